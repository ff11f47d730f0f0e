package trailcross.dynamics;

import trailcross.ephemeris.Ephemeris;

/**
 * The acceleration of a test particle in ecliptic J2000 coordinates (au, days TDB), the sum of
 * {@link Acceleration} terms. A model works in heliocentric coordinates or in barycentric ones (the
 * heliocentric ones shifted by the Sun's barycentric state, {@link #barycentricShift()}); integrators take
 * and give heliocentric states and convert with {@link #toModel} and {@link #toHeliocentric}. Not
 * thread-safe: each thread integrates with its own instance (see {@link ForceModelFactory}), which lets terms
 * keep scratch arrays.
 */
public interface ForceModel {

    /**
     * @return the ephemeris whose {@link Ephemeris#sunBarycentric} takes heliocentric coordinates to this
     *     model's (x_model = x_helio + x_Sun,bary), or null when the model works heliocentrically. It is
     *     thread-safe, unlike the model, so that dense output kept after the integration can use it.
     */
    default Ephemeris barycentricShift() {
        return null;
    }

    /**
     * Converts a heliocentric state to this model's coordinates, in place.
     *
     * @param t TDB days since J2000
     * @param state x, y, z, vx, vy, vz
     */
    default void toModel(double t, double[] state) {
        shift(barycentricShift(), t, state, 1);
    }

    /**
     * Converts a state in this model's coordinates to a heliocentric one, in place.
     *
     * @param t TDB days since J2000
     * @param state x, y, z, vx, vy, vz
     */
    default void toHeliocentric(double t, double[] state) {
        shift(barycentricShift(), t, state, -1);
    }

    /**
     * Adds {@code sign} × the Sun's barycentric state to {@code state} (a no-op without a shift).
     *
     * @param shift the ephemeris of {@link #barycentricShift()}, or null
     * @param t TDB days since J2000
     * @param state six numbers, changed in place
     * @param sign +1 heliocentric → barycentric, −1 back
     */
    static void shift(Ephemeris shift, double t, double[] state, int sign) {
        if (shift != null) {
            shift(shift, t, state, sign, new double[6]);
        }
    }

    /**
     * {@link #shift(Ephemeris, double, double[], int)} with a caller's scratch array for the Sun's state.
     *
     * @param shift the ephemeris of {@link #barycentricShift()}, or null
     * @param t TDB days since J2000
     * @param state six numbers, changed in place
     * @param sign +1 heliocentric → barycentric, −1 back
     * @param sun scratch, six numbers
     */
    static void shift(Ephemeris shift, double t, double[] state, int sign, double[] sun) {
        if (shift == null) {
            return;
        }
        shift.sunBarycentric(t, sun);
        for (int k = 0; k < 6; k++) {
            state[k] += sign * sun[k];
        }
    }

    /**
     * @param t TDB days since J2000
     * @param x position (3)
     * @param v velocity (3)
     * @param a receives the acceleration (3), overwritten
     */
    void acceleration(double t, double[] x, double[] v, double[] a);

    /**
     * @return the name of a body the particle passed inside of during the evaluations since the last call
     *     (the step just taken), or null; the call clears it
     */
    default String takeImpact() {
        return null;
    }

    /**
     * @return an estimate of the rounding error (au/d², absolute) of the accelerations evaluated since the
     *     last call, the largest of them; the call resets it. 0 when negligible.
     */
    default double takeRoundingError() {
        return 0;
    }
}
