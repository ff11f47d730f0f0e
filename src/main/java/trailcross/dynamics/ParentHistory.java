package trailcross.dynamics;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;
import trailcross.stream.ParentBody;

/**
 * The parent's orbit through time: its osculating state at the epoch integrated backward and forward
 * with the full force model (non-gravitational terms included) by {@link GaussRadau15}; every step's
 * dense output is kept so that the state at any instant of the span costs a polynomial evaluation, and
 * the perihelion passages are the roots of r·v found on it (Brent's method, Hipparchus).
 */
public final class ParentHistory {

    private final List<DenseStep> steps;
    private final List<Perihelion> perihelia;
    private final double first;
    private final double last;

    private ParentHistory(List<DenseStep> steps, List<Perihelion> perihelia, double first, double last) {
        this.steps = steps;
        this.perihelia = perihelia;
        this.first = first;
        this.last = last;
    }

    /**
     * Integrates a parent over [from, to] (TDB days since J2000; the epoch may lie anywhere in it).
     *
     * @param parent the parent body
     * @param forces the force model factory
     * @param epsilon the integrator's ε
     * @param from first instant
     * @param to last instant
     * @return the history
     * @throws IllegalArgumentException when the parent stops early (enters the Sun, hits a body, escapes)
     */
    public static ParentHistory compute(ParentBody parent, ForceModelFactory forces, double epsilon, double from,
            double to) {
        double epoch = parent.epoch().daysSinceJ2000();
        double[] s0 = parent.elements().stateAt(parent.epoch().jd()).toArray();
        List<DenseStep> steps = new ArrayList<>();
        GaussRadau15 gr = new GaussRadau15(epsilon, 1e5);
        for (double end : new double[] {Math.min(from, epoch), Math.max(to, epoch)}) {
            if (end == epoch) {
                continue;
            }
            ForceModel f = forces.create(0, parent.a1(), parent.a2(), parent.a3());
            Outcome o = gr.integrate(f, epoch, s0, end, step -> steps.add(step.copy()));
            if (o.status() != Outcome.Status.DONE) {
                throw stopped(parent.name(), o);
            }
        }
        steps.sort(Comparator.comparingDouble(s -> Math.min(s.start(), s.end())));
        List<Perihelion> perihelia = new ArrayList<>();
        BrentSolver solver = new BrentSolver(1e-10);
        double[] s = new double[6];
        for (DenseStep step : steps) {
            double a = Math.min(step.start(), step.end());
            double b = Math.max(step.start(), step.end());
            double fa = radialVelocity(step, a, s);
            double fb = radialVelocity(step, b, s);
            if (fa < 0 && fb >= 0) {
                double t = solver.solve(100, x -> radialVelocity(step, x, new double[6]), a, b);
                double[] state = new double[6];
                step.state(t, state);
                Elements el = Elements.of(StateVector.of(state), t + 2451545.0, Body.SUN.gm());
                perihelia.add(new Perihelion(t, state, el));
            }
        }
        return new ParentHistory(steps, perihelia, Math.min(from, epoch), Math.max(to, epoch));
    }

    private static double radialVelocity(DenseStep step, double t, double[] s) {
        step.state(t, s);
        return s[0] * s[3] + s[1] * s[4] + s[2] * s[5];
    }

    /**
     * A parent whose own orbit cannot be followed over the span, said in one line a user can act on: which
     * body, when (TDB), how far from the Sun, and what to do.
     *
     * @param name the parent
     * @param o how its integration ended
     * @return the error
     */
    static IllegalArgumentException stopped(String name, Outcome o) {
        double[] x = o.state();
        double r = Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2]);
        String when = trailcross.time.EpochFormat.tdb(trailcross.time.Epoch.ofDaysSinceJ2000(o.t()), 0);
        String what = switch (o.status()) {
            case HIT_SUN -> String.format(java.util.Locale.ROOT, "enters the Sun on %s (%.2e au from its centre)", when, r);
            case HIT_BODY -> String.format(java.util.Locale.ROOT, "hits %s on %s (%.4f au from the Sun)",
                    o.detail().isEmpty() ? "a planet" : o.detail(), when, r);
            case ESCAPED -> String.format(java.util.Locale.ROOT, "escapes the solar system on %s (%.0f au from the Sun)",
                    when, r);
            default -> String.format(java.util.Locale.ROOT, "cannot be integrated past %s (%s, %.4f au from the Sun)",
                    when, o.status(), r);
        };
        return new IllegalArgumentException(name + ": the parent's own orbit " + what
                + "; choose a span (--since, --year) that stays clear of it, or check the orbit's elements");
    }

    /**
     * Hands every stored step of the parent's integration, in time order, to a step handler (e.g. to find
     * the parent's closest approach to a target on its own dense output).
     *
     * @param handler the handler
     */
    public void replay(StepHandler handler) {
        for (DenseStep step : steps) {
            handler.handle(step);
        }
    }

    /** @return the perihelion passages found, in time order */
    public List<Perihelion> perihelia() {
        return List.copyOf(perihelia);
    }

    /** @return the first instant covered */
    public double first() {
        return first;
    }

    /** @return the last instant covered */
    public double last() {
        return last;
    }

    /**
     * The parent's heliocentric state at any instant of the span, from the dense output.
     *
     * @param t TDB days since J2000
     * @param out receives x, y, z, vx, vy, vz
     */
    public void stateAt(double t, double[] out) {
        if (t < first || t > last) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "JD %.3f TDB is outside the parent's integrated span (JD %.1f .. %.1f)", t + 2451545,
                    first + 2451545, last + 2451545));
        }
        int lo = 0;
        int hi = steps.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            DenseStep st = steps.get(mid);
            if (Math.min(st.start(), st.end()) <= t) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        steps.get(lo).state(t, out);
    }
}
