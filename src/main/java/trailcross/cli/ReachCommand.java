package trailcross.cli;

import java.io.IOException;
import java.io.PrintWriter;
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
import trailcross.encounter.EarthOrbit;
import trailcross.encounter.GeocentricRadiant;
import trailcross.forecast.Reachability;
import trailcross.encounter.TheoreticalRadiant;
import trailcross.ephemeris.Ephemeris;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.ParentReturns;
import trailcross.io.AtomicFile;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.TimeScale;

/** {@code trailcross reach STREAM}: can the stream's meteoroids reach the Earth at all. */
@Command(name = "reach", mixinStandardHelpOptions = true,
        description = {"Can a stream reach the Earth at all: the parent's MOID to the Earth's orbit at its osculating "
                + "epoch and at each past return (back-integrated), every branch (local minimum of the distance "
                + "between the orbits) with its node distance, theoretical radiant, Vg and solar longitude, and the "
                + "least ejection speed from the active arc that closes it.",
            "CSV columns (--csv): epoch_tdb, moid_au, node, node_distance_au, solar_longitude_deg, ra_deg, dec_deg, "
                + "vg_km_s, min_ejection_m_s."})
final class ReachCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--since", paramLabel = "YEAR",
            description = "examine the returns since this year (default: 100 years before the epoch)")
    Integer since;

    @Option(names = "--adjustment", defaultValue = "translation", paramLabel = "NAME",
            description = "how an orbit that misses the Earth's is moved onto it for its radiant: translation "
                    + "(default) or omega")
    String adjustment;

    @Option(names = "--csv", paramLabel = "FILE", description = "also write the rows as CSV")
    Path csv;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() throws IOException {
        TheoreticalRadiant.Adjustment adj = TheoreticalRadiant.Adjustment.ofOption(adjustment);
        StreamDefinition d = StreamFileReader.read(stream);
        Ephemeris eph = Ephemerides.fast(ephemeris.file);
        double epoch = d.parent().epoch().daysSinceJ2000();
        int epochYear = ParentReturns.yearOf(epoch);
        int from = since != null ? since : epochYear - 100;
        if (from > epochYear) {
            throw new IllegalArgumentException("--since " + from + " is after the parent's epoch (" + epochYear + ")");
        }
        double in = d.ejection().activeInboundAu();
        double out = d.ejection().activeOutboundAu();
        List<Reachability> rows = new ArrayList<>();
        rows.add(Reachability.of(epoch, "epoch", d.parent().elements(), EarthOrbit.at(eph, epoch), in, out, adj));
        // An unbound parent passes once: its osculating orbit is the only one to examine.
        if (from < epochYear && d.parent().elements().e() < 1) {
            ParentReturns.Result r = ParentReturns.compute(d.parent(), eph, from, epochYear);
            for (Perihelion p : r.returns()) {
                if (p.t() < epoch) {
                    rows.add(Reachability.of(p.t(), "return", p.elements(), EarthOrbit.at(eph, p.t()), in, out, adj));
                }
            }
        }
        PrintWriter o = spec.commandLine().getOut();
        o.printf(Locale.ROOT, "%s: reach of the Earth (%s adjustment for radiants of missing orbits)%n",
                d.parent().name(), adj.key());
        o.printf(Locale.ROOT, "%-20s %-7s %10s %-10s %9s %8s %8s %8s %7s %10s%n", "epoch (TDB)", "", "dist au", "node",
                "node au", "sol.long", "RA", "Dec", "Vg", "least dv");
        List<List<String>> csvRows = new ArrayList<>();
        for (Reachability r : rows) {
            String when = EpochFormat.iso(Epoch.ofDaysSinceJ2000(r.t()), TimeScale.TDB, 0);
            o.printf(Locale.ROOT, "%-20s %-7s MOID %.6f au%n", when, r.label(), r.moidAu());
            for (Reachability.Branch b : r.branches()) {
                GeocentricRadiant g = b.radiant().radiant();
                String node = b.radiant().ascending() ? "ascending" : "descending";
                String dv = Double.isNaN(b.leastEjectionMs()) ? "> " + (int) trailcross.forecast.EjectionReach.MAX_SPEED_M_S
                        : String.format(Locale.ROOT, "%.1f", b.leastEjectionMs());
                o.printf(Locale.ROOT, "%-20s %-7s %10.6f %-10s %9.4f %8.3f %8.2f %+8.2f %7.2f %10s%n", "", "",
                        b.radiant().minimum().distance(), node, b.radiant().nodeDistanceAu(), g.solarLongitudeDeg(),
                        g.raDeg(), g.decDeg(), g.vgKmS(), dv + " m/s");
                csvRows.add(List.of(when, f(b.radiant().minimum().distance(), 8), node,
                        f(b.radiant().nodeDistanceAu(), 6), f(g.solarLongitudeDeg(), 4), f(g.raDeg(), 3),
                        f(g.decDeg(), 3), f(g.vgKmS(), 3),
                        Double.isNaN(b.leastEjectionMs()) ? "" : f(b.leastEjectionMs(), 2)));
            }
        }
        o.println("least dv: the smallest ejection speed from the active arc (inside " + in + " au inbound, " + out
                + " au outbound) that puts a meteoroid (beta = 0) on an orbit meeting the Earth's on that branch.");
        o.println("Model estimates with stated uncertainties; operational decisions rest with the responsible "
                + "agencies' own assessments.");
        if (csv != null) {
            AtomicFile.write(csv, w -> {
                try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                        .setHeader("epoch_tdb", "moid_au", "node", "node_distance_au", "solar_longitude_deg", "ra_deg",
                                "dec_deg", "vg_km_s", "min_ejection_m_s").build())) {
                    for (List<String> row : csvRows) {
                        p.printRecord(row);
                    }
                }
            });
            o.println("wrote " + csv);
        }
        return 0;
    }

    private static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
