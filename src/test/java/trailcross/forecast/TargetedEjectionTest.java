package trailcross.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.ParentHistory;
import trailcross.ejection.ActiveArc;
import trailcross.ejection.ImportanceWeights;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.ParticleGenerator;
import trailcross.ejection.EjectionFocus;
import trailcross.encounter.Encounter;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.orbit.Elements;
import trailcross.stream.DirectionLaw;
import trailcross.stream.EjectionSettings;
import trailcross.stream.ParentBody;
import trailcross.stream.ParticleSettings;
import trailcross.stream.StreamDefinition;
import trailcross.stream.VelocityModel;
import trailcross.time.Epoch;

/**
 * Targeted ejection against plain sampling on a cheap case: an invented short-period orbit (q 0.98 au,
 * e 0.55, P ≈ 3.2 yr) whose ascending node lies near 1 au, the Sun and Jupiter only, meteoroids ejected
 * isotropically at 300 m/s inside 2 au, carried two revolutions on. The quantity is the fraction of the
 * return's meteoroids (by number) whose node passage in the target year falls within 10 days of the
 * Earth's passage of the same longitude. The importance-weighted estimate must agree with plain sampling
 * within their combined statistical error (both are unbiased estimates of the same number); the check is
 * the statistics of the two estimators, computed here, not an outside value.
 */
class TargetedEjectionTest {

    private static final ChebyshevCache EPHEMERIS = (ChebyshevCache) trailcross.ephemeris.Ephemerides.fast(null);
    private static final ForceModelFactory SUN_JUPITER = ForceModelFactory.sunAnd(EPHEMERIS, Body.JUPITER);
    private static final double T = 10958.0;
    private static final double HIT_DAYS = 10;

    private static ParticleGenerator generator() {
        double gm = Body.SUN.gm();
        // Node longitude placed so that the Earth passes it ~15 days after the trail's mean node passage two
        // revolutions on (two-body estimate): the hits lie on the trail's flank, a few per cent of it.
        Elements trial = Elements.ofDegrees(0.98, 0.55, 15.0, 0.0, 10.0, T + 2451545.0, gm);
        double nodeTime = T + 2 * trial.period() - 10 * trial.period() / 360 * 0.3;
        double[] e = new double[3];
        EPHEMERIS.heliocentricPosition(Body.EARTH, nodeTime + 15, e);
        double node = Math.toDegrees(Math.atan2(e[1], e[0])) + 10;
        Elements el = Elements.ofDegrees(0.98, 0.55, 15.0, node, 10.0, T + 2451545.0, gm);
        ParentBody parent = new ParentBody("test parent", Epoch.ofDaysSinceJ2000(T), el, 0, 0, 0, 2.0, 500.0, 100.0, null);
        EjectionSettings ej = new EjectionSettings(VelocityModel.FIXED, 1.0, 300.0, DirectionLaw.ISOTROPIC, 45, 2.0, 2.0,
                2.0, null, null);
        ParticleSettings ps = new ParticleSettings(1e-3, 1e-2, 1000.0, 2.0, 1.0, 3, true);
        StreamDefinition d = new StreamDefinition(Path.of("test.toml"), "test", "", 2.5, parent, ej, ps);
        ParentHistory h = ParentHistory.compute(parent, SUN_JUPITER, 1e-11, T - 400, T + 400);
        return new ParticleGenerator(d, h, ActiveArc.find(h, T, el, ej));
    }

    /** Per size bin: Σ y, Σ y², with y = w h / N (the particle's share of the estimate). */
    private static double[] estimate(TargetedEjection.Cloud c, ParticleGenerator g, double from, double to) {
        return estimate(c, g, from, to, Double.POSITIVE_INFINITY);
    }

    /** As above, counting only crossings within maxDeltaR of the Earth's orbit. */
    private static double[] estimate(TargetedEjection.Cloud c, ParticleGenerator g, double from, double to,
            double maxDeltaR) {
        Map<Long, Boolean> hit = new HashMap<>();
        Map<Long, Double> w = new HashMap<>();
        for (NodeCrossing x : c.crossings()) {
            Encounter e = Encounter.of(x, EPHEMERIS, from, to);
            if (Math.abs(e.daysAfterEarth()) <= HIT_DAYS && Math.abs(e.deltaR()) <= maxDeltaR) {
                hit.put(x.id(), true);
                w.put(x.id(), x.weight());
            }
        }
        ImportanceWeights iw = c.weights();
        int bins = g.sizes().bins();
        double[] sum = new double[bins];
        double[] sum2 = new double[bins];
        int[] n = new int[bins];
        for (ImportanceWeights.Stage s : iw.stages()) {
            for (int k = 0; k < bins; k++) {
                n[k] += g.inBin(k, s.particles(), s.allocation());
            }
        }
        double total = g.realMeteoroids();
        for (Long id : hit.keySet()) {
            int k = iw.bin(id);
            double y = w.get(id) / total;
            sum[k] += y;
            sum2[k] += y * y;
        }
        double f = 0;
        double var = 0;
        for (int k = 0; k < bins; k++) {
            f += sum[k];
            double mean = sum[k] / n[k];
            var += n[k] * (sum2[k] / n[k] - mean * mean) * n[k] / (n[k] - 1.0);
        }
        return new double[] {f, Math.sqrt(var), hit.size()};
    }

    /** A plain and a targeted cloud of the Sun + Jupiter case, 3000 particles each, over the same two years. */
    private record Pair(ParticleGenerator g, double from, double to, TargetedEjection.Cloud plain,
            TargetedEjection.Cloud targeted) {
    }

    private static Pair pair(long plainSeed, long targetedSeed) {
        ParticleGenerator g = generator();
        double from = ParentReturns.yearStart(ParentReturns.yearOf(T + 2 * 3.2 * 365.25));
        double to = from + 365.25 * 2;
        return new Pair(g, from, to,
                TargetedEjection.run(g, SUN_JUPITER, EPHEMERIS, from - 40, to + 40, from, to, 3000, plainSeed, false, 2,
                        Progress.NONE, "plain"),
                TargetedEjection.run(g, SUN_JUPITER, EPHEMERIS, from - 40, to + 40, from, to, 3000, targetedSeed, true, 2,
                        Progress.NONE, "targeted"));
    }

    @Test
    void weightedFractionNearTheEarthAgreesWithPlainSampling() {
        Pair r = pair(11L, 12L);
        double[] a = estimate(r.plain(), r.g(), r.from(), r.to());
        double[] b = estimate(r.targeted(), r.g(), r.from(), r.to());
        // A case worth the name: plain sampling finds some tens of hits, a few per cent of the cloud.
        assertThat(a[2]).as("plain hits").isBetween(20.0, 1500.0);
        // Targeting puts more particles there and so estimates the same fraction more precisely...
        assertThat(b[2]).as("targeted hits").isGreaterThan(2 * a[2]);
        assertThat(b[1]).isLessThan(a[1]);
        // ... and the two unbiased estimates agree within 3 combined standard errors.
        assertThat(Math.abs(a[0] - b[0])).as("plain %.5f +- %.5f, targeted %.5f +- %.5f", a[0], a[1], b[0], b[1])
                .isLessThan(3 * Math.hypot(a[1], b[1]));
    }

    @Test
    void aFocusOnDeltaRKeepsTheFractionNearAPointUnbiased() {
        // The fraction that crosses near a fixed point: within 10 days of the Earth's passage and within
        // DR of the Earth's orbit. The learned proposals carry a delta r model here (printed in the
        // description), which aims at delta r = 0; the weighted estimate must still agree with plain sampling.
        final double dr = 0.02;
        Pair r = pair(21L, 22L);
        TargetedEjection.Cloud targeted = r.targeted();
        assertThat(targeted.description()).contains("delta r within");
        double[] a = estimate(r.plain(), r.g(), r.from(), r.to(), dr);
        double[] b = estimate(targeted, r.g(), r.from(), r.to(), dr);
        System.out.printf(java.util.Locale.ROOT, "near a point: plain %.5f +- %.5f (%d), targeted %.5f +- %.5f (%d); %s%n",
                a[0], a[1], (int) a[2], b[0], b[1], (int) b[2], targeted.description());
        assertThat(a[2]).as("plain hits").isBetween(10.0, 1500.0);
        assertThat(b[2]).as("targeted hits").isGreaterThan(3 * a[2]);
        assertThat(b[1]).isLessThan(a[1]);
        assertThat(Math.abs(a[0] - b[0])).as("plain %.5f +- %.5f, targeted %.5f +- %.5f", a[0], a[1], b[0], b[1])
                .isLessThan(3 * Math.hypot(a[1], b[1]));
    }

    @Test
    void aProposalEqualToThePriorGivesWeightsOfOne() {
        ParticleGenerator g = generator();
        List<Meteoroid> plain = g.generate(600, 3L, false, 1);
        List<Meteoroid> viaFocus = g.generate(600, 3L, false, 2, EjectionFocus.PRIOR, 0);
        ImportanceWeights w = new ImportanceWeights(g)
                .add(new ImportanceWeights.Stage(EjectionFocus.PRIOR, 0, 300, g.meanAcceptance(EjectionFocus.PRIOR, 10, 1), null))
                .add(new ImportanceWeights.Stage(EjectionFocus.PRIOR, 300, 300, g.meanAcceptance(EjectionFocus.PRIOR, 10, 1), null));
        for (int k = 0; k < plain.size(); k++) {
            Meteoroid m = plain.get(k);
            assertThat(viaFocus.get(k).state()).isEqualTo(m.state());
            assertThat(w.importance(m.id(), EjectionFocus.Features.of(m.state(), m.beta()))).isEqualTo(1.0);
        }
        // A learned focus stays within its floor and 1, and its weights Z/a are bounded by Z/floor.
        double[] p = plain.stream().mapToDouble(m -> ParticleGenerator.periodAtEjection(m.state(), m.beta())).toArray();
        double[] ones = new double[p.length];
        java.util.Arrays.fill(ones, 1.0);
        EjectionFocus f = EjectionFocus.learn(java.util.Arrays.copyOf(p, 50), java.util.Arrays.copyOf(ones, 50), 3.0, 0.05);
        for (double x : p) {
            assertThat(f.periodAcceptance(x)).isBetween(0.05, 1.0);
        }
        assertThat(f.periodAcceptance(Double.POSITIVE_INFINITY)).isEqualTo(0.05);
    }
}
