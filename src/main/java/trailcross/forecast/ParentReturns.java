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
        return trailcross.time.EpochParser.parse(String.format(java.util.Locale.ROOT,
                "%04d-01-01T00:00:00 TDB", year)).daysSinceJ2000();
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
        return Integer.parseInt(trailcross.time.EpochFormat.iso(trailcross.time.Epoch.ofDaysSinceJ2000(t),
                trailcross.time.TimeScale.TDB, 0).substring(0, 4));
    }
}
