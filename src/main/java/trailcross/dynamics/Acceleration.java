package trailcross.dynamics;

/** One term of a {@link ForceModel}: adds its acceleration to {@code a}. */
public interface Acceleration {

    /**
     * @param t TDB days since J2000
     * @param x heliocentric position (au)
     * @param v heliocentric velocity (au/d)
     * @param a the acceleration so far, to add to (au/d²)
     */
    void add(double t, double[] x, double[] v, double[] a);
}
