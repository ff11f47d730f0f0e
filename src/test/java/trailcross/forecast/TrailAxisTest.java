package trailcross.forecast;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import trailcross.encounter.AxisMeeting;

/** The choice of a trail axis' meeting among its family's roots. */
class TrailAxisTest {

    private static AxisMeeting.Root root(double peakT, double deltaR, double sigmaMin) {
        return new AxisMeeting.Root(0, peakT, deltaR, 0, 0.1, sigmaMin);
    }

    @Test
    void aResolvedRootIsPreferredToANearerUnresolvedOne() {
        // The shape measured on the 1767 Leonid trail in 2002: a scattered stretch gave a root 0.00004 au from the
        // Earth's path that the family did not resolve (85 min between interpolations) beside the real one.
        AxisMeeting.Root spurious = root(10, -0.00004, 85);
        AxisMeeting.Root real = root(10.2, 0.00012, 0.1);
        assertThat(TrailAxis.choose(List.of(spurious, real), 0, 365)).isEqualTo(real);
    }

    @Test
    void withoutAResolvedRootTheNearestStandsAndRootsOutsideTheYearOrBandDoNot() {
        AxisMeeting.Root a = root(10, 0.0001, 60);
        AxisMeeting.Root b = root(20, 0.0003, 90);
        assertThat(TrailAxis.choose(List.of(a, b), 0, 365)).isEqualTo(a);
        assertThat(TrailAxis.choose(List.of(root(400, 0.0001, 0.1), b), 0, 365)).isEqualTo(b);
        assertThat(TrailAxis.choose(List.of(root(10, 0.5, 0.1)), 0, 365)).isNull();
        assertThat(TrailAxis.choose(List.of(), 0, 365)).isNull();
    }
}
