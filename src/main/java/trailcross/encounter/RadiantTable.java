package trailcross.encounter;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.Angles;
import trailcross.frames.SolarLongitude;
import trailcross.orbit.Elements;
import trailcross.orbit.Moid;
import trailcross.time.Epoch;
import trailcross.time.EpochParser;

/**
 * A radiant table for observers: one row per day (or per step) at 0h UTC with the solar longitude, the
 * radiant and Vg, and the daily drift. From particles' encounters: RA, Dec and Vg fitted linearly against
 * solar longitude (least squares, Commons Math) over the crossings near the Earth, evaluated on each row's
 * longitude. From a parent's orbit: the theoretical radiant ({@link TheoreticalRadiant}) of the orbit with
 * its node moved with the Earth — Ω + (λ − λ_peak), the standard way to let the radiant drift.
 */
public final class RadiantTable {

    /**
     * One row.
     *
     * @param t the instant (0h UTC of the date, or the step), TDB days since J2000
     * @param solarLongitudeDeg solar longitude, degrees
     * @param raDeg right ascension, degrees
     * @param decDeg declination, degrees
     * @param vgKmS Vg, km/s
     */
    public record Row(double t, double solarLongitudeDeg, double raDeg, double decDeg, double vgKmS) {
    }

    private RadiantTable() {
    }

    /**
     * @param encounters the crossings' encounters (those within 0.01 au of the Earth's orbit and
     *     {@value TrailEncounter#ALONG_TRAIL_DAYS} days of the Earth are used)
     * @param ephemeris the planets
     * @param stepDays the row step, days
     * @return the rows over the span of the used crossings' Earth times, whole UTC days
     * @throws IllegalArgumentException when fewer than two crossings are near the Earth
     */
    public static List<Row> fromEncounters(List<Encounter> encounters, Ephemeris ephemeris, double stepDays) {
        Line ra = new Line();
        Line dec = new Line();
        Line vg = new Line();
        double tMin = Double.MAX_VALUE;
        double tMax = -Double.MAX_VALUE;
        Double lon0 = null;
        Double ra0 = null;
        int n = 0;
        for (Encounter e : encounters) {
            if (Math.abs(e.deltaR()) > 0.01 || Math.abs(e.daysAfterEarth()) > TrailEncounter.ALONG_TRAIL_DAYS) {
                continue;
            }
            if (lon0 == null) {
                lon0 = e.solarLongitudeDeg();
                ra0 = e.radiant().raDeg();
            }
            double l = unwrap(e.solarLongitudeDeg(), lon0);
            ra.add(l, unwrap(e.radiant().raDeg(), ra0));
            dec.add(l, e.radiant().decDeg());
            vg.add(l, e.radiant().vgKmS());
            tMin = Math.min(tMin, e.earthT());
            tMax = Math.max(tMax, e.earthT());
            n++;
        }
        if (n < 2) {
            throw new IllegalArgumentException("no radiant table: fewer than two crossings within 0.01 au of the "
                    + "Earth's orbit in the window");
        }
        List<Row> rows = new ArrayList<>();
        double start = utcMidnightBefore(tMin);
        for (double t = start; t <= tMax + 1e-9 || rows.isEmpty(); t += stepDays) {
            double l = unwrap(solarLongitude(ephemeris, t), lon0);
            rows.add(new Row(t, Angles.normaliseDeg(l), Angles.normaliseDeg(ra.at(l)), dec.at(l), vg.at(l)));
        }
        return rows;
    }

    /**
     * @param orbit the parent's orbit
     * @param earth the Earth's orbit
     * @param branch the branch (local minimum) whose radiant is listed
     * @param adjustment how a missing orbit is moved onto the Earth's
     * @param year the calendar year of the rows
     * @param halfSpanDays rows from this many days before the peak to as many after
     * @param stepDays the row step, days
     * @param ephemeris the planets
     * @return the rows, and the peak first as computed
     */
    public static List<Row> fromOrbit(Elements orbit, Elements earth, Moid.Minimum branch,
            TheoreticalRadiant.Adjustment adjustment, int year, double halfSpanDays, double stepDays, Ephemeris ephemeris) {
        TheoreticalRadiant peak = TheoreticalRadiant.of(orbit, earth, branch, adjustment);
        double lambda = peak.radiant().solarLongitudeDeg();
        double jan1 = EpochParser.parse(String.format(java.util.Locale.ROOT, "%04d-01-01T00:00:00Z", year)).daysSinceJ2000();
        double lambda0 = solarLongitude(ephemeris, jan1);
        double guess = jan1 + Angles.normaliseDeg(lambda - lambda0) / 0.9856;
        double tPeak = EarthLongitude.time(ephemeris, Math.toRadians(lambda + 180), guess);
        List<Row> rows = new ArrayList<>();
        double start = utcMidnightBefore(tPeak - halfSpanDays);
        for (double t = start; t <= tPeak + halfSpanDays + 1e-9; t += stepDays) {
            double l = solarLongitude(ephemeris, t);
            double shift = Math.toRadians(Math.toDegrees(Angles.difference(Math.toRadians(l), Math.toRadians(lambda))));
            Elements moved = new Elements(orbit.q(), orbit.e(), orbit.i(), Angles.normalise(orbit.node() + shift),
                    orbit.peri(), orbit.perihelionJd(), orbit.gm());
            // Follow the branch: the local minimum of the moved orbit next to the peak's.
            Moid.Minimum m = Moid.near(moved, earth, branch.trueAnomalyA(), branch.trueAnomalyB() + shift);
            GeocentricRadiant g = TheoreticalRadiant.of(moved, earth, m, adjustment).radiant();
            rows.add(new Row(t, l, g.raDeg(), g.decDeg(), g.vgKmS()));
        }
        return rows;
    }

    /** A least-squares line that falls back to the mean when all x are equal (no slope). */
    private static final class Line {
        private final SimpleRegression fit = new SimpleRegression();
        private double sumY;

        void add(double x, double y) {
            fit.addData(x, y);
            sumY += y;
        }

        double at(double x) {
            double v = fit.predict(x);
            return Double.isFinite(v) ? v : sumY / fit.getN();
        }
    }

    private static double unwrap(double deg, double ref) {
        return ref + Math.toDegrees(Angles.difference(Math.toRadians(deg), Math.toRadians(ref)));
    }

    static double solarLongitude(Ephemeris ephemeris, double t) {
        double[] e = new double[3];
        ephemeris.heliocentricPosition(Body.EARTH, t, e);
        return SolarLongitude.degrees(e);
    }

    /** 0h UTC of the UTC date containing t. */
    static double utcMidnightBefore(double t) {
        String date = trailcross.time.EpochFormat.utc(Epoch.ofDaysSinceJ2000(t), 0).substring(0, 10);
        return EpochParser.parse(date + "T00:00:00Z").daysSinceJ2000();
    }
}
