package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code trailcross validate}: the quick cases pass; a case that is not met exits 1; a bad case file exits 2. */
class ValidateCommandTest {

    @TempDir
    Path dir;

    @Test
    void quickCasesPass() {
        MainTest.Run r = MainTest.run("validate", "--quick");
        assertThat(r.code()).as(r.out() + r.err()).isZero();
        assertThat(r.out()).contains("moid_au").contains("perihelion_tt").contains("calibration_round_trip").contains("axis_peak_utc")
                .contains("0 check(s) failed");
    }

    @Test
    void aMissedValueFailsAndABadFileIsBadInput() throws IOException {
        Path stream = Path.of("validation/55p-tempel-tuttle.toml").toAbsolutePath();
        Files.writeString(dir.resolve("wrong.toml"), "name = \"wrong on purpose\"\nstream = \"" + stream.toString().replace("\\", "/")
                + "\"\ncommand = \"moid\"\nquick = true\nsource = \"none: a deliberately wrong value\"\n"
                + "[[check]]\nquantity = \"moid_au\"\npublished = 0.0100\ntolerance = 1e-6\n");
        MainTest.Run r = MainTest.run("validate", "--dir", dir.toString());
        assertThat(r.code()).isEqualTo(1);
        assertThat(r.out()).contains("FAIL").contains("1 check(s) failed");
        Files.writeString(dir.resolve("wrong.toml"), "name = \"x\"\nstream = \"" + stream.toString().replace("\\", "/")
                + "\"\ncommand = \"orbit\"\nsource = \"x\"\n");
        MainTest.Run b = MainTest.run("validate", "--dir", dir.toString());
        assertThat(b.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(b.err()).contains("wrong.toml:3: command: 'orbit' is not moid, perihelion, forecast, calibrate or axis");
    }
}
