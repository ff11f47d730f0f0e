package trailcross.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.EpochParser;
import trailcross.time.TimeScale;
import trailcross.time.TimeScales;

/** {@code trailcross time TIME}: one instant in every time scale, as calendar date and Julian date. */
@Command(name = "time", mixinStandardHelpOptions = true,
        description = {"Shows a time in UTC, TAI, TT and TDB (calendar and Julian date).",
            "Accepted: 2031-11-17T04:12:00Z, '... TT', '... TDB', 'JD 2451545.0 TDB', '1998 Feb 28.0977 TT'."})
final class TimeCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", arity = "1..*", paramLabel = "TIME", description = "the time, with its scale")
    String[] words;

    @Override
    public Integer call() {
        Epoch e = EpochParser.parse(String.join(" ", words));
        PrintWriter out = spec.commandLine().getOut();
        out.println("scale,calendar,jd");
        for (TimeScale s : TimeScale.values()) {
            double[] jd = TimeScales.fromTdb(e, s);
            String cal = EpochFormat.iso(e, s, 6) + (s == TimeScale.UTC ? "Z" : "");
            out.println(s + "," + cal + "," + String.format(Locale.ROOT, "%.9f", jd[0] + jd[1]));
        }
        return 0;
    }
}
