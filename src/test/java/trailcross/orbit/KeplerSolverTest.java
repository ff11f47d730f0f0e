package trailcross.orbit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class KeplerSolverTest {

    @Test
    void meeusExample30a() {
        // Source: Meeus, Astronomical Algorithms (2nd ed.), Example 30.a: e = 0.100, M = 5°
        // gives E = 5.554589°.
        double ecc = KeplerSolver.eccentricAnomaly(Math.toRadians(5), 0.1);
        assertThat(Math.toDegrees(ecc)).isCloseTo(5.554589, within(1e-6));
    }

    @Test
    void ellipticSolutionsSatisfyTheEquationUpToEccentricityOne() {
        for (double e : new double[] {0, 0.3, 0.9, 0.99, 0.999999, 1 - 1e-12}) {
            for (double m = -7; m <= 7; m += 0.013) {
                double ecc = KeplerSolver.eccentricAnomaly(m, e);
                assertThat(ecc - e * Math.sin(ecc)).as("e=%s M=%s", e, m).isCloseTo(m, within(1e-14 * 8));
            }
            double tiny = KeplerSolver.eccentricAnomaly(1e-9, e);
            assertThat(tiny - e * Math.sin(tiny)).isCloseTo(1e-9, within(1e-18));
        }
    }

    @Test
    void hyperbolicSolutionsSatisfyTheEquationForLargeAnomalies() {
        for (double e : new double[] {1 + 1e-9, 1.01, 1.5, 10, 1000}) {
            for (double m : new double[] {-1e6, -50, -1, -1e-6, 1e-8, 0.5, 3, 700, 1e5, 1e9}) {
                double h = KeplerSolver.hyperbolicAnomaly(m, e);
                double back = e * Math.sinh(h) - h;
                assertThat(back).as("e=%s M=%s", e, m).isCloseTo(m, within(1e-13 * Math.max(1, Math.abs(m))));
            }
        }
    }
}
