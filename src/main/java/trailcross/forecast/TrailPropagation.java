package trailcross.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.LongConsumer;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.Outcome;
import trailcross.dynamics.Propagator;
import trailcross.dynamics.TestParticle;
import trailcross.ejection.Meteoroid;
import trailcross.encounter.CrossingFinder;
import trailcross.encounter.EarthOrbit;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Ephemeris;
import trailcross.orbit.Elements;

/**
 * Carries a meteoroid cloud from its ejection to the end of a target window with the full force model
 * ({@link Propagator}, all threads) and collects every particle's node crossings in the window from the
 * integrator's dense output ({@link CrossingFinder}); the plane is the Earth's orbital plane at the
 * window's middle, the band of distances 0.9–1.1 au.
 */
public final class TrailPropagation {

    /**
     * IAS15 ε for meteoroids. Measured on the standard propagation workload (`bench propagate --particles 2000`,
     * Halley-type particles over a century, against the independent reference): ε = 1e-8 ends with a median
     * error of 1.3e-11 au (max 1.0e-9), ε = 1e-7 4.2e-11 (max 1.2e-9), ε = 5e-7 2.8e-10 (max 4.9e-7) and
     * ε = 1e-6 1.4e-9 au (max 4.7e-6, one particle through a close planetary encounter) with 1.87 times the
     * throughput of 1e-8; on a forecast's clouds 1e-6 takes 2.4 times fewer steps. Trail cores are a few
     * 1e-4 au wide and delta r is read to 1e-5 au, so the forecast's own integration runs at 1e-6; the
     * integrator itself is checked at its tighter settings.
     */
    public static final double EPSILON = 1e-6;
    /** Least and greatest heliocentric distance of a kept crossing, au. */
    public static final double R_MIN = 0.9;
    /** See {@link #R_MIN}. */
    public static final double R_MAX = 1.1;

    private TrailPropagation() {
    }

    /**
     * The result.
     *
     * @param crossings every crossing in the window, by particle id
     * @param outcomes how each particle's propagation ended
     */
    public record Result(List<NodeCrossing> crossings, List<Outcome> outcomes) {
    }

    /**
     * @param cloud the particles (each at its ejection)
     * @param ephemeris the planets
     * @param windowStart first instant of the window, TDB days since J2000
     * @param windowEnd last instant
     * @param threads worker threads
     * @param progress called with the particles done so far, or null
     * @return the crossings and outcomes
     */
    public static Result run(List<Meteoroid> cloud, Ephemeris ephemeris, double windowStart, double windowEnd,
            int threads, LongConsumer progress) {
        return run(cloud, new ForceModelFactory(ephemeris, true, true), ephemeris, windowStart, windowEnd, threads,
                progress);
    }

    /**
     * @param cloud the particles (each at its ejection)
     * @param forces the force model
     * @param ephemeris the planets (the Earth's plane)
     * @param windowStart first instant of the window, TDB days since J2000
     * @param windowEnd last instant
     * @param threads worker threads
     * @param progress called with the particles done so far, or null
     * @return the crossings and outcomes
     */
    public static Result run(List<Meteoroid> cloud, ForceModelFactory forces, Ephemeris ephemeris, double windowStart,
            double windowEnd, int threads, LongConsumer progress) {
        if (cloud.isEmpty()) {
            throw new IllegalArgumentException("no particles to propagate");
        }
        for (Meteoroid m : cloud) {
            if (m.t() > windowEnd) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                        "particle %d is ejected at JD %.2f TDB, after the window's end", m.id(), m.t() + 2451545));
            }
        }
        ephemeris.checkSpan(windowEnd);
        double[] normal = normal(EarthOrbit.at(ephemeris, 0.5 * (windowStart + windowEnd)));
        ConcurrentHashMap<Long, CrossingFinder> finders = new ConcurrentHashMap<>();
        ConcurrentHashMap<Long, Meteoroid> byId = new ConcurrentHashMap<>();
        List<TestParticle> particles = new ArrayList<>(cloud.size());
        for (Meteoroid m : cloud) {
            if (byId.put(m.id(), m) != null) {
                throw new IllegalArgumentException("particle id " + m.id() + " appears twice");
            }
            particles.add(m.toTestParticle());
        }
        Propagator prop = new Propagator(forces, EPSILON, 1e4, threads);
        List<Outcome> outcomes = prop.propagate(particles, windowEnd, p -> {
            Meteoroid m = byId.get(p.id());
            double p0 = trailcross.ejection.ParticleGenerator.periodAtEjection(m.state(), m.beta());
            CrossingFinder f = new CrossingFinder(normal, windowStart, windowEnd, R_MIN, R_MAX, m.id(), m.returnT(),
                    m.weight(), m.massKg(), p0);
            finders.put(p.id(), f);
            return f;
        }, progress);
        List<NodeCrossing> crossings = new ArrayList<>();
        for (Meteoroid m : cloud) {
            crossings.addAll(finders.get(m.id()).crossings());
        }
        return new Result(crossings, outcomes);
    }

    private static double[] normal(Elements earth) {
        double[] pq = earth.axes();
        return new double[] {pq[1] * pq[5] - pq[2] * pq[4], pq[2] * pq[3] - pq[0] * pq[5], pq[0] * pq[4] - pq[1] * pq[3]};
    }
}
