package trailcross.cli;

import java.io.PrintWriter;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.ephemeris.EphemerisBenchmark;

/** {@code trailcross bench WHAT}: benchmarks that print figures (a human table, then one line per figure). */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = {"Benchmarks: ephemeris, eject, propagate, forecast.",
            "Prints a table, then one line per figure: bench <what> <variant> threads=N <name>=<value> ..."})
final class BenchCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "WHAT", description = "ephemeris, eject, propagate or forecast")
    String what;

    @Option(names = "--threads", split = ",", defaultValue = "1,2", paramLabel = "N[,N...]",
            description = "thread counts to measure (default 1,2)")
    int[] threads;

    @Option(names = "--spark", paramLabel = "MASTER",
            description = "forecast: the Leonids case on this machine's threads and on Spark (e.g. local[2]), walls and "
                    + "their ratio (needs Spark on the class path: ./trailcross adds it)")
    String spark;

    @Option(names = "--quick", description = "fewer calls (a rough figure in seconds)")
    boolean quick;

    @Option(names = "--particles", defaultValue = "1000", paramLabel = "N",
            description = "propagate: particles in the workload (default 1000)")
    int particles;

    @Option(names = "--check", defaultValue = "20", paramLabel = "N",
            description = "propagate: particles on which the reference run is cross-checked with Hipparchus GBS")
    int check;

    @Option(names = "--epsilon", defaultValue = "1e-8", paramLabel = "EPS",
            description = "propagate: Gauss-Radau's accuracy parameter (default 1e-8, the forecast's)")
    double epsilon;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        switch (what) {
            case "ephemeris" -> ephemeris(out);
            case "propagate" -> propagate(out);
            case "eject" -> eject(out);
            case "forecast" -> forecast(out);
            default -> throw new IllegalArgumentException("bench: unknown benchmark '" + what
                    + "' (ephemeris, eject, propagate, forecast)");
        }
        return 0;
    }

    private void propagate(PrintWriter out) throws Exception {
        if (particles < 1) {
            throw new IllegalArgumentException("--particles must be >= 1");
        }
        trailcross.dynamics.PropagationBenchmark bench = new trailcross.dynamics.PropagationBenchmark(
                new trailcross.dynamics.ForceModelFactory(trailcross.ephemeris.Ephemerides.fast(null), true, true),
                particles, 1);
        out.printf(Locale.ROOT, "propagate: %d Halley-type particles, Sun + planets + Earth + Moon + 1PN, 100 years; "
                + "Gauss-Radau eps %.0e%n", particles, epsilon);
        out.flush();
        int refThreads = Arrays.stream(threads).max().orElse(1);
        trailcross.dynamics.PropagationBenchmark.ReferenceCheck rc = bench.reference(refThreads, check);
        out.printf(Locale.ROOT, "reference: Gauss-Radau, timescale criterion, eps 1e-16; against Hipparchus GBS (rtol 1e-14) on %d particles: "
                + "median %.2e au, max %.2e au%n", rc.particles(), rc.medianAu(), rc.maxAu());
        out.printf(Locale.ROOT, "%-12s %8s %22s %14s %14s %9s%n", "integrator", "threads", "particle-yr/CPU-s",
                "median err au", "max err au", "wall s");
        StringBuilder lines = new StringBuilder();
        for (String integrator : new String[] {"gauss-radau", "dp853"}) {
            for (int n : threads) {
                trailcross.dynamics.PropagationBenchmark.Figure f = bench.measure(integrator, n, epsilon);
                out.printf(Locale.ROOT, "%-12s %8d %22.1f %14.2e %14.2e %9.2f%n", f.integrator(), f.threads(),
                        f.particleYearsPerCpuSecond(), f.medianErrorAu(), f.maxErrorAu(), f.wallSeconds());
                out.flush();
                lines.append(f.line()).append('\n');
            }
        }
        out.print(lines);
        out.flush();
    }

    private void forecast(PrintWriter out) {
        if (spark != null) {
            try {
                Class.forName("org.apache.spark.api.java.JavaSparkContext");
            } catch (ClassNotFoundException e) {
                throw new IllegalArgumentException("--spark: Apache Spark is not on the class path (run through "
                        + "./trailcross, which adds it, or spark-submit)");
            }
            SparkBench.run(out, spark, quick ? 400 : 4000, 2);
            return;
        }
        int demo = quick ? 200 : 1000;
        int leonids = quick ? 400 : 4000;
        out.printf(Locale.ROOT, "forecast: demo (streams/lysandre.toml, 2027, %d particles per return) and the 1999 Leonids "
                + "(55P since 1890, %d per return)%n", demo, leonids);
        out.printf(Locale.ROOT, "%-14s %8s %10s %22s %9s %14s%n", "workload", "threads", "particles", "particle-yr/CPU-s",
                "wall s", "peak heap MB");
        out.flush();
        var eph = trailcross.ephemeris.Ephemerides.fast(null);
        StringBuilder lines = new StringBuilder();
        for (String w : new String[] {"demo", "leonids-1999"}) {
            // A small run first fits the ephemeris cache over the span and warms the JIT, so that the first
            // timed thread count does not pay for them.
            trailcross.forecast.ForecastBenchmark.measure(w, 60, 1, eph);
            double first = Double.NaN;
            for (int n : threads) {
                var f = trailcross.forecast.ForecastBenchmark.measure(w, w.equals("demo") ? demo : leonids, n, eph);
                if (Double.isNaN(first)) {
                    first = f.wallSeconds();
                }
                out.printf(Locale.ROOT, "%-14s %8d %10d %22.0f %9.1f %14.0f   speed-up %.2fx%n", w, n, f.particles(),
                        f.particleYearsPerCpuSecond(), f.wallSeconds(), f.peakHeapMb(), first / f.wallSeconds());
                out.flush();
                lines.append(f.line()).append(String.format(Locale.ROOT, " speedup_vs_first=%.2f", first / f.wallSeconds()))
                        .append('\n');
            }
        }
        // The figure that matters: a trail's peak sigma per CPU-minute, plain against targeted sampling of the
        // same particle count, in the same run; on the Leonids' 1899 trail and on the demo's 1993 trail.
        int per = quick ? 1500 : 6000;
        out.printf(Locale.ROOT, "%nprecision: %d particles per return; a trail's peak sigma (resampling) and the CPU it "
                + "cost: Leonids 1999 (returns since 1898, the 1899 trail) and the demo (2027, its 1993 trail)%n", per);
        out.printf(Locale.ROOT, "%-14s %-9s %12s %9s %8s %7s %12s %14s%n", "workload", "sampling", "sigma (min)", "CPU min",
                "section", "ESS", "ESS/CPU-min", "sigma^2 x CPU");
        for (String w : new String[] {"leonids-1999", "demo"}) {
            var plain = trailcross.forecast.ForecastBenchmark.precision(w, per, false, 2, eph);
            var targeted = trailcross.forecast.ForecastBenchmark.precision(w, per, true, 2, eph);
            for (var p : new trailcross.forecast.ForecastBenchmark.Precision[] {plain, targeted}) {
                out.printf(Locale.ROOT, "%-14s %-9s %12.2f %9.2f %8d %7.0f %12.1f %14.1f%n", w, p.sampling(), p.sigmaMin(),
                        p.cpuMinutes(), p.section(), p.ess(), p.ess() / p.cpuMinutes(), p.varianceTime());
                lines.append(p.line()).append('\n');
            }
            double gain = plain.varianceTime() / targeted.varianceTime();
            double essGain = (targeted.ess() / targeted.cpuMinutes()) / (plain.ess() / plain.cpuMinutes());
            out.printf(Locale.ROOT, "%s: efficiency gain %.1fx (plain sigma^2 x CPU over targeted), ESS per CPU-minute "
                    + "gain %.1fx%n", w, gain, essGain);
            out.flush();
            lines.append(String.format(Locale.ROOT, "bench forecast precision-gain-%s threads=2 ratio=%.2f ess_ratio=%.2f%n",
                    w, gain, essGain));
        }
        out.print(lines);
        out.flush();
    }

    private void eject(PrintWriter out) {
        int n = quick ? 200_000 : 2_000_000;
        out.printf(Locale.ROOT, "eject: %d particles of an invented Halley-type return (Jones 1995, sunlit, 5 size bins)%n", n);
        out.printf(Locale.ROOT, "%-16s %8s %18s %22s%n", "variant", "threads", "particles per s", "time vs uniform draws");
        out.flush();
        trailcross.ejection.EjectionBenchmark bench = new trailcross.ejection.EjectionBenchmark(
                trailcross.ephemeris.Ephemerides.fast(null));
        StringBuilder lines = new StringBuilder();
        for (var f : bench.run(n, threads)) {
            out.printf(Locale.ROOT, "%-16s %8d %18.0f %21.1fx%n", f.variant(), f.threads(), f.particlesPerSecond(),
                    f.vsUniformDraws());
            lines.append(f.line()).append('\n');
        }
        int focusedParticles = quick ? 1000 : 5000;
        out.printf(Locale.ROOT, "under a proposal (3 days in P0, floor 0.001), %d particles: the band of directions against "
                + "keeping the law's candidates by their acceptance%n", focusedParticles);
        for (int t : threads) {
            List<trailcross.ejection.EjectionBenchmark.Figure> f = bench.focused(focusedParticles, t);
            for (var x : f) {
                out.printf(Locale.ROOT, "%-18s %6d %18.0f %21.1fx%n", x.variant(), x.threads(), x.particlesPerSecond(),
                        x.vsUniformDraws());
                lines.append(x.line()).append('\n');
            }
            double gain = f.get(0).particlesPerSecond() / f.get(1).particlesPerSecond();
            out.printf(Locale.ROOT, "band gain %.1fx%n", gain);
            lines.append(String.format(Locale.ROOT, "bench eject focused-gain threads=%d ratio=%.2f%n", t, gain));
        }
        out.print(lines);
        out.flush();
    }

    private void ephemeris(PrintWriter out) throws Exception {
        EphemerisBenchmark bench = new EphemerisBenchmark();
        long seriesCalls = quick ? 50 : 400;
        long cacheCalls = quick ? 200_000 : 3_000_000;
        out.println("ephemeris: one call = the nine bodies (Mercury … Neptune, Earth, Moon), heliocentric");
        out.printf(Locale.ROOT, "%-24s %8s %16s %12s%n", "variant", "threads", "ns per call", "vs series");
        StringBuilder lines = new StringBuilder();
        for (int n : threads) {
            if (n < 1) {
                throw new IllegalArgumentException("--threads: thread counts must be >= 1");
            }
            List<EphemerisBenchmark.Figure> figs = bench.run(n, seriesCalls, cacheCalls);
            double seriesNs = figs.get(0).nsPerCall();
            for (EphemerisBenchmark.Figure f : figs) {
                out.printf(Locale.ROOT, "%-24s %8d %16.1f %11.0fx%n", f.variant(), f.threads(), f.nsPerCall(),
                        seriesNs / f.nsPerCall());
                lines.append(f.line()).append(String.format(Locale.ROOT, " speedup_vs_series=%.1f",
                        seriesNs / f.nsPerCall())).append('\n');
            }
        }
        out.print(lines);
        out.flush();
    }
}
