package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.Test;
import trailcross.stream.DirectionLaw;

/**
 * Directions against the laws they claim: on 10^5 draws, cos θ (from the sunward axis) must be uniform
 * on the law's interval and the azimuth uniform (Archimedes: uniform on the sphere ⇔ cos θ uniform),
 * by Pearson's chi-square test (Commons Math) at significance 0.001 over 20 bins each.
 */
class DirectionSamplerTest {

    private static final int DRAWS = 100_000;
    private static final int BINS = 20;
    private static final double ALPHA = 0.001;
    private static final double[] POSITION = {0.6, -0.7, 0.25};

    @Test
    void isotropic() {
        check(new DirectionSampler(DirectionLaw.ISOTROPIC, 0), -1.0);
    }

    @Test
    void sunlitHemisphere() {
        check(new DirectionSampler(DirectionLaw.SUNLIT, 0), 0.0);
    }

    @Test
    void coneOfThirtyDegrees() {
        check(new DirectionSampler(DirectionLaw.CONE, 30.0), Math.cos(Math.toRadians(30)));
    }

    private static void check(DirectionSampler sampler, double cosMin) {
        double r = Math.sqrt(POSITION[0] * POSITION[0] + POSITION[1] * POSITION[1] + POSITION[2] * POSITION[2]);
        double[] axis = {-POSITION[0] / r, -POSITION[1] / r, -POSITION[2] / r};
        // An orthonormal pair perpendicular to the axis, built here independently of the sampler.
        double[] p = cross(axis, new double[] {0, 0, 1});
        double n = Math.sqrt(dot(p, p));
        p = new double[] {p[0] / n, p[1] / n, p[2] / n};
        double[] q = cross(axis, p);
        long[] cosCounts = new long[BINS];
        long[] phiCounts = new long[BINS];
        Well19937c rng = new Well19937c(20261202L);
        double[] d = new double[3];
        for (int k = 0; k < DRAWS; k++) {
            sampler.direction(rng.nextDouble(), rng.nextDouble(), POSITION, d);
            assertThat(dot(d, d)).isCloseTo(1.0, org.assertj.core.api.Assertions.within(1e-14));
            double c = dot(d, axis);
            assertThat(c).isGreaterThanOrEqualTo(cosMin - 1e-14);
            cosCounts[Math.min(BINS - 1, (int) ((c - cosMin) / (1 - cosMin) * BINS))]++;
            double phi = Math.atan2(dot(d, q), dot(d, p)) + Math.PI;
            phiCounts[Math.min(BINS - 1, (int) (phi / (2 * Math.PI) * BINS))]++;
        }
        double[] expected = new double[BINS];
        java.util.Arrays.fill(expected, DRAWS / (double) BINS);
        ChiSquareTest chi = new ChiSquareTest();
        assertThat(chi.chiSquareTest(expected, cosCounts)).as("cos theta uniform p-value").isGreaterThan(ALPHA);
        assertThat(chi.chiSquareTest(expected, phiCounts)).as("azimuth uniform p-value").isGreaterThan(ALPHA);
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }
}
