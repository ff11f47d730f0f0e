package trailcross.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.ejection.ActiveArc;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.MeteoroidFile;
import trailcross.ejection.ParticleGenerator;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.ReturnCloud;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.TimeScale;

/** {@code trailcross eject STREAM --return YEAR}: the meteoroid cloud of one return, as CSV. */
@Command(name = "eject", mixinStandardHelpOptions = true,
        description = {"Generates the meteoroid cloud of one return of the parent: ejection times over the active "
                + "arc, sizes, beta, weights, and heliocentric states (the parent's integrated state plus the "
                + "ejection velocity), written as CSV.",
            "Columns: " + "id, return_jd_tdb, ejection_jd_tdb, x_au, y_au, z_au, vx_au_d, vy_au_d, vz_au_d, "
                + "radius_m, mass_kg, beta, weight, speed_m_s."})
final class EjectCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--return", required = true, paramLabel = "YEAR",
            description = "the year of the perihelion return that sheds the cloud")
    int year;

    @Option(names = "--particles", defaultValue = "10000", paramLabel = "N", description = "particles (default 10000)")
    int particles;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "S", description = "random seed (default 1)")
    long seed;

    @Option(names = "--sobol", description = "quasi-random (Sobol) numbers instead of pseudo-random ones")
    boolean sobol;

    @Option(names = "--threads", defaultValue = "1", paramLabel = "N",
            description = "worker threads (the cloud does not depend on it)")
    int threads;

    @Option(names = "--out", required = true, paramLabel = "FILE", description = "the CSV file to write")
    Path out;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() {
        if (particles < 1) {
            throw new IllegalArgumentException("--particles must be >= 1, got " + particles);
        }
        trailcross.ejection.ParticleGenerator.checkMemory(particles, Runtime.getRuntime().maxMemory());
        if (out != null) {
            trailcross.io.OutputFolder.checkFile(out, "--out");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be >= 1, got " + threads);
        }
        StreamDefinition d = StreamFileReader.read(stream);
        ReturnCloud rc = ReturnCloud.prepare(d, Ephemerides.fast(ephemeris.file), year);
        ParticleGenerator g = rc.generator();
        List<Meteoroid> cloud = g.generate(particles, seed, sobol, threads);
        MeteoroidFile.write(out, cloud);
        PrintWriter o = spec.commandLine().getOut();
        ActiveArc arc = g.arc();
        o.printf(Locale.ROOT, "%s, return of %s (q %.6f au, e %.6f)%n", d.parent().name(),
                iso(rc.perihelion().t()), rc.perihelion().elements().q(), rc.perihelion().elements().e());
        o.printf(Locale.ROOT, "active arc: %s to %s (%.1f days), production on %d nodes%n", iso(arc.start()),
                iso(arc.end()), arc.days(), g.production().nodes());
        double[] v = cloud.stream().mapToDouble(Meteoroid::speedMs).sorted().toArray();
        double[] beta = cloud.stream().mapToDouble(Meteoroid::beta).toArray();
        o.printf(Locale.ROOT, "%d particles (%s, seed %d): ejection speed median %.2f m/s (%.2f .. %.2f), "
                + "beta %.2e .. %.2e%n", cloud.size(), sobol ? "Sobol" : "pseudo-random", seed, v[v.length / 2], v[0],
                v[v.length - 1], Arrays.stream(beta).min().orElse(0), Arrays.stream(beta).max().orElse(0));
        if (Double.isNaN(g.realMeteoroids())) {
            o.println("no parent.dust_production_kg_s: weights left empty (no fluxes or ZHR from this cloud)");
        } else {
            o.printf(Locale.ROOT, "dust shed over the arc: %.3e kg = %.3e meteoroids of %.1e .. %.1e m%n",
                    g.production().massKg(), g.realMeteoroids(), d.particles().radiusMinM(), d.particles().radiusMaxM());
        }
        o.println("wrote " + out);
        return 0;
    }

    private static String iso(double t) {
        return EpochFormat.iso(Epoch.ofDaysSinceJ2000(t), TimeScale.TDB, 0);
    }
}
