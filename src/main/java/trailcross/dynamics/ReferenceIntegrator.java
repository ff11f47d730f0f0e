package trailcross.dynamics;

import org.hipparchus.ode.ODEIntegrator;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.nonstiff.GraggBulirschStoerIntegrator;

/**
 * Hipparchus's general-purpose integrators on the same force model, as first-order systems: Dormand–Prince
 * 8(5,3) (Hairer, Nørsett &amp; Wanner 1993) and Gragg–Bulirsch–Stoer extrapolation. They are the reference
 * the Gauss–Radau integrator is checked against, and an {@code --integrator} choice. States in and out are
 * heliocentric; the integration runs in the force model's own coordinates.
 */
public final class ReferenceIntegrator {

    /** Which Hipparchus integrator. */
    public enum Kind {
        /** Hipparchus {@code DormandPrince853Integrator}. */
        DP853,
        /** Hipparchus {@code GraggBulirschStoerIntegrator}. */
        GBS
    }

    private final Kind kind;
    private final double absTol;
    private final double relTol;

    /**
     * @param kind the integrator
     * @param absTol absolute tolerance (au, au/d)
     * @param relTol relative tolerance
     */
    public ReferenceIntegrator(Kind kind, double absTol, double relTol) {
        this.kind = kind;
        this.absTol = absTol;
        this.relTol = relTol;
    }

    /**
     * @param force the force model
     * @param t0 start, TDB days since J2000
     * @param state x, y, z, vx, vy, vz
     * @param tEnd end
     * @return the state at tEnd
     */
    public double[] integrate(ForceModel force, double t0, double[] state, double tEnd) {
        ODEIntegrator integrator = switch (kind) {
            case DP853 -> new DormandPrince853Integrator(1e-10, 1e4, absTol, relTol);
            case GBS -> new GraggBulirschStoerIntegrator(1e-10, 1e4, absTol, relTol);
        };
        integrator.setMaxEvaluations(Integer.MAX_VALUE);
        double[] x = new double[3];
        double[] v = new double[3];
        double[] a = new double[3];
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 6;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                System.arraycopy(y, 0, x, 0, 3);
                System.arraycopy(y, 3, v, 0, 3);
                force.acceleration(t, x, v, a);
                return new double[] {y[3], y[4], y[5], a[0], a[1], a[2]};
            }
        };
        double[] start = state.clone();
        force.toModel(t0, start);
        ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(t0, start), tEnd);
        double[] out = end.getPrimaryState();
        force.toHeliocentric(tEnd, out);
        return out;
    }
}
