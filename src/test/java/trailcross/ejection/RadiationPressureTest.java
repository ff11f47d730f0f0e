package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** β of Burns, Lamy &amp; Soter (1979). */
class RadiationPressureTest {

    @Test
    void constantFollowsFromTheSunsLuminosityAndMass() {
        // Burns, Lamy & Soter (1979): beta = 3 L Q_pr / (16 pi G M c rho s) = 5.7e-4 Q_pr/(rho s) in SI.
        // L = 3.828e26 W (IAU 2015 Resolution B3 nominal solar luminosity), GM = 1.32712440018e20 m^3/s^2
        // (IAU 2015 B3 nominal), c = 299792458 m/s.
        double fromPhysics = 3 * 3.828e26 / (16 * Math.PI * 1.32712440018e20 * 299792458.0);
        assertThat(RadiationPressure.CONSTANT).isCloseTo(fromPhysics, within(0.01 * fromPhysics));
        // A 1 um grain of 1000 kg/m^3 and Q_pr = 1 has beta = 0.57; beta falls as 1/(rho s).
        assertThat(RadiationPressure.beta(1.0, 1000.0, 1e-6)).isCloseTo(0.57, within(1e-12));
        assertThat(RadiationPressure.beta(0.5, 2000.0, 1e-3)).isCloseTo(0.57 / 4000, within(1e-15));
    }
}
