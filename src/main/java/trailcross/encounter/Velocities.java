package trailcross.encounter;

/**
 * The geocentric speed Vg and the apparent (pre-atmospheric) speed V∞ of a meteoroid:
 * V∞² = Vg² + Vesc², with the escape speed at 100 km height (common practice; the reference height of
 * meteor work), Vesc = √(2 GM⊕ / (R⊕ + 100 km)) ≈ 11.09 km/s.
 */
public final class Velocities {

    /** GM of the Earth, km³/s² (DE440, Park et al. 2021). */
    public static final double GM_EARTH_KM3_S2 = 398600.435507;
    /** Equatorial radius of the Earth, km (WGS 84). */
    public static final double EARTH_RADIUS_KM = 6378.137;
    /** Escape speed at 100 km height, km/s. */
    public static final double ESCAPE_100KM_KM_S = Math.sqrt(2 * GM_EARTH_KM3_S2 / (EARTH_RADIUS_KM + 100.0));

    private Velocities() {
    }

    /**
     * @param vgKmS geocentric speed, km/s
     * @return V∞, km/s
     */
    public static double vInfinity(double vgKmS) {
        return Math.sqrt(vgKmS * vgKmS + ESCAPE_100KM_KM_S * ESCAPE_100KM_KM_S);
    }

    /**
     * @param vInfinityKmS apparent speed, km/s (≥ the escape speed)
     * @return Vg, km/s
     */
    public static double vg(double vInfinityKmS) {
        double v2 = vInfinityKmS * vInfinityKmS - ESCAPE_100KM_KM_S * ESCAPE_100KM_KM_S;
        if (v2 < 0) {
            throw new IllegalArgumentException("an apparent speed below the escape speed ("
                    + ESCAPE_100KM_KM_S + " km/s): " + vInfinityKmS);
        }
        return Math.sqrt(v2);
    }
}
