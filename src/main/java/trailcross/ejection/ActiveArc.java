package trailcross.ejection;

import org.hipparchus.analysis.solvers.BrentSolver;
import trailcross.dynamics.ParentHistory;
import trailcross.orbit.Elements;
import trailcross.stream.EjectionSettings;

/**
 * The part of one return during which the parent sheds meteoroids: from the instant its heliocentric
 * distance falls below the inbound limit to the instant it rises above the outbound limit (or the span of
 * the stream's production table, which then replaces the limits). The instants are roots of r(t) − limit on
 * the parent's integrated history (Brent's method, Hipparchus), bracketed by a two-body estimate; an orbit
 * whose aphelion lies inside a limit is active to its aphelion on that side.
 *
 * @param perihelion the return's perihelion, TDB days since J2000
 * @param start first instant of activity
 * @param end last instant of activity
 */
public record ActiveArc(double perihelion, double start, double end) {

    /**
     * @param history the parent's history (must cover the arc)
     * @param perihelion the return's perihelion time, TDB days since J2000
     * @param elements the osculating elements at that perihelion
     * @param ejection the stream's ejection settings
     * @return the arc
     * @throws IllegalArgumentException when the arc is empty or leaves the history's span
     */
    public static ActiveArc find(ParentHistory history, double perihelion, Elements elements,
            EjectionSettings ejection) {
        double start;
        double end;
        if (ejection.hasProductionTable()) {
            double[] days = ejection.productionTableDays();
            start = perihelion + days[0];
            end = perihelion + days[days.length - 1];
        } else {
            start = edge(history, perihelion, elements, ejection.activeInboundAu(), -1);
            end = edge(history, perihelion, elements, ejection.activeOutboundAu(), +1);
        }
        if (!(end > start)) {
            throw new IllegalArgumentException("empty active arc: the parent never comes inside the activity limits");
        }
        if (start < history.first() || end > history.last()) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "the active arc (JD %.1f .. %.1f TDB) leaves the parent's integrated span", start + 2451545,
                    end + 2451545));
        }
        return new ActiveArc(perihelion, start, end);
    }

    /**
     * The two-body time from perihelion to the distance r on one leg.
     *
     * @param el the elements
     * @param r a distance, au
     * @return days (≥ 0); 0 when r ≤ q; half the period when r is beyond the aphelion
     */
    public static double twoBodyDays(Elements el, double r) {
        double q = el.q();
        double e = el.e();
        if (r <= q) {
            return 0;
        }
        if (e < 1) {
            double a = el.a();
            if (r >= a * (1 + e)) {
                return el.period() / 2;
            }
            double cosE = (1 - r / a) / e;
            double ecc = Math.acos(Math.max(-1, Math.min(1, cosE)));
            return (ecc - e * Math.sin(ecc)) / el.meanMotion();
        }
        if (e > 1) {
            double a = el.a();
            double coshH = (1 - r / a) / e;
            double h = Math.log(coshH + Math.sqrt(coshH * coshH - 1));
            return (e * Math.sinh(h) - h) / el.meanMotion();
        }
        double d = Math.sqrt(r / q - 1);
        return Math.sqrt(2 * q * q * q / el.gm()) * (d + d * d * d / 3);
    }

    private static double edge(ParentHistory history, double perihelion, Elements el, double limit, int sign) {
        double[] s = new double[6];
        if (distance(history, perihelion, s) >= limit) {
            return perihelion;
        }
        double est = twoBodyDays(el, limit);
        if (el.e() < 1 && est >= el.period() / 2) {
            return perihelion + sign * el.period() / 2;
        }
        // Walk outwards in steps of an eighth of the estimate until r passes the limit, then refine.
        double h = Math.max(est / 8, 0.01);
        double inner = perihelion;
        for (int k = 1; k <= 64; k++) {
            double outer = perihelion + sign * h * k;
            if (outer < history.first() || outer > history.last()) {
                break;
            }
            if (distance(history, outer, s) >= limit) {
                double lo = Math.min(inner, outer);
                double hi = Math.max(inner, outer);
                return new BrentSolver(1e-9).solve(200, t -> distance(history, t, new double[6]) - limit, lo, hi);
            }
            inner = outer;
        }
        throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                "the parent does not reach %.3f au within the integrated span around its perihelion of JD %.1f TDB",
                limit, perihelion + 2451545));
    }

    private static double distance(ParentHistory history, double t, double[] s) {
        history.stateAt(t, s);
        return Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
    }

    /** @return the arc's length, days */
    public double days() {
        return end - start;
    }
}
