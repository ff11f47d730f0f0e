package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;

class RelativityTest {

    @Test
    void mercuryPerihelionAdvancesFortyThreeArcsecondsPerCentury() {
        // Einstein (1915): the Schwarzschild term alone advances Mercury's perihelion by 42.98″ per century
        // (a = 0.387098 au, e = 0.205630; common knowledge of the field). Sun + 1PN only, 100 years,
        // compared with the same integration without the term.
        double gm = Body.SUN.gm();
        Elements mercury = Elements.ofDegrees(0.387098 * (1 - 0.205630), 0.205630, 7.0, 48.3, 29.1, 0.0, gm);
        // From perihelion over a whole number of orbits (415 ≈ a century), so that the osculating elements
        // are compared at the same phase and the periodic 1PN terms drop out.
        double[] s0 = mercury.stateAt(0.0).toArray();
        double tEnd = 415 * mercury.period();
        ForceModel newton = new CompositeForceModel(List.of(new SunGravity(gm, 0)));
        ForceModel einstein = new CompositeForceModel(List.of(new SunGravity(gm, 0), new SolarRelativity(gm)));
        double[] a = new GaussRadau15(1e-10, 100).integrate(newton, 0, s0, tEnd, null).state();
        double[] b = new GaussRadau15(1e-10, 100).integrate(einstein, 0, s0, tEnd, null).state();
        Elements ea = Elements.of(StateVector.of(a), tEnd, gm);
        Elements eb = Elements.of(StateVector.of(b), tEnd, gm);
        double advance = Math.toDegrees((eb.node() + eb.peri()) - (ea.node() + ea.peri())) * 3600 * 36525 / tEnd;
        System.out.printf("Mercury 1PN perihelion advance: %.3f arcsec/century%n", advance);
        assertThat(advance).isCloseTo(42.98, within(0.05));
    }
}
