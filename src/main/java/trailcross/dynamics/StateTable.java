package trailcross.dynamics;

/**
 * The parent's heliocentric state over a span (a return's active arc) tabulated at equal steps from its
 * {@link ParentHistory} and interpolated by cubic Hermite polynomials on positions and velocities (de Boor
 * 2001, <i>A Practical Guide to Splines</i>, ch. IV): the velocity is the derivative of the position's
 * polynomial. A targeted cloud draws millions of candidate ejections per return, each at a random instant;
 * the history's own answer costs a search among its steps, a polynomial and the Sun's barycentric state
 * from the ephemeris, the table's a few multiplications.
 *
 * <p>The step h is {@value #STEP_FRACTION} of the orbit's shortest timescale T = r/v over the span. Cubic
 * Hermite interpolation errs by at most h⁴/384 max|x⁗| in position (de Boor, ch. IV), and x⁗ is of order
 * r/T⁴ on a Keplerian arc, so the position errs by about (h/T)⁴/384 of r and the velocity, one order lower,
 * by about (h/T)³ of v. Measured against the history on 55P's 1998 arc: 3.5e-15 au and a relative 1.0e-11
 * at worst (the tests hold it below 1e-13 au and 1e-10); a particle ejected at zero speed then stays on the
 * parent's integrated orbit to 1e-8 au after a revolution, and ejection speeds of metres per second are
 * known to a relative 1e-6.
 */
public final class StateTable {

    /** The step as a fraction of the orbit's shortest timescale r/v over the span. */
    public static final double STEP_FRACTION = 0.001;
    /** At most this many nodes (the step is widened beyond it). */
    public static final int MAX_NODES = 400_000;

    private final double start;
    private final double step;
    private final double[] nodes;
    private final int count;

    /**
     * @param history the parent's history (covering the span)
     * @param start the span's first instant, TDB days since J2000
     * @param end its last
     */
    public StateTable(ParentHistory history, double start, double end) {
        if (!(end > start)) {
            throw new IllegalArgumentException("a state table needs a span of positive length");
        }
        double[] s = new double[6];
        // The shortest timescale r/v over the span, sampled (it is smooth; its minimum is near perihelion).
        double timescale = Double.POSITIVE_INFINITY;
        int probes = 2000;
        for (int k = 0; k <= probes; k++) {
            history.stateAt(start + (end - start) * k / probes, s);
            double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
            double v = Math.sqrt(s[3] * s[3] + s[4] * s[4] + s[5] * s[5]);
            timescale = Math.min(timescale, r / v);
        }
        int intervals = (int) Math.min(MAX_NODES - 1, Math.ceil((end - start) / (STEP_FRACTION * timescale)));
        intervals = Math.max(intervals, 1);
        this.start = start;
        this.step = (end - start) / intervals;
        this.count = intervals + 1;
        this.nodes = new double[6 * count];
        for (int k = 0; k < count; k++) {
            history.stateAt(k == intervals ? end : start + k * step, s);
            System.arraycopy(s, 0, nodes, 6 * k, 6);
        }
    }

    /** @return the first instant covered, TDB days since J2000 */
    public double start() {
        return start;
    }

    /** @return the last instant covered */
    public double end() {
        return start + step * (count - 1);
    }

    /** @return the tabulation step, days */
    public double step() {
        return step;
    }

    /**
     * @param t TDB days since J2000, inside the span
     * @param out receives x, y, z, vx, vy, vz (au, au/d)
     */
    public void stateAt(double t, double[] out) {
        double x = (t - start) / step;
        if (!(x >= -1e-9 && x <= count - 1 + 1e-9)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "JD %.3f TDB is outside the tabulated span (JD %.3f .. %.3f)", t + 2451545, start + 2451545,
                    end() + 2451545));
        }
        int k = Math.min(Math.max((int) x, 0), count - 2);
        double u = x - k;
        double u2 = u * u;
        double u3 = u2 * u;
        // Hermite basis on [0, 1] and its derivative.
        double h00 = 2 * u3 - 3 * u2 + 1;
        double h10 = u3 - 2 * u2 + u;
        double h01 = -2 * u3 + 3 * u2;
        double h11 = u3 - u2;
        double d00 = (6 * u2 - 6 * u) / step;
        double d10 = 3 * u2 - 4 * u + 1;
        double d01 = -d00;
        double d11 = 3 * u2 - 2 * u;
        int a = 6 * k;
        int b = a + 6;
        for (int c = 0; c < 3; c++) {
            double p0 = nodes[a + c];
            double v0 = nodes[a + 3 + c];
            double p1 = nodes[b + c];
            double v1 = nodes[b + 3 + c];
            out[c] = h00 * p0 + h10 * step * v0 + h01 * p1 + h11 * step * v1;
            out[c + 3] = d00 * p0 + d10 * v0 + d01 * p1 + d11 * v1;
        }
    }
}
