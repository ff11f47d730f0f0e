package trailcross.encounter;

import org.hipparchus.analysis.solvers.BrentSolver;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.Angles;

/**
 * When the Earth reaches a heliocentric ecliptic longitude (J2000): three corrections at the Earth's mean
 * rate from a guess, then Brent's method (Hipparchus) on the longitude difference within a day of that.
 */
public final class EarthLongitude {

    /** The Earth's mean motion in longitude, rad/day (360° per sidereal year, 365.2564 d). */
    private static final double RATE = 2 * Math.PI / 365.2564;

    private EarthLongitude() {
    }

    /**
     * @param ephemeris the planets
     * @param lon heliocentric ecliptic longitude, rad
     * @param guess a time within half a year, TDB days since J2000
     * @return the nearest time the Earth is at that longitude, TDB days since J2000
     */
    public static double time(Ephemeris ephemeris, double lon, double guess) {
        double[] s = new double[3];
        double t = guess;
        for (int k = 0; k < 3; k++) {
            ephemeris.heliocentricPosition(Body.EARTH, t, s);
            t += Angles.difference(lon, Math.atan2(s[1], s[0])) / RATE;
        }
        return new BrentSolver(1e-10).solve(100, x -> {
            ephemeris.heliocentricPosition(Body.EARTH, x, s);
            return Angles.difference(Math.atan2(s[1], s[0]), lon);
        }, t - 1, t + 1);
    }
}
