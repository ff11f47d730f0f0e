package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross bench}: listed by the design, its stage still being built. */
@Command(name = "bench", mixinStandardHelpOptions = true, description = "Benchmarks: ephemeris, eject, propagate, forecast (not built yet).")
final class BenchCommand extends NotBuiltYet {
}
