package trailcross.time;

/**
 * An instant as a two-part Julian date in Barycentric Dynamical Time (TDB), the independent variable of
 * every integration in trailcross. The split {@code jd1 + jd2} keeps sub-microsecond resolution over
 * millennia (the IAU SOFA convention for two-part dates).
 *
 * @param jd1 first part of the TDB Julian date (conventionally the integer-and-half part)
 * @param jd2 second part of the TDB Julian date
 */
public record Epoch(double jd1, double jd2) implements Comparable<Epoch> {

    /** Julian date of J2000.0, 2000 January 1.5 TDB (IAU 1976). */
    public static final double J2000_JD = 2451545.0;

    /** J2000.0 itself. */
    public static final Epoch J2000 = new Epoch(J2000_JD, 0.0);

    /** Seconds in a day. */
    public static final double SECONDS_PER_DAY = 86400.0;

    /**
     * An epoch from a TDB Julian date, split so that {@code jd2} is the fraction from the preceding
     * half-day boundary.
     *
     * @param jdTdb Julian date, TDB
     * @return the epoch
     */
    public static Epoch ofTdb(double jdTdb) {
        double whole = Math.floor(jdTdb - 0.5) + 0.5;
        return new Epoch(whole, jdTdb - whole);
    }

    /**
     * An epoch from days since J2000.0, TDB.
     *
     * @param days days since J2000.0 (TDB)
     * @return the epoch
     */
    public static Epoch ofDaysSinceJ2000(double days) {
        double whole = Math.floor(days);
        return new Epoch(J2000_JD + whole, days - whole);
    }

    /** @return the TDB Julian date as one number (about 40 µs resolution near the present) */
    public double jd() {
        return jd1 + jd2;
    }

    /** @return days since J2000.0 TDB, computed without losing the fraction */
    public double daysSinceJ2000() {
        return (jd1 - J2000_JD) + jd2;
    }

    /**
     * @param days days to add (TDB)
     * @return this epoch moved by {@code days}
     */
    public Epoch plusDays(double days) {
        double sum = jd2 + days;
        double whole = Math.floor(sum);
        return new Epoch(jd1 + whole, sum - whole);
    }

    /**
     * @param other another epoch
     * @return {@code this - other} in days
     */
    public double daysFrom(Epoch other) {
        return (jd1 - other.jd1) + (jd2 - other.jd2);
    }

    /** @return the decimal Julian year (J2000.0 + days / 365.25), good enough to pick ΔT or a leap second */
    public double julianYear() {
        return 2000.0 + daysSinceJ2000() / 365.25;
    }

    @Override
    public int compareTo(Epoch o) {
        return Double.compare(daysFrom(o), 0.0);
    }
}
