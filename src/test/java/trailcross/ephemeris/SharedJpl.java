package trailcross.ephemeris;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;

/** Locates JPL's ephemeris excerpts in ../shared/jpl/ and says so clearly when they are absent. */
final class SharedJpl {

    static final Path DIR = Path.of("..", "shared", "jpl");

    private SharedJpl() {
    }

    static Path file(String name) {
        Path p = DIR.resolve(name);
        if (!Files.isRegularFile(p)) {
            System.err.println("NOTE: " + p.toAbsolutePath() + " is absent: JPL ephemeris checks skipped"
                    + " (they run in CI, where ../shared/jpl/ is present)");
        }
        Assumptions.assumeTrue(Files.isRegularFile(p), "../shared/jpl/" + name + " is absent");
        return p;
    }
}
