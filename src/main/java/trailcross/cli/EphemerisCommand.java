package trailcross.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemerides;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.EclipticFrame;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.EpochParser;
import trailcross.time.TimeScale;

/** {@code trailcross ephemeris BODY --at TIME | --from T --to T --step DAYS}: states as CSV on stdout. */
@Command(name = "ephemeris", mixinStandardHelpOptions = true,
        description = {"A body's heliocentric state, ecliptic J2000 (au, au/day), as CSV on stdout.",
            "Columns: time_tdb, x_au, y_au, z_au, vx_au_d, vy_au_d, vz_au_d."})
final class EphemerisCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "BODY", description = "one of: sun, mercury, venus, earth, moon, emb, "
            + "mars, jupiter, saturn, uranus, neptune")
    String bodyName;

    @ArgGroup(exclusive = true, multiplicity = "1")
    When when;

    static final class When {
        @Option(names = "--at", paramLabel = "TIME", description = "one instant (with its scale)")
        String at;

        @ArgGroup(exclusive = false)
        Range range;
    }

    static final class Range {
        @Option(names = "--from", required = true, paramLabel = "TIME", description = "first instant of a table")
        String from;

        @Option(names = "--to", required = true, paramLabel = "TIME", description = "last instant of a table")
        String to;

        @Option(names = "--step", required = true, paramLabel = "DAYS", description = "table step in days (TDB)")
        double stepDays;
    }

    @Option(names = "--frame", defaultValue = "ecliptic", paramLabel = "FRAME",
            description = "ecliptic (J2000, default) or equatorial (J2000 = ICRF)")
    String frame;

    @Option(names = "--barycentric", description = "barycentric instead of heliocentric")
    boolean barycentric;

    @Mixin
    EphemerisOption ephemeris;

    /** The most rows one table may have. */
    private static final long MAX_ROWS = 1_000_000;

    @Override
    public Integer call() throws IOException {
        Body body = Body.of(bodyName).orElseThrow(() -> new IllegalArgumentException(
                "unknown body '" + bodyName + "' (known: " + Body.names() + ")"));
        boolean equatorial = switch (frame.toLowerCase(Locale.ROOT)) {
            case "ecliptic" -> false;
            case "equatorial" -> true;
            default -> throw new IllegalArgumentException("--frame: unknown frame '" + frame + "' (ecliptic, equatorial)");
        };
        Epoch first;
        Epoch last;
        double step;
        if (when.at != null) {
            first = parse("--at", when.at);
            last = first;
            step = 1;
        } else {
            first = parse("--from", when.range.from);
            last = parse("--to", when.range.to);
            step = when.range.stepDays;
            if (!(step > 0)) {
                throw new IllegalArgumentException("--step must be a positive number of days, got " + step);
            }
            if (last.compareTo(first) < 0) {
                throw new IllegalArgumentException("--to is before --from");
            }
            if (last.daysFrom(first) / step > MAX_ROWS) {
                throw new IllegalArgumentException("--step gives more than " + MAX_ROWS + " rows");
            }
        }
        Ephemeris eph = Ephemerides.exact(ephemeris.file);
        long rows = (long) Math.floor(last.daysFrom(first) / step + 1e-9) + 1;
        // Check the span before writing anything, so that a bad range leaves no half table.
        eph.checkSpan(first.daysSinceJ2000());
        eph.checkSpan(first.plusDays((rows - 1) * step).daysSinceJ2000());
        PrintWriter out = spec.commandLine().getOut();
        CSVFormat format = CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                .setHeader("time_tdb", "x_au", "y_au", "z_au", "vx_au_d", "vy_au_d", "vz_au_d").build();
        try (CSVPrinter csv = new CSVPrinter(out, format)) {
            double[] s = new double[6];
            for (long k = 0; k < rows; k++) {
                Epoch e = first.plusDays(k * step);
                double t = e.daysSinceJ2000();
                if (barycentric) {
                    eph.barycentric(body, t, s);
                } else {
                    eph.heliocentric(body, t, s);
                }
                if (equatorial) {
                    EclipticFrame.toEquatorial(s, 0);
                    EclipticFrame.toEquatorial(s, 3);
                }
                csv.printRecord(EpochFormat.iso(e, TimeScale.TDB, 3), num(s[0]), num(s[1]), num(s[2]), num(s[3]),
                        num(s[4]), num(s[5]));
            }
        }
        return 0;
    }

    private static Epoch parse(String option, String text) {
        try {
            return EpochParser.parse(text);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": " + e.getMessage(), e);
        }
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.15e", v);
    }
}
