package trailcross.ejection;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import trailcross.io.AtomicFile;

/**
 * A meteoroid cloud as CSV (Commons CSV), so that a researcher can inspect or replace it: columns
 * {@code id, return_jd_tdb, ejection_jd_tdb, x_au, y_au, z_au, vx_au_d, vy_au_d, vz_au_d, radius_m, mass_kg,
 * beta, weight, speed_m_s}, heliocentric ecliptic J2000, numbers with 17 significant digits so that they
 * read back bit for bit (times as Julian dates, exact to their last digit, 2^−29 d); {@code weight} is empty when the stream gives no dust production and
 * {@code speed_m_s} may be left out of a file made elsewhere. Written atomically ({@link AtomicFile}).
 */
public final class MeteoroidFile {

    /** The columns, in order. */
    public static final String[] HEADER = {
        "id", "return_jd_tdb", "ejection_jd_tdb", "x_au", "y_au", "z_au", "vx_au_d", "vy_au_d", "vz_au_d",
        "radius_m", "mass_kg", "beta", "weight", "speed_m_s"
    };
    private static final double J2000 = 2451545.0;

    private MeteoroidFile() {
    }

    /**
     * @param file the target (replaced atomically)
     * @param particles the cloud
     */
    public static void write(Path file, List<Meteoroid> particles) {
        AtomicFile.write(file, w -> {
            try (CSVPrinter csv = new CSVPrinter(w,
                    CSVFormat.DEFAULT.builder().setHeader(HEADER).setRecordSeparator('\n').build())) {
                for (Meteoroid m : particles) {
                    double[] s = m.state();
                    csv.printRecord(m.id(), num(m.returnT() + J2000), num(m.t() + J2000), num(s[0]), num(s[1]),
                            num(s[2]), num(s[3]), num(s[4]), num(s[5]), num(m.radiusM()), num(m.massKg()),
                            num(m.beta()), Double.isNaN(m.weight()) ? "" : num(m.weight()), num(m.speedMs()));
                }
            }
        });
    }

    /**
     * @param file a cloud
     * @return its particles
     * @throws IllegalArgumentException naming the file and line of a bad entry (a missing column, a value
     *     that is not a finite number, a negative radius, mass or weight, a duplicate id)
     */
    public static List<Meteoroid> read(Path file) {
        List<Meteoroid> out = new ArrayList<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8);
                CSVParser csv = CSVParser.parse(r, CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                        .setTrim(true).build())) {
            for (int k = 0; k < HEADER.length - 1; k++) {
                if (!csv.getHeaderMap().containsKey(HEADER[k])) {
                    throw new IllegalArgumentException(file + ":1: missing column " + HEADER[k]);
                }
            }
            boolean hasSpeed = csv.getHeaderMap().containsKey("speed_m_s");
            for (CSVRecord rec : csv) {
                long line = rec.getRecordNumber() + 1;
                try {
                    long id = Long.parseLong(rec.get("id"));
                    double ret = finite(rec, "return_jd_tdb") - J2000;
                    if (!seen.add(id + "/" + ret)) {
                        throw new IllegalArgumentException("id " + id + " appears twice in the same return");
                    }
                    double[] s = new double[6];
                    for (int k = 0; k < 6; k++) {
                        s[k] = finite(rec, HEADER[3 + k]);
                    }
                    String w = rec.get("weight");
                    double weight = w.isEmpty() ? Double.NaN : nonNegative(rec, "weight");
                    out.add(new Meteoroid(id, ret, finite(rec, "ejection_jd_tdb") - J2000, s,
                            positive(rec, "radius_m"), positive(rec, "mass_kg"), nonNegative(rec, "beta"), weight,
                            hasSpeed && !rec.get("speed_m_s").isEmpty() ? nonNegative(rec, "speed_m_s") : Double.NaN));
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException(file + ":" + line + ": id: not an integer: " + e.getMessage(), e);
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(file + ":" + line + ": " + e.getMessage(), e);
                }
            }
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException(file + ": no such file", e);
        } catch (IOException | IllegalStateException | java.io.UncheckedIOException e) {
            throw new IllegalArgumentException(file + ": not a meteoroid file: " + e.getMessage(), e);
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException(file + ": no particles");
        }
        return out;
    }

    private static double finite(CSVRecord rec, String column) {
        return trailcross.io.CsvNumbers.finite(rec.get(column), column);
    }

    private static double positive(CSVRecord rec, String column) {
        double v = finite(rec, column);
        if (!(v > 0)) {
            throw new IllegalArgumentException(column + ": must be > 0, got " + v);
        }
        return v;
    }

    private static double nonNegative(CSVRecord rec, String column) {
        double v = finite(rec, column);
        if (v < 0) {
            throw new IllegalArgumentException(column + ": must be >= 0, got " + v);
        }
        return v;
    }

    private static String num(double v) {
        return trailcross.io.CsvNumbers.exact(v);
    }
}
