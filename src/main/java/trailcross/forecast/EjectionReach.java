package trailcross.forecast;

import trailcross.ejection.ParticleGenerator;
import trailcross.orbit.Elements;
import trailcross.orbit.Moid;
import trailcross.orbit.StateVector;

/**
 * The least ejection speed that puts a meteoroid on an orbit meeting the Earth's on one branch, from
 * anywhere on the parent's active arc: at each of {@value #POINTS} points of the arc (evenly in true
 * anomaly between the distance limits, two-body on the parent's osculating orbit), Newton's method on the
 * branch's distance d(Δv) (gradient by central differences, the branch followed by {@link Moid#near})
 * drives d to zero along the smallest Δv; the least |Δv| over the points is the answer. β = 0 (large
 * meteoroids; radiation pressure only lowers the speed needed for some directions).
 */
public final class EjectionReach {

    /** Points along the arc. */
    public static final int POINTS = 41;
    /** Speeds above this are not pursued, m/s. */
    public static final double MAX_SPEED_M_S = 5000.0;
    private static final double H = 1e-8;

    private EjectionReach() {
    }

    /**
     * @param orbit the parent's osculating orbit
     * @param earth the Earth's orbit
     * @param branch the branch's local minimum (for the parent's orbit)
     * @param inboundAu activity limit before perihelion, au
     * @param outboundAu activity limit after perihelion, au
     * @return the least speed, m/s, or NaN when none below {@link #MAX_SPEED_M_S} is found
     */
    public static double leastSpeedMs(Elements orbit, Elements earth, Moid.Minimum branch, double inboundAu,
            double outboundAu) {
        if (branch.distance() < 1e-9) {
            return 0.0;
        }
        double nuIn = limitAnomaly(orbit, inboundAu);
        double nuOut = limitAnomaly(orbit, outboundAu);
        double best = Double.NaN;
        for (int k = 0; k < POINTS; k++) {
            double nu = -nuIn + (nuIn + nuOut) * k / (POINTS - 1);
            double v = solve(orbit, earth, branch, orbit.stateAtTrueAnomaly(nu));
            if (Double.isFinite(v) && (Double.isNaN(best) || v < best)) {
                best = v;
            }
        }
        return best;
    }

    private static double limitAnomaly(Elements el, double r) {
        if (r <= el.q()) {
            return 0;
        }
        double c = (el.p() / r - 1) / el.e();
        return c <= -1 ? (el.e() < 1 ? Math.PI : Math.acos(-1 / el.e()) - 1e-6) : Math.acos(Math.min(1, c));
    }

    private static double solve(Elements orbit, Elements earth, Moid.Minimum branch, StateVector s) {
        double[] dv = new double[3];
        double[] guess = {branch.trueAnomalyA(), branch.trueAnomalyB()};
        double max = MAX_SPEED_M_S * ParticleGenerator.M_S_TO_AU_D;
        for (int iter = 0; iter < 30; iter++) {
            double f = distance(orbit, earth, s, dv, guess, true);
            if (!Double.isFinite(f)) {
                return Double.NaN;
            }
            if (f < 1e-8) {
                return norm(dv) / ParticleGenerator.M_S_TO_AU_D;
            }
            double[] g = new double[3];
            for (int k = 0; k < 3; k++) {
                double keep = dv[k];
                dv[k] = keep + H;
                double fp = distance(orbit, earth, s, dv, guess, false);
                dv[k] = keep - H;
                double fm = distance(orbit, earth, s, dv, guess, false);
                dv[k] = keep;
                g[k] = (fp - fm) / (2 * H);
            }
            double g2 = g[0] * g[0] + g[1] * g[1] + g[2] * g[2];
            if (!(g2 > 0)) {
                return Double.NaN;
            }
            for (int k = 0; k < 3; k++) {
                dv[k] -= f * g[k] / g2;
            }
            if (norm(dv) > max) {
                return Double.NaN;
            }
        }
        return Double.NaN;
    }

    private static double distance(Elements orbit, Elements earth, StateVector s, double[] dv, double[] guess,
            boolean keep) {
        StateVector n = new StateVector(s.x(), s.y(), s.z(), s.vx() + dv[0], s.vy() + dv[1], s.vz() + dv[2]);
        Elements el = Elements.of(n, orbit.perihelionJd(), orbit.gm());
        if (!Double.isFinite(el.e()) || el.e() > 50) {
            return Double.NaN;
        }
        Moid.Minimum m = Moid.near(el, earth, guess[0], guess[1]);
        if (keep) {
            guess[0] = m.trueAnomalyA();
            guess[1] = m.trueAnomalyB();
        }
        return m.distance();
    }

    private static double norm(double[] v) {
        return Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
    }
}
