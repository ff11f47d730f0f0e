package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;

/**
 * Gauss–Radau (IAS15 control, ε = 1e-9 and tighter) against Hipparchus's Dormand–Prince 8(5,3) at tight
 * tolerance (reference library), with the full force model: Sun, planets, Earth, Moon, relativity.
 */
class AgainstReferenceIntegratorsTest {

    private static final ChebyshevCache EPHEMERIS = SharedEphemeris.CACHE;
    private static final ForceModelFactory FORCES = SharedEphemeris.FORCES;

    @Test
    void jupiterCloseApproach() {
        // A particle placed 0.02 au from Jupiter at 2030-01-01 with 12 km/s relative speed (escape speed there: 9 km/s), traced back
        // 3 years, then integrated through the encounter by both methods.
        double tc = 10957.5;
        double[] jup = new double[6];
        EPHEMERIS.heliocentric(Body.JUPITER, tc, jup);
        double kms = 86400 / Body.Constants.AU_KM;
        double[] sc = {jup[0] + 0.02, jup[1], jup[2] + 0.005, jup[3], jup[4] + 12 * kms, jup[5] - 2 * kms};
        ForceModel f = FORCES.create(0);
        double t0 = tc - 3 * 365.25;
        double[] s0 = new GaussRadau15(1e-11, 1e4).integrate(f, tc, sc, t0, null).state();
        double tEnd = tc + 3 * 365.25;
        Outcome gr = new GaussRadau15(1e-9, 1e4).integrate(f, t0, s0, tEnd, null);
        double[] ref = new ReferenceIntegrator(ReferenceIntegrator.Kind.DP853, 1e-16, 1e-15)
                .integrate(FORCES.create(0), t0, s0, tEnd);
        double err = StateVector.of(gr.state()).distanceTo(StateVector.of(ref));
        System.out.printf("Jupiter encounter: GR15 vs DP853 %.2e au (%d steps)%n", err, gr.steps());
        assertThat(err).isLessThan(1e-9);
    }

    @Test
    void halleyTypeOrbitOverACentury() {
        // The demo comet's orbit (q 0.95 au, e 0.91, i 140°: Halley type) for 100 years.
        Elements el = Elements.ofDegrees(0.95, 0.91, 140, 75, 154.8, 9500.0, Body.SUN.gm());
        double t0 = 9000;
        double[] s0 = el.stateAt(t0).toArray();
        double tEnd = t0 - 100 * 365.25;
        Outcome gr = new GaussRadau15(1e-9, 1e4).integrate(FORCES.create(0), t0, s0, tEnd, null);
        double[] ref = new ReferenceIntegrator(ReferenceIntegrator.Kind.DP853, 1e-16, 1e-15)
                .integrate(FORCES.create(0), t0, s0, tEnd);
        double err = StateVector.of(gr.state()).distanceTo(StateVector.of(ref));
        System.out.printf("Halley-type century: GR15 vs DP853 %.2e au (%d steps)%n", err, gr.steps());
        assertThat(err).isLessThan(1e-9);
    }
}
