package trailcross.frames;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;
import trailcross.time.Epoch;
import trailcross.time.EpochParser;
import trailcross.time.TimeScale;
import trailcross.time.TimeScales;

class FramesTest {

    @Test
    void eclipticToEquatorialMatchesSofaRotation() {
        // Reference: IAU SOFA iauEcm06 at J2000.0 differs from the pure ε0 rotation only by the
        // precession-bias frame terms; iauObl80 gives ε0 = 84381.448″ at J2000.0 (Lieske et al. 1977).
        assertThat(Math.toDegrees(JSOFA.jauObl80(2451545.0, 0.0)) * 3600).isCloseTo(84381.448, within(1e-9));
        double[] ecl = Spherical.ofDegrees(90.0, 0.0, 1.0).toCartesian();
        double[] eq = EclipticFrame.equatorialOf(ecl);
        Spherical s = Spherical.of(eq);
        // The ecliptic's 90° point lies at RA 90°, Dec +ε0.
        assertThat(s.lonDeg()).isCloseTo(90.0, within(1e-12));
        assertThat(s.latDeg()).isCloseTo(84381.448 / 3600.0, within(1e-12));
        double[] back = EclipticFrame.eclipticOf(eq);
        for (int k = 0; k < 3; k++) {
            assertThat(back[k]).isCloseTo(ecl[k], within(1e-15));
        }
    }

    @Test
    void sphericalRoundTrip() {
        for (double lon = 0; lon < 360; lon += 17.3) {
            for (double lat = -89; lat <= 89; lat += 22.1) {
                Spherical s = Spherical.ofDegrees(lon, lat, 2.5);
                Spherical t = Spherical.of(s.toCartesian());
                assertThat(t.lonDeg()).isCloseTo(lon, within(1e-11));
                assertThat(t.latDeg()).isCloseTo(lat, within(1e-11));
                assertThat(t.r()).isCloseTo(2.5, within(1e-14));
            }
        }
    }

    @Test
    void angleSeparationAndDifference() {
        assertThat(Math.toDegrees(Angles.separation(0, 0, Math.toRadians(90), 0))).isCloseTo(90, within(1e-12));
        assertThat(Angles.difference(Math.toRadians(1), Math.toRadians(359))).isCloseTo(Math.toRadians(2), within(1e-15));
        assertThat(Angles.normaliseDeg(-10)).isEqualTo(350);
    }

    @Test
    void leonidMaximum1999SolarLongitude() {
        // Published: the 1999 Leonid maximum at 1999-11-18 02:02 UT was at λ☉ = 235.285–235.287 (J2000;
        // Arlt et al. 1999, WGN 27; IMO quick-look 235.287 at 02:05). Earth from IAU SOFA iauEpv00.
        double lambda = solarLongitudeAt("1999-11-18T02:02:00Z");
        assertThat(lambda).isCloseTo(235.2855, within(0.002));
    }

    @Test
    void draconids2011SolarLongitude() {
        // Published: Draconid 2011 peak at 2011-10-08 20:12 UT, λ☉ = 195.036 (J2000), as predicted from the
        // 1900 trail (Vaubaillon et al. 2011, WGN 39) — recalled from memory.
        double lambda = solarLongitudeAt("2011-10-08T20:12:00Z");
        assertThat(lambda).isCloseTo(195.036, within(0.003));
    }

    private static double solarLongitudeAt(String utc) {
        Epoch e = EpochParser.parse(utc);
        double[] tt = TimeScales.fromTdb(e, TimeScale.TT);
        double[][] pvh = new double[2][3];
        double[][] pvb = new double[2][3];
        JSOFA.jauEpv00(e.jd1(), e.jd2(), pvh, pvb);
        double[] earth = EclipticFrame.eclipticOf(pvh[0]);
        assertThat(tt[0]).isPositive();
        return SolarLongitude.degrees(earth);
    }
}
