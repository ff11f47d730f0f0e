package trailcross.encounter;

import java.util.Arrays;
import org.apache.commons.math3.random.Well19937c;

/**
 * The weighted density of a trail section's node crossings along the Earth's path, by kernel density
 * estimation (Silverman 1986): each crossing i at delta r_i and solar longitude λ_i (the longitude at which
 * the Earth passes it) with value v_i contributes v_i K_r(δr_i) K_λ(λ_i − λ) to the profile at λ, with
 * Gaussian kernels in delta r (evaluated at the Earth's path, δr = 0) and along the path. The bandwidths
 * follow Silverman's rule of thumb (his eq. 3.31: h = 0.9 min(σ, IQR/1.34) n^−1/5, n the Kish effective
 * number of the weights), computed once on the whole section: the narrowest width the crossings can
 * resolve without the estimate being dominated by single particles. The peak is the profile's maximum
 * (grid, then a parabola through the three highest points); its uncertainty is the spread of the maxima of
 * {@value #RESAMPLES} bootstrap resamples of the crossings (Efron &amp; Tibshirani 1993) with the same
 * bandwidths.
 */
public final class DensityProfile {

    /** Bootstrap resamples. */
    public static final int RESAMPLES = 200;
    /** Kernel reach, in bandwidths. */
    private static final double REACH = 5;
    /** Grid points per bandwidth, and at most this many in all. */
    private static final int PER_BANDWIDTH = 6;
    private static final int MAX_GRID = 6000;

    /**
     * The result.
     *
     * @param grid the longitudes of the profile, degrees (unwrapped, increasing)
     * @param value the profile there (units of the values per degree per unit of delta r)
     * @param low the 16th percentile of the bootstrap profiles at each grid point
     * @param high the 84th percentile
     * @param peak the longitude of the maximum, degrees
     * @param peakValue the profile at the peak
     * @param peakSigma the peak's bootstrap standard deviation, degrees
     * @param peakValueSigma the bootstrap standard deviation of the profile's maximum
     * @param hR the kernel's bandwidth in delta r, au
     * @param hLambda the kernel's bandwidth in longitude, degrees
     * @param fwhm the profile's full width at half maximum, the kernel's share removed in quadrature, degrees
     * @param ess Kish's effective number of the values that feed the profile, Σ(v K_r)² form
     * @param lambda the crossings' longitudes the profile was made from, degrees (null when not kept)
     * @param contribution what each adds along the path (its value times its delta-r kernel), in
     *        {@code lambda}'s order, so that profiles of several trails can be summed ({@link CombinedActivity})
     */
    public record Result(double[] grid, double[] value, double[] low, double[] high, double peak, double peakValue,
            double peakSigma, double peakValueSigma, double hR, double hLambda, double fwhm, double ess,
            double[] lambda, double[] contribution) {

        /**
         * The profile's other maxima that rival its peak: local maxima of at least {@code share} of the peak's
         * value, each set apart from every higher maximum by a dip of at least {@value #DIP} of its own value
         * (its prominence; a ripple of the kernel sum is not a maximum). Where one exists the peak's
         * resampling σ mixes the two places, and a forecaster should read both.
         *
         * @param share least value, as a share of the peak's
         * @return grid indices, highest first
         */
        public int[] otherMaxima(double share) {
            return DensityProfile.otherMaxima(value, share);
        }
    }

    /**
     * The local maxima of a profile, other than its highest, of at least {@code share} of the highest value,
     * each set apart from every higher maximum by a dip of at least {@value #DIP} of its own value (its
     * prominence; a ripple of a kernel sum is not a maximum).
     *
     * @param value the profile on its grid
     * @param share least value, as a share of the highest
     * @return grid indices, highest first
     */
    public static int[] otherMaxima(double[] value, double share) {
        int n = value.length;
        int top = argmax(value);
        java.util.List<Integer> found = new java.util.ArrayList<>();
        for (int j = 1; j + 1 < n; j++) {
            if (j == top || value[j] < share * value[top] || value[j] < value[j - 1] || value[j] < value[j + 1]) {
                continue;
            }
            // The deepest dip towards the nearest higher point on each side; the shallower side decides.
            double prominence = Double.POSITIVE_INFINITY;
            for (int dir = -1; dir <= 1; dir += 2) {
                double low = value[j];
                int k = j + dir;
                while (k >= 0 && k < n && value[k] <= value[j]) {
                    low = Math.min(low, value[k]);
                    k += dir;
                }
                if (k >= 0 && k < n) {
                    prominence = Math.min(prominence, value[j] - low);
                }
            }
            if (prominence >= DIP * value[j]) {
                found.add(j);
            }
        }
        found.sort((a, b) -> Double.compare(value[b], value[a]));
        return found.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Least dip, as a share of a maximum's value, that sets it apart from a higher one. */
    public static final double DIP = 0.03;

    private DensityProfile() {
    }

    /**
     * @param deltaR the crossings' delta r, au
     * @param lambda their longitudes, degrees, unwrapped about one another
     * @param shapeWeight the weights that set the bandwidths (the crossings' real meteoroids)
     * @param value what each crossing adds to the profile (e.g. its weight times a flux factor)
     * @param seed the bootstrap's seed
     * @return the profile, or null when the values sum to zero
     */
    public static Result of(double[] deltaR, double[] lambda, double[] shapeWeight, double[] value, long seed) {
        int n = deltaR.length;
        if (n < 3 || lambda.length != n || value.length != n || shapeWeight.length != n) {
            throw new IllegalArgumentException("a density profile needs at least three crossings, with every column");
        }
        double hR = Math.max(1e-6, bandwidth(deltaR, shapeWeight));
        double[] kr = new double[n];
        double[] near = new double[n];
        for (int i = 0; i < n; i++) {
            double z = deltaR[i] / hR;
            kr[i] = Math.exp(-0.5 * z * z) / (hR * Math.sqrt(2 * Math.PI));
            near[i] = shapeWeight[i] * kr[i];
        }
        double hL = Math.max(1e-5, bandwidth(lambda, near));
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            c[i] = value[i] * kr[i];
        }
        return along(lambda, c, hL, hR, seed);
    }

    /**
     * The one-dimensional part: a weighted Gaussian kernel density of contributions c at positions x with
     * bandwidth h on a grid reaching 3h beyond the data, its maximum, FWHM and their bootstrap uncertainties
     * ({@value #RESAMPLES} resamples), and 16–84% bands.
     *
     * @param x the positions
     * @param c each one's contribution
     * @param hL the bandwidth
     * @param hR the other coordinate's bandwidth, stored in the result
     * @param seed the bootstrap's seed
     * @return the profile, or null when the contributions sum to zero
     */
    static Result along(double[] x, double[] c, double hL, double hR, long seed) {
        double[] lambda = x;
        int n = x.length;
        double lo = Arrays.stream(lambda).min().orElseThrow() - 3 * hL;
        double hi = Arrays.stream(lambda).max().orElseThrow() + 3 * hL;
        double step = Math.max(hL / PER_BANDWIDTH, (hi - lo) / (MAX_GRID - 1));
        int m = (int) Math.ceil((hi - lo) / step) + 1;
        double[] grid = new double[m];
        for (int j = 0; j < m; j++) {
            grid[j] = lo + j * step;
        }
        int[] all = new int[n];
        for (int i = 0; i < n; i++) {
            all[i] = i;
        }
        double[] prof = profile(all, c, lambda, grid, hL);
        int best = argmax(prof);
        if (prof[best] <= 0) {
            return null;
        }
        double peak = refine(grid, prof, best);
        double peakValue = prof[best];
        double fwhm = fwhm(grid, prof, best, hL);
        Well19937c rng = new Well19937c(seed);
        double[][] boots = new double[RESAMPLES][];
        double[] peaks = new double[RESAMPLES];
        double[] maxima = new double[RESAMPLES];
        int[] pick = new int[n];
        for (int b = 0; b < RESAMPLES; b++) {
            for (int i = 0; i < n; i++) {
                pick[i] = rng.nextInt(n);
            }
            double[] p = profile(pick, c, lambda, grid, hL);
            int k = argmax(p);
            peaks[b] = refine(grid, p, k);
            maxima[b] = p[k];
            boots[b] = p;
        }
        double[][] band = bands(boots);
        double[] low = band[0];
        double[] high = band[1];
        double[] fed = new double[n];
        for (int i = 0; i < n; i++) {
            fed[i] = Math.abs(c[i]);
        }
        return new Result(grid, prof, low, high, peak, peakValue, sd(peaks), sd(maxima), hR, hL, fwhm,
                kish(fed), x, c);
    }

    /**
     * The 16th and 84th percentiles at each grid point of bootstrap profiles (order statistics of the sorted
     * resamples, the lower rounded down and the upper up).
     *
     * @param boots the resampled profiles, all on one grid
     * @return {low, high}
     */
    static double[][] bands(double[][] boots) {
        int r = boots.length;
        int m = boots[0].length;
        double[] low = new double[m];
        double[] high = new double[m];
        double[] col = new double[r];
        for (int j = 0; j < m; j++) {
            for (int b = 0; b < r; b++) {
                col[b] = boots[b][j];
            }
            Arrays.sort(col);
            low[j] = col[(int) Math.floor(0.16 * (r - 1))];
            high[j] = col[(int) Math.ceil(0.84 * (r - 1))];
        }
        return new double[][] {low, high};
    }

    /**
     * The smoothing bias of the profile's value at one longitude, by Richardson's extrapolation in the
     * bandwidths: a second-order kernel's estimate has bias c·h² + O(h⁴) (Silverman 1986, sec. 4.3.1), so the
     * estimates with bandwidths (h_r, h_λ) and (h_r, h_λ)/√2 differ by c·h²/2 and the bias at h is twice that
     * difference. The difference carries the noise of the narrower estimate too; it is returned whole, not
     * with its noise subtracted, because subtracting made the estimate zero in runs whose true bias was large
     * (on a sharp core inside a broad halo, 2-σ intervals then held the truth in 34 runs of 40 instead of 39).
     * The bootstrap σ of the profile's maximum does not contain this term: without it the stated uncertainty
     * of a peak value shrinks with the particle count faster than its error does (a bandwidth set on a whole
     * section flattens its sharp core).
     *
     * @param deltaR the crossings' delta r, au
     * @param lambda their longitudes, degrees
     * @param value what each crossing adds to the profile
     * @param hR the profile's bandwidth in delta r, au
     * @param hLambda its bandwidth in longitude, degrees
     * @param at the longitude, degrees
     * @return the estimated magnitude of the bias at {@code at}, in the profile's units (≥ 0; its own noise
     *         included, so it errs on the large side)
     */
    public static double smoothingBias(double[] deltaR, double[] lambda, double[] value, double hR, double hLambda,
            double at) {
        double h2r = hR / Math.sqrt(2);
        double h2l = hLambda / Math.sqrt(2);
        double total = 0;
        for (int i = 0; i < deltaR.length; i++) {
            total += value[i] * (gauss(deltaR[i], hR) * gauss(lambda[i] - at, hLambda)
                    - gauss(deltaR[i], h2r) * gauss(lambda[i] - at, h2l));
        }
        return Math.abs(2 * total);
    }

    private static double gauss(double x, double h) {
        double z = x / h;
        return Math.exp(-0.5 * z * z) / (h * Math.sqrt(2 * Math.PI));
    }

    /**
     * Silverman's rule of thumb on weighted data, 0.9 min(σ, IQR/1.34) n_eff^−1/5.
     *
     * @param x the data
     * @param w their weights (non-negative)
     * @return the bandwidth (0 when the data do not vary)
     */
    public static double bandwidth(double[] x, double[] w) {
        int n = x.length;
        double sw = 0;
        double mean = 0;
        for (int i = 0; i < n; i++) {
            sw += w[i];
            mean += w[i] * x[i];
        }
        if (!(sw > 0)) {
            w = new double[n];
            Arrays.fill(w, 1.0);
            return bandwidth(x, w);
        }
        mean /= sw;
        double var = 0;
        for (int i = 0; i < n; i++) {
            var += w[i] * (x[i] - mean) * (x[i] - mean);
        }
        double sigma = Math.sqrt(var / sw);
        double q1 = weightedQuantile(x, w, 0.25);
        double q3 = weightedQuantile(x, w, 0.75);
        double iqr = q3 - q1;
        double spread = iqr > 0 ? Math.min(sigma, iqr / 1.34) : sigma;
        double ess = kish(w);
        return 0.9 * spread * Math.pow(Math.max(ess, 1), -0.2);
    }

    static double[] profile(int[] pick, double[] c, double[] lambda, double[] grid, double h) {
        double[] p = new double[grid.length];
        double lo = grid[0];
        double step = grid.length > 1 ? grid[1] - grid[0] : 1;
        double norm = 1 / (h * Math.sqrt(2 * Math.PI));
        for (int i : pick) {
            if (c[i] == 0) {
                continue;
            }
            int from = Math.max(0, (int) Math.floor((lambda[i] - REACH * h - lo) / step));
            int to = Math.min(grid.length - 1, (int) Math.ceil((lambda[i] + REACH * h - lo) / step));
            for (int j = from; j <= to; j++) {
                double z = (grid[j] - lambda[i]) / h;
                p[j] += c[i] * norm * Math.exp(-0.5 * z * z);
            }
        }
        return p;
    }

    static int argmax(double[] p) {
        int best = 0;
        for (int j = 1; j < p.length; j++) {
            if (p[j] > p[best]) {
                best = j;
            }
        }
        return best;
    }

    /** The vertex of the parabola through the grid's maximum and its neighbours. */
    static double refine(double[] grid, double[] p, int k) {
        if (k == 0 || k == p.length - 1) {
            return grid[k];
        }
        double a = p[k - 1];
        double b = p[k];
        double c = p[k + 1];
        double d = a - 2 * b + c;
        double off = d < 0 ? 0.5 * (a - c) / d : 0;
        return grid[k] + Math.max(-0.5, Math.min(0.5, off)) * (grid[1] - grid[0]);
    }

    /** Full width at half maximum about the peak (linear between grid points), the kernel removed in quadrature. */
    static double fwhm(double[] grid, double[] p, int k, double h) {
        double half = 0.5 * p[k];
        int a = k;
        while (a > 0 && p[a] > half) {
            a--;
        }
        int b = k;
        while (b < p.length - 1 && p[b] > half) {
            b++;
        }
        double left = p[a] == p[a + 1] ? grid[a] : grid[a] + (half - p[a]) / (p[a + 1] - p[a]) * (grid[a + 1] - grid[a]);
        double right = p[b] == p[b - 1] ? grid[b]
                : grid[b - 1] + (half - p[b - 1]) / (p[b] - p[b - 1]) * (grid[b] - grid[b - 1]);
        double w = right - left;
        double kernel = 2.3548 * h;
        return w > kernel ? Math.sqrt(w * w - kernel * kernel) : 0;
    }

    static double sd(double[] v) {
        double mean = Arrays.stream(v).average().orElse(0);
        double s = 0;
        for (double x : v) {
            s += (x - mean) * (x - mean);
        }
        return Math.sqrt(s / (v.length - 1));
    }

    /**
     * The weighted quantile: the least x whose cumulative weight (in increasing x) reaches q of the total;
     * with no positive total, the unweighted element at position q·n.
     *
     * @param x the data
     * @param w their weights (non-negative)
     * @param q the quantile, in [0, 1]
     * @return the quantile
     */
    public static double weightedQuantile(double[] x, double[] w, double q) {
        int n = x.length;
        Integer[] order = new Integer[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            order[i] = i;
            total += w[i];
        }
        Arrays.sort(order, (a, b) -> Double.compare(x[a], x[b]));
        if (!(total > 0)) {
            return x[order[Math.min(n - 1, (int) (q * n))]];
        }
        double acc = 0;
        for (int i : order) {
            acc += w[i];
            if (acc >= q * total) {
                return x[i];
            }
        }
        return x[order[n - 1]];
    }

    /**
     * Kish's effective sample size (Σw)² / Σw² (Kish 1965, Survey Sampling).
     *
     * @param w weights
     * @return the effective number (0 for none)
     */
    public static double kish(double[] w) {
        double s = 0;
        double s2 = 0;
        for (double x : w) {
            s += x;
            s2 += x * x;
        }
        return s2 == 0 ? 0 : s * s / s2;
    }
}
