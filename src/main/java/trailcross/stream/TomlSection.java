package trailcross.stream;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * One table of a stream file, read key by key: each read records the key as known, each problem is a
 * {@link StreamFileException} at the key's line, and {@link #finish()} rejects the keys nobody read
 * (a misspelt key must not be silently ignored).
 */
final class TomlSection {

    private final Path file;
    private final String name;
    private final TomlTable table;
    private final int headerLine;
    private final Set<String> known = new LinkedHashSet<>();

    TomlSection(Path file, String name, TomlTable table, int headerLine) {
        this.file = file;
        this.name = name;
        this.table = table;
        this.headerLine = headerLine;
    }

    boolean present() {
        return table != null;
    }

    boolean has(String key) {
        known.add(key);
        return table != null && table.contains(List.of(key));
    }

    StreamFileException error(String key, String problem) {
        return new StreamFileException(file, lineOf(key), name + "." + key, problem);
    }

    int lineOf(String key) {
        if (table != null && table.contains(List.of(key))) {
            TomlPosition p = table.inputPositionOf(List.of(key));
            if (p != null) {
                return p.line();
            }
        }
        return headerLine;
    }

    double requireDouble(String key, String unit) {
        if (!has(key)) {
            throw missing(key);
        }
        return number(key, unit);
    }

    double optionalDouble(String key, double fallback, String unit) {
        return has(key) ? number(key, unit) : fallback;
    }

    Double nullableDouble(String key, String unit) {
        return has(key) ? number(key, unit) : null;
    }

    String requireString(String key, String what) {
        if (!has(key)) {
            throw missing(key);
        }
        return string(key, what);
    }

    String optionalString(String key, String fallback, String what) {
        return has(key) ? string(key, what) : fallback;
    }

    boolean optionalBoolean(String key, boolean fallback) {
        if (!has(key)) {
            return fallback;
        }
        Object v = table.get(List.of(key));
        if (v instanceof Boolean b) {
            return b;
        }
        throw error(key, "expected true or false, found " + describe(v));
    }

    int optionalInt(String key, int fallback) {
        if (!has(key)) {
            return fallback;
        }
        Object v = table.get(List.of(key));
        if (v instanceof Long l && l >= Integer.MIN_VALUE && l <= Integer.MAX_VALUE) {
            return l.intValue();
        }
        throw error(key, "expected a whole number, found " + describe(v));
    }

    double[] optionalDoubleArray(String key, String unit) {
        if (!has(key)) {
            return null;
        }
        Object v = table.get(List.of(key));
        if (!(v instanceof TomlArray a)) {
            throw error(key, "expected an array of numbers (" + unit + "), found " + describe(v));
        }
        double[] out = new double[a.size()];
        for (int k = 0; k < a.size(); k++) {
            Object x = a.get(k);
            if (x instanceof Double d) {
                out[k] = d;
            } else if (x instanceof Long l) {
                out[k] = l;
            } else {
                throw error(key, "element " + (k + 1) + " is not a number (" + unit + ")");
            }
            if (!Double.isFinite(out[k])) {
                throw error(key, "element " + (k + 1) + " is not finite");
            }
        }
        return out;
    }

    /** Rejects every key of the table that no read asked for. */
    void finish() {
        if (table == null) {
            return;
        }
        List<String> unknown = new ArrayList<>();
        for (String k : table.keySet()) {
            if (!known.contains(k)) {
                unknown.add(k);
            }
        }
        if (!unknown.isEmpty()) {
            String k = unknown.get(0);
            throw error(k, "unknown key (known keys of [" + name + "]: " + String.join(", ", known) + ")");
        }
    }

    private StreamFileException missing(String key) {
        String where = table == null ? "section [" + name + "] is missing" : "required key is missing";
        return new StreamFileException(file, headerLine, name + "." + key, where);
    }

    private double number(String key, String unit) {
        Object v = table.get(List.of(key));
        double d;
        if (v instanceof Double x) {
            d = x;
        } else if (v instanceof Long l) {
            d = l;
        } else {
            throw error(key, "expected a number (" + unit + "), found " + describe(v));
        }
        if (!Double.isFinite(d)) {
            throw error(key, "must be a finite number (" + unit + ")");
        }
        return d;
    }

    private String string(String key, String what) {
        Object v = table.get(List.of(key));
        if (v instanceof String s) {
            return s;
        }
        String hint = v instanceof java.time.temporal.TemporalAccessor
                ? " (write times as quoted strings with a scale, e.g. \"2020-01-01T00:00:00 TDB\")" : "";
        throw error(key, "expected a string (" + what + "), found " + describe(v) + hint);
    }

    private static String describe(Object v) {
        if (v instanceof String s) {
            return "the string \"" + s + "\"";
        }
        if (v instanceof TomlTable) {
            return "a table";
        }
        if (v instanceof TomlArray) {
            return "an array";
        }
        if (v instanceof java.time.temporal.TemporalAccessor) {
            return "a TOML date-time";
        }
        return v == null ? "nothing" : v.getClass().getSimpleName().toLowerCase(java.util.Locale.ROOT) + " " + v;
    }
}
