package trailcross.cluster;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.LongConsumer;
import java.util.stream.IntStream;
import org.apache.spark.api.java.JavaSparkContext;
import trailcross.ejection.ParticleGenerator;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.CloudEngine;

/**
 * The forecast's sampling stages on an Apache Spark cluster: a stage of one return becomes one task per
 * slice of {@value #SLICE} particles (Spark's RDD API: the tasks are opaque Java functions of a slice index,
 * and {@code collect} returns the slices in order, which is all the forecast needs; the Dataset API's
 * schemas and query planning have nothing to work on here). Each task ({@link SliceTask}) rebuilds the
 * return's generator from the stage's recipe (cached per executor JVM, as is the ephemeris,
 * {@link ExecutorCache}), ejects its slice, propagates it with the full force model on one thread and
 * returns only its crossings. The driver keeps everything else of the forecast (parent history, learning
 * the proposals, weights, aggregation, files), so the cluster run's tables are the local run's byte for byte.
 * A lost task that Spark runs again gives the same crossings (tested).
 */
public final class SparkEngine implements CloudEngine {

    /** Particles per task. */
    public static final int SLICE = 256;

    private final JavaSparkContext spark;
    private final String ephemerisFile;
    private long tasks;
    private long taskNanos;
    private long particles;

    /**
     * @param spark the Spark context
     * @param ephemerisFile the JPL DE file every executor can read at the same path, or null for the embedded
     *     ephemeris
     */
    public SparkEngine(JavaSparkContext spark, Path ephemerisFile) {
        this.spark = spark;
        this.ephemerisFile = ephemerisFile == null ? null : ephemerisFile.toAbsolutePath().toString();
    }

    /**
     * What the tasks cost so far (for the benchmark's estimate of a large run).
     *
     * @param tasks tasks run
     * @param taskSeconds their summed wall time in the executors
     * @param particles particles they ejected and propagated
     */
    public record Stats(long tasks, double taskSeconds, long particles) {
    }

    /** @return the tasks' cost so far */
    public synchronized Stats stats() {
        return new Stats(tasks, taskNanos / 1e9, particles);
    }

    @Override
    public synchronized List<NodeCrossing> run(Stage stage, ParticleGenerator gen, Ephemeris ephemeris, int threads,
            LongConsumer progress) {
        int slices = (stage.n() + SLICE - 1) / SLICE;
        List<Integer> index = IntStream.range(0, slices).boxed().toList();
        String file = ephemerisFile;
        List<SliceTask.Result> parts = spark.parallelize(index, slices).map(i -> SliceTask.timed(stage, file, i))
                .collect();
        List<NodeCrossing> out = new ArrayList<>();
        for (SliceTask.Result p : parts) {
            out.addAll(p.crossings());
            tasks++;
            taskNanos += p.nanos();
            particles += p.particles();
        }
        progress.accept(stage.n());
        return out;
    }
}
