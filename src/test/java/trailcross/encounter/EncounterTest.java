package trailcross.encounter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.GaussRadau15;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.ephemeris.Vsop87Ephemeris;
import trailcross.frames.EclipticFrame;
import trailcross.frames.SolarLongitude;
import trailcross.orbit.Elements;

/** Node crossings and the quantities read from them, against direct geometric constructions. */
class EncounterTest {

    private static final ChebyshevCache EPHEMERIS = new ChebyshevCache(new Vsop87Ephemeris());
    private static final double KM_S = 86400 / Body.Constants.AU_KM;

    @Test
    void deltaRTimingAndRadiantOfASyntheticCrossing() {
        // Construction: the Earth at T0; a particle crossing the ecliptic 2.5 days later at the Earth's
        // heliocentric longitude, 0.0007 au outside its distance, arriving from RA 153.6, Dec +21.8 at
        // 71.0 km/s relative to the Earth's velocity at T0.
        double t0 = 7261.6; // 2019-11-18, TDB days since J2000
        double[] e = new double[6];
        EPHEMERIS.heliocentric(Body.EARTH, t0, e);
        double rE = Math.sqrt(e[0] * e[0] + e[1] * e[1] + e[2] * e[2]);
        double lon = Math.atan2(e[1], e[0]);
        double r = rE + 0.0007;
        double ra = Math.toRadians(153.6);
        double dec = Math.toRadians(21.8);
        double[] towards = EclipticFrame.eclipticOf(new double[] {Math.cos(dec) * Math.cos(ra), Math.cos(dec) * Math.sin(ra), Math.sin(dec)});
        double vg = 71.0 * KM_S;
        double[] state = {r * Math.cos(lon), r * Math.sin(lon), 0, e[3] - vg * towards[0], e[4] - vg * towards[1], e[5] - vg * towards[2]};
        NodeCrossing c = new NodeCrossing(1, 0, 1.0, 1e-6, 12000, t0 + 2.5, state, state[5] > 0);
        Encounter enc = Encounter.of(c, EPHEMERIS);
        assertThat(enc.earthT()).isCloseTo(t0, within(1e-7));
        assertThat(enc.deltaR()).isCloseTo(0.0007, within(1e-12));
        assertThat(enc.daysAfterEarth()).isCloseTo(2.5, within(1e-7));
        assertThat(enc.solarLongitudeDeg()).isCloseTo(SolarLongitude.degrees(new double[] {e[0], e[1], e[2]}), within(1e-7));
        assertThat(enc.radiant().raDeg()).isCloseTo(153.6, within(1e-6));
        assertThat(enc.radiant().decDeg()).isCloseTo(21.8, within(1e-6));
        assertThat(enc.radiant().vgKmS()).isCloseTo(71.0, within(1e-6));
    }

    @Test
    void crossingsFoundOnTheDenseOutputLieOnThePlaneAtTheNodes() {
        // A two-body orbit (planets off): its nodes are at true anomaly -omega and pi - omega, at
        // r = p / (1 + e cos nu), and the crossing state lies in the plane z = 0.
        Elements el = Elements.ofDegrees(0.9, 0.85, 30.0, 100.0, 150.0, 2451545.0 + 8000, Body.SUN.gm());
        ForceModelFactory twoBody = new ForceModelFactory(EPHEMERIS, false, false);
        CrossingFinder f = new CrossingFinder(new double[] {0, 0, 1}, 7000, 9500, 0, 100, 5, 8000, 1.0, 1e-6, el.period());
        double[] s0 = el.stateAt(2451545.0 + 7000).toArray();
        new GaussRadau15(1e-10, 1e4).integrate(twoBody.create(0), 7000, s0, 9500, f);
        List<NodeCrossing> found = f.crossings();
        assertThat(found).hasSize(2);
        for (NodeCrossing c : found) {
            double nu = c.ascending() ? -el.peri() : Math.PI - el.peri();
            assertThat(c.r()).isCloseTo(el.p() / (1 + el.e() * Math.cos(nu)), within(1e-9));
            assertThat(c.state()[2]).isCloseTo(0, within(1e-12));
            assertThat(el.stateAt(c.t() + 2451545.0).z()).isCloseTo(0, within(1e-9));
        }
        assertThat(found.get(0).ascending()).isNotEqualTo(found.get(1).ascending());
        // A band of distances excludes the far node.
        CrossingFinder near = new CrossingFinder(new double[] {0, 0, 1}, 7000, 9500, 0.9, 1.1, 5, 8000, 1.0, 1e-6, el.period());
        new GaussRadau15(1e-10, 1e4).integrate(twoBody.create(0), 7000, s0, 9500, near);
        assertThat(near.crossings()).hasSizeLessThan(2);
    }

    @Test
    void trailAggregateRecoversASyntheticSection() {
        // 400 crossings: lambda = 235.30 + N(0, 0.01 deg), delta r uniform in [-0.0025, +0.0015] au, passages
        // within 5 days of the Earth, node passage times t = tn + 3 (P0 - P) (a trail three revolutions
        // old, unperturbed: fM = 1/3).
        Well19937c rng = new Well19937c(99);
        double tE = 7261.6;
        double p = 33.2 * 365.25;
        List<Encounter> list = new ArrayList<>();
        for (int k = 0; k < 400; k++) {
            double dr = -0.0005 + 0.004 * (rng.nextDouble() - 0.5);
            double lambda = 235.30 + 0.01 * gauss(rng);
            double p0 = p + 2 * (rng.nextDouble() - 0.5);
            double t = tE + 3 * (p0 - p);
            NodeCrossing c = new NodeCrossing(k, tE - 8 * p - 3, 1e9, 1e-5, p0, t, new double[] {0, 0, 0, 0, 0, 0.01}, false);
            list.add(new Encounter(c, tE + 0.01 * k / 400, dr, lambda, 10 * (rng.nextDouble() - 0.5),
                    new GeocentricRadiant(153.6, 21.8, 71.0, lambda)));
        }
        TrailEncounter t = TrailEncounter.of(list, p, 2.5, EPHEMERIS);
        assertThat(t.particles()).isEqualTo(400);
        assertThat(t.deltaR()).isCloseTo(-0.0005, within(2e-4));
        // The median of 400 normal draws scatters by 1.25 sigma/sqrt(n) = 0.0006 deg; 4 of those.
        assertThat(t.solarLongitudeDeg()).isCloseTo(235.30, within(0.0025));
        assertThat(t.fwhmHours()).isCloseTo(2.3548 * 0.01 * TrailEncounter.HOURS_PER_DEGREE, within(0.1 * 0.57));
        assertThat(t.peakSigmaMin()).isBetween(0.5 * 0.0006 * 1461, 2.0 * 0.0006 * 1461);
        assertThat(t.fM()).isCloseTo(1.0 / 3, within(1e-6));
        assertThat(t.raDeg()).isCloseTo(153.6, within(1e-9));
        assertThat(t.vgKmS()).isCloseTo(71.0, within(1e-9));
        assertThat(t.revolutions()).isEqualTo(8);
        // The Earth's time at the peak longitude.
        double[] e = new double[3];
        EPHEMERIS.heliocentricPosition(Body.EARTH, t.peakT(), e);
        assertThat(SolarLongitude.degrees(e)).isCloseTo(t.solarLongitudeDeg(), within(1e-7));
        assertThat(t.zhr()).isPositive();
    }

    private static double gauss(Well19937c r) {
        return r.nextGaussian();
    }
}
