package trailcross.dynamics;

/**
 * How an integration ended.
 *
 * @param status why it stopped
 * @param t where it stopped, TDB days since J2000
 * @param state the state there (x, y, z, vx, vy, vz); for an impact, the last state before it
 * @param steps accepted steps
 * @param rejected rejected steps
 * @param detail the body hit, or other detail; empty when none
 */
public record Outcome(Status status, double t, double[] state, long steps, long rejected, String detail) {

    /** Why an integration stopped. */
    public enum Status {
        /** Reached the requested end. */
        DONE,
        /** Passed inside the Sun's radius. */
        HIT_SUN,
        /** Passed inside a planet's or the Moon's radius. */
        HIT_BODY,
        /** Went beyond the escape distance. */
        ESCAPED,
        /** The step size collapsed (the acceleration is not smooth enough to integrate). */
        STEP_UNDERFLOW
    }
}
