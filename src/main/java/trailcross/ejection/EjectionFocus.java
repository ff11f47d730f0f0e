package trailcross.ejection;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;

/**
 * A proposal for targeted ejection, defined by its acceptance in the conditions at ejection: a candidate
 * drawn from the prior (the stream's own ejection law) is kept with probability a(x), so that the kept
 * particles follow q(x) = p(x) a(x) / Z with Z = E_p[a], and each carries the importance weight p/q = Z / a
 * (adaptive importance sampling with a defensive mixture: a never falls below {@link #floor()}, so no weight
 * exceeds Z / floor; Hesterberg 1995, Technometrics 37, 185). Two things decide where a particle meets the
 * Earth's orbit, and both are known before any integration, so a rejected candidate costs only its draw:
 * <ul>
 *   <li>the orbital period at ejection P0 decides where it lies along its trail after N revolutions
 *       (McNaught &amp; Asher 1999): a shape s_P(P0) tabulated on a uniform grid and interpolated linearly
 *       (zero outside the grid and for unbound particles);</li>
 *   <li>optionally, how far inside or outside the Earth's orbit it crosses: a {@link NodeModel} predicts the
 *       delta r at the meeting from the two-body node distance of the orbit at ejection, β and P0 (the
 *       planets move a trail's neighbouring particles alike, so the differences at ejection carry through),
 *       and the shape s_R = exp(−½ (δr̂/width)²) favours particles that reach the Earth's path itself.</li>
 * </ul>
 * a = floor + (1 − floor) s_P s_R: the floor wherever s_P = 0, which {@link PeriodBand} relies on (it draws
 * only directions that reach the periods of {@link #periodSupport()}).
 *
 * @param lo the grid's first period, days
 * @param step the grid spacing, days
 * @param values the acceptance in P0 alone at the grid points, floor + (1 − floor) s_P, each in [floor, 1]
 * @param floor the acceptance everywhere off the focus (1 for the prior)
 * @param node the delta r model, or null for a focus in P0 alone
 */
public record EjectionFocus(double lo, double step, double[] values, double floor, NodeModel node)
        implements java.io.Serializable {

    /**
     * The conditions at ejection a focus looks at, computed from the particle's heliocentric state under the
     * Sun's gravity reduced by radiation pressure (μ = GM☉(1 − β)).
     *
     * @param p0 the orbital period, days (infinite when unbound)
     * @param nodeAscendingAu the two-body orbit's distance at its ascending node on the ecliptic, au (NaN when
     *     the orbit does not reach it)
     * @param nodeDescendingAu at its descending node, au
     * @param beta radiation-pressure β
     */
    public record Features(double p0, double nodeAscendingAu, double nodeDescendingAu, double beta) {

        /**
         * From the conic: p = |h|²/μ, the eccentricity vector e = v × h / μ − r̂, and the ascending node's
         * direction n̂ = ẑ × h / |ẑ × h|, so r = p / (1 ± e·n̂) at the ascending (+) and descending (−) node.
         *
         * @param state heliocentric state, ecliptic J2000 (au, au/d)
         * @param beta radiation-pressure β
         * @return the features
         */
        public static Features of(double[] state, double beta) {
            double mu = trailcross.ephemeris.Body.SUN.gm() * (1 - beta);
            double x = state[0];
            double y = state[1];
            double z = state[2];
            double vx = state[3];
            double vy = state[4];
            double vz = state[5];
            double hx = y * vz - z * vy;
            double hy = z * vx - x * vz;
            double hz = x * vy - y * vx;
            double r = Math.sqrt(x * x + y * y + z * z);
            double ex = (vy * hz - vz * hy) / mu - x / r;
            double ey = (vz * hx - vx * hz) / mu - y / r;
            double nLen = Math.hypot(hx, hy);
            double p = (hx * hx + hy * hy + hz * hz) / mu;
            double en = nLen > 0 ? (ex * -hy + ey * hx) / nLen : Double.NaN;
            double asc = 1 + en > 0 ? p / (1 + en) : Double.NaN;
            double desc = 1 - en > 0 ? p / (1 - en) : Double.NaN;
            return new Features(ParticleGenerator.periodAtEjection(state, beta), asc, desc, beta);
        }

        /**
         * @param ascending which node
         * @return the distance at that node, au
         */
        public double node(boolean ascending) {
            return ascending ? nodeAscendingAu : nodeDescendingAu;
        }
    }

    /**
     * A linear predictor of a particle's delta r where it meets the Earth's path, from its conditions at
     * ejection: δr̂ = c0 + cR (r_node − rRef) + cBeta β + cP (P0 − pRef), fitted by least squares on the
     * particles of earlier stages that came near (Apache Commons Math); its residual scatter sets, with the
     * spread of those particles' delta r, the width of the focus.
     *
     * @param ascending whether the meeting is at the ascending node
     * @param c0 delta r at the reference point, au
     * @param cR slope in the node distance at ejection
     * @param cBeta slope in β, au
     * @param cP slope in P0, au/day
     * @param rRef reference node distance, au
     * @param pRef reference period, days
     * @param width the focus' standard deviation in δr̂, au
     * @param rSquared the fit's coefficient of determination (reported)
     */
    public record NodeModel(boolean ascending, double c0, double cR, double cBeta, double cP, double rRef, double pRef,
            double width, double rSquared) implements java.io.Serializable {

        /** Fewest particles a fit is made on. */
        public static final int MIN_POINTS = 12;
        /** Least R² for the model to be used: below it delta r is not decided by the conditions at ejection. */
        public static final double MIN_R_SQUARED = 0.5;
        /** Least width, as a share of the near particles' spread in delta r (keeps the kernels fed). */
        public static final double MIN_WIDTH_SHARE = 0.4;

        /**
         * @param x a particle's conditions at ejection
         * @return its predicted delta r, au (NaN when it has no such node)
         */
        public double predict(Features x) {
            return c0 + cR * (x.node(ascending) - rRef) + cBeta * x.beta() + cP * (x.p0() - pRef);
        }

        /**
         * @param x a particle's conditions at ejection
         * @return the shape s_R in [0, 1]
         */
        public double shape(Features x) {
            double d = predict(x) / width;
            return Double.isFinite(d) ? Math.exp(-0.5 * d * d) : 0;
        }

        /**
         * The fit, when there are enough points and it explains enough of delta r.
         *
         * @param x the near particles' conditions at ejection
         * @param deltaR their delta r at the meeting, au
         * @param ascending the node they met the Earth's path at
         * @return the model, or null
         */
        public static NodeModel fit(List<Features> x, double[] deltaR, boolean ascending) {
            int n = x.size();
            if (n < MIN_POINTS || deltaR.length != n) {
                return null;
            }
            double rRef = 0;
            double pRef = 0;
            for (Features f : x) {
                rRef += f.node(ascending) / n;
                pRef += f.p0() / n;
            }
            double[][] a = new double[n][3];
            for (int i = 0; i < n; i++) {
                Features f = x.get(i);
                a[i] = new double[] {f.node(ascending) - rRef, f.beta(), f.p0() - pRef};
                if (!Double.isFinite(a[i][0] + a[i][2] + deltaR[i])) {
                    return null;
                }
            }
            OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
            double[] b;
            double r2;
            double resid;
            try {
                ols.newSampleData(deltaR.clone(), a);
                b = ols.estimateRegressionParameters();
                r2 = ols.calculateRSquared();
                resid = Math.sqrt(ols.estimateErrorVariance());
            } catch (org.apache.commons.math3.exception.MathIllegalArgumentException e) {
                return null; // singular design (e.g. every β equal): no model
            }
            if (!(r2 >= MIN_R_SQUARED) || !Double.isFinite(resid)) {
                return null;
            }
            double spread = new StandardDeviation().evaluate(deltaR);
            double width = Math.max(1e-6, Math.max(resid, MIN_WIDTH_SHARE * spread));
            return new NodeModel(ascending, b[0], b[1], b[2], b[3], rRef, pRef, width, r2);
        }
    }

    /**
     * A focus in P0 alone.
     *
     * @param lo the grid's first period, days
     * @param step the grid spacing, days
     * @param values the acceptance at the grid points, each in [floor, 1]
     * @param floor the acceptance everywhere off the focus
     */
    public EjectionFocus(double lo, double step, double[] values, double floor) {
        this(lo, step, values, floor, null);
    }

    /**
     * @param model the delta r model (null: none)
     * @return this focus with that model
     */
    public EjectionFocus withNode(NodeModel model) {
        return new EjectionFocus(lo, step, values, floor, model);
    }

    /** The prior itself: every candidate kept, every importance weight 1. */
    public static final EjectionFocus PRIOR = new EjectionFocus(0, 1, new double[] {1, 1}, 1, null);

    /** Grid points of a learned focus. */
    static final int GRID = 2001;

    /** Checks the table. */
    public EjectionFocus {
        if (!(floor > 0 && floor <= 1) || values.length < 2 || !(step > 0)) {
            throw new IllegalArgumentException("a period focus needs a floor in (0, 1], two values and a step > 0");
        }
        values = values.clone();
        for (double v : values) {
            if (!(v >= floor && v <= 1)) {
                throw new IllegalArgumentException("acceptance " + v + " outside [" + floor + ", 1]");
            }
        }
    }

    /** @return whether this is the prior (all candidates kept) */
    public boolean isPrior() {
        return floor == 1;
    }

    /**
     * @param x a candidate's conditions at ejection
     * @return the probability that it is kept
     */
    public double acceptance(Features x) {
        if (floor == 1) {
            return 1;
        }
        double a = periodAcceptance(x.p0());
        return node == null ? a : floor + (a - floor) * node.shape(x);
    }

    /**
     * @param state a candidate's heliocentric state at ejection
     * @param beta its β
     * @return the probability that it is kept
     */
    public double acceptance(double[] state, double beta) {
        if (floor == 1) {
            return 1;
        }
        // A focus in P0 alone needs only the period: no node distances, no record, per candidate drawn.
        return node == null ? periodAcceptance(ParticleGenerator.periodAtEjection(state, beta))
                : acceptance(Features.of(state, beta));
    }

    /**
     * The acceptance in P0 alone, floor + (1 − floor) s_P(P0) (the whole acceptance when there is no node
     * model).
     *
     * @param p0 orbital period at ejection, days (infinite when unbound)
     * @return the acceptance
     */
    public double periodAcceptance(double p0) {
        if (floor == 1) {
            return 1;
        }
        double x = (p0 - lo) / step;
        if (!(x >= 0) || x > values.length - 1) {
            return floor;
        }
        int k = Math.min((int) x, values.length - 2);
        double f = x - k;
        return values[k] + f * (values[k + 1] - values[k]);
    }

    /**
     * The periods outside which the acceptance is the floor: the grid points beside the first and the last
     * value above the floor (the table is interpolated linearly, so it exceeds the floor only between them).
     *
     * @return {least, greatest} period, days, or null when the acceptance is the floor everywhere (and for
     *     the prior)
     */
    public double[] periodSupport() {
        if (isPrior()) {
            return null;
        }
        int first = -1;
        int last = -1;
        for (int j = 0; j < values.length; j++) {
            if (values[j] > floor) {
                if (first < 0) {
                    first = j;
                }
                last = j;
            }
        }
        if (first < 0) {
            return null;
        }
        return new double[] {lo + Math.max(0, first - 1) * step, lo + Math.min(values.length - 1, last + 1) * step};
    }

    /**
     * A focus learned from periods that reached the target: a weighted Gaussian kernel density of them with the
     * bandwidth given (the caller's choice, e.g. Silverman's rule of thumb), scaled so that its maximum is 1,
     * then lifted to the floor: a = floor + (1 − floor) f / max f.
     *
     * @param periods the periods of the particles that reached the target, days
     * @param weights their importance weights (relative)
     * @param h the kernel's bandwidth, days (&gt; 0)
     * @param floor the defensive acceptance off the focus
     * @return the focus
     */
    public static EjectionFocus learn(double[] periods, double[] weights, double h, double floor) {
        int n = periods.length;
        if (n == 0 || weights.length != n || !(h > 0)) {
            throw new IllegalArgumentException("a focus needs at least one period, with one weight each, and a bandwidth > 0");
        }
        double[] sorted = periods.clone();
        Arrays.sort(sorted);
        double lo = sorted[0] - 4 * h;
        double hi = sorted[n - 1] + 4 * h;
        double step = (hi - lo) / (GRID - 1);
        double[] f = new double[GRID];
        for (int k = 0; k < n; k++) {
            int from = Math.max(0, (int) Math.floor((periods[k] - 4 * h - lo) / step));
            int to = Math.min(GRID - 1, (int) Math.ceil((periods[k] + 4 * h - lo) / step));
            for (int j = from; j <= to; j++) {
                double z = (lo + j * step - periods[k]) / h;
                f[j] += weights[k] * Math.exp(-0.5 * z * z);
            }
        }
        double max = Arrays.stream(f).max().orElse(0);
        double[] a = new double[GRID];
        for (int j = 0; j < GRID; j++) {
            a[j] = Math.min(1, floor + (1 - floor) * f[j] / max);
        }
        return new EjectionFocus(lo, step, a, floor);
    }

    /**
     * A Gaussian focus about one period (used when no particle reached the target yet and the period that
     * would is extrapolated).
     *
     * @param centre the period aimed at, days
     * @param width its standard deviation, days
     * @param floor the defensive acceptance
     * @return the focus
     */
    public static EjectionFocus around(double centre, double width, double floor) {
        double lo = centre - 4 * width;
        double step = 8 * width / (GRID - 1);
        double[] a = new double[GRID];
        for (int j = 0; j < GRID; j++) {
            double z = (lo + j * step - centre) / width;
            a[j] = Math.min(1, floor + (1 - floor) * Math.exp(-0.5 * z * z));
        }
        return new EjectionFocus(lo, step, a, floor);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof EjectionFocus f && f.lo == lo && f.step == step && f.floor == floor
                && Arrays.equals(f.values, values) && java.util.Objects.equals(f.node, node);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(values) * 31 + Double.hashCode(lo);
    }

    @Override
    public String toString() {
        if (isPrior()) {
            return "EjectionFocus[prior]";
        }
        String nodePart = node == null ? "" : String.format(java.util.Locale.ROOT,
                ", delta r within %.5f au (R2 %.2f)", node.width(), node.rSquared());
        return String.format(java.util.Locale.ROOT, "EjectionFocus[%.3f..%.3f d%s, floor %.3f]", lo,
                lo + step * (values.length - 1), nodePart, floor);
    }

    /** @return a copy of the acceptance table */
    @Override
    public double[] values() {
        return values.clone();
    }
}
