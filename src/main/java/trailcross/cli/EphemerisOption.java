package trailcross.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/** The {@code --ephemeris FILE} option shared by every command that uses the planets. */
final class EphemerisOption {

    @Option(names = "--ephemeris", paramLabel = "FILE",
            description = "a JPL DE binary ephemeris (DE405 … DE441) instead of the embedded VSOP87B + Moon98")
    Path file;
}
