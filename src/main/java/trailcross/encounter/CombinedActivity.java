package trailcross.encounter;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;

/**
 * The shower's activity in one year from all its trails together, as an observer counts it: the sum of the
 * trails' activity profiles ({@link DensityProfile}, each with its own kernels) on one time grid, its maximum,
 * and the maximum's uncertainty by a stratified bootstrap: in each of {@value #RESAMPLES} resamples every trail's
 * crossings are drawn again on their own, the trails being independent samples (Efron &amp; Tibshirani 1993,
 * ch. 6 and sec. 8.3 on stratified resampling), and the summed profile's maximum taken; the 16–84% bands come
 * from the same resamples. Where two trails meet the Earth within hours of each other their sum, not either
 * trail's peak, is what an observer's count follows.
 *
 * @param times the grid, TDB days since J2000 (increasing, evenly spaced)
 * @param value the summed profile there (ZHR, or the trails' common relative unit)
 * @param low the 16th percentile of the resampled sums at each grid point
 * @param high the 84th percentile
 * @param peakT the summed profile's maximum, TDB days since J2000
 * @param peakSigmaMin the maximum's resampling standard deviation, minutes
 * @param peakValue the summed profile at its maximum
 * @param peakValueSigma the resampling standard deviation of the summed profile's maximum value
 * @param returns each trail's return (perihelion), TDB days since J2000, in the order of the parts given
 * @param shareAtPeak each trail's share of the sum at its maximum, in the same order
 */
public record CombinedActivity(double[] times, double[] value, double[] low, double[] high, double peakT,
        double peakSigmaMin, double peakValue, double peakValueSigma, double[] returns, double[] shareAtPeak) {

    /** @return how many trails contribute */
    public int trails() {
        return returns.length;
    }

    /** Other maxima of the sum are listed from this share of its highest up: a second trail's storm, say. */
    public static final double LISTED_SHARE = 0.5;

    /**
     * The sum's other maxima of at least {@value #LISTED_SHARE} of its highest ({@link DensityProfile#otherMaxima}):
     * where trails met together peak apart, each of their maxima.
     *
     * @return per maximum: its time (TDB days since J2000) and its share of the highest
     */
    public List<double[]> otherMaxima() {
        List<double[]> out = new ArrayList<>();
        for (int j : DensityProfile.otherMaxima(value, LISTED_SHARE)) {
            out.add(new double[] {times[j], value[j] / peakValue});
        }
        return out;
    }

    /**
     * The trails that make the maximum: each trail's return and its share of the sum there, largest first, those
     * of at least {@code least} of it.
     *
     * @param least the least share listed
     * @return rows {return, TDB days since J2000; share}
     */
    public List<double[]> makers(double least) {
        List<double[]> out = new ArrayList<>();
        for (int k = 0; k < shareAtPeak.length; k++) {
            if (shareAtPeak[k] >= least) {
                out.add(new double[] {returns[k], shareAtPeak[k]});
            }
        }
        out.sort((a, b) -> Double.compare(b[1], a[1]));
        return out;
    }

    /** Bootstrap resamples. */
    public static final int RESAMPLES = DensityProfile.RESAMPLES;
    /** At most this many grid points. */
    private static final int MAX_GRID = 6000;

    /**
     * One trail's share: its section's crossings along the Earth's path and how longitude maps to time.
     *
     * @param lambda the crossings' longitudes, degrees (unwrapped about one another)
     * @param contribution what each adds to the profile (its value times its delta-r kernel at δr = 0)
     * @param hLambda the trail's bandwidth in longitude, degrees
     * @param peakLambda a longitude, degrees, on the same unwrapping as {@code lambda}
     * @param peakT the time the Earth is there, TDB days since J2000
     * @param returnT the trail's return (perihelion), TDB days since J2000 (NaN when not known)
     */
    public record Part(double[] lambda, double[] contribution, double hLambda, double peakLambda, double peakT,
            double returnT) {

        /** @return the longitude (on the part's unwrapping) at which the Earth is at time t, degrees */
        double lambdaAt(double t) {
            return peakLambda + (t - peakT) * 24 / TrailEncounter.HOURS_PER_DEGREE;
        }

        /** @return the time at which the Earth is at longitude λ (on the part's unwrapping) */
        double timeAt(double lambda) {
            return peakT + (lambda - peakLambda) * TrailEncounter.HOURS_PER_DEGREE / 24;
        }
    }

    /**
     * The meetings whose activity overlaps in time, grouped: each meeting spans its peak ± 3 FWHM (at least
     * ± 1 h, the activity plot's span), and meetings whose spans overlap, directly or through others, form one
     * group. A stream met at two nodes in one year (two showers months apart) gives two groups, whose sum
     * would mean nothing to an observer.
     *
     * @param meetings one year's cloud meetings
     * @return the groups, each in time order, the groups in time order
     */
    public static List<List<TrailEncounter>> overlapping(List<TrailEncounter> meetings) {
        List<TrailEncounter> sorted = new ArrayList<>(meetings);
        sorted.sort(java.util.Comparator.comparingDouble(m -> m.peakT() - halfSpanDays(m)));
        List<List<TrailEncounter>> groups = new ArrayList<>();
        double end = Double.NEGATIVE_INFINITY;
        for (TrailEncounter m : sorted) {
            if (groups.isEmpty() || m.peakT() - halfSpanDays(m) > end) {
                groups.add(new ArrayList<>());
                end = Double.NEGATIVE_INFINITY;
            }
            groups.get(groups.size() - 1).add(m);
            end = Math.max(end, m.peakT() + halfSpanDays(m));
        }
        return groups;
    }

    /** @return half the span a meeting's activity is shown over, days: 3 FWHM, at least 1 h */
    public static double halfSpanDays(TrailEncounter m) {
        return Math.max(3 * m.fwhmHours(), 1.0) / 24;
    }

    /**
     * @param meetings cloud meetings whose activity overlaps ({@link #overlapping}; those without a profile
     *        value are left out)
     * @param seed the bootstrap's seed
     * @return their summed activity, or null when fewer than two of them have a non-zero profile
     */
    public static CombinedActivity ofMeetings(List<TrailEncounter> meetings, long seed) {
        List<Part> parts = new ArrayList<>();
        for (TrailEncounter m : meetings) {
            DensityProfile.Result p = m.profile();
            if (p != null && p.peakValue() > 0 && p.lambda() != null) {
                parts.add(new Part(p.lambda(), p.contribution(), p.hLambda(), p.peak(), m.peakT(), m.returnT()));
            }
        }
        return parts.size() < 2 ? null : of(parts, seed);
    }

    /**
     * @param parts the trails' shares
     * @param seed the bootstrap's seed
     * @return their summed activity, or null when there is none or it is zero everywhere
     */
    public static CombinedActivity of(List<Part> parts, long seed) {
        if (parts.isEmpty()) {
            return null;
        }
        double from = Double.POSITIVE_INFINITY;
        double to = Double.NEGATIVE_INFINITY;
        double step = Double.POSITIVE_INFINITY;
        for (Part p : parts) {
            double lo = Arrays.stream(p.lambda()).min().orElseThrow() - 3 * p.hLambda();
            double hi = Arrays.stream(p.lambda()).max().orElseThrow() + 3 * p.hLambda();
            from = Math.min(from, p.timeAt(lo));
            to = Math.max(to, p.timeAt(hi));
            step = Math.min(step, p.timeAt(p.hLambda() / 6) - p.timeAt(0));
        }
        step = Math.max(step, (to - from) / (MAX_GRID - 1));
        int m = (int) Math.ceil((to - from) / step) + 1;
        double[] times = new double[m];
        for (int j = 0; j < m; j++) {
            times[j] = from + j * step;
        }
        double[][] grids = new double[parts.size()][m];
        for (int k = 0; k < parts.size(); k++) {
            for (int j = 0; j < m; j++) {
                grids[k][j] = parts.get(k).lambdaAt(times[j]);
            }
        }
        int[][] all = new int[parts.size()][];
        for (int k = 0; k < parts.size(); k++) {
            all[k] = new int[parts.get(k).lambda().length];
            for (int i = 0; i < all[k].length; i++) {
                all[k][i] = i;
            }
        }
        // Each trail's own profile, kept for its share at the maximum; the sum adds them in order, as sum() does.
        double[][] own = new double[parts.size()][];
        double[] sum = new double[m];
        for (int k = 0; k < parts.size(); k++) {
            Part p = parts.get(k);
            own[k] = DensityProfile.profile(all[k], p.contribution(), p.lambda(), grids[k], p.hLambda());
            for (int j = 0; j < m; j++) {
                sum[j] += own[k][j];
            }
        }
        int best = DensityProfile.argmax(sum);
        if (!(sum[best] > 0)) {
            return null;
        }
        Well19937c rng = new Well19937c(seed);
        double[] peaks = new double[RESAMPLES];
        double[] maxima = new double[RESAMPLES];
        double[][] boots = new double[RESAMPLES][];
        int[][] pick = new int[parts.size()][];
        for (int b = 0; b < RESAMPLES; b++) {
            for (int k = 0; k < parts.size(); k++) {
                int n = all[k].length;
                pick[k] = new int[n];
                for (int i = 0; i < n; i++) {
                    pick[k][i] = rng.nextInt(n);
                }
            }
            double[] s = sum(parts, grids, pick);
            int top = DensityProfile.argmax(s);
            peaks[b] = DensityProfile.refine(times, s, top);
            maxima[b] = s[top];
            boots[b] = s;
        }
        double[][] band = DensityProfile.bands(boots);
        double[] shares = new double[parts.size()];
        double[] returns = new double[parts.size()];
        for (int k = 0; k < parts.size(); k++) {
            returns[k] = parts.get(k).returnT();
            shares[k] = own[k][best] / sum[best];
        }
        return new CombinedActivity(times, sum, band[0], band[1], DensityProfile.refine(times, sum, best),
                DensityProfile.sd(peaks) * 1440, sum[best], DensityProfile.sd(maxima), returns, shares);
    }

    /** The trails' profiles at the grid's times, from the crossings picked in each. */
    private static double[] sum(List<Part> parts, double[][] grids, int[][] pick) {
        double[] total = new double[grids[0].length];
        for (int k = 0; k < parts.size(); k++) {
            Part p = parts.get(k);
            double[] one = DensityProfile.profile(pick[k], p.contribution(), p.lambda(), grids[k], p.hLambda());
            for (int j = 0; j < total.length; j++) {
                total[j] += one[j];
            }
        }
        return total;
    }
}
