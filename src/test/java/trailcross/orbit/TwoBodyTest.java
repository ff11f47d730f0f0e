package trailcross.orbit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class TwoBodyTest {

    private static final double K2 = GravitationalParameters.SUN_GAUSSIAN;

    @ParameterizedTest
    @CsvSource({
        // Source: Meeus, Astronomical Algorithms (2nd ed.), ch. 35 (near-parabolic motion), the worked
        // cases of Table 35.A, recalled from memory: q (au), e, t − T (days), ν (deg), r (au).
        "0.1,       0.987,      254.9,   164.50029, 4.063777",
        "3.363943,  1.05731,    1237.1,  109.40598, 10.668551",
    })
    void meeusNearParabolic(double q, double e, double dt, double nuDeg, double r) {
        Elements el = Elements.ofDegrees(q, e, 0, 0, 0, 0.0, K2);
        StateVector s = el.stateAt(dt);
        assertThat(s.r()).isCloseTo(r, within(2e-6));
        assertThat(Math.toDegrees(Math.atan2(s.y(), s.x()))).isCloseTo(nuDeg, within(2e-5));
    }

    @Test
    void parabolaAgreesWithBarker() {
        // Barker's equation (Meeus 1998, ch. 34) in closed form against the universal variables at e = 1.
        double q = 0.7;
        Elements el = Elements.ofDegrees(q, 1.0, 0, 0, 0, 0.0, K2);
        for (double dt : new double[] {-400, -10, 0.5, 33, 1000, 20000}) {
            double w = 3 * GravitationalParameters.GAUSSIAN_K * dt / (q * Math.sqrt(2 * q));
            double s = KeplerSolver.barker(w);
            double nu = 2 * Math.atan(s);
            StateVector st = el.stateAt(dt);
            assertThat(st.r()).isCloseTo(q * (1 + s * s), within(1e-12 * st.r()));
            assertThat(Math.atan2(st.y(), st.x())).isCloseTo(nu, within(1e-12));
        }
    }

    @ParameterizedTest
    @CsvSource({"0.1", "0.9", "0.99", "0.9999"})
    void manyOrbitsAgainstKeplerEquation(double e) {
        // 1000 revolutions in one call against the exact solution M = E − e sin E.
        double a = 2.0;
        Elements el = Elements.ofDegrees(a * (1 - e), e, 10, 20, 30, 0.0, K2);
        double period = el.period();
        for (double frac : new double[] {0.013, 0.25, 0.5, 0.77}) {
            double dt = 1000 * period + frac * period;
            StateVector s = el.stateAt(dt);
            double ecc = KeplerSolver.eccentricAnomaly(2 * Math.PI * frac, e);
            double rExact = a * (1 - e * Math.cos(ecc));
            assertThat(s.r()).as("e=%s frac=%s", e, frac).isCloseTo(rExact, within(2e-9 * a));
        }
    }

    @Test
    void energyAndAngularMomentumConservedOnHyperbola() {
        double[] s = {1.0, 0.2, -0.1, 0.001, 0.03, 0.004};
        double[] out = new double[6];
        double e0 = energy(s);
        double[] h0 = momentum(s);
        for (double dt : new double[] {-5000, -1, 1e-6, 3, 400, 36500}) {
            TwoBody.propagate(s, dt, K2, out);
            assertThat(energy(out)).isCloseTo(e0, within(1e-13 * Math.abs(e0)));
            double[] h = momentum(out);
            for (int k = 0; k < 3; k++) {
                assertThat(h[k]).isCloseTo(h0[k], within(1e-13 * Math.abs(h0[k])));
            }
        }
    }

    @Test
    void forwardThenBackIsIdentity() {
        double[] s = {0.3, -0.9, 0.05, 0.016, 0.004, 0.002};
        double[] mid = new double[6];
        double[] back = new double[6];
        TwoBody.propagate(s, 123.456, K2, mid);
        TwoBody.propagate(mid, -123.456, K2, back);
        for (int k = 0; k < 6; k++) {
            assertThat(back[k]).isCloseTo(s[k], within(1e-13));
        }
    }

    private static double energy(double[] s) {
        double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
        return 0.5 * (s[3] * s[3] + s[4] * s[4] + s[5] * s[5]) - K2 / r;
    }

    private static double[] momentum(double[] s) {
        return new double[] {s[1] * s[5] - s[2] * s[4], s[2] * s[3] - s[0] * s[5], s[0] * s[4] - s[1] * s[3]};
    }
}
