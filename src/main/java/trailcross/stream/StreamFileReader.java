package trailcross.stream;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.tomlj.Toml;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;
import trailcross.orbit.Elements;
import trailcross.orbit.GravitationalParameters;
import trailcross.time.Epoch;
import trailcross.time.EpochParser;

/**
 * Reads and validates a stream file (TOML 1.0). Required: {@code [stream] name} and the parent's
 * osculating orbit {@code [parent] epoch, q_au, e, i_deg, node_deg, peri_deg, perihelion} (or
 * {@code mean_anomaly_deg} instead of {@code perihelion} for e &lt; 1). Every other key is optional with
 * the default documented beside its constant; unknown keys and sections are errors. Every error is one
 * {@link StreamFileException}: {@code file:line: key: what is wrong}.
 */
public final class StreamFileReader {

    private static final Set<String> SECTIONS = Set.of("stream", "parent", "ejection", "particles");

    private StreamFileReader() {
    }

    /**
     * @param file the stream file
     * @return the validated definition with defaults filled in
     * @throws StreamFileException for a missing, unreadable, malformed or invalid file
     */
    public static StreamDefinition read(Path file) {
        String text;
        try {
            if (Files.isDirectory(file)) {
                throw new StreamFileException(file, 0, "", "is a directory, not a stream file");
            }
            text = Files.readString(file);
        } catch (NoSuchFileException e) {
            throw new StreamFileException(file, 0, "", "no such file");
        } catch (IOException e) {
            throw new StreamFileException(file, 0, "", "cannot read: " + e.getMessage());
        }
        return parse(file, text);
    }

    /**
     * The same from the file's text (a cluster's executors get the text, not the file).
     *
     * @param file the stream file's name, for messages
     * @param text its text
     * @return the validated definition with defaults filled in
     * @throws StreamFileException for a malformed or invalid text
     */
    public static StreamDefinition parse(Path file, String text) {
        TomlParseResult toml = Toml.parse(text);
        if (toml.hasErrors()) {
            TomlParseError err = toml.errors().get(0);
            TomlPosition p = err.position();
            throw new StreamFileException(file, p == null ? 0 : p.line(), "",
                    "not valid TOML: " + err.getMessage().replaceAll(" \\(line \\d+, column \\d+\\)", ""));
        }
        for (String k : toml.keySet()) {
            if (!SECTIONS.contains(k) || !toml.isTable(k)) {
                throw new StreamFileException(file, line(toml, k), k,
                        "unknown section or top-level key (sections: [stream], [parent], [ejection], [particles])");
            }
        }
        TomlSection stream = section(file, toml, "stream");
        String name = stream.requireString("name", "the stream's name");
        if (name.isBlank()) {
            throw stream.error("name", "must not be empty");
        }
        String description = stream.optionalString("description", "", "free text");
        double r = stream.optionalDouble("population_index", StreamDefinition.DEFAULT_POPULATION_INDEX, "r");
        if (r <= 1.3 || r > 5) {
            // Koschack & Rendtel's flux relation has (r − 1.3)^0.748; published r lie in 1.5–4.
            throw stream.error("population_index", "must be in (1.3, 5], got " + r);
        }
        stream.finish();

        ParentBody parent = parent(file, section(file, toml, "parent"), name);
        EjectionSettings ejection = ejection(section(file, toml, "ejection"), parent);
        ParticleSettings particles = particles(section(file, toml, "particles"));
        return new StreamDefinition(file, name, description, r, parent, ejection, particles);
    }

    private static TomlSection section(Path file, TomlParseResult toml, String name) {
        TomlTable t = toml.isTable(name) ? toml.getTable(name) : null;
        int header = t == null ? 1 : line(toml, name);
        return new TomlSection(file, name, t, header);
    }

    private static int line(TomlParseResult toml, String key) {
        TomlPosition p = toml.inputPositionOf(List.of(key));
        return p == null ? 1 : p.line();
    }

    private static ParentBody parent(Path file, TomlSection s, String streamName) {
        String name = s.optionalString("name", streamName, "the parent's designation");
        Epoch epoch = time(s, "epoch", true);
        double q = s.requireDouble("q_au", "au");
        if (q <= 0) {
            throw s.error("q_au", "perihelion distance must be > 0 au, got " + q);
        }
        double e = s.requireDouble("e", "eccentricity");
        if (e < 0) {
            throw s.error("e", "eccentricity must be >= 0, got " + e);
        }
        double i = angle(s, "i_deg", 0, 180, true);
        double node = angle(s, "node_deg", 0, 360, false);
        double peri = angle(s, "peri_deg", 0, 360, false);
        boolean hasT = s.has("perihelion");
        boolean hasM = s.has("mean_anomaly_deg");
        Elements el;
        double gm = GravitationalParameters.SUN;
        if (hasT && hasM) {
            throw s.error("mean_anomaly_deg", "give either perihelion or mean_anomaly_deg, not both");
        } else if (hasM) {
            if (e >= 1) {
                throw s.error("mean_anomaly_deg", "a mean anomaly needs e < 1; give perihelion instead");
            }
            double m = s.requireDouble("mean_anomaly_deg", "degrees");
            el = Elements.ofMeanAnomaly(q, e, Math.toRadians(i), Math.toRadians(node), Math.toRadians(peri),
                    Math.toRadians(m), epoch.jd(), gm);
        } else {
            Epoch t = time(s, "perihelion", true);
            el = Elements.ofDegrees(q, e, i, node, peri, t.jd(), gm);
        }
        double a1 = nongrav(s, "a1");
        double a2 = nongrav(s, "a2");
        double a3 = nongrav(s, "a3");
        double radius = positive(s, "radius_km", ParentBody.DEFAULT_RADIUS_KM, "km", 1e-3, 1000);
        double density = positive(s, "density_kg_m3", ParentBody.DEFAULT_DENSITY_KG_M3, "kg/m^3", 10, 10000);
        Double dust = s.nullableDouble("dust_production_kg_s", "kg/s");
        if (dust != null && dust < 0) {
            throw s.error("dust_production_kg_s", "must be >= 0 kg/s, got " + dust);
        }
        Double gas = s.nullableDouble("gas_production_mol_s", "molecules/s");
        if (gas != null && gas <= 0) {
            throw s.error("gas_production_mol_s", "must be > 0 molecules/s, got " + gas);
        }
        s.finish();
        return new ParentBody(name, epoch, el, a1, a2, a3, radius, density, dust, gas);
    }

    /** a1, a2, a3 as in DESIGN.md (au/d²); {@code a1_au_d2} etc. are accepted as the same key. */
    private static double nongrav(TomlSection s, String key) {
        String longKey = key + "_au_d2";
        boolean plain = s.has(key);
        boolean unit = s.has(longKey);
        if (plain && unit) {
            throw s.error(longKey, "give " + key + " or " + longKey + ", not both");
        }
        double v = unit ? s.requireDouble(longKey, "au/d^2") : s.optionalDouble(key, 0.0, "au/d^2");
        if (Math.abs(v) > 1e-5) {
            // Published A1 of active comets are ≲ 1e-7 au/d² (Marsden et al. 1973; Yeomans et al. 2004).
            throw s.error(unit ? longKey : key, "|" + key + "| must be below 1e-5 au/d^2 (unit au/d^2), got " + v);
        }
        return v;
    }

    private static EjectionSettings ejection(TomlSection s, ParentBody parent) {
        String modelName = s.optionalString("model", EjectionSettings.DEFAULT_MODEL.key(), "a model name");
        VelocityModel model = VelocityModel.of(modelName).orElseThrow(() -> s.error("model",
                "unknown model '" + modelName + "' (known: " + VelocityModel.names() + ")"));
        if (model == VelocityModel.CRIFO_RODIONOV_1997 && parent.gasProductionMolS() == null) {
            throw s.error("model", "crifo1997 needs parent.gas_production_mol_s");
        }
        double scale = positive(s, "speed_scale", 1.0, "factor", 1e-3, 100);
        // 0 is allowed: a cold cloud (the parent's own path) is the approach's check case.
        double fixed = closed(s, "fixed_speed_m_s", EjectionSettings.DEFAULT_FIXED_SPEED_M_S, "m/s", 0, 1e4);
        String dirName = s.optionalString("directions", EjectionSettings.DEFAULT_DIRECTIONS.key(), "a direction law");
        DirectionLaw dirs = DirectionLaw.of(dirName).orElseThrow(() -> s.error("directions",
                "unknown direction law '" + dirName + "' (known: " + DirectionLaw.names() + ")"));
        double cone = s.optionalDouble("cone_half_angle_deg", EjectionSettings.DEFAULT_CONE_HALF_ANGLE_DEG, "degrees");
        if (!(cone > 0 && cone <= 180)) {
            throw s.error("cone_half_angle_deg", "must be in (0, 180] degrees, got " + cone);
        }
        double q = parent.elements().q();
        double inbound = s.optionalDouble("active_inbound_au", EjectionSettings.DEFAULT_ACTIVE_AU, "au");
        double outbound = s.optionalDouble("active_outbound_au", EjectionSettings.DEFAULT_ACTIVE_AU, "au");
        if (inbound < q && outbound < q) {
            throw s.error(inbound < q ? "active_inbound_au" : "active_outbound_au",
                    "empty active arc: both limits are inside the perihelion distance q = " + q + " au");
        }
        if (inbound < 0 || outbound < 0) {
            throw s.error(inbound < 0 ? "active_inbound_au" : "active_outbound_au", "must be >= 0 au");
        }
        double n = s.optionalDouble("production_exponent", EjectionSettings.DEFAULT_PRODUCTION_EXPONENT, "");
        if (n < 0 || n > 20) {
            throw s.error("production_exponent", "must be in [0, 20], got " + n);
        }
        double[] days = s.optionalDoubleArray("production_table_days", "days from perihelion");
        double[] rel = s.optionalDoubleArray("production_table_relative", "relative production");
        if ((days == null) != (rel == null)) {
            String k = days == null ? "production_table_relative" : "production_table_days";
            throw s.error(k, "production_table_days and production_table_relative go together");
        }
        if (days != null) {
            if (days.length < 2 || days.length != rel.length) {
                throw s.error("production_table_relative", "needs as many values as production_table_days (at least 2)");
            }
            for (int k = 1; k < days.length; k++) {
                if (!(days[k] > days[k - 1])) {
                    throw s.error("production_table_days", "must increase strictly (element " + (k + 1) + ")");
                }
            }
            double sum = 0;
            for (int k = 0; k < rel.length; k++) {
                if (rel[k] < 0) {
                    throw s.error("production_table_relative", "element " + (k + 1) + " is negative");
                }
                sum += rel[k];
            }
            if (sum <= 0) {
                throw s.error("production_table_relative", "all values are zero: empty active arc");
            }
        }
        s.finish();
        return new EjectionSettings(model, scale, fixed, dirs, cone, inbound, outbound, n, days, rel);
    }

    private static ParticleSettings particles(TomlSection s) {
        double rmin = positive(s, "radius_min_m", ParticleSettings.DEFAULT_RADIUS_MIN_M, "m", 0, 10);
        double rmax = positive(s, "radius_max_m", Math.max(rmin, ParticleSettings.DEFAULT_RADIUS_MAX_M), "m", 0, 10);
        if (rmax < rmin) {
            throw s.error("radius_max_m", "must be >= radius_min_m (" + rmin + " m), got " + rmax);
        }
        double rho = positive(s, "density_kg_m3", ParticleSettings.DEFAULT_DENSITY_KG_M3, "kg/m^3", 10, 10000);
        double sIndex = s.optionalDouble("mass_index", ParticleSettings.DEFAULT_MASS_INDEX, "");
        if (!(sIndex > 1 && sIndex < 4)) {
            throw s.error("mass_index", "differential mass index must be in (1, 4), got " + sIndex);
        }
        // Q_pr = 0 switches radiation pressure off (β = 0), for studies and checks.
        double qpr = closed(s, "radiation_pressure_efficiency", ParticleSettings.DEFAULT_QPR, "Q_pr", 0, 2);
        int bins = s.optionalInt("size_bins", ParticleSettings.DEFAULT_SIZE_BINS);
        if (bins < 1 || bins > 100) {
            throw s.error("size_bins", "must be in 1..100, got " + bins);
        }
        boolean strat = s.optionalBoolean("stratified", true);
        s.finish();
        return new ParticleSettings(rmin, rmax, rho, sIndex, qpr, bins, strat);
    }

    private static Epoch time(TomlSection s, String key, boolean required) {
        String text = required ? s.requireString(key, "a time with its scale") : s.optionalString(key, null, "a time");
        try {
            return EpochParser.parse(text);
        } catch (IllegalArgumentException e) {
            throw s.error(key, e.getMessage());
        }
    }

    private static double angle(TomlSection s, String key, double lo, double hi, boolean closedHigh) {
        double v = s.requireDouble(key, "degrees");
        boolean ok = v >= lo && (closedHigh ? v <= hi : v < hi);
        if (!ok) {
            throw s.error(key, "must be in [" + (int) lo + ", " + (int) hi + (closedHigh ? "]" : ")")
                    + " degrees, got " + v);
        }
        return v;
    }

    private static double closed(TomlSection s, String key, double fallback, String unit, double lo, double hi) {
        double v = s.optionalDouble(key, fallback, unit);
        if (!(v >= lo && v <= hi)) {
            throw s.error(key, "must be in [" + lo + ", " + hi + "] " + unit + ", got " + v);
        }
        return v;
    }

    private static double positive(TomlSection s, String key, double fallback, String unit, double lo, double hi) {
        double v = s.optionalDouble(key, fallback, unit);
        if (!(v > lo && v <= hi)) {
            throw s.error(key, "must be in (" + lo + ", " + hi + "] " + unit + ", got " + v);
        }
        return v;
    }
}
