package trailcross.stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

public class StreamFileReaderTest {

    /** Only the keys DESIGN.md requires. */
    public static final String MINIMAL_TEXT = """
            [stream]
            name = "a name"

            [parent]
            epoch = "2020-01-01T00:00:00 TDB"
            q_au = 0.98
            e = 0.90
            i_deg = 160.0
            node_deg = 235.0
            peri_deg = 172.0
            perihelion = "2019-05-10T12:00:00 TDB"
            """;

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path f = dir.resolve("s.toml");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void minimalFileGetsEveryDefault() throws IOException {
        StreamDefinition d = StreamFileReader.read(write(MINIMAL_TEXT));
        assertThat(d.name()).isEqualTo("a name");
        assertThat(d.parent().elements().q()).isEqualTo(0.98);
        assertThat(Math.toDegrees(d.parent().elements().i())).isCloseTo(160.0, within(1e-12));
        // 2019-05-10T12:00 TDB = JD 2458614.0 TDB.
        assertThat(d.parent().elements().perihelionJd()).isEqualTo(2458614.0);
        assertThat(d.parent().a1()).isZero();
        assertThat(d.parent().dustProductionKgS()).isNull();
        assertThat(d.ejection().model()).isEqualTo(EjectionSettings.DEFAULT_MODEL);
        assertThat(d.ejection().activeInboundAu()).isEqualTo(EjectionSettings.DEFAULT_ACTIVE_AU);
        assertThat(d.particles().massIndex()).isEqualTo(ParticleSettings.DEFAULT_MASS_INDEX);
        assertThat(d.populationIndex()).isEqualTo(StreamDefinition.DEFAULT_POPULATION_INDEX);
    }

    @Test
    void meanAnomalyInsteadOfPerihelion() throws IOException {
        // 3200 Phaethon, JPL elements at JD 2457400.5 (../shared/REFERENCES.md): M = 208.8333449°,
        // a = 1.2711945 au, so the perihelion lies M/n earlier.
        String text = MINIMAL_TEXT.replace("q_au = 0.98", "q_au = 0.1399901").replace("e = 0.90", "e = 0.889875")
                .replace("perihelion = \"2019-05-10T12:00:00 TDB\"", "mean_anomaly_deg = 208.8333449")
                .replace("2020-01-01T00:00:00 TDB", "JD 2457400.5 TDB");
        StreamDefinition d = StreamFileReader.read(write(text));
        double a = 0.1399901 / (1 - 0.889875);
        assertThat(a).isCloseTo(1.2711945, within(2e-6));
        double n = Math.sqrt(trailcross.orbit.GravitationalParameters.SUN / (a * a * a));
        assertThat(d.parent().elements().perihelionJd())
                .isCloseTo(2457400.5 - Math.toRadians(208.8333449) / n, within(1e-9));
    }

    @Test
    void nonGravitationalKeysWithAndWithoutUnitSuffix() throws IOException {
        StreamDefinition d = StreamFileReader.read(write(MINIMAL_TEXT.replace("[parent]", "[parent]\na1 = 1.5e-9\na2_au_d2 = -2e-10")));
        assertThat(d.parent().a1()).isEqualTo(1.5e-9);
        assertThat(d.parent().a2()).isEqualTo(-2e-10);
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT.replace("[parent]", "[parent]\na1 = 1e-9\na1_au_d2 = 1e-9"))))
                .hasMessageContaining("parent.a1_au_d2: give a1 or a1_au_d2, not both");
    }

    @Test
    void missingKeyNamesFileLineAndKey() throws IOException {
        Path f = write(MINIMAL_TEXT.replace("q_au = 0.98\n", ""));
        assertThatThrownBy(() -> StreamFileReader.read(f))
                .isInstanceOf(StreamFileException.class)
                .hasMessage(f + ":4: parent.q_au: required key is missing");
    }

    @Test
    void missingSection() throws IOException {
        Path f = write("[stream]\nname = \"x\"\n");
        assertThatThrownBy(() -> StreamFileReader.read(f))
                .hasMessage(f + ":1: parent.epoch: section [parent] is missing");
    }

    @Test
    void wrongType() throws IOException {
        Path f = write(MINIMAL_TEXT.replace("e = 0.90", "e = \"high\""));
        assertThatThrownBy(() -> StreamFileReader.read(f))
                .hasMessage(f + ":7: parent.e: expected a number (eccentricity), found the string \"high\"");
    }

    @Test
    void outOfRange() throws IOException {
        Path f = write(MINIMAL_TEXT.replace("i_deg = 160.0", "i_deg = 200.0"));
        assertThatThrownBy(() -> StreamFileReader.read(f))
                .hasMessage(f + ":8: parent.i_deg: must be in [0, 180] degrees, got 200.0");
        Path g = write(MINIMAL_TEXT.replace("q_au = 0.98", "q_au = -1"));
        assertThatThrownBy(() -> StreamFileReader.read(g)).hasMessageContaining(":6: parent.q_au: perihelion distance must be > 0 au");
    }

    @Test
    void unknownKeyIsAnError() throws IOException {
        Path f = write(MINIMAL_TEXT + "radius_kms = 3\n");
        assertThatThrownBy(() -> StreamFileReader.read(f))
                .hasMessageStartingWith(f + ":12: parent.radius_kms: unknown key");
        Path g = write(MINIMAL_TEXT + "[ejections]\nmodel = \"jones1995\"\n");
        assertThatThrownBy(() -> StreamFileReader.read(g))
                .hasMessageStartingWith(g + ":12: ejections: unknown section");
    }

    @Test
    void brokenToml() throws IOException {
        Path f = write(MINIMAL_TEXT.replace("e = 0.90", "e = = 0.90"));
        assertThatThrownBy(() -> StreamFileReader.read(f)).hasMessageStartingWith(f + ":7: not valid TOML");
    }

    @Test
    void missingFile() {
        Path f = dir.resolve("nothing.toml");
        assertThatThrownBy(() -> StreamFileReader.read(f)).hasMessage(f + ": no such file");
    }

    @Test
    void timeWithoutScaleAndUnquotedTime() throws IOException {
        Path f = write(MINIMAL_TEXT.replace("2019-05-10T12:00:00 TDB", "2019-05-10T12:00:00"));
        assertThatThrownBy(() -> StreamFileReader.read(f))
                .hasMessageContaining(":11: parent.perihelion: time '2019-05-10T12:00:00' has no time scale");
        Path g = write(MINIMAL_TEXT.replace("\"2019-05-10T12:00:00 TDB\"", "2019-05-10T12:00:00"));
        assertThatThrownBy(() -> StreamFileReader.read(g))
                .hasMessageContaining("write times as quoted strings with a scale");
    }

    @Test
    void ejectionAndParticleChecks() throws IOException {
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT + "[ejection]\nactive_inbound_au = 0.5\nactive_outbound_au = 0.5\n")))
                .hasMessageContaining("ejection.active_inbound_au: empty active arc");
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT + "[ejection]\nmodel = \"magic\"\n")))
                .hasMessageContaining("ejection.model: unknown model 'magic' (known: whipple1951, jones1995, crifo1997, fixed)");
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT + "[ejection]\nmodel = \"crifo1997\"\n")))
                .hasMessageContaining("needs parent.gas_production_mol_s");
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT
                + "[ejection]\nproduction_table_days = [-10.0, 5.0, 3.0]\nproduction_table_relative = [1.0, 2.0, 1.0]\n")))
                .hasMessageContaining("ejection.production_table_days: must increase strictly (element 3)");
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT + "[particles]\nmass_index = 1.0\n")))
                .hasMessageContaining("particles.mass_index: differential mass index must be in (1, 4)");
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT.replace("[parent]", "[parent]\nradius_km = -2"))))
                .hasMessageContaining("parent.radius_km: must be in");
        assertThatThrownBy(() -> StreamFileReader.read(write(MINIMAL_TEXT + "[particles]\nradius_min_m = 0.01\nradius_max_m = 0.001\n")))
                .hasMessageContaining("particles.radius_max_m: must be >= radius_min_m");
    }

    @Test
    void demoAndValidationFilesRead() {
        for (String f : new String[] {"streams/lysandre.toml", "streams/ossory-visitor.toml",
            "validation/55p-tempel-tuttle.toml"}) {
            StreamDefinition d = StreamFileReader.read(Path.of(f));
            assertThat(d.name()).isNotBlank();
        }
        // The demo comet's descending node (ν = 180° − ω) lies at 1.012 au, as its file says.
        StreamDefinition d = StreamFileReader.read(Path.of("streams/lysandre.toml"));
        var el = d.parent().elements();
        double nu = Math.PI - el.peri();
        double rNode = el.p() / (1 + el.e() * Math.cos(nu));
        assertThat(rNode).isCloseTo(1.012, within(0.001));
        assertThat(StreamFileReader.read(Path.of("streams/ossory-visitor.toml")).parent().elements().e()).isGreaterThan(1);
    }
}
