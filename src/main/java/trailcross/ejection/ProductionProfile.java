package trailcross.ejection;

import java.util.ArrayList;
import java.util.List;
import trailcross.dynamics.ParentHistory;
import trailcross.stream.EjectionSettings;

/**
 * The parent's dust production along its active arc, Q(t) in kg/s: the stream's 1-au production times
 * r(t)^−n on the integrated history, or times the stream's production table (linear between its
 * entries). Q is held as a piecewise-linear function on nodes refined until linear interpolation is
 * within 1e-4 of the peak production, so that its integral (the dust mass of the return) and its
 * inverse cumulative distribution (the ejection times) are exact for that function.
 */
public final class ProductionProfile {

    /** Interpolation tolerance relative to the peak production. */
    private static final double TOLERANCE = 1e-4;
    private static final int INITIAL_INTERVALS = 256;
    private static final int MAX_NODES = 1 << 16;

    private final double[] t;
    private final double[] q;
    private final double[] cumulative;
    private final boolean absolute;

    private ProductionProfile(double[] t, double[] q, boolean absolute) {
        this.t = t;
        this.q = q;
        this.absolute = absolute;
        cumulative = new double[t.length];
        for (int k = 1; k < t.length; k++) {
            cumulative[k] = cumulative[k - 1] + 0.5 * (q[k] + q[k - 1]) * (t[k] - t[k - 1]);
        }
    }

    /**
     * @param history the parent's history
     * @param arc the active arc
     * @param ejection the stream's ejection settings
     * @param dustProductionKgS production at 1 au, kg/s, or null (then Q is relative and {@link #massKg()} is NaN)
     * @return the profile
     */
    public static ProductionProfile of(ParentHistory history, ActiveArc arc, EjectionSettings ejection,
            Double dustProductionKgS) {
        double q1 = dustProductionKgS == null ? 1.0 : dustProductionKgS;
        boolean absolute = dustProductionKgS != null;
        if (ejection.hasProductionTable()) {
            double[] days = ejection.productionTableDays();
            double[] rel = ejection.productionTableRelative();
            double[] tt = new double[days.length];
            double[] qq = new double[days.length];
            for (int k = 0; k < days.length; k++) {
                tt[k] = arc.perihelion() + days[k];
                qq[k] = q1 * rel[k];
            }
            return new ProductionProfile(tt, qq, absolute);
        }
        double n = ejection.productionExponent();
        double[] s = new double[6];
        java.util.function.DoubleUnaryOperator f = x -> {
            history.stateAt(x, s);
            double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
            return q1 * Math.pow(r, -n);
        };
        List<double[]> nodes = new ArrayList<>();
        double peak = 0;
        for (int k = 0; k <= INITIAL_INTERVALS; k++) {
            double x = k == INITIAL_INTERVALS ? arc.end() : arc.start() + arc.days() * k / INITIAL_INTERVALS;
            double y = f.applyAsDouble(x);
            peak = Math.max(peak, y);
            nodes.add(new double[] {x, y});
        }
        double tol = TOLERANCE * Math.max(peak, f.applyAsDouble(arc.perihelion()));
        List<double[]> refined = new ArrayList<>();
        refined.add(nodes.get(0));
        for (int k = 1; k < nodes.size(); k++) {
            refine(f, nodes.get(k - 1), nodes.get(k), tol, refined, 0);
        }
        if (refined.size() > MAX_NODES) {
            throw new IllegalStateException("production profile: " + refined.size() + " nodes");
        }
        double[] tt = new double[refined.size()];
        double[] qq = new double[refined.size()];
        for (int k = 0; k < tt.length; k++) {
            tt[k] = refined.get(k)[0];
            qq[k] = refined.get(k)[1];
        }
        return new ProductionProfile(tt, qq, absolute);
    }

    private static void refine(java.util.function.DoubleUnaryOperator f, double[] a, double[] b, double tol,
            List<double[]> out, int depth) {
        double m = 0.5 * (a[0] + b[0]);
        double ym = f.applyAsDouble(m);
        if (depth < 12 && Math.abs(ym - 0.5 * (a[1] + b[1])) > tol) {
            double[] mid = {m, ym};
            refine(f, a, mid, tol, out, depth + 1);
            refine(f, mid, b, tol, out, depth + 1);
        } else {
            out.add(b);
        }
    }

    /**
     * The ejection time of a uniform number: the inverse of the cumulative production.
     *
     * @param u uniform in [0, 1)
     * @return TDB days since J2000
     */
    public double sample(double u) {
        double target = u * cumulative[cumulative.length - 1];
        int lo = 0;
        int hi = t.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (cumulative[mid] <= target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double h = t[hi] - t[lo];
        double d = (q[hi] - q[lo]) / h;
        double rest = target - cumulative[lo];
        // ∫0^x (q_lo + d ξ) dξ = rest, in the form that stays exact as d → 0.
        double disc = Math.max(0, q[lo] * q[lo] + 2 * d * rest);
        double denom = q[lo] + Math.sqrt(disc);
        double x = denom > 0 ? 2 * rest / denom : 0;
        return t[lo] + Math.min(h, Math.max(0, x));
    }

    /** @return the dust mass shed over the arc, kg (NaN when the stream gives no dust production) */
    public double massKg() {
        return absolute ? cumulative[cumulative.length - 1] * 86400.0 : Double.NaN;
    }

    /**
     * @param time TDB days since J2000
     * @return the production there, kg/s (relative when no dust production is given), 0 outside the arc
     */
    public double production(double time) {
        if (time < t[0] || time > t[t.length - 1]) {
            return 0;
        }
        int k = java.util.Arrays.binarySearch(t, time);
        if (k >= 0) {
            return q[k];
        }
        int hi = -k - 1;
        int lo = hi - 1;
        return q[lo] + (q[hi] - q[lo]) * (time - t[lo]) / (t[hi] - t[lo]);
    }

    /** @return the number of nodes of the piecewise-linear production */
    public int nodes() {
        return t.length;
    }
}
