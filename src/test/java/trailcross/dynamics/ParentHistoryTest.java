package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;
import trailcross.stream.ParentBody;
import trailcross.time.Epoch;
import trailcross.time.EpochParser;
import trailcross.time.TimeScale;
import trailcross.time.TimeScales;

class ParentHistoryTest {

    private static final double GM = Body.SUN.gm();

    private static ParentBody parent(String name, String epoch, String perihelion, double q, double e, double peri,
            double node, double i, double a1, double a2, double a3) {
        Epoch ep = EpochParser.parse(epoch);
        Epoch tp = EpochParser.parse(perihelion);
        return new ParentBody(name, ep, Elements.ofDegrees(q, e, i, node, peri, tp.jd(), GM), a1, a2, a3, 1, 500,
                null, null);
    }

    private static double tt(Perihelion p) {
        double[] t = TimeScales.fromTdb(Epoch.ofDaysSinceJ2000(p.t()), TimeScale.TT);
        return t[0] + t[1];
    }

    @Test
    void giacobiniZinner2012To2018() {
        // IMCCE note 0013 (../shared/REFERENCES.md): 21P's 2012 solution with A1, A2, A3 (1e-8 au/d²),
        // integrated by IMCCE to the next perihelion: 2018 Sep 10.95559 TT, q 1.0127516, e 0.7105542,
        // ω 172.8620232, Ω 195.3926044, i 31.9980091.
        ParentBody gz = parent("21P", "JD 2455968.5 TT", "2012 Feb 11.73325 TT", 1.0305054, 0.7070620, 172.6017114,
                195.3966798, 31.9107682, 0.35827e-8, 0.18945e-8, -0.06096e-8);
        double from = gz.epoch().daysSinceJ2000();
        ParentHistory h = ParentHistory.compute(gz, SharedEphemeris.FORCES, 1e-10, from, from + 7.5 * 365.25);
        Perihelion p = h.perihelia().stream().filter(x -> x.t() > 6000).findFirst().orElseThrow();
        double published = EpochParser.parse("2018 Sep 10.95559 TT").jd();
        double[] ttNow = {tt(p)};
        System.out.printf("21P 2018: T %+.4f d, q %+.2e au, e %+.2e, ω %+.5f°, Ω %+.5f°, i %+.5f°%n",
                p.t() + 2451545 - published, p.elements().q() - 1.0127516, p.elements().e() - 0.7105542,
                Math.toDegrees(p.elements().peri()) - 172.8620232, Math.toDegrees(p.elements().node()) - 195.3926044,
                Math.toDegrees(p.elements().i()) - 31.9980091);
        assertThat(ttNow[0]).isCloseTo(EpochParser.parse("2018 Sep 10.95559 TDB").jd(), within(0.01));
        assertThat(p.elements().q()).isCloseTo(1.0127516, within(1e-5));
        assertThat(p.elements().e()).isCloseTo(0.7105542, within(1e-5));
        assertThat(Math.toDegrees(p.elements().peri())).isCloseTo(172.8620232, within(1e-3));
        assertThat(Math.toDegrees(p.elements().node())).isCloseTo(195.3926044, within(1e-3));
        assertThat(Math.toDegrees(p.elements().i())).isCloseTo(31.9980091, within(1e-3));
    }

    @Test
    void tempelTuttleBackTo1965() {
        // JPL solution J985/69 for 55P (../shared/REFERENCES.md) integrated back: the 1965 perihelion of
        // IMCCE note 0160 is 1965 Apr 30.00784 TT (q 0.9816266, e 0.9044429, i 162.7065579).
        ParentBody tt = parent("55P", "JD 2451040.5 TDB", "JD 2450872.5977341123 TDB", 0.9764279154675056,
                0.9055527209724122, 172.5002736828059, 235.270989149082, 162.4865753794343, 1.580981463194e-9,
                9.186415933073e-11, 0);
        double epoch = tt.epoch().daysSinceJ2000();
        ParentHistory h = ParentHistory.compute(tt, SharedEphemeris.FORCES, 1e-10, epoch - 36 * 365.25, epoch);
        List<Perihelion> ps = h.perihelia();
        Perihelion p1965 = ps.stream().filter(x -> x.t() < -10000 && x.t() > -14000).findFirst().orElseThrow();
        double published = EpochParser.parse("1965 Apr 30.00784 TT").jd();
        System.out.printf("55P 1965: T %+.4f d, q %+.2e au, e %+.2e, i %+.5f°%n", tt(p1965) - published,
                p1965.elements().q() - 0.9816266, p1965.elements().e() - 0.9044429,
                Math.toDegrees(p1965.elements().i()) - 162.7065579);
        assertThat(tt(p1965)).isCloseTo(published, within(0.05));
        assertThat(p1965.elements().q()).isCloseTo(0.9816266, within(1e-4));
        // The 1998 perihelion comes back from the epoch, where the elements give it.
        Perihelion p1998 = ps.get(ps.size() - 1);
        assertThat(p1998.t() + 2451545).isCloseTo(2450872.5977341123, within(0.01));
    }

    @Test
    void halleyBackTo1910() {
        // JPL solution 74 for 1P (../shared/REFERENCES.md) integrated back to 1910: perihelion 1910 Apr 20.18 TT
        // (Yeomans & Kiang 1981, recalled from memory, hence the 0.1-day tolerance).
        ParentBody halley = parent("1P", "JD 2439907.5 TDB", "JD 2446469.6983372075 TDB", 0.575157544193894,
                0.9679221169240834, 112.2128395742619, 59.07198712310091, 162.1951462980701, 4.887227714062e-10,
                1.554720848799e-10, 0);
        double epoch = halley.epoch().daysSinceJ2000();
        ParentHistory h = ParentHistory.compute(halley, SharedEphemeris.FORCES, 1e-10, epoch - 60 * 365.25, epoch);
        Perihelion p = h.perihelia().get(0);
        double published = EpochParser.parse("1910 Apr 20.18 TT").jd();
        System.out.printf("1P 1910: T %+.4f d%n", tt(p) - published);
        assertThat(tt(p)).isCloseTo(published, within(0.1));
    }

    @Test
    void stateAtFollowsTheDenseOutput() {
        ParentBody tt = parent("55P", "JD 2451040.5 TDB", "JD 2450872.5977341123 TDB", 0.9764279154675056,
                0.9055527209724122, 172.5002736828059, 235.270989149082, 162.4865753794343, 0, 0, 0);
        double epoch = tt.epoch().daysSinceJ2000();
        ParentHistory h = ParentHistory.compute(tt, SharedEphemeris.FORCES, 1e-10, epoch - 400, epoch + 400);
        double[] s = new double[6];
        h.stateAt(epoch, s);
        double[] osc = tt.elements().stateAt(tt.epoch().jd()).toArray();
        for (int k = 0; k < 6; k++) {
            assertThat(s[k]).isCloseTo(osc[k], within(1e-13));
        }
        double[] before = new double[6];
        double[] after = new double[6];
        h.stateAt(epoch - 200, before);
        h.stateAt(epoch - 200 + 1e-7, after);
        assertThat(Math.abs(after[0] - before[0])).isLessThan(1e-7 * 0.05);
    }
}
