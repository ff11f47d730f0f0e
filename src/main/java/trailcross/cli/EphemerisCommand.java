package trailcross.cli;

import picocli.CommandLine.Command;

/** {@code trailcross ephemeris}: listed by the design, its stage still being built. */
@Command(name = "ephemeris", mixinStandardHelpOptions = true, description = "A body's heliocentric ecliptic J2000 state at a time or as a table (not built yet).")
final class EphemerisCommand extends NotBuiltYet {
}
