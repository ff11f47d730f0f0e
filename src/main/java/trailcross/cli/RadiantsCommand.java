package trailcross.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.dynamics.Perihelion;
import trailcross.ejection.MeteoroidFile;
import trailcross.encounter.EarthOrbit;
import trailcross.encounter.Encounter;
import trailcross.encounter.NodeCrossing;
import trailcross.encounter.RadiantTable;
import trailcross.encounter.TheoreticalRadiant;
import trailcross.ephemeris.Ephemeris;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.ParentReturns;
import trailcross.forecast.TrailPropagation;
import trailcross.orbit.Elements;
import trailcross.orbit.Moid;
import trailcross.io.AtomicFile;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.EpochParser;

/** {@code trailcross radiants STREAM --year Y}: a radiant table for observers. */
@Command(name = "radiants", mixinStandardHelpOptions = true,
        description = {"A radiant table for observers and planners: one row per day (0h UTC) or per --step with the "
                + "solar longitude, radiant and Vg, and the daily drift. From a meteoroid cloud (--cloud, made by "
                + "'trailcross eject') propagated to the year, or else from the parent's orbit at its last return "
                + "before the year's end (theoretical radiant, node moved with the Earth).",
            "Columns: date_utc, solar_longitude_deg, ra_deg, dec_deg, vg_km_s."})
final class RadiantsCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--year", required = true, paramLabel = "Y", description = "the year of the table")
    int year;

    @Option(names = "--cloud", paramLabel = "FILE", description = "a meteoroid cloud (CSV of 'trailcross eject')")
    Path cloud;

    @Option(names = "--step", defaultValue = "1", paramLabel = "DAYS", description = "row step in days (default 1)")
    double step;

    @Option(names = "--days", defaultValue = "10", paramLabel = "N",
            description = "without --cloud: rows from N/2 days before the peak to N/2 after (default 10)")
    double days;

    @Option(names = "--adjustment", defaultValue = "translation", paramLabel = "NAME",
            description = "without --cloud: translation (default) or omega, for an orbit that misses the Earth's")
    String adjustment;

    @Option(names = "--threads", defaultValue = "2", paramLabel = "N", description = "worker threads (default 2)")
    int threads;

    @Option(names = "--out", paramLabel = "FILE", description = "write the CSV here instead of standard output")
    Path out;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() throws Exception {
        if (!(step > 0) || !(days >= 0) || threads < 1) {
            throw new IllegalArgumentException("--step must be > 0, --days >= 0, --threads >= 1");
        }
        StreamDefinition d = StreamFileReader.read(stream);
        Ephemeris eph = Ephemerides.fast(ephemeris.file);
        double jan1 = ParentReturns.yearStart(year);
        double dec31 = ParentReturns.yearStart(year + 1);
        eph.checkSpan(jan1);
        eph.checkSpan(dec31);
        List<RadiantTable.Row> rows;
        String source;
        if (cloud != null) {
            var particles = MeteoroidFile.read(cloud);
            TrailPropagation.Result r = TrailPropagation.run(particles, eph, jan1, dec31, threads, null);
            List<Encounter> enc = new ArrayList<>();
            for (NodeCrossing c : r.crossings()) {
                enc.add(Encounter.of(c, eph));
            }
            if (enc.isEmpty()) {
                throw new IllegalArgumentException(cloud + ": none of its " + particles.size()
                        + " particles crosses the Earth's orbital plane between 0.9 and 1.1 au in " + year);
            }
            rows = RadiantTable.fromEncounters(enc, eph, step);
            source = r.crossings().size() + " crossings of " + particles.size() + " particles";
        } else {
            TheoreticalRadiant.Adjustment adj = TheoreticalRadiant.Adjustment.ofOption(adjustment);
            Elements orbit = orbitBefore(d, eph, year, dec31);
            Elements earth = EarthOrbit.at(eph, 0.5 * (jan1 + dec31));
            Moid.Minimum branch = Moid.minima(orbit, earth).get(0);
            rows = RadiantTable.fromOrbit(orbit, earth, branch, adj, year, days / 2, step, eph);
            source = String.format(Locale.ROOT, "the parent's orbit (MOID %.5f au, %s adjustment)", branch.distance(),
                    adj.key());
        }
        StringWriter text = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(text, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                .setHeader("date_utc", "solar_longitude_deg", "ra_deg", "dec_deg", "vg_km_s").build())) {
            for (RadiantTable.Row row : rows) {
                p.printRecord(EpochFormat.utc(Epoch.ofDaysSinceJ2000(row.t()), 0), f(row.solarLongitudeDeg(), 4),
                        f(row.raDeg(), 3), f(row.decDeg(), 3), f(row.vgKmS(), 2));
            }
        }
        String drift = drift(rows) + " (from " + source + ")";
        if (out != null) {
            AtomicFile.write(out, w -> w.write(text.toString()));
            spec.commandLine().getOut().println(drift);
            spec.commandLine().getOut().println("wrote " + out);
        } else {
            PrintWriter o = spec.commandLine().getOut();
            o.print(text);
            o.flush();
            spec.commandLine().getErr().println(drift);
        }
        return 0;
    }

    private static Elements orbitBefore(StreamDefinition d, Ephemeris eph, int year, double end) {
        Elements el = d.parent().elements();
        double epoch = d.parent().epoch().daysSinceJ2000();
        if (el.e() >= 1 || Math.abs(end - epoch) < el.period()) {
            return el;
        }
        int back = (int) Math.ceil(el.period() / 365.25) + 1;
        ParentReturns.Result r = ParentReturns.compute(d.parent(), eph, year - back, year);
        Elements best = el;
        for (Perihelion p : r.returns()) {
            if (p.t() < end) {
                best = p.elements();
            }
        }
        return best;
    }

    private static String drift(List<RadiantTable.Row> rows) {
        if (rows.size() < 2) {
            return "daily drift: one row only";
        }
        RadiantTable.Row a = rows.get(0);
        RadiantTable.Row b = rows.get(rows.size() - 1);
        double dt = b.t() - a.t();
        double dra = Math.IEEEremainder(b.raDeg() - a.raDeg(), 360);
        return String.format(Locale.ROOT, "daily drift: RA %+.3f deg/day, Dec %+.3f deg/day", dra / dt,
                (b.decDeg() - a.decDeg()) / dt);
    }

    private static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
