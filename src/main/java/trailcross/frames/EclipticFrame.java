package trailcross.frames;

/**
 * Rotations between the ecliptic J2000 frame of trailcross and equatorial J2000 (the ICRF, the
 * ~0.02″ FK5–ICRF frame bias ignored). The ecliptic frame is the ICRF rotated about its x axis by the
 * IAU 1976 obliquity of J2000.0, ε0 = 84381.448″ (Lieske et al. 1977; IERS Conventions).
 *
 * <p>Methods work in place on {@code double[3]} (or the first three / all six entries of a state) so
 * that hot loops allocate nothing.
 */
public final class EclipticFrame {

    /** ε0 = 84381.448 arcseconds in radians (Lieske et al. 1977). */
    public static final double OBLIQUITY_J2000 = Math.toRadians(84381.448 / 3600.0);

    private static final double COS_E = Math.cos(OBLIQUITY_J2000);
    private static final double SIN_E = Math.sin(OBLIQUITY_J2000);

    private EclipticFrame() {
    }

    /**
     * Rotates an ecliptic vector into equatorial J2000.
     *
     * @param v the vector, read at {@code offset..offset+2} and overwritten
     * @param offset index of its x component
     */
    public static void toEquatorial(double[] v, int offset) {
        double y = v[offset + 1];
        double z = v[offset + 2];
        v[offset + 1] = COS_E * y - SIN_E * z;
        v[offset + 2] = SIN_E * y + COS_E * z;
    }

    /**
     * Rotates an equatorial J2000 vector into the ecliptic frame.
     *
     * @param v the vector, read at {@code offset..offset+2} and overwritten
     * @param offset index of its x component
     */
    public static void toEcliptic(double[] v, int offset) {
        double y = v[offset + 1];
        double z = v[offset + 2];
        v[offset + 1] = COS_E * y + SIN_E * z;
        v[offset + 2] = -SIN_E * y + COS_E * z;
    }

    /**
     * @param ecliptic an ecliptic vector (not changed)
     * @return a new array with the vector in equatorial J2000
     */
    public static double[] equatorialOf(double[] ecliptic) {
        double[] v = ecliptic.clone();
        for (int k = 0; k + 2 < v.length; k += 3) {
            toEquatorial(v, k);
        }
        return v;
    }

    /**
     * @param equatorial an equatorial J2000 vector or state (not changed)
     * @return a new array with the vector (each triple) in the ecliptic frame
     */
    public static double[] eclipticOf(double[] equatorial) {
        double[] v = equatorial.clone();
        for (int k = 0; k + 2 < v.length; k += 3) {
            toEcliptic(v, k);
        }
        return v;
    }
}
