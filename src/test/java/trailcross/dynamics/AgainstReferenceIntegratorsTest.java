package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;

/**
 * Gauss–Radau (IAS15 control, ε = 1e-9 and tighter) against Hipparchus's reference integrators at tight
 * tolerance (reference library), with the full force model: Sun, planets, Earth, Moon, relativity. In the
 * default barycentric frame the reference is Gragg–Bulirsch–Stoer; Dormand–Prince 8(5,3) is compared in the
 * heliocentric frame, because in the barycentric one it stops converging near 3e-9 au over a Halley-type
 * century whatever its tolerance (measured at relative tolerances 1e-15, 3e-16, 1e-16: 1e-10 … 6e-9 au from
 * both Gauss–Radau and GBS, which agree with each other to 1e-11 … 2e-10 au): its rounding, not the model.
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
        compare("Jupiter encounter", t0, s0, tEnd);
    }

    /** Gauss–Radau at ε = 1e-9 against GBS (barycentric) and DP853 (heliocentric), each within 1e-9 au. */
    private static void compare(String what, double t0, double[] s0, double tEnd) {
        Outcome gr = new GaussRadau15(1e-9, 1e4).integrate(FORCES.create(0), t0, s0, tEnd, null);
        double[] gbs = new ReferenceIntegrator(ReferenceIntegrator.Kind.GBS, 1e-16, 1e-14)
                .integrate(FORCES.create(0), t0, s0, tEnd);
        double errGbs = StateVector.of(gr.state()).distanceTo(StateVector.of(gbs));
        ForceModelFactory helio = new ForceModelFactory(EPHEMERIS, true, true, false);
        Outcome grHelio = new GaussRadau15(1e-9, 1e4).integrate(helio.create(0), t0, s0, tEnd, null);
        double[] dp = new ReferenceIntegrator(ReferenceIntegrator.Kind.DP853, 1e-16, 1e-15)
                .integrate(helio.create(0), t0, s0, tEnd);
        double errDp = StateVector.of(grHelio.state()).distanceTo(StateVector.of(dp));
        System.out.printf("%s: GR15 vs GBS %.2e au (%d steps, barycentric); vs DP853 %.2e au (%d steps, "
                + "heliocentric)%n", what, errGbs, gr.steps(), errDp, grHelio.steps());
        assertThat(errGbs).isLessThan(1e-9);
        assertThat(errDp).isLessThan(1e-9);
    }

    @Test
    void halleyTypeOrbitOverACentury() {
        // The demo comet's orbit (q 0.95 au, e 0.91, i 140°: Halley type) for 100 years.
        Elements el = Elements.ofDegrees(0.95, 0.91, 140, 75, 154.8, 9500.0, Body.SUN.gm());
        double t0 = 9000;
        double[] s0 = el.stateAt(t0).toArray();
        double tEnd = t0 - 100 * 365.25;
        compare("Halley-type century", t0, s0, tEnd);
    }

    @Test
    void unboundOrbitFarFromTheSun() {
        // An invented unbound orbit (q 0.6 au, e 1.8) carried back 100 years from perihelion, out to ~700 au,
        // where the Sun's pull is as small as the planets' indirect terms: the step control must not chase
        // the piecewise ephemeris' jumps between blocks (it once stalled there), and both methods agree.
        Elements el = Elements.ofDegrees(0.6, 1.8, 60, 300, 112.2, 2451545.0 + 10800.0, Body.SUN.gm());
        double t0 = 10800.0;
        double[] s0 = el.stateAt(t0 + 2451545.0).toArray();
        double tEnd = t0 - 100 * 365.25;
        Outcome gr = new GaussRadau15(1e-10, 1e5).integrate(FORCES.create(0), t0, s0, tEnd, null);
        assertThat(gr.status()).isEqualTo(Outcome.Status.DONE);
        assertThat(gr.steps()).isLessThan(20_000);
        double[] ref = new ReferenceIntegrator(ReferenceIntegrator.Kind.DP853, 1e-16, 1e-15)
                .integrate(FORCES.create(0), t0, s0, tEnd);
        double err = StateVector.of(gr.state()).distanceTo(StateVector.of(ref));
        double r = StateVector.of(ref).r();
        System.out.printf("Unbound orbit, 100 years back to %.0f au: GR15 vs DP853 %.2e au (%d steps)%n", r, err, gr.steps());
        assertThat(err / r).isLessThan(1e-10);
    }
}
