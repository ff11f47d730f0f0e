package trailcross.encounter;

import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;

/**
 * What a forecaster reads from one node crossing: when the Earth reaches the crossing's heliocentric
 * longitude, delta r — the crossing's heliocentric distance minus the Earth's at that longitude, negative
 * inside the Earth's orbit (McNaught &amp; Asher 1999, WGN 27, 85) — the solar longitude there (geometric,
 * J2000), how many days after the Earth the particle passes (its along-trail position; negative when it
 * passes first), and the geocentric radiant from the particle's and the Earth's heliocentric velocities.
 *
 * @param crossing the crossing
 * @param earthT when the Earth is at the crossing's heliocentric longitude, TDB days since J2000
 * @param deltaR delta r, au
 * @param solarLongitudeDeg solar longitude at earthT, degrees
 * @param daysAfterEarth crossing time minus earthT, days
 * @param radiant the geocentric radiant and Vg
 */
public record Encounter(NodeCrossing crossing, double earthT, double deltaR, double solarLongitudeDeg,
        double daysAfterEarth, GeocentricRadiant radiant) {

    /** The sidereal year, days (the Earth's return to a heliocentric longitude; Astronomical Almanac). */
    static final double SIDEREAL_YEAR = 365.25636;

    /**
     * @param c a crossing
     * @param ephemeris the planets
     * @return its encounter quantities
     */
    public static Encounter of(NodeCrossing c, Ephemeris ephemeris) {
        return of(c, ephemeris, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /**
     * The crossing met by the Earth's passage of its longitude inside a span (a forecast year or years): the
     * passage nearest the crossing in time when that lies in the span, else the span's passage nearest to
     * it, so that a crossing shortly after the span's end counts for the meeting shortly before it.
     *
     * @param c a crossing
     * @param ephemeris the planets
     * @param from the span's start, TDB days since J2000 (at least a year before {@code to})
     * @param to the span's end
     * @return its encounter quantities
     */
    public static Encounter of(NodeCrossing c, Ephemeris ephemeris, double from, double to) {
        double[] x = c.state();
        double lon = Math.atan2(x[1], x[0]);
        double tE = EarthLongitude.time(ephemeris, lon, c.t());
        for (int k = 0; tE < from && k < 1000; k++) {
            tE = EarthLongitude.time(ephemeris, lon, tE + SIDEREAL_YEAR);
        }
        for (int k = 0; tE >= to && k < 1000; k++) {
            tE = EarthLongitude.time(ephemeris, lon, tE - SIDEREAL_YEAR);
        }
        double[] e = new double[6];
        ephemeris.heliocentric(Body.EARTH, tE, e);
        double rE = Math.sqrt(e[0] * e[0] + e[1] * e[1] + e[2] * e[2]);
        double[] pos = {e[0], e[1], e[2]};
        double[] vel = {e[3], e[4], e[5]};
        GeocentricRadiant g = GeocentricRadiant.of(new double[] {x[3], x[4], x[5]}, pos, vel);
        return new Encounter(c, tE, c.r() - rE, g.solarLongitudeDeg(), c.t() - tE, g);
    }
}
