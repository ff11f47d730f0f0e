package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The cloud's CSV: exact round trip, clear errors, atomic replacement. */
class MeteoroidFileTest {

    @TempDir
    Path dir;

    private static List<Meteoroid> sample() {
        return List.of(
                new Meteoroid(0, 10958.25, 10901.123456789, new double[] {0.1 / 3, -0.9, 0.27, -0.019, 1e-3 / 7, 1e-17},
                        1.2345678901234567e-4, 6.789e-9, 0.00462, 1.5e14, 38.25),
                new Meteoroid(1, 10958.25, 10960.5, new double[] {1.5, 0.6, 1.1, -0.007, -0.0146, -0.0026},
                        3e-3, 1.1e-4, 1.9e-4, Double.NaN, 4.0));
    }

    @Test
    void roundTripIsExact() {
        Path f = dir.resolve("cloud.csv");
        MeteoroidFile.write(f, sample());
        List<Meteoroid> back = MeteoroidFile.read(f);
        assertThat(back).hasSize(2);
        for (int k = 0; k < 2; k++) {
            Meteoroid a = sample().get(k);
            Meteoroid b = back.get(k);
            assertThat(b.state()).isEqualTo(a.state());
            // Times are written as JD, whose last digit is 2^-29 d (40 us): exact to that.
            assertThat(b.t()).isCloseTo(a.t(), org.assertj.core.api.Assertions.within(5e-10));
            assertThat(b.returnT()).isCloseTo(a.returnT(), org.assertj.core.api.Assertions.within(5e-10));
            assertThat(b.radiusM()).isEqualTo(a.radiusM());
            assertThat(b.beta()).isEqualTo(a.beta());
            assertThat(Double.compare(b.weight(), a.weight())).isZero();
        }
    }

    @Test
    void badEntriesNameFileAndLine() throws IOException {
        Path f = dir.resolve("cloud.csv");
        MeteoroidFile.write(f, sample());
        List<String> lines = Files.readAllLines(f);
        String[] cols = lines.get(2).split(",");
        cols[9] = "NaN";
        Files.writeString(f, lines.get(0) + "\n" + lines.get(1) + "\n" + String.join(",", cols) + "\n");
        assertThatThrownBy(() -> MeteoroidFile.read(f)).hasMessageStartingWith(f + ":3: radius_m: not a finite number");
        Files.writeString(f, lines.get(0) + "\n" + lines.get(1) + "\n" + lines.get(1) + "\n");
        assertThatThrownBy(() -> MeteoroidFile.read(f)).hasMessageStartingWith(f + ":3: id 0 appears twice");
        Files.writeString(f, "id,x_au\n1,2\n");
        assertThatThrownBy(() -> MeteoroidFile.read(f)).hasMessage(f + ":1: missing column return_jd_tdb");
        Files.writeString(f, lines.get(0) + "\n");
        assertThatThrownBy(() -> MeteoroidFile.read(f)).hasMessage(f + ": no particles");
    }

    @Test
    void failedWriteLeavesTheOldFile() throws IOException {
        Path f = dir.resolve("cloud.csv");
        MeteoroidFile.write(f, sample());
        String before = Files.readString(f);
        Meteoroid broken = new Meteoroid(5, 0, 0, null, 1, 1, 0, 1, 1);
        assertThatThrownBy(() -> MeteoroidFile.write(f, List.of(sample().get(0), broken)))
                .isInstanceOf(NullPointerException.class);
        assertThat(Files.readString(f)).isEqualTo(before);
        try (var files = Files.list(dir)) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("cloud.csv");
        }
    }
}
