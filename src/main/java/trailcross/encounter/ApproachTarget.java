package trailcross.encounter;

import trailcross.frames.RotationElements;

/**
 * What a cloud's approach is measured to: a body of the ephemeris ({@link BodyTarget}), a Sun–Earth
 * Lagrange point ({@link LagrangePoint}) or a given track ({@link TrackTarget}). States are heliocentric
 * ecliptic J2000 (au, au/d), time TDB days since J2000; implementations are thread-safe.
 */
public interface ApproachTarget {

    /** @return the name shown (e.g. "earth", "l2", "track probe.csv") */
    String name();

    /**
     * @param t TDB days since J2000
     * @param out receives x, y, z, vx, vy, vz
     */
    void state(double t, double[] out);

    /** @return the target's GM, au³/d² (0, the default, for a point or a spacecraft) */
    default double gm() {
        return 0;
    }

    /** @return the target's radius, km (0, the default, for a point) */
    default double radiusKm() {
        return 0;
    }

    /** @return the planet's rotation elements, or null (the default) when it has none */
    default RotationElements rotation() {
        return null;
    }

    /** @return the first instant the target is known, TDB days since J2000 */
    double firstDay();

    /** @return the last instant */
    double lastDay();
}
