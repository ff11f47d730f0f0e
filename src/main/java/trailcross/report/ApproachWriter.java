package trailcross.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import trailcross.encounter.DensityProfile;
import trailcross.encounter.FluenceProfile;
import trailcross.forecast.ApproachRun;
import trailcross.io.AtomicFile;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;

/**
 * Writes an approach run's files into its output folder, each atomically ({@link AtomicFile}):
 * {@code approaches.csv} (one row per particle: {@code id, closest_utc, distance_au, v_rel_km_s, ra_deg,
 * dec_deg, weight, mass_kg, captured}, then the return, the impact parameter, the ejection speed and the
 * radiant in the planet's frame), {@code profile.csv} (one row per profile bin: {@code time_utc,
 * fluence_per_km2} with its 16–84% band), {@code summary.json} and the plots ({@link ApproachPlots}).
 */
public final class ApproachWriter {

    private ApproachWriter() {
    }

    /**
     * @param dir the output folder
     * @param stream the stream file
     * @param r the result
     * @param ephemerisName the ephemeris used
     * @param version the program's version
     * @return the files written
     */
    public static List<Path> write(Path dir, Path stream, ApproachRun.Result r, String ephemerisName, String version) {
        List<Path> written = new ArrayList<>();
        Path app = dir.resolve("approaches.csv");
        AtomicFile.write(app, w -> {
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                    .setHeader("id", "closest_utc", "distance_au", "v_rel_km_s", "ra_deg", "dec_deg", "weight", "mass_kg",
                            "captured", "return_year", "impact_parameter_au", "ejection_speed_m_s", "ejection_utc", "planet_ra_deg",
                            "planet_dec_deg", "counted").build())) {
                for (ApproachRun.Row row : r.rows()) {
                    p.printRecord(row.approach().id(), utc(row.approach().t(), 3), g(row.approach().distance()),
                            f(row.vRelKmS(), 4), f(row.raDeg(), 4), f(row.decDeg(), 4), g(row.weight()), g(row.massKg()),
                            row.captured(), row.returnYear(), g(row.impactAu()), f(row.ejectionSpeedMs(), 3), utc(row.ejectionT(), 0),
                            Double.isNaN(row.planetRaDeg()) ? "" : f(row.planetRaDeg(), 4),
                            Double.isNaN(row.planetDecDeg()) ? "" : f(row.planetDecDeg(), 4), row.counts());
                }
            }
        });
        written.add(app);
        Path prof = dir.resolve("profile.csv");
        FluenceProfile fl = r.fluence();
        AtomicFile.write(prof, w -> {
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                    .setHeader("time_utc", "fluence_per_km2", "fluence_low_per_km2", "fluence_high_per_km2").build())) {
                if (fl != null) {
                    DensityProfile.Result d = fl.profile();
                    double step = d.grid().length > 1 ? d.grid()[1] - d.grid()[0] : 0;
                    for (int k = 0; k < d.grid().length; k++) {
                        p.printRecord(utc(d.grid()[k], 0), g(d.value()[k] * step), g(d.low()[k] * step),
                                g(d.high()[k] * step));
                    }
                }
            }
        });
        written.add(prof);
        written.addAll(ApproachPlots.write(dir, stream.getFileName().toString().replaceFirst("\\.toml$", "")
                + " to " + r.target(), r));
        Path sum = dir.resolve("summary.json");
        ApproachRun.Settings s = r.settings();
        AtomicFile.write(sum, w -> {
            w.write("{\n");
            w.write("  \"program\": " + ForecastWriter.json(version) + ",\n");
            w.write("  \"stream\": " + ForecastWriter.json(stream.toString()) + ",\n");
            w.write("  \"target\": " + ForecastWriter.json(r.target()) + ",\n");
            w.write("  \"from_utc\": " + ForecastWriter.json(utc(s.from(), 0)) + ",\n");
            w.write("  \"to_utc\": " + ForecastWriter.json(utc(s.to(), 0)) + ",\n");
            w.write("  \"returns\": [" + String.join(", ", r.returns().stream().map(String::valueOf).toList()) + "],\n");
            w.write("  \"particles_per_return\": " + s.particles() + ",\n");
            w.write("  \"particles_in_span\": " + r.rows().size() + ",\n");
            w.write("  \"particles_ejected_after_span\": " + r.notEjected() + ",\n");
            w.write("  \"seed\": " + s.seed() + ",\n");
            w.write("  \"ephemeris\": " + ForecastWriter.json(ephemerisName) + ",\n");
            w.write("  \"numbers_absolute\": " + r.absolute() + ",\n");
            w.write("  \"parent_min_distance_au\": " + num(r.parent() == null ? Double.NaN : r.parent().distance()) + ",\n");
            w.write("  \"parent_min_distance_utc\": " + (r.parent() == null ? "null"
                    : ForecastWriter.json(utc(r.parent().t(), 0))) + ",\n");
            w.write("  \"cloud_min_distance_au\": " + num(r.nearest().approach().distance()) + ",\n");
            w.write("  \"cloud_min_distance_utc\": " + ForecastWriter.json(utc(r.nearest().approach().t(), 0)) + ",\n");
            w.write("  \"cloud_min_distance_particle\": " + r.nearest().approach().id() + ",\n");
            w.write("  \"reaches\": " + r.reaches() + ",\n");
            w.write("  \"extra_ejection_speed_m_s\": " + num(r.extraSpeedMs()) + ",\n");
            w.write("  \"within\": [\n");
            List<String> items = new ArrayList<>();
            for (ApproachRun.Band b : r.bands()) {
                items.add(String.format(Locale.ROOT, "    {\"distance_au\": %s, \"particles\": %d, \"fraction\": %s, "
                        + "\"meteoroids\": %s, \"mass_kg\": %s}", num(b.withinAu()), b.particles(), num(b.fraction()),
                        num(b.meteoroids()), num(b.massKg())));
            }
            w.write(String.join(",\n", items) + "\n  ],\n");
            w.write("  \"capture_radius_km\": " + num(r.captureRadiusKm()) + ",\n");
            w.write("  \"captured_particles\": " + r.capturedParticles() + ",\n");
            w.write("  \"captured_fraction\": " + num(r.capturedFraction()) + ",\n");
            w.write("  \"expected_impacts\": " + num(r.expectedImpacts()) + ",\n");
            w.write("  \"expected_impacts_sigma\": " + num(r.expectedImpactsSigma()) + ",\n");
            w.write("  \"fluence_counts\": " + ForecastWriter.json(r.massLimit()) + ",\n");
            w.write("  \"fluence_per_km2\": " + num(fl == null ? Double.NaN : fl.total()) + ",\n");
            w.write("  \"fluence_sigma_per_km2\": " + num(fl == null ? Double.NaN : fl.totalSigma()) + ",\n");
            w.write("  \"sampling_radius_au\": " + num(fl == null ? Double.NaN : fl.radiusAu()) + ",\n");
            w.write("  \"profile_particles\": " + (fl == null ? 0 : fl.particles()) + ",\n");
            w.write("  \"peak_utc\": " + (fl == null ? "null" : ForecastWriter.json(utc(fl.peakT(), 0))) + ",\n");
            w.write("  \"peak_sigma_min\": " + num(fl == null ? Double.NaN : fl.peakSigmaMin()) + ",\n");
            w.write("  \"fwhm_h\": " + num(fl == null ? Double.NaN : fl.fwhmHours()) + ",\n");
            w.write("  \"run_seconds\": " + ForecastWriter.f(r.seconds(), 1) + ",\n");
            w.write("  \"caution\": " + ForecastWriter.json(ForecastWriter.CAUTION) + "\n");
            w.write("}\n");
        });
        written.add(sum);
        return written;
    }

    static String utc(double t, int decimals) {
        return EpochFormat.utc(Epoch.ofDaysSinceJ2000(t), decimals);
    }

    private static String num(double v) {
        return Double.isFinite(v) ? g(v) : "null";
    }

    private static String g(double v) {
        return String.format(Locale.ROOT, "%.9g", v);
    }

    private static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
