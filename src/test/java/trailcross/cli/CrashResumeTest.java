package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A forecast killed (SIGKILL) in a child JVM while it writes its trail checkpoints resumes to tables
 * identical, byte for byte, to an uninterrupted run's; a damaged checkpoint is reported and its trail
 * recomputed; no file the run wrote is ever half-written.
 */
class CrashResumeTest {

    @TempDir
    Path dir;

    private static final String[] RUN = {"forecast", "streams/lysandre.toml", "--year", "2027", "--returns", "2",
        "--particles", "200", "--threads", "1"};

    private static String[] with(String... more) {
        String[] a = java.util.Arrays.copyOf(RUN, RUN.length + more.length);
        System.arraycopy(more, 0, a, RUN.length, more.length);
        return a;
    }

    @Test
    void killedMidRunResumesToIdenticalTables() throws Exception {
        Path whole = dir.resolve("whole");
        MainTest.Run a = MainTest.run(with("--out", whole.toString()));
        assertThat(a.code()).as(a.err()).isZero();

        Path killed = dir.resolve("killed");
        List<String> cmd = new ArrayList<>(List.of(ProcessHandle.current().info().command().orElse("java"), "-cp",
                System.getProperty("java.class.path"), "trailcross.cli.Main"));
        cmd.addAll(List.of(with("--out", killed.toString())));
        Process child = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(dir.resolve("child.log").toFile())
                .start();
        // Kill it as soon as its first trail's checkpoint is in place, while the next is being computed.
        Path progress = killed.resolve("progress");
        long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(4);
        while (System.nanoTime() < deadline && child.isAlive() && finished(progress) < 1) {
            Thread.sleep(20);
        }
        boolean wasAlive = child.isAlive();
        child.destroyForcibly().waitFor(30, TimeUnit.SECONDS);
        assertThat(wasAlive).as("the child was killed mid-run, not after it ended").isTrue();
        assertThat(finished(progress)).isEqualTo(1);
        assertThat(Files.exists(killed.resolve("encounters.csv"))).isFalse();
        // What it left is whole: every checkpoint in place reads back (its checksum matches).
        try (var s = Files.list(progress)) {
            for (Path p : s.filter(p -> p.getFileName().toString().matches("trail-\\d+(-axis)?\\.csv")).toList()) {
                trailcross.io.SealedFile.read(p);
            }
        }
        MainTest.Run resumed = MainTest.run(with("--out", killed.toString(), "--resume"));
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.out()).contains("read back from the saved run");
        for (String f : new String[] {"encounters.csv", "crossings.csv"}) {
            assertThat(Files.readString(killed.resolve(f))).as(f).isEqualTo(Files.readString(whole.resolve(f)));
        }

        // A damaged checkpoint is reported in one line and its trail recomputed, to the same tables.
        Path first;
        try (var s = Files.list(progress)) {
            first = s.filter(p -> p.getFileName().toString().matches("trail-\\d+\\.csv")).sorted().findFirst().orElseThrow();
        }
        String text = Files.readString(first);
        Files.writeString(first, text.replaceFirst("\n(\\d)", "\n9$1"));
        MainTest.Run again = MainTest.run(with("--out", killed.toString(), "--resume"));
        assertThat(again.code()).as(again.err()).isZero();
        assertThat(again.out()).contains("damaged: its checksum does not match its content; recomputing the trail");
        for (String f : new String[] {"encounters.csv", "crossings.csv"}) {
            assertThat(Files.readString(killed.resolve(f))).as(f).isEqualTo(Files.readString(whole.resolve(f)));
        }
    }

    /** Trails whose cloud checkpoint is in place. */
    private static int finished(Path progress) throws IOException {
        if (!Files.isDirectory(progress)) {
            return 0;
        }
        try (var s = Files.list(progress)) {
            return (int) s.filter(p -> p.getFileName().toString().matches("trail-\\d+\\.csv")).count();
        }
    }
}
