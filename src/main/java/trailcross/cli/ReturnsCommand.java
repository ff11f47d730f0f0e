package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross returns}: listed by the design, its stage still being built. */
@Command(name = "returns", mixinStandardHelpOptions = true, description = "The parent's perihelion returns from back-integration (not built yet).")
final class ReturnsCommand extends NotBuiltYet {
}
