package trailcross.encounter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.Random;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;
import org.junit.jupiter.api.Test;

/** Capture with gravitational focusing. */
class CaptureTest {

    /** The Earth's GM, km³/s² (IERS Conventions 2010, Table 1.1). */
    private static final double GM = 398600.4418;
    private static final double R = 6378.137 + 100;

    @Test
    void crossSectionIsTheTextbookFocusingFormula() {
        // σ = π R² (1 + v_esc²/v∞²), v_esc² = 2GM/R (Öpik 1951; Jones & Poole 2007, eq. 1; from memory):
        // at the Earth with R = 6478 km, v_esc = 11.09 km/s; at v∞ = 11.09 km/s the factor is 2.
        double vEsc = Math.sqrt(2 * GM / R);
        assertThat(vEsc).isCloseTo(11.093, offset(0.001));
        assertThat(Capture.crossSection(R, GM, vEsc * vEsc) / (Math.PI * R * R)).isCloseTo(2.0, offset(1e-12));
        double v = 20;
        assertThat(Capture.crossSection(R, GM, v * v)).isCloseTo(Math.PI * R * R * (1 + vEsc * vEsc / (v * v)),
                offset(1e-6));
        // Far out on a path aimed 7000 km from the centre: without gravity it misses the 6478-km sphere, with
        // the Earth's it is focused inside (the focused radius at 20 km/s is 7407 km).
        double[] rel = {1e6, 7000, 0, -20, 0, 0};
        assertThat(Capture.impactParameter(rel, 0)).isCloseTo(7000, offset(1e-9));
        assertThat(Capture.captured(rel, 0, R)).isFalse();
        assertThat(Capture.captured(rel, GM, R)).isTrue();
    }

    @Test
    void monteCarloCapturesOfAUniformStreamMatchTheCrossSection() {
        // A uniform stream at v∞ = 5 km/s (focusing factor 5.9) over a disc of 5 R: each meteoroid's path in
        // the Earth's field integrated (Dormand–Prince 8(5,3), Hipparchus) from 300 R away; captured when it
        // comes inside R. The count matches N σ / (π B²) within 3 binomial standard deviations, and the
        // capture test on the relative state half-way in agrees with the integrated path meteoroid by meteoroid.
        double vInf = 5;
        double big = 5 * R;
        int n = 1500;
        Random rnd = new Random(20261202);
        int caught = 0;
        int agree = 0;
        for (int k = 0; k < n; k++) {
            double b = big * Math.sqrt(rnd.nextDouble());
            double phi = 2 * Math.PI * rnd.nextDouble();
            double x0 = -300 * R;
            double r0 = Math.sqrt(x0 * x0 + b * b);
            double v0 = Math.sqrt(vInf * vInf + 2 * GM / r0);
            // Direction so that the angular momentum is b v∞ (energy and momentum of the hyperbola).
            double vt = b * vInf / r0;
            double vr = -Math.sqrt(v0 * v0 - vt * vt);
            double ux = x0 / r0;
            double uy = b / r0;
            double[] y = {x0, b * Math.cos(phi), b * Math.sin(phi), 0, 0, 0};
            // Radial unit vector (ux, uy·cos φ, uy·sin φ); transverse in the same plane.
            double[] radial = {ux, uy * Math.cos(phi), uy * Math.sin(phi)};
            double[] trans = {-uy, ux * Math.cos(phi), ux * Math.sin(phi)};
            for (int c = 0; c < 3; c++) {
                y[3 + c] = vr * radial[c] + vt * trans[c];
            }
            double[] minR = {Double.POSITIVE_INFINITY};
            double[] mid = new double[6];
            OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
                @Override
                public int getDimension() {
                    return 6;
                }

                @Override
                public double[] computeDerivatives(double t, double[] s) {
                    double r3 = Math.pow(s[0] * s[0] + s[1] * s[1] + s[2] * s[2], 1.5);
                    return new double[] {s[3], s[4], s[5], -GM * s[0] / r3, -GM * s[1] / r3, -GM * s[2] / r3};
                }
            };
            DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-3, 1e4, 1e-9, 1e-12);
            double tEnd = 2 * 300 * R / vInf;
            dp.addStepHandler(new ODEStepHandler() {
                @Override
                public void handleStep(ODEStateInterpolator interp) {
                    double a = interp.getPreviousState().getTime();
                    double e = interp.getCurrentState().getTime();
                    for (int j = 0; j <= 20; j++) {
                        ODEStateAndDerivative st = interp.getInterpolatedState(a + (e - a) * j / 20);
                        double[] s = st.getPrimaryState();
                        double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
                        minR[0] = Math.min(minR[0], r);
                    }
                    if (a <= tEnd / 4 && e > tEnd / 4) {
                        System.arraycopy(interp.getInterpolatedState(tEnd / 4).getPrimaryState(), 0, mid, 0, 6);
                    }
                }
            });
            dp.integrate(ode, new ODEState(0, y), tEnd);
            boolean hit = minR[0] < R;
            if (hit) {
                caught++;
            }
            if (Capture.captured(mid, GM, R) == hit) {
                agree++;
            }
        }
        double p = Capture.crossSection(R, GM, vInf * vInf) / (Math.PI * big * big);
        double expected = n * p;
        double sd = Math.sqrt(n * p * (1 - p));
        assertThat((double) caught).isCloseTo(expected, offset(3 * sd));
        assertThat(agree).isGreaterThanOrEqualTo(n - 2);
    }
}
