package trailcross.forecast;

import java.util.List;
import java.util.Locale;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.ParentHistory;
import trailcross.dynamics.Perihelion;
import trailcross.ejection.ActiveArc;
import trailcross.ejection.ParticleGenerator;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.EjectionSettings;
import trailcross.stream.StreamDefinition;

/**
 * One return of a stream's parent made ready for ejection: the parent integrated ({@link ParentHistory})
 * over the calendar year of the return plus the active arc on either side (estimated from the osculating
 * orbit, then checked on the integrated one), the perihelion of that year found, its active arc and the
 * particle generator built.
 *
 * @param history the parent's history
 * @param perihelion the return
 * @param generator the particle generator for that return
 */
public record ReturnCloud(ParentHistory history, Perihelion perihelion, ParticleGenerator generator) {

    /**
     * @param stream the stream
     * @param ephemeris the planets
     * @param year the calendar year (TDB) of the return's perihelion
     * @return the prepared return
     * @throws IllegalArgumentException when the parent has no perihelion that year or the span leaves the
     *     ephemeris
     */
    public static ReturnCloud prepare(StreamDefinition stream, Ephemeris ephemeris, int year) {
        double from = ParentReturns.yearStart(year);
        double to = ParentReturns.yearStart(year + 1);
        double[] margin = margins(stream, stream.parent().elements());
        double lo = from - margin[0];
        double hi = to + margin[1];
        for (double t : new double[] {lo, hi, stream.parent().epoch().daysSinceJ2000()}) {
            ephemeris.checkSpan(t);
        }
        ParentHistory h = ParentHistory.compute(stream.parent(), new ForceModelFactory(ephemeris, true, true),
                ParentReturns.PARENT_EPSILON, lo, hi);
        List<Perihelion> inYear = h.perihelia().stream().filter(p -> p.t() >= from && p.t() < to).toList();
        if (inYear.isEmpty()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "--return %d: %s has no perihelion passage in %d (list them with 'trailcross returns %s --since YEAR')",
                    year, stream.parent().name(), year, stream.source()));
        }
        Perihelion p = inYear.get(0);
        ActiveArc arc = ActiveArc.find(h, p.t(), p.elements(), stream.ejection());
        return new ReturnCloud(h, p, new ParticleGenerator(stream, h, arc));
    }

    /**
     * One return made ready from a history already integrated (a forecast integrates the parent once over
     * all its returns), or, when that history does not cover the return's active arc with margin, from a
     * history of its own ({@link #prepare}).
     *
     * @param stream the stream
     * @param ephemeris the planets
     * @param history an integrated history
     * @param p a perihelion found on it
     * @param year the return's calendar year
     * @return the prepared return
     */
    public static ReturnCloud from(StreamDefinition stream, Ephemeris ephemeris, ParentHistory history, Perihelion p,
            int year) {
        double[] margin = margins(stream, p.elements());
        if (p.t() - margin[0] < history.first() || p.t() + margin[1] > history.last()) {
            return prepare(stream, ephemeris, year);
        }
        ActiveArc arc = ActiveArc.find(history, p.t(), p.elements(), stream.ejection());
        return new ReturnCloud(history, p, new ParticleGenerator(stream, history, arc));
    }

    /**
     * How far before and after a perihelion the history must reach: the active arc's two-body length with
     * 25% and 30 days to spare for the change of the orbit between the osculating epoch and the return.
     */
    private static double[] margins(StreamDefinition stream, trailcross.orbit.Elements el) {
        EjectionSettings ej = stream.ejection();
        double before;
        double after;
        if (ej.hasProductionTable()) {
            double[] days = ej.productionTableDays();
            before = Math.max(0, -days[0]);
            after = Math.max(0, days[days.length - 1]);
        } else {
            before = ActiveArc.twoBodyDays(el, ej.activeInboundAu());
            after = ActiveArc.twoBodyDays(el, ej.activeOutboundAu());
        }
        return new double[] {1.25 * before + 30, 1.25 * after + 30};
    }
}
