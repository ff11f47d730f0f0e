package trailcross.forecast;

import java.util.List;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.ParentHistory;
import trailcross.dynamics.Perihelion;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.ParentBody;

/**
 * The parent's perihelion returns over a span of years: the span checked against the ephemeris, the
 * parent integrated ({@link ParentHistory}) from the first instant to one period past its osculating epoch
 * (so that the next return is found), the returns inside the span listed.
 */
public final class ParentReturns {

    /** The IAS15 ε used for parents (tighter than for meteoroids: the parent's history seeds every trail). */
    public static final double PARENT_EPSILON = 1e-10;

    private ParentReturns() {
    }

    /**
     * @param parent the parent
     * @param ephemeris the planets
     * @param sinceYear first calendar year (Jan 1.0 TDB)
     * @param untilYear last calendar year (Dec 31, 24h TDB), or 0 for one period past the epoch
     * @return the history and the returns in the span
     */
    public static Result compute(ParentBody parent, Ephemeris ephemeris, int sinceYear, int untilYear) {
        double from = yearStart(sinceYear);
        double epoch = parent.epoch().daysSinceJ2000();
        double period = parent.elements().period();
        double to = untilYear != 0 ? yearStart(untilYear + 1)
                : epoch + (Double.isFinite(period) ? Math.min(1.05 * period, 300 * 365.25) : 365.25);
        if (to < from) {
            throw new IllegalArgumentException("--until " + untilYear + " is before --since " + sinceYear);
        }
        for (double t : new double[] {from, to, epoch}) {
            ephemeris.checkSpan(t);
        }
        ParentHistory h = ParentHistory.compute(parent, new ForceModelFactory(ephemeris, true, true),
                PARENT_EPSILON, from, to);
        List<Perihelion> inSpan = h.perihelia().stream().filter(p -> p.t() >= from && p.t() <= to).toList();
        return new Result(h, inSpan);
    }

    /**
     * @param year a calendar year
     * @return Jan 1.0 TDB of that year, days since J2000
     */
    public static double yearStart(int year) {
        // Gregorian calendar (proleptic), January 1.0 as month 13 of the year before (Meeus 1998, ch. 7):
        // computed from the calendar, so that any year gives a number and the ephemeris' span check can speak.
        long y = year - 1L;
        long a = Math.floorDiv(y, 100);
        long b = 2 - a + Math.floorDiv(a, 4);
        double jd = Math.floor(365.25 * (y + 4716)) + Math.floor(30.6001 * 14) + 1 + b - 1524.5;
        return jd - 2451545.0;
    }

    /**
     * @param history the integrated history
     * @param returns the perihelia inside the span, in time order
     */
    public record Result(ParentHistory history, List<Perihelion> returns) {
    }

    /**
     * @param t TDB days since J2000
     * @return the calendar year (TDB) containing t
     */
    public static int yearOf(double t) {
        int y = (int) Math.floor(2000 + t / 365.2425);
        while (yearStart(y) > t) {
            y--;
        }
        while (yearStart(y + 1) <= t) {
            y++;
        }
        return y;
    }
}
