package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross reach}: listed by the design, its stage still being built. */
@Command(name = "reach", mixinStandardHelpOptions = true, description = "Can a stream reach the Earth at all: MOID, nodes, least ejection speed, radiant (not built yet).")
final class ReachCommand extends NotBuiltYet {
}
