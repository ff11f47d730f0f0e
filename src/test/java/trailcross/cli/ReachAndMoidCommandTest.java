package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code trailcross reach} and {@code trailcross moid} end to end. */
class ReachAndMoidCommandTest {

    @TempDir
    Path dir;

    @Test
    void reachOf55pListsTheLeonidBranchAtEachReturn() throws IOException {
        Path csv = dir.resolve("reach.csv");
        MainTest.Run r = MainTest.run("reach", "validation/55p-tempel-tuttle.toml", "--since", "1960", "--csv", csv.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("MOID 0.008478 au").contains("descending").contains("operational decisions rest with");
        List<String> lines = Files.readAllLines(csv);
        assertThat(lines.get(0)).isEqualTo("epoch_tdb,moid_au,node,node_distance_au,solar_longitude_deg,ra_deg,dec_deg,"
                + "vg_km_s,min_ejection_m_s");
        // The osculating epoch (JPL J985/69: MOID 0.00848081 au, ../shared/REFERENCES.md) and the returns of
        // 1965 and 1998 (IMCCE: 1965 Apr 30.00784 TT; 1998 Feb 28.0977 TT).
        assertThat(lines).hasSize(4);
        String[] epoch = lines.get(1).split(",");
        assertThat(Double.parseDouble(epoch[1])).isCloseTo(0.00848, within(5e-6));
        assertThat(epoch[2]).isEqualTo("descending");
        // Leonid radiant (IAU MDC J23: lambda 236.3, RA 154.4, Dec +21.4, Vg 70.3) within 2 deg and 1.5 km/s.
        assertThat(Double.parseDouble(epoch[4])).isCloseTo(236.3, within(2.0));
        assertThat(Double.parseDouble(epoch[5])).isCloseTo(154.4, within(2.0));
        assertThat(Double.parseDouble(epoch[6])).isCloseTo(21.4, within(2.0));
        assertThat(Double.parseDouble(epoch[7])).isCloseTo(70.3, within(1.5));
        assertThat(lines.get(2)).startsWith("1965-04-30");
        assertThat(lines.get(3)).startsWith("1998-02-28");
        // A speed of tens of m/s closes a miss of ~0.005-0.01 au from the arc (the order of the trail
        // ejection speeds of the published Leonid models; common practice).
        for (String line : lines.subList(1, 4)) {
            assertThat(Double.parseDouble(line.split(",")[8])).isBetween(5.0, 300.0);
        }
    }

    @Test
    void reachWorksForAnUnboundParent() {
        MainTest.Run r = MainTest.run("reach", "streams/ossory-visitor.toml");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("epoch").contains("MOID");
    }

    @Test
    void moidOfElementStringsAndStreams() {
        // Wiśniowski & Rickman (2013) case 2: MOID 0.00289925623680 au (../shared/REFERENCES.md).
        MainTest.Run r = MainTest.run("moid", "q=2.036,e=0.164,i=0,node=0,peri=250.227",
                "q=2.12995319,e=0.2313469,i=34.84268,node=173.12520,peri=310.03850");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).startsWith("MOID 0.00289926 au").contains("D_SH");
        MainTest.Run e = MainTest.run("moid", "validation/55p-tempel-tuttle.toml", "earth");
        assertThat(e.code()).isZero();
        assertThat(e.out()).startsWith("MOID 0.00847");
        MainTest.Run bad = MainTest.run("moid", "q=1,e=0.5,i=3", "earth");
        assertThat(bad.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(bad.err()).contains("A: missing node=");
        MainTest.Run none = MainTest.run("moid", "nothing.toml", "earth");
        assertThat(none.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(none.err()).contains("A: 'nothing.toml' is neither a stream file");
        MainTest.Run adj = MainTest.run("reach", "streams/lysandre.toml", "--adjustment", "sideways");
        assertThat(adj.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(adj.err()).contains("--adjustment: unknown 'sideways'");
    }
}
