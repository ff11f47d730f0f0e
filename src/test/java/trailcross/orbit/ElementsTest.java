package trailcross.orbit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class ElementsTest {

    /** Earth's GM in km³/s² used by Vallado's examples. */
    private static final double MU_EARTH = 398600.4418;

    @Test
    void valladoExample2_5StateToElements() {
        // Source: Vallado, Fundamentals of Astrodynamics and Applications (4th ed.), Example 2-5:
        // r = 6524.834 I + 6862.875 J + 6448.296 K km, v = 4.901327 I + 5.533756 J − 1.976341 K km/s
        // gives p = 11067.790 km, a = 36127.343 km, e = 0.832853, i = 87.870°, Ω = 227.89°,
        // ω = 53.38°, ν = 92.335°.
        StateVector s = new StateVector(6524.834, 6862.875, 6448.296, 4.901327, 5.533756, -1.976341);
        Elements el = Elements.of(s, 0.0, MU_EARTH);
        // p to 0.01 km: the example's rounded inputs (1 mm, 1 µm/s) carry ~1e-6 relative in h².
        assertThat(el.p()).isCloseTo(11067.790, within(0.01));
        assertThat(el.a()).isCloseTo(36127.343, within(0.01));
        assertThat(el.e()).isCloseTo(0.832853, within(1e-6));
        assertThat(Math.toDegrees(el.i())).isCloseTo(87.870, within(0.001));
        // Ω and ω are printed to two decimals in the example (227.89°, 53.38°, truncated).
        assertThat(Math.toDegrees(el.node())).isCloseTo(227.89, within(0.01));
        assertThat(Math.toDegrees(el.peri())).isCloseTo(53.38, within(0.01));
        assertThat(Math.toDegrees(el.trueAnomalyAt(0.0))).isCloseTo(92.335, within(0.001));
    }

    @Test
    void valladoExample2_6ElementsToState() {
        // Source: Vallado (4th ed.), Example 2-6: p = 11067.790 km, e = 0.83285, i = 87.87°,
        // Ω = 227.89°, ω = 53.38°, ν = 92.335° give r = 6525.368 I + 6861.532 J + 6449.119 K km and
        // v = 4.902279 I + 5.533140 J − 1.975710 K km/s.
        double e = 0.83285;
        Elements el = Elements.ofDegrees(11067.790 / (1 + e), e, 87.87, 227.89, 53.38, 0.0, MU_EARTH);
        StateVector s = el.stateAtTrueAnomaly(Math.toRadians(92.335));
        assertThat(s.x()).isCloseTo(6525.368, within(0.01));
        assertThat(s.y()).isCloseTo(6861.532, within(0.01));
        assertThat(s.z()).isCloseTo(6449.119, within(0.01));
        assertThat(s.vx()).isCloseTo(4.902279, within(1e-5));
        assertThat(s.vy()).isCloseTo(5.533140, within(1e-5));
        assertThat(s.vz()).isCloseTo(-1.975710, within(1e-5));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 0.5, 0.999, 1.0, 1.5, 10.0})
    void roundTripElementsStateElements(double e) {
        double gm = GravitationalParameters.SUN;
        double tp = 2451000.5;
        Elements el = Elements.ofDegrees(0.9, e, 37.0, 123.0, 211.0, tp, gm);
        for (double dt : new double[] {-200.0, -3.0, 0.0, 1.7, 80.0}) {
            double jd = tp + dt;
            Elements back = Elements.of(el.stateAt(jd), jd, gm);
            assertThat(back.q()).as("q e=%s dt=%s", e, dt).isCloseTo(el.q(), within(1e-12));
            assertThat(back.e()).as("e").isCloseTo(e, within(1e-12));
            assertThat(back.i()).as("i").isCloseTo(el.i(), within(1e-12));
            assertThat(back.node()).as("node").isCloseTo(el.node(), within(1e-12));
            if (e > 0) {
                assertThat(back.peri()).as("peri").isCloseTo(el.peri(), within(1e-11));
                assertThat(back.perihelionJd()).as("T").isCloseTo(tp, within(1e-9));
            } else {
                // A circle has no perihelion: the same state must come back.
                StateVector s0 = el.stateAt(jd + 10);
                StateVector s1 = back.stateAt(jd + 10);
                assertThat(s1.distanceTo(s0)).isLessThan(5e-12 * s0.r());
            }
        }
    }

    @Test
    void hyperbolicLargeAnomalyRoundTrip() {
        // A fast unbound visitor 30 years past perihelion: H is large (sinh H ~ 1e3).
        double gm = GravitationalParameters.SUN;
        Elements el = Elements.ofDegrees(1.2, 3.5, 122.0, 24.0, 240.0, 2460000.5, gm);
        double jd = 2460000.5 + 30 * 365.25;
        StateVector s = el.stateAt(jd);
        Elements back = Elements.of(s, jd, gm);
        assertThat(back.q()).isCloseTo(1.2, within(1e-11));
        assertThat(back.e()).isCloseTo(3.5, within(1e-12));
        assertThat(back.perihelionJd()).isCloseTo(2460000.5, within(1e-7));
    }

    @Test
    void periodAndMeanMotion() {
        // Kepler's third law with the Gaussian constant: a = 1 au gives 365.2568983 d, the sidereal
        // year of the Gaussian constant (IAU 1976 definition of k).
        Elements el = Elements.ofDegrees(1.0, 0.0, 0, 0, 0, 0.0, GravitationalParameters.SUN_GAUSSIAN);
        assertThat(el.period()).isCloseTo(365.2568983, within(1e-6));
        Elements m = Elements.ofMeanAnomaly(1.0, 0.5, 0, 0, 0, Math.PI / 2, 100.0,
                GravitationalParameters.SUN_GAUSSIAN);
        assertThat(m.meanAnomalyAt(100.0)).isCloseTo(Math.PI / 2, within(1e-13));
    }
}
