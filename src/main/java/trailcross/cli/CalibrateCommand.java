package trailcross.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.ephemeris.Ephemeris;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.Calibration;
import trailcross.forecast.ForecastRun;
import trailcross.io.AtomicFile;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;

/** {@code trailcross calibrate STREAM --year Y --trail R --zhr Z}: the dust production fitted on one outburst. */
@Command(name = "calibrate", mixinStandardHelpOptions = true,
        description = {"Fits the stream's dust production so that one trail's computed ZHR in a past year equals the "
                + "observed ZHR (the forecast is run as by 'forecast'; the ZHR is proportional to the production).",
            "Prints dust_production_kg_s = X; --out FILE writes a copy of the stream file with that value."})
final class CalibrateCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--year", required = true, paramLabel = "Y", description = "the year of the observed outburst")
    int year;

    @Option(names = "--trail", required = true, paramLabel = "RETURN_YEAR", description = "the trail observed (its return year)")
    int trail;

    @Option(names = "--zhr", required = true, paramLabel = "Z", description = "the observed peak ZHR")
    double zhr;

    @Option(names = "--out", paramLabel = "FILE", description = "write the stream file with the fitted value here")
    Path out;

    @Option(names = "--since", paramLabel = "YEAR", description = "examine every return since this year")
    Integer since;

    @Option(names = "--returns", paramLabel = "N", description = "the most recent N returns")
    Integer returns;

    @Option(names = "--particles", defaultValue = "" + ForecastCommand.DEFAULT_PARTICLES, paramLabel = "N",
            description = "particles per return (default " + ForecastCommand.DEFAULT_PARTICLES + ")")
    int particles;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "S", description = "random seed (default 1)")
    long seed;

    @Option(names = "--threads", defaultValue = "2", paramLabel = "N", description = "worker threads (default 2)")
    int threads;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() {
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be >= 1, got " + threads);
        }
        if (since != null && returns != null) {
            throw new IllegalArgumentException("give --since or --returns, not both");
        }
        if (out != null && Files.isDirectory(out)) {
            throw new IllegalArgumentException("--out " + out + ": is a folder, not a file");
        }
        StreamDefinition d = StreamFileReader.read(stream);
        Ephemeris eph = Ephemerides.fast(ephemeris.file);
        PrintWriter o = spec.commandLine().getOut();
        int from = since != null ? since : Math.max(1001, year - ForecastCommand.DEFAULT_SPAN_YEARS);
        int max = since != null ? 0 : returns != null ? returns : ForecastCommand.DEFAULT_RETURNS;
        ForecastRun.Settings s = new ForecastRun.Settings(year, year, from, max, since == null && returns == null,
                particles, seed, threads, true);
        Calibration c = Calibration.fit(d, eph, s, trail, zhr, line -> {
            o.println(line);
            o.flush();
        });
        o.printf(Locale.ROOT, "trail %d in %d: computed ZHR %.4g +- %.2g at %.4g kg/s; observed %.4g%n", trail, year,
                c.computedZhr(), c.computedSigma(), c.runDustKgS(), zhr);
        o.printf(Locale.ROOT, "dust_production_kg_s = %.9g%n", c.dustKgS());
        o.printf(Locale.ROOT, "(statistical uncertainty %.2g kg/s, %.0f%%)%n", c.sigmaKgS(), 100 * c.sigmaKgS() / c.dustKgS());
        if (out != null) {
            String text;
            try {
                text = Files.readString(stream);
            } catch (IOException e) {
                throw new UncheckedIOException(stream + ": " + e.getMessage(), e);
            }
            String calibrated = Calibration.withDustProduction(text, c.dustKgS());
            AtomicFile.write(out, w -> w.write(calibrated));
            StreamFileReader.read(out);
            o.println("wrote " + out);
        }
        return 0;
    }
}
