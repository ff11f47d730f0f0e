package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A parent whose own orbit cannot be followed is a one-line error naming the body, the date and the distance. */
class ParentFateTest {

    @TempDir
    Path dir;

    @Test
    void aSunGrazerThatEntersTheSunIsOneLine() throws IOException {
        // The invented demo comet with its perihelion moved to 1e-6 au: inside the Sun's radius (0.00465 au).
        String text = Files.readString(Path.of("streams/lysandre.toml")).replace("q_au = 0.95", "q_au = 1e-6");
        Path stream = dir.resolve("grazer.toml");
        Files.writeString(stream, text);
        for (String[] args : new String[][] {{"returns", stream.toString(), "--since", "2000"},
            {"forecast", stream.toString(), "--year", "2030", "--returns", "1", "--particles", "100", "--out", dir.resolve("o").toString()}}) {
            MainTest.Run r = MainTest.run(args);
            assertThat(r.code()).as(r.err()).isEqualTo(Main.BAD_INPUT);
            assertThat(r.err().strip().lines().count()).isEqualTo(1);
            assertThat(r.err()).contains("Lysandre (fictional): the parent's own orbit enters the Sun on 20")
                    .contains("au from its centre").doesNotContain("internal error");
        }
    }
}
