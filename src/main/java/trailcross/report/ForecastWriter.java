package trailcross.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import trailcross.encounter.Encounter;
import trailcross.encounter.RadiantTable;
import trailcross.encounter.TrailEncounter;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.ForecastRun;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;

/**
 * Writes a forecast's tables into its output folder, each file atomically ({@link AtomicFile}):
 * {@code encounters.csv} (one row per trail that meets the Earth, the columns of the design),
 * {@code crossings.csv} (every node crossing: {@code return_year, id, crossing_tdb, earth_utc,
 * solar_longitude_deg, delta_r_au, days_after_earth, node, ra_deg, dec_deg, vg_km_s, weight, mass_kg}),
 * {@code radiants.csv} (the daily radiant table from the crossings near the Earth) and
 * {@code summary.json} (inputs, seed, version, run time, caution), and the plots ({@link ForecastPlots}).
 */
public final class ForecastWriter {

    /** The caution printed with every forecast. */
    public static final String CAUTION = "These are model estimates with stated uncertainties; operational decisions "
            + "rest with the responsible agencies' own assessments.";

    private ForecastWriter() {
    }

    /**
     * @param dir the output folder (created)
     * @param stream the stream file
     * @param r the result
     * @param ephemeris the planets (for the radiant table's dates)
     * @param ephemerisName the ephemeris used, for the summary
     * @param version the program's version
     * @return the files written
     */
    public static List<Path> write(Path dir, Path stream, ForecastRun.Result r, Ephemeris ephemeris,
            String ephemerisName, String version) {
        List<Path> written = new ArrayList<>();
        Path enc = dir.resolve("encounters.csv");
        AtomicFile.write(enc, w -> {
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                    .setHeader("return_year", "revolutions", "peak_utc", "solar_longitude_deg", "delta_r_au", "particles",
                            "ra_deg", "dec_deg", "vg_km_s", "fwhm_h", "zhr").build())) {
                for (ForecastRun.Trail t : r.meetings()) {
                    TrailEncounter m = t.meeting();
                    p.printRecord(t.returnYear(), m.revolutions(), utc(m.peakT()), f(m.solarLongitudeDeg(), 4),
                            f(m.deltaR(), 6), m.particles(), f(m.raDeg(), 2), f(m.decDeg(), 2), f(m.vgKmS(), 2),
                            f(m.fwhmHours(), 2), Double.isNaN(m.zhr()) ? "" : f(m.zhr(), 0));
                }
            }
        });
        written.add(enc);
        Path cr = dir.resolve("crossings.csv");
        List<Encounter> all = new ArrayList<>();
        AtomicFile.write(cr, w -> {
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                    .setHeader("return_year", "id", "crossing_tdb", "earth_utc", "solar_longitude_deg", "delta_r_au",
                            "days_after_earth", "node", "ra_deg", "dec_deg", "vg_km_s", "weight", "mass_kg").build())) {
                for (ForecastRun.Trail t : r.trails()) {
                    for (Encounter e : t.encounters()) {
                        p.printRecord(t.returnYear(), e.crossing().id(),
                                EpochFormat.tdb(Epoch.ofDaysSinceJ2000(e.crossing().t()), 0), utc(e.earthT()),
                                f(e.solarLongitudeDeg(), 5), f(e.deltaR(), 6), f(e.daysAfterEarth(), 3),
                                e.crossing().ascending() ? "ascending" : "descending", f(e.radiant().raDeg(), 3),
                                f(e.radiant().decDeg(), 3), f(e.radiant().vgKmS(), 3),
                                Double.isNaN(e.crossing().weight()) ? "" : String.format(Locale.ROOT, "%.6g", e.crossing().weight()),
                                String.format(Locale.ROOT, "%.6g", e.crossing().massKg()));
                    }
                }
            }
        });
        written.add(cr);
        for (ForecastRun.Trail t : r.trails()) {
            all.addAll(t.encounters());
        }
        Path rad = dir.resolve("radiants.csv");
        List<RadiantTable.Row> rows;
        try {
            rows = RadiantTable.fromEncounters(all, ephemeris, 1.0);
        } catch (IllegalArgumentException none) {
            rows = List.of();
        }
        List<RadiantTable.Row> table = rows;
        AtomicFile.write(rad, w -> {
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                    .setHeader("date_utc", "solar_longitude_deg", "ra_deg", "dec_deg", "vg_km_s").build())) {
                for (RadiantTable.Row row : table) {
                    p.printRecord(utc(row.t()), f(row.solarLongitudeDeg(), 4), f(row.raDeg(), 3), f(row.decDeg(), 3),
                            f(row.vgKmS(), 2));
                }
            }
        });
        written.add(rad);
        written.addAll(ForecastPlots.write(dir, stream.getFileName().toString().replaceFirst("\\.toml$", "") + " "
                + r.settings().year(), r, table));
        Path sum = dir.resolve("summary.json");
        ForecastRun.Settings s = r.settings();
        AtomicFile.write(sum, w -> {
            w.write("{\n");
            w.write("  \"program\": " + json(version) + ",\n");
            w.write("  \"stream\": " + json(stream.toString()) + ",\n");
            w.write("  \"year\": " + s.year() + ",\n");
            w.write("  \"since\": " + s.sinceYear() + ",\n");
            w.write("  \"particles_per_return\": " + s.particles() + ",\n");
            w.write("  \"seed\": " + s.seed() + ",\n");
            w.write("  \"threads\": " + s.threads() + ",\n");
            w.write("  \"ephemeris\": " + json(ephemerisName) + ",\n");
            w.write("  \"returns\": [" + String.join(", ", r.trails().stream().map(t -> Integer.toString(t.returnYear())).toList()) + "],\n");
            w.write("  \"trails_meeting_the_earth\": " + r.meetings().size() + ",\n");
            w.write("  \"run_seconds\": " + f(r.seconds(), 1) + ",\n");
            w.write("  \"caution\": " + json(CAUTION) + "\n");
            w.write("}\n");
        });
        written.add(sum);
        return written;
    }

    private static String json(String s) {
        StringBuilder b = new StringBuilder("\"");
        for (char c : s.toCharArray()) {
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }

    static String utc(double t) {
        return EpochFormat.utc(Epoch.ofDaysSinceJ2000(t), 0);
    }

    private static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
