package trailcross.frames;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * A planet's north pole and size from the IAU Working Group on Cartographic Coordinates and Rotational
 * Elements, 2009 report (Archinal et al. 2011, Celest. Mech. Dyn. Astr. 109, 101, Tables 1 and 4; values
 * from memory): α0 = a0 + a1 T, δ0 = d0 + d1 T in the ICRF, T in Julian centuries of TDB from J2000, plus
 * Neptune's libration term in N = 357.85° + 52.316° T. Jupiter's small periodic terms (each below 0.0005°)
 * are left out. The planet's equatorial frame is the report's: z along the pole, x toward the ascending node
 * of the planet's equator on the ICRF equator (right ascension α0 + 90°).
 *
 * @param name the body's name (lower case)
 * @param radiusKm equatorial radius, km (Table 4)
 * @param a0 α0 at J2000, degrees
 * @param a1 its rate, degrees per century
 * @param d0 δ0 at J2000, degrees
 * @param d1 its rate, degrees per century
 * @param libration Neptune's amplitudes (α: sin N, δ: cos N), degrees, or 0
 * @param librationDelta the δ amplitude (δ0 gets − this × cos N)
 */
public record RotationElements(String name, double radiusKm, double a0, double a1, double d0, double d1,
        double libration, double librationDelta) {

    private static final Map<String, RotationElements> TABLE = Map.of(
            "mercury", new RotationElements("mercury", 2439.7, 281.0097, -0.0328, 61.4143, -0.0049, 0, 0),
            "venus", new RotationElements("venus", 6051.8, 272.76, 0, 67.16, 0, 0, 0),
            "earth", new RotationElements("earth", 6378.1366, 0.00, -0.641, 90.00, -0.557, 0, 0),
            "mars", new RotationElements("mars", 3396.19, 317.68143, -0.1061, 52.88650, -0.0609, 0, 0),
            "jupiter", new RotationElements("jupiter", 71492, 268.056595, -0.006499, 64.495303, 0.002413, 0, 0),
            "saturn", new RotationElements("saturn", 60268, 40.589, -0.036, 83.537, -0.004, 0, 0),
            "uranus", new RotationElements("uranus", 25559, 257.311, 0, -15.175, 0, 0, 0),
            "neptune", new RotationElements("neptune", 24764, 299.36, 0, 43.46, 0, 0.70, 0.51));

    /**
     * @param name a planet's name, any case
     * @return its elements, if the table has them
     */
    public static Optional<RotationElements> of(String name) {
        return Optional.ofNullable(TABLE.get(name.toLowerCase(Locale.ROOT)));
    }

    /**
     * @param t TDB days since J2000
     * @return the pole's right ascension and declination (ICRF), degrees
     */
    public double[] poleDeg(double t) {
        double centuries = t / 36525.0;
        double ra = a0 + a1 * centuries;
        double dec = d0 + d1 * centuries;
        if (libration != 0) {
            double n = Math.toRadians(357.85 + 52.316 * centuries);
            ra += libration * Math.sin(n);
            dec -= librationDelta * Math.cos(n);
        }
        return new double[] {ra, dec};
    }

    /**
     * @param t TDB days since J2000
     * @return the pole as a unit vector in the ICRF (equatorial J2000)
     */
    public double[] pole(double t) {
        double[] p = poleDeg(t);
        return Spherical.ofDegrees(p[0], p[1], 1).toCartesian();
    }

    /**
     * Expresses a direction given in the ICRF in the planet's equatorial frame.
     *
     * @param t TDB days since J2000
     * @param icrf a direction (equatorial J2000)
     * @return its right ascension and declination in the planet's equatorial frame, degrees (RA in [0, 360))
     */
    public double[] toPlanetEquatorialDeg(double t, double[] icrf) {
        double[] p = poleDeg(t);
        double ra0 = Math.toRadians(p[0]);
        double dec0 = Math.toRadians(p[1]);
        // x: the node of the planet's equator on the ICRF equator; z: the pole; y = z × x.
        double[] x = {-Math.sin(ra0), Math.cos(ra0), 0};
        double[] z = {Math.cos(dec0) * Math.cos(ra0), Math.cos(dec0) * Math.sin(ra0), Math.sin(dec0)};
        double[] y = {z[1] * x[2] - z[2] * x[1], z[2] * x[0] - z[0] * x[2], z[0] * x[1] - z[1] * x[0]};
        Spherical s = Spherical.of(dot(icrf, x), dot(icrf, y), dot(icrf, z));
        return new double[] {Angles.normaliseDeg(s.lonDeg()), s.latDeg()};
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }
}
