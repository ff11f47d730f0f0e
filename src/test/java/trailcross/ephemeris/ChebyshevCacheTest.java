package trailcross.ephemeris;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ChebyshevCacheTest {

    private static final Vsop87Ephemeris SERIES = new Vsop87Ephemeris();

    @Test
    void fitStaysWithin1e10AuOfTheSeriesFrom1000To3000() {
        // The bound of the cache's contract; measured maximum ≈ 5e-11 au (Mercury).
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        Random rnd = new Random(7);
        Body[] bodies = {Body.MERCURY, Body.VENUS, Body.EARTH, Body.MOON, Body.EARTH_MOON_BARYCENTRE, Body.MARS,
            Body.JUPITER, Body.SATURN, Body.URANUS, Body.NEPTUNE};
        double worst = 0;
        for (int k = 0; k < 40; k++) {
            double t = cache.firstDay() + rnd.nextDouble() * (cache.lastDay() - cache.firstDay());
            for (Body b : bodies) {
                double[] a = new double[6];
                double[] c = new double[6];
                SERIES.heliocentric(b, t, a);
                cache.heliocentric(b, t, c);
                double d = Math.sqrt(sq(a[0] - c[0]) + sq(a[1] - c[1]) + sq(a[2] - c[2]));
                double dv = Math.sqrt(sq(a[3] - c[3]) + sq(a[4] - c[4]) + sq(a[5] - c[5]));
                assertThat(d).as("%s at t=%.3f", b, t).isLessThan(1e-10);
                assertThat(dv).as("%s velocity at t=%.3f", b, t).isLessThan(5e-9);
                worst = Math.max(worst, d);
            }
        }
        System.out.printf("cache vs series, worst position error %.2e au%n", worst);
        // Block edges and the ends of the span, where a fit is most exposed.
        for (double t : new double[] {cache.firstDay(), cache.firstDay() + 8.0, 4096.0, cache.lastDay()}) {
            double[] a = new double[6];
            double[] c = new double[6];
            SERIES.heliocentric(Body.EARTH, t, a);
            cache.heliocentric(Body.EARTH, t, c);
            assertThat(Math.sqrt(sq(a[0] - c[0]) + sq(a[1] - c[1]) + sq(a[2] - c[2]))).isLessThan(1e-10);
        }
    }

    @Test
    void allBodyCallsAgreeWithSingleBodyCalls() {
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        double t = 1234.567;
        double[] all = new double[54];
        double[] pos = new double[27];
        cache.heliocentricAll(t, all);
        cache.heliocentricPositionsAll(t, pos);
        for (int i = 0; i < ChebyshevCache.ALL.length; i++) {
            double[] one = new double[6];
            cache.heliocentric(ChebyshevCache.ALL[i], t, one);
            for (int k = 0; k < 6; k++) {
                assertThat(all[6 * i + k]).isEqualTo(one[k]);
            }
            for (int k = 0; k < 3; k++) {
                assertThat(pos[3 * i + k]).isEqualTo(one[k]);
            }
        }
        double[] sunCache = new double[6];
        double[] sunSeries = new double[6];
        cache.sunBarycentric(t, sunCache);
        SERIES.sunBarycentric(t, sunSeries);
        assertThat(Math.abs(sunCache[0] - sunSeries[0])).isLessThan(1e-12);
    }

    @Test
    void blocksJoinWithoutAJump() {
        // Lobatto interpolation takes the source's own value at both ends of a block, so the two blocks meeting
        // at a boundary agree there up to rounding: the jump is measured just left and right of boundaries
        // (multiples of 8 days are boundaries of every item), the motion over that one-ulp gap taken out.
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        ChebyshevCache.Cursor cursor = cache.cursor();
        double worst = 0;
        double[] left = new double[54];
        double[] right = new double[54];
        double[] sunLeft = new double[6];
        double[] sunRight = new double[6];
        for (int m = 1; m < 400; m++) {
            double tb = cache.firstDay() + 8.0 * 911 * m;
            if (tb >= cache.lastDay()) {
                break;
            }
            double tl = Math.nextDown(tb);
            cursor.heliocentricAll(tl, left);
            cursor.heliocentricAll(tb, right);
            cursor.sunBarycentric(tl, sunLeft);
            cursor.sunBarycentric(tb, sunRight);
            for (int i = 0; i <= ChebyshevCache.ALL.length; i++) {
                double[] l = i < ChebyshevCache.ALL.length ? left : sunLeft;
                double[] r = i < ChebyshevCache.ALL.length ? right : sunRight;
                int o = i < ChebyshevCache.ALL.length ? 6 * i : 0;
                double j2 = 0;
                for (int k = 0; k < 3; k++) {
                    j2 += sq(r[o + k] - l[o + k] - r[o + 3 + k] * (tb - tl));
                }
                worst = Math.max(worst, Math.sqrt(j2));
            }
        }
        System.out.printf("cache: largest jump between blocks %.2e au%n", worst);
        assertThat(worst).isLessThan(ChebyshevCache.JUMP_BOUND_AU);
        assertThat(cache.discontinuityAu()).isEqualTo(ChebyshevCache.JUMP_BOUND_AU);
    }

    @Test
    void cursorsAnswerLikeTheCacheWhateverTheirHistory() {
        // A cursor remembers blocks; its answers must not depend on what it was asked before.
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        ChebyshevCache.Cursor forward = cache.cursor();
        ChebyshevCache.Cursor jumping = cache.cursor();
        Random rnd = new Random(11);
        double[] a = new double[54];
        double[] b = new double[54];
        double[] c = new double[54];
        for (int k = 0; k < 2000; k++) {
            double t = 3000 + k * 0.37;
            jumping.heliocentricAll(cache.firstDay() + rnd.nextDouble() * (cache.lastDay() - cache.firstDay()), c);
            forward.heliocentricAll(t, a);
            jumping.heliocentricAll(t, b);
            assertThat(b).containsExactly(a);
            cache.heliocentricAll(t, c);
            assertThat(c).containsExactly(a);
        }
    }

    @Test
    void sunIsTheBarycentreOfTheCachedPlanets() {
        // The Sun's item is fitted from the cache's own planets: it must equal −Σ m_j r_j / M (DE440 masses),
        // summed directly, to well below the planets' own fit bound; and the series' barycentric Sun to 1e-12.
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        double total = Body.SUN.gm();
        for (Body p : Body.MASSIVE_PLANETS) {
            total += p.gm();
        }
        Random rnd = new Random(5);
        double worst = 0;
        double worstVelocity = 0;
        for (int k = 0; k < 200; k++) {
            double t = -36525 + rnd.nextDouble() * 73050;
            double[] sum = new double[6];
            double[] s = new double[6];
            for (Body p : Body.MASSIVE_PLANETS) {
                cache.heliocentric(p, t, s);
                for (int m = 0; m < 6; m++) {
                    sum[m] -= p.gm() / total * s[m];
                }
            }
            double[] sun = new double[6];
            cache.sunBarycentric(t, sun);
            worst = Math.max(worst, Math.sqrt(sq(sun[0] - sum[0]) + sq(sun[1] - sum[1]) + sq(sun[2] - sum[2])));
            worstVelocity = Math.max(worstVelocity, Math.sqrt(sq(sun[3] - sum[3]) + sq(sun[4] - sum[4]) + sq(sun[5] - sum[5])));
        }
        System.out.printf("cache: barycentric Sun vs its planets %.2e au, %.2e au/d%n", worst, worstVelocity);
        assertThat(worst).isLessThan(3e-13);
        assertThat(worstVelocity).isLessThan(2e-13);
    }

    @Test
    void threadsSeeTheSameBlocks() throws Exception {
        // Lazy fitting from several threads at once gives bit-identical answers.
        ChebyshevCache shared = new ChebyshevCache(SERIES);
        ChebyshevCache alone = new ChebyshevCache(SERIES);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<double[]>> results = new ArrayList<>();
            for (int k = 0; k < 16; k++) {
                final double t = 500 + 3.3 * (k % 4);
                results.add(pool.submit(() -> {
                    double[] out = new double[54];
                    shared.heliocentricAll(t, out);
                    return out;
                }));
            }
            for (int k = 0; k < 16; k++) {
                double[] expected = new double[54];
                alone.heliocentricAll(500 + 3.3 * (k % 4), expected);
                assertThat(results.get(k).get()).containsExactly(expected);
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void outsideTheSpanIsAnError() {
        ChebyshevCache cache = new ChebyshevCache(SERIES);
        assertThatThrownBy(() -> cache.heliocentric(Body.EARTH, 400000, new double[6]))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("outside the span");
    }

    private static double sq(double x) {
        return x * x;
    }
}
