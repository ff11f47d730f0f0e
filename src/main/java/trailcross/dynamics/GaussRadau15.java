package trailcross.dynamics;

/**
 * The 15th-order Gauss–Radau integrator for second-order equations x″ = a(t, x, x′) of Everhart (1985,
 * "An efficient integrator that uses Gauss–Radau spacings", IAU Coll. 83) with the predictor–corrector
 * iteration to machine precision and the adaptive step control of IAS15 (Rein &amp; Spiegel 2015, MNRAS
 * 446, 1424, eqs. 7–11): the step error is estimated by the global ratio max|b6| / max|a| and the step
 * scaled by (ε / error)^{1/7}, rejecting steps that would shrink by more than a safety factor of 4.
 * One particle, its own step sequence. Not thread-safe: one instance per thread.
 */
public final class GaussRadau15 {

    /** The Gauss–Radau spacings h_1 … h_7 on [0, 1] (Everhart 1985, h_0 = 0). */
    static final double[] H = {
        0.0, 0.0562625605369221464656521910318, 0.180240691736892364987579942780,
        0.352624717113169637373907769648, 0.547153626330555383001448554766,
        0.734210177215410531523210605558, 0.885320946839095768090359771030,
        0.977520613561287501891174488626
    };
    /** C[k][j]: coefficient of τ^{j+1} in τ(τ − h_1)…(τ − h_k); b_j = Σ_{k ≥ j} C[k][j] g_k. */
    private static final double[][] C = new double[7][7];
    /** D = C⁻¹ in the sense g_k = Σ_{j ≥ k} D[k][j] b_j. */
    private static final double[][] D = new double[7][7];

    static {
        for (int k = 0; k < 7; k++) {
            // Expand τ · Π_{m=1..k} (τ − h_m): poly[p] is the coefficient of τ^{p+1}.
            double[] poly = new double[8];
            poly[0] = 1;
            for (int m = 1; m <= k; m++) {
                for (int p = m; p >= 0; p--) {
                    poly[p] = (p > 0 ? poly[p - 1] : 0) - H[m] * poly[p];
                }
            }
            for (int j = 0; j <= k; j++) {
                C[k][j] = poly[j];
            }
        }
        double gain = 0;
        for (int n = 0; n < 8; n++) {
            double w = 1;
            for (int m = 0; m < 8; m++) {
                if (m != n) {
                    w *= H[n] - H[m];
                }
            }
            gain += 1 / Math.abs(w);
        }
        ROUNDING_GAIN = gain;
        // M[j][k] = C[k][j] is upper triangular with unit diagonal; invert by back substitution.
        for (int col = 0; col < 7; col++) {
            for (int row = col; row >= 0; row--) {
                double s = row == col ? 1 : 0;
                for (int m = row + 1; m <= col; m++) {
                    s -= C[m][row] * D[m][col];
                }
                D[row][col] = s;
            }
        }
    }

    private static final double SAFETY = 0.25;
    private static final int MAX_ITERATIONS = 12;
    private static final double MIN_STEP = 1e-9;
    /** Consecutive accepted steps below {@link #MIN_STEP} after which the integration stops. */
    private static final int MAX_TINY_STEPS = 1000;

    private final double epsilon;
    private final double escapeDistance;

    /** Σ |w_n| of the divided-difference weights giving g6 from the eight accelerations (computed below). */
    static final double ROUNDING_GAIN;
    /** Factor between the force model's one-ulp rounding estimate and the jitter seen in b6. */
    private static final double NOISE_MARGIN = 64;

    private final DenseStep step = new DenseStep();
    private final double[][] g = new double[7][3];
    private final double[][] e = new double[7][3];
    private final double[][] bSaved = new double[7][3];
    private final double[] x = new double[3];
    private final double[] v = new double[3];
    private final double[] a = new double[3];

    /**
     * @param epsilon the IAS15 accuracy parameter ε (1e-9 in Rein &amp; Spiegel 2015)
     * @param escapeDistance heliocentric distance (au) beyond which a particle is left
     */
    public GaussRadau15(double epsilon, double escapeDistance) {
        this.epsilon = epsilon;
        this.escapeDistance = escapeDistance;
    }

    /**
     * Integrates from (t0, state) to tEnd (either direction).
     *
     * @param force the force model
     * @param t0 start, TDB days since J2000
     * @param state x, y, z, vx, vy, vz at t0 (not changed)
     * @param tEnd where to stop
     * @param handler receives each accepted step, or null
     * @return the outcome
     */
    public Outcome integrate(ForceModel force, double t0, double[] state, double tEnd, StepHandler handler) {
        double t = t0;
        double[] x0 = step.x0;
        double[] v0 = step.v0;
        double[] a0 = step.a0;
        double[][] b = step.b;
        System.arraycopy(state, 0, x0, 0, 3);
        System.arraycopy(state, 3, v0, 0, 3);
        for (int j = 0; j < 7; j++) {
            java.util.Arrays.fill(b[j], 0);
            java.util.Arrays.fill(e[j], 0);
        }
        double direction = Math.signum(tEnd - t0);
        long steps = 0;
        int tinySteps = 0;
        long rejected = 0;
        if (direction == 0) {
            return new Outcome(Outcome.Status.DONE, t, state.clone(), 0, 0, "");
        }
        double r0 = Math.sqrt(x0[0] * x0[0] + x0[1] * x0[1] + x0[2] * x0[2]);
        double speed = Math.sqrt(v0[0] * v0[0] + v0[1] * v0[1] + v0[2] * v0[2]);
        double dt = direction * Math.min(Math.abs(tEnd - t0), Math.max(1e-3, 0.01 * r0 / Math.max(speed, 1e-12)));
        force.takeImpact();
        force.takeRoundingError();
        while (true) {
            boolean last = false;
            if (Math.abs(dt) >= Math.abs(tEnd - t)) {
                dt = tEnd - t;
                last = true;
            }
            force.acceleration(t, x0, v0, a0);
            // g from the predicted b.
            for (int k = 0; k < 3; k++) {
                for (int i = 0; i < 7; i++) {
                    double s = 0;
                    for (int j = i; j < 7; j++) {
                        s += D[i][j] * b[j][k];
                    }
                    g[i][k] = s;
                }
            }
            for (int j = 0; j < 7; j++) {
                System.arraycopy(b[j], 0, bSaved[j], 0, 3);
            }
            double previousError = Double.MAX_VALUE;
            for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
                double maxA = 0;
                double maxDb6 = 0;
                for (int n = 1; n <= 7; n++) {
                    substep(t, dt, H[n], force);
                    for (int k = 0; k < 3; k++) {
                        double f = a[k] - a0[k];
                        // Newton divided differences for g_{n−1}.
                        double gk = f / H[n];
                        for (int m = 1; m < n; m++) {
                            gk = (gk - g[m - 1][k]) / (H[n] - H[m]);
                        }
                        double delta = gk - g[n - 1][k];
                        g[n - 1][k] = gk;
                        for (int j = 0; j < n; j++) {
                            b[j][k] += C[n - 1][j] * delta;
                        }
                        if (n == 7) {
                            maxA = Math.max(maxA, Math.abs(a[k]));
                            maxDb6 = Math.max(maxDb6, Math.abs(delta));
                        }
                    }
                }
                double error = maxA > 0 ? maxDb6 / maxA : 0;
                if (error < 1e-16 || (iteration > 1 && error >= previousError)) {
                    break;
                }
                previousError = error;
            }
            // Step control (IAS15 global criterion).
            double maxA = 0;
            double maxB6 = 0;
            for (int k = 0; k < 3; k++) {
                maxA = Math.max(maxA, Math.abs(a[k]));
                maxB6 = Math.max(maxB6, Math.abs(b[6][k]));
            }
            double error = maxA > 0 ? maxB6 / maxA : 0;
            // Rounding floor: near a planet the heliocentric positions of particle and planet carry
            // rounding errors that make the separation, and so the acceleration, jitter by the force
            // model's one-ulp estimate; the seventh divided difference b6 amplifies that jitter by
            // ROUNDING_GAIN whatever the step. Below that level the error estimate is noise, so the
            // tolerance is held there rather than the step shrunk without end. NOISE_MARGIN covers the
            // several rounded terms in each position (measured here: the estimate is 10–30× low).
            double noiseFloor = maxA > 0 ? NOISE_MARGIN * ROUNDING_GAIN * force.takeRoundingError() / maxA : 0;
            double tolerance = Math.max(epsilon, noiseFloor);
            double dtNew = error > 0 ? dt * Math.pow(tolerance / error, 1.0 / 7.0) : dt / SAFETY;
            if (!Double.isFinite(dtNew)) {
                dtNew = dt * SAFETY;
            }
            if (Math.abs(dtNew / dt) < SAFETY) {
                rejected++;
                if (Math.abs(dtNew) < MIN_STEP) {
                    return new Outcome(Outcome.Status.STEP_UNDERFLOW, t, stateOf(x0, v0), steps, rejected, "");
                }
                // Redo from the same start with a shorter step: the predicted polynomial rescaled,
                // b_j ← b_j q^{j+1} (and the prediction e with it).
                double q = dtNew / dt;
                double qj = q;
                for (int j = 0; j < 7; j++) {
                    for (int k = 0; k < 3; k++) {
                        b[j][k] = bSaved[j][k] * qj;
                        e[j][k] *= qj;
                    }
                    qj *= q;
                }
                dt = dtNew;
                continue;
            }
            if (Math.abs(dtNew / dt) > 1 / SAFETY) {
                dtNew = dt / SAFETY;
            }
            step.t0 = t;
            step.dt = dt;
            String impact = force.takeImpact();
            if (handler != null) {
                handler.handle(step);
            }
            // Advance to the end of the step.
            endState(dt);
            t = last ? tEnd : t + dt;
            steps++;
            System.arraycopy(x, 0, x0, 0, 3);
            System.arraycopy(v, 0, v0, 0, 3);
            double r = Math.sqrt(x0[0] * x0[0] + x0[1] * x0[1] + x0[2] * x0[2]);
            if (r < PhysicalConstants.SUN_RADIUS_AU) {
                return new Outcome(Outcome.Status.HIT_SUN, t, stateOf(x0, v0), steps, rejected, "sun");
            }
            if (impact != null) {
                return new Outcome(Outcome.Status.HIT_BODY, t, stateOf(x0, v0), steps, rejected, impact);
            }
            if (r > escapeDistance) {
                return new Outcome(Outcome.Status.ESCAPED, t, stateOf(x0, v0), steps, rejected, "");
            }
            if (last) {
                return new Outcome(Outcome.Status.DONE, t, stateOf(x0, v0), steps, rejected, "");
            }
            // A step control that keeps accepting steps below MIN_STEP is chasing something it cannot
            // resolve (a discontinuity in the forces): stop with a reason rather than run on without end.
            tinySteps = Math.abs(dt) < MIN_STEP ? tinySteps + 1 : 0;
            if (tinySteps > MAX_TINY_STEPS) {
                return new Outcome(Outcome.Status.STEP_UNDERFLOW, t, stateOf(x0, v0), steps, rejected,
                        "steps below " + MIN_STEP + " d");
            }
            predict(b, dtNew / dt);
            dt = dtNew;
        }
    }

    /** Position, velocity and acceleration at τ = h of the current step into x, v, a. */
    private void substep(double t, double dt, double h, ForceModel force) {
        DenseStep.evaluate(step.x0, step.v0, step.a0, step.b, h, dt, x, v);
        force.acceleration(t + h * dt, x, v, a);
    }

    private void endState(double dt) {
        DenseStep.evaluate(step.x0, step.v0, step.a0, step.b, 1.0, dt, x, v);
    }

    /**
     * Predicts the next step's b from this one's for a step ratio q (Everhart 1985, eq. 2.13; IAS15):
     * e = the series of b rescaled to the new step, b_next = e + (b − e_previous).
     *
     * @param b this step's converged b, replaced by the prediction for the next step
     * @param q new step / old step
     */
    private void predict(double[][] b, double q) {
        double q2 = q * q;
        double q3 = q2 * q;
        double q4 = q2 * q2;
        double q5 = q2 * q3;
        double q6 = q3 * q3;
        double q7 = q3 * q4;
        for (int k = 0; k < 3; k++) {
            double b0 = b[0][k];
            double b1 = b[1][k];
            double b2 = b[2][k];
            double b3 = b[3][k];
            double b4 = b[4][k];
            double b5 = b[5][k];
            double b6 = b[6][k];
            double d0 = b0 - e[0][k];
            double d1 = b1 - e[1][k];
            double d2 = b2 - e[2][k];
            double d3 = b3 - e[3][k];
            double d4 = b4 - e[4][k];
            double d5 = b5 - e[5][k];
            double d6 = b6 - e[6][k];
            e[0][k] = q * (b6 * 7 + b5 * 6 + b4 * 5 + b3 * 4 + b2 * 3 + b1 * 2 + b0);
            e[1][k] = q2 * (b6 * 21 + b5 * 15 + b4 * 10 + b3 * 6 + b2 * 3 + b1);
            e[2][k] = q3 * (b6 * 35 + b5 * 20 + b4 * 10 + b3 * 4 + b2);
            e[3][k] = q4 * (b6 * 35 + b5 * 15 + b4 * 5 + b3);
            e[4][k] = q5 * (b6 * 21 + b5 * 6 + b4);
            e[5][k] = q6 * (b6 * 7 + b5);
            e[6][k] = q7 * b6;
            b[0][k] = e[0][k] + d0;
            b[1][k] = e[1][k] + d1;
            b[2][k] = e[2][k] + d2;
            b[3][k] = e[3][k] + d3;
            b[4][k] = e[4][k] + d4;
            b[5][k] = e[5][k] + d5;
            b[6][k] = e[6][k] + d6;
        }
    }

    private static double[] stateOf(double[] x, double[] v) {
        return new double[] {x[0], x[1], x[2], v[0], v[1], v[2]};
    }
}
