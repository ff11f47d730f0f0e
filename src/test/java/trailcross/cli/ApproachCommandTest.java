package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import trailcross.encounter.TrackTarget;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.ephemeris.Vsop87Ephemeris;

/** {@code trailcross approach}: files, the console answer, tracks and bad input. */
class ApproachCommandTest {

    @TempDir
    Path dir;

    @Test
    void theVisitorsCloudAgainstTheEarthWritesTheContractFiles() throws IOException {
        MainTest.Run r = MainTest.run("approach", "streams/ossory-visitor.toml", "--from", "2029-08-01 TDB", "--to",
                "2029-10-01 TDB", "--particles", "300", "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("Can the debris of Ossory (fictional) reach earth?")
                .contains("parent's closest approach:").contains("answer:").contains("operational decisions");
        List<String> rows = Files.readAllLines(dir.resolve("approaches.csv"));
        assertThat(rows.get(0)).startsWith("id,closest_utc,distance_au,v_rel_km_s,ra_deg,dec_deg,weight,mass_kg,captured");
        assertThat(rows).hasSizeGreaterThan(100);
        assertThat(Files.readAllLines(dir.resolve("profile.csv")).get(0)).startsWith("time_utc,fluence_per_km2");
        String json = Files.readString(dir.resolve("summary.json"));
        for (String key : new String[] {"parent_min_distance_au", "parent_min_distance_utc", "cloud_min_distance_au",
            "cloud_min_distance_utc", "peak_utc", "peak_sigma_min", "captured_fraction", "caution"}) {
            assertThat(json).contains("\"" + key + "\":");
        }
        assertThat(dir.resolve("approach-distances.png")).exists();
    }

    @Test
    void aTrackWrittenByTheEphemerisCommandKeepsItsPositions() throws IOException {
        // The tool's own ephemeris output (16 digits, one-day rows) read back as a track: between the rows the
        // interpolant gives the ephemeris to 1e-12 au and 1e-11 au/d. (VSOP87's velocity series agree with the
        // derivative of its position series to ~5e-12 au/d, measured here by central differences: that, not the
        // interpolation, sets the level; positions alone at 16 digits would allow 1e-15 au.)
        MainTest.Run e = MainTest.run("ephemeris", "mars", "--from", "2030-01-01 TDB", "--to", "2030-03-01 TDB",
                "--step", "1");
        assertThat(e.code()).as(e.err()).isZero();
        Path file = dir.resolve("mars.csv");
        Files.writeString(file, e.out());
        TrackTarget track = TrackTarget.read(file);
        Ephemeris exact = new Vsop87Ephemeris();
        Random rnd = new Random(20261202);
        double worstX = 0;
        double worstV = 0;
        double[] a = new double[6];
        double[] b = new double[6];
        for (int k = 0; k < 200; k++) {
            double t = track.firstDay() + rnd.nextDouble() * (track.lastDay() - track.firstDay());
            track.state(t, a);
            exact.heliocentric(Body.MARS, t, b);
            worstX = Math.max(worstX, Math.hypot(Math.hypot(a[0] - b[0], a[1] - b[1]), a[2] - b[2]));
            worstV = Math.max(worstV, Math.hypot(Math.hypot(a[3] - b[3], a[4] - b[4]), a[5] - b[5]));
        }
        assertThat(worstX).isLessThan(1e-12);
        assertThat(worstV).isLessThan(1e-11);
        // And as a target on the command line, named by its file.
        MainTest.Run r = MainTest.run("approach", "streams/ossory-visitor.toml", "--target", file.toString(), "--from",
                "2030-01-02 TDB", "--to", "2030-02-01 TDB", "--particles", "20", "--out", dir.resolve("t").toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("reach track mars.csv?");
    }

    @Test
    void badInputIsRefusedInOneLine() throws IOException {
        MainTest.Run t = MainTest.run("approach", "streams/ossory-visitor.toml", "--target", "vulcan", "--from",
                "2029-08-01 TDB", "--to", "2029-10-01 TDB", "--out", dir.resolve("a").toString());
        assertThat(t.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(t.err()).contains("--target: unknown target 'vulcan'");
        MainTest.Run s = MainTest.run("approach", "streams/ossory-visitor.toml", "--target", "sun", "--from",
                "2029-08-01 TDB", "--to", "2029-10-01 TDB", "--out", dir.resolve("b").toString());
        assertThat(s.err()).contains("--target sun: not a body");
        MainTest.Run o = MainTest.run("approach", "streams/ossory-visitor.toml", "--from", "2029-10-01 TDB", "--to",
                "2029-08-01 TDB", "--out", dir.resolve("c").toString());
        assertThat(o.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(o.err()).contains("--to must be after --from");
        Path bad = dir.resolve("probe.csv");
        Files.writeString(bad, "time_tdb,x_au,y_au,z_au,vx_au_d,vy_au_d,vz_au_d\n2030-01-01T00:00:00,1,0,0,0,0.017,0\n"
                + "2030-01-02T00:00:00,1,0,0,0,0.017\n");
        MainTest.Run k = MainTest.run("approach", "streams/ossory-visitor.toml", "--target", bad.toString(), "--from",
                "2029-08-01 TDB", "--to", "2029-10-01 TDB", "--out", dir.resolve("d").toString());
        assertThat(k.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(k.err().trim().lines().count()).isEqualTo(1);
        assertThat(k.err()).contains("probe.csv: line 3");
        MainTest.Run y = MainTest.run("approach", "streams/ossory-visitor.toml", "--return", "2028", "--from",
                "2029-08-01 TDB", "--to", "2029-10-01 TDB", "--out", dir.resolve("e").toString());
        assertThat(y.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(y.err()).contains("--return 2028: Ossory (fictional) has no perihelion passage in 2028");
        assertThat(dir.resolve("e").resolve("approaches.csv")).doesNotExist();
    }
}
