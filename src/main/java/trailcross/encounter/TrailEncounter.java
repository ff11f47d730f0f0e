package trailcross.encounter;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.Angles;

/**
 * One trail's meeting with the Earth in one year, from its particles' node crossings ({@link Encounter}):
 * <ul>
 * <li>the trail section met: crossings whose node passage lies within {@value #ALONG_TRAIL_DAYS} days of the
 * Earth's passage of the same longitude, the window doubled (to at most {@value #MAX_ALONG_TRAIL_DAYS} days)
 * until it holds {@value #ENOUGH} crossings;</li>
 * <li>delta r: the median of their delta r;</li>
 * <li>peak: the median of their crossing longitudes (robust against the broad component of small, fast
 * meteoroids), the activity profile's width from their median absolute deviation (FWHM = 2.355 × 1.4826
 * MAD, Gaussian), the peak's uncertainty the spread of the median over 200 bootstrap resamples;</li>
 * <li>the radiant and Vg: the mean over the crossings nearest the Earth's path (up to 20);</li>
 * <li>fM (McNaught &amp; Asher 1999): the along-trail density against an unperturbed trail one revolution
 * old, 1/|d t_node / d P0|, with t_node the node passage times and P0 the orbital periods at ejection
 * (least-squares slope; an unperturbed trail N revolutions old has d t_node / d P0 = N);</li>
 * <li>ZHR: the meteoroids brighter than +6.5 mag (mass from Jacchia, Verniani &amp; Briggs 1967,
 * M = 55.34 − 8.75 log V − 2.25 log m, V cm/s, m g, zenith; from memory) crossing the plane within
 * ±{@value #BOX_DELTA_R_AU} au of the Earth's path and ±{@value #BOX_LONGITUDE_DEG}° of the peak, per area
 * and time, turned into the flux perpendicular to their geocentric velocity (× Vg/|v_z|), then ZHR =
 * Q · 37200 / ((13.1 r − 16.45)(r − 1.3)^0.748) with the population index r (Koschack &amp; Rendtel 1990,
 * WGN 18, 44; from memory). Empty when the weights are unknown.</li>
 * </ul>
 *
 * @param returnT the trail's return (perihelion), TDB days since J2000
 * @param revolutions revolutions of the parent since that return
 * @param peakT the peak, TDB days since J2000
 * @param peakSigmaMin the peak's 1-σ uncertainty, minutes
 * @param solarLongitudeDeg solar longitude of the peak, degrees
 * @param deltaR delta r, au
 * @param particles particles in the section met
 * @param raDeg radiant RA, degrees
 * @param decDeg radiant Dec, degrees
 * @param vgKmS Vg, km/s
 * @param fwhmHours FWHM of the activity profile, hours
 * @param fM the along-trail density factor
 * @param zhr the ZHR estimate (NaN when unknown)
 */
public record TrailEncounter(double returnT, int revolutions, double peakT, double peakSigmaMin,
        double solarLongitudeDeg, double deltaR, int particles, double raDeg, double decDeg, double vgKmS,
        double fwhmHours, double fM, double zhr) {

    /** Along-trail half-window: crossings this many days before or after the Earth, days. */
    public static final double ALONG_TRAIL_DAYS = 10.0;
    /** The window is doubled until it holds this many crossings, ... */
    public static final int ENOUGH = 12;
    /** ... but not beyond this half-width, days. */
    public static final double MAX_ALONG_TRAIL_DAYS = 80.0;
    /** ZHR box: half-width in delta r, au. */
    public static final double BOX_DELTA_R_AU = 0.001;
    /** ZHR box: half-width in solar longitude, degrees. */
    public static final double BOX_LONGITUDE_DEG = 0.05;
    /** Hours per degree of solar longitude (365.2422 d per 360°). */
    public static final double HOURS_PER_DEGREE = 365.2422 * 24 / 360;
    private static final double AU_KM = Body.Constants.AU_KM;

    /**
     * @param encounters the crossings of one trail in the year (at least three)
     * @param parentPeriodDays the parent's orbital period (for revolutions and fM)
     * @param populationIndex r of the shower
     * @param ephemeris the planets (the Earth's time at the peak longitude)
     * @return the trail's meeting, or null when fewer than three crossings lie within the along-trail window
     */
    public static TrailEncounter of(List<Encounter> encounters, double parentPeriodDays, double populationIndex,
            Ephemeris ephemeris) {
        List<Encounter> met = new ArrayList<>();
        double window = ALONG_TRAIL_DAYS;
        for (; window <= MAX_ALONG_TRAIL_DAYS; window *= 2) {
            met.clear();
            for (Encounter e : encounters) {
                if (Math.abs(e.daysAfterEarth()) <= window) {
                    met.add(e);
                }
            }
            if (met.size() >= ENOUGH) {
                break;
            }
        }
        window = Math.min(window, MAX_ALONG_TRAIL_DAYS);
        if (met.size() < 3) {
            return null;
        }
        double returnT = met.get(0).crossing().returnT();
        double[] dr = met.stream().mapToDouble(Encounter::deltaR).toArray();
        double deltaR = median(dr, null);
        // Longitudes unwrapped around the first one, so that a trail met at λ ≈ 0° stays continuous.
        double lon0 = met.get(0).solarLongitudeDeg();
        double[] lon = met.stream().mapToDouble(e -> lon0 + Math.toDegrees(Angles.difference(
                Math.toRadians(e.solarLongitudeDeg()), Math.toRadians(lon0)))).toArray();
        // The peak: the median longitude of the section, robust to the broad component of small, fast
        // meteoroids; its uncertainty from resampling; the width from the median absolute deviation.
        double peakLon = median(lon, null);
        double[] absDev = new double[lon.length];
        for (int k = 0; k < lon.length; k++) {
            absDev[k] = Math.abs(lon[k] - peakLon);
        }
        double sigmaLon = 1.4826 * median(absDev, null);
        DescriptiveStatistics boot = new DescriptiveStatistics();
        Well19937c rng = new Well19937c(Double.doubleToLongBits(returnT));
        int[] pick = new int[lon.length];
        for (int b = 0; b < 200; b++) {
            for (int k = 0; k < pick.length; k++) {
                pick[k] = rng.nextInt(pick.length);
            }
            boot.addValue(median(lon, pick));
        }
        double peakSigmaMin = boot.getStandardDeviation() * HOURS_PER_DEGREE * 60;
        double peakT = EarthLongitude.time(ephemeris, Math.toRadians(peakLon + 180), met.get(0).earthT());
        // Radiant: the crossings nearest the Earth's path.
        List<Encounter> nearest = new ArrayList<>(met);
        nearest.sort(Comparator.comparingDouble(e -> Math.abs(e.deltaR())));
        nearest = nearest.subList(0, Math.min(20, nearest.size()));
        double sx = 0;
        double sy = 0;
        double sz = 0;
        double vg = 0;
        for (Encounter e : nearest) {
            double ra = Math.toRadians(e.radiant().raDeg());
            double dec = Math.toRadians(e.radiant().decDeg());
            sx += Math.cos(dec) * Math.cos(ra);
            sy += Math.cos(dec) * Math.sin(ra);
            sz += Math.sin(dec);
            vg += e.radiant().vgKmS();
        }
        vg /= nearest.size();
        double raDeg = Angles.normaliseDeg(Math.toDegrees(Math.atan2(sy, sx)));
        double decDeg = Math.toDegrees(Math.atan2(sz, Math.hypot(sx, sy)));
        // fM: node passage time against the period at ejection; an unperturbed trail N revolutions old has
        // dt/dP0 = N, so fM = 1/|dt/dP0| relative to one revolution.
        SimpleRegression tp = new SimpleRegression();
        for (Encounter e : met) {
            if (Double.isFinite(e.crossing().initialPeriod())) {
                tp.addData(e.crossing().initialPeriod(), e.crossing().t());
            }
        }
        double fM = 1 / Math.abs(tp.getSlope());
        int revolutions = (int) Math.round((peakT - returnT) / parentPeriodDays);
        double zhr = zhr(met, peakLon, vg, populationIndex, window);
        return new TrailEncounter(returnT, revolutions, peakT, peakSigmaMin, Angles.normaliseDeg(peakLon), deltaR,
                met.size(), raDeg, decDeg, vg, 2.3548 * sigmaLon * HOURS_PER_DEGREE, fM, zhr);
    }

    /** The median of v, or of a resample of it (indices in pick). */
    private static double median(double[] v, int[] pick) {
        double[] x = new double[pick == null ? v.length : pick.length];
        for (int k = 0; k < x.length; k++) {
            x[k] = v[pick == null ? k : pick[k]];
        }
        java.util.Arrays.sort(x);
        int n = x.length;
        return n % 2 == 1 ? x[n / 2] : 0.5 * (x[n / 2 - 1] + x[n / 2]);
    }

    /** The meteoroids brighter than +6.5 mag per km² per hour through the Earth, to ZHR. */
    private static double zhr(List<Encounter> met, double peakLon, double vg, double r, double window) {
        double vInf = Velocities.vInfinity(vg);
        double logM = (55.34 - 8.75 * Math.log10(vInf * 1e5) - 6.5) / 2.25;
        double massLimitKg = Math.pow(10, logM) * 1e-3;
        double weight = 0;
        double vzSum = 0;
        int n = 0;
        for (Encounter e : met) {
            double w = e.crossing().weight();
            if (Double.isNaN(w)) {
                return Double.NaN;
            }
            double dl = Math.toDegrees(Angles.difference(Math.toRadians(e.solarLongitudeDeg()), Math.toRadians(peakLon)));
            if (Math.abs(e.deltaR()) <= BOX_DELTA_R_AU && Math.abs(dl) <= BOX_LONGITUDE_DEG) {
                if (e.crossing().massKg() >= massLimitKg) {
                    weight += w;
                }
                vzSum += Math.abs(e.crossing().state()[5]);
                n++;
            }
        }
        if (n == 0) {
            return 0.0;
        }
        double vz = vzSum / n * AU_KM / 86400.0;
        double rE = 1.0;
        double areaKm2 = 2 * BOX_DELTA_R_AU * AU_KM * rE * AU_KM * Math.toRadians(2 * BOX_LONGITUDE_DEG);
        double hours = 2 * window * 24;
        double plane = weight / (areaKm2 * hours);
        double flux = plane * vg / vz;
        return flux * 37200 / ((13.1 * r - 16.45) * Math.pow(r - 1.3, 0.748));
    }
}
