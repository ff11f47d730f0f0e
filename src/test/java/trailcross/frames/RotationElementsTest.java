package trailcross.frames;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import org.junit.jupiter.api.Test;

/** The IAU WGCCRE rotation elements and the planet's equatorial frame. */
class RotationElementsTest {

    @Test
    void polesAreTheTabulatedOnes() {
        // Archinal et al. (2011), Celest. Mech. Dyn. Astr. 109, 101, Table 1 (the 2009 report; from memory):
        // Mars α0 = 317.68143 − 0.1061 T, δ0 = 52.88650 − 0.0609 T; Earth α0 = −0.641 T, δ0 = 90 − 0.557 T;
        // Neptune α0 = 299.36 + 0.70 sin N, δ0 = 43.46 − 0.51 cos N, N = 357.85 + 52.316 T.
        RotationElements mars = RotationElements.of("Mars").orElseThrow();
        assertThat(mars.poleDeg(0)).containsExactly(new double[] {317.68143, 52.88650}, offset(1e-9));
        assertThat(mars.poleDeg(36525)).containsExactly(new double[] {317.68143 - 0.1061, 52.88650 - 0.0609}, offset(1e-9));
        RotationElements earth = RotationElements.of("earth").orElseThrow();
        assertThat(earth.poleDeg(-36525)).containsExactly(new double[] {0.641, 90.557}, offset(1e-9));
        RotationElements nep = RotationElements.of("neptune").orElseThrow();
        double n = Math.toRadians(357.85);
        assertThat(nep.poleDeg(0)).containsExactly(new double[] {299.36 + 0.70 * Math.sin(n), 43.46 - 0.51 * Math.cos(n)},
                offset(1e-9));
        assertThat(RotationElements.of("moon")).isEmpty();
    }

    @Test
    void polesMakeThePublishedObliquitiesWithTheOrbits() {
        // Obliquity to the orbit (NASA planetary fact sheets, from memory): Mercury 0.034°, Venus 177.36°,
        // Earth 23.44°, Mars 25.19°, Jupiter 3.13°, Saturn 26.73°, Uranus 97.77°, Neptune 28.32°; the IAU north
        // pole is the one on the invariable plane's north side, so retrograde rotators give 180° − obliquity.
        // The orbit normal from the embedded ephemeris at J2000 (osculating; mean and osculating planes
        // differ by a few 0.01°).
        String[] names = {"mercury", "venus", "earth", "mars", "jupiter", "saturn", "uranus", "neptune"};
        double[] obliquity = {0.034, 177.36, 23.44, 25.19, 3.13, 26.73, 97.77, 28.32};
        trailcross.ephemeris.Ephemeris eph = new trailcross.ephemeris.Vsop87Ephemeris();
        for (int k = 0; k < names.length; k++) {
            double[] s = new double[6];
            eph.heliocentric(trailcross.ephemeris.Body.of(names[k]).orElseThrow(), 0, s);
            double[] h = {s[1] * s[5] - s[2] * s[4], s[2] * s[3] - s[0] * s[5], s[0] * s[4] - s[1] * s[3]};
            double[] normal = EclipticFrame.equatorialOf(h);
            double[] pole = RotationElements.of(names[k]).orElseThrow().pole(0);
            double cos = (normal[0] * pole[0] + normal[1] * pole[1] + normal[2] * pole[2])
                    / Math.sqrt(normal[0] * normal[0] + normal[1] * normal[1] + normal[2] * normal[2]);
            double angle = Math.toDegrees(Math.acos(cos));
            double expected = Math.min(obliquity[k], 180 - obliquity[k]);
            assertThat(angle).as(names[k]).isCloseTo(expected, offset(0.08));
        }
    }

    @Test
    void thePlanetsFrameHasItsPoleAtDeclination90AndItsNodeAtZero() {
        RotationElements mars = RotationElements.of("mars").orElseThrow();
        double[] pole = mars.pole(1000);
        assertThat(mars.toPlanetEquatorialDeg(1000, pole)[1]).isCloseTo(90, offset(1e-9));
        double ra0 = Math.toRadians(mars.poleDeg(1000)[0]);
        double[] node = {-Math.sin(ra0), Math.cos(ra0), 0};
        assertThat(mars.toPlanetEquatorialDeg(1000, node)).containsExactly(new double[] {0, 0}, offset(1e-9));
        // The Earth's frame at J2000 is the ICRF itself: a direction keeps its RA (shifted by the node's
        // 90°, the frame's x axis) and its Dec.
        RotationElements earth = RotationElements.of("earth").orElseThrow();
        double[] v = Spherical.ofDegrees(100, 20, 1).toCartesian();
        assertThat(earth.toPlanetEquatorialDeg(0, v)).containsExactly(new double[] {10, 20}, offset(1e-9));
    }
}
