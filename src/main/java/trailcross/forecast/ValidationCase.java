package trailcross.forecast;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * One validation case: a real body's stream file, what to compute (an Earth MOID, a perihelion return, a
 * forecast), the published values with their tolerances and the source. A small TOML file of keys
 * {@code name, stream} (relative to the case file){@code , command} ({@code moid}, {@code perihelion},
 * {@code forecast}, {@code calibrate}, {@code axis}){@code , quick, source}, the command's {@code year, since,
 * particles, trail}, for {@code axis} the period offsets scanned {@code offset_days = [lo, hi]}, and
 * {@code [[check]]} tables of {@code quantity, published, tolerance} (quantities: {@code moid_au},
 * {@code perihelion_tt}, {@code q_au}, {@code peak_utc} (tolerance in minutes), {@code abs_delta_r_au}
 * (the published value is the bound), {@code radiant} ({@code published = [ra, dec]}, tolerance in degrees),
 * {@code solar_longitude_deg}).
 *
 * @param file the case file
 * @param name what is checked
 * @param stream the stream file
 * @param command what to compute
 * @param quick whether the test suite runs it
 * @param source where the published values come from
 * @param year the year (perihelion, forecast)
 * @param since first return examined (forecast)
 * @param particles particles per return (forecast)
 * @param trail the return year of the trail checked (forecast, calibrate)
 * @param zhr the observed ZHR the calibration is fitted on (calibrate)
 * @param transferYear a year the calibrated stream is then forecast for (calibrate; 0: none)
 * @param transferTrail the trail checked in that year
 * @param offsetDays the period offsets the trail's axis family spans, days ({@code axis}; null: ±{@value
 *     #DEFAULT_OFFSET_DAYS})
 * @param checks the checks
 */
public record ValidationCase(Path file, String name, Path stream, String command, boolean quick, String source,
        int year, int since, int particles, int trail, double zhr, int transferYear, int transferTrail,
        double[] offsetDays, List<Check> checks) {

    /** The period offsets an {@code axis} case spans by default, ± this many days. */
    public static final double DEFAULT_OFFSET_DAYS = 600;

    /** The quantities a check can name. */
    public static final Set<String> QUANTITIES = Set.of("moid_au", "perihelion_tt", "q_au", "peak_utc",
            "abs_delta_r_au", "radiant", "solar_longitude_deg", "axis_delta_r_au", "axis_peak_utc", "peak_sigma_min",
            "calibration_round_trip", "transfer_zhr_factor", "axis_solar_longitude_deg", "together_peak_utc");

    /**
     * One check.
     *
     * @param quantity what is compared
     * @param published the published value: a number, a time text, or [ra, dec]
     * @param tolerance the tolerance (unit by quantity)
     */
    public record Check(String quantity, Object published, double tolerance) {
    }

    /**
     * @param file a case file
     * @return the case
     * @throws IllegalArgumentException naming the file (and line) of a problem
     */
    public static ValidationCase read(Path file) {
        TomlParseResult t;
        try {
            t = Toml.parse(file);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException(file + ": no such file");
        } catch (IOException e) {
            throw new IllegalArgumentException(file + ": cannot read: " + e.getMessage());
        }
        if (t.hasErrors()) {
            var err = t.errors().get(0);
            throw new IllegalArgumentException(file + ":" + (err.position() == null ? 0 : err.position().line())
                    + ": not valid TOML: " + err.getMessage());
        }
        String name = text(file, t, "name");
        Path stream = file.toAbsolutePath().getParent().resolve(text(file, t, "stream")).normalize();
        if (!Files.exists(stream)) {
            throw new IllegalArgumentException(file + ":" + line(t, "stream") + ": stream: no such file " + stream);
        }
        String command = text(file, t, "command");
        if (!Set.of("moid", "perihelion", "forecast", "calibrate", "axis").contains(command)) {
            throw new IllegalArgumentException(file + ":" + line(t, "command") + ": command: '" + command
                    + "' is not moid, perihelion, forecast, calibrate or axis");
        }
        double[] offsets = null;
        if (t.contains("offset_days")) {
            TomlArray o = t.isArray("offset_days") ? t.getArray("offset_days") : null;
            if (o == null || o.size() != 2 || !(o.get(0) instanceof Number) || !(o.get(1) instanceof Number)
                    || ((Number) o.get(0)).doubleValue() >= ((Number) o.get(1)).doubleValue()) {
                throw new IllegalArgumentException(file + ":" + line(t, "offset_days")
                        + ": offset_days: must be [lo, hi] in days with lo < hi");
            }
            offsets = new double[] {((Number) o.get(0)).doubleValue(), ((Number) o.get(1)).doubleValue()};
        }
        TomlArray arr = t.getArray("check");
        if (arr == null || arr.isEmpty()) {
            throw new IllegalArgumentException(file + ": no [[check]] tables");
        }
        List<Check> checks = new ArrayList<>();
        for (int k = 0; k < arr.size(); k++) {
            TomlTable c = arr.getTable(k);
            String q = c.getString("quantity");
            int ln = c.inputPositionOf("quantity") == null ? 0 : c.inputPositionOf("quantity").line();
            if (q == null || !QUANTITIES.contains(q)) {
                throw new IllegalArgumentException(file + ":" + ln + ": quantity: '" + q + "' is not one of " + QUANTITIES);
            }
            Object pub = c.get("published");
            if (pub instanceof TomlArray a) {
                pub = new double[] {a.getDouble(0), a.getDouble(1)};
            } else if (pub instanceof Long l) {
                pub = l.doubleValue();
            }
            Double tol = c.getDouble("tolerance");
            if (pub == null || (tol == null && !q.equals("abs_delta_r_au") && !q.equals("peak_sigma_min"))) {
                throw new IllegalArgumentException(file + ":" + ln + ": check " + q + " needs published and tolerance");
            }
            checks.add(new Check(q, pub, tol == null ? 0 : tol));
        }
        return new ValidationCase(file, name, stream, command, Boolean.TRUE.equals(t.getBoolean("quick")),
                text(file, t, "source"), intOf(t, "year"), intOf(t, "since"), intOf(t, "particles"), intOf(t, "trail"),
                t.getDouble("zhr") == null ? Double.NaN : t.getDouble("zhr"), intOf(t, "transfer_year"),
                intOf(t, "transfer_trail"), offsets, checks);
    }

    private static String text(Path file, TomlParseResult t, String key) {
        String v = t.getString(key);
        if (v == null) {
            throw new IllegalArgumentException(file + ": " + key + ": required key is missing");
        }
        return v;
    }

    private static int intOf(TomlParseResult t, String key) {
        Long v = t.getLong(key);
        return v == null ? 0 : v.intValue();
    }

    private static int line(TomlParseResult t, String key) {
        return t.inputPositionOf(key) == null ? 0 : t.inputPositionOf(key).line();
    }
}
