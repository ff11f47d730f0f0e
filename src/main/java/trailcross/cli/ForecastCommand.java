package trailcross.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.encounter.TrailEncounter;
import trailcross.ephemeris.Ephemeris;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.ForecastRun;
import trailcross.report.ForecastWriter;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;

/** {@code trailcross forecast STREAM --year Y}: the whole job. */
@Command(name = "forecast", mixinStandardHelpOptions = true,
        description = {"The whole job for a year: the parent's returns, a meteoroid cloud per return, its propagation "
                + "with the planets to the year, node crossings near the Earth's orbit, and per trail the peak time "
                + "(UTC) and solar longitude, delta r, radiant, Vg, FWHM, fM and ZHR.",
            "Writes DIR/encounters.csv, crossings.csv, radiants.csv, summary.json; prints a table sorted by strength."})
final class ForecastCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--year", required = true, paramLabel = "Y|A..B",
            description = "the forecast year, or a span of years A..B (one table with a year column)")
    String yearText;

    int year;

    @Option(names = "--since", paramLabel = "YEAR",
            description = "examine every return since this year (default: the last " + DEFAULT_RETURNS + " returns in "
                    + DEFAULT_SPAN_YEARS + " years whose orbit passes within 0.05 au of the Earth's)")
    Integer since;

    @Option(names = "--returns", paramLabel = "N", description = "the most recent N returns (no screening)")
    Integer returns;

    static final int DEFAULT_RETURNS = 4;
    static final int DEFAULT_SPAN_YEARS = 250;

    /** Default particles per return. */
    static final int DEFAULT_PARTICLES = ForecastRun.DEFAULT_PARTICLES;

    @Option(names = "--particles", defaultValue = "" + DEFAULT_PARTICLES, paramLabel = "N",
            description = "particles per return, over all sampling stages (default " + DEFAULT_PARTICLES + ")")
    int particles;

    @Option(names = "--sampling", defaultValue = "targeted", paramLabel = "targeted|plain",
            description = "targeted: a pilot cloud, then clouds concentrated where particles meet the Earth, "
                    + "importance-weighted (default); plain: the ejection law alone")
    String sampling;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "S", description = "random seed (default 1)")
    long seed;

    @Option(names = "--threads", defaultValue = "2", paramLabel = "N", description = "worker threads (default 2)")
    int threads;

    @Option(names = "--out", paramLabel = "DIR", description = "output folder (default out/<stream file name>-<year>)")
    Path out;

    @Option(names = "--resume", description = "continue a run of the same settings in --out after a crash")
    boolean resume;

    @Mixin
    EphemerisOption ephemeris;

    /** Where the sampling stages run: on this machine's threads, unless the cluster entry point says otherwise. */
    static final java.util.function.Function<Path, trailcross.forecast.CloudEngine> LOCAL_ENGINE =
            file -> trailcross.forecast.CloudEngine.LOCAL;
    /** The engine for an ephemeris file (set by {@link ClusterMain}). */
    static volatile java.util.function.Function<Path, trailcross.forecast.CloudEngine> engines = LOCAL_ENGINE;

    /** A console progress bar (on standard error, so that standard output stays the table). */
    private static trailcross.forecast.Progress.Stage bar(String label, long total) {
        me.tongfei.progressbar.ProgressBar pb = new me.tongfei.progressbar.ProgressBarBuilder().setTaskName(label)
                .setInitialMax(total).setStyle(me.tongfei.progressbar.ProgressBarStyle.ASCII).setUnit(" particles", 1)
                .setConsumer(new me.tongfei.progressbar.ConsoleProgressBarConsumer(System.err)).build();
        return new trailcross.forecast.Progress.Stage() {
            @Override
            public void accept(long done) {
                pb.stepTo(done);
            }

            @Override
            public void close() {
                pb.close();
            }
        };
    }

    /**
     * @param text "Y" or "A..B"
     * @return the first and last year
     */
    static int[] years(String text) {
        String t = text.trim();
        try {
            int k = t.indexOf("..");
            if (k < 0) {
                int y = Integer.parseInt(t);
                return new int[] {y, y};
            }
            return new int[] {Integer.parseInt(t.substring(0, k).trim()), Integer.parseInt(t.substring(k + 2).trim())};
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--year: '" + text + "' is not a year or a span A..B");
        }
    }

    @Override
    public Integer call() {
        int[] span = years(yearText);
        year = span[0];
        if (span[1] < span[0]) {
            throw new IllegalArgumentException("--year " + yearText + ": the span is reversed");
        }
        if (!sampling.equals("targeted") && !sampling.equals("plain")) {
            throw new IllegalArgumentException("--sampling: '" + sampling + "' is not targeted or plain");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be >= 1, got " + threads);
        }
        StreamDefinition d = StreamFileReader.read(stream);
        Ephemeris eph = Ephemerides.fast(ephemeris.file);
        PrintWriter o = spec.commandLine().getOut();
        if (since != null && returns != null) {
            throw new IllegalArgumentException("give --since or --returns, not both");
        }
        if (returns != null && returns < 1) {
            throw new IllegalArgumentException("--returns must be >= 1, got " + returns);
        }
        int from = since != null ? since : Math.max(1001, year - DEFAULT_SPAN_YEARS);
        int max = since != null ? 0 : returns != null ? returns : DEFAULT_RETURNS;
        boolean screen = since == null && returns == null;
        String name = stream.getFileName().toString().replaceFirst("\\.toml$", "");
        Path dir = out != null ? out : Path.of("out", name + "-" + (span[1] > span[0] ? span[0] + "-" + span[1] : "" + year));
        ForecastRun.Settings settings = new ForecastRun.Settings(span[0], span[1], from, max, screen, particles, seed,
                threads, sampling.equals("targeted"));
        trailcross.io.OutputFolder.check(dir, "--out");
        String fingerprint;
        try {
            fingerprint = "settings " + settings.firstYear() + ".." + settings.lastYear() + " " + settings.targeted()
                    + " " + settings.sinceYear() + " " + settings.maxReturns() + " "
                    + settings.screen() + " " + settings.particles() + " " + settings.seed() + " ephemeris " + eph.name()
                    + "\n" + java.nio.file.Files.readString(stream);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        trailcross.forecast.TrailCheckpoint checkpoint = new trailcross.forecast.TrailCheckpoint(dir, fingerprint, resume);
        ForecastRun.Result r = ForecastRun.run(d, eph, settings,
                line -> {
                    o.println(line);
                    o.flush();
                }, System.console() != null ? ForecastCommand::bar : trailcross.forecast.Progress.NONE, checkpoint,
                engines.apply(ephemeris.file));
        List<Path> files = ForecastWriter.write(dir, stream, r, eph, eph.name(), new Version().getVersion()[0]);
        o.println();
        trailcross.report.ForecastTable.print(o, d.name(), r);
        o.println(ForecastWriter.CAUTION);
        o.printf(Locale.ROOT, "wrote %s (%.0f s)%n", String.join(", ", files.stream().map(Path::toString).toList()), r.seconds());
        return 0;
    }
}
