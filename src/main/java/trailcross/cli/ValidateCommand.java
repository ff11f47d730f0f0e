package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross validate}: listed by the design, its stage still being built. */
@Command(name = "validate", mixinStandardHelpOptions = true, description = "Runs every case in validation/ and prints computed against published (not built yet).")
final class ValidateCommand extends NotBuiltYet {
}
