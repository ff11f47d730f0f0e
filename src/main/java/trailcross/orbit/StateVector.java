package trailcross.orbit;

/**
 * A position and velocity: au and au/day in trailcross's frames (ecliptic J2000 unless said otherwise);
 * the unit is whatever the caller's GM implies in the orbit routines.
 *
 * @param x position x
 * @param y position y
 * @param z position z
 * @param vx velocity x
 * @param vy velocity y
 * @param vz velocity z
 */
public record StateVector(double x, double y, double z, double vx, double vy, double vz) {

    /**
     * @param s an array holding x, y, z, vx, vy, vz from index 0
     * @return the state
     */
    public static StateVector of(double[] s) {
        return new StateVector(s[0], s[1], s[2], s[3], s[4], s[5]);
    }

    /** @return {x, y, z, vx, vy, vz} */
    public double[] toArray() {
        return new double[] {x, y, z, vx, vy, vz};
    }

    /** @return {x, y, z} */
    public double[] position() {
        return new double[] {x, y, z};
    }

    /** @return {vx, vy, vz} */
    public double[] velocity() {
        return new double[] {vx, vy, vz};
    }

    /** @return the distance from the origin */
    public double r() {
        return Math.sqrt(x * x + y * y + z * z);
    }

    /** @return the speed */
    public double speed() {
        return Math.sqrt(vx * vx + vy * vy + vz * vz);
    }

    /**
     * @param o another state
     * @return the distance between the two positions
     */
    public double distanceTo(StateVector o) {
        double dx = x - o.x;
        double dy = y - o.y;
        double dz = z - o.z;
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
