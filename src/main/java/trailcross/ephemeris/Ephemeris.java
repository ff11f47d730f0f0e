package trailcross.ephemeris;

/**
 * Positions and velocities of the Sun, the planets, the Earth, the Moon and the Earth–Moon barycentre
 * in trailcross's frame: ecliptic and mean equinox J2000 (the ICRF rotated by ε0 = 84381.448″), au and
 * au/day, time in TDB days since J2000.0 (JD 2451545.0 TDB).
 *
 * <p>Implementations are thread-safe. Methods write six numbers {x, y, z, vx, vy, vz} into
 * {@code out} from index 0 so that hot loops allocate nothing.
 */
public interface Ephemeris {

    /** @return a short description of the source (e.g. "VSOP87B + Moon98", "JPL DE440") */
    String name();

    /** @return the first instant served, TDB days since J2000 */
    double firstDay();

    /** @return the last instant served, TDB days since J2000 */
    double lastDay();

    /**
     * Heliocentric state.
     *
     * @param body the body ({@link Body#SUN} gives zeros)
     * @param t TDB days since J2000
     * @param out receives x, y, z, vx, vy, vz (au, au/d)
     * @throws IllegalArgumentException when t is outside [firstDay, lastDay]
     */
    void heliocentric(Body body, double t, double[] out);

    /**
     * Heliocentric position only (three numbers), for callers that need no velocity; implementations may
     * make it cheaper than {@link #heliocentric}.
     *
     * @param body the body
     * @param t TDB days since J2000
     * @param out receives x, y, z (au)
     */
    default void heliocentricPosition(Body body, double t, double[] out) {
        double[] s = new double[6];
        heliocentric(body, t, s);
        System.arraycopy(s, 0, out, 0, 3);
    }

    /**
     * The Moon's geocentric position (three numbers); implementations with a lunar theory of their own
     * give it directly.
     *
     * @param t TDB days since J2000
     * @param out receives x, y, z (au)
     */
    default void moonGeocentricPosition(double t, double[] out) {
        double[] moon = new double[3];
        double[] earth = new double[3];
        heliocentricPosition(Body.MOON, t, moon);
        heliocentricPosition(Body.EARTH, t, earth);
        for (int k = 0; k < 3; k++) {
            out[k] = moon[k] - earth[k];
        }
    }

    /**
     * The Sun's barycentric state (the solar-system barycentre seen from the Sun, negated).
     *
     * @param t TDB days since J2000
     * @param out receives x, y, z, vx, vy, vz
     */
    void sunBarycentric(double t, double[] out);

    /**
     * Barycentric state: heliocentric plus the Sun's barycentric state.
     *
     * @param body the body
     * @param t TDB days since J2000
     * @param out receives x, y, z, vx, vy, vz
     */
    default void barycentric(Body body, double t, double[] out) {
        double[] sun = new double[6];
        sunBarycentric(t, sun);
        heliocentric(body, t, out);
        for (int k = 0; k < 6; k++) {
            out[k] += sun[k];
        }
    }

    /**
     * @return the largest jump of a body's position between adjacent pieces of a piecewise representation
     *     (au), which an integrator cannot resolve by shrinking its step; 0 for a continuous source
     */
    default double discontinuityAu() {
        return 0;
    }

    /**
     * Checks a time against the span.
     *
     * @param t TDB days since J2000
     * @throws IllegalArgumentException naming the span when t is outside it
     */
    default void checkSpan(double t) {
        if (!(t >= firstDay() && t <= lastDay())) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "time JD %.5f TDB is outside the span of %s (JD %.1f .. %.1f TDB)",
                    t + 2451545.0, name(), firstDay() + 2451545.0, lastDay() + 2451545.0));
        }
    }
}
