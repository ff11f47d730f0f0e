package trailcross.ephemeris;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class JplDeFileTest {

    @TempDir
    Path tmp;

    /**
     * JPL's own test points (../shared/jpl/testpo.NNN, lines of JPL's testpo files): every line whose date
     * falls inside one of the excerpts of that DE must be reproduced to 1e-13 au (au/day for rates).
     */
    @Test
    void reproducesJplTestPoints() throws IOException {
        int checked = 0;
        checked += check("testpo.440", "de440-excerpt-1999-2000.440", "de440-excerpt-2023.440");
        checked += check("testpo.431", "de431-excerpt-1999-2000.431");
        checked += check("testpo.405", "de405-excerpt-1969a.405", "de405-excerpt-1969b.405",
                "de405-excerpt-1970.405", "de405-excerpt-2003.405");
        // testpo.431 has 5 points in the DE431 excerpt, testpo.405 7 in the DE405 2003 excerpt; testpo.440
        // dates (2007–2008) fall outside the DE440 excerpts.
        assertThat(checked).as("test points inside the excerpts").isEqualTo(12);
    }

    private int check(String testpo, String... excerpts) throws IOException {
        List<JplDeFile> files = new ArrayList<>();
        for (String e : excerpts) {
            files.add(new JplDeFile(SharedJpl.file(e)));
        }
        int n = 0;
        for (String line : Files.readAllLines(SharedJpl.file(testpo))) {
            String[] w = line.trim().split("\\s+");
            if (w.length < 7 || !w[0].matches("\\d+")) {
                continue;
            }
            double jd = Double.parseDouble(w[2]);
            int target = Integer.parseInt(w[3]);
            int centre = Integer.parseInt(w[4]);
            int coord = Integer.parseInt(w[5]);
            double value = Double.parseDouble(w[6]);
            for (JplDeFile f : files) {
                if (jd >= f.startJd() && jd <= f.endJd()) {
                    double computed = TestPoint.value(f, jd, target, centre, coord);
                    assertThat(computed).as("%s JD %s %d-%d coord %d", testpo, jd, target, centre, coord)
                            .isCloseTo(value, within(1e-13));
                    n++;
                    break;
                }
            }
        }
        return n;
    }

    @Test
    void headerIsReadInBothByteOrders() {
        // DE440 excerpt is little-endian, DE405 big-endian; header constants of DE440 (Park et al. 2021).
        JplDeFile de440 = new JplDeFile(SharedJpl.file("de440-excerpt-2023.440"));
        assertThat(de440.denum()).isEqualTo(440);
        assertThat(de440.constant("AU")).isEqualTo(149597870.7);
        assertThat(de440.constant("EMRAT")).isCloseTo(81.3005682214972154, within(1e-12));
        assertThat(de440.constant("GM5")).isCloseTo(Body.JUPITER.gm(), within(1e-20));
        JplDeFile de405 = new JplDeFile(SharedJpl.file("de405-excerpt-2003.405"));
        assertThat(de405.denum()).isEqualTo(405);
        assertThat(de405.constant("AU")).isEqualTo(149597870.691);
    }

    @Test
    void badFilesGiveOneLineErrors() throws IOException {
        Path foreign = tmp.resolve("foreign.bin");
        Files.write(foreign, new byte[8000]);
        assertThatThrownBy(() -> new JplDeFile(foreign)).hasMessage(foreign + ": not a JPL DE ephemeris"
                + " (no plausible DE number in either byte order)");
        byte[] whole = Files.readAllBytes(SharedJpl.file("de440-excerpt-2023.440"));
        Path truncated = tmp.resolve("truncated.440");
        Files.write(truncated, java.util.Arrays.copyOf(whole, whole.length - 5000));
        assertThatThrownBy(() -> new JplDeFile(truncated)).hasMessageContaining(truncated + ": truncated");
        Path missing = tmp.resolve("none.440");
        assertThatThrownBy(() -> new JplDeFile(missing)).hasMessage(missing + ": no such file");
        JplDeFile ok = new JplDeFile(SharedJpl.file("de440-excerpt-2023.440"));
        assertThatThrownBy(() -> ok.evaluate(0, 2451545.0, 0, new double[6]))
                .hasMessageContaining("outside its span");
    }

    /** A JPL test point: target minus centre, JPL numbering (1–13), coordinate 1–6. */
    static final class TestPoint {
        private TestPoint() {
        }

        static double value(JplDeFile f, double jd, int target, int centre, int coord) {
            if (target == 14 || target == 15) {
                int item = target == 14 ? 11 : 12;
                double[] v = new double[6];
                f.evaluate(item, jd, 0, v);
                return v[coord - 1];
            }
            double[] a = state(f, jd, target);
            double[] b = state(f, jd, centre);
            return a[coord - 1] - b[coord - 1];
        }

        static double[] state(JplDeFile f, double jd, int body) {
            double au = f.constant("AU");
            double emrat = f.constant("EMRAT");
            double[] s = new double[6];
            if (body == 12 || body == 0) {
                return s;
            }
            if (body == 3 || body == 10) {
                double[] moon = new double[6];
                f.evaluate(2, jd, 0, s);
                f.evaluate(9, jd, 0, moon);
                for (int k = 0; k < 6; k++) {
                    s[k] -= moon[k] / (1 + emrat);
                    if (body == 10) {
                        s[k] += moon[k];
                    }
                }
            } else {
                int item = body == 13 ? 2 : body == 11 ? 10 : body - 1;
                f.evaluate(item, jd, 0, s);
            }
            for (int k = 0; k < 6; k++) {
                s[k] /= au;
            }
            return s;
        }
    }
}
