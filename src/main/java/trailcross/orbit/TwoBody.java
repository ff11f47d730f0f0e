package trailcross.orbit;

/**
 * Two-body propagation by universal variables with Lagrange's f and g functions (Danby 1988, §6.9;
 * Battin 1999, §4.5). One formulation serves ellipses, parabolas and hyperbolas alike. Kepler's
 * equation in the universal anomaly s, F(s) = r0 s c1 + η0 s² c2 + μ s³ c3 − Δt = 0, has F′(s) = r > 0,
 * so it is solved by Laguerre–Conway iterations (Conway 1986) kept inside a bracket, falling back to
 * bisection: convergence is guaranteed for any eccentricity and any Δt.
 */
public final class TwoBody {

    private static final int MAX_ITERATIONS = 200;

    private TwoBody() {
    }

    /**
     * Propagates a state over Δt.
     *
     * @param state the state at t0: {x, y, z, vx, vy, vz}, not changed
     * @param dt Δt = t − t0, in the time unit of {@code gm}
     * @param gm the central body's gravitational parameter
     * @param out receives the state at t (may be {@code state} itself)
     */
    public static void propagate(double[] state, double dt, double gm, double[] out) {
        double x = state[0];
        double y = state[1];
        double z = state[2];
        double vx = state[3];
        double vy = state[4];
        double vz = state[5];
        double r0 = Math.sqrt(x * x + y * y + z * z);
        double eta0 = x * vx + y * vy + z * vz;
        double v2 = vx * vx + vy * vy + vz * vz;
        double beta = 2 * gm / r0 - v2;

        double t = dt;
        if (beta > 0) {
            // Whole revolutions change nothing: reduce Δt to less than half a period.
            double period = 2 * Math.PI * gm / (beta * Math.sqrt(beta));
            t = dt - Math.rint(dt / period) * period;
        }
        double[] c = new double[4];
        double s = solve(r0, eta0, beta, gm, t, c);
        Stumpff.evaluate(beta * s * s, c);
        double s2c2 = s * s * c[2];
        double r = r0 * c[0] + eta0 * s * c[1] + gm * s2c2;
        double f = 1 - gm * s2c2 / r0;
        double g = t - gm * s * s * s * c[3];
        double fdot = -gm * s * c[1] / (r * r0);
        double gdot = 1 - gm * s2c2 / r;
        out[0] = f * x + g * vx;
        out[1] = f * y + g * vy;
        out[2] = f * z + g * vz;
        out[3] = fdot * x + gdot * vx;
        out[4] = fdot * y + gdot * vy;
        out[5] = fdot * z + gdot * vz;
    }

    /**
     * Solves the universal Kepler equation for s.
     */
    private static double solve(double r0, double eta0, double beta, double gm, double dt, double[] c) {
        if (dt == 0) {
            return 0;
        }
        // Bracket the root: F(0) = −Δt and F is increasing.
        double lo;
        double hi;
        double guess = dt / r0;
        if (dt > 0) {
            lo = 0;
            hi = guess;
            while (kepler(hi, r0, eta0, beta, gm, dt, c) < 0) {
                lo = hi;
                hi *= 2;
            }
        } else {
            hi = 0;
            lo = guess;
            while (kepler(lo, r0, eta0, beta, gm, dt, c) > 0) {
                hi = lo;
                lo *= 2;
            }
        }
        double s = Math.min(Math.max(guess, lo), hi);
        for (int k = 0; k < MAX_ITERATIONS; k++) {
            Stumpff.evaluate(beta * s * s, c);
            double f = r0 * s * c[1] + eta0 * s * s * c[2] + gm * s * s * s * c[3] - dt;
            double fp = r0 * c[0] + eta0 * s * c[1] + gm * s * s * c[2];
            double fpp = (gm - beta * r0) * s * c[1] + eta0 * c[0];
            if (f == 0) {
                return s;
            }
            if (Double.isNaN(f) || Double.isNaN(fp)) {
                // Overflow far beyond the root of a hyperbolic orbit: shrink the bracket towards zero.
                if (s > 0) {
                    hi = s;
                } else {
                    lo = s;
                }
                s = 0.5 * (lo + hi);
                continue;
            }
            if (f < 0) {
                lo = s;
            } else {
                hi = s;
            }
            // Laguerre–Conway step with n = 5.
            double disc = Math.abs(16 * fp * fp - 20 * f * fpp);
            double denom = fp + Math.copySign(Math.sqrt(disc), fp);
            double next = s - 5 * f / denom;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - s) <= 2e-16 * Math.abs(next) || next == lo || next == hi) {
                return next;
            }
            s = next;
        }
        return s;
    }

    private static double kepler(double s, double r0, double eta0, double beta, double gm, double dt,
            double[] c) {
        Stumpff.evaluate(beta * s * s, c);
        return r0 * s * c[1] + eta0 * s * s * c[2] + gm * s * s * s * c[3] - dt;
    }
}
