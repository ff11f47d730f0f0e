package trailcross.report;

import trailcross.io.AtomicFile;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import trailcross.encounter.AxisMeeting;
import trailcross.encounter.Encounter;
import trailcross.encounter.RadiantTable;
import trailcross.encounter.CombinedActivity;
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
        boolean span = r.settings().span();
        AtomicFile.write(enc, w -> {
            List<String> header = new ArrayList<>(List.of("return_year", "revolutions", "peak_utc", "solar_longitude_deg",
                    "delta_r_au", "particles", "ra_deg", "dec_deg", "vg_km_s", "fwhm_h", "zhr", "peak_sigma_min",
                    "axis_peak_utc", "axis_delta_r_au", "fm", "ess", "zhr_sigma", "relative_intensity", "axis_fm",
                    "axis_solar_longitude_deg", "axis_sigma_min", "times_disagree", "delta_r_sigma_au", "fm_sigma"));
            if (span) {
                header.add(0, "year");
            }
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                    .setHeader(header.toArray(String[]::new)).build())) {
                for (ForecastRun.Meeting mt : r.meetings()) {
                    TrailEncounter m = mt.cloud();
                    AxisMeeting.Root a = mt.axis();
                    List<Object> row = new ArrayList<>();
                    if (span) {
                        row.add(mt.year());
                    }
                    row.add(mt.returnYear());
                    if (m != null) {
                        row.addAll(List.of(mt.revolutions(), utc(m.peakT()), f(m.solarLongitudeDeg(), 4), f(m.deltaR(), 6),
                                m.particles(), f(m.raDeg(), 2), f(m.decDeg(), 2), f(m.vgKmS(), 2), f(m.fwhmHours(), 2),
                                r.absolute() ? f(m.zhr(), 0) : "", f(m.peakSigmaMin(), 1)));
                    } else {
                        row.addAll(List.of(mt.revolutions(), utc(a.peakT()), f(a.solarLongitudeDeg(), 4),
                                f(a.deltaR(), 6), 0, "", "", "", "", "", ""));
                    }
                    row.add(a == null ? "" : utc(a.peakT()));
                    row.add(a == null ? "" : f(a.deltaR(), 6));
                    row.add(m == null ? "" : f(m.fM(), 4));
                    row.add(m == null ? "" : f(m.ess(), 1));
                    row.add(m == null || !r.absolute() ? "" : f(m.zhrSigma(), 0));
                    row.add(Double.isNaN(r.relativeIntensity(mt)) ? "" : f(r.relativeIntensity(mt), 4));
                    row.add(a == null ? "" : f(a.fM(), 4));
                    row.add(a == null ? "" : f(a.solarLongitudeDeg(), 4));
                    row.add(a == null ? "" : f(a.sigmaMin(), 1));
                    row.add(mt.timesDisagree());
                    row.add(m == null || Double.isNaN(m.deltaRSigma()) ? "" : f(m.deltaRSigma(), 6));
                    row.add(m == null || Double.isNaN(m.fMSigma()) ? "" : f(m.fMSigma(), 4));
                    p.printRecord(row);
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
            w.write("  \"last_year\": " + s.lastYear() + ",\n");
            w.write("  \"sampling\": " + json(s.targeted() ? "targeted" : "plain") + ",\n");
            w.write("  \"zhr_absolute\": " + r.absolute() + ",\n");
            w.write("  \"trails\": [\n");
            List<String> items = new ArrayList<>();
            for (ForecastRun.Meeting mt : r.meetings()) {
                TrailEncounter m = mt.cloud();
                items.add(String.format(Locale.ROOT, "    {\"year\": %d, \"return_year\": %d, \"ess\": %s, \"peak_utc\": %s, "
                        + "\"peak_sigma_min\": %s, \"delta_r_au\": %s, \"delta_r_sigma_au\": %s, \"axis_peak_utc\": %s, "
                        + "\"axis_delta_r_au\": %s, \"fm\": %s, \"fm_sigma\": %s, \"other_maxima\": [%s]}", mt.year(),
                        mt.returnYear(), m == null ? "null" : f(m.ess(), 1), json(utc(mt.peakT())),
                        m == null ? "null" : f(m.peakSigmaMin(), 1), m == null ? "null" : f(m.deltaR(), 6),
                        m == null || Double.isNaN(m.deltaRSigma()) ? "null" : f(m.deltaRSigma(), 6),
                        mt.axis() == null ? "null" : json(utc(mt.axis().peakT())),
                        mt.axis() == null ? "null" : f(mt.axis().deltaR(), 6), m == null ? "null" : f(m.fM(), 4),
                        m == null || Double.isNaN(m.fMSigma()) ? "null" : f(m.fMSigma(), 4),
                        m == null ? "" : String.join(", ", m.rivalMaxima().stream().map(x -> String.format(Locale.ROOT,
                                "{\"utc\": %s, \"solar_longitude_deg\": %s, \"share_of_peak\": %s}", json(utc(x[0])),
                                f(x[1], 4), f(x[2], 3))).toList())));
            }
            w.write(String.join(",\n", items));
            w.write(items.isEmpty() ? "  ],\n" : "\n  ],\n");
            List<String> together = new ArrayList<>();
            double scale = r.intensityScale();
            for (int y = s.firstYear(); y <= s.lastYear(); y++) {
                for (CombinedActivity c : r.combined(y)) {
                    together.add(String.format(Locale.ROOT, "    {\"year\": %d, \"trails\": %d, \"peak_utc\": %s, "
                            + "\"peak_sigma_min\": %s, \"%s\": %s, \"sigma\": %s, \"shares_at_peak\": [%s], "
                            + "\"other_maxima\": [%s]}", y, c.trails(),
                            json(utc(c.peakT())), f(c.peakSigmaMin(), 1), r.absolute() ? "zhr" : "relative_intensity",
                            f(c.peakValue() * scale, r.absolute() ? 1 : 4), f(c.peakValueSigma() * scale, r.absolute() ? 1 : 4),
                            String.join(", ", c.makers(0).stream().map(x -> String.format(Locale.ROOT,
                                    "{\"return_year\": %d, \"share\": %s}", trailcross.forecast.ParentReturns.yearOf(x[0]),
                                    f(x[1], 3))).toList()),
                            String.join(", ", c.otherMaxima().stream().map(x -> String.format(Locale.ROOT,
                                    "{\"utc\": %s, \"share_of_peak\": %s}", json(utc(x[0])), f(x[1], 3))).toList())));
                }
            }
            w.write("  \"trails_together\": [" + (together.isEmpty() ? "],\n" : "\n" + String.join(",\n", together) + "\n  ],\n"));
            w.write("  \"run_seconds\": " + f(r.seconds(), 1) + ",\n");
            w.write("  \"caution\": " + json(CAUTION) + "\n");
            w.write("}\n");
        });
        written.add(sum);
        return written;
    }

    static String json(String s) {
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

    static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
