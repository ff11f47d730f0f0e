package trailcross.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.jastronomy.jsofa.JSOFA;

/** The calendar year's start and the year of an instant, against IAU SOFA's iauCal2jd (JSOFA). */
class ParentReturnsTest {

    @Test
    void yearStartIsSofasJanuaryFirst() throws Exception {
        for (int y = -4000; y <= 9000; y += 7) {
            JSOFA.JulianDate jd = JSOFA.jauCal2jd(y, 1, 1);
            double sofa = jd.djm0 + jd.djm1 - 2451545.0;
            assertThat(ParentReturns.yearStart(y)).as("year %d", y).isEqualTo(sofa);
            assertThat(ParentReturns.yearOf(sofa)).isEqualTo(y);
            assertThat(ParentReturns.yearOf(sofa - 1e-6)).isEqualTo(y - 1);
        }
        // Beyond SOFA's calendar the start is still a number (the ephemeris' span check then speaks).
        assertThat(ParentReturns.yearStart(99999)).isGreaterThan(ParentReturns.yearStart(9999));
    }
}
