package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.Outcome;
import trailcross.dynamics.ParentHistory;
import trailcross.dynamics.Perihelion;
import trailcross.dynamics.Propagator;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;
import trailcross.stream.DirectionLaw;
import trailcross.stream.EjectionSettings;
import trailcross.stream.ParentBody;
import trailcross.stream.ParticleSettings;
import trailcross.stream.StreamDefinition;
import trailcross.stream.VelocityModel;
import trailcross.time.Epoch;

/**
 * The particle generator: ejection times against the production law, weights against the dust mass,
 * reproducibility across thread counts, a cold ejection against the parent's own orbit, and the critical β
 * of Burns, Lamy &amp; Soter (1979). The parents are invented test orbits (no check value depends on a
 * real body); the checks are against laws computed here independently.
 */
class ParticleGeneratorTest {

    private static final ChebyshevCache EPHEMERIS = (ChebyshevCache) trailcross.ephemeris.Ephemerides.fast(null);
    private static final ForceModelFactory TWO_BODY = new ForceModelFactory(EPHEMERIS, false, false);
    private static final double GM = Body.SUN.gm();
    /** Perihelion 2030-01-01 TDB, days since J2000. */
    private static final double T = 10958.0;

    private static StreamDefinition stream(Elements el, EjectionSettings ej, ParticleSettings p, Double dust) {
        ParentBody parent = new ParentBody("test parent", Epoch.ofDaysSinceJ2000(T), el, 0, 0, 0, 2.0, 500.0, dust, null);
        return new StreamDefinition(Path.of("test.toml"), "test", "", 2.5, parent, ej, p);
    }

    private static EjectionSettings law(VelocityModel m, double fixed, double inbound, double outbound, double n) {
        return new EjectionSettings(m, 1.0, fixed, DirectionLaw.SUNLIT, 45, inbound, outbound, n, null, null);
    }

    private static Elements halleyType() {
        return Elements.ofDegrees(0.9, 0.8, 30.0, 80.0, 120.0, T + 2451545.0, GM);
    }

    private static ParentHistory twoBodyHistory(StreamDefinition d, double from, double to) {
        return ParentHistory.compute(d.parent(), TWO_BODY, 1e-11, from, to);
    }

    @Test
    void ejectionTimesFollowTheProductionLawAndWeightsCarryTheDustMass() {
        Elements el = halleyType();
        ParticleSettings ps = new ParticleSettings(1e-4, 1e-2, 1000.0, 2.0, 1.0, 5, true);
        StreamDefinition d = stream(el, law(VelocityModel.JONES_1995, 0, 2.5, 2.0, 3.0), ps, 1000.0);
        ParentHistory h = twoBodyHistory(d, T - 500, T + 500);
        ActiveArc arc = ActiveArc.find(h, T, el, d.ejection());
        // The arc's ends lie where the two-body orbit crosses the limits.
        assertThat(el.stateAt(arc.start() + 2451545.0).r()).isCloseTo(2.5, within(1e-8));
        assertThat(el.stateAt(arc.end() + 2451545.0).r()).isCloseTo(2.0, within(1e-8));
        assertThat(arc.start()).isCloseTo(T - ActiveArc.twoBodyDays(el, 2.5), within(1e-6));

        // The production law Q = Q1 r^-3, integrated here from the two-body orbit (Hipparchus Gauss-Legendre).
        int cells = 4000;
        double[] grid = new double[cells + 1];
        double[] cdf = new double[cells + 1];
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(5, 1e-10, 1e-300);
        for (int k = 0; k <= cells; k++) {
            grid[k] = arc.start() + arc.days() * k / cells;
            if (k > 0) {
                cdf[k] = cdf[k - 1] + gl.integrate(100_000, t -> Math.pow(el.stateAt(t + 2451545.0).r(), -3),
                        grid[k - 1], grid[k]);
            }
        }
        double total = cdf[cells];
        ParticleGenerator g = new ParticleGenerator(d, h, arc);
        assertThat(g.production().massKg()).isCloseTo(1000.0 * 86400 * total, within(1e-4 * 1000.0 * 86400 * total));

        List<Meteoroid> cloud = g.generate(100_000, 42L, false, 2);
        double[] u = new double[cloud.size()];
        double mass = 0;
        double number = 0;
        for (int k = 0; k < u.length; k++) {
            Meteoroid m = cloud.get(k);
            assertThat(m.t()).isBetween(arc.start(), arc.end());
            int cell = Math.min(cells - 1, (int) ((m.t() - arc.start()) / arc.days() * cells));
            double f = (m.t() - grid[cell]) / (grid[cell + 1] - grid[cell]);
            u[k] = (cdf[cell] + f * (cdf[cell + 1] - cdf[cell])) / total;
            mass += m.weight() * m.massKg();
            number += m.weight();
        }
        // Kolmogorov-Smirnov (Commons Math) at significance 0.001.
        double p = new KolmogorovSmirnovTest().kolmogorovSmirnovTest(new UniformRealDistribution(0, 1), u);
        assertThat(p).as("KS p-value of the ejection times").isGreaterThan(0.001);
        // The weights: their sum is the number of real meteoroids, M/<m>; sum(w m) estimates M (stratified
        // sampling in 5 bins of a decade's 0.4: the within-bin scatter of m is below 15% per particle, so 1e5
        // particles give M to about 0.1%).
        double dustMass = g.production().massKg();
        assertThat(number).isCloseTo(dustMass / g.sizes().meanMass(), within(1e-9 * number));
        assertThat(mass).isCloseTo(dustMass, within(0.01 * dustMass));
    }

    @Test
    void sameSeedSameCloudOnAnyThreadCount() {
        Elements el = halleyType();
        StreamDefinition d = stream(el, law(VelocityModel.WHIPPLE_1951, 0, 3, 3, 2),
                new ParticleSettings(1e-4, 1e-2, 800.0, 1.8, 1.0, 5, true), 500.0);
        ParentHistory h = twoBodyHistory(d, T - 600, T + 600);
        ParticleGenerator g = new ParticleGenerator(d, h, ActiveArc.find(h, T, el, d.ejection()));
        for (boolean sobol : new boolean[] {false, true}) {
            List<Meteoroid> one = g.generate(10_000, 9L, sobol, 1);
            List<Meteoroid> three = g.generate(10_000, 9L, sobol, 3);
            for (int k = 0; k < one.size(); k++) {
                assertThat(three.get(k).state()).isEqualTo(one.get(k).state());
                assertThat(three.get(k).t()).isEqualTo(one.get(k).t());
                assertThat(three.get(k).massKg()).isEqualTo(one.get(k).massKg());
            }
        }
        assertThat(g.generate(100, 10L, false, 1).get(5).t()).isNotEqualTo(g.generate(100, 9L, false, 1).get(5).t());
    }

    @Test
    void normalisingConstantByShiftedSobolPointsAgreesWithPlainDrawsWithinItsError() {
        // Z = E_p[a] of a narrow proposal in P0 (a Gaussian of 3 days about the prior's median period, as the
        // forecast's main stage learns), by randomised quasi-Monte Carlo against the plain mean of the
        // acceptance over independent prior particles (the definition, Commons Math's WELL generator).
        Elements el = halleyType();
        ParticleSettings ps = new ParticleSettings(1e-4, 1e-2, 1000.0, 2.0, 1.0, 3, true);
        StreamDefinition d = stream(el, law(VelocityModel.JONES_1995, 0, 3.0, 3.0, 2.0), ps, 1000.0);
        ParentHistory h = twoBodyHistory(d, T - 1500, T + 1500);
        ParticleGenerator g = new ParticleGenerator(d, h, ActiveArc.find(h, T, el, d.ejection()));
        int n = 300_000;
        List<Meteoroid> prior = g.generate(n, 21L, false, 2);
        double[] p0 = prior.stream().mapToDouble(m -> ParticleGenerator.periodAtEjection(m.state(), m.beta())).sorted().toArray();
        double[] node = prior.stream().mapToDouble(m -> EjectionFocus.Features.of(m.state(), m.beta()).nodeDescendingAu())
                .filter(Double::isFinite).sorted().toArray();
        double spread = node[(int) (0.75 * node.length)] - node[(int) (0.25 * node.length)];
        EjectionFocus inPeriod = EjectionFocus.around(p0[n / 2], 3.0, 1e-9);
        // The same with a node model (its acceptance depends on the whole direction, not only on the band's μ).
        EjectionFocus.NodeModel model = new EjectionFocus.NodeModel(false, 0, 1, 0, 0, node[node.length / 2], 0,
                0.5 * spread, 1);
        for (EjectionFocus focus : List.of(inPeriod, inPeriod.withNode(model))) {
            checkNormalisingConstant(g, prior, focus);
        }
    }

    private static void checkNormalisingConstant(ParticleGenerator g, List<Meteoroid> prior, EjectionFocus focus) {
        int n = prior.size();
        int bins = 3;
        double[] sum = new double[bins];
        double[] sum2 = new double[bins];
        int[] count = new int[bins];
        for (int i = 0; i < n; i++) {
            Meteoroid m = prior.get(i);
            int k = g.binOf(i, n, null);
            double a = focus.acceptance(m.state(), m.beta());
            sum[k] += a;
            sum2[k] += a * a;
            count[k]++;
        }
        double[][] rq = g.meanAcceptanceWithError(focus, 20_000, 5L);
        for (int k = 0; k < bins; k++) {
            double mean = sum[k] / count[k];
            double plainSe = Math.sqrt((sum2[k] / count[k] - mean * mean) / count[k]);
            System.out.printf("bin %d: Z plain %.5f +- %.5f (%d draws), shifted Sobol %.5f +- %.5f%n", k, mean, plainSe,
                    count[k], rq[0][k], rq[1][k]);
            assertThat(rq[0][k]).isCloseTo(mean, within(3 * Math.hypot(plainSe, rq[1][k])));
            assertThat(rq[1][k]).isLessThanOrEqualTo(ParticleGenerator.Z_RELATIVE_ERROR * rq[0][k] * 1.0000001);
        }
        // Another seed's shifts land within the stated errors.
        double[][] other = g.meanAcceptanceWithError(focus, 20_000, 6L);
        for (int k = 0; k < bins; k++) {
            assertThat(other[0][k]).isCloseTo(rq[0][k], within(4 * Math.hypot(rq[1][k], other[1][k])));
        }
    }

    @Test
    void coldEjectionFollowsTheParentThroughThePlanets() {
        // Zero speed and beta = 0: each particle is the parent at its ejection time, and carried a full
        // revolution with the planets it stays on the parent's integrated orbit (a two-body guess of the
        // parent's state would be off by Jupiter's perturbation, ~1e-4 au).
        Elements el = Elements.ofDegrees(1.2, 0.6, 12.0, 40.0, 200.0, T + 2451545.0, GM);
        ForceModelFactory planets = new ForceModelFactory(EPHEMERIS, true, true);
        StreamDefinition d = stream(el, law(VelocityModel.FIXED, 0.0, 2.0, 2.0, 2.0),
                new ParticleSettings(1e-3, 1e-3, 1000.0, 2.0, 0.0, 1, false), 100.0);
        double period = el.period();
        ParentHistory h = ParentHistory.compute(d.parent(), planets, 1e-11, T - 300, T + 1.2 * period);
        ParticleGenerator g = new ParticleGenerator(d, h, ActiveArc.find(h, T, el, d.ejection()));
        List<Meteoroid> cloud = g.generate(8, 3L, false, 1);
        double tEnd = T + period;
        List<Outcome> out = new Propagator(planets, 1e-11, 1e5, 2).propagate(
                cloud.stream().map(Meteoroid::toTestParticle).toList(), tEnd, null, null);
        double[] parent = new double[6];
        h.stateAt(tEnd, parent);
        for (int k = 0; k < cloud.size(); k++) {
            assertThat(cloud.get(k).beta()).isZero();
            assertThat(cloud.get(k).speedMs()).isZero();
            double[] s = out.get(k).state();
            double dr = Math.hypot(Math.hypot(s[0] - parent[0], s[1] - parent[1]), s[2] - parent[2]);
            // The two integrations' own differences and the ejection state's interpolation from the arc's
            // table (StateTable, a relative 1e-11 in velocity) leave 1.0e-8 au (measured).
            assertThat(dr).as("particle %d after one revolution", k).isLessThan(2e-8);
        }
    }

    @Test
    void zeroSpeedGrainsAreUnboundAboveTheCriticalBeta() {
        // Burns, Lamy & Soter (1979): released at zero relative speed at perihelion, a grain leaves on an
        // unbound orbit when beta >= (1 - e)/2. Grains released within 0.01 d of perihelion, with beta 0.2%
        // below and above the critical value, have e' < 1 and e' > 1 under GM(1 - beta).
        Elements el = halleyType();
        double critical = RadiationPressure.criticalBetaAtPerihelion(el.e());
        for (double factor : new double[] {0.998, 1.002}) {
            double beta = critical * factor;
            double radius = RadiationPressure.CONSTANT / (1000.0 * beta);
            EjectionSettings ej = new EjectionSettings(VelocityModel.FIXED, 1.0, 0.0, DirectionLaw.SUNLIT, 45, 3, 3, 2,
                    new double[] {-0.01, 0.01}, new double[] {1.0, 1.0});
            StreamDefinition d = stream(el, ej, new ParticleSettings(radius, radius, 1000.0, 2.0, 1.0, 1, false), null);
            ParentHistory h = twoBodyHistory(d, T - 10, T + 10);
            ParticleGenerator g = new ParticleGenerator(d, h, ActiveArc.find(h, T, el, ej));
            for (Meteoroid m : g.generate(20, 1L, false, 1)) {
                assertThat(m.beta()).isCloseTo(beta, within(1e-12 * beta));
                assertThat(m.weight()).isNaN();
                double e = Elements.of(StateVector.of(m.state()), m.t() + 2451545.0, GM * (1 - m.beta())).e();
                if (factor < 1) {
                    assertThat(e).isLessThan(1.0);
                } else {
                    assertThat(e).isGreaterThan(1.0);
                }
            }
        }
    }

    @Test
    void unboundParentHasOnePassageAndAnArc() {
        Elements el = Elements.ofDegrees(0.6, 1.8, 60.0, 300.0, 112.0, T + 2451545.0, GM);
        StreamDefinition d = stream(el, law(VelocityModel.JONES_1995, 0, 2.5, 2.5, 2.0),
                new ParticleSettings(1e-4, 1e-2, 1000.0, 2.0, 1.0, 5, true), 50.0);
        ParentHistory h = twoBodyHistory(d, T - 400, T + 400);
        List<Perihelion> passages = h.perihelia();
        assertThat(passages).hasSize(1);
        ActiveArc arc = ActiveArc.find(h, passages.get(0).t(), passages.get(0).elements(), d.ejection());
        assertThat(el.stateAt(arc.start() + 2451545.0).r()).isCloseTo(2.5, within(1e-8));
        assertThat(el.stateAt(arc.end() + 2451545.0).r()).isCloseTo(2.5, within(1e-8));
        List<Meteoroid> cloud = new ParticleGenerator(d, h, arc).generate(2000, 5L, true, 1);
        assertThat(cloud).allSatisfy(m -> assertThat(m.t()).isBetween(arc.start(), arc.end()));
        double[] v = cloud.stream().mapToDouble(Meteoroid::speedMs).toArray();
        assertThat(Arrays.stream(v).min().orElseThrow()).isPositive();
    }

    @Test
    void aFocusedCloudFollowsThePriorTimesTheAcceptance() {
        // The band's envelope (PeriodBand) must draw exactly q = p a / Z, the law of keeping each prior candidate
        // with probability a. Checked against that definition: per size bin, the a-weighted share of prior
        // particles (Commons Math's WELL generator, plain draws) in quintile cells of P0, ejection time, beta and
        // the descending node's distance, against the focused cloud's share; every cell within 4.5 combined
        // sigma. Three direction laws (the cap's rejection), a focus in P0 with a node model (a acceptance that
        // depends on the whole direction) and in P0 alone.
        Elements el = halleyType();
        for (DirectionLaw law : DirectionLaw.values()) {
            EjectionSettings ej = new EjectionSettings(VelocityModel.JONES_1995, 1.0, 0, law, 45, 3.0, 3.0, 2.0, null, null);
            StreamDefinition d = stream(el, ej, new ParticleSettings(1e-4, 1e-2, 1000.0, 2.0, 1.0, 3, true), 1000.0);
            ParentHistory h = twoBodyHistory(d, T - 1500, T + 1500);
            ParticleGenerator g = new ParticleGenerator(d, h, ActiveArc.find(h, T, el, d.ejection()));
            List<Meteoroid> pilot = g.generate(30_000, 3L, false, 2);
            double[] p0 = pilot.stream().mapToDouble(m -> ParticleGenerator.periodAtEjection(m.state(), m.beta())).sorted()
                    .toArray();
            double[] node = pilot.stream().mapToDouble(m -> EjectionFocus.Features.of(m.state(), m.beta()).nodeDescendingAu())
                    .filter(Double::isFinite).sorted().toArray();
            EjectionFocus inPeriod = EjectionFocus.around(p0[p0.length / 2], 4.0, 0.002);
            double spread = node[(int) (0.75 * node.length)] - node[(int) (0.25 * node.length)];
            EjectionFocus.NodeModel model = new EjectionFocus.NodeModel(false, 0, 1, 0, 0, node[node.length / 2], 0,
                    0.3 * spread, 1);
            for (EjectionFocus focus : List.of(inPeriod, inPeriod.withNode(model))) {
                checkFocusedLaw(g, focus, law + (focus.node() == null ? ", P0 alone" : ", P0 and node"));
            }
        }
    }

    /** Compares a focused cloud with the a-weighted prior, cell by cell (see the test above). */
    private static void checkFocusedLaw(ParticleGenerator g, EjectionFocus focus, String what) {
        int bins = g.sizes().bins();
        int functions = 4;
        java.util.function.BiFunction<Meteoroid, Integer, Double> f = (m, j) -> switch (j) {
            case 0 -> ParticleGenerator.periodAtEjection(m.state(), m.beta());
            case 1 -> m.t();
            case 2 -> m.beta();
            default -> {
                double r = EjectionFocus.Features.of(m.state(), m.beta()).nodeDescendingAu();
                yield Double.isFinite(r) ? r : -1.0;
            }
        };
        // The a-weighted prior, 5 chunks of 200,000 plain particles.
        List<double[]> rows = new java.util.ArrayList<>();
        for (int chunk = 0; chunk < 5; chunk++) {
            List<Meteoroid> prior = g.generate(200_000, 100L + chunk, false, 2);
            for (int i = 0; i < prior.size(); i++) {
                Meteoroid m = prior.get(i);
                double a = focus.acceptance(m.state(), m.beta());
                rows.add(new double[] {g.binOf(i, prior.size(), null), a, f.apply(m, 0), f.apply(m, 1), f.apply(m, 2),
                        f.apply(m, 3)});
            }
        }
        List<Meteoroid> focused = g.generate(6000, 77L, false, 2, focus, 0, null);
        double worst = 0;
        for (int j = 0; j < functions; j++) {
            final int col = 2 + j;
            // Quintile edges of the a-weighted prior, all bins together.
            double[][] sorted = rows.stream().map(r -> new double[] {r[col], r[1]}).sorted((x, y) -> Double.compare(x[0], y[0]))
                    .toArray(double[][]::new);
            double total = Arrays.stream(sorted).mapToDouble(x -> x[1]).sum();
            double[] edges = new double[4];
            double acc = 0;
            int e = 0;
            for (double[] x : sorted) {
                acc += x[1];
                while (e < 4 && acc >= (e + 1) * total / 5) {
                    edges[e++] = x[0];
                }
            }
            for (int k = 0; k < bins; k++) {
                double[] w = new double[5];
                double[] w2 = new double[5];
                double sum = 0;
                for (double[] r : rows) {
                    if (r[0] == k) {
                        int cell = cell(r[col], edges);
                        w[cell] += r[1];
                        sum += r[1];
                    }
                }
                int[] n = new int[5];
                int nk = 0;
                for (int i = 0; i < focused.size(); i++) {
                    if (g.binOf(i, focused.size(), null) == k) {
                        n[cell(f.apply(focused.get(i), j), edges)]++;
                        nk++;
                    }
                }
                for (int c = 0; c < 5; c++) {
                    double share = w[c] / sum;
                    for (double[] r : rows) {
                        if (r[0] == k) {
                            double d = (cell(r[col], edges) == c ? 1 : 0) - share;
                            w2[c] += r[1] * r[1] * d * d;
                        }
                    }
                    double var = w2[c] / (sum * sum) + share * (1 - share) / nk;
                    if (share == 0 || share == 1) {
                        // A cell this bin's sizes never reach, or all they reach (beta follows the size).
                        assertThat(n[c]).as("%s: function %d, bin %d, cell %d", what, j, k, c).isEqualTo(share == 0 ? 0 : nk);
                        continue;
                    }
                    double z = (n[c] / (double) nk - share) / Math.sqrt(var);
                    worst = Math.max(worst, Math.abs(z));
                    assertThat(Math.abs(z)).as("%s: function %d, bin %d, cell %d: focused %.4f, prior x a %.4f", what, j, k,
                            c, n[c] / (double) nk, share).isLessThan(4.5);
                }
            }
        }
        System.out.printf("%s: largest |z| over the cells %.2f%n", what, worst);
    }

    private static int cell(double x, double[] edges) {
        int c = 0;
        while (c < edges.length && x > edges[c]) {
            c++;
        }
        return c;
    }
}
