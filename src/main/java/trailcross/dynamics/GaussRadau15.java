package trailcross.dynamics;

/**
 * The 15th-order Gauss–Radau integrator for second-order equations x″ = a(t, x, x′) of Everhart (1985,
 * "An efficient integrator that uses Gauss–Radau spacings", IAU Coll. 83) with the predictor–corrector
 * iteration (until its last change is a thousandth of ε) and the adaptive step control of IAS15, rejecting
 * steps that would shrink by more than a safety factor of 4. Two step criteria ({@link Criterion}):
 * <ul>
 * <li>{@link Criterion#HIGHEST_TERM} (default): the IAS15 estimate max|b6| / max|a| (Rein &amp; Spiegel 2015,
 * MNRAS 446, 1424, eqs. 7–11), the step scaled by (ε / error)^{1/7}, with a rounding floor near planets.</li>
 * <li>{@link Criterion#TIMESCALE}: the step is (7! ε)^{1/7} times the timescale √(2 |a|² / (|ȧ|² + |a||ä|))
 * of the step polynomial's acceleration, jerk and snap at the step's end (Pham, Rein &amp; Spiegel 2024,
 * Open Journal of Astrophysics 7; cited from memory). It follows the orbit's own timescale and passes over
 * small fast ripples in the forces, which makes it the independent reference of the benchmark at ε = 1e-16;
 * measured on the standard workload it is not the faster one for a given error: at ε = 1e-13 it takes 1,150
 * steps per particle-century for a median error of 1.2e-9 au, where the default at ε = 1e-9 takes 1,660
 * for 1e-11 au, because it under-resolves small planetary encounters (Uranus, the Earth).</li>
 * </ul>
 * One particle, its own step sequence. Not thread-safe: one instance per thread.
 */
public final class GaussRadau15 {

    /** How the next step is chosen. */
    public enum Criterion {
        /** Pham, Rein &amp; Spiegel (2024): the orbit's timescale from acceleration, jerk and snap. */
        TIMESCALE,
        /** Rein &amp; Spiegel (2015): the highest term of the step polynomial against the acceleration. */
        HIGHEST_TERM
    }

    /** (7! ε)^{1/7} for ε = 1 (the TIMESCALE step is this times ε^{1/7} times the timescale). */
    private static final double TIMESCALE_FACTOR = Math.pow(5040.0, 1.0 / 7.0);

    /** The Gauss–Radau spacings h_1 … h_7 on [0, 1] (Everhart 1985, h_0 = 0). */
    static final double[] H = {
        0.0, 0.0562625605369221464656521910318, 0.180240691736892364987579942780,
        0.352624717113169637373907769648, 0.547153626330555383001448554766,
        0.734210177215410531523210605558, 0.885320946839095768090359771030,
        0.977520613561287501891174488626
    };
    /** INVERSE_SPACING[n][m] = 1 / (h_n − h_m), m &lt; n (h_0 = 0): the divided differences' divisors. */
    private static final double[][] INVERSE_SPACING = new double[8][8];
    /** C[k][j]: coefficient of τ^{j+1} in τ(τ − h_1)…(τ − h_k); b_j = Σ_{k ≥ j} C[k][j] g_k. */
    private static final double[][] C = new double[7][7];
    /** D = C⁻¹ in the sense g_k = Σ_{j ≥ k} D[k][j] b_j. */
    private static final double[][] D = new double[7][7];

    static {
        for (int n = 1; n < 8; n++) {
            for (int m = 0; m < n; m++) {
                INVERSE_SPACING[n][m] = 1 / (H[n] - H[m]);
            }
        }
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
    /**
     * The corrector stops when its last change of b6 is below this fraction of ε (relative to |a|): a
     * thousandth of the step's own error allowance. IAS15 iterates on to 1e-16 whatever ε; measured on the
     * standard workload at ε = 1e-9, the third iteration that costs (21.4 force evaluations per step instead
     * of 15.6) moves no final position by more than 1e-13 au.
     */
    private static final double CONVERGED_FRACTION = 1e-3;
    private static final double MIN_STEP = 1e-9;
    /** Consecutive accepted steps below {@link #MIN_STEP} after which the integration stops. */
    private static final int MAX_TINY_STEPS = 1000;

    private final double epsilon;
    private final double escapeDistance;
    private final Criterion criterion;
    private final double timescaleFactor;
    private final double converged;

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
    private final double[] helioScratch = new double[6];
    private final double[] sunScratch = new double[6];

    /**
     * @param epsilon the IAS15 accuracy parameter ε (1e-9 in Rein &amp; Spiegel 2015)
     * @param escapeDistance heliocentric distance (au) beyond which a particle is left
     */
    public GaussRadau15(double epsilon, double escapeDistance) {
        this(epsilon, escapeDistance, Criterion.HIGHEST_TERM);
    }

    /**
     * @param epsilon the IAS15 accuracy parameter ε
     * @param escapeDistance heliocentric distance (au) beyond which a particle is left
     * @param criterion the step criterion
     */
    public GaussRadau15(double epsilon, double escapeDistance, Criterion criterion) {
        this.epsilon = epsilon;
        this.escapeDistance = escapeDistance;
        this.criterion = criterion;
        this.timescaleFactor = TIMESCALE_FACTOR * Math.pow(epsilon, 1.0 / 7.0);
        this.converged = Math.max(1e-16, CONVERGED_FRACTION * epsilon);
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
        step.shift = force.barycentricShift();
        double[] start = state.clone();
        force.toModel(t0, start);
        System.arraycopy(start, 0, x0, 0, 3);
        System.arraycopy(start, 3, v0, 0, 3);
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
        double r0 = Math.sqrt(state[0] * state[0] + state[1] * state[1] + state[2] * state[2]);
        double speed = Math.sqrt(state[3] * state[3] + state[4] * state[4] + state[5] * state[5]);
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
                        // Newton divided differences for g_{n−1} (multiplying by the reciprocal spacings).
                        double[] inv = INVERSE_SPACING[n];
                        double gk = f * inv[0];
                        for (int m = 1; m < n; m++) {
                            gk = (gk - g[m - 1][k]) * inv[m];
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
                if (error < converged || (iteration > 1 && error >= previousError)) {
                    break;
                }
                previousError = error;
            }
            double dtNew = criterion == Criterion.TIMESCALE ? timescaleStep(dt, a0, b) : highestTermStep(dt, force);
            if (!Double.isFinite(dtNew)) {
                dtNew = dt * SAFETY;
            }
            if (Math.abs(dtNew / dt) < SAFETY) {
                rejected++;
                if (Math.abs(dtNew) < MIN_STEP) {
                    return new Outcome(Outcome.Status.STEP_UNDERFLOW, t, heliocentricStart(t).clone(), steps,
                            rejected, "");
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
            double[] helio = heliocentricStart(t);
            double r = Math.sqrt(helio[0] * helio[0] + helio[1] * helio[1] + helio[2] * helio[2]);
            if (r < PhysicalConstants.SUN_RADIUS_AU) {
                return new Outcome(Outcome.Status.HIT_SUN, t, helio.clone(), steps, rejected, "sun");
            }
            if (impact != null) {
                return new Outcome(Outcome.Status.HIT_BODY, t, helio.clone(), steps, rejected, impact);
            }
            if (r > escapeDistance) {
                return new Outcome(Outcome.Status.ESCAPED, t, helio.clone(), steps, rejected, "");
            }
            if (last) {
                return new Outcome(Outcome.Status.DONE, t, helio.clone(), steps, rejected, "");
            }
            // A step control that keeps accepting steps below MIN_STEP is chasing something it cannot
            // resolve (a discontinuity in the forces): stop with a reason rather than run on without end.
            tinySteps = Math.abs(dt) < MIN_STEP ? tinySteps + 1 : 0;
            if (tinySteps > MAX_TINY_STEPS) {
                return new Outcome(Outcome.Status.STEP_UNDERFLOW, t, helio.clone(), steps, rejected,
                        "steps below " + MIN_STEP + " d");
            }
            predict(b, dtNew / dt);
            dt = dtNew;
        }
    }

    /**
     * The next step from the orbit's timescale at the end of this one (Pham, Rein &amp; Spiegel 2024): with the
     * step polynomial a(τ) = a0 + Σ b_j τ^{j+1}, at τ = 1 the acceleration is a0 + Σ b_j, the jerk × dt is
     * Σ (j+1) b_j and the snap × dt² is Σ (j+1) j b_j; τ² = 2 |a|² / (|ȧ|² + |a| |ä|) in units of dt.
     */
    private double timescaleStep(double dt, double[] a0, double[][] b) {
        double y2 = 0;
        double y3 = 0;
        double y4 = 0;
        for (int k = 0; k < 3; k++) {
            double acc = a0[k] + b[0][k] + b[1][k] + b[2][k] + b[3][k] + b[4][k] + b[5][k] + b[6][k];
            double jerk = b[0][k] + 2 * b[1][k] + 3 * b[2][k] + 4 * b[3][k] + 5 * b[4][k] + 6 * b[5][k] + 7 * b[6][k];
            double snap = 2 * b[1][k] + 6 * b[2][k] + 12 * b[3][k] + 20 * b[4][k] + 30 * b[5][k] + 42 * b[6][k];
            y2 += acc * acc;
            y3 += jerk * jerk;
            y4 += snap * snap;
        }
        double denominator = y3 + Math.sqrt(y4 * y2);
        if (!(denominator > 0) || !(y2 > 0)) {
            return dt / SAFETY;
        }
        return dt * Math.sqrt(2 * y2 / denominator) * timescaleFactor;
    }

    /**
     * The next step from the IAS15 estimate max|b6| / max|a| (Rein &amp; Spiegel 2015), the tolerance held at the
     * rounding floor near planets: there the heliocentric positions of particle and planet carry rounding
     * errors that make the separation, and so the acceleration, jitter by the force model's one-ulp estimate;
     * the seventh divided difference b6 amplifies that jitter by ROUNDING_GAIN whatever the step. Below that
     * level the error estimate is noise, so the tolerance is held there rather than the step shrunk without
     * end. NOISE_MARGIN covers the several rounded terms in each position (measured: the estimate is 10–30×
     * low).
     */
    private double highestTermStep(double dt, ForceModel force) {
        double maxA = 0;
        double maxB6 = 0;
        for (int k = 0; k < 3; k++) {
            maxA = Math.max(maxA, Math.abs(a[k]));
            maxB6 = Math.max(maxB6, Math.abs(step.b[6][k]));
        }
        double error = maxA > 0 ? maxB6 / maxA : 0;
        double noiseFloor = maxA > 0 ? NOISE_MARGIN * ROUNDING_GAIN * force.takeRoundingError() / maxA : 0;
        double tolerance = Math.max(epsilon, noiseFloor);
        return error > 0 ? dt * Math.pow(tolerance / error, 1.0 / 7.0) : dt / SAFETY;
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

    /** The heliocentric state of the step's start (model coordinates x0, v0) at t, in a scratch array. */
    private double[] heliocentricStart(double t) {
        System.arraycopy(step.x0, 0, helioScratch, 0, 3);
        System.arraycopy(step.v0, 0, helioScratch, 3, 3);
        ForceModel.shift(step.shift, t, helioScratch, -1, sunScratch);
        return helioScratch;
    }
}
