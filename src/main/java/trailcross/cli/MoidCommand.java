package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross moid}: listed by the design, its stage still being built. */
@Command(name = "moid", mixinStandardHelpOptions = true, description = "Minimum orbit intersection distance of two orbits (not built yet).")
final class MoidCommand extends NotBuiltYet {
}
