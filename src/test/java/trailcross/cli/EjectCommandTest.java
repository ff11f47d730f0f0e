package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.MeteoroidFile;

/** {@code trailcross eject} on the demo streams, and its bad-input paths. */
class EjectCommandTest {

    @TempDir
    Path dir;

    @Test
    void writesTheCloudOfOneReturn() {
        Path out = dir.resolve("lysandre-2027.csv");
        MainTest.Run r = MainTest.run("eject", "streams/lysandre.toml", "--return", "2027", "--particles", "3000",
                "--seed", "11", "--threads", "2", "--out", out.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("return of 2027-03-14").contains("active arc").contains("3000 particles")
                .contains("dust shed over the arc");
        List<Meteoroid> cloud = MeteoroidFile.read(out);
        assertThat(cloud).hasSize(3000);
        // The demo comet is active inside 3 au on both legs (stream file), so every ejection is there.
        assertThat(cloud).allSatisfy(m -> {
            double[] s = m.state();
            assertThat(Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2])).isBetween(0.95 - 1e-3, 3.0 + 1e-6);
            assertThat(m.weight()).isPositive();
        });
        // The same seed on one thread writes the same file.
        Path again = dir.resolve("again.csv");
        MainTest.run("eject", "streams/lysandre.toml", "--return", "2027", "--particles", "3000", "--seed", "11",
                "--out", again.toString());
        try {
            assertThat(Files.readString(again)).isEqualTo(Files.readString(out));
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    @Test
    void badInputGivesOneLineAndExitTwo() throws IOException {
        Path out = dir.resolve("cloud.csv");
        Files.writeString(out, "keep me\n");
        MainTest.Run none = MainTest.run("eject", "streams/lysandre.toml", "--return", "2030", "--particles", "10",
                "--out", out.toString());
        assertThat(none.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(none.err()).contains("no perihelion passage in 2030").doesNotContain("\n\tat ");
        assertThat(none.err().strip().lines()).hasSize(1);
        MainTest.Run zero = MainTest.run("eject", "streams/lysandre.toml", "--return", "2027", "--particles", "0",
                "--out", out.toString());
        assertThat(zero.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(zero.err()).contains("--particles must be >= 1");
        Path bad = dir.resolve("bad.toml");
        Files.writeString(bad, Files.readString(Path.of("streams/lysandre.toml")).replace("radius_km = 3.0", "radius_km = -3.0"));
        MainTest.Run neg = MainTest.run("eject", bad.toString(), "--return", "2027", "--out", out.toString());
        assertThat(neg.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(neg.err()).startsWith("trailcross: " + bad + ":").contains("parent.radius_km");
        assertThat(Files.readString(out)).isEqualTo("keep me\n");
    }
}
