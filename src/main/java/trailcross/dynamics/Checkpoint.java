package trailcross.dynamics;

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

/**
 * Particle states at one epoch, so that a long propagation can resume after a crash: a CSV file
 * (columns {@code id, t_tdb_jd, x_au, y_au, z_au, vx_au_d, vy_au_d, vz_au_d, beta, status}) written to a
 * temporary file beside the target and moved into place, so that a crash never leaves half a checkpoint, and
 * sealed with a checksum of its content ({@link trailcross.io.SealedFile}), so that a damaged one is refused.
 * Numbers are written with 17 significant digits, so that they read back bit for bit.
 */
public final class Checkpoint {

    private static final String[] HEADER = {
        "id", "t_tdb_jd", "x_au", "y_au", "z_au", "vx_au_d", "vy_au_d", "vz_au_d", "beta", "status"
    };

    /**
     * One particle's entry.
     *
     * @param particle the particle, at the checkpoint's epoch
     * @param status its status (DONE while it is still propagating)
     */
    public record Entry(TestParticle particle, Outcome.Status status) {
    }

    private Checkpoint() {
    }

    /**
     * @param file where to write (replaced atomically)
     * @param entries the particles
     */
    public static void write(Path file, List<Entry> entries) {
        trailcross.io.SealedFile.write(file, w -> {
            try (CSVPrinter csv = new CSVPrinter(w,
                    CSVFormat.DEFAULT.builder().setHeader(HEADER).setRecordSeparator('\n').build())) {
                for (Entry e : entries) {
                    TestParticle p = e.particle();
                    double[] s = p.state();
                    csv.printRecord(p.id(), num(p.t() + 2451545.0), num(s[0]), num(s[1]), num(s[2]), num(s[3]),
                            num(s[4]), num(s[5]), num(p.beta()), e.status());
                }
            }
        });
    }

    /**
     * @param file a checkpoint
     * @return its entries
     * @throws IllegalArgumentException naming the file and line of a bad entry
     */
    public static List<Entry> read(Path file) {
        List<Entry> out = new ArrayList<>();
        String text = trailcross.io.SealedFile.read(file);
        try (Reader r = new java.io.StringReader(text);
                CSVParser csv = CSVParser.parse(r, CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).build())) {
            for (String h : HEADER) {
                if (!csv.getHeaderMap().containsKey(h)) {
                    throw new IllegalArgumentException(file + ":1: missing column " + h);
                }
            }
            for (CSVRecord rec : csv) {
                long line = rec.getRecordNumber() + 1;
                try {
                    double[] s = new double[6];
                    String[] cols = {"x_au", "y_au", "z_au", "vx_au_d", "vy_au_d", "vz_au_d"};
                    for (int k = 0; k < 6; k++) {
                        s[k] = finite(rec.get(cols[k]), cols[k]);
                    }
                    TestParticle p = new TestParticle(Long.parseLong(rec.get("id")),
                            finite(rec.get("t_tdb_jd"), "t_tdb_jd") - 2451545.0, s, finite(rec.get("beta"), "beta"));
                    out.add(new Entry(p, Outcome.Status.valueOf(rec.get("status"))));
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(file + ":" + line + ": " + e.getMessage(), e);
                }
            }
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException(file + ": no such file", e);
        } catch (IOException e) {
            throw new IllegalArgumentException(file + ": cannot read: " + e.getMessage(), e);
        } catch (IllegalStateException e) {
            throw new IllegalArgumentException(file + ": not a checkpoint: " + e.getMessage(), e);
        }
        return out;
    }

    private static double finite(String text, String column) {
        return trailcross.io.CsvNumbers.finite(text, column);
    }

    private static String num(double v) {
        return trailcross.io.CsvNumbers.exact(v);
    }
}
