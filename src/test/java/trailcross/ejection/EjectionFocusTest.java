package trailcross.ejection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;

/**
 * The focus' conditions at ejection and its delta r model. The node distances are checked against the
 * conic itself (r = p / (1 + e cos f) at the true anomalies of the nodes, f = −ω and π − ω; e.g. Murray &amp;
 * Dermott 1999, eqs. 2.20 and 2.23): the state the orbit's own elements give there lies on the ecliptic at
 * the distance the features report, computed from a state elsewhere on the orbit.
 */
class EjectionFocusTest {

    @Test
    void nodeDistancesAreWhereTheOrbitCrossesTheEcliptic() {
        Random rnd = new Random(2026);
        double gm = Body.SUN.gm();
        for (int k = 0; k < 200; k++) {
            double q = 0.1 + 1.5 * rnd.nextDouble();
            double e = 0.95 * rnd.nextDouble();
            double beta = k % 2 == 0 ? 0 : 0.02 * rnd.nextDouble();
            double mu = gm * (1 - beta);
            Elements el = Elements.ofDegrees(q, e, 1 + 178 * rnd.nextDouble(), 360 * rnd.nextDouble(),
                    360 * rnd.nextDouble(), 2451545.0, mu);
            double[] s = el.stateAtTrueAnomaly(2 * Math.PI * rnd.nextDouble() - Math.PI).toArray();
            EjectionFocus.Features f = EjectionFocus.Features.of(s, beta);
            StateVector asc = el.stateAtTrueAnomaly(-el.peri());
            StateVector desc = el.stateAtTrueAnomaly(Math.PI - el.peri());
            assertThat(asc.z()).isCloseTo(0, within(1e-9));
            assertThat(desc.z()).isCloseTo(0, within(1e-9));
            double ra = Math.sqrt(asc.x() * asc.x() + asc.y() * asc.y());
            double rd = Math.sqrt(desc.x() * desc.x() + desc.y() * desc.y());
            assertThat(f.nodeAscendingAu()).as("orbit %d", k).isCloseTo(ra, within(1e-9 * ra));
            assertThat(f.nodeDescendingAu()).as("orbit %d", k).isCloseTo(rd, within(1e-9 * rd));
            assertThat(f.p0()).isCloseTo(el.period(), within(1e-9 * el.period()));
            assertThat(f.node(true)).isEqualTo(f.nodeAscendingAu());
        }
        // A hyperbola reaches only the node on the side of its perihelion.
        Elements h = Elements.ofDegrees(0.5, 1.5, 30, 0, 200, 2451545.0, gm);
        EjectionFocus.Features fh = EjectionFocus.Features.of(h.stateAtTrueAnomaly(0).toArray(), 0);
        assertThat(Double.isNaN(fh.nodeAscendingAu()) != Double.isNaN(fh.nodeDescendingAu())).isTrue();
        assertThat(fh.p0()).isInfinite();
    }

    @Test
    void theDeltaRModelRecoversALinearLawAndRefusesNoise() {
        Random rnd = new Random(7);
        List<EjectionFocus.Features> x = new ArrayList<>();
        double[] dr = new double[60];
        double[] pure = new double[60];
        for (int i = 0; i < dr.length; i++) {
            EjectionFocus.Features f = new EjectionFocus.Features(12470 + 20 * rnd.nextGaussian(), Double.NaN,
                    0.977 + 0.001 * rnd.nextGaussian(), 0.002 * rnd.nextDouble());
            x.add(f);
            dr[i] = 0.0006 + 1.04 * (f.nodeDescendingAu() - 0.977) + 0.05 * f.beta() + 2e-5 * (f.p0() - 12470)
                    + 5e-5 * rnd.nextGaussian();
            pure[i] = 1e-3 * rnd.nextGaussian();
        }
        EjectionFocus.NodeModel m = EjectionFocus.NodeModel.fit(x, dr, false);
        assertThat(m).isNotNull();
        assertThat(m.cR()).isCloseTo(1.04, within(0.02));
        assertThat(m.cBeta()).isCloseTo(0.05, within(0.01));
        assertThat(m.cP()).isCloseTo(2e-5, within(1e-6));
        assertThat(m.rSquared()).isGreaterThan(0.99);
        // The width: the residual scatter, or a share of the spread of delta r when that is larger.
        assertThat(m.width()).isGreaterThanOrEqualTo(EjectionFocus.NodeModel.MIN_WIDTH_SHARE
                * new org.apache.commons.math3.stat.descriptive.moment.StandardDeviation().evaluate(dr) * 0.999);
        for (int i = 0; i < dr.length; i++) {
            assertThat(m.predict(x.get(i))).isCloseTo(dr[i], within(3e-4));
        }
        // Delta r unrelated to the conditions at ejection, or too few particles: no model.
        assertThat(EjectionFocus.NodeModel.fit(x, pure, false)).isNull();
        assertThat(EjectionFocus.NodeModel.fit(x.subList(0, 11), java.util.Arrays.copyOf(dr, 11), false)).isNull();
    }

    @Test
    void theAcceptanceStaysBetweenTheFloorAndOne() {
        EjectionFocus p = EjectionFocus.around(12470, 10, 0.01);
        EjectionFocus.NodeModel m = new EjectionFocus.NodeModel(false, 0.0006, 1, 0, 0, 0.977, 12470, 3e-4, 0.9);
        EjectionFocus f = p.withNode(m);
        assertThat(f.withNode(null)).isEqualTo(p);
        assertThat(f).isNotEqualTo(p);
        Random rnd = new Random(3);
        for (int i = 0; i < 2000; i++) {
            double p0 = 12470 + 30 * rnd.nextGaussian();
            EjectionFocus.Features x = new EjectionFocus.Features(p0, Double.NaN, 0.977 + 0.002 * rnd.nextGaussian(), 0);
            double a = f.acceptance(x);
            assertThat(a).isBetween(0.01, 1.0).isLessThanOrEqualTo(p.acceptance(x) + 1e-15);
            assertThat(p.acceptance(x)).isEqualTo(p.periodAcceptance(p0));
        }
        // On the Earth's path (predicted delta r 0) the node factor is 1; far from it only the floor is left.
        EjectionFocus.Features on = new EjectionFocus.Features(12470, Double.NaN, 0.977 - 0.0006, 0);
        EjectionFocus.Features off = new EjectionFocus.Features(12470, Double.NaN, 0.990, 0);
        EjectionFocus.Features none = new EjectionFocus.Features(12470, 0.98, Double.NaN, 0);
        assertThat(f.acceptance(on)).isCloseTo(1.0, within(1e-12));
        assertThat(f.acceptance(off)).isCloseTo(0.01, within(1e-12));
        assertThat(f.acceptance(none)).isCloseTo(0.01, within(1e-12));
        assertThat(EjectionFocus.PRIOR.acceptance(off)).isEqualTo(1.0);
    }
}
