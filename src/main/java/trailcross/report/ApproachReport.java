package trailcross.report;

import java.io.PrintWriter;
import java.util.Locale;
import trailcross.encounter.FluenceProfile;
import trailcross.forecast.ApproachRun;

/** The approach run's one-screen console answer to "can the debris reach the target". */
public final class ApproachReport {

    /**
     * Beyond this extra speed a target is called out of reach: cometary dust leaves at metres to hundreds of
     * metres per second, ~1 km/s at most for the smallest grains near the Sun (common practice).
     */
    public static final double OUT_OF_REACH_M_S = 2000;

    private ApproachReport() {
    }

    /**
     * @param o where to print
     * @param r the result
     */
    public static void print(PrintWriter o, ApproachRun.Result r) {
        ApproachRun.Settings s = r.settings();
        o.printf(Locale.ROOT, "Can the debris of %s reach %s?  %s .. %s, returns %s, %d particles in the span%n",
                r.parentName(), r.target(), utc(s.from()), utc(s.to()),
                String.join(", ", r.returns().stream().map(String::valueOf).toList()), r.rows().size());
        if (r.parent() != null) {
            o.printf(Locale.ROOT, "  parent's closest approach:  %.6f au on %s%n", r.parent().distance(), utc(r.parent().t()));
        }
        ApproachRun.Row n = r.nearest();
        o.printf(Locale.ROOT, "  cloud's closest approach:   %.6f au on %s (particle %d, %.1f km/s, radiant RA %.2f Dec %+.2f)%n",
                n.approach().distance(), utc(n.approach().t()), n.approach().id(), n.vRelKmS(), n.raDeg(), n.decDeg());
        for (ApproachRun.Band b : r.bands()) {
            o.printf(Locale.ROOT, "  within %-6s au: %5d particles, %.3g%% of the cloud, %.3g meteoroids, %.3g kg%n",
                    trim(b.withinAu()), b.particles(), 100 * b.fraction(), b.meteoroids(), b.massKg());
        }
        if (r.captureRadiusKm() > 0) {
            o.printf(Locale.ROOT, "  captured (inside %.0f km of the centre, a planet's focusing included): %d particles, "
                    + "%.3g%% of the cloud; expected impacts %.3g ± %.2g%n", r.captureRadiusKm(), r.capturedParticles(), 100 * r.capturedFraction(), r.expectedImpacts(),
                    Double.isNaN(r.expectedImpactsSigma()) ? 0 : r.expectedImpactsSigma());
        }
        FluenceProfile f = r.fluence();
        if (f != null) {
            o.printf(Locale.ROOT, "  fluence (%s): %.3g ± %.2g per km²; peak %s ± %.0f min, FWHM %.1f h "
                    + "(%d particles within %s au, ESS %.0f)%n", r.massLimit(), f.total(), f.totalSigma(), utc(f.peakT()),
                    f.peakSigmaMin(), f.fwhmHours(), f.particles(), trim(f.radiusAu()), f.ess());
        } else {
            o.printf(Locale.ROOT, "  fluence: fewer than 3 particles pass within %s au; no profile%n",
                    trim(FluenceProfile.MAX_RADIUS_AU));
        }
        if (r.reaches()) {
            o.printf(Locale.ROOT, "  answer: YES - meteoroids of this cloud reach %s (%s)%n", r.target(),
                    r.capturedParticles() > 0 ? "particles captured"
                    : r.bands().get(0).particles() > 0 ? "particles within " + trim(r.bands().get(0).withinAu()) + " au"
                    : String.format(Locale.ROOT, "the cloud's fluence there expects %.3g impacts", r.expectedImpacts()));
        } else {
            o.printf(Locale.ROOT, "  answer: no particle of this cloud comes within %s au%s",
                    trim(r.bands().get(0).withinAu()), r.captureRadiusKm() > 0 ? " or is captured" : "");
            if (Double.isNaN(r.extraSpeedMs())) {
                o.println();
            } else if (r.extraSpeedMs() > OUT_OF_REACH_M_S) {
                o.printf(Locale.ROOT, "; it would take about %.0f km/s more ejection speed (linear estimate): out of reach%n",
                        r.extraSpeedMs() / 1000);
            } else {
                o.printf(Locale.ROOT, "; about %.0f m/s more ejection speed would have been needed (linear estimate)%n",
                        r.extraSpeedMs());
            }
        }
        if (!r.absolute()) {
            o.println("  (the stream gives no dust production: numbers are per kg/s of dust)");
        }
    }

    private static String trim(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceFirst("0+$", "").replaceFirst("\\.$", "");
    }

    private static String utc(double t) {
        return ApproachWriter.utc(t, 0);
    }
}
