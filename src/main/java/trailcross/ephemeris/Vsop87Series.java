package trailcross.ephemeris;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import trailcross.frames.EclipticFrame;

/**
 * The complete VSOP87B planetary theory (Bretagnon &amp; Francou 1988, A&amp;A 202, 309): heliocentric
 * spherical coordinates L, B, R of Mercury … Neptune (the Earth itself, not the Earth–Moon barycentre),
 * VSOP87 ecliptic and equinox J2000, as Poisson series in T = Julian millennia (TDB) from J2000.0.
 * Velocities come from the analytic derivative of the series.
 *
 * <p>Positions are rotated into the ICRF with VSOP87's published VSOP87→FK5 rotation (Bretagnon &amp;
 * Francou 1988, the matrix given with the VSOP87 files), then into trailcross's ecliptic J2000 by ε0.
 * The coefficients are the resource {@code vsop87b.txt}, converted by {@code tools/Vsop87Convert.java}.
 */
public final class Vsop87Series {

    /** The planets of VSOP87B, in the resource's order. */
    public static final Body[] PLANETS = {
        Body.MERCURY, Body.VENUS, Body.EARTH, Body.MARS, Body.JUPITER, Body.SATURN, Body.URANUS, Body.NEPTUNE
    };

    private static final double DAYS_PER_MILLENNIUM = 365250.0;

    /** VSOP87 ecliptic J2000 → FK5 equatorial J2000 (Bretagnon &amp; Francou 1988). */
    private static final double[][] VSOP_TO_FK5 = {
        {1.000000000000, 0.000000440360, -0.000000190919},
        {-0.000000479966, 0.917482137087, -0.397776982902},
        {0.000000000000, 0.397776982902, 0.917482137087},
    };

    /** VSOP87 ecliptic → trailcross ecliptic (ICRF rotated by ε0): R_x(ε0) · VSOP_TO_FK5. */
    private static final double[] ROTATION = combinedRotation();

    /** terms[planet][coordinate L,B,R][power] = {A0, B0, C0, A1, B1, C1, ...}. */
    private final double[][][][] terms;

    private static final class Holder {
        static final Vsop87Series INSTANCE = load();
    }

    private Vsop87Series(double[][][][] terms) {
        this.terms = terms;
    }

    /** @return the series, read from the resource on first use */
    public static Vsop87Series get() {
        return Holder.INSTANCE;
    }

    /** @return the number of terms of all planets and coordinates */
    public int termCount() {
        int n = 0;
        for (double[][][] p : terms) {
            for (double[][] c : p) {
                for (double[] s : c) {
                    n += s.length / 3;
                }
            }
        }
        return n;
    }

    /**
     * @param body a planet of {@link #PLANETS}
     * @return its index in {@link #PLANETS}
     */
    public static int indexOf(Body body) {
        for (int k = 0; k < PLANETS.length; k++) {
            if (PLANETS[k] == body) {
                return k;
            }
        }
        throw new IllegalArgumentException(body.key() + " is not a VSOP87 planet");
    }

    /**
     * The heliocentric state of a planet in trailcross's ecliptic J2000.
     *
     * @param planet index into {@link #PLANETS}
     * @param t TDB days since J2000
     * @param out receives x, y, z and, when {@code withVelocity}, vx, vy, vz (au, au/d)
     * @param withVelocity whether to sum the derivative series too
     */
    public void heliocentric(int planet, double t, double[] out, boolean withVelocity) {
        double tau = t / DAYS_PER_MILLENNIUM;
        double[] lbr = new double[6];
        for (int c = 0; c < 3; c++) {
            // Horner in tau over the powers alpha, with the derivative carried alongside:
            // d/dtau sum tau^a S_a(tau) = sum a tau^(a-1) S_a + sum tau^a S'_a.
            double value = 0;
            double polyRate = 0;
            double termRate = 0;
            double[][] powers = terms[planet][c];
            for (int alpha = powers.length - 1; alpha >= 0; alpha--) {
                double[] s = powers[alpha];
                double sum = 0;
                double dsum = 0;
                if (withVelocity) {
                    for (int k = 0; k < s.length; k += 3) {
                        double arg = s[k + 1] + s[k + 2] * tau;
                        sum += s[k] * Math.cos(arg);
                        dsum -= s[k] * s[k + 2] * Math.sin(arg);
                    }
                } else {
                    for (int k = 0; k < s.length; k += 3) {
                        sum += s[k] * Math.cos(s[k + 1] + s[k + 2] * tau);
                    }
                }
                polyRate = polyRate * tau + value;
                value = value * tau + sum;
                termRate = termRate * tau + dsum;
            }
            lbr[c] = value;
            lbr[c + 3] = (polyRate + termRate) / DAYS_PER_MILLENNIUM;
        }
        toCartesian(lbr, out, withVelocity);
    }

    /**
     * A planet's heliocentric positions on a lattice of times t = start + j·step + offsets[i] (j &lt; count), as
     * {@link #heliocentric} gives them without velocity, but with each term's cosine carried from one row of
     * the lattice to the next by a rotation through C·step (the angle-addition recurrence, one complex product
     * per term and time instead of a cosine; Press et al. 2007, Numerical Recipes, 5.4 and 5.5), from its
     * exact value at row 0. Over 32 rows the rotations' rounding stays near 1e-15 of each term. A lattice's
     * values depend only on its start, step, rows and offsets.
     *
     * @param planet index into {@link #PLANETS}
     * @param start the lattice's first row, TDB days since J2000
     * @param step days between rows
     * @param count rows
     * @param offsets offsets within a row, days
     * @param out receives x, y, z of time (j, i) at {@code out[j * offsets.length + i]} (each of length ≥ 3)
     */
    public void positionsOnLattice(int planet, double start, double step, int count, double[] offsets, double[][] out) {
        int width = offsets.length;
        int points = count * width;
        double[][] lbr = new double[3][points];
        double[] sum = new double[points];
        double[] cosine = new double[width];
        double[] sine = new double[width];
        for (int c = 0; c < 3; c++) {
            double[][] powers = terms[planet][c];
            double[] value = lbr[c];
            for (int alpha = powers.length - 1; alpha >= 0; alpha--) {
                java.util.Arrays.fill(sum, 0.0);
                double[] s = powers[alpha];
                for (int k = 0; k < s.length; k += 3) {
                    double amplitude = s[k];
                    double rate = s[k + 2] / DAYS_PER_MILLENNIUM;
                    for (int i = 0; i < width; i++) {
                        double arg = s[k + 1] + rate * (start + offsets[i]);
                        cosine[i] = amplitude * Math.cos(arg);
                        sine[i] = amplitude * Math.sin(arg);
                    }
                    double rc = Math.cos(rate * step);
                    double rs = Math.sin(rate * step);
                    for (int j = 0, p = 0; j < count; j++) {
                        for (int i = 0; i < width; i++, p++) {
                            double x = cosine[i];
                            double y = sine[i];
                            sum[p] += x;
                            cosine[i] = x * rc - y * rs;
                            sine[i] = y * rc + x * rs;
                        }
                    }
                }
                // Horner in tau over the powers, as in heliocentric.
                for (int j = 0, p = 0; j < count; j++) {
                    for (int i = 0; i < width; i++, p++) {
                        double tau = (start + j * step + offsets[i]) / DAYS_PER_MILLENNIUM;
                        value[p] = value[p] * tau + sum[p];
                    }
                }
            }
        }
        double[] one = new double[6];
        for (int p = 0; p < points; p++) {
            one[0] = lbr[0][p];
            one[1] = lbr[1][p];
            one[2] = lbr[2][p];
            toCartesian(one, out[p], false);
        }
    }

    private static void toCartesian(double[] lbr, double[] out, boolean withVelocity) {
        double l = lbr[0];
        double b = lbr[1];
        double r = lbr[2];
        double cl = Math.cos(l);
        double sl = Math.sin(l);
        double cb = Math.cos(b);
        double sb = Math.sin(b);
        double x = r * cb * cl;
        double y = r * cb * sl;
        double z = r * sb;
        double[] m = ROTATION;
        out[0] = m[0] * x + m[1] * y + m[2] * z;
        out[1] = m[3] * x + m[4] * y + m[5] * z;
        out[2] = m[6] * x + m[7] * y + m[8] * z;
        if (withVelocity) {
            double dl = lbr[3];
            double db = lbr[4];
            double dr = lbr[5];
            double vx = dr * cb * cl - r * sb * db * cl - r * cb * sl * dl;
            double vy = dr * cb * sl - r * sb * db * sl + r * cb * cl * dl;
            double vz = dr * sb + r * cb * db;
            out[3] = m[0] * vx + m[1] * vy + m[2] * vz;
            out[4] = m[3] * vx + m[4] * vy + m[5] * vz;
            out[5] = m[6] * vx + m[7] * vy + m[8] * vz;
        }
    }

    private static double[] combinedRotation() {
        double[] m = new double[9];
        for (int col = 0; col < 3; col++) {
            double[] v = {VSOP_TO_FK5[0][col], VSOP_TO_FK5[1][col], VSOP_TO_FK5[2][col]};
            EclipticFrame.toEcliptic(v, 0);
            m[col] = v[0];
            m[3 + col] = v[1];
            m[6 + col] = v[2];
        }
        return m;
    }

    private static Vsop87Series load() {
        String resource = "/trailcross/ephemeris/vsop87b.txt";
        double[][][][] terms = new double[PLANETS.length][3][][];
        try (InputStream in = Vsop87Series.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("resource " + resource + " is missing from the build");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII), 1 << 16);
            int planet = -1;
            double[][][] series = new double[3][6][];
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (line.startsWith("planet ")) {
                    planet++;
                    String name = line.substring(7).trim();
                    if (!PLANETS[planet].key().equals(name)) {
                        throw new IllegalStateException("vsop87b.txt: expected " + PLANETS[planet].key() + ", found " + name);
                    }
                    series = new double[3][][];
                    terms[planet] = series;
                    continue;
                }
                String[] head = line.split(" ");
                int coord = "LBR".indexOf(head[1].charAt(0));
                int alpha = Integer.parseInt(head[2]);
                int count = Integer.parseInt(head[3]);
                if (series[coord] == null) {
                    series[coord] = new double[0][];
                }
                if (series[coord].length <= alpha) {
                    series[coord] = java.util.Arrays.copyOf(series[coord], alpha + 1);
                }
                double[] s = new double[3 * count];
                for (int k = 0; k < count; k++) {
                    String t = r.readLine();
                    int a = t.indexOf(' ');
                    int b = t.indexOf(' ', a + 1);
                    s[3 * k] = Double.parseDouble(t.substring(0, a));
                    s[3 * k + 1] = Double.parseDouble(t.substring(a + 1, b));
                    s[3 * k + 2] = Double.parseDouble(t.substring(b + 1));
                }
                series[coord][alpha] = s;
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + resource, e);
        }
        for (double[][][] p : terms) {
            for (int c = 0; c < 3; c++) {
                for (int a = 0; a < p[c].length; a++) {
                    if (p[c][a] == null) {
                        p[c][a] = new double[0];
                    }
                }
            }
        }
        return new Vsop87Series(terms);
    }
}
