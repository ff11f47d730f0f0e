package trailcross.forecast;

import java.util.Locale;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.StreamDefinition;

/**
 * Calibrates a stream's dust production on one observed outburst, the published idea of Egal et al. (2019,
 * Icarus): the forecast of a past year is run, and since every particle's weight, hence the computed ZHR, is
 * proportional to the dust production, the production that makes the chosen trail's computed ZHR equal the
 * observed one is X = X_run × ZHR_observed / ZHR_computed. Its statistical uncertainty is the computed ZHR's
 * (resampling) carried over: σ_X = X σ_ZHR / ZHR.
 *
 * @param dustKgS the fitted dust production at 1 au, kg/s
 * @param sigmaKgS its statistical uncertainty, kg/s
 * @param runDustKgS the production the forecast ran with, kg/s
 * @param computedZhr the trail's ZHR at that production
 * @param computedSigma its uncertainty
 * @param result the forecast
 */
public record Calibration(double dustKgS, double sigmaKgS, double runDustKgS, double computedZhr, double computedSigma,
        ForecastRun.Result result) {

    /**
     * @param stream the stream
     * @param ephemeris the planets
     * @param s the forecast's settings (one year)
     * @param trail the return year of the trail observed
     * @param observedZhr the observed ZHR
     * @param log progress lines
     * @return the calibration
     * @throws IllegalArgumentException when the trail does not meet the Earth that year or the ZHR is not positive
     */
    public static Calibration fit(StreamDefinition stream, Ephemeris ephemeris, ForecastRun.Settings s, int trail,
            double observedZhr, Consumer<String> log) {
        if (!(observedZhr > 0) || !Double.isFinite(observedZhr)) {
            throw new IllegalArgumentException("--zhr must be a positive number, got " + observedZhr);
        }
        if (s.span()) {
            throw new IllegalArgumentException("calibrate takes one --year, not a span");
        }
        double used = stream.parent().dustProductionKgS() != null ? stream.parent().dustProductionKgS()
                : ForecastRun.REFERENCE_DUST_KG_S;
        ForecastRun.Result r = ForecastRun.run(ForecastRun.withDust(stream, used), ephemeris, s, log);
        ForecastRun.Meeting m = r.meetings().stream().filter(x -> x.returnYear() == trail && x.cloud() != null)
                .findFirst().orElseThrow(() -> new IllegalArgumentException(String.format(Locale.ROOT,
                        "--trail %d: that trail does not meet the Earth in %d in this run (trails met: %s)", trail,
                        s.year(), String.join(", ", r.meetings().stream().filter(x -> x.cloud() != null)
                                .map(x -> Integer.toString(x.returnYear())).toList()))));
        double zhr = m.cloud().zhr();
        if (!(zhr > 0)) {
            throw new IllegalArgumentException("--trail " + trail + ": the computed ZHR is zero (no meteoroid above the "
                    + "visual limit near the Earth's path); try more --particles");
        }
        double x = used * observedZhr / zhr;
        return new Calibration(x, x * m.cloud().zhrSigma() / zhr, used, zhr, m.cloud().zhrSigma(), r);
    }

    private static final Pattern SECTION = Pattern.compile("^\\s*\\[([^\\]]+)\\]\\s*(#.*)?$");
    private static final Pattern KEY = Pattern.compile("^(\\s*)dust_production_kg_s\\s*=.*$");

    /**
     * A stream file's text with {@code dust_production_kg_s} in its {@code [parent]} section set: the key's line
     * replaced when there is one, else a line added under the section's header; every other line kept.
     *
     * @param text the stream file
     * @param kgS the value
     * @return the new text
     * @throws IllegalArgumentException when the file has no [parent] section
     */
    public static String withDustProduction(String text, double kgS) {
        String[] lines = text.split("\n", -1);
        StringBuilder out = new StringBuilder();
        String section = "";
        int header = -1;
        boolean done = false;
        String value = String.format(Locale.ROOT, "dust_production_kg_s = %.9g", kgS);
        for (int k = 0; k < lines.length; k++) {
            Matcher sm = SECTION.matcher(lines[k]);
            if (sm.matches()) {
                section = sm.group(1).trim();
                if (section.equals("parent")) {
                    header = k;
                }
            }
            Matcher km = KEY.matcher(lines[k]);
            if (section.equals("parent") && km.matches()) {
                lines[k] = km.group(1) + value + "   # calibrated by trailcross calibrate";
                done = true;
            }
        }
        if (header < 0) {
            throw new IllegalArgumentException("the stream file has no [parent] section");
        }
        for (int k = 0; k < lines.length; k++) {
            out.append(lines[k]);
            if (k < lines.length - 1) {
                out.append('\n');
            }
            if (!done && k == header) {
                out.append(value).append("   # calibrated by trailcross calibrate\n");
            }
        }
        return out.toString();
    }
}
