package trailcross.ephemeris;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ChebyshevCacheTest {

    private static final Vsop87Ephemeris SERIES = new Vsop87Ephemeris();

    @Test
    void fitStaysWithin1e10AuOfTheSeriesFrom1000To3000() {
        // The bound of the cache's contract; measured maximum ≈ 5e-11 au (Mercury).
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        Random rnd = new Random(7);
        Body[] bodies = {Body.MERCURY, Body.VENUS, Body.EARTH, Body.MOON, Body.EARTH_MOON_BARYCENTRE, Body.MARS,
            Body.JUPITER, Body.SATURN, Body.URANUS, Body.NEPTUNE};
        double worst = 0;
        for (int k = 0; k < 40; k++) {
            double t = cache.firstDay() + rnd.nextDouble() * (cache.lastDay() - cache.firstDay());
            for (Body b : bodies) {
                double[] a = new double[6];
                double[] c = new double[6];
                SERIES.heliocentric(b, t, a);
                cache.heliocentric(b, t, c);
                double d = Math.sqrt(sq(a[0] - c[0]) + sq(a[1] - c[1]) + sq(a[2] - c[2]));
                double dv = Math.sqrt(sq(a[3] - c[3]) + sq(a[4] - c[4]) + sq(a[5] - c[5]));
                assertThat(d).as("%s at t=%.3f", b, t).isLessThan(1e-10);
                assertThat(dv).as("%s velocity at t=%.3f", b, t).isLessThan(5e-9);
                worst = Math.max(worst, d);
            }
        }
        System.out.printf("cache vs series, worst position error %.2e au%n", worst);
        // Block edges and the ends of the span, where a fit is most exposed.
        for (double t : new double[] {cache.firstDay(), cache.firstDay() + 8.0, 4096.0, cache.lastDay()}) {
            double[] a = new double[6];
            double[] c = new double[6];
            SERIES.heliocentric(Body.EARTH, t, a);
            cache.heliocentric(Body.EARTH, t, c);
            assertThat(Math.sqrt(sq(a[0] - c[0]) + sq(a[1] - c[1]) + sq(a[2] - c[2]))).isLessThan(1e-10);
        }
    }

    @Test
    void allBodyCallsAgreeWithSingleBodyCalls() {
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        double t = 1234.567;
        double[] all = new double[54];
        double[] pos = new double[27];
        cache.heliocentricAll(t, all);
        cache.heliocentricPositionsAll(t, pos);
        for (int i = 0; i < ChebyshevCache.ALL.length; i++) {
            double[] one = new double[6];
            cache.heliocentric(ChebyshevCache.ALL[i], t, one);
            for (int k = 0; k < 6; k++) {
                assertThat(all[6 * i + k]).isEqualTo(one[k]);
            }
            for (int k = 0; k < 3; k++) {
                assertThat(pos[3 * i + k]).isEqualTo(one[k]);
            }
        }
        double[] sunCache = new double[6];
        double[] sunSeries = new double[6];
        cache.sunBarycentric(t, sunCache);
        SERIES.sunBarycentric(t, sunSeries);
        assertThat(Math.abs(sunCache[0] - sunSeries[0])).isLessThan(1e-12);
    }

    @Test
    void threadsSeeTheSameBlocks() throws Exception {
        // Lazy fitting from several threads at once gives bit-identical answers.
        ChebyshevCache shared = new ChebyshevCache(SERIES);
        ChebyshevCache alone = new ChebyshevCache(SERIES);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<double[]>> results = new ArrayList<>();
            for (int k = 0; k < 16; k++) {
                final double t = 500 + 3.3 * (k % 4);
                results.add(pool.submit(() -> {
                    double[] out = new double[54];
                    shared.heliocentricAll(t, out);
                    return out;
                }));
            }
            for (int k = 0; k < 16; k++) {
                double[] expected = new double[54];
                alone.heliocentricAll(500 + 3.3 * (k % 4), expected);
                assertThat(results.get(k).get()).containsExactly(expected);
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void outsideTheSpanIsAnError() {
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        assertThatThrownBy(() -> cache.heliocentric(Body.EARTH, 400000, new double[6]))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("outside the span");
    }

    private static double sq(double x) {
        return x * x;
    }
}
