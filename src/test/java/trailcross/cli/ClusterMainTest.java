package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.spark.SparkConf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The Spark entry point runs the forecast's own command line, with its checkpoint and --resume. */
class ClusterMainTest {

    @TempDir
    Path dir;

    @Test
    void theEntryPointWritesTheLocalFilesAndResumes() throws IOException {
        String[] common = {"forecast", "streams/lysandre.toml", "--year", "2027", "--since", "1990", "--particles", "200",
            "--sampling", "plain"};
        MainTest.Run local = MainTest.run(concat(common, "--out", dir.resolve("local").toString()));
        assertThat(local.code()).as(local.err()).isZero();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        SparkConf conf = new SparkConf().setMaster("local[2]").set("spark.ui.enabled", "false")
                .set("spark.driver.host", "127.0.0.1").set("spark.driver.bindAddress", "127.0.0.1");
        int code = ClusterMain.run(concat(common, "--out", dir.resolve("cluster").toString()), conf, new PrintWriter(out),
                new PrintWriter(err));
        assertThat(code).as(err.toString()).isZero();
        assertThat(out.toString()).contains("trail 1993: 200 particles plain");
        for (String f : new String[] {"encounters.csv", "crossings.csv"}) {
            assertThat(Files.readAllBytes(dir.resolve("cluster").resolve(f)))
                    .isEqualTo(Files.readAllBytes(dir.resolve("local").resolve(f)));
        }
        // The finished return was saved by the driver: --resume reads it back instead of running tasks.
        StringWriter again = new StringWriter();
        code = ClusterMain.run(concat(common, "--out", dir.resolve("cluster").toString(), "--resume"),
                new SparkConf().setMaster("local[2]").set("spark.ui.enabled", "false")
                        .set("spark.driver.host", "127.0.0.1").set("spark.driver.bindAddress", "127.0.0.1"),
                new PrintWriter(again), new PrintWriter(new StringWriter()));
        assertThat(code).isZero();
        assertThat(again.toString()).contains("read back from the saved run");
        assertThat(Files.readAllBytes(dir.resolve("cluster").resolve("encounters.csv")))
                .isEqualTo(Files.readAllBytes(dir.resolve("local").resolve("encounters.csv")));
        assertThat(ForecastCommand.engines).isSameAs(ForecastCommand.LOCAL_ENGINE);
    }

    private static String[] concat(String[] a, String... b) {
        String[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
