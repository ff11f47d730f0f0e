package trailcross.report;

import java.io.PrintWriter;
import java.util.Locale;
import trailcross.encounter.AxisMeeting;
import trailcross.encounter.CombinedActivity;
import trailcross.encounter.TrailEncounter;
import trailcross.forecast.ForecastRun;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;

/**
 * The forecast's console table, one row per meeting: year, trail (return year), revolutions, the cloud's
 * peak (UTC) ± its resampling σ, solar longitude, delta r of the cloud and of the axis, fM, FWHM, ZHR ± σ
 * (or the intensity relative to the strongest meeting when the stream gives no dust production), the
 * effective sample size, and the axis' peak; a line under a row says where the cloud and the axis disagree
 * by more than their uncertainties, and a line after a year's rows gives trails met in overlapping hours
 * together ({@link CombinedActivity}).
 */
public final class ForecastTable {

    /** Below this effective sample size a row is marked unreliable (resampling underestimates its spread). */
    public static final double FEW = 10;
    /** A trail shapes a sum of trails when its own maximum is at least this share of the sum's. */
    public static final double SHAPES = 0.1;

    private ForecastTable() {
    }

    /**
     * @param o where to print
     * @param streamName the stream's name
     * @param r the forecast
     */
    public static void print(PrintWriter o, String streamName, ForecastRun.Result r) {
        ForecastRun.Settings s = r.settings();
        String years = s.span() ? s.firstYear() + "-" + s.lastYear() : Integer.toString(s.firstYear());
        o.printf(Locale.ROOT, "%s in %s: %d meeting(s) with the Earth (%s sampling)%n", streamName, years,
                r.meetings().size(), s.targeted() ? "targeted" : "plain");
        o.printf(Locale.ROOT, "%-4s %-5s %3s %-27s %9s %9s %9s %-13s %6s %-15s %6s %-17s%n", "year", "trail", "rev",
                "peak UTC +- sigma", "sol.long", "dr cloud", "dr axis", "fM +- sigma", "FWHM", r.absolute() ? "ZHR +- sigma"
                        : "rel. intensity", "ESS", "axis peak UTC");
        java.util.List<ForecastRun.Meeting> meetings = r.meetings();
        for (int k = 0; k < meetings.size(); k++) {
            ForecastRun.Meeting mt = meetings.get(k);
            TrailEncounter m = mt.cloud();
            AxisMeeting.Root a = mt.axis();
            String peak = m == null ? "(cloud too thin)" : String.format(Locale.ROOT, "%s +- %.0f min",
                    minute(m.peakT()), m.peakSigmaMin());
            String intensity = m == null ? "-" : r.absolute() ? String.format(Locale.ROOT, "%.0f +- %.0f", m.zhr(),
                    m.zhrSigma()) : String.format(Locale.ROOT, "%.3f +- %.3f", r.relativeIntensity(mt),
                    m.zhr() > 0 ? r.relativeIntensity(mt) * m.zhrSigma() / m.zhr() : 0);
            o.printf(Locale.ROOT, "%-4d %-5d %3d %-27s %9.4f %9s %9s %-13s %6s %-15s %6s %-17s%n", mt.year(),
                    mt.returnYear(), mt.revolutions(), peak,
                    m != null ? m.solarLongitudeDeg() : a.solarLongitudeDeg(),
                    m == null ? "-" : String.format(Locale.ROOT, "%+.5f", m.deltaR()),
                    a == null ? "-" : String.format(Locale.ROOT, "%+.5f", a.deltaR()),
                    m == null ? (a == null ? "-" : String.format(Locale.ROOT, "%.3f", a.fM()))
                            : Double.isNaN(m.fMSigma()) ? String.format(Locale.ROOT, "%.3f", m.fM())
                            : String.format(Locale.ROOT, "%.3f +- %.3f", m.fM(), m.fMSigma()),
                    m == null ? "-" : String.format(Locale.ROOT, "%.2fh", m.fwhmHours()), intensity,
                    m == null ? "-" : String.format(Locale.ROOT, "%.0f", m.ess()),
                    a == null ? "-" : minute(a.peakT()));
            if (m != null && m.ess() < FEW) {
                o.printf(Locale.ROOT, "     only %.0f effective particles behind this row: its figures and their "
                        + "resampling uncertainties are unreliable (give more --particles)%n",
                        m.ess());
            }
            if (m != null) {
                for (double[] x : m.rivalMaxima()) {
                    o.printf(Locale.ROOT, "     another maximum at %s UT (sol.long %.4f, %.0f%% of the peak): the peak's "
                            + "sigma spans the choice among them%n", minute(x[0]), x[1], 100 * x[2]);
                }
            }
            if (mt.timesDisagree()) {
                // Off the trail's core the Earth samples a tilted cross-section's flank, whose maximum need not
                // lie at the axis' node longitude: the distance says how far off the core the Earth passes.
                o.printf(Locale.ROOT, "     cloud and axis peaks differ by %.0f min, more than twice their uncertainty "
                        + "(cloud %.0f, axis %.1f min; the axis passes %.5f au from the Earth's path)%n",
                        (m.peakT() - a.peakT()) * 1440, m.peakSigmaMin(), a.sigmaMin(), Math.abs(a.deltaR()));
            }
            if (k + 1 == meetings.size() || meetings.get(k + 1).year() != mt.year()) {
                combined(o, r, mt.year());
            }
        }
        if (r.meetings().isEmpty()) {
            o.println("No trail meets the Earth in " + years + " (try more --particles or an earlier --since).");
        }
    }

    /** A line for each group of a year's trails whose activity overlaps, when a group holds two or more. */
    private static void combined(PrintWriter o, ForecastRun.Result r, int year) {
        double scale = r.intensityScale();
        for (CombinedActivity c : r.combined(year)) {
            // The trails that shape the sum: met inside its hours, with a tenth of its maximum or more.
            double[] t = c.times();
            double fewest = r.meetings().stream().filter(m -> m.year() == year && m.cloud() != null)
                    .map(ForecastRun.Meeting::cloud)
                    .filter(m -> m.peakT() >= t[0] && m.peakT() <= t[t.length - 1] && m.zhr() >= SHAPES * c.peakValue())
                    .mapToDouble(TrailEncounter::ess).min().orElse(Double.POSITIVE_INFINITY);
            o.printf(Locale.ROOT, "%-4d %d trails together: maximum %s UT +- %.0f min, %s %s +- %s%s%n", year,
                    c.trails(), minute(c.peakT()), c.peakSigmaMin(), r.absolute() ? "ZHR" : "rel. intensity",
                    String.format(Locale.ROOT, r.absolute() ? "%.0f" : "%.3f", c.peakValue() * scale),
                    String.format(Locale.ROOT, r.absolute() ? "%.0f" : "%.3f", c.peakValueSigma() * scale),
                    fewest < FEW ? " (unreliable: a trail that shapes it has fewer than " + (int) FEW
                            + " effective particles)" : "");
            java.util.List<String> makers = c.makers(SHAPES).stream().map(x -> String.format(Locale.ROOT, "%d trail %.0f%%",
                    trailcross.forecast.ParentReturns.yearOf(x[0]), 100 * x[1])).toList();
            o.printf(Locale.ROOT, "     at that maximum: %s%n", String.join(", ", makers));
            for (double[] x : c.otherMaxima()) {
                o.printf(Locale.ROOT, "     another maximum of these trails together at %s UT (%.0f%% of the highest)%n",
                        minute(x[0]), 100 * x[1]);
            }
        }
    }

    private static String minute(double t) {
        return EpochFormat.utc(Epoch.ofDaysSinceJ2000(t + 0.5 / 1440), 0).substring(0, 16).replace("T", " ");
    }
}
