package trailcross.cluster;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import trailcross.ejection.EjectionFocus;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Ephemerides;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.CloudEngine;
import trailcross.forecast.ForecastRun;
import trailcross.forecast.ReturnRecipe;
import trailcross.report.ForecastWriter;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;

/** The forecast on Spark in local mode (two worker threads) against the local run. */
class SparkEngineTest {

    private static JavaSparkContext spark;

    @TempDir
    Path dir;

    @BeforeAll
    static void start() {
        spark = new JavaSparkContext(new SparkConf().setMaster("local[2]").setAppName("trailcross test")
                .set("spark.ui.enabled", "false").set("spark.driver.host", "127.0.0.1")
                .set("spark.driver.bindAddress", "127.0.0.1"));
        spark.setLogLevel("WARN");
    }

    @AfterAll
    static void stop() {
        spark.close();
    }

    @Test
    void theClusterRunsFilesAreTheLocalRunsByteForByte() throws IOException {
        Path file = Path.of("streams/lysandre.toml");
        StreamDefinition stream = StreamFileReader.read(file);
        Ephemeris eph = Ephemerides.fast(null);
        // Targeted (three stages), 900 particles: stages of 180, 180 and 540 particles, 1 + 1 + 3 tasks.
        ForecastRun.Settings s = new ForecastRun.Settings(2027, 2027, 1980, 1, false, 900, 7, 2, true);
        ForecastRun.Result local = ForecastRun.run(stream, eph, s, line -> { });
        ForecastRun.Result cluster = ForecastRun.run(stream, eph, s, line -> { }, trailcross.forecast.Progress.NONE, null,
                new SparkEngine(spark, null));
        Path a = dir.resolve("local");
        Path b = dir.resolve("cluster");
        ForecastWriter.write(a, file, local, eph, eph.name(), "test");
        ForecastWriter.write(b, file, cluster, eph, eph.name(), "test");
        for (String f : new String[] {"encounters.csv", "crossings.csv", "radiants.csv"}) {
            assertThat(Files.readAllBytes(b.resolve(f))).as(f).isEqualTo(Files.readAllBytes(a.resolve(f)));
        }
        assertThat(Files.readAllLines(a.resolve("crossings.csv"))).hasSizeGreaterThan(100);
        assertThat(Files.readAllLines(a.resolve("encounters.csv"))).hasSizeGreaterThan(1);
    }

    @Test
    void aTaskRunTwiceGivesTheSameCrossingsAsTheLocalStage() throws IOException {
        // What a lost executor's rerun gives: the same slice again, identical, and identical to the local
        // engine's crossings of the same particles.
        Path file = Path.of("streams/lysandre.toml");
        ReturnRecipe recipe = new ReturnRecipe(file.toString(), Files.readString(file), 2000.0, 1980, 2027, 1993);
        double from = trailcross.forecast.ParentReturns.yearStart(2027) - ForecastRun.EDGE_DAYS;
        double to = trailcross.forecast.ParentReturns.yearStart(2028) + ForecastRun.EDGE_DAYS;
        CloudEngine.Stage stage = new CloudEngine.Stage(recipe, SparkEngine.SLICE + 40, 11, EjectionFocus.PRIOR, 0, null,
                from, to);
        List<NodeCrossing> once = SliceTask.run(stage, null, 1);
        List<NodeCrossing> twice = SliceTask.run(stage, null, 1);
        assertThat(text(twice)).isEqualTo(text(once));
        Ephemeris eph = ExecutorCache.ephemeris(null);
        List<NodeCrossing> local = CloudEngine.LOCAL.run(stage, recipe.generator(eph), eph, 2, d -> { });
        List<NodeCrossing> first = SliceTask.run(stage, null, 0);
        assertThat(text(local)).isEqualTo(text(first) + text(once));
        assertThat(local).isNotEmpty();
    }

    private static String text(List<NodeCrossing> cs) {
        StringBuilder b = new StringBuilder();
        for (NodeCrossing c : cs) {
            b.append(c.id()).append(' ').append(Double.doubleToLongBits(c.t())).append(' ')
                    .append(java.util.Arrays.toString(c.state())).append(' ').append(c.weight()).append('\n');
        }
        return b.toString();
    }
}
