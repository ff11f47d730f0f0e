package trailcross.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.encounter.ApproachTarget;
import trailcross.encounter.BodyTarget;
import trailcross.encounter.LagrangePoint;
import trailcross.encounter.TrackTarget;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemerides;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.ApproachRun;
import trailcross.report.ApproachReport;
import trailcross.report.ApproachWriter;
import trailcross.report.ForecastWriter;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.EpochParser;

/** {@code trailcross approach STREAM --target T --from TIME --to TIME}: can the debris reach a target at all. */
@Command(name = "approach", mixinStandardHelpOptions = true,
        description = {"A cloud's approach in space and time to a target: ejects the parent's cloud (the single passage "
                + "of an unbound parent, or chosen returns), propagates it with the planets over the span and finds "
                + "every particle's closest approach, relative speed, radiant and capture; the share of the cloud "
                + "within chosen distances, the fluence profile at the target and the parent's own approach.",
            "Writes DIR/approaches.csv, profile.csv, summary.json and plots; prints the answer."})
final class ApproachCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--target", defaultValue = "earth", paramLabel = "T",
            description = "earth (default), a body of the ephemeris (mercury … neptune, moon), l1 or l2 (Sun-Earth), "
                    + "or a track CSV file with the ephemeris command's columns")
    String target;

    @Option(names = "--from", required = true, paramLabel = "TIME", description = "the span's start (with its scale)")
    String from;

    @Option(names = "--to", required = true, paramLabel = "TIME", description = "the span's end")
    String to;

    @Option(names = "--return", paramLabel = "YEAR", split = ",",
            description = "the returns to eject at (default: the last one before --to; an unbound parent's passage)")
    List<Integer> returnYears = new ArrayList<>();

    @Option(names = "--since", paramLabel = "YEAR", description = "eject at every return since this year")
    Integer since;

    @Option(names = "--particles", defaultValue = "" + ApproachRun.DEFAULT_PARTICLES, paramLabel = "N",
            description = "particles per return (default " + ApproachRun.DEFAULT_PARTICLES + ")")
    int particles;

    @Option(names = "--sampling", defaultValue = "targeted", paramLabel = "targeted|plain",
            description = "targeted: for a bound parent, a pilot cloud, then one concentrated on the periods that come "
                    + "near the target, importance-weighted (default); plain: the ejection law alone")
    String sampling;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "S", description = "random seed (default 1)")
    long seed;

    @Option(names = "--threads", defaultValue = "2", paramLabel = "N", description = "worker threads (default 2)")
    int threads;

    @Option(names = "--within", split = ",", paramLabel = "AU",
            description = "distances to report, au (default 0.001,0.01,0.05)")
    double[] within = ApproachRun.DEFAULT_WITHIN_AU.clone();

    @Option(names = "--atmosphere-km", defaultValue = "" + ApproachRun.DEFAULT_ATMOSPHERE_KM, paramLabel = "KM",
            description = "height above a planet's radius inside which a meteoroid is captured (default 100)")
    double atmosphereKm;

    @Option(names = "--capture-radius-km", defaultValue = "0", paramLabel = "KM",
            description = "capture radius of l1, l2 or a track (default 0: none)")
    double captureRadiusKm;

    @Option(names = "--min-mass-kg", paramLabel = "KG",
            description = "count meteoroids above this mass in the fluence (default: brighter than +6.5 mag for the "
                    + "Earth, all sizes for other targets)")
    Double minMassKg;

    @Option(names = "--out", paramLabel = "DIR",
            description = "output folder (default out/<stream file name>-approach-<target>)")
    Path out;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() {
        StreamDefinition d = StreamFileReader.read(stream);
        Ephemeris eph = Ephemerides.fast(ephemeris.file);
        ApproachTarget t = target(target, eph);
        if (since != null && !returnYears.isEmpty()) {
            throw new IllegalArgumentException("give --since or --return, not both");
        }
        double t0 = parse("--from", from);
        double t1 = parse("--to", to);
        if (!sampling.equals("targeted") && !sampling.equals("plain")) {
            throw new IllegalArgumentException("--sampling: '" + sampling + "' is not targeted or plain");
        }
        if (within.length == 0) {
            throw new IllegalArgumentException("--within: give at least one distance");
        }
        String name = stream.getFileName().toString().replaceFirst("\\.toml$", "");
        String tname = t instanceof TrackTarget ? Path.of(target).getFileName().toString().replaceFirst("\\.csv$", "")
                : t.name();
        Path dir = out != null ? out : Path.of("out", name + "-approach-" + tname);
        trailcross.io.OutputFolder.check(dir, "--out");
        ApproachRun.Settings s = new ApproachRun.Settings(List.copyOf(returnYears), since, t0, t1, particles, seed, threads,
                atmosphereKm, captureRadiusKm, within, minMassKg == null ? Double.NaN : minMassKg, sampling.equals("targeted"));
        PrintWriter o = spec.commandLine().getOut();
        ApproachRun.Result r = ApproachRun.run(d, eph, t, s, line -> {
            o.println(line);
            o.flush();
        }, null);
        List<Path> files = ApproachWriter.write(dir, stream, r, eph.name(), new Version().getVersion()[0]);
        o.println();
        ApproachReport.print(o, r);
        o.println(ForecastWriter.CAUTION);
        o.printf(Locale.ROOT, "wrote %s (%.0f s)%n", String.join(", ", files.stream().map(Path::toString).toList()),
                r.seconds());
        return 0;
    }

    /**
     * @param text the --target value
     * @param eph the planets
     * @return the target
     */
    static ApproachTarget target(String text, Ephemeris eph) {
        String k = text.trim().toLowerCase(Locale.ROOT);
        if (k.equals("l1") || k.equals("l2")) {
            return new LagrangePoint(eph, k.equals("l1") ? 1 : 2);
        }
        var body = Body.of(k);
        if (body.isPresent()) {
            return new BodyTarget(eph, body.get());
        }
        Path p = Path.of(text);
        if (k.endsWith(".csv") || Files.exists(p)) {
            if (!Files.isRegularFile(p)) {
                throw new IllegalArgumentException("--target " + text + ": no such track file");
            }
            return TrackTarget.read(p);
        }
        throw new IllegalArgumentException("--target: unknown target '" + text + "' (earth, " + Body.names()
                + ", l1, l2, or a track .csv file)");
    }

    private static double parse(String option, String text) {
        try {
            return EpochParser.parse(text).daysSinceJ2000();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": " + e.getMessage(), e);
        }
    }
}
