package trailcross.encounter;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import trailcross.dynamics.DenseStep;
import trailcross.dynamics.StepHandler;

/**
 * Finds a particle's passages through the Earth's orbital plane, inside a target window and within a
 * band of heliocentric distance around the Earth's orbit, as roots of n·x(t) on each integrator step's
 * dense output (Brent's method, Hipparchus) — no re-integration. Each step is searched on four
 * sub-intervals, so that a step spanning more than one passage is not missed. One finder per particle.
 */
public final class CrossingFinder implements StepHandler {

    /** Sub-intervals searched per step. */
    private static final int SUBDIVISIONS = 4;

    private final double[] normal;
    private final double windowStart;
    private final double windowEnd;
    private final double rMin;
    private final double rMax;
    private final long id;
    private final double returnT;
    private final double weight;
    private final double massKg;
    private final double initialPeriod;
    private final List<NodeCrossing> found = new ArrayList<>();
    private final double[] s = new double[6];
    private final BrentSolver solver = new BrentSolver(1e-12);

    /**
     * @param normal unit normal of the Earth's orbital plane (ecliptic J2000 axes)
     * @param windowStart first instant of interest, TDB days since J2000
     * @param windowEnd last instant of interest
     * @param rMin least heliocentric distance kept, au
     * @param rMax greatest heliocentric distance kept, au
     * @param id the particle's id
     * @param returnT the particle's return
     * @param weight its weight
     * @param massKg its mass
     * @param initialPeriod its orbital period at ejection, days
     */
    public CrossingFinder(double[] normal, double windowStart, double windowEnd, double rMin, double rMax, long id,
            double returnT, double weight, double massKg, double initialPeriod) {
        this.normal = normal.clone();
        this.windowStart = windowStart;
        this.windowEnd = windowEnd;
        this.rMin = rMin;
        this.rMax = rMax;
        this.id = id;
        this.returnT = returnT;
        this.weight = weight;
        this.massKg = massKg;
        this.initialPeriod = initialPeriod;
    }

    @Override
    public void handle(DenseStep step) {
        double a = Math.min(step.start(), step.end());
        double b = Math.max(step.start(), step.end());
        if (b < windowStart || a > windowEnd) {
            return;
        }
        double lo = Math.max(a, windowStart);
        double hi = Math.min(b, windowEnd);
        double h = (hi - lo) / SUBDIVISIONS;
        double t0 = lo;
        double f0 = height(step, t0);
        for (int k = 1; k <= SUBDIVISIONS; k++) {
            double t1 = k == SUBDIVISIONS ? hi : lo + h * k;
            double f1 = height(step, t1);
            // A root at t1 itself is taken by the next interval (f0 == 0 there), so each is found once.
            if (f0 == 0 || f0 * f1 < 0) {
                double t = f0 == 0 ? t0 : solver.solve(100, x -> height(step, x), t0, t1);
                if (t < hi || hi == windowEnd) {
                    record(step, t);
                }
            }
            t0 = t1;
            f0 = f1;
        }
    }

    private void record(DenseStep step, double t) {
        double[] st = new double[6];
        step.state(t, st);
        double r = Math.sqrt(st[0] * st[0] + st[1] * st[1] + st[2] * st[2]);
        if (r < rMin || r > rMax) {
            return;
        }
        double vn = normal[0] * st[3] + normal[1] * st[4] + normal[2] * st[5];
        for (NodeCrossing c : found) {
            if (Math.abs(c.t() - t) < 1e-9) {
                return;
            }
        }
        found.add(new NodeCrossing(id, returnT, weight, massKg, initialPeriod, t, st, vn > 0));
    }

    private double height(DenseStep step, double t) {
        step.state(t, s);
        return normal[0] * s[0] + normal[1] * s[1] + normal[2] * s[2];
    }

    /** @return the passages found so far, in the order found */
    public List<NodeCrossing> crossings() {
        return List.copyOf(found);
    }
}
