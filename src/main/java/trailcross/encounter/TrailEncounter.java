package trailcross.encounter;

import java.util.ArrayList;
import java.util.List;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.Angles;

/**
 * One trail's meeting with the Earth in one year, from its particles' node crossings ({@link Encounter}),
 * each weighted by the real meteoroids it stands for (importance weights included):
 * <ul>
 * <li>the trail section met: crossings whose node passage lies within {@value #ALONG_TRAIL_DAYS} days of the
 * Earth's passage of the same longitude, the window doubled (to at most {@value #MAX_ALONG_TRAIL_DAYS} days)
 * until it holds {@value #ENOUGH} crossings;</li>
 * <li>the activity profile: the flux of meteoroids brighter than +6.5 mag at the Earth along its path, from the
 * weighted kernel density of the section's crossings in delta r (at δr = 0) and solar longitude
 * ({@link DensityProfile}); each crossing's rate through the plane becomes a flux perpendicular to its
 * geocentric velocity (× Vg/|v_z|) and the flux becomes ZHR = Q · 37200 / ((13.1 r − 16.45)(r − 1.3)^0.748)
 * with the population index r (Koschack &amp; Rendtel 1990, WGN 18, 44; from memory); the mass of a +6.5-mag
 * meteor from Jacchia, Verniani &amp; Briggs (1967), M = 55.34 − 8.75 log V − 2.25 log m (V cm/s, m g, zenith;
 * from memory);</li>
 * <li>peak: the profile's maximum, its uncertainty from resampling; FWHM from the profile; ZHR at the peak
 * with its resampling uncertainty and the kernel's smoothing bias there in quadrature (relative to the run's strongest meeting when the stream gives no dust
 * production);</li>
 * <li>delta r: the weighted median of the crossings at the peak longitude (weights × the longitude kernel);
 * the radiant and Vg: their weighted mean;</li>
 * <li>fM (McNaught &amp; Asher 1999): 1/|d t_node / d P0| = |d P0 / d t_node|, with t_node the node passage
 * times and P0 the orbital periods at ejection (weighted least-squares slope of P0 on t_node over the crossings of the
 * commonest revolution count; an unperturbed trail N revolutions old has d t_node / d P0 = N). The slope is
 * taken in that direction because the section is chosen by node time: fitted the other way, node time on
 * P0, the window truncates the response and flattens the slope (Hausman &amp; Wise 1977, truncated
 * regression; from memory), which with ejection's other variables spreading node times inflated fM (the Leonids' 1899
 * trail in 1999, before the slope was weighted: 1.24 that way, 0.29 this way, the trail's axis 0.40);</li>
 * <li>ESS: Kish's effective number of the crossings behind the profile.</li>
 * </ul>
 *
 * @param returnT the trail's return (perihelion), TDB days since J2000
 * @param revolutions revolutions of the parent since that return
 * @param peakT the peak, TDB days since J2000
 * @param peakSigmaMin the peak's 1-σ uncertainty, minutes
 * @param solarLongitudeDeg solar longitude of the peak, degrees
 * @param deltaR delta r, au (the weighted median of the crossings at the peak's longitude)
 * @param deltaRSigma its 1-σ uncertainty from {@value #BOOTSTRAP} bootstrap resamples of the section, au
 * @param particles particles in the section met
 * @param raDeg radiant RA, degrees
 * @param decDeg radiant Dec, degrees
 * @param vgKmS Vg, km/s
 * @param fwhmHours FWHM of the activity profile, hours
 * @param fM the along-trail density factor
 * @param fMSigma its 1-σ uncertainty by the pairs bootstrap ({@value #BOOTSTRAP} resamples; NaN with fewer
 *        than three crossings on the branch)
 * @param zhr the ZHR at the peak (for the weights given)
 * @param zhrSigma its 1-σ uncertainty: the resampling σ and the kernel's smoothing bias at the peak
 *        ({@link DensityProfile#smoothingBias}) in quadrature
 * @param ess Kish's effective sample size of the crossings behind the profile
 * @param profile the activity profile in ZHR against solar longitude
 */
public record TrailEncounter(double returnT, int revolutions, double peakT, double peakSigmaMin,
        double solarLongitudeDeg, double deltaR, double deltaRSigma, int particles, double raDeg, double decDeg, double vgKmS,
        double fwhmHours, double fM, double fMSigma, double zhr, double zhrSigma, double ess, DensityProfile.Result profile) {

    /** Along-trail half-window: crossings this many days before or after the Earth, days. */
    public static final double ALONG_TRAIL_DAYS = 10.0;
    /** The window is doubled until it holds this many crossings, ... */
    public static final int ENOUGH = 12;
    /** ... but not beyond this half-width, days. */
    public static final double MAX_ALONG_TRAIL_DAYS = 80.0;
    /** Bootstrap resamples for the uncertainty of delta r. */
    public static final int BOOTSTRAP = 200;
    /** Hours per degree of solar longitude (365.2422 d per 360°). */
    public static final double HOURS_PER_DEGREE = 365.2422 * 24 / 360;
    private static final double AU_KM = Body.Constants.AU_KM;

    /**
     * @param encounters the crossings of one trail in the year
     * @param parentPeriodDays the parent's orbital period (for revolutions)
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
        int n = met.size();
        double returnT = met.get(0).crossing().returnT();
        double[] dr = new double[n];
        double[] lon = new double[n];
        double[] w = new double[n];
        double[] zhrValue = new double[n];
        double r = populationIndex;
        double toZhr = 37200 / ((13.1 * r - 16.45) * Math.pow(r - 1.3, 0.748));
        double rE = 0;
        for (Encounter e : met) {
            rE += (e.crossing().r() - e.deltaR()) / n;
        }
        // Profile units: Σ value K_r K_λ is per au of delta r and per degree of longitude; divided by the area
        // element (km² per au·degree at the Earth's distance) and the section's duration (hours) it is a rate
        // per km² per hour.
        double perAreaTime = 1 / (AU_KM * AU_KM * rE * Math.toRadians(1) * 2 * window * 24);
        // Longitudes unwrapped around the first one, so that a trail met at λ ≈ 0° stays continuous.
        double lon0 = met.get(0).solarLongitudeDeg();
        for (int i = 0; i < n; i++) {
            Encounter e = met.get(i);
            dr[i] = e.deltaR();
            lon[i] = lon0 + Math.toDegrees(Angles.difference(Math.toRadians(e.solarLongitudeDeg()), Math.toRadians(lon0)));
            double wi = e.crossing().weight();
            w[i] = Double.isNaN(wi) ? 1 : wi;
            double vg = e.radiant().vgKmS();
            double vz = Math.abs(e.crossing().state()[5]) * AU_KM / 86400.0;
            boolean visible = e.crossing().massKg() >= massLimitKg(vg);
            zhrValue[i] = visible ? w[i] * Math.min(vg / Math.max(vz, 1e-9), 1e3) * perAreaTime * toZhr : 0;
        }
        DensityProfile.Result prof = DensityProfile.of(dr, lon, w, zhrValue, Double.doubleToLongBits(returnT));
        if (prof == null) {
            // No meteoroid above the visual limit near the Earth's path: profile of all sizes for the timing.
            double[] all = new double[n];
            for (int i = 0; i < n; i++) {
                all[i] = w[i] * perAreaTime;
            }
            prof = DensityProfile.of(dr, lon, w, all, Double.doubleToLongBits(returnT));
            if (prof == null) {
                return null;
            }
            prof = new DensityProfile.Result(prof.grid(), new double[prof.grid().length], new double[prof.grid().length],
                    new double[prof.grid().length], prof.peak(), 0, prof.peakSigma(), 0, prof.hR(), prof.hLambda(),
                    prof.fwhm(), prof.ess(), null, null);
        }
        double peakLon = prof.peak();
        // The ZHR's uncertainty: the bootstrap σ of the maximum and, in quadrature, the kernel's smoothing bias
        // there (a sharp core is flattened by a bandwidth set on the whole section).
        double bias = DensityProfile.smoothingBias(dr, lon, zhrValue, prof.hR(), prof.hLambda(), peakLon);
        double peakT = EarthLongitude.time(ephemeris, Math.toRadians(peakLon + 180), met.get(0).earthT());
        // The crossings at the peak: weights times the longitude kernel.
        double[] atPeak = new double[n];
        for (int i = 0; i < n; i++) {
            double z = (lon[i] - peakLon) / prof.hLambda();
            atPeak[i] = w[i] * Math.exp(-0.5 * z * z);
        }
        double deltaR = DensityProfile.weightedQuantile(dr, atPeak, 0.5);
        double deltaRSigma = bootstrapSigma(dr, atPeak, Double.doubleToLongBits(returnT) ^ 0x6A09E667F3BCC909L);
        double sx = 0;
        double sy = 0;
        double sz = 0;
        double vg = 0;
        double sw = 0;
        for (int i = 0; i < n; i++) {
            Encounter e = met.get(i);
            double zr = dr[i] / prof.hR();
            double k = atPeak[i] * Math.exp(-0.5 * zr * zr);
            double ra = Math.toRadians(e.radiant().raDeg());
            double dec = Math.toRadians(e.radiant().decDeg());
            sx += k * Math.cos(dec) * Math.cos(ra);
            sy += k * Math.cos(dec) * Math.sin(ra);
            sz += k * Math.sin(dec);
            vg += k * e.radiant().vgKmS();
            sw += k;
        }
        vg /= sw;
        double raDeg = Angles.normaliseDeg(Math.toDegrees(Math.atan2(sy, sx)));
        double decDeg = Math.toDegrees(Math.atan2(sz, Math.hypot(sx, sy)));
        // fM: the period at ejection against node passage time (see the class comment for the direction); an
        // unperturbed trail N revolutions old has dP0/dt = 1/N, so fM = |dP0/dt| relative to one revolution.
        // Only the crossings of the section's commonest number of revolutions since the return: where planets
        // make the map many-valued, particles of another revolution count are not on the same branch.
        java.util.Map<Long, Integer> revs = new java.util.TreeMap<>();
        for (Encounter e : met) {
            double p0 = e.crossing().initialPeriod();
            if (Double.isFinite(p0)) {
                revs.merge(Math.round((e.crossing().t() - e.crossing().returnT()) / p0), 1, Integer::sum);
            }
        }
        long branch = revs.entrySet().stream().max(java.util.Map.Entry.comparingByValue()).map(java.util.Map.Entry::getKey)
                .orElse(0L);
        List<double[]> pairs = new ArrayList<>();
        for (Encounter e : met) {
            double p0 = e.crossing().initialPeriod();
            if (Double.isFinite(p0) && Math.round((e.crossing().t() - e.crossing().returnT()) / p0) == branch) {
                double wi = e.crossing().weight();
                pairs.add(new double[] {e.crossing().t(), p0, Double.isNaN(wi) ? 1 : wi});
            }
        }
        double fM = Math.abs(slope(pairs));
        double fMSigma = slopeSigma(pairs, Double.doubleToLongBits(returnT) ^ 0xBB67AE8584CAA73BL);
        int revolutions = (int) Math.round((peakT - returnT) / parentPeriodDays);
        return new TrailEncounter(returnT, revolutions, peakT, prof.peakSigma() * HOURS_PER_DEGREE * 60,
                Angles.normaliseDeg(peakLon), deltaR, deltaRSigma, n, raDeg, decDeg, vg, prof.fwhm() * HOURS_PER_DEGREE, fM,
                fMSigma,
                prof.peakValue(), Math.hypot(prof.peakValueSigma(), bias), prof.ess(), prof);
    }

    /**
     * The weighted least-squares slope of y on x, Σw(x − x̄)(y − ȳ) / Σw(x − x̄)² with weighted means: weighted
     * by the real meteoroids each crossing stands for (importance weights included), so that it estimates the
     * trail's own slope whatever proposal drew the particles; unweighted, it is the slope of the proposal's
     * mixture, which moves with the particle count (on the demo's youngest trail 0.889 at 6000 particles per
     * return and 0.948 at 2000, 2.4 combined σ apart).
     *
     * @param xyw rows (x, y, weight)
     * @return the slope (NaN when x does not vary)
     */
    static double slope(List<double[]> xyw) {
        double sw = 0;
        double mx = 0;
        double my = 0;
        for (double[] p : xyw) {
            sw += p[2];
            mx += p[2] * p[0];
            my += p[2] * p[1];
        }
        mx /= sw;
        my /= sw;
        double sxy = 0;
        double sxx = 0;
        for (double[] p : xyw) {
            sxy += p[2] * (p[0] - mx) * (p[1] - my);
            sxx += p[2] * (p[0] - mx) * (p[0] - mx);
        }
        return sxx > 0 ? sxy / sxx : Double.NaN;
    }

    /**
     * The weighted slope's uncertainty by the pairs bootstrap (Efron &amp; Tibshirani 1993, sec. 9.5): the
     * standard deviation of the |slope| over {@value #BOOTSTRAP} resamples of the (node time, P0, weight) rows;
     * it holds the weights' own scatter, which the textbook standard error does not.
     *
     * @param xy the rows (x, y, weight)
     * @param seed the resampling's seed
     * @return the 1-σ uncertainty of |slope| (NaN with fewer than three pairs)
     */
    static double slopeSigma(List<double[]> xy, long seed) {
        if (xy.size() < 3) {
            return Double.NaN;
        }
        List<double[]> rows = new ArrayList<>(xy.size());
        return resampledSd(xy.size(), seed, pick -> {
            rows.clear();
            for (int j : pick) {
                rows.add(xy.get(j));
            }
            return Math.abs(slope(rows));
        });
    }

    /**
     * The standard deviation of the weighted median over bootstrap resamples of the crossings (Efron &amp;
     * Tibshirani 1993, ch. 6), seeded so that a run is reproducible.
     */
    static double bootstrapSigma(double[] values, double[] weights, long seed) {
        int n = values.length;
        double[] v = new double[n];
        double[] w = new double[n];
        return resampledSd(n, seed, pick -> {
            double total = 0;
            for (int i = 0; i < n; i++) {
                v[i] = values[pick[i]];
                w[i] = weights[pick[i]];
                total += w[i];
            }
            return total > 0 ? DensityProfile.weightedQuantile(v, w, 0.5) : Double.NaN;
        });
    }

    /**
     * The bootstrap's one loop: {@value #BOOTSTRAP} resamples of n items with replacement, drawn from a
     * generator seeded by {@code seed}, a statistic of each; resamples whose statistic is not finite are left out.
     *
     * @param n items
     * @param seed the seed
     * @param statistic of the indices drawn
     * @return the statistic's standard deviation (NaN with fewer than two finite values)
     */
    private static double resampledSd(int n, long seed, java.util.function.ToDoubleFunction<int[]> statistic) {
        org.apache.commons.math3.random.RandomGenerator rng = new org.apache.commons.math3.random.Well19937c(
                new int[] {(int) seed, (int) (seed >>> 32)});
        org.apache.commons.math3.stat.descriptive.SummaryStatistics st = new org.apache.commons.math3.stat.descriptive.SummaryStatistics();
        int[] pick = new int[n];
        for (int b = 0; b < BOOTSTRAP; b++) {
            for (int i = 0; i < n; i++) {
                pick[i] = rng.nextInt(n);
            }
            double x = statistic.applyAsDouble(pick);
            if (Double.isFinite(x)) {
                st.addValue(x);
            }
        }
        return st.getN() > 1 ? st.getStandardDeviation() : Double.NaN;
    }

    /**
     * @param vgKmS geocentric speed, km/s
     * @return the mass of a meteoroid of +6.5 mag at the zenith at that speed (Jacchia, Verniani &amp; Briggs
     *     1967, from memory), kg
     */
    public static double massLimitKg(double vgKmS) {
        double vInf = Velocities.vInfinity(vgKmS);
        double logM = (55.34 - 8.75 * Math.log10(vInf * 1e5) - 6.5) / 2.25;
        return Math.pow(10, logM) * 1e-3;
    }

    /** A rival maximum is listed from this share of the peak's value up. */
    public static final double RIVAL_SHARE = 0.8;

    /**
     * The activity profile's other maxima of at least {@value #RIVAL_SHARE} of the peak ({@link
     * DensityProfile.Result#otherMaxima}).
     *
     * @return per maximum: its time (TDB days since J2000), solar longitude (degrees) and share of the peak
     */
    public List<double[]> rivalMaxima() {
        double[] t = profileTimes();
        List<double[]> out = new ArrayList<>();
        for (int j : profile.otherMaxima(RIVAL_SHARE)) {
            out.add(new double[] {t[j], Angles.normaliseDeg(profile.grid()[j]),
                    profile.value()[j] / profile.peakValue()});
        }
        return out;
    }

    /** @return the profile's time of each grid point, TDB days since J2000 (linear in longitude about the peak) */
    public double[] profileTimes() {
        double[] g = profile.grid();
        double[] t = new double[g.length];
        double peakLon = profile.peak();
        for (int j = 0; j < g.length; j++) {
            t[j] = peakT + (g[j] - peakLon) * HOURS_PER_DEGREE / 24;
        }
        return t;
    }
}
