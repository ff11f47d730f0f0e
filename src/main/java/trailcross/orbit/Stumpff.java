package trailcross.orbit;

/**
 * Stumpff functions c0…c3 of the universal-variable formulation of two-body motion (Stumpff 1959;
 * Danby 1988, "Fundamentals of Celestial Mechanics", §6.9): c0(x) = cos √x, c1 = sin √x / √x,
 * c2 = (1 − cos √x)/x, c3 = (√x − sin √x)/x^{3/2}, continued to x ≤ 0 through the hyperbolic functions.
 * Near x = 0 (the parabola) the Taylor series is used, so there is no cancellation for near-parabolic
 * orbits.
 */
public final class Stumpff {

    /** |x| below which the series is summed (its terms fall as x^k/(2k+3)!; 14 terms reach 1e-17). */
    private static final double SERIES_LIMIT = 1.0;

    private Stumpff() {
    }

    /**
     * Evaluates c0, c1, c2, c3 at x.
     *
     * @param x the argument (β s² in the universal formulation)
     * @param c output, length ≥ 4: c[0..3]
     */
    public static void evaluate(double x, double[] c) {
        if (Math.abs(x) < SERIES_LIMIT) {
            // c2 = Σ (−x)^k/(2k+2)!, c3 = Σ (−x)^k/(2k+3)!
            double c2 = 0;
            double c3 = 0;
            double t2 = 0.5;
            double t3 = 1.0 / 6.0;
            for (int k = 0; k < 16; k++) {
                c2 += t2;
                c3 += t3;
                t2 *= -x / ((2 * k + 3) * (2 * k + 4));
                t3 *= -x / ((2 * k + 4) * (2 * k + 5));
            }
            c[2] = c2;
            c[3] = c3;
            c[1] = 1 - x * c3;
            c[0] = 1 - x * c2;
        } else if (x > 0) {
            double w = Math.sqrt(x);
            double s = Math.sin(w);
            double h = Math.sin(0.5 * w);
            c[0] = Math.cos(w);
            c[1] = s / w;
            c[2] = 2 * h * h / x;
            c[3] = (w - s) / (x * w);
        } else {
            double w = Math.sqrt(-x);
            double s = Math.sinh(w);
            double h = Math.sinh(0.5 * w);
            c[0] = Math.cosh(w);
            c[1] = s / w;
            c[2] = -2 * h * h / x;
            c[3] = (s - w) / (-x * w);
        }
    }
}
