package trailcross.cli;

import java.io.PrintWriter;
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
        description = {"Benchmarks: ephemeris (built); eject, propagate, forecast (their stages are not built yet).",
            "Prints a table, then one line per figure: bench <what> <variant> threads=N <name>=<value> ..."})
final class BenchCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "WHAT", description = "ephemeris, eject, propagate or forecast")
    String what;

    @Option(names = "--threads", split = ",", defaultValue = "1,2", paramLabel = "N[,N...]",
            description = "thread counts to measure (default 1,2)")
    int[] threads;

    @Option(names = "--quick", description = "fewer calls (a rough figure in seconds)")
    boolean quick;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        switch (what) {
            case "ephemeris" -> ephemeris(out);
            case "eject", "propagate", "forecast" -> {
                spec.commandLine().getErr().println("trailcross bench " + what
                        + ": not available in this version yet (its stage is still being built)");
                return Main.NOT_BUILT;
            }
            default -> throw new IllegalArgumentException("bench: unknown benchmark '" + what
                    + "' (ephemeris, eject, propagate, forecast)");
        }
        return 0;
    }

    private void ephemeris(PrintWriter out) throws Exception {
        EphemerisBenchmark bench = new EphemerisBenchmark();
        long seriesCalls = quick ? 50 : 400;
        long cacheCalls = quick ? 200_000 : 3_000_000;
        out.println("ephemeris: one call = the nine bodies (Mercury … Neptune, Earth, Moon), heliocentric");
        out.printf(Locale.ROOT, "%-22s %8s %16s %12s%n", "variant", "threads", "ns per call", "vs series");
        StringBuilder lines = new StringBuilder();
        for (int n : threads) {
            if (n < 1) {
                throw new IllegalArgumentException("--threads: thread counts must be >= 1");
            }
            List<EphemerisBenchmark.Figure> figs = bench.run(n, seriesCalls, cacheCalls);
            double seriesNs = figs.get(0).nsPerCall();
            for (EphemerisBenchmark.Figure f : figs) {
                out.printf(Locale.ROOT, "%-22s %8d %16.1f %11.0fx%n", f.variant(), f.threads(), f.nsPerCall(),
                        seriesNs / f.nsPerCall());
                lines.append(f.line()).append(String.format(Locale.ROOT, " speedup_vs_series=%.1f",
                        seriesNs / f.nsPerCall())).append('\n');
            }
        }
        out.print(lines);
        out.flush();
    }
}
