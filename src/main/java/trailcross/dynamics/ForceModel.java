package trailcross.dynamics;

/**
 * The acceleration of a test particle in heliocentric ecliptic J2000 coordinates (au, days TDB), the sum of
 * {@link Acceleration} terms. Not thread-safe: each thread integrates with its own instance (see
 * {@link ForceModelFactory}), which lets terms keep scratch arrays.
 */
public interface ForceModel {

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
