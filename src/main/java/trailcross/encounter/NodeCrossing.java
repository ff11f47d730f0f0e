package trailcross.encounter;

/**
 * One passage of a particle through the Earth's orbital plane near the Earth's orbit.
 *
 * @param id the particle's id
 * @param returnT the perihelion of the return that shed it, TDB days since J2000
 * @param weight the real meteoroids it stands for (NaN when unknown)
 * @param massKg its mass, kg
 * @param initialPeriod its orbital period at ejection (under GM☉(1 − β)), days; infinite when unbound (for fM)
 * @param t the crossing time, TDB days since J2000
 * @param state heliocentric ecliptic J2000 state at the crossing (x, y, z au; vx, vy, vz au/d)
 * @param ascending true at the ascending node (moving north through the plane)
 */
public record NodeCrossing(long id, double returnT, double weight, double massKg, double initialPeriod, double t,
        double[] state, boolean ascending) implements java.io.Serializable {

    /** @return the heliocentric distance at the crossing, au */
    public double r() {
        return Math.sqrt(state[0] * state[0] + state[1] * state[1] + state[2] * state[2]);
    }
}
