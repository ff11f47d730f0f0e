package trailcross.time;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

class TimeScalesTest {

    private static final double US = 1e-6 / 86400.0;

    @Test
    void sofaUtcToTaiToTtToTdbTestValues() {
        // Source: IAU SOFA's own test program t_sofa_c.c (recalled from memory): iauUtctai(2453750.5,
        // 0.892100694) → 0.8924826384444444444.
        Epoch fromUtc = TimeScales.toTdb(TimeScale.UTC, 2453750.5, 0.892100694);
        double[] tai = TimeScales.fromTdb(fromUtc, TimeScale.TAI);
        assertThat((tai[0] - 2453750.5) + tai[1]).isCloseTo(0.8924826384444444444, within(2e-11));
        Epoch fromTai = TimeScales.toTdb(TimeScale.TAI, 2453750.5, 0.892482639);
        double[] tt = TimeScales.fromTdb(fromTai, TimeScale.TT);
        // TT = TAI + 32.184 s exactly (IAU 1991 Resolution A4).
        assertThat((tt[0] - 2453750.5) + tt[1]).isCloseTo(0.892482639 + 32.184 / 86400, within(2e-11));
        // TDB − TT: the Fairhead & Bretagnon (1990) series of iauDtdb at the geocentre (JSOFA reference).
        Epoch fromTt = TimeScales.toTdb(TimeScale.TT, 2453750.5, 0.892855139);
        double dtdb = JSOFA.jauDtdb(2453750.5, 0.892855139, 0.0, 0.0, 0.0, 0.0);
        assertThat(fromTt.daysFrom(new Epoch(2453750.5, 0.892855139)) * 86400).isCloseTo(dtdb, within(1e-9));
    }

    @Test
    void sofaTimeScaleCookbookExample() {
        // Source: IAU SOFA "Time Scale and Calendar Tools" cookbook, worked example (from memory):
        // UTC 2006-01-15 21:24:37.500 → TAI 21:25:10.500, TT 21:25:42.684, TDB 21:25:42.684373.
        Epoch e = EpochParser.parse("2006-01-15T21:24:37.5Z");
        assertThat(EpochFormat.iso(e, TimeScale.TAI, 3)).isEqualTo("2006-01-15T21:25:10.500");
        assertThat(EpochFormat.iso(e, TimeScale.TT, 3)).isEqualTo("2006-01-15T21:25:42.684");
        double[] tdb = TimeScales.fromTdb(e, TimeScale.TDB);
        double secondsOfDay = ((tdb[0] - 0.5 - Math.floor(tdb[0] - 0.5)) + tdb[1]) * 86400.0;
        assertThat(secondsOfDay).isCloseTo(21 * 3600 + 25 * 60 + 42.684373, within(3e-6));
    }

    @Test
    void agreesWithJsofaChainAtManyDates() {
        // Reference: JSOFA (IAU SOFA) called directly, UTC → TAI → TT → TDB.
        for (int year = 1961; year <= 2100; year += 7) {
            double[] utc = {cal(year, 3, 14), 0.3712};
            JSOFA.JulianDate tai = jsofa(() -> JSOFA.jauUtctai(utc[0], utc[1]));
            JSOFA.JulianDate tt = JSOFA.jauTaitt(tai.djm0, tai.djm1);
            double dtdb = JSOFA.jauDtdb(tt.djm0, tt.djm1, 0.3712, 0, 0, 0);
            JSOFA.JulianDate tdb = JSOFA.jauTttdb(tt.djm0, tt.djm1, dtdb);
            Epoch e = TimeScales.toTdb(TimeScale.UTC, utc[0], utc[1]);
            assertThat(e.daysFrom(new Epoch(tdb.djm0, tdb.djm1))).as("year %d", year).isCloseTo(0, within(0.01 * US));
            double[] back = TimeScales.fromTdb(e, TimeScale.UTC);
            assertThat((back[0] - utc[0]) + (back[1] - utc[1])).isCloseTo(0, within(0.01 * US));
        }
    }

    @Test
    void ttMinusUtcAfterTheLastLeapSecond() {
        // TAI − UTC = 37 s since 2017 January 1 (IERS Bulletin C 52), TT − TAI = 32.184 s.
        Epoch e = EpochParser.parse("2031-11-17T04:12:00Z");
        Epoch tt = EpochParser.parse("2031-11-17T04:13:09.184 TT");
        assertThat(e.daysFrom(tt) * 86400).isCloseTo(0, within(1e-6));
    }

    @Test
    void beforeUtcUsesDeltaT() {
        // 1899 Nov 15: UT = TT − ΔT, ΔT ≈ −2.8 s around 1900 (Espenak & Meeus 2006 tabulation).
        Epoch ut = EpochParser.parse("1899-11-15T00:00:00Z");
        Epoch tt = EpochParser.parse("1899-11-15T00:00:00 TT");
        double dt = ut.daysFrom(tt) * 86400;
        assertThat(dt).isCloseTo(DeltaT.seconds(ut.julianYear()), within(1e-3));
        assertThat(EpochFormat.utc(ut, 0)).isEqualTo("1899-11-15T00:00:00Z");
    }

    @Test
    void deltaTMatchesTabulatedValuesAndIsContinuous() {
        // Espenak & Meeus (2006), Table 1 (observed ΔT, from memory): 1900: −2.8 s, 1950: 29.1 s, 1800: 13.7 s.
        assertThat(DeltaT.seconds(1900.0)).isCloseTo(-2.8, within(0.2));
        assertThat(DeltaT.seconds(1950.0)).isCloseTo(29.1, within(0.2));
        assertThat(DeltaT.seconds(1800.0)).isCloseTo(13.7, within(0.2));
        for (double y : new double[] {1600, 1700, 1800, 1860, 1900, 1920, 1941, 1961, 1986, 2005}) {
            assertThat(DeltaT.seconds(y - 1e-9)).as("year %s", y).isCloseTo(DeltaT.seconds(y), within(0.8));
        }
    }

    private static double cal(int y, int m, int d) {
        JSOFA.JulianDate jd = jsofa(() -> JSOFA.jauCal2jd(y, m, d));
        return jd.djm0 + jd.djm1;
    }

    private interface Call {
        JSOFA.JulianDate run() throws Exception;
    }

    private static JSOFA.JulianDate jsofa(Call c) {
        try {
            return c.run();
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }
}
