package trailcross.dynamics;

/**
 * One accepted step of {@link GaussRadau15} with its interpolating polynomial: a(τ) = a0 + Σ b_j τ^{j+1},
 * τ = (t − t0)/dt ∈ [0, 1], integrated twice analytically (Everhart 1985), so that positions and velocities
 * anywhere inside the step cost a polynomial evaluation, to the integrator's own accuracy. The polynomial is
 * in the force model's coordinates; {@link #state} gives heliocentric states (shifting barycentric ones by
 * the Sun's barycentric state at the same instant). The arrays are the integrator's: a handler that keeps a
 * step must {@link #copy()} it.
 */
public final class DenseStep {

    double t0;
    double dt;
    final double[] x0 = new double[3];
    final double[] v0 = new double[3];
    final double[] a0 = new double[3];
    /** b[j][k], j = 0..6, component k. */
    final double[][] b = new double[7][3];
    /** The force model's {@link ForceModel#barycentricShift()}, or null. */
    trailcross.ephemeris.Ephemeris shift;

    /** @return the step's start, TDB days since J2000 */
    public double start() {
        return t0;
    }

    /** @return the step's length in days (negative backwards) */
    public double length() {
        return dt;
    }

    /** @return the step's end */
    public double end() {
        return t0 + dt;
    }

    /**
     * @param t a time inside the step (TDB days since J2000)
     * @param out receives x, y, z, vx, vy, vz
     */
    public void state(double t, double[] out) {
        evaluate(x0, v0, a0, b, (t - t0) / dt, dt, out, out);
        ForceModel.shift(shift, t, out, -1);
    }

    /**
     * The step polynomial at fraction s of a step of length dt (Everhart 1985): positions into
     * {@code x[0..2]}, velocities into {@code v[0..2]} ({@code v} may be {@code x}, then from index 3).
     */
    static void evaluate(double[] x0, double[] v0, double[] a0, double[][] b, double s, double dt, double[] x,
            double[] v) {
        int vo = x == v ? 3 : 0;
        for (int k = 0; k < 3; k++) {
            double b0 = b[0][k];
            double b1 = b[1][k];
            double b2 = b[2][k];
            double b3 = b[3][k];
            double b4 = b[4][k];
            double b5 = b[5][k];
            double b6 = b[6][k];
            double px = a0[k] / 2 + s * (b0 / 6 + s * (b1 / 12 + s * (b2 / 20 + s * (b3 / 30
                    + s * (b4 / 42 + s * (b5 / 56 + s * b6 / 72))))));
            double pv = a0[k] + s * (b0 / 2 + s * (b1 / 3 + s * (b2 / 4 + s * (b3 / 5
                    + s * (b4 / 6 + s * (b5 / 7 + s * b6 / 8))))));
            double h = s * dt;
            x[k] = x0[k] + h * v0[k] + h * h * px;
            v[vo + k] = v0[k] + h * pv;
        }
    }

    /** @return an independent copy of this step */
    public DenseStep copy() {
        DenseStep c = new DenseStep();
        c.t0 = t0;
        c.dt = dt;
        c.shift = shift;
        System.arraycopy(x0, 0, c.x0, 0, 3);
        System.arraycopy(v0, 0, c.v0, 0, 3);
        System.arraycopy(a0, 0, c.a0, 0, 3);
        for (int j = 0; j < 7; j++) {
            System.arraycopy(b[j], 0, c.b[j], 0, 3);
        }
        return c;
    }
}
