package trailcross.cli;

import java.io.PrintWriter;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import trailcross.cluster.SparkEngine;

/**
 * The Apache Spark entry point: {@code spark-submit --class trailcross.cli.ClusterMain target/trailcross.jar
 * forecast STREAM --year Y ...} takes the local forecast command line and runs each return's
 * sampling stages as Spark tasks ({@link SparkEngine}); everything else, and every file written, is the local
 * run's. The master comes from spark-submit ({@code --master}); without one, {@code local[*]}.
 */
public final class ClusterMain {

    private ClusterMain() {
    }

    /**
     * @param args the trailcross command line
     */
    public static void main(String[] args) {
        System.exit(run(args, new SparkConf(), new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /**
     * @param args the command line
     * @param conf the Spark configuration (its master, or local[*])
     * @param out standard output
     * @param err standard error
     * @return the exit code
     */
    static int run(String[] args, SparkConf conf, PrintWriter out, PrintWriter err) {
        if (!conf.contains("spark.master")) {
            conf.setMaster("local[*]");
        }
        conf.setIfMissing("spark.app.name", "trailcross " + String.join(" ", args));
        try (JavaSparkContext spark = new JavaSparkContext(conf)) {
            spark.setLogLevel("WARN");
            ForecastCommand.engines = file -> new SparkEngine(spark, file);
            try {
                return Main.execute(args, out, err);
            } finally {
                ForecastCommand.engines = ForecastCommand.LOCAL_ENGINE;
            }
        }
    }
}
