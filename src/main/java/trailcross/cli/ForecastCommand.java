package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross forecast}: listed by the design, its stage still being built. */
@Command(name = "forecast", mixinStandardHelpOptions = true, description = "The whole job for a year: trails, encounters, radiants, ZHR (not built yet).")
final class ForecastCommand extends NotBuiltYet {
}
