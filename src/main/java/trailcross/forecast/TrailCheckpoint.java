package trailcross.forecast;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import trailcross.encounter.NodeCrossing;
import trailcross.io.AtomicFile;

/**
 * A forecast's progress on disk, so that {@code --resume} continues a run after a crash with identical
 * results: {@code DIR/progress/settings.txt} holds the run's settings and stream, and each finished
 * trail's node crossings go to {@code DIR/progress/trail-YEAR.csv} and its axis family's to
 * {@code trail-YEAR-axis.csv} (17 significant digits, written atomically, sealed with a checksum of their
 * content: a damaged one is reported and its trail recomputed, never read back). A resumed run reads the finished trails instead of propagating them again and refuses
 * to mix runs of different settings.
 */
public final class TrailCheckpoint {

    private static final String[] HEADER = {
        "id", "return_tdb", "weight", "mass_kg", "initial_period_d", "t_tdb", "x_au", "y_au", "z_au", "vx_au_d",
        "vy_au_d", "vz_au_d", "ascending"
    };

    private final Path dir;

    /**
     * @param outputDir the forecast's output folder
     * @param fingerprint the run's settings and stream, as text
     * @param resume whether a saved run may be continued
     */
    public TrailCheckpoint(Path outputDir, String fingerprint, boolean resume) {
        this.dir = outputDir.resolve("progress");
        Path settings = dir.resolve("settings.txt");
        try {
            if (resume && Files.exists(settings)) {
                String saved = Files.readString(settings);
                if (!saved.equals(fingerprint)) {
                    throw new IllegalArgumentException("--resume: " + settings
                            + " was written by a run with other settings or another stream file; remove it or drop --resume");
                }
            } else {
                if (Files.isDirectory(dir)) {
                    try (var s = Files.list(dir)) {
                        for (Path p : s.toList()) {
                            Files.delete(p);
                        }
                    }
                }
                AtomicFile.write(settings, w -> w.write(fingerprint));
            }
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(dir + ": " + e.getMessage(), e);
        }
    }

    /**
     * A finished trail.
     *
     * @param crossings the cloud's crossings, final weights
     * @param axis the axis family's crossings
     */
    public record Saved(List<NodeCrossing> crossings, List<NodeCrossing> axis) {
    }

    /**
     * @param returnYear a trail
     * @param log told, in one line, of a damaged checkpoint (which is then not read back)
     * @return its saved crossings, or null when it has not been finished or its checkpoint is damaged
     */
    public Saved read(int returnYear, java.util.function.Consumer<String> log) {
        Path f = file(returnYear);
        Path a = dir.resolve("trail-" + returnYear + "-axis.csv");
        if (!Files.exists(f) || !Files.exists(a)) {
            return null;
        }
        try {
            return new Saved(readFile(f), readFile(a));
        } catch (trailcross.io.SealedFile.DamagedException e) {
            log.accept("trail " + returnYear + ": " + e.getMessage() + "; recomputing the trail");
            return null;
        }
    }

    private static List<NodeCrossing> readFile(Path f) {
        List<NodeCrossing> out = new ArrayList<>();
        String text = trailcross.io.SealedFile.read(f);
        try (Reader r = new java.io.StringReader(text);
                CSVParser csv = CSVParser.parse(r, CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).build())) {
            for (CSVRecord rec : csv) {
                double[] s = new double[6];
                for (int k = 0; k < 6; k++) {
                    s[k] = Double.parseDouble(rec.get(HEADER[6 + k]));
                }
                out.add(new NodeCrossing(Long.parseLong(rec.get("id")), d(rec, "return_tdb"), d(rec, "weight"),
                        d(rec, "mass_kg"), d(rec, "initial_period_d"), d(rec, "t_tdb"), s,
                        Boolean.parseBoolean(rec.get("ascending"))));
            }
        } catch (IOException | RuntimeException e) {
            throw new trailcross.io.SealedFile.DamagedException(f + ": damaged: not a readable trail checkpoint ("
                    + e.getMessage() + ")");
        }
        return out;
    }

    /**
     * @param returnYear a trail
     * @param crossings its crossings
     * @param axis its axis family's crossings
     */
    public void write(int returnYear, List<NodeCrossing> crossings, List<NodeCrossing> axis) {
        // The axis first: a trail counts as finished only when its cloud's file exists too.
        writeFile(dir.resolve("trail-" + returnYear + "-axis.csv"), axis);
        writeFile(file(returnYear), crossings);
    }

    private static void writeFile(Path file, List<NodeCrossing> crossings) {
        trailcross.io.SealedFile.write(file, w -> {
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setHeader(HEADER).setRecordSeparator('\n').build())) {
                for (NodeCrossing c : crossings) {
                    double[] s = c.state();
                    p.printRecord(c.id(), n(c.returnT()), n(c.weight()), n(c.massKg()), n(c.initialPeriod()), n(c.t()),
                            n(s[0]), n(s[1]), n(s[2]), n(s[3]), n(s[4]), n(s[5]), c.ascending());
                }
            }
        });
    }

    private Path file(int returnYear) {
        return dir.resolve("trail-" + returnYear + ".csv");
    }

    private static double d(CSVRecord rec, String col) {
        return Double.parseDouble(rec.get(col));
    }

    private static String n(double v) {
        return trailcross.io.CsvNumbers.exact(v);
    }
}
