package trailcross.encounter;

import org.hipparchus.analysis.solvers.BrentSolver;
import trailcross.dynamics.DenseStep;
import trailcross.dynamics.StepHandler;

/**
 * Finds a particle's closest approach to a target inside a span on the integrator's dense output: on each
 * step (clipped to the span) the range rate (r − r_T)·(v − v_T) is sampled on {@value #SUBDIVISIONS}
 * sub-intervals, each change of sign from approaching to receding is refined by Brent's method
 * (Hipparchus), and the nearest of these minima and of the span's ends is kept. No re-integration; one
 * finder per particle.
 */
public final class ClosestApproach implements StepHandler {

    /** Sub-intervals searched per step (a step can hold more than one extremum of the range). */
    public static final int SUBDIVISIONS = 8;

    private final ApproachTarget target;
    private final double from;
    private final double to;
    private final long id;
    private final double[] p = new double[6];
    private final double[] q = new double[6];
    private final BrentSolver solver = new BrentSolver(1e-13);
    private double bestT = Double.NaN;
    private double bestD = Double.POSITIVE_INFINITY;
    private final double[] bestRel = new double[6];
    private final double[] bestState = new double[6];
    private final double probeT;
    private double[] probe;

    /**
     * @param target the target
     * @param from the span's start, TDB days since J2000
     * @param to its end
     * @param id the particle's id
     */
    public ClosestApproach(ApproachTarget target, double from, double to, long id) {
        this(target, from, to, id, Double.NaN);
    }

    /**
     * A finder that also keeps the particle's state at one instant (e.g. the parent's own closest approach,
     * to measure how far the cloud has spread there).
     *
     * @param target the target
     * @param from the span's start, TDB days since J2000
     * @param to its end
     * @param id the particle's id
     * @param probeT the instant whose state to keep (NaN: none)
     */
    public ClosestApproach(ApproachTarget target, double from, double to, long id, double probeT) {
        this.probeT = probeT;
        this.target = target;
        this.from = from;
        this.to = to;
        this.id = id;
    }

    @Override
    public void handle(DenseStep step) {
        if (probe == null && probeT >= Math.min(step.start(), step.end()) && probeT <= Math.max(step.start(), step.end())) {
            probe = new double[6];
            step.state(probeT, probe);
        }
        double lo = Math.max(Math.min(step.start(), step.end()), from);
        double hi = Math.min(Math.max(step.start(), step.end()), to);
        if (!(lo <= hi)) {
            return;
        }
        consider(step, lo);
        consider(step, hi);
        double h = (hi - lo) / SUBDIVISIONS;
        if (h <= 0) {
            return;
        }
        double t0 = lo;
        double f0 = rangeRate(step, t0);
        for (int k = 1; k <= SUBDIVISIONS; k++) {
            double t1 = k == SUBDIVISIONS ? hi : lo + h * k;
            double f1 = rangeRate(step, t1);
            if (f0 < 0 && f1 > 0) {
                consider(step, solver.solve(200, x -> rangeRate(step, x), t0, t1));
            }
            t0 = t1;
            f0 = f1;
        }
    }

    private double rangeRate(DenseStep step, double t) {
        step.state(t, p);
        target.state(t, q);
        double f = 0;
        for (int k = 0; k < 3; k++) {
            f += (p[k] - q[k]) * (p[k + 3] - q[k + 3]);
        }
        return f;
    }

    private void consider(DenseStep step, double t) {
        step.state(t, p);
        target.state(t, q);
        double dx = p[0] - q[0];
        double dy = p[1] - q[1];
        double dz = p[2] - q[2];
        double d = Math.sqrt(dx * dx + dy * dy + dz * dz);
        if (d < bestD) {
            bestD = d;
            bestT = t;
            for (int k = 0; k < 6; k++) {
                bestRel[k] = p[k] - q[k];
                bestState[k] = p[k];
            }
        }
    }

    /** @return the particle's heliocentric state at the probe instant, or null when it was not alive then */
    public double[] probe() {
        return probe == null ? null : probe.clone();
    }

    /** @return the closest approach found, or null when no step fell inside the span */
    public Approach result() {
        return Double.isNaN(bestT) ? null : new Approach(id, bestT, bestD, bestRel.clone(), bestState.clone());
    }
}
