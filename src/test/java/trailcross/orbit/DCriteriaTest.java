package trailcross.orbit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The D-criteria: their angular terms against a direct vector construction (I21 the angle between the
 * orbit normals, Π21 the difference of the perihelion arguments counted from the mutual node, θ21 the
 * angle between the perihelion directions), which the published trigonometric forms (Southworth &amp;
 * Hawkins 1963; Drummond 1981) must equal, on random pairs; and the criteria's assembled forms.
 */
class DCriteriaTest {

    private static final double GM = 2.9591220828411956e-4;

    @Test
    void trigonometricFormsEqualTheVectorGeometry() {
        SplittableRandom r = new SplittableRandom(1963);
        for (int k = 0; k < 2000; k++) {
            Elements a = random(r);
            Elements b = random(r);
            double[] pa = a.axes();
            double[] pb = b.axes();
            double[] na = cross(pa, 0, pa, 3);
            double[] nb = cross(pb, 0, pb, 3);
            double i21 = Math.acos(Math.max(-1, Math.min(1, dot(na, nb))));
            assertThat(DCriteria.twoSinHalfI21(a, b)).isCloseTo(2 * Math.sin(i21 / 2), within(1e-12));
            // The mutual node N = na x nb; each perihelion's angle from N in its own plane.
            double[] n = cross(na, 0, nb, 0);
            double len = Math.sqrt(dot(n, n));
            n = new double[] {n[0] / len, n[1] / len, n[2] / len};
            double wa = Math.atan2(dot(cross(n, 0, new double[] {pa[0], pa[1], pa[2]}, 0), na), dot(n, pa));
            double wb = Math.atan2(dot(cross(n, 0, new double[] {pb[0], pb[1], pb[2]}, 0), nb), dot(n, pb));
            double pi21 = DCriteria.pi21(a, b, DCriteria.twoSinHalfI21(a, b));
            assertThat(Math.abs(Math.sin((pi21 - (wb - wa)) / 2))).as("pair %d", k).isLessThan(1e-9);
            double theta = Math.acos(Math.max(-1, Math.min(1, dot(pa, pb))));
            double[] la = DCriteria.perihelionDirection(a);
            double[] lb = DCriteria.perihelionDirection(b);
            double thetaTrig = Math.acos(Math.max(-1, Math.min(1, Math.cos(la[1]) * Math.cos(lb[1]) * Math.cos(lb[0] - la[0])
                    + Math.sin(la[1]) * Math.sin(lb[1]))));
            assertThat(thetaTrig).isCloseTo(theta, within(1e-7));
        }
    }

    @Test
    void assembledCriteria() {
        Elements a = Elements.ofDegrees(0.98, 0.90, 160.0, 235.0, 172.0, 2451545.0, GM);
        assertThat(DCriteria.southworthHawkins(a, a)).isZero();
        assertThat(DCriteria.drummond(a, a)).isZero();
        assertThat(DCriteria.jopek(a, a)).isZero();
        // Only q differs: D_SH = |dq|, D_H = |dq|/(q1 + q2), D' = |dq|/(q1 + q2) (the three definitions).
        Elements b = Elements.ofDegrees(0.88, 0.90, 160.0, 235.0, 172.0, 2451545.0, GM);
        assertThat(DCriteria.southworthHawkins(a, b)).isCloseTo(0.10, within(1e-12));
        assertThat(DCriteria.jopek(a, b)).isCloseTo(0.10 / 1.86, within(1e-12));
        assertThat(DCriteria.drummond(a, b)).isCloseTo(0.10 / 1.86, within(1e-12));
        // Only i differs by 10 deg: D_SH = D_H = 2 sin 5 deg, D' = 10/180.
        Elements c = Elements.ofDegrees(0.98, 0.90, 150.0, 235.0, 172.0, 2451545.0, GM);
        assertThat(DCriteria.southworthHawkins(a, c)).isCloseTo(2 * Math.sin(Math.toRadians(5)), within(1e-12));
        assertThat(DCriteria.drummond(a, c)).isCloseTo(10.0 / 180.0, within(1e-3));
        // Symmetric.
        SplittableRandom r = new SplittableRandom(5);
        for (int k = 0; k < 200; k++) {
            Elements x = random(r);
            Elements y = random(r);
            assertThat(DCriteria.southworthHawkins(x, y)).isCloseTo(DCriteria.southworthHawkins(y, x), within(1e-12));
            assertThat(DCriteria.drummond(x, y)).isCloseTo(DCriteria.drummond(y, x), within(1e-12));
            assertThat(DCriteria.jopek(x, y)).isCloseTo(DCriteria.jopek(y, x), within(1e-12));
        }
    }

    private static Elements random(SplittableRandom r) {
        return new Elements(0.1 + r.nextDouble(), r.nextDouble() * 0.99, 0.01 + 3.1 * r.nextDouble(),
                2 * Math.PI * r.nextDouble(), 2 * Math.PI * r.nextDouble(), 2451545.0, GM);
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static double[] cross(double[] a, int oa, double[] b, int ob) {
        return new double[] {a[oa + 1] * b[ob + 2] - a[oa + 2] * b[ob + 1], a[oa + 2] * b[ob] - a[oa] * b[ob + 2],
            a[oa] * b[ob + 1] - a[oa + 1] * b[ob]};
    }
}
