package trailcross.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

/**
 * Random option values for the commands (negative, zero, huge counts, reversed spans, a file as output
 * folder, a folder as input file, words for numbers): every outcome is success, or exit 2 with one line on
 * standard error — never an internal error. Fixed seed; every {@code --out} offered to the forecast is a
 * file, not a folder, so that each forecast is refused before any work and the property stays within the
 * suite's budget (the other values still vary, and are checked first where they are bad).
 */
class CommandLinePropertiesTest {

    private static final List<String> COUNTS = List.of("-5", "0", "1", "49", "2000000000", "99999999999", "abc", "1e3", "");

    @Provide
    Arbitrary<List<String>> commandLines() {
        Arbitrary<String> count = Arbitraries.of(COUNTS);
        Arbitrary<String> year = Arbitraries.of("2027", "1999..1998", "2027..2027", "-3", "99999", "20x7", "2027..", "..2027");
        Arbitrary<String> path = Arbitraries.of("streams/lysandre.toml", "streams", "no/such/file.toml", "pom.xml", "");
        Arbitrary<String> time = Arbitraries.of("2031-11-17T04:12:00Z", "1998 Feb 30.0 TT", "2031-02-29 TT", "JD 2451545 TDB",
                "yesterday", "2016-12-31T23:59:60Z", "2031-11-17T24:00:00Z", "99999-01-01 TDB");
        Arbitrary<List<String>> forecast = Combinators.combine(path, year, count, count, Arbitraries.of("streams/lysandre.toml",
                "streams", "/proc/version")).as((p, y, n, t, out) -> List.of("forecast", p, "--year", y, "--particles", n,
                        "--threads", t, "--out", out));
        Arbitrary<List<String>> timeCmd = time.map(t -> List.of("time", t));
        Arbitrary<List<String>> eph = Combinators.combine(Arbitraries.of("earth", "mars", "pluto", "moon", ""), time)
                .as((b, t) -> List.of("ephemeris", b, "--at", t));
        Arbitrary<List<String>> moid = Combinators.combine(Arbitraries.of("earth", "streams/lysandre.toml",
                "q=0.98,e=0.9,i=160,node=235,peri=172", "q=-1,e=0.9,i=160,node=235,peri=172", "q=1,e=nan,i=0,node=0,peri=0",
                "streams"), Arbitraries.of("earth", "q=0.97,e=1.5,i=10,node=20,peri=30", "x=1")).as((a, b) -> List.of("moid", a, b));
        Arbitrary<List<String>> check = path.map(p -> List.of("check", p));
        Arbitrary<List<String>> calibrate = Combinators.combine(path, count, Arbitraries.of("-1", "0", "NaN", "abc"))
                .as((p, n, z) -> List.of("calibrate", p, "--year", "2027", "--trail", "1993", "--zhr", z, "--particles", n));
        Arbitrary<List<String>> returns = Combinators.combine(path, Arbitraries.of("2000", "3000", "-99999", "abc", "2020"))
                .as((p, y) -> List.of("returns", p, "--since", y));
        Arbitrary<List<String>> radiants = Combinators.combine(path, year).as((p, y) -> List.of("radiants", p, "--year", y));
        Arbitrary<List<String>> eject = Combinators.combine(path, count, Arbitraries.of("1993", "2027", "1800", "abc"),
                Arbitraries.of("streams", "pom.xml/x.csv")).as((p, n, y, o) -> List.of("eject", p, "--return", y,
                        "--particles", n, "--out", o));
        return Arbitraries.oneOf(forecast, timeCmd, eph, moid, check, calibrate, returns, radiants, eject);
    }

    @Property(tries = 160, seed = "20261202")
    void everyCommandLineSucceedsOrFailsInOneLine(@ForAll("commandLines") List<String> args) {
        List<String> a = new ArrayList<>(args);
        if (a.get(0).equals("forecast") && a.get(9).equals("streams")) {
            a.set(9, "streams/lysandre.toml"); // a file as the output folder
        }
        MainTest.Run r = MainTest.run(a.toArray(String[]::new));
        assertThat(r.code()).as("%s -> %s", a, r.err()).isIn(0, Main.BAD_INPUT);
        if (r.code() == Main.BAD_INPUT) {
            assertThat(r.err().strip().lines().count()).as("%s -> %s", a, r.err()).isEqualTo(1);
            assertThat(r.err()).doesNotContain("internal error").doesNotContain("Exception");
            Statistics.collect(a.get(0) + ": clean error");
        } else {
            Statistics.collect(a.get(0) + ": success");
        }
    }
}
