package trailcross.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import trailcross.ejection.ImportanceWeights;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.ParticleGenerator;
import trailcross.ejection.EjectionFocus;
import trailcross.encounter.Encounter;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Ephemeris;

/**
 * Targeted ejection, adaptive importance sampling in the period at ejection P0 (Cappé et al. 2004,
 * population Monte Carlo; Cornuet et al. 2012, AMIS): a pilot cloud drawn from the stream's own ejection
 * law ({@value #PILOT_SHARE} of the particles) shows which periods put a particle at its node near the Earth
 * in the forecast years (its node passage within a window of the Earth's passage of the same longitude);
 * a second stage ({@value #SECOND_SHARE}) is drawn from a proposal concentrated there
 * ({@link EjectionFocus#learn}, bandwidth widened to explore), and the main stage (the rest) from a proposal
 * learned again on both earlier stages with a narrower window. When no pilot particle comes near yet, the
 * period that would is extrapolated from the pilot's node times (least squares) and aimed at. Every stage's
 * particles are kept and weighted by the balance heuristic ({@link ImportanceWeights}), so every weighted
 * sum stays an unbiased estimate of the plain cloud's.
 */
public final class TargetedEjection {

    /** Share of the particles in the pilot stage (the prior). */
    public static final double PILOT_SHARE = 0.2;
    /** Share in the second stage. */
    public static final double SECOND_SHARE = 0.2;
    /** First prior draws per size bin for a proposal's normalising constant (more follow until it is within 1%). */
    public static final int Z_DRAWS = 200_000;
    /** Share of a proposal's particles meant to come from its defensive floor. */
    public static final double DEFENSIVE_SHARE = 0.1;
    /** Learning windows, days: the second stage's, then the main stage's (each doubled until enough hits). */
    private static final double[] WINDOWS = {30, 10};
    /** Hits (distinct particles) wanted in a learning window before it stops widening. */
    private static final int[] ENOUGH_HITS = {5, 20};
    /** Bandwidth factors of the second and main stages' proposals. */
    private static final double[] WIDEN = {2.0, 1.2};
    private static final double MAX_WINDOW = 160;

    /**
     * A cloud's crossings with their final weights.
     *
     * @param crossings every crossing in the window, weights = real meteoroids (importance included)
     * @param encounters their encounter quantities inside the span, in the same order
     * @param weights the stages
     * @param hitPeriods the periods at ejection of the particles that came near the Earth
     * @param description one line for the log
     */
    public record Cloud(List<NodeCrossing> crossings, List<Encounter> encounters, ImportanceWeights weights, double[] hitPeriods, String description) {

        /**
         * The period offsets the trail's axis should span: the central 90% of those of the particles that came
         * near the Earth (a rare particle many revolutions off does not stretch the family), widened by half
         * their range on each side (at least 2 days), else those of every crossing.
         *
         * @param parentPeriod the parent's period at the return, days
         * @return least and greatest offset, days
         */
        public double[] periodRange(double parentPeriod) {
            double[] p = hitPeriods.length >= 3 ? hitPeriods
                    : crossings.stream().mapToDouble(NodeCrossing::initialPeriod).filter(Double::isFinite).toArray();
            if (p.length < 2) {
                return new double[] {-0.02 * parentPeriod, 0.02 * parentPeriod};
            }
            double[] sorted = p.clone();
            java.util.Arrays.sort(sorted);
            double lo = sorted[(int) Math.floor(0.05 * (sorted.length - 1))] - parentPeriod;
            double hi = sorted[(int) Math.ceil(0.95 * (sorted.length - 1))] - parentPeriod;
            double pad = Math.max(2, 0.5 * (hi - lo));
            return new double[] {lo - pad, hi + pad};
        }
    }

    private TargetedEjection() {
    }

    /**
     * @param gen the return's generator
     * @param ephemeris the planets
     * @param windowStart crossings from here, TDB days since J2000
     * @param windowEnd to here
     * @param spanStart the forecast span's start (the Earth's passages inside the span count)
     * @param spanEnd its end
     * @param n particles in all
     * @param seed the trail's seed
     * @param targeted false: one plain stage of n particles
     * @param threads worker threads
     * @param progress where the propagation reports
     * @param label the progress label
     * @return the weighted crossings
     */
    public static Cloud run(ParticleGenerator gen, Ephemeris ephemeris, double windowStart, double windowEnd,
            double spanStart, double spanEnd, int n, long seed, boolean targeted, int threads, Progress progress,
            String label) {
        return run(gen, new trailcross.dynamics.ForceModelFactory(ephemeris, true, true), ephemeris, windowStart,
                windowEnd, spanStart, spanEnd, n, seed, targeted, threads, progress, label);
    }

    /**
     * @param gen the return's generator
     * @param forces the force model
     * @param ephemeris the planets
     * @param windowStart crossings from here, TDB days since J2000
     * @param windowEnd to here
     * @param spanStart the forecast span's start (the Earth's passages inside the span count)
     * @param spanEnd its end
     * @param n particles in all
     * @param seed the trail's seed
     * @param targeted false: one plain stage of n particles
     * @param threads worker threads
     * @param progress where the propagation reports
     * @param label the progress label
     * @return the weighted crossings
     */
    public static Cloud run(ParticleGenerator gen, trailcross.dynamics.ForceModelFactory forces, Ephemeris ephemeris,
            double windowStart, double windowEnd,
            double spanStart, double spanEnd, int n, long seed, boolean targeted, int threads, Progress progress,
            String label) {
        return run(gen, forces, ephemeris, windowStart, windowEnd, spanStart, spanEnd, n, seed, targeted, threads,
                progress, label, CloudEngine.LOCAL, null);
    }

    /**
     * As {@link #run(ParticleGenerator, trailcross.dynamics.ForceModelFactory, Ephemeris, double, double, double,
     * double, int, long, boolean, int, Progress, String)}, each stage run by an engine (on this machine with the
     * given forces when it is {@link CloudEngine#LOCAL}; elsewhere with the full force model, the generator
     * rebuilt from the recipe).
     *
     * @param gen the return's generator
     * @param forces the force model (local engine)
     * @param ephemeris the planets
     * @param windowStart crossings from here, TDB days since J2000
     * @param windowEnd to here
     * @param spanStart the forecast span's start
     * @param spanEnd its end
     * @param n particles in all
     * @param seed the trail's seed
     * @param targeted false: one plain stage of n particles
     * @param threads worker threads
     * @param progress where the propagation reports
     * @param label the progress label
     * @param engine where the stages run
     * @param recipe how another machine rebuilds the generator (null with the local engine)
     * @return the weighted crossings
     */
    public static Cloud run(ParticleGenerator gen, trailcross.dynamics.ForceModelFactory forces, Ephemeris ephemeris,
            double windowStart, double windowEnd, double spanStart, double spanEnd, int n, long seed, boolean targeted,
            int threads, Progress progress, String label, CloudEngine engine, ReturnRecipe recipe) {
        ImportanceWeights weights = new ImportanceWeights(gen);
        List<NodeCrossing> raw = new ArrayList<>();
        List<Encounter> enc = new ArrayList<>();
        int[] sizes = targeted ? new int[] {(int) (n * PILOT_SHARE), (int) (n * SECOND_SHARE), 0} : new int[] {n};
        if (targeted) {
            sizes[2] = n - sizes[0] - sizes[1];
        }
        List<Meteoroid> prior = null;
        Map<Long, EjectionFocus.Features> features = new java.util.HashMap<>();
        StringBuilder what = new StringBuilder(targeted ? "targeted" : "plain");
        try (Progress.Stage stage = progress.open(label, n)) {
            long first = 0;
            for (int k = 0; k < sizes.length; k++) {
                EjectionFocus focus = k == 0 ? EjectionFocus.PRIOR : learn(enc, weights, prior, features, k - 1);
                double[] allocation = k == 0 ? null : allocation(gen, enc);
                long stageSeed = k == 0 ? seed : seed + 7_919_000_003L * k;
                boolean local = engine == CloudEngine.LOCAL;
                // The local engine ejects here; elsewhere only the pilot is ejected here too (cheap, the prior
                // keeps every candidate), for the defensive floor of the later proposals.
                List<Meteoroid> cloud = local || (k == 0 && targeted)
                        ? gen.generate(sizes[k], stageSeed, false, threads, focus, first, allocation) : null;
                // Weights and the next proposal need each particle's conditions at ejection; a remote stage's
                // particles are drawn again here (cheap next to their integration, and bit for bit the same).
                if (targeted) {
                    List<Meteoroid> drawn = cloud != null ? cloud
                            : gen.generate(sizes[k], stageSeed, false, threads, focus, first, allocation);
                    for (Meteoroid m : drawn) {
                        features.put(m.id(), EjectionFocus.Features.of(m.state(), m.beta()));
                    }
                }
                double[] z = gen.meanAcceptance(focus, Z_DRAWS, stageSeed ^ 0x5DEECE66DL);
                weights.add(new ImportanceWeights.Stage(focus, first, sizes[k], z, allocation));
                if (k == 0) {
                    prior = cloud;
                }
                if (!focus.isPrior()) {
                    what.append(String.format(Locale.ROOT, ", stage %d %s Z %.4f", k + 1, focus, mean(z)));
                }
                long done = first;
                List<NodeCrossing> c = local
                        ? TrailPropagation.run(cloud, forces, ephemeris, windowStart, windowEnd, threads,
                                d -> stage.accept(done + d)).crossings()
                        : engine.run(new CloudEngine.Stage(recipe, sizes[k], stageSeed, focus, first, allocation,
                                windowStart, windowEnd), gen, ephemeris, threads, d -> stage.accept(done + d));
                raw.addAll(c);
                for (NodeCrossing x : c) {
                    enc.add(Encounter.of(x, ephemeris, spanStart, spanEnd));
                }
                first += sizes[k];
            }
        }
        // The final weights, over all stages; the encounter quantities already found do not depend on them.
        List<NodeCrossing> out = new ArrayList<>(raw.size());
        List<Encounter> weighted = new ArrayList<>(raw.size());
        for (int i = 0; i < raw.size(); i++) {
            NodeCrossing c = raw.get(i);
            double weight = targeted ? weights.weight(c.id(), features.get(c.id()))
                    : weights.weight(c.id(), new EjectionFocus.Features(c.initialPeriod(), Double.NaN, Double.NaN, 0));
            NodeCrossing w = new NodeCrossing(c.id(), c.returnT(), weight, c.massKg(),
                    c.initialPeriod(), c.t(), c.state(), c.ascending());
            Encounter e = enc.get(i);
            out.add(w);
            weighted.add(new Encounter(w, e.earthT(), e.deltaR(), e.solarLongitudeDeg(), e.daysAfterEarth(), e.radiant()));
        }
        return new Cloud(out, weighted, weights, hits(enc, WINDOWS[WINDOWS.length - 1], 3), what.toString());
    }

    /** Least share of a later stage's particles in any size bin. */
    public static final double MIN_BIN_SHARE = 0.03;

    /**
     * The later stages' shares of the size bins: in proportion to the bins' numbers of meteoroids bright
     * enough to be seen (heavier than the +6.5-mag mass at the pilot's median Vg), since the ZHR is a sum
     * over those (proportional allocation), each bin keeping at least {@value #MIN_BIN_SHARE} (the large,
     * tightly grouped grains time the trail).
     */
    private static double[] allocation(ParticleGenerator gen, List<Encounter> enc) {
        if (!gen.stratified() || enc.isEmpty()) {
            return null;
        }
        double[] vg = enc.stream().mapToDouble(e -> e.radiant().vgKmS()).sorted().toArray();
        return allocation(gen, trailcross.encounter.TrailEncounter.massLimitKg(vg[vg.length / 2]));
    }

    /**
     * The size bins' shares in proportion to their numbers of meteoroids above a mass, each at least
     * {@value #MIN_BIN_SHARE}.
     *
     * @param gen the generator (stratified sizes)
     * @param limit the mass, kg
     * @return the shares, or null when no bin has meteoroids above it
     */
    static double[] allocation(ParticleGenerator gen, double limit) {
        int bins = gen.sizes().bins();
        double[] f = new double[bins];
        double total = 0;
        for (int k = 0; k < bins; k++) {
            f[k] = gen.sizes().numberFractionAbove(k, limit);
            total += f[k];
        }
        if (!(total > 0)) {
            return null;
        }
        double[] share = new double[bins];
        double free = 1 - MIN_BIN_SHARE * bins;
        for (int k = 0; k < bins; k++) {
            share[k] = MIN_BIN_SHARE + free * f[k] / total;
        }
        return share;
    }

    /**
     * The proposal of stage k + 1, learned on the crossings so far: a focus in P0 on the particles whose node
     * passage came near the Earth's, and on the same particles, when it explains their delta r, a
     * {@link EjectionFocus.NodeModel} that aims at the Earth's path.
     */
    private static EjectionFocus learn(List<Encounter> enc, ImportanceWeights weights, List<Meteoroid> prior,
            Map<Long, EjectionFocus.Features> features, int k) {
        Map<Long, double[]> best = nearest(enc);
        if (best.isEmpty()) {
            return EjectionFocus.PRIOR;
        }
        List<Map.Entry<Long, double[]>> hits = near(best, WINDOWS[k], ENOUGH_HITS[k]);
        if (hits.size() >= 3) {
            double[] p = hits.stream().mapToDouble(h -> h.getValue()[1]).toArray();
            double[] w = hits.stream().mapToDouble(h -> weights.importance(h.getKey(), features.get(h.getKey())))
                    .toArray();
            // Silverman's rule of thumb (DensityProfile.bandwidth), widened to explore, at least 0.01 d.
            double h = Math.max(0.01, WIDEN[k] * trailcross.encounter.DensityProfile.bandwidth(p, w));
            // The second stage keeps exploring across delta r (the section's profile and delta r need it); the main
            // stage aims at the Earth's path too, where the intensity and the peak are read.
            EjectionFocus.NodeModel node = k == WINDOWS.length - 1 ? nodeModel(hits, features) : null;
            return withFloor(EjectionFocus.learn(p, w, h, 1e-9).withNode(node), prior,
                    f -> EjectionFocus.learn(p, w, h, f).withNode(node));
        }
        // Nobody near yet: aim where the pilot's node times extrapolate to the Earth's passage.
        SimpleRegression fit = new SimpleRegression();
        for (double[] v : best.values()) {
            if (Double.isFinite(v[1])) {
                fit.addData(v[1], v[0]);
            }
        }
        if (fit.getN() < 5 || !(Math.abs(fit.getSlope()) > 0.1)) {
            return EjectionFocus.PRIOR;
        }
        double centre = -fit.getIntercept() / fit.getSlope();
        double width = Math.max(0.5, 2 * Math.sqrt(fit.getMeanSquareError()) / Math.abs(fit.getSlope()));
        return withFloor(EjectionFocus.around(centre, width, 1e-9), prior, f -> EjectionFocus.around(centre, width, f));
    }

    /** The delta r model of the near particles at the node most of them met the Earth's path at, or null. */
    private static EjectionFocus.NodeModel nodeModel(List<Map.Entry<Long, double[]>> hits,
            Map<Long, EjectionFocus.Features> features) {
        long ascending = hits.stream().filter(h -> h.getValue()[3] > 0).count();
        boolean asc = 2 * ascending > hits.size();
        List<EjectionFocus.Features> x = new ArrayList<>();
        List<Double> dr = new ArrayList<>();
        for (var h : hits) {
            if ((h.getValue()[3] > 0) == asc && Double.isFinite(h.getValue()[2])) {
                x.add(features.get(h.getKey()));
                dr.add(h.getValue()[2]);
            }
        }
        return EjectionFocus.NodeModel.fit(x, dr.stream().mapToDouble(Double::doubleValue).toArray(), asc);
    }

    /**
     * The floor that gives the defensive part about {@link #DEFENSIVE_SHARE} of the proposal's particles:
     * floor = share/(1 − share) × E_p[shape], the shape's prior mean estimated on the pilot (a prior sample).
     */
    static EjectionFocus withFloor(EjectionFocus shape, List<Meteoroid> prior,
            java.util.function.DoubleFunction<EjectionFocus> make) {
        double mean = 0;
        for (Meteoroid m : prior) {
            mean += shape.acceptance(m.state(), m.beta()) / prior.size();
        }
        double floor = Math.min(0.5, Math.max(1e-4, DEFENSIVE_SHARE / (1 - DEFENSIVE_SHARE) * mean));
        return make.apply(floor);
    }

    /**
     * Per particle: its crossing nearest the Earth's passage, as (days after the Earth, P0, delta r, 1 if it
     * crossed northwards else 0).
     */
    private static Map<Long, double[]> nearest(List<Encounter> enc) {
        Map<Long, double[]> best = new java.util.TreeMap<>();
        for (Encounter e : enc) {
            double[] old = best.get(e.crossing().id());
            if (old == null || Math.abs(e.daysAfterEarth()) < Math.abs(old[0])) {
                best.put(e.crossing().id(), new double[] {e.daysAfterEarth(), e.crossing().initialPeriod(), e.deltaR(),
                        e.crossing().ascending() ? 1 : 0});
            }
        }
        return best;
    }

    /**
     * The particles whose crossing came within a window of the Earth's passage, the window doubled (up to
     * {@value #MAX_WINDOW} days) until at least {@code enough} of them did; the last window's when none
     * sufficed.
     */
    private static List<Map.Entry<Long, double[]>> near(Map<Long, double[]> best, double window, int enough) {
        List<Map.Entry<Long, double[]>> hits = new ArrayList<>();
        for (double w = window; w <= MAX_WINDOW; w *= 2) {
            hits.clear();
            for (var e : best.entrySet()) {
                if (Math.abs(e.getValue()[0]) <= w && Double.isFinite(e.getValue()[1])) {
                    hits.add(e);
                }
            }
            if (hits.size() >= enough) {
                break;
            }
        }
        return hits;
    }

    /** The periods at ejection of the particles that came near, or none when fewer than {@code least} did. */
    private static double[] hits(List<Encounter> enc, double window, int least) {
        List<Map.Entry<Long, double[]>> hits = near(nearest(enc), window, least);
        return hits.size() >= least ? hits.stream().mapToDouble(h -> h.getValue()[1]).toArray() : new double[0];
    }

    private static double mean(double[] v) {
        return java.util.Arrays.stream(v).average().orElse(Double.NaN);
    }
}
