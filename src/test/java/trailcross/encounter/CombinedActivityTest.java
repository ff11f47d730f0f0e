package trailcross.encounter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * The summed activity of several trails against clouds whose summed density is known exactly: two Gaussian
 * clumps of crossings along the Earth's path, each on its own longitude unwrapping and time mapping, as two
 * trails are. A Gaussian kernel density of a Gaussian sample of spread s with bandwidth h has expectation the
 * Gaussian of spread √(s² + h²) (Silverman 1986, sec. 3.3), so the sum's expected value and, by symmetry, its
 * maximum's place are known.
 */
class CombinedActivityTest {

    private static final double H = TrailEncounter.HOURS_PER_DEGREE;

    /** A clump of n crossings about {@code centre} (degrees) with spread s, each adding 1/n. */
    private static CombinedActivity.Part clump(long seed, int n, double centre, double s, double atT) {
        Well19937c rng = new Well19937c(seed);
        double[] lambda = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            lambda[i] = centre + s * rng.nextGaussian();
            c[i] = 1.0 / n;
        }
        double[] w = new double[n];
        Arrays.fill(w, 1.0);
        return new CombinedActivity.Part(lambda, c, DensityProfile.bandwidth(lambda, w), centre, atT, seed);
    }

    private static double normal(double x, double s) {
        return Math.exp(-0.5 * x * x / (s * s)) / (s * Math.sqrt(2 * Math.PI));
    }

    @Test
    void oneTrailAloneGivesItsOwnProfile() {
        // The trail's own profile (DensityProfile) and the "sum" of that trail alone: same maximum, same value.
        Well19937c rng = new Well19937c(11);
        int n = 1500;
        double[] dr = new double[n];
        double[] lon = new double[n];
        double[] w = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            dr[i] = 2e-4 * rng.nextGaussian();
            lon[i] = 74.96 + 0.02 * rng.nextGaussian();
            w[i] = 1;
            v[i] = 1;
        }
        DensityProfile.Result p = DensityProfile.of(dr, lon, w, v, 5);
        double peakT = 9999.25;
        CombinedActivity c = CombinedActivity.of(List.of(new CombinedActivity.Part(p.lambda(), p.contribution(),
                p.hLambda(), p.peak(), peakT, 1899)), 6);
        double step = p.hLambda() / 6 * H / 24;
        assertThat(c.peakT()).isCloseTo(peakT, within(step));
        assertThat(c.peakValue() / p.peakValue()).isCloseTo(1.0, within(1e-3));
        assertThat(c.trails()).isEqualTo(1);
        assertThat(c.makers(0.1)).hasSize(1);
        assertThat(c.makers(0.1).get(0)[0]).isEqualTo(1899);
        assertThat(c.makers(0.1).get(0)[1]).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void twoEqualTrailsPeakBetweenThemAtTheirSummedDensity() {
        double s = 0.01;
        double d = 0.012;
        int n = 4000;
        // Trail A about λ 100° met at t = 0; trail B on another unwrapping (λ 460° ≡ 100°) met d degrees later.
        CombinedActivity.Part a = clump(21, n, 100.0, s, 0.0);
        CombinedActivity.Part b = clump(22, n, 460.0, s, d * H / 24);
        CombinedActivity c = CombinedActivity.of(List.of(a, b), 7);
        double mid = 0.5 * d * H / 24;
        assertThat(c.peakSigmaMin()).isPositive();
        assertThat(Math.abs(c.peakT() - mid) * 1440).isLessThan(3 * c.peakSigmaMin() + 1.0);
        // Expected sum at the midpoint: each clump's smoothed Gaussian at d/2 from its centre (per degree).
        double expected = normal(d / 2, Math.hypot(s, a.hLambda())) + normal(d / 2, Math.hypot(s, b.hLambda()));
        assertThat(c.peakValue()).isCloseTo(expected, within(4 * c.peakValueSigma()));
        assertThat(c.peakValueSigma() / c.peakValue()).isLessThan(0.05);
        // At the midpoint each makes about half the sum, and the shares add up to the whole.
        assertThat(c.shareAtPeak()[0]).isCloseTo(0.5, within(0.1));
        assertThat(c.shareAtPeak()[0] + c.shareAtPeak()[1]).isCloseTo(1.0, within(1e-9));
        assertThat(c.makers(0.1)).hasSize(2);
        // The bands hold the profile at its maximum.
        int top = DensityProfile.argmax(c.value());
        assertThat(c.low()[top]).isLessThanOrEqualTo(c.value()[top]);
        assertThat(c.high()[top]).isGreaterThanOrEqualTo(c.value()[top]);
    }

    /** A meeting with only the fields grouping reads: its peak (days) and FWHM (hours). */
    private static TrailEncounter meeting(double peakT, double fwhmHours) {
        return new TrailEncounter(0, 1, peakT, 1, 75, 0, 0, 10, 0, 0, 30, fwhmHours, 1, 0, 1, 0, 10, null);
    }

    @Test
    void onlyTrailsWhoseHoursOverlapAreSummed() {
        // Spans are the peak ± 3 FWHM (at least ± 1 h): A −3..+3 h, B +1.8..+7.8 h overlap; C, 100 days on (a
        // shower at the other node), stands alone; D's ± 1 h touches neither.
        TrailEncounter a = meeting(0.0, 1.0);
        TrailEncounter b = meeting(0.2, 1.0);
        TrailEncounter c = meeting(100.0, 2.0);
        TrailEncounter d = meeting(0.5, 0.1);
        List<List<TrailEncounter>> groups = CombinedActivity.overlapping(List.of(c, b, d, a));
        assertThat(groups).hasSize(3);
        assertThat(groups.get(0)).containsExactly(a, b);
        assertThat(groups.get(1)).containsExactly(d);
        assertThat(groups.get(2)).containsExactly(c);
    }

    @Test
    void trailsThatPeakApartAreBothListed() {
        // Two equal clumps 0.1 degree (2.4 h) apart, ten times their spread: the sum has a maximum at each, the
        // second listed at about its full share; a clump of a third of the size between them is not a maximum.
        double s = 0.01;
        CombinedActivity.Part a = clump(31, 3000, 50.0, s, 0.0);
        CombinedActivity.Part b = clump(32, 3000, 50.0, s, 0.1 * H / 24);
        CombinedActivity c = CombinedActivity.of(List.of(a, b), 8);
        List<double[]> other = c.otherMaxima();
        assertThat(other).hasSize(1);
        assertThat(other.get(0)[1]).isCloseTo(1.0, within(0.1));
        double[] times = {c.peakT(), other.get(0)[0]};
        Arrays.sort(times);
        assertThat(times[0] * 1440).isCloseTo(0.0, within(5.0));
        assertThat(times[1] * 1440).isCloseTo(0.1 * H * 60, within(5.0));
        // Ten spreads apart, the maximum is one trail's alone.
        assertThat(c.makers(0.1)).hasSize(1);
        assertThat(c.makers(0.1).get(0)[1]).isGreaterThan(0.99);
    }
}
