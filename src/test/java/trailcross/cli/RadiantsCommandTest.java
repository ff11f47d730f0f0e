package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code trailcross radiants}: the observers' table, and its bad-input messages. */
class RadiantsCommandTest {

    @TempDir
    Path dir;

    @Test
    void leonidTableFromTheParentsOrbit() throws IOException {
        Path out = dir.resolve("radiants.csv");
        MainTest.Run r = MainTest.run("radiants", "validation/55p-tempel-tuttle.toml", "--year", "1999", "--out", out.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("daily drift: RA +");
        List<String> lines = Files.readAllLines(out);
        assertThat(lines.get(0)).isEqualTo("date_utc,solar_longitude_deg,ra_deg,dec_deg,vg_km_s");
        assertThat(lines).hasSize(12);
        // 1999 Nov 18 0h UTC: the observed video radiant of the storm, alpha 153.65, delta +21.80 (IMO
        // quick-look analysis, ../shared/REFERENCES.md [R]), within 0.5 deg; Vg of the Leonids 70.3 km/s
        // (IAU MDC J23) within 1.5 km/s.
        String row = lines.stream().filter(l -> l.startsWith("1999-11-18T00:00:00Z")).findFirst().orElseThrow();
        String[] c = row.split(",");
        assertThat(Double.parseDouble(c[2])).isCloseTo(153.65, within(0.5));
        assertThat(Double.parseDouble(c[3])).isCloseTo(21.80, within(0.5));
        assertThat(Double.parseDouble(c[4])).isCloseTo(70.3, within(1.5));
        // Rows one day apart: the solar longitude advances by about a degree a day.
        double l1 = Double.parseDouble(lines.get(1).split(",")[1]);
        double l2 = Double.parseDouble(lines.get(2).split(",")[1]);
        assertThat(l2 - l1).isCloseTo(1.0, within(0.05));
    }

    @Test
    void badInputsSaySo() throws IOException {
        Path empty = dir.resolve("empty.csv");
        Files.writeString(empty, String.join(",", trailcross.ejection.MeteoroidFile.HEADER) + "\n");
        MainTest.Run e = MainTest.run("radiants", "streams/lysandre.toml", "--year", "2027", "--cloud", empty.toString());
        assertThat(e.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(e.err()).contains(empty + ": no particles");
        MainTest.Run y = MainTest.run("radiants", "streams/lysandre.toml", "--year", "3500");
        assertThat(y.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(y.err()).contains("outside the span");
    }
}
