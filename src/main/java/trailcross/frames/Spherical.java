package trailcross.frames;

/**
 * Spherical coordinates of a vector: longitude (or right ascension) in [0, 2π), latitude (or
 * declination) in [−π/2, π/2], and length.
 *
 * @param lon longitude in radians, [0, 2π)
 * @param lat latitude in radians
 * @param r length
 */
public record Spherical(double lon, double lat, double r) {

    /**
     * @param x x component
     * @param y y component
     * @param z z component
     * @return the spherical coordinates of (x, y, z); longitude 0 for a vector along z
     */
    public static Spherical of(double x, double y, double z) {
        double rho = Math.hypot(x, y);
        double r = Math.hypot(rho, z);
        return new Spherical(Angles.normalise(Math.atan2(y, x)), Math.atan2(z, rho), r);
    }

    /**
     * @param v a vector as {@code double[3]}
     * @return its spherical coordinates
     */
    public static Spherical of(double[] v) {
        return of(v[0], v[1], v[2]);
    }

    /**
     * @param lonDeg longitude in degrees
     * @param latDeg latitude in degrees
     * @param r length
     * @return the coordinates
     */
    public static Spherical ofDegrees(double lonDeg, double latDeg, double r) {
        return new Spherical(Angles.normalise(Math.toRadians(lonDeg)), Math.toRadians(latDeg), r);
    }

    /** @return the Cartesian vector */
    public double[] toCartesian() {
        double c = Math.cos(lat);
        return new double[] {r * c * Math.cos(lon), r * c * Math.sin(lon), r * Math.sin(lat)};
    }

    /** @return longitude in degrees, [0, 360) */
    public double lonDeg() {
        return Math.toDegrees(lon);
    }

    /** @return latitude in degrees */
    public double latDeg() {
        return Math.toDegrees(lat);
    }
}
