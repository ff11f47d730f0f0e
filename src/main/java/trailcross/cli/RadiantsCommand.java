package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross radiants}: listed by the design, its stage still being built. */
@Command(name = "radiants", mixinStandardHelpOptions = true, description = "A radiant table (date, solar longitude, RA, Dec, Vg) for a stream and year (not built yet).")
final class RadiantsCommand extends NotBuiltYet {
}
