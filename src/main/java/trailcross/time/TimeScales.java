package trailcross.time;

import org.jastronomy.jsofa.JSOFA;
import org.jastronomy.jsofa.JSOFAIllegalParameter;
import org.jastronomy.jsofa.JSOFAInternalError;

/**
 * Conversions between UTC, TAI, TT and TDB through IAU SOFA (JSOFA): leap seconds ({@code jauDat}),
 * TT = TAI + 32.184 s, and TDB − TT from the Fairhead &amp; Bretagnon (1990) series as coded in
 * {@code jauDtdb}, evaluated at the geocentre.
 *
 * <p>UTC is not defined before 1960; there trailcross takes "UTC" to mean Universal Time, TT − ΔT with
 * ΔT from {@link DeltaT}. After the last leap second in JSOFA's table, TAI − UTC keeps its last value.
 */
public final class TimeScales {

    /** First year of UTC in SOFA's leap-second table. */
    private static final int UTC_START_YEAR = 1960;

    private TimeScales() {
    }

    /**
     * Converts a two-part Julian date in any scale to a TDB epoch.
     *
     * @param scale the scale of {@code jd1 + jd2}
     * @param jd1 first part
     * @param jd2 second part
     * @return the TDB epoch
     */
    public static Epoch toTdb(TimeScale scale, double jd1, double jd2) {
        switch (scale) {
            case TDB:
                return normalise(jd1, jd2);
            case TT:
                return ttToTdb(jd1, jd2);
            case TAI: {
                JSOFA.JulianDate tt = JSOFA.jauTaitt(jd1, jd2);
                return ttToTdb(tt.djm0, tt.djm1);
            }
            case UTC: {
                if (yearOf(jd1, jd2) < UTC_START_YEAR) {
                    double dt = DeltaT.seconds(approxYear(jd1 + jd2)) / Epoch.SECONDS_PER_DAY;
                    return ttToTdb(jd1, jd2 + dt);
                }
                try {
                    JSOFA.JulianDate tai = JSOFA.jauUtctai(jd1, jd2);
                    JSOFA.JulianDate tt = JSOFA.jauTaitt(tai.djm0, tai.djm1);
                    return ttToTdb(tt.djm0, tt.djm1);
                } catch (JSOFAIllegalParameter | JSOFAInternalError e) {
                    throw new IllegalArgumentException("UTC date out of range: " + e.getMessage(), e);
                }
            }
            default:
                throw new AssertionError(scale);
        }
    }

    /**
     * Expresses a TDB epoch as a two-part Julian date in another scale.
     *
     * @param epoch the TDB epoch
     * @param scale the wanted scale
     * @return {jd1, jd2} in {@code scale}; for UTC, SOFA's quasi-JD convention on leap-second days
     */
    public static double[] fromTdb(Epoch epoch, TimeScale scale) {
        if (scale == TimeScale.TDB) {
            return new double[] {epoch.jd1(), epoch.jd2()};
        }
        double dtr = dtdbSeconds(epoch.jd1(), epoch.jd2());
        JSOFA.JulianDate tt = JSOFA.jauTdbtt(epoch.jd1(), epoch.jd2(), dtr);
        if (scale == TimeScale.TT) {
            return new double[] {tt.djm0, tt.djm1};
        }
        JSOFA.JulianDate tai = JSOFA.jauTttai(tt.djm0, tt.djm1);
        if (scale == TimeScale.TAI) {
            return new double[] {tai.djm0, tai.djm1};
        }
        if (yearOf(tt.djm0, tt.djm1) < UTC_START_YEAR) {
            double dt = DeltaT.seconds(approxYear(tt.djm0 + tt.djm1)) / Epoch.SECONDS_PER_DAY;
            return new double[] {tt.djm0, tt.djm1 - dt};
        }
        try {
            // Invert iauUtctai by iteration, as SOFA's current iauTaiutc does; JSOFA's jauTaiutc is off by
            // milliseconds in the 1961–1971 drifting-UTC era.
            double u1 = tai.djm0;
            double u2 = tai.djm1;
            for (int k = 0; k < 3; k++) {
                JSOFA.JulianDate g = JSOFA.jauUtctai(u1, u2);
                u2 += (tai.djm0 - g.djm0) + (tai.djm1 - g.djm1);
            }
            return new double[] {u1, u2};
        } catch (JSOFAIllegalParameter | JSOFAInternalError e) {
            throw new IllegalArgumentException("UTC date out of range: " + e.getMessage(), e);
        }
    }

    /**
     * TDB − TT in seconds at the geocentre (Fairhead &amp; Bretagnon 1990 via SOFA {@code iauDtdb}).
     *
     * @param jd1 first part of the date (TT or TDB; the difference is immaterial here)
     * @param jd2 second part
     * @return TDB − TT in seconds
     */
    public static double dtdbSeconds(double jd1, double jd2) {
        double fraction = (jd1 + jd2 + 0.5) - Math.floor(jd1 + jd2 + 0.5);
        return JSOFA.jauDtdb(jd1, jd2, fraction, 0.0, 0.0, 0.0);
    }

    /**
     * Whether an epoch given in {@code scale} would need UT from ΔT rather than SOFA's UTC.
     *
     * @param jd1 first part
     * @param jd2 second part
     * @return true before 1960
     */
    static boolean beforeUtc(double jd1, double jd2) {
        return yearOf(jd1, jd2) < UTC_START_YEAR;
    }

    private static Epoch ttToTdb(double jd1, double jd2) {
        JSOFA.JulianDate tdb = JSOFA.jauTttdb(jd1, jd2, dtdbSeconds(jd1, jd2));
        return normalise(tdb.djm0, tdb.djm1);
    }

    private static Epoch normalise(double jd1, double jd2) {
        double whole = Math.floor(jd1 - 0.5) + 0.5;
        double rest = (jd1 - whole) + jd2;
        double shift = Math.floor(rest);
        return new Epoch(whole + shift, rest - shift);
    }

    private static int yearOf(double jd1, double jd2) {
        try {
            return JSOFA.jauJd2cal(jd1, jd2).iy;
        } catch (JSOFAIllegalParameter e) {
            throw new IllegalArgumentException("date outside the calendar range: JD " + (jd1 + jd2), e);
        }
    }

    private static double approxYear(double jd) {
        return 2000.0 + (jd - Epoch.J2000_JD) / 365.25;
    }
}
