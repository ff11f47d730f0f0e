package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;

class GaussRadau15Test {

    private static final double GM = Body.SUN.gm();

    private static ForceModel kepler() {
        return new CompositeForceModel(List.of(new SunGravity(GM, 0)));
    }

    /**
     * Two-body motion against the exact Kepler solution (universal variables, {@link Elements#stateAt})
     * after 1000 orbits; energy and angular momentum drift bounded (the style of Hipparchus's reference
     * problems, e.g. its Keplerian test problem).
     */
    @ParameterizedTest
    @CsvSource({"0.1, 2e-9", "0.9, 2e-8", "0.99, 2e-7"})
    void thousandOrbitsAgainstKepler(double e, double tolerance) {
        double a = 1.3;
        Elements el = Elements.ofDegrees(a * (1 - e), e, 20, 40, 60, 0.0, GM);
        double t0 = 0.3 * el.period();
        double[] s0 = el.stateAt(t0).toArray();
        double tEnd = t0 + 1000 * el.period();
        GaussRadau15 gr = new GaussRadau15(1e-9, 1e4);
        Outcome out = gr.integrate(kepler(), t0, s0, tEnd, null);
        assertThat(out.status()).isEqualTo(Outcome.Status.DONE);
        StateVector exact = el.stateAt(tEnd);
        double err = StateVector.of(out.state()).distanceTo(exact);
        System.out.printf("GR15 e=%.2f 1000 orbits: position error %.2e au, %d steps%n", e, err, out.steps());
        assertThat(err / a).isLessThan(tolerance);
        assertThat(Math.abs(energy(out.state()) / energy(s0) - 1)).isLessThan(tolerance);
        assertThat(Math.abs(momentum(out.state()) / momentum(s0) - 1)).isLessThan(tolerance);
    }

    @Test
    void hyperbolicFlybyBothWays() {
        Elements el = Elements.ofDegrees(0.3, 2.5, 50, 10, 100, 0.0, GM);
        double[] s0 = el.stateAt(-200).toArray();
        GaussRadau15 gr = new GaussRadau15(1e-9, 1e4);
        Outcome fwd = gr.integrate(kepler(), -200, s0, 200, null);
        assertThat(StateVector.of(fwd.state()).distanceTo(el.stateAt(200))).isLessThan(1e-10);
        Outcome back = gr.integrate(kepler(), 200, fwd.state(), -200, null);
        assertThat(StateVector.of(back.state()).distanceTo(el.stateAt(-200))).isLessThan(1e-10);
    }

    @Test
    void denseOutputMatchesTheExactOrbitInsideSteps() {
        Elements el = Elements.ofDegrees(0.5, 0.8, 10, 0, 0, 0.0, GM);
        double[] s0 = el.stateAt(-30).toArray();
        double[] worst = {0};
        new GaussRadau15(1e-9, 1e4).integrate(kepler(), -30, s0, 30, step -> {
            double[] s = new double[6];
            for (double f = 0.1; f < 1; f += 0.2) {
                double t = step.start() + f * step.length();
                step.state(t, s);
                worst[0] = Math.max(worst[0], StateVector.of(s).distanceTo(el.stateAt(t)));
            }
        });
        assertThat(worst[0]).isLessThan(1e-11);
    }

    @Test
    void plungingIntoTheSunStopsWithAReason() {
        double[] s0 = {0.5, 0, 0, 0, 1e-5, 0};
        Outcome o = new GaussRadau15(1e-9, 1e4).integrate(kepler(), 0, s0, 100, null);
        assertThat(o.status()).isEqualTo(Outcome.Status.HIT_SUN);
        for (double v : o.state()) {
            assertThat(v).isFinite();
        }
    }

    private static double energy(double[] s) {
        double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
        return 0.5 * (s[3] * s[3] + s[4] * s[4] + s[5] * s[5]) - GM / r;
    }

    private static double momentum(double[] s) {
        double hx = s[1] * s[5] - s[2] * s[4];
        double hy = s[2] * s[3] - s[0] * s[5];
        double hz = s[0] * s[4] - s[1] * s[3];
        return Math.sqrt(hx * hx + hy * hy + hz * hz);
    }
}
