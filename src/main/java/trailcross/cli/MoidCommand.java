package trailcross.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.ephemeris.Ephemeris;
import trailcross.ephemeris.Ephemerides;
import trailcross.orbit.DCriteria;
import trailcross.orbit.Elements;
import trailcross.orbit.Moid;
import trailcross.stream.StreamFileReader;
import trailcross.time.EpochParser;

/** {@code trailcross moid A B}: the MOID of any two orbits, every local minimum, and the D-criteria. */
@Command(name = "moid", mixinStandardHelpOptions = true,
        description = {"Minimum orbit intersection distance between two orbits (elliptic or unbound), every local "
                + "minimum of the distance between them, and the orbital similarity criteria D_SH (Southworth & "
                + "Hawkins 1963), D' (Drummond 1981) and D_H (Jopek 1993).",
            "An orbit is a stream file (its parent), 'earth' (the Earth's osculating orbit at --at, default the first "
                + "stream's epoch or J2000), or q=AU,e=E,i=DEG,node=DEG,peri=DEG (ecliptic J2000)."})
final class MoidCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "A", description = "the first orbit")
    String a;

    @Parameters(index = "1", paramLabel = "B", description = "the second orbit")
    String b;

    @Option(names = "--at", paramLabel = "TIME", description = "the instant for 'earth' (a time with its scale)")
    String at;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() {
        double t = 0;
        if (at != null) {
            t = EpochParser.parse(at).daysSinceJ2000();
        } else {
            for (String s : new String[] {a, b}) {
                if (!s.contains("=") && !s.equalsIgnoreCase("earth") && Files.exists(Path.of(s))) {
                    t = StreamFileReader.read(Path.of(s)).parent().epoch().daysSinceJ2000();
                    break;
                }
            }
        }
        Ephemeris eph = Ephemerides.fast(ephemeris.file);
        Elements ea = OrbitArgument.parse(a, "A", eph, t);
        Elements eb = OrbitArgument.parse(b, "B", eph, t);
        PrintWriter o = spec.commandLine().getOut();
        var minima = Moid.minima(ea, eb);
        o.printf(Locale.ROOT, "MOID %.8f au%n", minima.get(0).distance());
        o.println("local minima: distance_au, true_anomaly_a_deg, r_a_au, true_anomaly_b_deg, r_b_au");
        for (Moid.Minimum m : minima) {
            o.printf(Locale.ROOT, "  %.8f  %9.4f  %.6f  %9.4f  %.6f%n", m.distance(), Math.toDegrees(m.trueAnomalyA()),
                    m.radiusA(), Math.toDegrees(m.trueAnomalyB()), m.radiusB());
        }
        o.printf(Locale.ROOT, "D_SH %.5f  D' %.5f  D_H %.5f%n", DCriteria.southworthHawkins(ea, eb),
                DCriteria.drummond(ea, eb), DCriteria.jopek(ea, eb));
        return 0;
    }
}
