package trailcross.orbit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** MOID against published cases and an independent brute-force search. */
class MoidTest {

    private static final double GM = 2.9591220828411956e-4;

    @Test
    void wisniowskiRickmanTestSet() {
        // Wiśniowski & Rickman (2013, Acta Astron. 63, 293), their test set (../shared/REFERENCES.md [R]):
        // reference orbit A and ten orbits B with the published MOID (au), to 1e-7 au.
        Elements a = Elements.ofDegrees(2.036, 0.164, 0.0, 0.0, 250.227, 2451545.0, GM);
        double[][] cases = {
            {2.55343183, 0.0777898, 10.58785, 80.35052, 72.14554, 0.13455874348909},
            {2.12995319, 0.2313469, 34.84268, 173.12520, 310.03850, 0.00289925623680},
            {1.98948966, 0.2552218, 12.97943, 169.90317, 248.22602, 0.07817951779390},
            {2.15354370, 0.0882196, 7.13426, 103.89537, 150.08873, 0.08735595371552},
            {2.08388391, 0.1905003, 5.36719, 141.60955, 358.80654, 0.14532630925408},
            {2.48391159, 0.9543470, 119.29902, 39.00301, 357.90012, 0.26938418933051},
            {2.36382356, 0.9006860, 160.41316, 297.34820, 102.45000, 0.54491059333263},
            {0.13964163, 0.8901393, 22.23224, 265.28749, 322.11933, 0.70855959609279},
            {0.35420623, 0.8363753, 11.68912, 28.13011, 208.66724, 0.03943927946198},
            {0.52469070, 0.7715449, 12.56792, 7.25167, 122.30952, 0.18225709092897},
        };
        for (double[] c : cases) {
            Elements b = Elements.ofDegrees(c[0], c[1], c[2], c[3], c[4], 2451545.0, GM);
            assertThat(Moid.of(a, b)).as("case q = %s", c[0]).isCloseTo(c[5], within(1e-7));
            assertThat(Moid.of(b, a)).isCloseTo(c[5], within(1e-7));
        }
    }

    @Test
    void localMinimaAreStationaryAndThePointsLieOnTheOrbits() {
        Elements a = Elements.ofDegrees(2.036, 0.164, 0.0, 0.0, 250.227, 2451545.0, GM);
        Elements b = Elements.ofDegrees(0.35420623, 0.8363753, 11.68912, 28.13011, 208.66724, 2451545.0, GM);
        List<Moid.Minimum> m = Moid.minima(a, b);
        assertThat(m.size()).isGreaterThanOrEqualTo(2);
        for (Moid.Minimum x : m) {
            double[] pa = a.stateAtTrueAnomaly(x.trueAnomalyA()).position();
            double[] pb = b.stateAtTrueAnomaly(x.trueAnomalyB()).position();
            double d = Math.sqrt(sq(pa[0] - pb[0]) + sq(pa[1] - pb[1]) + sq(pa[2] - pb[2]));
            assertThat(d).isCloseTo(x.distance(), within(1e-12));
            // Stationary: moving either point by 1e-4 rad does not bring them closer.
            for (double du : new double[] {-1e-4, 1e-4}) {
                assertThat(dist(a, b, x.trueAnomalyA() + du, x.trueAnomalyB())).isGreaterThanOrEqualTo(x.distance());
                assertThat(dist(a, b, x.trueAnomalyA(), x.trueAnomalyB() + du)).isGreaterThanOrEqualTo(x.distance());
            }
        }
    }

    @Test
    void agreesWithBruteForceOnRandomPairsIncludingUnboundOrbits() {
        // 10^4 random pairs (q 0.1-5 au, e 0-3 with a fifth unbound, any orientation). The brute force here is
        // independent of Moid: positions from Elements.stateAtTrueAnomaly on a 360 x 360 grid of true anomaly,
        // the best cell zoomed into by successively finer 11 x 11 grids. Where the two differ by more than
        // 1e-6 au the brute force's coarse grid must be the one that missed (Moid lower), never Moid.
        SplittableRandom rnd = new SplittableRandom(20131);
        int agree = 0;
        for (int k = 0; k < 10_000; k++) {
            Elements a = random(rnd);
            Elements b = random(rnd);
            double fast = Moid.of(a, b);
            double brute = brute(a, b, 360);
            assertThat(fast).as("pair %d: %s / %s", k, a, b).isLessThanOrEqualTo(brute + 1e-9);
            if (Math.abs(fast - brute) < 1e-7) {
                agree++;
            }
        }
        assertThat(agree).isGreaterThanOrEqualTo(9_900);
    }

    private static Elements random(SplittableRandom r) {
        double e = r.nextDouble() < 0.2 ? 1 + 2 * r.nextDouble() : r.nextDouble() * 0.97;
        return new Elements(0.1 + 4.9 * r.nextDouble(), e, Math.PI * r.nextDouble(), 2 * Math.PI * r.nextDouble(),
                2 * Math.PI * r.nextDouble(), 2451545.0, GM);
    }

    private static double brute(Elements a, Elements b, int n) {
        double capA = cap(a);
        double capB = cap(b);
        double[] pa = new double[3 * n];
        double[] pb = new double[3 * n];
        for (int j = 0; j < n; j++) {
            System.arraycopy(a.stateAtTrueAnomaly(-capA + 2 * capA * j / (n - 1)).position(), 0, pa, 3 * j, 3);
            System.arraycopy(b.stateAtTrueAnomaly(-capB + 2 * capB * j / (n - 1)).position(), 0, pb, 3 * j, 3);
        }
        double best = Double.MAX_VALUE;
        int bi = 0;
        int bj = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double d = sq(pa[3 * i] - pb[3 * j]) + sq(pa[3 * i + 1] - pb[3 * j + 1]) + sq(pa[3 * i + 2] - pb[3 * j + 2]);
                if (d < best) {
                    best = d;
                    bi = i;
                    bj = j;
                }
            }
        }
        double u = -capA + 2 * capA * bi / (n - 1);
        double v = -capB + 2 * capB * bj / (n - 1);
        double hu = 2 * capA / (n - 1);
        double hv = 2 * capB / (n - 1);
        double bestD = dist(a, b, u, v);
        for (int round = 0; round < 14; round++) {
            double cu = u;
            double cv = v;
            for (int i = -5; i <= 5; i++) {
                for (int j = -5; j <= 5; j++) {
                    double d = dist(a, b, cu + hu * i / 5, cv + hv * j / 5);
                    if (d < bestD) {
                        bestD = d;
                        u = cu + hu * i / 5;
                        v = cv + hv * j / 5;
                    }
                }
            }
            hu *= 0.35;
            hv *= 0.35;
        }
        return bestD;
    }

    private static double cap(Elements el) {
        if (el.e() < 1) {
            return Math.PI;
        }
        double c = (el.p() / Moid.MAX_DISTANCE_AU - 1) / el.e();
        return Math.acos(Math.max(-1, Math.min(1, c)));
    }

    private static double dist(Elements a, Elements b, double u, double v) {
        double[] pa = a.stateAtTrueAnomaly(u).position();
        double[] pb = b.stateAtTrueAnomaly(v).position();
        return Math.sqrt(sq(pa[0] - pb[0]) + sq(pa[1] - pb[1]) + sq(pa[2] - pb[2]));
    }

    private static double sq(double x) {
        return x * x;
    }
}
