package trailcross.time;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class EpochParserTest {

    private static final double MS = 1e-3 / 86400.0;

    @Test
    void formsOfTheSameInstantAgree() {
        Epoch iso = EpochParser.parse("2000-01-01T12:00:00 TDB");
        assertThat(iso.jd()).isEqualTo(2451545.0);
        assertThat(EpochParser.parse("JD 2451545.0 TDB").daysFrom(iso)).isZero();
        assertThat(EpochParser.parse("MJD 51544.5 TDB").daysFrom(iso)).isZero();
        assertThat(EpochParser.parse("2000 Jan 1.5 TDB").daysFrom(iso)).isCloseTo(0, within(1e-12));
        assertThat(EpochParser.parse("2000-01-01T12:00 tdb").daysFrom(iso)).isZero();
    }

    @Test
    void tradeFractionalDay() {
        // 55P's 1998 perihelion as JPL gives it: JD 2450872.5977341123 TDB = 1998 Feb 28.0977341 TDB
        // (../shared/REFERENCES.md, JPL solution J985/69).
        Epoch e = EpochParser.parse("1998 Feb 28.0977341123 TDB");
        assertThat(e.jd()).isCloseTo(2450872.5977341123, within(1e-9));
        Epoch f = EpochParser.parse("1998 February 28.0977 TT");
        assertThat(f.daysFrom(e)).isCloseTo(0, within(1e-4));
    }

    @Test
    void zuluAndUtcAreTheSame() {
        assertThat(EpochParser.parse("2031-11-17T04:12:00Z"))
                .isEqualTo(EpochParser.parse("2031-11-17T04:12:00 UTC"));
    }

    @Test
    void leapSecondIsAValidUtcTime() {
        // 2016 Dec 31 23:59:60 UTC was a leap second (IERS Bulletin C 52).
        Epoch leap = EpochParser.parse("2016-12-31T23:59:60Z");
        Epoch next = EpochParser.parse("2017-01-01T00:00:00Z");
        assertThat(next.daysFrom(leap) * 86400).isCloseTo(1.0, within(1e-6));
        assertThat(EpochFormat.utc(leap, 1)).isEqualTo("2016-12-31T23:59:60.0Z");
    }

    @Test
    void formatRoundTrip() {
        Epoch e = EpochParser.parse("1999-11-18T02:02:00Z");
        assertThat(EpochFormat.utc(e, 0)).isEqualTo("1999-11-18T02:02:00Z");
        assertThat(EpochParser.parse(EpochFormat.tdb(e, 6)).daysFrom(e)).isCloseTo(0, within(MS));
    }

    @Test
    void missingScaleIsAnErrorThatListsTheScales() {
        assertThatThrownBy(() -> EpochParser.parse("2031-11-17T04:12:00"))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("no time scale")
                .hasMessageContaining("Z, UTC, TAI, TT, TDB");
        assertThatThrownBy(() -> EpochParser.parse("JD 2451545.0"))
                .hasMessageContaining("no time scale");
        assertThatThrownBy(() -> EpochParser.parse("2031-11-17T04:12:00 GPS"))
                .hasMessageContaining("unknown time scale 'GPS'");
        assertThatThrownBy(() -> EpochParser.parse("yesterday"))
                .hasMessageContaining("cannot read time");
        assertThatThrownBy(() -> EpochParser.parse("2031-13-17T04:12:00Z"))
                .hasMessageContaining("not a valid date");
    }

    @Test
    void daysPastTheMonthHour24AndMisplacedLeapSecondsAreErrors() {
        // Gregorian month lengths (common practice): 1998 and 1900 have no Feb 29, 2000 has.
        assertThatThrownBy(() -> EpochParser.parse("1998 Feb 30.0 TT")).hasMessageContaining("day 30 is not in 1998-02 (1..28)");
        assertThatThrownBy(() -> EpochParser.parse("1900-02-29T00:00:00 TT")).hasMessageContaining("not a valid date");
        assertThat(EpochParser.parse("2000-02-29T00:00:00 TT").daysFrom(EpochParser.parse("2000-02-28T00:00:00 TT")))
                .isCloseTo(1.0, within(MS));
        assertThatThrownBy(() -> EpochParser.parse("2031-04-31T00:00:00Z")).hasMessageContaining("not a valid date");
        assertThatThrownBy(() -> EpochParser.parse("2031-11-17T24:00:00Z")).hasMessageContaining("hour must be 0..23");
        assertThatThrownBy(() -> EpochParser.parse("2031-11-17T23:60:00Z")).hasMessageContaining("minute 0..59");
        // A leap second only where IERS inserted one: 2016 Dec 31 (Bulletin C 52), not 2016 Jun 30.
        assertThat(EpochParser.parse("2016-12-31T23:59:60.5Z")).isNotNull();
        assertThatThrownBy(() -> EpochParser.parse("2016-06-30T23:59:60Z")).hasMessageContaining("not a valid date");
        assertThatThrownBy(() -> EpochParser.parse("2016-12-31T23:59:61Z")).hasMessageContaining("not a valid date");
    }
}
