package trailcross.frames;

/** Angle helpers: normalisation to a full turn and the signed difference of two angles. */
public final class Angles {

    private static final double TWO_PI = 2 * Math.PI;

    private Angles() {
    }

    /**
     * @param a an angle in radians
     * @return the same direction in [0, 2π)
     */
    public static double normalise(double a) {
        double r = a % TWO_PI;
        if (r < 0) {
            r += TWO_PI;
        }
        return r >= TWO_PI ? 0.0 : r;
    }

    /**
     * @param deg an angle in degrees
     * @return the same direction in [0, 360)
     */
    public static double normaliseDeg(double deg) {
        double r = deg % 360.0;
        if (r < 0) {
            r += 360.0;
        }
        return r >= 360.0 ? 0.0 : r;
    }

    /**
     * @param a an angle in radians
     * @param b another
     * @return a − b brought into (−π, π]
     */
    public static double difference(double a, double b) {
        double d = normalise(a - b);
        return d > Math.PI ? d - TWO_PI : d;
    }

    /**
     * Angular separation of two directions by the haversine-stable atan2 form (Vincenty 1975).
     *
     * @param lon1 longitude (or RA) of the first, radians
     * @param lat1 latitude (or Dec) of the first, radians
     * @param lon2 longitude of the second, radians
     * @param lat2 latitude of the second, radians
     * @return the separation in radians, [0, π]
     */
    public static double separation(double lon1, double lat1, double lon2, double lat2) {
        double dl = lon2 - lon1;
        double c1 = Math.cos(lat1);
        double c2 = Math.cos(lat2);
        double s1 = Math.sin(lat1);
        double s2 = Math.sin(lat2);
        double x = c2 * Math.sin(dl);
        double y = c1 * s2 - s1 * c2 * Math.cos(dl);
        double z = s1 * s2 + c1 * c2 * Math.cos(dl);
        return Math.atan2(Math.hypot(x, y), z);
    }
}
