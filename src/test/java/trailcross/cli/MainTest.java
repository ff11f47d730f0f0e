package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MainTest {

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void helpListsEveryCommandOfTheDesign() {
        Run r = run("--help");
        assertThat(r.code()).isZero();
        for (String c : new String[] {"forecast", "reach", "returns", "ephemeris", "radiants", "moid", "validate", "bench"}) {
            assertThat(r.out()).contains("  " + c + " ");
        }
        assertThat(r.out().replaceAll("\\s+", " ")).contains("operational decisions rest with");
    }

    @Test
    void checkPrintsTheResolvedStream() {
        Run r = run("check", "streams/lysandre.toml");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("Lysandrids").contains("period 34.295 yr").contains("model jones1995");
    }

    @Test
    void malformedStreamFilesGiveOneLineAndExitTwo() throws IOException {
        String minimal = trailcross.stream.StreamFileReaderTest.MINIMAL_TEXT;
        String[][] cases = {
            {minimal.replace("q_au = 0.98\n", ""), "parent.q_au: required key is missing"},
            {minimal.replace("e = 0.90", "e = true"), "parent.e: expected a number"},
            {minimal.replace("node_deg = 235.0", "node_deg = 400"), "parent.node_deg: must be in [0, 360)"},
            {minimal + "colour = \"red\"\n", "parent.colour: unknown key"},
            {minimal.replace("[parent]", "[parent"), "not valid TOML"},
        };
        for (String[] c : cases) {
            Path f = dir.resolve("bad.toml");
            Files.writeString(f, c[0]);
            Run r = run("check", f.toString());
            assertThat(r.code()).as(c[1]).isEqualTo(Main.BAD_INPUT);
            assertThat(r.err()).startsWith("trailcross: " + f + ":").contains(c[1]);
            assertThat(r.err().strip().lines().count()).isEqualTo(1);
            assertThat(r.err()).doesNotContain("Exception").doesNotContain("\tat ");
            assertThat(r.out()).isEmpty();
        }
        Run missing = run("check", dir.resolve("absent.toml").toString());
        assertThat(missing.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(missing.err().strip()).isEqualTo("trailcross: " + dir.resolve("absent.toml") + ": no such file");
    }

    @Test
    void badOptionIsOneLine() {
        Run r = run("time", "--nonsense");
        assertThat(r.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err().strip().lines().count()).isEqualTo(1);
    }

    @Test
    void timeCommandShowsEveryScale() {
        Run r = run("time", "2031-11-17T04:12:00Z");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("UTC,2031-11-17T04:12:00.000000Z").contains("TT,2031-11-17T04:13:09.184000");
        Run bad = run("time", "2031-11-17T04:12:00");
        assertThat(bad.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(bad.err()).contains("no time scale");
    }
}
