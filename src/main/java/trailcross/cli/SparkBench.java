package trailcross.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import trailcross.cluster.SparkEngine;
import trailcross.ephemeris.Ephemerides;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.ForecastBenchmark;

/**
 * {@code bench forecast --spark MASTER}: the Leonids 1999 forecast on this machine's threads and on Spark
 * (the same particles) in one run, both walls and their ratio, and from the measured time per task an
 * estimate of a large run's wall on a cluster. Kept apart from {@link BenchCommand} so that the command line
 * loads no Spark class unless asked.
 */
final class SparkBench {

    /** The large run estimated: particles per return, returns, executor cores. */
    static final long BIG_PARTICLES = 1_000_000;
    static final int BIG_RETURNS = 12;
    static final int BIG_CORES = 100;

    private SparkBench() {
    }

    /**
     * @param out where to print
     * @param master the Spark master (e.g. local[2])
     * @param particles particles per return
     * @param threads the threaded run's threads
     */
    static void run(PrintWriter out, String master, int particles, int threads) {
        Ephemeris eph = Ephemerides.fast(null);
        out.printf(Locale.ROOT, "forecast on Spark: the 1999 Leonids (55P since 1890, %d particles per return), threads=%d "
                + "against Spark %s%n", particles, threads, master);
        out.flush();
        ForecastBenchmark.measure("leonids-1999", 60, 1, eph);
        ForecastBenchmark.Figure local = ForecastBenchmark.measure("leonids-1999", particles, threads, eph);
        SparkConf conf = new SparkConf().setMaster(master).setAppName("trailcross bench").set("spark.ui.enabled", "false");
        try (JavaSparkContext spark = new JavaSparkContext(conf)) {
            spark.setLogLevel("WARN");
            // A small run first builds the executors' ephemeris cache and generators' code paths.
            ForecastBenchmark.measure("leonids-1999", 60, 1, eph, new SparkEngine(spark, null));
            SparkEngine engine = new SparkEngine(spark, null);
            ForecastBenchmark.Figure cluster = ForecastBenchmark.measure("leonids-1999", particles, threads, eph, engine);
            SparkEngine.Stats st = engine.stats();
            double perTask = st.taskSeconds() / st.tasks();
            double perParticle = st.taskSeconds() / st.particles();
            long bigTasks = BIG_RETURNS * ((BIG_PARTICLES + SparkEngine.SLICE - 1) / SparkEngine.SLICE);
            double bigWall = BIG_RETURNS * BIG_PARTICLES * perParticle / BIG_CORES;
            out.printf(Locale.ROOT, "%-10s %9s %10s%n", "run", "wall s", "ratio");
            out.printf(Locale.ROOT, "%-10s %9.1f %10s%n", "threads", local.wallSeconds(), "1.00");
            out.printf(Locale.ROOT, "%-10s %9.1f %10.2f   (%d tasks of %d particles, %.2f s each)%n", "spark",
                    cluster.wallSeconds(), cluster.wallSeconds() / local.wallSeconds(), st.tasks(), SparkEngine.SLICE,
                    perTask);
            out.printf(Locale.ROOT, "estimate: %d particles x %d returns of the same ages = %d tasks; on %d executor cores "
                    + "about %.0f min of tasks (+ the driver's serial part)%n", BIG_PARTICLES, BIG_RETURNS, bigTasks,
                    BIG_CORES, bigWall / 60);
            out.printf(Locale.ROOT, "bench forecast threaded-leonids-1999 threads=%d particles=%d wall_s=%.1f%n", threads,
                    local.particles(), local.wallSeconds());
            out.printf(Locale.ROOT, "bench forecast spark-leonids-1999 master=%s particles=%d wall_s=%.1f ratio_vs_threaded=%.2f "
                    + "tasks=%d task_s=%.3f%n", master, cluster.particles(), cluster.wallSeconds(),
                    cluster.wallSeconds() / local.wallSeconds(), st.tasks(), perTask);
            out.printf(Locale.ROOT, "bench forecast spark-estimate particles=%d returns=%d cores=%d tasks=%d wall_min=%.0f%n",
                    BIG_PARTICLES, BIG_RETURNS, BIG_CORES, bigTasks, bigWall / 60);
            out.flush();
        }
    }
}
