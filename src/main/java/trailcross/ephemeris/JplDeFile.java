package trailcross.ephemeris;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.HashMap;
import java.util.Map;

/**
 * A JPL planetary ephemeris in JPL's binary record format (DE405 … DE441, either byte order): the
 * header record (titles, constant names, span, AU, EMRAT, the coefficient pointers), the constants record,
 * then fixed-length records of Chebyshev coefficients (Standish, "JPL Planetary and Lunar Ephemerides",
 * the format of JPL's export files and its reader {@code testeph}). The layout is read from the header,
 * the byte order from the plausibility of DENUM. The file is memory-mapped; reads are thread-safe.
 *
 * <p>Items (JPL numbering from 0): 0 Mercury, 1 Venus, 2 Earth–Moon barycentre, 3 Mars, 4 Jupiter,
 * 5 Saturn, 6 Uranus, 7 Neptune, 8 Pluto, 9 Moon (geocentric), 10 Sun, 11 nutations (2 components),
 * 12 librations, 13 TT−TDB (when present). Positions are barycentric ICRF, km and km/day.
 */
public final class JplDeFile {

    /** Number of items with coefficient pointers. */
    public static final int ITEMS = 14;

    private static final int TITLE_BYTES = 3 * 84;
    private static final int NAME_BYTES = 6;
    private static final int OLD_NAMES = 400;

    private final Path path;
    /** Data records mapped in segments of whole records (a DE441 file exceeds one buffer's 2 GiB). */
    private final ByteBuffer[] segments;
    private final int recordsPerSegment;
    private final int recordBytes;
    private final double start;
    private final double end;
    private final double step;
    private final int[][] pointers = new int[ITEMS][3];
    private final Map<String, Double> constants = new HashMap<>();
    private final int denum;
    private final int records;

    /**
     * Opens a file.
     *
     * @param path the file
     * @throws IllegalArgumentException for a missing, truncated or foreign file (the message names the file)
     */
    public JplDeFile(Path path) {
        this.path = path;
        try (FileChannel ch = FileChannel.open(path, StandardOpenOption.READ)) {
            long size = ch.size();
            if (size < TITLE_BYTES + OLD_NAMES * NAME_BYTES + 204) {
                throw fail("too short for a JPL DE header (" + size + " bytes)");
            }
            ByteBuffer buf = ch.map(FileChannel.MapMode.READ_ONLY, 0, Math.min(size, 1 << 20));
            buf.order(ByteOrder.LITTLE_ENDIAN);
            int base = TITLE_BYTES + OLD_NAMES * NAME_BYTES;
            int numdeOffset = base + 24 + 4 + 16 + 144;
            if (!plausibleDenum(buf.getInt(numdeOffset))) {
                buf.order(ByteOrder.BIG_ENDIAN);
                if (!plausibleDenum(buf.getInt(numdeOffset))) {
                    throw fail("not a JPL DE ephemeris (no plausible DE number in either byte order)");
                }
            }
            start = buf.getDouble(base);
            end = buf.getDouble(base + 8);
            step = buf.getDouble(base + 16);
            int ncon = buf.getInt(base + 24);
            denum = buf.getInt(numdeOffset);
            for (int i = 0; i < 12; i++) {
                for (int j = 0; j < 3; j++) {
                    pointers[i][j] = buf.getInt(base + 44 + 12 * i + 4 * j);
                }
            }
            for (int j = 0; j < 3; j++) {
                pointers[12][j] = buf.getInt(numdeOffset + 4 + 4 * j);
            }
            int extraNames = Math.max(0, ncon - OLD_NAMES);
            int after = numdeOffset + 16 + extraNames * NAME_BYTES;
            if (extraNames > 0 && after + 24 <= size) {
                // DE430 and later: RPT (TT−TDB) follows the extra names; TPT after it is unused here.
                for (int j = 0; j < 3; j++) {
                    pointers[13][j] = buf.getInt(after + 4 * j);
                }
            }
            if (!(end > start && step > 0 && step < 1000) || ncon < 0 || ncon > 10000) {
                throw fail("header is not a JPL DE header (span or constant count implausible)");
            }
            int ncoeff = 0;
            for (int i = 0; i < ITEMS; i++) {
                int[] p = pointers[i];
                if (p[1] > 0 && p[2] > 0) {
                    ncoeff = Math.max(ncoeff, p[0] - 1 + p[1] * p[2] * components(i));
                }
            }
            recordBytes = 8 * ncoeff;
            long expected = (long) recordBytes * (2 + Math.round((end - start) / step));
            if (recordBytes <= 0 || size < expected) {
                throw fail("truncated: the header promises " + expected + " bytes, the file has " + size);
            }
            records = (int) Math.round((end - start) / step);
            recordsPerSegment = Math.max(1, (1 << 30) / recordBytes);
            int nseg = (records + recordsPerSegment - 1) / recordsPerSegment;
            segments = new ByteBuffer[nseg];
            for (int k = 0; k < nseg; k++) {
                long from = (long) recordBytes * (2 + (long) k * recordsPerSegment);
                long length = (long) recordBytes * Math.min(recordsPerSegment, records - k * recordsPerSegment);
                segments[k] = ch.map(FileChannel.MapMode.READ_ONLY, from, length).order(buf.order());
            }
            if (recordBytes + 8L * ncon > buf.limit()) {
                buf = ch.map(FileChannel.MapMode.READ_ONLY, 0, recordBytes + 8L * ncon).order(buf.order());
            }
            for (int k = 0; k < ncon; k++) {
                int nameAt = k < OLD_NAMES ? TITLE_BYTES + NAME_BYTES * k : numdeOffset + 16 + NAME_BYTES * (k - OLD_NAMES);
                byte[] name = new byte[NAME_BYTES];
                buf.get(nameAt, name);
                constants.put(new String(name, java.nio.charset.StandardCharsets.US_ASCII).trim(),
                        buf.getDouble(recordBytes + 8 * k));
            }
        } catch (NoSuchFileException e) {
            throw fail("no such file");
        } catch (IOException e) {
            throw fail("cannot read: " + e.getMessage());
        }
    }

    private static boolean plausibleDenum(int n) {
        return n >= 100 && n <= 2000;
    }

    private IllegalArgumentException fail(String problem) {
        return new IllegalArgumentException(path + ": " + problem);
    }

    /**
     * @param item JPL item number (0–13)
     * @return the number of components (2 for nutations, 1 for TT−TDB, else 3)
     */
    public static int components(int item) {
        return item == 11 ? 2 : item == 13 ? 1 : 3;
    }

    /** @return the DE number (e.g. 440) */
    public int denum() {
        return denum;
    }

    /** @return the first Julian date covered, TDB */
    public double startJd() {
        return start;
    }

    /** @return the last Julian date covered, TDB */
    public double endJd() {
        return end;
    }

    /** @return the file */
    public Path path() {
        return path;
    }

    /**
     * @param name a header constant name (AU, EMRAT, GM1 …)
     * @return its value
     * @throws IllegalArgumentException when the file has no such constant
     */
    public double constant(String name) {
        Double v = constants.get(name);
        if (v == null) {
            throw fail("no constant " + name);
        }
        return v;
    }

    /** @return whether the file carries the item (e.g. 13, TT−TDB, is in DE430 and later only) */
    public boolean has(int item) {
        return pointers[item][1] > 0 && pointers[item][2] > 0;
    }

    /**
     * Evaluates one item: position-like components and their rates per day.
     *
     * @param item JPL item number
     * @param jd1 first part of the Julian date, TDB
     * @param jd2 second part
     * @param out receives components then their rates (2 × components values)
     */
    public void evaluate(int item, double jd1, double jd2, double[] out) {
        int[] p = pointers[item];
        if (!has(item)) {
            throw fail("has no data for item " + item);
        }
        double fromStart = (jd1 - start) + jd2;
        if (!(fromStart >= 0 && fromStart <= end - start)) {
            throw fail(String.format(java.util.Locale.ROOT, "time JD %.5f TDB is outside its span JD %.1f .. %.1f",
                    jd1 + jd2, start, end));
        }
        int rec = (int) Math.floor(fromStart / step);
        if (rec >= records) {
            rec = records - 1;
        }
        ByteBuffer data = segments[rec / recordsPerSegment];
        int recordStart = recordBytes * (rec % recordsPerSegment);
        double inRecord = fromStart - rec * step;
        int ncf = p[1];
        int nsub = p[2];
        double subLength = step / nsub;
        int sub = Math.min((int) Math.floor(inRecord / subLength), nsub - 1);
        double x = 2 * (inRecord - sub * subLength) / subLength - 1;
        int ncomp = components(item);
        int coeffStart = recordStart + 8 * (p[0] - 1 + sub * ncf * ncomp);
        // Chebyshev T_k(x) and T'_k(x) by their recurrences.
        double[] t = new double[ncf];
        double[] d = new double[ncf];
        t[0] = 1;
        d[0] = 0;
        if (ncf > 1) {
            t[1] = x;
            d[1] = 1;
        }
        for (int k = 2; k < ncf; k++) {
            t[k] = 2 * x * t[k - 1] - t[k - 2];
            d[k] = 2 * t[k - 1] + 2 * x * d[k - 1] - d[k - 2];
        }
        double scale = 2 / subLength;
        for (int c = 0; c < ncomp; c++) {
            double pos = 0;
            double vel = 0;
            int at = coeffStart + 8 * c * ncf;
            for (int k = ncf - 1; k >= 0; k--) {
                double coeff = data.getDouble(at + 8 * k);
                pos += coeff * t[k];
                vel += coeff * d[k];
            }
            out[c] = pos;
            out[ncomp + c] = vel * scale;
        }
    }
}
