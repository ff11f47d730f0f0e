package trailcross.encounter;

/**
 * One particle's closest approach to a target inside a span.
 *
 * @param id the particle's id
 * @param t the instant, TDB days since J2000
 * @param distance the distance between the centres, au
 * @param relative the particle's state relative to the target there (x, y, z, vx, vy, vz; au, au/d;
 *     ecliptic J2000 axes)
 * @param state the particle's heliocentric state there
 */
public record Approach(long id, double t, double distance, double[] relative, double[] state) {

    /** @return the relative speed, au/d */
    public double speed() {
        return Math.sqrt(relative[3] * relative[3] + relative[4] * relative[4] + relative[5] * relative[5]);
    }
}
