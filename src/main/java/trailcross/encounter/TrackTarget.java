package trailcross.encounter;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.hipparchus.analysis.interpolation.HermiteInterpolator;
import trailcross.io.CsvNumbers;
import trailcross.time.EpochParser;

/**
 * A spacecraft's (or any object's) track as an approach target, read from a CSV file with the
 * {@code ephemeris} command's columns ({@code time_tdb, x_au, y_au, z_au, vx_au_d, vy_au_d, vz_au_d};
 * heliocentric ecliptic J2000). Between rows the state is the Hermite interpolant of positions and
 * velocities at the four nearest rows (degree 7; Hipparchus {@link HermiteInterpolator}): on a planet's
 * track at one-day spacing it keeps positions to the file's 16 digits (tested against the ephemeris).
 * A track has no mass and no size.
 */
public final class TrackTarget implements ApproachTarget {

    /** The columns a track file must have. */
    public static final String[] COLUMNS = {"time_tdb", "x_au", "y_au", "z_au", "vx_au_d", "vy_au_d", "vz_au_d"};

    private final String name;
    private final double[] t;
    private final double[][] s;

    /**
     * @param name the name shown
     * @param t strictly increasing TDB days since J2000
     * @param s the states at those times
     */
    public TrackTarget(String name, double[] t, double[][] s) {
        if (t.length < 2 || s.length != t.length) {
            throw new IllegalArgumentException(name + ": a track needs at least two rows");
        }
        this.name = name;
        this.t = t.clone();
        this.s = s.clone();
    }

    /**
     * @param file a CSV file with {@link #COLUMNS}
     * @return the track
     * @throws IllegalArgumentException naming the file and line of what is wrong
     */
    public static TrackTarget read(Path file) {
        List<Double> times = new ArrayList<>();
        List<double[]> states = new ArrayList<>();
        CSVFormat fmt = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setTrim(true)
                .setIgnoreEmptyLines(true).build();
        try (Reader r = Files.newBufferedReader(file); CSVParser p = CSVParser.parse(r, fmt)) {
            for (String c : COLUMNS) {
                if (!p.getHeaderMap().containsKey(c)) {
                    throw new IllegalArgumentException(file + ": line 1: the track has no column '" + c
                            + "' (needs " + String.join(", ", COLUMNS) + ")");
                }
            }
            for (CSVRecord rec : p) {
                long line = rec.getParser().getCurrentLineNumber();
                try {
                    String when = rec.get(COLUMNS[0]);
                    double day = EpochParser.parse(when.matches(".*[A-Za-z]$") ? when : when + " TDB").daysSinceJ2000();
                    double[] x = new double[6];
                    for (int k = 0; k < 6; k++) {
                        x[k] = CsvNumbers.finite(rec.get(COLUMNS[k + 1]), COLUMNS[k + 1]);
                    }
                    if (!times.isEmpty() && !(day > times.get(times.size() - 1))) {
                        throw new IllegalArgumentException("time_tdb: times must increase from row to row");
                    }
                    times.add(day);
                    states.add(x);
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(file + ": line " + line + ": " + e.getMessage(), e);
                }
            }
        } catch (IOException e) {
            throw new IllegalArgumentException(file + ": cannot be read (" + e.getMessage() + ")", e);
        } catch (IllegalStateException | java.io.UncheckedIOException e) {
            throw new IllegalArgumentException(file + ": not a CSV table (" + e.getMessage() + ")", e);
        }
        if (times.size() < 2) {
            throw new IllegalArgumentException(file + ": a track needs at least two rows, found " + times.size());
        }
        double[] tt = new double[times.size()];
        for (int i = 0; i < tt.length; i++) {
            tt[i] = times.get(i);
        }
        return new TrackTarget("track " + file.getFileName(), tt, states.toArray(new double[0][]));
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public void state(double time, double[] out) {
        if (!(time >= t[0] && time <= t[t.length - 1])) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s covers JD %.5f .. %.5f TDB, not JD %.5f", name, t[0] + 2451545, t[t.length - 1] + 2451545,
                    time + 2451545));
        }
        int k = java.util.Arrays.binarySearch(t, time);
        if (k < 0) {
            k = -k - 2;
        }
        k = Math.min(k, t.length - 2);
        int lo = Math.max(0, k - 1);
        int hi = Math.min(t.length - 1, k + 2);
        HermiteInterpolator h = new HermiteInterpolator();
        double origin = t[k];
        for (int i = lo; i <= hi; i++) {
            h.addSamplePoint(t[i] - origin, new double[] {s[i][0], s[i][1], s[i][2]},
                    new double[] {s[i][3], s[i][4], s[i][5]});
        }
        double[][] d = h.derivatives(time - origin, 1);
        System.arraycopy(d[0], 0, out, 0, 3);
        System.arraycopy(d[1], 0, out, 3, 3);
    }

    @Override
    public double firstDay() {
        return t[0];
    }

    @Override
    public double lastDay() {
        return t[t.length - 1];
    }
}
