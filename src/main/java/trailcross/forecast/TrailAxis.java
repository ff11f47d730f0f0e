package trailcross.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import trailcross.dynamics.Perihelion;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.ParticleGenerator;
import trailcross.encounter.AxisMeeting;
import trailcross.encounter.Encounter;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;

/**
 * A return's trail axis in the published dust-trail sense (McNaught &amp; Asher 1999; Asher 1999): particles
 * (β = 0) ejected at the perihelion along the parent's velocity, each with its own orbital period
 * P_parent + ΔP0, integrated with the same forces as the cloud ({@link TrailPropagation}). A coarse family
 * of {@value #COARSE} members spans the offsets that reach the forecast years; around each place where the
 * members' node time passes the Earth's time, {@value #FINE} more are added, so that the meeting is
 * interpolated on finely spaced members ({@link AxisMeeting}).
 */
public final class TrailAxis {

    /** Members of the coarse family. */
    public static final int COARSE = 48;
    /** Members added about each meeting. */
    public static final int FINE = 16;
    /** At most this many meetings refined per family. */
    private static final int MAX_REFINED = 8;

    private TrailAxis() {
    }

    /**
     * @param p the return
     * @param lo the least period offset, days
     * @param hi the greatest
     * @param ephemeris the planets
     * @param windowStart crossings from here, TDB days since J2000
     * @param windowEnd to here
     * @param years the forecast years' bounds (start of the first, then the start of each following year)
     * @param threads worker threads
     * @return the family's crossings in the window (initial period = P_parent + ΔP0; id = member)
     */
    public static List<NodeCrossing> compute(Perihelion p, double lo, double hi, Ephemeris ephemeris, double windowStart,
            double windowEnd, double[] years, int threads) {
        List<Double> offsets = new ArrayList<>();
        for (int k = 0; k < COARSE; k++) {
            offsets.add(lo + (hi - lo) * k / (COARSE - 1));
        }
        List<NodeCrossing> coarse = propagate(p, offsets, 0, ephemeris, windowStart, windowEnd, threads);
        double spacing = (hi - lo) / (COARSE - 1);
        double parent = parentPeriod(p);
        TreeSet<Double> fine = new TreeSet<>();
        int refined = 0;
        for (int y = 0; y + 1 < years.length; y++) {
            List<AxisMeeting.Point> pts = points(coarse, parent, ephemeris, years[y], years[y + 1]);
            pts.sort(java.util.Comparator.comparingDouble(AxisMeeting.Point::offsetDays));
            for (int k = 0; k + 1 < pts.size() && refined < MAX_REFINED; k++) {
                double g0 = pts.get(k).nodeT() - pts.get(k).earthT();
                double g1 = pts.get(k + 1).nodeT() - pts.get(k + 1).earthT();
                double x0 = pts.get(k).offsetDays();
                double x1 = pts.get(k + 1).offsetDays();
                if (g0 * g1 <= 0 && x1 - x0 < 1.5 * spacing) {
                    refined++;
                    for (int j = 1; j <= FINE; j++) {
                        fine.add(x0 - 0.5 * spacing + (x1 - x0 + spacing) * j / (FINE + 1));
                    }
                }
            }
        }
        List<NodeCrossing> all = new ArrayList<>(coarse);
        if (!fine.isEmpty()) {
            all.addAll(propagate(p, new ArrayList<>(fine), COARSE, ephemeris, windowStart, windowEnd, threads));
        }
        return all;
    }

    /**
     * @param p the return
     * @return the parent's period at the perihelion (β = 0), days
     */
    public static double parentPeriod(Perihelion p) {
        return ParticleGenerator.periodAtEjection(p.state(), 0);
    }

    /**
     * One point per member: of its crossings, the one nearest the Earth's passage inside the year.
     *
     * @param crossings the family's crossings
     * @param parentPeriod the parent's period at the perihelion, days
     * @param ephemeris the planets
     * @param from the year's start, TDB days since J2000
     * @param to its end
     * @return the points
     */
    public static List<AxisMeeting.Point> points(List<NodeCrossing> crossings, double parentPeriod, Ephemeris ephemeris,
            double from, double to) {
        java.util.Map<Long, AxisMeeting.Point> best = new java.util.TreeMap<>();
        for (NodeCrossing c : crossings) {
            Encounter e = Encounter.of(c, ephemeris, from, to);
            AxisMeeting.Point q = new AxisMeeting.Point(c.initialPeriod() - parentPeriod, c.t(), e.earthT(), e.deltaR(),
                    e.solarLongitudeDeg());
            AxisMeeting.Point old = best.get(c.id());
            if (old == null || Math.abs(q.nodeT() - q.earthT()) < Math.abs(old.nodeT() - old.earthT())) {
                best.put(c.id(), q);
            }
        }
        return new ArrayList<>(best.values());
    }

    /**
     * A root whose spline and linear interpolations differ by more than this is not resolved by the family,
     * minutes: measured on the 1767 Leonid trail in 2002, a scattered stretch of the family (node time moving
     * 200 days per day of offset) gave a spurious root 0.00004 au from the
     * Earth's path with 85 minutes between the two interpolations, while the trail's real meeting (resolved to
     * 0.1 min) lay 0.00012 au away.
     */
    public static final double RESOLVED_MIN = 30;

    /**
     * The Earth's meeting with the axis in one year: of the family's roots ({@link AxisMeeting}, members
     * farther apart than three coarse spacings not joined) whose peak lies in the year and whose node lies in
     * the band searched, the one nearest the Earth's path among those the family resolves ({@link
     * #RESOLVED_MIN}), or, when it resolves none, the nearest.
     *
     * @param axis the family's crossings ({@link #compute})
     * @param parentPeriod the parent's period at the perihelion, days ({@link #parentPeriod})
     * @param ephemeris the planets
     * @param from the year's start, TDB days since J2000
     * @param to its end
     * @return the meeting, or null when the axis does not meet the Earth's path in the year
     */
    public static AxisMeeting.Root meeting(List<NodeCrossing> axis, double parentPeriod, Ephemeris ephemeris, double from,
            double to) {
        double gap = 3 * coarseSpacing(axis, parentPeriod);
        return choose(AxisMeeting.of(points(axis, parentPeriod, ephemeris, from, to), gap), from, to);
    }

    /**
     * @param roots a family's roots, nearest the Earth's path first ({@link AxisMeeting#of})
     * @param from the year's start, TDB days since J2000
     * @param to its end
     * @return the meeting {@link #meeting} describes, or null
     */
    static AxisMeeting.Root choose(List<AxisMeeting.Root> roots, double from, double to) {
        List<AxisMeeting.Root> in = roots.stream().filter(r -> r.peakT() >= from && r.peakT() < to)
                .filter(r -> Math.abs(r.deltaR()) < TrailPropagation.R_MAX - 1).toList();
        return in.stream().filter(r -> r.sigmaMin() <= RESOLVED_MIN).findFirst().orElse(in.isEmpty() ? null : in.get(0));
    }

    /** The coarse family's spacing in the period offset, days (1 when the family is empty). */
    private static double coarseSpacing(List<NodeCrossing> axis, double parentPeriod) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (NodeCrossing c : axis) {
            if (c.id() < COARSE) {
                lo = Math.min(lo, c.initialPeriod() - parentPeriod);
                hi = Math.max(hi, c.initialPeriod() - parentPeriod);
            }
        }
        return hi > lo ? (hi - lo) / (COARSE - 1) : 1;
    }

    private static List<NodeCrossing> propagate(Perihelion p, List<Double> offsets, long firstId, Ephemeris ephemeris,
            double windowStart, double windowEnd, int threads) {
        double[] s = p.state();
        double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
        double v = Math.sqrt(s[3] * s[3] + s[4] * s[4] + s[5] * s[5]);
        double mu = Body.SUN.gm();
        double parent = parentPeriod(p);
        List<Meteoroid> family = new ArrayList<>();
        for (int k = 0; k < offsets.size(); k++) {
            double period = parent + offsets.get(k);
            double a = Math.cbrt(mu * Math.pow(period / (2 * Math.PI), 2));
            double speed = Math.sqrt(mu * (2 / r - 1 / a));
            double[] st = {s[0], s[1], s[2], s[3] * speed / v, s[4] * speed / v, s[5] * speed / v};
            family.add(new Meteoroid(firstId + k, p.t(), p.t(), st, 0, 0, 0, Double.NaN, (speed - v) / ParticleGenerator.M_S_TO_AU_D));
        }
        return TrailPropagation.run(family, ephemeris, windowStart, windowEnd, threads, null).crossings();
    }
}
