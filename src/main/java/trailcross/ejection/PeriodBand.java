package trailcross.ejection;

import trailcross.ephemeris.Body;

/**
 * The directions of ejection that can give a period inside a proposal's support, for drawing a proposal
 * q(x) ∝ p(x) a(x) ({@link EjectionFocus}) without spending a candidate on every direction that cannot.
 *
 * <p>With the nucleus' heliocentric velocity V (unit vector v̂) and an ejection speed Δv in direction d, the
 * particle's speed is v² = V² + 2 V Δv μ + Δv² with μ = d·v̂, and its period (vis-viva, μ☉ = GM☉(1 − β))
 * grows with v², so the periods [P_lo, P_hi] outside which a(x) is the floor map to one interval of μ:
 * μ(P) = (v²(P) − V² − Δv²) / (2 V Δv), v²(P) = 2μ☉/r − (4π² μ☉² / P²)^(1/3). On the unit sphere the
 * band μ1 ≤ μ ≤ μ2 has area 2π (μ2 − μ1) in the coordinates (μ, azimuth about v̂), each element dμ dφ, so a
 * direction uniform on the band is μ uniform and φ uniform; the direction law's density on its cap
 * {d·ŝ ≥ cos α} about the sunward ŝ is 1 / (2π (1 − cos α)).
 *
 * <p>Exact sampling by rejection with a mixture envelope (von Neumann 1951; Devroye 1986, "Non-Uniform
 * Random Variate Generation", II.3): given the ejection time and size u, the target in d is
 * p(d|u) (floor + b(x)), b = a − floor, which is zero off the band; its envelope is
 * floor · p(d|u) + (1 − floor) / (2π (1 − cos α)) on the band, of total mass
 * M(u) = floor + (1 − floor) w / (1 − cos α), w = μ2 − μ1. A candidate u is kept with probability
 * M(u) / M_max, then the floor's part is taken with probability floor / M(u) (a direction from the law,
 * always kept), else a direction uniform on the band, kept when it lies in the cap and with probability
 * b / (1 − floor). The kept particles follow p(u) p(d|u) a(x) / E[a], the same law as drawing every
 * candidate from the prior and keeping it with probability a(x), in about M_max / E[a] candidates u instead
 * of 1 / E[a] full candidates. M_max bounds M(u) in a cell of ejection times and a size bin: w ≤ D / (2 V Δv)
 * with D = (4π² GM☉²)^(1/3) (P_lo^(−2/3) − P_hi^(−2/3)) (β ≥ 0 only narrows it), V Δv at its least over the
 * cell and the bin (found on a grid by the generator, and lowered by {@link #MARGIN} for what the grid may
 * miss), and w ≤ 2 always. The cells are {@value #CELLS} slices of equal probability of the ejection time;
 * since M_max differs between them (slow grains far from the Sun reach a wide band), a cell is chosen with
 * probability ∝ its M_max and the time drawn from the law inside it, so that a kept candidate's density stays
 * p(u) M(u) / const (stratified rejection; its acceptance is then M(u) over its own cell's bound).
 */
public final class PeriodBand {

    /** Share by which the least V Δv found on a grid is lowered before it bounds M(u). */
    public static final double MARGIN = 0.2;
    /** Widening of the band on each side in μ, against rounding at its edges (widening is always exact). */
    private static final double WIDEN = 1e-9;

    private final double floor;
    private final double capArea;
    private final double cbrtLo;
    private final double cbrtHi;
    private final double spread;
    private final double[][] bound;
    private final double[][] cumulative;

    /** Slices of equal probability of the ejection time, each with its own bound. */
    public static final int CELLS = 64;

    /**
     * @param focus the proposal (not the prior)
     * @param cosMax the cosine of the direction law's cap half-angle ({@link DirectionSampler#cosMax()})
     * @param leastSpeedProduct per size bin and time cell, the least V Δv there found on a grid, (au/d)²
     *     (0 or less: no bound but w ≤ 2)
     * @return the band, or null when the focus' acceptance is the floor at every period
     */
    public static PeriodBand of(EjectionFocus focus, double cosMax, double[][] leastSpeedProduct) {
        double[] support = focus.periodSupport();
        return support == null ? null : new PeriodBand(focus.floor(), cosMax, support[0], support[1], leastSpeedProduct);
    }

    private PeriodBand(double floor, double cosMax, double pLo, double pHi, double[][] leastSpeedProduct) {
        this.floor = floor;
        this.capArea = 1 - cosMax;
        double fourPi2 = 4 * Math.PI * Math.PI;
        this.cbrtLo = Math.cbrt(fourPi2 / (pLo * pLo));
        this.cbrtHi = Math.cbrt(fourPi2 / (pHi * pHi));
        double gm = Body.SUN.gm();
        this.spread = Math.cbrt(gm * gm) * (cbrtLo - cbrtHi);
        int bins = leastSpeedProduct.length;
        this.bound = new double[bins][CELLS];
        this.cumulative = new double[bins][CELLS];
        for (int k = 0; k < bins; k++) {
            double sum = 0;
            for (int j = 0; j < CELLS; j++) {
                double least = (1 - MARGIN) * leastSpeedProduct[k][j];
                double w = least > 0 ? Math.min(2, spread / (2 * least)) : 2;
                bound[k][j] = envelope(w + 2 * WIDEN);
                sum += bound[k][j];
                cumulative[k][j] = sum;
            }
        }
    }

    /**
     * A time cell of a size bin, chosen with probability ∝ its bound.
     *
     * @param bin the size bin
     * @param x uniform in [0, 1)
     * @return the cell, 0 … {@value #CELLS} − 1
     */
    public int cell(int bin, double x) {
        double[] c = cumulative[bin];
        double target = x * c[CELLS - 1];
        int j = java.util.Arrays.binarySearch(c, target);
        j = j >= 0 ? j + 1 : -j - 1;
        return Math.min(j, CELLS - 1);
    }

    /**
     * The band of μ = d·v̂ for one candidate.
     *
     * @param state the nucleus' heliocentric state (au, au/d)
     * @param dv the ejection speed, au/d (&gt; 0)
     * @param beta the grain's β
     * @param out receives μ1, μ2 (μ2 ≤ μ1 when the band is empty)
     */
    public void limits(double[] state, double dv, double beta, double[] out) {
        double muSun = Body.SUN.gm() * (1 - beta);
        if (!(muSun > 0) || !(dv > 0)) {
            out[0] = 1;
            out[1] = -1;
            return;
        }
        double r = Math.sqrt(state[0] * state[0] + state[1] * state[1] + state[2] * state[2]);
        double v2 = state[3] * state[3] + state[4] * state[4] + state[5] * state[5];
        double twoVdv = 2 * Math.sqrt(v2) * dv;
        double m23 = Math.cbrt(muSun * muSun);
        double base = 2 * muSun / r - v2 - dv * dv;
        out[0] = Math.max(-1, (base - m23 * cbrtLo) / twoVdv - WIDEN);
        out[1] = Math.min(1, (base - m23 * cbrtHi) / twoVdv + WIDEN);
    }

    /**
     * @param width the band's width w in μ (≥ 0)
     * @return M(u) = floor + (1 − floor) w / (1 − cos α), the envelope's mass
     */
    public double envelope(double width) {
        return floor + (1 - floor) * Math.max(0, width) / capArea;
    }

    /**
     * @param bin a size bin
     * @param cell a time cell
     * @return M_max, the bound of M(u) there
     */
    public double bound(int bin, int cell) {
        return bound[bin][cell];
    }

    /** @return the proposal's floor */
    public double floor() {
        return floor;
    }

    /** @return 1 − cos α, the direction law's cap area over 2π */
    public double capArea() {
        return capArea;
    }
}
