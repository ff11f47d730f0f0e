package trailcross.encounter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.ephemeris.Ephemeris;

/** The approach targets: the Sun–Earth L1/L2 points and a track read from a file. */
class ApproachTargetsTest {

    private static final Ephemeris EPHEMERIS = (ChebyshevCache) trailcross.ephemeris.Ephemerides.fast(null);

    @TempDir
    Path dir;

    @Test
    void collinearPointsAgreeWithTheSmallMassSeriesOfTheRestrictedProblem() {
        // Szebehely (1967), Theory of Orbits, §4.5: for small μ, with r_H = (μ/3)^(1/3),
        // γ1 = r_H − r_H²/3 − r_H³/9 + O(r_H⁴) and γ2 = r_H + r_H²/3 − r_H³/9 + O(r_H⁴) (from memory);
        // r_H ≈ 0.01, so the truncated series is good to ~r_H⁴ ≈ 1e-8.
        double mu = LagrangePoint.massRatio();
        assertThat(mu).isBetween(3.0403e-6, 3.0405e-6); // DE440 GM: Sun–Earth+Moon (common value 3.0404e-6)
        double h = Math.cbrt(mu / 3);
        assertThat(LagrangePoint.gamma(1, mu)).isCloseTo(h - h * h / 3 - h * h * h / 9, org.assertj.core.data.Offset.offset(h * h * h * h));
        assertThat(LagrangePoint.gamma(2, mu)).isCloseTo(h + h * h / 3 - h * h * h / 9, org.assertj.core.data.Offset.offset(h * h * h * h));
        // The points lie about 1.5 million km sunward and anti-sunward of the Earth (common practice: 1.49e6
        // and 1.51e6 km), on the Sun–barycentre line.
        double t = 10000;
        double[] emb = new double[6];
        EPHEMERIS.heliocentric(Body.EARTH_MOON_BARYCENTRE, t, emb);
        for (int which = 1; which <= 2; which++) {
            double[] l = new double[6];
            new LagrangePoint(EPHEMERIS, which).state(t, l);
            double d = Math.sqrt(sq(l[0] - emb[0]) + sq(l[1] - emb[1]) + sq(l[2] - emb[2])) * Body.Constants.AU_KM;
            assertThat(d).isBetween(1.47e6, 1.53e6);
            double rl = Math.sqrt(sq(l[0]) + sq(l[1]) + sq(l[2]));
            double re = Math.sqrt(sq(emb[0]) + sq(emb[1]) + sq(emb[2]));
            assertThat(rl < re).isEqualTo(which == 1);
            double cross = Math.abs(l[0] * emb[1] - l[1] * emb[0]);
            assertThat(cross).isLessThan(1e-15);
        }
    }

    @Test
    void aBadTrackFileIsRefusedNamingItsLine() throws IOException {
        Path file = dir.resolve("bad.csv");
        Files.writeString(file, "time_tdb,x_au,y_au,z_au,vx_au_d,vy_au_d,vz_au_d\n"
                + "2030-01-01T00:00:00,1,0,0,0,0.017,0\n"
                + "2030-01-02T00:00:00,1,zero,0,0,0.017,0\n");
        assertThatThrownBy(() -> TrackTarget.read(file)).hasMessageContaining("bad.csv: line 3: y_au: not a number");
        Files.writeString(file, "time_tdb,x_au,y_au,z_au,vx_au_d,vy_au_d,vz_au_d\n"
                + "2030-01-02T00:00:00,1,0,0,0,0.017,0\n"
                + "2030-01-01T00:00:00,1,0,0,0,0.017,0\n");
        assertThatThrownBy(() -> TrackTarget.read(file)).hasMessageContaining("line 3: time_tdb: times must increase");
        Files.writeString(file, "time_tdb,x_au,y_au,z_au\n2030-01-01T00:00:00,1,0,0\n");
        assertThatThrownBy(() -> TrackTarget.read(file)).hasMessageContaining("bad.csv: line 1: the track has no column 'vx_au_d'");
    }

    private static double sq(double x) {
        return x * x;
    }
}
