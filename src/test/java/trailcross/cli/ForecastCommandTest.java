package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code trailcross forecast} end to end on the demo comet (a small run), and its bad-input paths. */
class ForecastCommandTest {

    @TempDir
    Path dir;

    @Test
    void demoTrailMeetsTheEarthAndTheTablesAreWritten() throws IOException {
        MainTest.Run r = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2027", "--returns", "1",
                "--particles", "400", "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("1 returns since").contains("meeting(s) with the Earth (targeted sampling)")
                .contains("ESS").contains("axis peak UTC").contains("operational decisions rest with");
        List<String> enc = Files.readAllLines(dir.resolve("encounters.csv"));
        // The contract's columns (../shared/DESIGN.md), then the new ones it names, then ours.
        assertThat(enc.get(0)).startsWith("return_year,revolutions,peak_utc,solar_longitude_deg,delta_r_au,particles,"
                + "ra_deg,dec_deg,vg_km_s,fwhm_h,zhr,peak_sigma_min,axis_peak_utc,axis_delta_r_au,fm,ess,zhr_sigma,");
        assertThat(enc).hasSize(2);
        String[] row = enc.get(1).split(",", -1);
        assertThat(row[0]).isEqualTo("1993");
        assertThat(row[1]).isEqualTo("1");
        // The invented comet's descending node lies near the Earth's orbit in early June (stream file), so
        // its trail is met near solar longitude 75 deg, within 0.01 au.
        assertThat(row[2]).startsWith("2027-06-");
        assertThat(Double.parseDouble(row[3])).isBetween(73.0, 77.0);
        assertThat(Math.abs(Double.parseDouble(row[4]))).isLessThan(0.01);
        assertThat(Double.parseDouble(row[10])).isPositive();
        assertThat(Double.parseDouble(row[11])).isPositive();
        assertThat(row[12]).startsWith("2027-06-");
        assertThat(Double.parseDouble(row[15])).isGreaterThan(1);
        assertThat(Double.parseDouble(row[16])).isPositive();
        // The cloud's delta r comes with its bootstrap uncertainty, fM with its standard error (last columns).
        assertThat(enc.get(0)).endsWith(",times_disagree,delta_r_sigma_au,fm_sigma");
        assertThat(Double.parseDouble(row[row.length - 2])).isPositive().isLessThan(0.01);
        assertThat(Double.parseDouble(row[row.length - 1])).isPositive().isLessThan(Double.parseDouble(row[14]));
        assertThat(Files.readAllLines(dir.resolve("crossings.csv")).size()).isGreaterThan(10);
        assertThat(Files.readString(dir.resolve("radiants.csv"))).startsWith("date_utc,solar_longitude_deg,ra_deg,dec_deg,vg_km_s\n2027-");
        assertThat(Files.readString(dir.resolve("summary.json"))).contains("\"seed\": 1").contains("\"caution\"")
                .contains("\"ess\": ").contains("\"run_seconds\": ").contains("\"delta_r_sigma_au\": ").contains("\"fm_sigma\": ")
                .contains("\"other_maxima\": [").contains("\"trails_together\": []");
        for (String png : new String[] {"node-map.png", "activity.png", "radiants.png"}) {
            byte[] b = Files.readAllBytes(dir.resolve(png));
            assertThat(b.length).as(png).isGreaterThan(5000);
            assertThat(new String(b, 1, 3, java.nio.charset.StandardCharsets.US_ASCII)).isEqualTo("PNG");
        }
    }

    @Test
    void twoTrailsInOneYearAreAlsoGivenTogether() throws IOException {
        MainTest.Run r = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2027", "--returns", "2",
                "--particles", "300", "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("2027 2 trails together: maximum 2027-06-").contains("     at that maximum: ");
        assertThat(Files.readString(dir.resolve("summary.json"))).contains("\"shares_at_peak\": [{\"return_year\": ");
        String json = Files.readString(dir.resolve("summary.json"));
        assertThat(json).contains("\"trails_together\": [\n    {\"year\": 2027, \"trails\": 2, \"peak_utc\": \"2027-06-");
        // The sum's maximum is at least the stronger trail's (ZHR column of encounters.csv).
        double strongest = 0;
        for (String line : Files.readAllLines(dir.resolve("encounters.csv")).subList(1, 3)) {
            strongest = Math.max(strongest, Double.parseDouble(line.split(",", -1)[10]));
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\"trails_together\".*?\"zhr\": ([0-9.]+)",
                java.util.regex.Pattern.DOTALL).matcher(json);
        assertThat(m.find()).isTrue();
        assertThat(Double.parseDouble(m.group(1))).isGreaterThanOrEqualTo(strongest * 0.999);
    }

    @Test
    void aSpanOfYearsGivesOneTableWithAYearColumn() throws IOException {
        MainTest.Run r = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2026..2027", "--returns", "1",
                "--particles", "300", "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        List<String> enc = Files.readAllLines(dir.resolve("encounters.csv"));
        assertThat(enc.get(0)).startsWith("year,return_year,revolutions,peak_utc,");
        // Every meeting's peak lies inside its own year.
        for (String line : enc.subList(1, enc.size())) {
            String[] row = line.split(",", -1);
            assertThat(row[3]).startsWith(row[0] + "-");
        }
        assertThat(enc.stream().anyMatch(l -> l.startsWith("2027,1993,"))).isTrue();
    }

    @Test
    void anUnboundParentIsForecastWithoutATrailAxis() throws IOException {
        // The invented unbound visitor passes once (2029): its cloud is propagated, no axis is built for it.
        MainTest.Run r = MainTest.run("forecast", "streams/ossory-visitor.toml", "--year", "2030", "--particles", "200",
                "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("trail 2029: 200 particles targeted");
        assertThat(Files.readAllLines(dir.resolve("encounters.csv")).get(0)).startsWith("return_year,");
    }

    @Test
    void calibrateWritesTheFittedDustProduction() throws IOException {
        Path cal = dir.resolve("calibrated.toml");
        MainTest.Run r = MainTest.run("calibrate", "streams/lysandre.toml", "--year", "2027", "--trail", "1993", "--zhr",
                "250", "--returns", "1", "--particles", "300", "--out", cal.toString());
        assertThat(r.code()).as(r.err()).isZero();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("dust_production_kg_s = ([0-9.e+-]+)").matcher(r.out());
        assertThat(m.find()).isTrue();
        double x = Double.parseDouble(m.group(1));
        assertThat(x).isPositive();
        String text = Files.readString(cal);
        assertThat(text).contains("dust_production_kg_s = " + m.group(1)).contains("[parent]").contains("q_au = 0.95");
        assertThat(text.split("dust_production_kg_s", -1)).hasSize(2);
        // The same run with the calibrated file gives the observed ZHR (the ZHR scales with the production).
        MainTest.Run f = MainTest.run("forecast", cal.toString(), "--year", "2027", "--returns", "1", "--particles", "300",
                "--out", dir.resolve("f").toString());
        assertThat(f.code()).as(f.err()).isZero();
        String[] row = Files.readAllLines(dir.resolve("f").resolve("encounters.csv")).get(1).split(",", -1);
        assertThat(Double.parseDouble(row[10])).isCloseTo(250.0, org.assertj.core.api.Assertions.within(1.0));
        MainTest.Run bad = MainTest.run("calibrate", "streams/lysandre.toml", "--year", "2027", "--trail", "1800",
                "--zhr", "250", "--returns", "1", "--particles", "300");
        assertThat(bad.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(bad.err()).contains("--trail 1800");
    }

    @Test
    void badInputGivesOneLine() {
        MainTest.Run a = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2027", "--since", "2030");
        assertThat(a.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(a.err()).contains("--since 2030 must be before --year 2027");
        MainTest.Run b = MainTest.run("forecast", "streams/lysandre.toml", "--year", "3200");
        assertThat(b.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(b.err()).contains("outside the span");
        MainTest.Run c = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2027", "--since", "1990", "--returns", "2");
        assertThat(c.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(c.err()).contains("--since or --returns, not both");
        MainTest.Run d = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2028..2027");
        assertThat(d.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(d.err()).contains("the span is reversed");
        MainTest.Run huge = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2027", "--particles", "2000000000");
        assertThat(huge.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(huge.err()).contains("--particles 2000000000 needs about").contains("GB of heap");
        MainTest.Run file = MainTest.run("forecast", "streams/lysandre.toml", "--year", "2027", "--out", "streams/lysandre.toml");
        assertThat(file.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(file.err()).contains("--out streams/lysandre.toml: is a file, not a folder");
        MainTest.Run far = MainTest.run("forecast", "streams/lysandre.toml", "--year", "99999");
        assertThat(far.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(far.err()).contains("--year 99999 lies outside the span of the ephemeris").contains("years ");
        MainTest.Run e = MainTest.run("forecast", "streams/lysandre.toml", "--year", "20x7");
        assertThat(e.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(e.err()).contains("--year: '20x7'");
    }

    @Test
    void resumeAfterACrashGivesTheSameTables() throws IOException {
        String[] args = {"forecast", "streams/lysandre.toml", "--year", "2027", "--returns", "2", "--particles", "200",
            "--out", dir.toString()};
        MainTest.Run first = MainTest.run(args);
        assertThat(first.code()).as(first.err()).isZero();
        String encounters = Files.readString(dir.resolve("encounters.csv"));
        String crossings = Files.readString(dir.resolve("crossings.csv"));
        // A crash after the first trail: the second trail's checkpoint and the tables are gone.
        try (var s = Files.list(dir.resolve("progress"))) {
            Path second = s.filter(p -> p.getFileName().toString().matches("trail-\\d+\\.csv")).sorted().toList().get(1);
            Files.delete(second);
        }
        Files.delete(dir.resolve("encounters.csv"));
        String[] resume = java.util.Arrays.copyOf(args, args.length + 1);
        resume[args.length] = "--resume";
        MainTest.Run again = MainTest.run(resume);
        assertThat(again.code()).as(again.err()).isZero();
        assertThat(again.out()).contains("read back from the saved run").contains("targeted");
        assertThat(Files.readString(dir.resolve("encounters.csv"))).isEqualTo(encounters);
        assertThat(Files.readString(dir.resolve("crossings.csv"))).isEqualTo(crossings);
        // Other settings do not mix with the saved run.
        String[] other = resume.clone();
        other[7] = "300";
        MainTest.Run bad = MainTest.run(other);
        assertThat(bad.code()).isEqualTo(Main.BAD_INPUT);
        assertThat(bad.err()).contains("--resume:").contains("other settings");
    }
}
