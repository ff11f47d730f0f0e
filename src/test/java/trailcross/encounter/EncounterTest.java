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
import trailcross.frames.EclipticFrame;
import trailcross.frames.SolarLongitude;
import trailcross.orbit.Elements;

/** Node crossings and the quantities read from them, against direct geometric constructions. */
class EncounterTest {

    private static final ChebyshevCache EPHEMERIS = (ChebyshevCache) trailcross.ephemeris.Ephemerides.fast(null);
    private static final double KM_S = 86400 / Body.Constants.AU_KM;

    @Test
    void deltaRSigmaIsTheMediansStandardError() {
        // The sample median of n draws from a normal law of standard deviation s has standard error
        // sqrt(pi/2) s / sqrt(n) for large n (textbook asymptotics, e.g. Kendall & Stuart, vol. 1, from memory);
        // the bootstrap estimate of it must come within 25% (its own scatter at 200 resamples is ~10%).
        Well19937c rng = new Well19937c(42);
        int n = 400;
        double s = 3e-4;
        double[] v = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = 0.001 + s * rng.nextGaussian();
            w[i] = 1;
        }
        double sigma = TrailEncounter.bootstrapSigma(v, w, 9L);
        assertThat(sigma).isCloseTo(Math.sqrt(Math.PI / 2) * s / Math.sqrt(n), org.assertj.core.api.Assertions.withinPercentage(25));
        // Doubling every weight changes nothing; one crossing alone has no spread.
        double[] w2 = w.clone();
        java.util.Arrays.fill(w2, 2.0);
        assertThat(TrailEncounter.bootstrapSigma(v, w2, 9L)).isEqualTo(sigma);
        assertThat(TrailEncounter.bootstrapSigma(new double[] {0.001}, new double[] {1}, 9L)).isZero();
    }

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

    /**
     * A synthetic section: n crossings at λ = 235.30 + N(0, 0.01°), delta r = N(−0.0005, 0.0003) au, node
     * passages within 5 days of the Earth, node times t = tn + 3 (P0 − P) (a trail three revolutions old,
     * unperturbed: fM = 1/3).
     */
    private static List<Encounter> section(long seed, int n) {
        Well19937c rng = new Well19937c(seed);
        double tE = 7261.6;
        double p = 33.2 * 365.25;
        List<Encounter> list = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double dr = -0.0005 + 0.0003 * rng.nextGaussian();
            double lambda = 235.30 + 0.01 * rng.nextGaussian();
            double p0 = p + 2 * (rng.nextDouble() - 0.5);
            double t = tE + 3 * (p0 - p);
            NodeCrossing c = new NodeCrossing(k, tE - 8 * p - 3, 1e9, 1e-5, p0, t,
                    new double[] {0.9886 + dr, 0, 0, 0, 0, 0.01}, false);
            list.add(new Encounter(c, tE + 0.01 * k / n, dr, lambda, 10 * (rng.nextDouble() - 0.5),
                    new GeocentricRadiant(153.6, 21.8, 71.0, lambda)));
        }
        return list;
    }

    @Test
    void fmIsNotFlattenedByTheSectionsWindowInNodeTime() {
        // A trail three revolutions old (fM = 1/3) whose node times also scatter by 10 days with the other
        // ejection variables; the section keeps node passages within 10 days of the Earth, as TrailEncounter
        // chooses it. Fitting node time on P0 inside that window flattens the slope (fM came out near 1);
        // P0 on node time does not.
        double p = 33.2 * 365.25;
        TrailEncounter te = TrailEncounter.of(windowedSection(7, 3000), p, 2.5, EPHEMERIS);
        assertThat(te.fM()).isCloseTo(1.0 / 3, within(0.02));
    }

    /**
     * A section of a synthetic trail three revolutions old (fM = 1/3) whose node times also scatter by 10 days
     * with the other ejection variables, kept within 10 days of the Earth's passage as TrailEncounter chooses it.
     */
    private static List<Encounter> windowedSection(int seed, int size) {
        Well19937c rng = new Well19937c(seed);
        double tE = 7261.6;
        double p = 33.2 * 365.25;
        List<Encounter> list = new ArrayList<>();
        for (int k = 0; list.size() < size; k++) {
            double p0 = p + 40 * (rng.nextDouble() - 0.5);
            double t = tE + 3 * (p0 - p) + 10 * rng.nextGaussian();
            if (Math.abs(t - tE) > 10) {
                continue;
            }
            double dr = -0.0005 + 0.0003 * rng.nextGaussian();
            double lambda = 235.30 + 0.01 * rng.nextGaussian();
            NodeCrossing c = new NodeCrossing(k, tE - 8 * p - 3, 1e9, 1e-5, p0, t,
                    new double[] {0.9886 + dr, 0, 0, 0, 0, 0.01}, false);
            list.add(new Encounter(c, tE, dr, lambda, t - tE, new GeocentricRadiant(153.6, 21.8, 71.0, lambda)));
        }
        return list;
    }

    @Test
    void fmUncertaintyMatchesTheScatterOfIndependentSections() {
        // Twenty independent sections of the same synthetic trail (fM = 1/3, node times scattered 10 days by the
        // other ejection variables): the stated σ of fM must match the spread of fM from section to section.
        double p = 33.2 * 365.25;
        int runs = 20;
        double[] fm = new double[runs];
        double meanSigma = 0;
        for (int s = 0; s < runs; s++) {
            TrailEncounter te = TrailEncounter.of(windowedSection(100 + s, 300), p, 2.5, EPHEMERIS);
            fm[s] = te.fM();
            meanSigma += te.fMSigma() / runs;
        }
        double mean = java.util.Arrays.stream(fm).average().orElseThrow();
        double sd = Math.sqrt(java.util.Arrays.stream(fm).map(x -> (x - mean) * (x - mean)).sum() / (runs - 1));
        assertThat(mean).isCloseTo(1.0 / 3, within(3 * sd / Math.sqrt(runs) + 0.005));
        // The sample sd of 20 values is itself uncertain by about 16%: a factor 1.6 either way fails only when the
        // stated σ is wrong.
        assertThat(meanSigma).isBetween(sd / 1.6, sd * 1.6);
    }

    @Test
    void fmSlopeWeighsTheParticlesSoThatTheProposalDoesNotMoveIt() {
        // A trail section whose node time bends with the period offset x (t = 3x + 0.15x², days), drawn from
        // a proposal that puts 80% of the particles on x in [5, 15] and the rest on the prior, uniform on
        // [−20, 20], with importance weights prior/proposal. The weighted slope must give the prior's slope
        // (from a large plain sample) within its bootstrap σ; the unweighted slope, the proposal's, must not.
        Well19937c rng = new Well19937c(21);
        List<double[]> plain = new ArrayList<>();
        for (int i = 0; i < 200_000; i++) {
            double x = 40 * rng.nextDouble() - 20;
            plain.add(new double[] {3 * x + 0.15 * x * x + rng.nextGaussian(), x, 1});
        }
        double truth = TrailEncounter.slope(plain);
        List<double[]> drawn = new ArrayList<>();
        List<double[]> unweighted = new ArrayList<>();
        for (int i = 0; i < 20_000; i++) {
            double x = rng.nextDouble() < 0.2 ? 40 * rng.nextDouble() - 20 : 5 + 10 * rng.nextDouble();
            double q = 0.2 / 40 + (x >= 5 && x <= 15 ? 0.8 / 10 : 0);
            double t = 3 * x + 0.15 * x * x + rng.nextGaussian();
            drawn.add(new double[] {t, x, (1.0 / 40) / q});
            unweighted.add(new double[] {t, x, 1});
        }
        double sigma = TrailEncounter.slopeSigma(drawn, 5);
        assertThat(sigma).isPositive();
        assertThat(TrailEncounter.slope(drawn)).isCloseTo(truth, within(3 * sigma));
        assertThat(Math.abs(TrailEncounter.slope(unweighted) - truth)).isGreaterThan(3 * sigma);
    }

    @Test
    void densityPeakOfASyntheticCloudIsItsModeWithAnHonestUncertainty() {
        double p = 33.2 * 365.25;
        TrailEncounter t = TrailEncounter.of(section(99, 1500), p, 2.5, EPHEMERIS);
        assertThat(t.particles()).isEqualTo(1500);
        assertThat(t.deltaR()).isCloseTo(-0.0005, within(1e-4));
        assertThat(t.fM()).isCloseTo(1.0 / 3, within(1e-6));
        assertThat(t.raDeg()).isCloseTo(153.6, within(1e-9));
        assertThat(t.vgKmS()).isCloseTo(71.0, within(1e-9));
        assertThat(t.revolutions()).isEqualTo(8);
        // The profile's width: the section's Gaussian, the kernel removed.
        assertThat(t.fwhmHours()).isCloseTo(2.3548 * 0.01 * TrailEncounter.HOURS_PER_DEGREE, within(0.15 * 0.57));
        // The peak lies at the mode (235.30) within 4 of its stated sigmas, ...
        double sigmaDeg = t.peakSigmaMin() / 60 / TrailEncounter.HOURS_PER_DEGREE;
        assertThat(Math.abs(t.solarLongitudeDeg() - 235.30)).isLessThan(4 * sigmaDeg);
        // ... and that sigma is the real scatter of the peak: over 12 independent sections, the spread of
        // their peaks is within a factor 2 of the mean stated sigma.
        double[] peaks = new double[12];
        double meanSigma = 0;
        for (int k = 0; k < peaks.length; k++) {
            TrailEncounter e = TrailEncounter.of(section(1000 + k, 1500), p, 2.5, EPHEMERIS);
            peaks[k] = e.solarLongitudeDeg();
            meanSigma += e.peakSigmaMin() / 60 / TrailEncounter.HOURS_PER_DEGREE / peaks.length;
        }
        double spread = new org.apache.commons.math3.stat.descriptive.DescriptiveStatistics(peaks).getStandardDeviation();
        assertThat(spread).isBetween(0.5 * meanSigma, 2.0 * meanSigma);
        // The Earth's time at the peak longitude.
        double[] e = new double[3];
        EPHEMERIS.heliocentricPosition(Body.EARTH, t.peakT(), e);
        assertThat(SolarLongitude.degrees(e)).isCloseTo(t.solarLongitudeDeg(), within(1e-7));
    }

    @Test
    void zhrOfAUniformSlabIsItsFlux() {
        // Crossings spread uniformly over delta r in [-0.002, 0.002] au, lambda in [235.2, 235.4] deg and
        // node passages within 10 days of the Earth: the plane is crossed at a known rate per area and
        // time, N w / (area x 20 d); times Vg/|vz| the flux perpendicular to the meteors' path, and by
        // Koschack & Rendtel (1990; from memory) Q = ZHR (13.1 r - 16.45)(r - 1.3)^0.748 / 37200.
        Well19937c rng = new Well19937c(7);
        int n = 6000;
        double w = 1e9;
        double rE = 0.9886;
        double vzAuD = 0.01;
        List<Encounter> list = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double dr = -0.002 + 0.004 * rng.nextDouble();
            double lambda = 235.2 + 0.2 * rng.nextDouble();
            NodeCrossing c = new NodeCrossing(k, 0, w, 1e-5, 12000, 7261.6, new double[] {rE + dr, 0, 0, 0, 0, vzAuD}, false);
            list.add(new Encounter(c, 7261.6, dr, lambda, -10 + 20 * rng.nextDouble(),
                    new GeocentricRadiant(153.6, 21.8, 71.0, lambda)));
        }
        TrailEncounter t = TrailEncounter.of(list, 33.2 * 365.25, 2.5, EPHEMERIS);
        double au = Body.Constants.AU_KM;
        double areaKm2 = 0.004 * au * Math.toRadians(0.2) * rE * au;
        double plane = n * w / (areaKm2 * 20 * 24);
        double flux = plane * 71.0 / (vzAuD * au / 86400);
        double r = 2.5;
        double zhr = flux * 37200 / ((13.1 * r - 16.45) * Math.pow(r - 1.3, 0.748));
        assertThat(t.zhrSigma()).isBetween(0.02 * zhr, 0.3 * zhr);
        assertThat(t.zhr()).isCloseTo(zhr, within(4 * t.zhrSigma()));
        assertThat(t.ess()).isGreaterThan(30);
    }

    @Test
    void aCrossingJustAfterTheYearMeetsTheEarthInsideIt() {
        // A crossing on 2000 Jan 10 at the longitude the Earth passes on Nov 18: its nearest passage is
        // 1999 Nov 18; for a forecast of 2000 it is 2000 Nov 18.
        double nov18 = -43.5; // 1999-11-18 12h TDB
        double[] e = new double[6];
        EPHEMERIS.heliocentric(Body.EARTH, nov18, e);
        double lon = Math.atan2(e[1], e[0]);
        double[] state = {Math.cos(lon), Math.sin(lon), 0, 0, 0, -0.01};
        NodeCrossing c = new NodeCrossing(1, -9000, 1, 1e-6, 12000, 9.5, state, false);
        Encounter near = Encounter.of(c, EPHEMERIS);
        assertThat(near.earthT()).isCloseTo(nov18, within(0.01));
        Encounter in2000 = Encounter.of(c, EPHEMERIS, 0.5 - 1.0, 365.5);
        assertThat(in2000.earthT()).isBetween(-0.5, 365.5);
        assertThat(in2000.earthT() - nov18).isCloseTo(365.25, within(1.0));
        assertThat(in2000.daysAfterEarth()).isCloseTo(9.5 - in2000.earthT(), within(1e-9));
        Encounter in1999 = Encounter.of(c, EPHEMERIS, -365.5, -0.5);
        assertThat(in1999.earthT()).isCloseTo(nov18, within(0.01));
    }

    @Test
    void axisMeetingOfASyntheticFamily() {
        // A family whose exact meeting is known: node time minus the Earth's time 3 (x - x*) + 0.2 (x - x*)^2
        // days, x* = 1.234 d, the Earth's time T* + 0.0005 (x - x*), delta r -0.0007 + 0.0001 (x - x*).
        double xs = 1.234;
        double ts = 7261.6;
        List<AxisMeeting.Point> pts = new ArrayList<>();
        for (int k = 0; k <= 20; k++) {
            double x = -5 + 0.5 * k;
            double d = x - xs;
            double earth = ts + 0.0005 * d;
            pts.add(new AxisMeeting.Point(x, earth + 3 * d + 0.2 * d * d, earth, -0.0007 + 0.0001 * d, 235.29 + 1e-4 * d));
        }
        List<AxisMeeting.Root> roots = AxisMeeting.of(pts, 1.0);
        assertThat(roots).hasSize(1);
        AxisMeeting.Root r = roots.get(0);
        assertThat(r.offsetDays()).isCloseTo(xs, within(1e-3));
        assertThat(r.peakT()).isCloseTo(ts, within(1e-6));
        assertThat(r.deltaR()).isCloseTo(-0.0007, within(1e-7));
        assertThat(r.solarLongitudeDeg()).isCloseTo(235.29, within(1e-6));
        // fM = 1/|d t_node/dx| at the root: d/dx [earth + 3d + 0.2 d^2] = 0.0005 + 3.
        assertThat(r.fM()).isCloseTo(1 / 3.0005, within(1e-3));
        // A gap in the family splits it: no root is taken across it.
        List<AxisMeeting.Point> gapped = new ArrayList<>(pts);
        gapped.removeIf(q -> q.offsetDays() > 0 && q.offsetDays() < 3);
        assertThat(AxisMeeting.of(gapped, 1.0)).isEmpty();
    }

    private static double gauss(Well19937c r) {
        return r.nextGaussian();
    }
}
