package trailcross.time;

import java.util.Locale;
import org.jastronomy.jsofa.JSOFA;
import org.jastronomy.jsofa.JSOFAIllegalParameter;
import org.jastronomy.jsofa.JSOFAInternalError;

/**
 * Writes epochs for people and files: ISO-8601 in UTC with a trailing {@code Z}, or in TDB/TT with the
 * scale named, rounded by IAU SOFA {@code iauD2dtf} (which handles leap-second days).
 */
public final class EpochFormat {

    private EpochFormat() {
    }

    /**
     * @param epoch the epoch
     * @param decimals decimals of the second (0 to 9)
     * @return e.g. {@code 1999-11-18T02:02:00Z}
     */
    public static String utc(Epoch epoch, int decimals) {
        return iso(epoch, TimeScale.UTC, decimals) + "Z";
    }

    /**
     * @param epoch the epoch
     * @param scale the scale to express it in
     * @param decimals decimals of the second (0 to 9)
     * @return e.g. {@code 2019-05-10T12:00:00} (no scale suffix)
     */
    public static String iso(Epoch epoch, TimeScale scale, int decimals) {
        double[] jd = TimeScales.fromTdb(epoch, scale);
        String sofaScale = scale == TimeScale.UTC && !TimeScales.beforeUtc(jd[0], jd[1]) ? "UTC" : "TT";
        try {
            JSOFA.CalendarHMS c = JSOFA.jauD2dtf(sofaScale, decimals, jd[0], jd[1]);
            String base = String.format(Locale.ROOT, "%04d-%02d-%02dT%02d:%02d:%02d", c.iy, c.im, c.id,
                    c.ihmsf[0], c.ihmsf[1], c.ihmsf[2]);
            if (decimals > 0) {
                base += String.format(Locale.ROOT, ".%0" + decimals + "d", c.ihmsf[3]);
            }
            return base;
        } catch (JSOFAIllegalParameter | JSOFAInternalError e) {
            throw new IllegalArgumentException("cannot format JD " + (jd[0] + jd[1]) + ": " + e.getMessage(), e);
        }
    }

    /**
     * @param epoch the epoch
     * @param decimals decimals of the second
     * @return e.g. {@code 2019-05-10T12:00:00 TDB}, a form {@link EpochParser} reads back
     */
    public static String tdb(Epoch epoch, int decimals) {
        return iso(epoch, TimeScale.TDB, decimals) + " TDB";
    }
}
