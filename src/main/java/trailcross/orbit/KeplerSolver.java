package trailcross.orbit;

import org.hipparchus.util.FastMath;

/**
 * Solutions of Kepler's equation in its classical forms, for the cases where a caller has a mean
 * anomaly rather than a time (elements from catalogues, tables of mean anomaly):
 * <ul>
 *   <li>elliptic, M = E − e sin E: Newton–Raphson from the starter E0 = M + 0.85 e sign(sin M)
 *       (Danby 1988, §6.6), guarded by a bracket of width 2e around M, robust to e → 1;</li>
 *   <li>hyperbolic, M = e sinh H − H: Newton–Raphson from the upper end of a bracket
 *       [asinh(M/e), …], where the convex equation converges monotonically, robust for large |M|;</li>
 *   <li>parabolic, Barker's equation W = 3 s + s³ with s = tan(ν/2), solved in closed form
 *       (Meeus 1998, "Astronomical Algorithms", ch. 34).</li>
 * </ul>
 * Two-body propagation from a state uses {@link TwoBody} instead, whose universal variable has no
 * singularity at e = 1.
 */
public final class KeplerSolver {

    private static final int MAX_ITERATIONS = 100;

    private KeplerSolver() {
    }

    /**
     * @param meanAnomaly M in radians (any value)
     * @param e eccentricity, 0 ≤ e &lt; 1
     * @return the eccentric anomaly E with the same number of whole turns as M
     */
    public static double eccentricAnomaly(double meanAnomaly, double e) {
        double turns = Math.floor(meanAnomaly / (2 * Math.PI) + 0.5);
        double m = meanAnomaly - turns * 2 * Math.PI; // in [−π, π)
        // E − M = e sin E, so E lies within e of M, and on the same side of 0 as M.
        double lo = m >= 0 ? m : m - e;
        double hi = m >= 0 ? m + e : m;
        double ecc = m + 0.85 * e * Math.signum(Math.sin(m));
        ecc = Math.min(Math.max(ecc, lo), hi);
        for (int k = 0; k < MAX_ITERATIONS; k++) {
            double f = ecc - e * Math.sin(ecc) - m;
            if (f == 0) {
                break;
            }
            if (f < 0) {
                lo = ecc;
            } else {
                hi = ecc;
            }
            double next = ecc - f / (1 - e * Math.cos(ecc));
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - ecc) <= 1e-16 * Math.max(1.0, Math.abs(ecc))) {
                ecc = next;
                break;
            }
            ecc = next;
        }
        return ecc + turns * 2 * Math.PI;
    }

    /**
     * @param meanAnomaly M = e sinh H − H in radians (any value)
     * @param e eccentricity, e &gt; 1
     * @return the hyperbolic anomaly H
     */
    public static double hyperbolicAnomaly(double meanAnomaly, double e) {
        if (meanAnomaly == 0) {
            return 0;
        }
        double m = Math.abs(meanAnomaly);
        // f(H) = e sinh H − H − M is increasing for H ≥ 0; f(0) = −M and f(asinh(M/(e − 1)) + …) > 0.
        // e sinh H = M + H ≥ M bounds H below; doubling finds an upper bound.
        double lo = FastMath.asinh(m / e);
        double hi = Math.max(FastMath.asinh(m / (e - 1)), 2 * lo);
        while (e * Math.sinh(hi) - hi - m < 0) {
            hi *= 2;
        }
        double h = hi;
        for (int k = 0; k < MAX_ITERATIONS; k++) {
            double f = e * Math.sinh(h) - h - m;
            if (f == 0) {
                break;
            }
            if (f < 0) {
                lo = h;
            } else {
                hi = h;
            }
            double next = h - f / (e * Math.cosh(h) - 1);
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - h) <= 1e-16 * Math.max(1.0, h)) {
                h = next;
                break;
            }
            h = next;
        }
        return Math.copySign(h, meanAnomaly);
    }

    /**
     * Barker's equation for the parabola: tan(ν/2) from W = 3 k (t − T) / (q √(2q)) with
     * s³ + 3 s − W = 0 (Meeus 1998, eq. 34.1 and its closed-form root).
     *
     * @param w W = 3 √(μ) Δt / (q √(2 q))
     * @return s = tan(ν/2)
     */
    public static double barker(double w) {
        // s = Y − 1/Y with Y = cbrt(W/2 + sqrt(W²/4 + 1)); written to avoid cancellation for W < 0.
        double g = Math.cbrt(Math.abs(w) / 2 + Math.sqrt(w * w / 4 + 1));
        return Math.copySign(g - 1 / g, w);
    }
}
