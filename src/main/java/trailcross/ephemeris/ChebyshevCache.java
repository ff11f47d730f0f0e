package trailcross.ephemeris;

import java.util.concurrent.atomic.AtomicReferenceArray;

/**
 * A fast stand-in for a slow ephemeris: each body's heliocentric position is fitted, block by block, by a
 * Chebyshev series on Chebyshev–Gauss nodes (the interpolation JPL's own ephemerides use; Newhall 1989,
 * Celest. Mech. 45, 305), and velocities are the derivative of the fit. Blocks are fitted lazily on first
 * use, thread-safely (a block computed twice by two threads is the same block), and kept.
 *
 * <p>Fitted items: the eight planets (the Earth as the Earth–Moon barycentre, which is smooth) and the
 * geocentric Moon; the Earth and the Moon follow from those two with EMRAT, the Sun's barycentric offset
 * from the planets' masses. Block lengths and degrees per item were chosen so that the fit stays within
 * 1e-10 au of the source everywhere (measured in the tests).
 */
public final class ChebyshevCache implements Ephemeris {

    /** Bound on the fit's error against its source, au (measured in the tests, 5e-11): adjacent blocks differ by at most twice it. */
    public static final double FIT_BOUND_AU = 1e-10;

    /** The fitted items, in order; {@link #MOON_ITEM} is the geocentric Moon. */
    private static final Body[] ITEMS = {
        Body.MERCURY, Body.VENUS, Body.EARTH_MOON_BARYCENTRE, Body.MARS, Body.JUPITER, Body.SATURN,
        Body.URANUS, Body.NEPTUNE, Body.MOON
    };
    private static final int MOON_ITEM = 8;
    private static final int EMB_ITEM = 2;
    /** Block length in days, per item. */
    private static final double[] LENGTH = {16, 32, 8, 32, 32, 32, 32, 16, 8};
    /** Number of Chebyshev coefficients per component, per item. */
    private static final int[] COEFFS = {14, 13, 12, 13, 14, 14, 14, 13, 15};
    /** The largest entry of {@link #COEFFS}, the size of the scratch array of T_k. */
    private static final int MAX_COEFFS = 15;

    /** The bodies of {@link #heliocentricAll}, in its output order. */
    public static final Body[] ALL = {
        Body.MERCURY, Body.VENUS, Body.EARTH, Body.MOON, Body.MARS, Body.JUPITER, Body.SATURN, Body.URANUS,
        Body.NEPTUNE
    };

    private static final double MOON_FRACTION = 1 / (1 + Body.Constants.EMRAT);

    private final Ephemeris source;
    private final double origin;
    private final double last;
    private final AtomicReferenceArray<double[]>[] blocks;
    private final double[][] nodes;
    private final double[][][] cosines;
    private final double massTotal;
    /** The last block of each item (the span's last instant belongs to it, not to the block after). */
    private final int[] lastIndex = new int[ITEMS.length];

    /**
     * @param source the ephemeris to fit (its span becomes this cache's span)
     */
    @SuppressWarnings("unchecked")
    public ChebyshevCache(Ephemeris source) {
        this.source = source;
        this.origin = source.firstDay();
        // Whole blocks only, so that every fitting node lies inside the source's span.
        double whole = Double.POSITIVE_INFINITY;
        for (double len : LENGTH) {
            whole = Math.min(whole, Math.floor((source.lastDay() - origin) / len) * len);
        }
        this.last = origin + whole;
        for (int i = 0; i < ITEMS.length; i++) {
            lastIndex[i] = (int) Math.round(whole / LENGTH[i]) - 1;
        }
        blocks = new AtomicReferenceArray[ITEMS.length];
        nodes = new double[ITEMS.length][];
        cosines = new double[ITEMS.length][][];
        for (int i = 0; i < ITEMS.length; i++) {
            int count = (int) Math.ceil((last - origin) / LENGTH[i]) + 1;
            blocks[i] = new AtomicReferenceArray<>(count);
            int n = COEFFS[i];
            nodes[i] = new double[n];
            cosines[i] = new double[n][n];
            for (int j = 0; j < n; j++) {
                double theta = Math.PI * (j + 0.5) / n;
                nodes[i][j] = Math.cos(theta);
                for (int k = 0; k < n; k++) {
                    cosines[i][k][j] = Math.cos(k * theta);
                }
            }
        }
        double m = Body.SUN.gm();
        for (Body b : Body.MASSIVE_PLANETS) {
            m += b.gm();
        }
        massTotal = m;
    }

    @Override
    public double discontinuityAu() {
        return 2 * FIT_BOUND_AU;
    }

    @Override
    public String name() {
        return source.name() + ", Chebyshev cache";
    }

    @Override
    public double firstDay() {
        return origin;
    }

    @Override
    public double lastDay() {
        return last;
    }

    @Override
    public void heliocentric(Body body, double t, double[] out) {
        checkSpan(t);
        switch (body) {
            case SUN -> java.util.Arrays.fill(out, 0, 6, 0.0);
            case EARTH, MOON -> {
                double[] pair = new double[12];
                double[] tk = new double[MAX_COEFFS];
                evaluate(EMB_ITEM, t, pair, 0, tk, 6);
                evaluate(MOON_ITEM, t, pair, 6, tk, 6);
                splitEarthMoon(pair, 0, 6, 6);
                System.arraycopy(pair, body == Body.EARTH ? 0 : 6, out, 0, 6);
            }
            default -> evaluate(itemOf(body), t, out, 0, new double[MAX_COEFFS], 6);
        }
    }

    /**
     * The heliocentric states of every body of {@link #ALL} at once, the call a force model makes each step.
     *
     * @param t TDB days since J2000
     * @param out receives 6 numbers per body, in the order of {@link #ALL} (length ≥ 54)
     */
    public void heliocentricAll(double t, double[] out) {
        allBodies(t, out, 6);
    }

    /**
     * The heliocentric positions (no velocities) of every body of {@link #ALL}: what a force model needs,
     * at half the cost of {@link #heliocentricAll}.
     *
     * @param t TDB days since J2000
     * @param out receives 3 numbers per body, in the order of {@link #ALL} (length ≥ 27)
     */
    public void heliocentricPositionsAll(double t, double[] out) {
        allBodies(t, out, 3);
    }

    /** Every body of {@link #ALL}, {@code width} numbers each (3: positions, 6: states). */
    private void allBodies(double t, double[] out, int width) {
        checkSpan(t);
        double[] tk = new double[MAX_COEFFS];
        evaluate(0, t, out, 0, tk, width);
        evaluate(1, t, out, width, tk, width);
        evaluate(EMB_ITEM, t, out, 2 * width, tk, width);
        evaluate(MOON_ITEM, t, out, 3 * width, tk, width);
        splitEarthMoon(out, 2 * width, 3 * width, width);
        for (int i = 3; i < 8; i++) {
            evaluate(i, t, out, width * (i + 1), tk, width);
        }
    }

    /**
     * Turns the Earth–Moon barycentre at {@code emb} and the geocentric Moon at {@code moon} into the
     * heliocentric Earth and Moon, in place: Earth = EMB − Moon/(1 + EMRAT), Moon = EMB + Moon·EMRAT/(1 + EMRAT).
     */
    private static void splitEarthMoon(double[] v, int emb, int moon, int width) {
        for (int k = 0; k < width; k++) {
            double b = v[emb + k];
            double m = v[moon + k];
            v[emb + k] = b - MOON_FRACTION * m;
            v[moon + k] = b + (1 - MOON_FRACTION) * m;
        }
    }

    @Override
    public void sunBarycentric(double t, double[] out) {
        checkSpan(t);
        double[] s = new double[6];
        double[] tk = new double[MAX_COEFFS];
        java.util.Arrays.fill(out, 0, 6, 0.0);
        for (int i = 0; i < 8; i++) {
            evaluate(i, t, s, 0, tk, 6);
            double w = ITEMS[i].gm() / massTotal;
            for (int k = 0; k < 6; k++) {
                out[k] -= w * s[k];
            }
        }
    }

    private static int itemOf(Body body) {
        for (int i = 0; i < MOON_ITEM; i++) {
            if (ITEMS[i] == body) {
                return i;
            }
        }
        throw new AssertionError(body);
    }

    /**
     * Position (width 3) or position and velocity (width 6) of item i at t, from its block's Chebyshev
     * series: T_k(x) once, then dot products with the position coefficients and, for velocities, with the
     * derivative's coefficients stored with the block.
     */
    private void evaluate(int i, double t, double[] out, int offset, double[] tk, int width) {
        double[] c = block(i, t, tk);
        int n = COEFFS[i];
        double px = 0;
        double py = 0;
        double pz = 0;
        for (int k = 0, j = 0; k < n; k++, j += 6) {
            double tv = tk[k];
            px += c[j] * tv;
            py += c[j + 1] * tv;
            pz += c[j + 2] * tv;
        }
        out[offset] = px;
        out[offset + 1] = py;
        out[offset + 2] = pz;
        if (width == 6) {
            double vx = 0;
            double vy = 0;
            double vz = 0;
            for (int k = 0, j = 3; k < n; k++, j += 6) {
                double tv = tk[k];
                vx += c[j] * tv;
                vy += c[j + 1] * tv;
                vz += c[j + 2] * tv;
            }
            out[offset + 3] = vx;
            out[offset + 4] = vy;
            out[offset + 5] = vz;
        }
    }

    /**
     * The coefficients of item i's block containing t, with T_0(x) … T_{n−1}(x) of t's position in the
     * block written into tk.
     */
    private double[] block(int i, double t, double[] tk) {
        double length = LENGTH[i];
        int index = Math.min((int) ((t - origin) / length), lastIndex[i]);
        double[] c = blocks[i].get(index);
        if (c == null) {
            c = fit(i, index);
        }
        int n = COEFFS[i];
        double x = 2 * (t - origin - index * length) / length - 1;
        double x2 = 2 * x;
        tk[0] = 1;
        tk[1] = x;
        for (int k = 2; k < n; k++) {
            tk[k] = x2 * tk[k - 1] - tk[k - 2];
        }
        return c;
    }

    private double[] fit(int i, int index) {
        int n = COEFFS[i];
        double length = LENGTH[i];
        double start = origin + index * length;
        double[][] values = new double[n][3];
        for (int j = 0; j < n; j++) {
            double t = start + 0.5 * length * (nodes[i][j] + 1);
            if (i == MOON_ITEM) {
                source.moonGeocentricPosition(t, values[j]);
            } else {
                source.heliocentricPosition(ITEMS[i], t, values[j]);
            }
        }
        double[] c = new double[6 * n];
        for (int comp = 0; comp < 3; comp++) {
            for (int k = 0; k < n; k++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    sum += values[j][comp] * cosines[i][k][j];
                }
                c[comp * n + k] = (k == 0 ? 1.0 : 2.0) * sum / n;
            }
            // Derivative series: d_{k-1} = d_{k+1} + 2 k c_k (d_n = d_{n+1} = 0), d_0 halved; then d/dt = (2/L) d/dx.
            int v = (3 + comp) * n;
            double next = 0;
            double nextNext = 0;
            for (int k = n - 1; k >= 1; k--) {
                double d = nextNext + 2 * k * c[comp * n + k];
                c[v + k - 1] = d;
                nextNext = next;
                next = d;
            }
            c[v + n - 1] = 0;
            c[v] *= 0.5;
            for (int k = 0; k < n; k++) {
                c[v + k] *= 2 / length;
            }
        }
        // Interleave as {px, py, pz, vx, vy, vz} per k, the order evaluate() reads them in.
        double[] interleaved = new double[6 * n];
        for (int m = 0; m < 6; m++) {
            for (int k = 0; k < n; k++) {
                interleaved[6 * k + m] = c[m * n + k];
            }
        }
        c = interleaved;
        if (blocks[i].compareAndSet(index, null, c)) {
            return c;
        }
        return blocks[i].get(index);
    }
}
