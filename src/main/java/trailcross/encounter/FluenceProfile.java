package trailcross.encounter;

import trailcross.ephemeris.Body;

/**
 * The fluence of a cloud at a target against time, from its particles' closest approaches: the particles
 * whose impact parameter b lies inside a sampling radius D (the least of {@value #FIRST_RADIUS_AU} au
 * doubled, up to {@value #MAX_RADIUS_AU} au, that holds {@value #ENOUGH} of them) each carry their meteoroids
 * through the disc π D² perpendicular to their path, so that Σ N_i / (π D²) estimates the fluence (per km²)
 * at the target; the time profile is the weighted Gaussian kernel density of their closest-approach times
 * (bandwidth by Silverman's rule of thumb, {@link DensityProfile#bandwidth}), its peak, FWHM and 16–84% bands
 * with bootstrap uncertainties ({@link DensityProfile}). A larger D trades resolution for particles: its
 * value is part of the result.
 *
 * @param radiusAu the sampling radius D, au
 * @param particles particles inside it
 * @param ess Kish's effective number of them (by fluence)
 * @param profile the fluence rate against time (grid in TDB days since J2000, values per km² per day)
 * @param total the fluence over the span, per km²
 * @param totalSigma its bootstrap uncertainty
 */
public record FluenceProfile(double radiusAu, int particles, double ess, DensityProfile.Result profile, double total,
        double totalSigma) {

    /** The first sampling radius tried, au. */
    public static final double FIRST_RADIUS_AU = 0.001;
    /** The largest, au. */
    public static final double MAX_RADIUS_AU = 0.128;
    /** Particles wanted inside the sampling radius. */
    public static final int ENOUGH = 12;
    /** Bootstrap resamples of the total. */
    private static final int RESAMPLES = DensityProfile.RESAMPLES;

    /**
     * @param t each particle's closest-approach time, TDB days since J2000
     * @param b its impact parameter, au
     * @param meteoroids the meteoroids it stands for that count (e.g. above a mass), ≥ 0
     * @param seed the bootstrap's seed
     * @return the profile, or null when fewer than three particles with meteoroids pass within
     *     {@value #MAX_RADIUS_AU} au
     */
    public static FluenceProfile of(double[] t, double[] b, double[] meteoroids, long seed) {
        double radius = FIRST_RADIUS_AU;
        int inside = 0;
        for (; radius <= MAX_RADIUS_AU * 1.0001; radius *= 2) {
            inside = count(b, meteoroids, radius);
            if (inside >= ENOUGH) {
                break;
            }
        }
        radius = Math.min(radius, MAX_RADIUS_AU);
        inside = count(b, meteoroids, radius);
        if (inside < 3) {
            return null;
        }
        double rKm = radius * Body.Constants.AU_KM;
        double disc = Math.PI * rKm * rKm;
        double[] x = new double[inside];
        double[] c = new double[inside];
        int j = 0;
        for (int i = 0; i < t.length; i++) {
            if (b[i] <= radius && meteoroids[i] > 0) {
                x[j] = t[i];
                c[j] = meteoroids[i] / disc;
                j++;
            }
        }
        double h = Math.max(1e-3, DensityProfile.bandwidth(x, c));
        DensityProfile.Result p = DensityProfile.along(x, c, h, radius, seed);
        if (p == null) {
            return null;
        }
        double total = 0;
        for (double v : c) {
            total += v;
        }
        org.apache.commons.math3.random.Well19937c rng = new org.apache.commons.math3.random.Well19937c(seed + 1);
        double[] totals = new double[RESAMPLES];
        for (int r = 0; r < RESAMPLES; r++) {
            double s = 0;
            for (int i = 0; i < inside; i++) {
                s += c[rng.nextInt(inside)];
            }
            totals[r] = s;
        }
        return new FluenceProfile(radius, inside, DensityProfile.kish(c), p, total, DensityProfile.sd(totals));
    }

    private static int count(double[] b, double[] meteoroids, double radius) {
        int n = 0;
        for (int i = 0; i < b.length; i++) {
            if (b[i] <= radius && meteoroids[i] > 0) {
                n++;
            }
        }
        return n;
    }

    /** @return the peak, TDB days since J2000 */
    public double peakT() {
        return profile.peak();
    }

    /** @return the peak's 1-σ uncertainty, minutes */
    public double peakSigmaMin() {
        return profile.peakSigma() * 1440;
    }

    /** @return the profile's FWHM, hours */
    public double fwhmHours() {
        return profile.fwhm() * 24;
    }
}
