package trailcross.ephemeris;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Measures the cost of one all-body state (the nine bodies of {@link ChebyshevCache#ALL}) from the full
 * series and from the cache, on a given number of threads, each thread timing its own calls after a
 * warm-up. Each thread marches through a ten-year window in steps of about 0.03 day, as an integrator
 * does (consecutive calls touch the same blocks). A figure, never a pass/fail test: the ratio
 * series/cache is measured in the same run.
 */
public final class EphemerisBenchmark {

    /**
     * One measured figure.
     *
     * @param variant what was measured
     * @param threads threads calling at once
     * @param nsPerCall nanoseconds per all-body call, mean over threads
     * @param calls calls per thread
     */
    public record Figure(String variant, int threads, double nsPerCall, long calls) {
        /** @return the machine-readable line of DESIGN.md's bench contract */
        public String line() {
            return String.format(Locale.ROOT, "bench ephemeris %s threads=%d ns_per_all_body=%.1f calls=%d",
                    variant, threads, nsPerCall, calls);
        }
    }

    private final Vsop87Ephemeris series = new Vsop87Ephemeris();
    private final ChebyshevCache cache = new ChebyshevCache(series);
    /** Ten years from 2020: the window the calls sample, fitted before timing. */
    private static final double WINDOW_START = 7305.0;
    private static final double WINDOW_DAYS = 3652.5;

    /**
     * @param threads 1, 2, …
     * @param seriesCalls calls per thread for the series
     * @param cacheCalls calls per thread for the cache
     * @return the figures: series, cache state, cache positions
     */
    public List<Figure> run(int threads, long seriesCalls, long cacheCalls) throws Exception {
        double[] out = new double[54];
        for (double t = WINDOW_START; t < WINDOW_START + WINDOW_DAYS; t += 1.0) {
            cache.heliocentricAll(t, out); // fit every block of the window before timing
        }
        List<Figure> figures = new ArrayList<>();
        figures.add(new Figure("vsop87-series-state", threads, time(threads, seriesCalls, () -> (t, o) -> {
            for (Body b : ChebyshevCache.ALL) {
                series.heliocentric(b, t, o);
            }
        }), seriesCalls));
        // A cursor per thread is how the force model calls the cache; the shared call finds its thread's
        // cursor through a ThreadLocal first.
        figures.add(new Figure("cache-state", threads, time(threads, cacheCalls,
                () -> cache.cursor()::heliocentricAll), cacheCalls));
        figures.add(new Figure("cache-positions", threads, time(threads, cacheCalls,
                () -> cache.cursor()::heliocentricPositionsAll), cacheCalls));
        figures.add(new Figure("cache-state-shared-call", threads, time(threads, cacheCalls,
                () -> cache::heliocentricAll), cacheCalls));
        return figures;
    }

    private interface Call {
        void at(double t, double[] out);
    }

    private static double time(int threads, long calls, java.util.function.Supplier<Call> perThread) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<Double>> results = new ArrayList<>();
            for (int k = 0; k < threads; k++) {
                final int seed = k;
                results.add(pool.submit(() -> {
                    Call call = perThread.get();
                    double[] out = new double[54];
                    double step = 0.0271828 * (seed + 1);
                    double sink = 0;
                    long warm = Math.max(1, calls / 5);
                    double t = WINDOW_START;
                    for (long i = 0; i < warm; i++) {
                        call.at(t, out);
                        sink += out[0];
                        t = next(t, step);
                    }
                    long start = System.nanoTime();
                    for (long i = 0; i < calls; i++) {
                        call.at(t, out);
                        sink += out[0];
                        t = next(t, step);
                    }
                    long elapsed = System.nanoTime() - start;
                    if (sink == 42.0) {
                        System.out.print("");
                    }
                    return elapsed / (double) calls;
                }));
            }
            double sum = 0;
            for (Future<Double> f : results) {
                sum += f.get();
            }
            return sum / threads;
        } finally {
            pool.shutdown();
        }
    }

    /** The next time of the march, wrapped into the window (a subtraction, not the costly double {@code %}). */
    private static double next(double t, double step) {
        double n = t + step;
        return n >= WINDOW_START + WINDOW_DAYS ? n - WINDOW_DAYS : n;
    }
}
