package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

class EphemerisCommandTest {

    @Test
    void oneStateHasTheDesignColumns() {
        MainTest.Run r = MainTest.run("ephemeris", "earth", "--at", "2000-01-01T12:00:00 TDB");
        assertThat(r.code()).isZero();
        String[] lines = r.out().strip().split("\n");
        assertThat(lines[0]).isEqualTo("time_tdb,x_au,y_au,z_au,vx_au_d,vy_au_d,vz_au_d");
        assertThat(lines).hasSize(2);
        String[] v = lines[1].split(",");
        assertThat(v[0]).isEqualTo("2000-01-01T12:00:00.000");
        // The Earth at J2000.0 is at ~0.983 au, ecliptic longitude ~100.4° (Sun at λ☉ ≈ 280.4°;
        // Astronomical Almanac 2000, from memory).
        double x = Double.parseDouble(v[1]);
        double y = Double.parseDouble(v[2]);
        assertThat(Math.hypot(x, y)).isCloseTo(0.9833, within(2e-4));
        assertThat(Math.toDegrees(Math.atan2(y, x)) + 360 - 180).isCloseTo(280.37, within(0.02));
    }

    @Test
    void tableAndEquatorialFrame() {
        MainTest.Run ecl = MainTest.run("ephemeris", "mars", "--from", "2023-02-01 TDB", "--to", "2023-02-02 TDB",
                "--step", "0.5");
        MainTest.Run eq = MainTest.run("ephemeris", "mars", "--from", "2023-02-01 TDB", "--to", "2023-02-02 TDB",
                "--step", "0.5", "--frame", "equatorial");
        assertThat(ecl.out().strip().split("\n")).hasSize(4);
        String[] a = ecl.out().strip().split("\n")[1].split(",");
        String[] b = eq.out().strip().split("\n")[1].split(",");
        double ra = Math.sqrt(sq(a[1]) + sq(a[2]) + sq(a[3]));
        double rb = Math.sqrt(sq(b[1]) + sq(b[2]) + sq(b[3]));
        assertThat(rb).isCloseTo(ra, within(1e-14));
        assertThat(Double.parseDouble(b[1])).isEqualTo(Double.parseDouble(a[1]));
    }

    @Test
    void jplFileGivesTheSameEarthToFortyFiveKm() {
        Path de = Path.of("..", "shared", "jpl", "de440-excerpt-2023.440");
        Assumptions.assumeTrue(Files.isRegularFile(de), "../shared/jpl/ is absent");
        MainTest.Run jpl = MainTest.run("ephemeris", "earth", "--at", "2023-02-01 TDB", "--ephemeris", de.toString());
        MainTest.Run vsop = MainTest.run("ephemeris", "earth", "--at", "2023-02-01 TDB");
        String[] a = jpl.out().strip().split("\n")[1].split(",");
        String[] b = vsop.out().strip().split("\n")[1].split(",");
        double d = Math.sqrt(Math.pow(Double.parseDouble(a[1]) - Double.parseDouble(b[1]), 2)
                + Math.pow(Double.parseDouble(a[2]) - Double.parseDouble(b[2]), 2)
                + Math.pow(Double.parseDouble(a[3]) - Double.parseDouble(b[3]), 2));
        assertThat(d).isLessThan(3e-7);
    }

    @Test
    void badInputIsOneLineExitTwoAndNoHalfTable() {
        String[][] cases = {
            {"ephemeris", "pluto", "--at", "2023-02-01 TDB"},
            {"ephemeris", "earth", "--at", "2023-02-01"},
            {"ephemeris", "earth", "--at", "2023-02-01 TDB", "--frame", "galactic"},
            {"ephemeris", "earth", "--from", "2900-01-01 TDB", "--to", "3100-01-01 TDB", "--step", "100"},
            {"ephemeris", "earth", "--at", "2023-02-01 TDB", "--ephemeris", "README.md"},
            {"ephemeris", "earth", "--at", "2023-02-01 TDB", "--ephemeris", "no-such.440"},
            {"ephemeris", "earth"},
        };
        for (String[] c : cases) {
            MainTest.Run r = MainTest.run(c);
            assertThat(r.code()).as(String.join(" ", c)).isEqualTo(Main.BAD_INPUT);
            assertThat(r.err().strip().lines().count()).as(r.err()).isEqualTo(1);
            assertThat(r.out()).as(String.join(" ", c)).isEmpty();
        }
    }

    private static double sq(String s) {
        double v = Double.parseDouble(s);
        return v * v;
    }
}
