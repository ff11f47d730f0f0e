package trailcross.ejection;

import java.util.Arrays;

/**
 * A proposal for targeted ejection, defined by its acceptance in the orbital period at ejection P0: a
 * candidate drawn from the prior (the stream's own ejection law) is kept with probability a(P0), so that the
 * kept particles follow q(x) = p(x) a(P0(x)) / Z with Z = E_p[a], and each carries the importance weight
 * p/q = Z / a (adaptive importance sampling with a defensive mixture: a never falls below {@link #floor()},
 * so no weight exceeds Z / floor; Hesterberg 1995, Technometrics 37, 185). P0 decides where a particle lies
 * along its trail after N revolutions (McNaught &amp; Asher 1999), and it is known before any integration,
 * so a rejected candidate costs only its draw. The acceptance is tabulated on a uniform grid of P0 and
 * interpolated linearly; outside the grid, and for unbound particles, it is the floor.
 *
 * @param lo the grid's first period, days
 * @param step the grid spacing, days
 * @param values the acceptance at the grid points, each in [floor, 1]
 * @param floor the acceptance everywhere off the focus (1 for the prior)
 */
public record PeriodFocus(double lo, double step, double[] values, double floor) implements java.io.Serializable {

    /** The prior itself: every candidate kept, every importance weight 1. */
    public static final PeriodFocus PRIOR = new PeriodFocus(0, 1, new double[] {1, 1}, 1);

    /** Grid points of a learned focus. */
    static final int GRID = 2001;

    /** Checks the table. */
    public PeriodFocus {
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
     * @param p0 orbital period at ejection, days (infinite when unbound)
     * @return the probability that a candidate of that period is kept
     */
    public double acceptance(double p0) {
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
    public static PeriodFocus learn(double[] periods, double[] weights, double h, double floor) {
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
        return new PeriodFocus(lo, step, a, floor);
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
    public static PeriodFocus around(double centre, double width, double floor) {
        double lo = centre - 4 * width;
        double step = 8 * width / (GRID - 1);
        double[] a = new double[GRID];
        for (int j = 0; j < GRID; j++) {
            double z = (lo + j * step - centre) / width;
            a[j] = Math.min(1, floor + (1 - floor) * Math.exp(-0.5 * z * z));
        }
        return new PeriodFocus(lo, step, a, floor);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PeriodFocus f && f.lo == lo && f.step == step && f.floor == floor
                && Arrays.equals(f.values, values);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(values) * 31 + Double.hashCode(lo);
    }

    @Override
    public String toString() {
        return isPrior() ? "PeriodFocus[prior]" : String.format(java.util.Locale.ROOT,
                "PeriodFocus[%.3f..%.3f d, floor %.3f]", lo, lo + step * (values.length - 1), floor);
    }

    /** @return a copy of the acceptance table */
    @Override
    public double[] values() {
        return values.clone();
    }
}
