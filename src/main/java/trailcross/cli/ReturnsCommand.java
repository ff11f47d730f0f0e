package trailcross.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import trailcross.dynamics.Perihelion;
import trailcross.ephemeris.Ephemerides;
import trailcross.forecast.ParentReturns;
import trailcross.orbit.Elements;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.TimeScale;

/** {@code trailcross returns STREAM --since YEAR}: the parent's perihelion returns, CSV on stdout. */
@Command(name = "returns", mixinStandardHelpOptions = true,
        description = {"The parent's perihelion returns from integrating its orbit (planets, relativity, "
                + "non-gravitational forces), with osculating heliocentric elements at each, as CSV on stdout.",
            "Columns: perihelion_tdb, q_au, e, i_deg, node_deg, peri_deg, a_au."})
final class ReturnsCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "STREAM", description = "the stream file")
    Path stream;

    @Option(names = "--since", required = true, paramLabel = "YEAR", description = "first year to list")
    int since;

    @Option(names = "--until", paramLabel = "YEAR", description = "last year to list (default: one orbit past the epoch)")
    int until;

    @Mixin
    EphemerisOption ephemeris;

    @Override
    public Integer call() throws IOException {
        StreamDefinition d = StreamFileReader.read(stream);
        ParentReturns.Result r = ParentReturns.compute(d.parent(), Ephemerides.fast(ephemeris.file), since, until);
        PrintWriter out = spec.commandLine().getOut();
        CSVFormat format = CSVFormat.DEFAULT.builder().setRecordSeparator('\n')
                .setHeader("perihelion_tdb", "q_au", "e", "i_deg", "node_deg", "peri_deg", "a_au").build();
        try (CSVPrinter csv = new CSVPrinter(out, format)) {
            for (Perihelion p : r.returns()) {
                Elements el = p.elements();
                csv.printRecord(EpochFormat.iso(Epoch.ofDaysSinceJ2000(p.t()), TimeScale.TDB, 3),
                        f(el.q(), 9), f(el.e(), 9), f(Math.toDegrees(el.i()), 7), f(Math.toDegrees(el.node()), 7),
                        f(Math.toDegrees(el.peri()), 7), f(el.a(), 7));
            }
        }
        if (r.returns().isEmpty()) {
            spec.commandLine().getErr().println("trailcross returns: no perihelion passage between " + since
                    + " and the end of the span");
        }
        return 0;
    }

    private static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }
}
