package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.junit.jupiter.api.Test;

/** Masses against the power law dN ∝ m^−s dm they claim. */
class SizeDistributionTest {

    @Test
    void massesFollowThePowerLaw() {
        // Kolmogorov-Smirnov (Commons Math) on 10^5 draws: the law's own CDF F(m) = (m^(1-s) - a^(1-s)) /
        // (b^(1-s) - a^(1-s)), written here, maps the draws to uniform ones; significance 0.001.
        for (double s : new double[] {1.5, 2.0, 2.6}) {
            SizeDistribution d = new SizeDistribution(1e-4, 1e-2, 800.0, s, 1);
            double a = d.lowerEdge(0);
            double b = d.upperEdge(0);
            Well19937c rng = new Well19937c(7L);
            double[] u = new double[100_000];
            for (int k = 0; k < u.length; k++) {
                double m = d.mass(rng.nextDouble());
                assertThat(m).isBetween(a * (1 - 1e-12), b * (1 + 1e-12));
                u[k] = (Math.pow(m, 1 - s) - Math.pow(a, 1 - s)) / (Math.pow(b, 1 - s) - Math.pow(a, 1 - s));
            }
            double p = new KolmogorovSmirnovTest().kolmogorovSmirnovTest(new UniformRealDistribution(0, 1), u);
            assertThat(p).as("KS p-value, s = " + s).isGreaterThan(0.001);
        }
    }

    @Test
    void binsAndMeanMassAgreeWithClosedForms() {
        // For s = 2: <m> = a b ln(b/a) / (b - a) (from the integrals of m^-1 and m^-2); each of K log bins of
        // ratio g = (b/a)^(1/K) holds a number fraction proportional to g^-k.
        SizeDistribution d = new SizeDistribution(1e-4, 1e-2, 1000.0, 2.0, 4);
        double a = d.lowerEdge(0);
        double b = d.upperEdge(3);
        assertThat(d.meanMass()).isCloseTo(a * b * Math.log(b / a) / (b - a), within(1e-12 * a * 10));
        double g = Math.pow(b / a, 0.25);
        double sum = 0;
        for (int k = 0; k < 4; k++) {
            sum += d.numberFraction(k);
            assertThat(d.numberFraction(k) / d.numberFraction(0)).isCloseTo(Math.pow(g, -k), within(1e-12));
            double m = d.massInBin(k, 0.37);
            assertThat(m).isBetween(d.lowerEdge(k), d.upperEdge(k));
        }
        assertThat(sum).isCloseTo(1.0, within(1e-14));
        assertThat(d.radius(d.lowerEdge(0))).isCloseTo(1e-4, within(1e-18));
    }

    @Test
    void oneSizeOnly() {
        SizeDistribution d = new SizeDistribution(1e-3, 1e-3, 1000.0, 2.0, 5);
        assertThat(d.bins()).isEqualTo(1);
        assertThat(d.mass(0.7)).isEqualTo(d.lowerEdge(0));
        assertThat(d.meanMass()).isEqualTo(d.lowerEdge(0));
    }
}
