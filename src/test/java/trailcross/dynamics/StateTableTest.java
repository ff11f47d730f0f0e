package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Random;
import org.junit.jupiter.api.Test;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;
import trailcross.stream.ParentBody;
import trailcross.time.Epoch;
import trailcross.time.EpochParser;

class StateTableTest {

    @Test
    void tableAnswersAsTheHistoryOverAnActiveArc() {
        // 55P's JPL solution J985/69 (../shared/REFERENCES.md) about its 1998 perihelion, the arc inside 3 au.
        Epoch epoch = EpochParser.parse("JD 2451040.5 TDB");
        Elements el = Elements.ofDegrees(0.9764279154675056, 0.9055527209724122, 162.4865753794343, 235.270989149082,
                172.5002736828059, 2450872.5977341123, Body.SUN.gm());
        ParentBody p = new ParentBody("55P", epoch, el, 1.580981463194e-9, 9.186415933073e-11, 0, 1.8, 500, null, null);
        double tp = 2450872.5977341123 - 2451545;
        ParentHistory h = ParentHistory.compute(p, SharedEphemeris.FORCES, 1e-10, tp - 400, tp + 400);
        StateTable table = new StateTable(h, tp - 300, tp + 300);
        double[] a = new double[6];
        double[] b = new double[6];
        double worstX = 0;
        double worstV = 0;
        Random rnd = new Random(3);
        for (int k = 0; k < 20_000; k++) {
            double t = tp - 300 + 600 * rnd.nextDouble();
            h.stateAt(t, a);
            table.stateAt(t, b);
            worstX = Math.max(worstX, Math.hypot(Math.hypot(a[0] - b[0], a[1] - b[1]), a[2] - b[2]));
            double v = Math.sqrt(a[3] * a[3] + a[4] * a[4] + a[5] * a[5]);
            worstV = Math.max(worstV, Math.hypot(Math.hypot(a[3] - b[3], a[4] - b[4]), a[5] - b[5]) / v);
        }
        System.out.printf("state table: step %.3f d, worst position %.2e au, worst relative velocity %.2e%n",
                table.step(), worstX, worstV);
        // The class's stated bounds (measured 3.5e-15 au and 1.0e-11).
        assertThat(worstX).isLessThan(1e-13);
        assertThat(worstV).isLessThan(1e-10);
        // The nodes themselves are the history's.
        h.stateAt(tp - 300, a);
        table.stateAt(tp - 300, b);
        assertThat(b[0]).isEqualTo(a[0]);
        assertThatThrownBy(() -> table.stateAt(tp + 301, new double[6])).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("outside the tabulated span");
    }
}
