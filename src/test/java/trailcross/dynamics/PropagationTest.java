package trailcross.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;

class PropagationTest {

    @TempDir
    Path dir;

    static List<TestParticle> halleyTypeCloud(int n, long seed, double t0) {
        Random r = new Random(seed);
        List<TestParticle> out = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            Elements el = Elements.ofDegrees(0.98 + 0.01 * r.nextGaussian(), 0.905 + 0.002 * r.nextGaussian(),
                    162.5 + 0.2 * r.nextGaussian(), 235.3 + 0.2 * r.nextGaussian(), 172.5 + 0.2 * r.nextGaussian(),
                    t0 + 2451545.0 + 30 * r.nextGaussian(), Body.SUN.gm());
            out.add(new TestParticle(k, t0, el.stateAt(t0 + 2451545.0).toArray(), 1e-4 * r.nextDouble()));
        }
        return out;
    }

    @Test
    void resultsAreBitIdenticalOnAnyNumberOfThreads() {
        List<TestParticle> cloud = halleyTypeCloud(12, 1, 0.0);
        List<Outcome> one = new Propagator(SharedEphemeris.FORCES, 1e-9, 1e3, 1).propagate(cloud, 3 * 365.25, null, null);
        List<Outcome> two = new Propagator(SharedEphemeris.FORCES, 1e-9, 1e3, 2).propagate(cloud, 3 * 365.25, null, null);
        for (int k = 0; k < cloud.size(); k++) {
            assertThat(two.get(k).state()).containsExactly(one.get(k).state());
        }
    }

    @Test
    void resumedRunEqualsUninterruptedRun() {
        List<TestParticle> cloud = halleyTypeCloud(6, 2, 100.0);
        Propagator p = new Propagator(SharedEphemeris.FORCES, 1e-9, 1e3, 2);
        double seg = 200;
        List<Checkpoint.Entry> whole = new SegmentedPropagation(p, seg, null).run(cloud, 100, 100 + 5 * seg, null, null);
        Path ck = dir.resolve("run.checkpoint.csv");
        // A run that "crashed" after three segments, then the same run again with its checkpoint.
        new SegmentedPropagation(p, seg, ck).run(cloud, 100, 100 + 3 * seg, null, null);
        List<Checkpoint.Entry> resumed = new SegmentedPropagation(p, seg, ck).run(cloud, 100, 100 + 5 * seg, null, null);
        for (int k = 0; k < cloud.size(); k++) {
            assertThat(resumed.get(k).particle().state()).containsExactly(whole.get(k).particle().state());
        }
        assertThat(Checkpoint.read(ck)).hasSize(6);
    }

    @Test
    void checkpointRoundTripsBitForBitAndRejectsBadNumbers() throws IOException {
        List<TestParticle> cloud = halleyTypeCloud(3, 3, 0.0);
        List<Checkpoint.Entry> entries = cloud.stream().map(t -> new Checkpoint.Entry(t, Outcome.Status.DONE)).toList();
        Path f = dir.resolve("c.csv");
        Checkpoint.write(f, entries);
        List<Checkpoint.Entry> back = Checkpoint.read(f);
        for (int k = 0; k < 3; k++) {
            assertThat(back.get(k).particle().state()).containsExactly(cloud.get(k).state());
        }
        List<String> lines = new ArrayList<>(Files.readAllLines(f));
        lines.set(2, lines.get(2).replaceFirst(",[^,]+,", ",NaN,"));
        // Edited behind trailcross' back: the checksum no longer matches, and the file is refused.
        Files.write(f, lines);
        assertThatThrownBy(() -> Checkpoint.read(f)).isInstanceOf(trailcross.io.SealedFile.DamagedException.class)
                .hasMessage(f + ": damaged: its checksum does not match its content");
        // Cut short: no checksum line.
        Files.write(f, lines.subList(0, 2));
        assertThatThrownBy(() -> Checkpoint.read(f)).hasMessageContaining("damaged: no checksum line");
        // Sealed, but with a bad number in it: the number is named.
        List<String> body = lines.subList(0, lines.size() - 1);
        trailcross.io.SealedFile.write(f, w -> w.write(String.join("\n", body) + "\n"));
        assertThatThrownBy(() -> Checkpoint.read(f)).hasMessage(f + ":3: t_tdb_jd: not a finite number: 'NaN'");
        assertThatThrownBy(() -> Checkpoint.read(dir.resolve("none.csv"))).hasMessageContaining("no such file");
    }

    @Test
    void timeOutsideTheEphemerisIsAClearError() {
        List<TestParticle> cloud = halleyTypeCloud(1, 4, 0.0);
        assertThatThrownBy(() -> new Propagator(SharedEphemeris.FORCES, 1e-9, 1e3, 1).propagate(cloud, 400000, null, null))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("outside the span");
    }
}
