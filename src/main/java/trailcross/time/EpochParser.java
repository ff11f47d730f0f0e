package trailcross.time;

import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jastronomy.jsofa.JSOFA;
import org.jastronomy.jsofa.JSOFAIllegalParameter;
import org.jastronomy.jsofa.JSOFAInternalError;

/**
 * Reads the time forms used in trailcross inputs. Every form must name its scale:
 * <ul>
 *   <li>ISO-8601: {@code 2031-11-17T04:12:00Z}, {@code 2031-11-17T04:12:00.5 TT},
 *       {@code 2019-05-10T12:00 TDB}, {@code 2031-11-17 UTC};</li>
 *   <li>Julian dates: {@code JD 2451545.0 TDB}, {@code MJD 51544.5 TT};</li>
 *   <li>the trade's fractional day (as printed in orbit catalogues and MPECs):
 *       {@code 1998 Feb 28.0977 TT}, {@code 1999 November 18.085 UTC}.</li>
 * </ul>
 * Calendar dates are Gregorian (proleptic before 1582), as in IAU SOFA {@code iauCal2jd}.
 */
public final class EpochParser {

    private static final Pattern ISO = Pattern.compile(
            "(-?\\d{4})-(\\d{2})-(\\d{2})(?:[T ](\\d{2}):(\\d{2})(?::(\\d{2}(?:\\.\\d*)?))?)?\\s*(Z|[A-Za-z]+)?");
    private static final Pattern JULIAN = Pattern.compile(
            "(JD|MJD)\\s*(-?\\d+(?:\\.\\d*)?)\\s*([A-Za-z]+)?", Pattern.CASE_INSENSITIVE);
    private static final Pattern FRACTIONAL = Pattern.compile(
            "(-?\\d{1,4})\\s+([A-Za-z]{3,9})\\.?\\s+(\\d{1,2}(?:\\.\\d*)?)\\s*([A-Za-z]+)?");
    private static final String[] MONTHS = {
        "JAN", "FEB", "MAR", "APR", "MAY", "JUN", "JUL", "AUG", "SEP", "OCT", "NOV", "DEC"
    };
    private static final double MJD_ZERO = 2400000.5;

    private EpochParser() {
    }

    /**
     * Parses a time string.
     *
     * @param text the time, with its scale
     * @return the TDB epoch
     * @throws IllegalArgumentException naming what is wrong, and the accepted scales when none is given
     */
    public static Epoch parse(String text) {
        String t = text.trim();
        Matcher m = JULIAN.matcher(t);
        if (m.matches()) {
            TimeScale scale = scale(m.group(3), t);
            double value = Double.parseDouble(m.group(2));
            boolean mjd = m.group(1).equalsIgnoreCase("MJD");
            double whole = Math.floor(value);
            double jd1 = mjd ? MJD_ZERO + whole : whole;
            return TimeScales.toTdb(scale, jd1, value - whole);
        }
        m = ISO.matcher(t);
        if (m.matches()) {
            TimeScale scale = scale(m.group(7), t);
            int hour = m.group(4) == null ? 0 : Integer.parseInt(m.group(4));
            int minute = m.group(5) == null ? 0 : Integer.parseInt(m.group(5));
            double second = m.group(6) == null ? 0.0 : Double.parseDouble(m.group(6));
            return fromCalendar(scale, Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)),
                    Integer.parseInt(m.group(3)), hour, minute, second, t);
        }
        m = FRACTIONAL.matcher(t);
        if (m.matches()) {
            TimeScale scale = scale(m.group(4), t);
            int month = month(m.group(2), t);
            double day = Double.parseDouble(m.group(3));
            int wholeDay = (int) Math.floor(day);
            double seconds = (day - wholeDay) * Epoch.SECONDS_PER_DAY;
            int hour = (int) Math.floor(seconds / 3600);
            int minute = (int) Math.floor((seconds - 3600 * hour) / 60);
            double second = seconds - 3600 * hour - 60 * minute;
            return fromCalendar(scale, Integer.parseInt(m.group(1)), month, wholeDay, hour, minute, second, t);
        }
        throw new IllegalArgumentException("cannot read time '" + t + "': use ISO-8601 (2031-11-17T04:12:00Z,"
                + " 2019-05-10T12:00:00 TDB), 'JD 2451545.0 TDB' or '1998 Feb 28.0977 TT'");
    }

    private static TimeScale scale(String word, String text) {
        if (word == null) {
            throw new IllegalArgumentException("time '" + text + "' has no time scale: add one of "
                    + TimeScale.ACCEPTED + " (e.g. '" + text + " TDB')");
        }
        Optional<TimeScale> s = TimeScale.fromSuffix(word);
        return s.orElseThrow(() -> new IllegalArgumentException("time '" + text + "': unknown time scale '"
                + word + "', accepted: " + TimeScale.ACCEPTED));
    }

    private static int month(String name, String text) {
        String key = name.toUpperCase(Locale.ROOT).substring(0, 3);
        for (int k = 0; k < MONTHS.length; k++) {
            if (MONTHS[k].equals(key)) {
                return k + 1;
            }
        }
        throw new IllegalArgumentException("time '" + text + "': unknown month '" + name + "'");
    }

    /** The leap seconds inserted at the end of a UTC day (IAU SOFA iauDat's table), 0 on most days. */
    private static double leapAtEndOf(int year, int month, int day) {
        int ny = year;
        int nm = month;
        int nd = day + 1;
        if (nd > monthLength(year, month)) {
            nd = 1;
            nm++;
            if (nm > 12) {
                nm = 1;
                ny++;
            }
        }
        try {
            return JSOFA.jauDat(ny, nm, nd, 0.0) - JSOFA.jauDat(year, month, day, 0.0);
        } catch (JSOFAIllegalParameter | JSOFAInternalError e) {
            return 0;
        }
    }

    /**
     * @param year a Gregorian year (proleptic)
     * @param month 1..12
     * @return the days in that month
     */
    static int monthLength(int year, int month) {
        return switch (month) {
            case 2 -> (year % 4 == 0 && year % 100 != 0) || year % 400 == 0 ? 29 : 28;
            case 4, 6, 9, 11 -> 30;
            default -> 31;
        };
    }

    private static Epoch fromCalendar(TimeScale scale, int year, int month, int day, int hour, int minute,
            double second, String text) {
        if (month < 1 || month > 12) {
            throw new IllegalArgumentException("time '" + text + "': not a valid date: month " + month + " is not 1..12");
        }
        int length = monthLength(year, month);
        if (day < 1 || day > length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "time '%s': not a valid date: day %d is not in %d-%02d (1..%d)",
                    text, day, year, month, length));
        }
        if (hour > 23 || minute > 59) {
            throw new IllegalArgumentException("time '" + text + "': not a valid time: hour must be 0..23 and minute 0..59");
        }
        // Second 60 exists only at the end of a UTC day that ends with a leap second (SOFA's iauDtf2d merely warns).
        double secondLimit = 60;
        if (scale == TimeScale.UTC && year >= 1972 && hour == 23 && minute == 59) {
            secondLimit += leapAtEndOf(year, month, day);
        }
        if (second < 0 || second >= secondLimit) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "time '%s': not a valid date or time: second %s is not in 0..%s on that day", text,
                    second, secondLimit == 60 ? "59.999" : "60.999"));
        }
        // SOFA's UTC calendar handles leap-second days; before 1960 UTC means UT (see TimeScales).
        String sofaScale = scale == TimeScale.UTC && year >= 1960 ? "UTC" : "TT";
        try {
            JSOFA.JulianDate jd = JSOFA.jauDtf2d(sofaScale, year, month, day, hour, minute, second);
            return TimeScales.toTdb(scale, jd.djm0, jd.djm1);
        } catch (JSOFAIllegalParameter | JSOFAInternalError e) {
            throw new IllegalArgumentException("time '" + text + "': not a valid date or time ("
                    + e.getMessage() + ")", e);
        }
    }
}
