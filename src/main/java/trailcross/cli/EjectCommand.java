package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross eject}: listed by the design, its stage still being built. */
@Command(name = "eject", mixinStandardHelpOptions = true, description = "Generates the meteoroid cloud of one return as CSV (not built yet).")
final class EjectCommand extends NotBuiltYet {
}
