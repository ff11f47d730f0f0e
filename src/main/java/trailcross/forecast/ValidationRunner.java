package trailcross.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import trailcross.dynamics.Perihelion;
import trailcross.encounter.AxisMeeting;
import trailcross.encounter.CombinedActivity;
import trailcross.encounter.EarthOrbit;
import trailcross.encounter.TrailEncounter;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.Angles;
import trailcross.orbit.Moid;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;
import trailcross.time.Epoch;
import trailcross.time.EpochFormat;
import trailcross.time.EpochParser;

/** Runs a {@link ValidationCase}: computes what it names and compares it with the published values. */
public final class ValidationRunner {

    /**
     * One compared quantity.
     *
     * @param quantity the quantity
     * @param computed the computed value, as text
     * @param published the published value, as text
     * @param difference the difference (unit by quantity), as text
     * @param pass whether it is within the tolerance
     */
    public record Outcome(String quantity, String computed, String published, String difference, boolean pass) {
    }

    private ValidationRunner() {
    }

    /**
     * @param c the case
     * @param ephemeris the planets
     * @param log progress lines
     * @return one outcome per check
     */
    public static List<Outcome> run(ValidationCase c, Ephemeris ephemeris, Consumer<String> log) {
        StreamDefinition d = StreamFileReader.read(c.stream());
        List<Outcome> out = new ArrayList<>();
        switch (c.command()) {
            case "moid" -> {
                double moid = Moid.of(d.parent().elements(), EarthOrbit.at(ephemeris, d.parent().epoch().daysSinceJ2000()));
                for (ValidationCase.Check k : c.checks()) {
                    out.add(number(k, moid, "%.8f", "au"));
                }
            }
            case "perihelion" -> {
                ParentReturns.Result r = ParentReturns.compute(d.parent(), ephemeris, c.year(), c.year());
                if (r.returns().isEmpty()) {
                    throw new IllegalArgumentException(c.file() + ": no perihelion in " + c.year());
                }
                Perihelion p = r.returns().get(0);
                for (ValidationCase.Check k : c.checks()) {
                    if (k.quantity().equals("perihelion_tt")) {
                        double pub = EpochParser.parse((String) k.published()).daysSinceJ2000();
                        double diff = p.t() - pub;
                        out.add(new Outcome(k.quantity(), EpochFormat.iso(Epoch.ofDaysSinceJ2000(p.t()),
                                trailcross.time.TimeScale.TT, 0) + " TT", (String) k.published(),
                                String.format(Locale.ROOT, "%+.4f d", diff), Math.abs(diff) <= k.tolerance()));
                    } else {
                        out.add(number(k, p.elements().q(), "%.7f", "au"));
                    }
                }
            }
            case "calibrate" -> {
                ForecastRun.Settings st = settings(c, c.year());
                Calibration cal = Calibration.fit(d, ephemeris, st, c.trail(), c.zhr(), log);
                for (ValidationCase.Check k : c.checks()) {
                    if (k.quantity().equals("calibration_round_trip")) {
                        // The calibrated file written, read back, and forecast again: the trail's ZHR is the observed.
                        java.nio.file.Path tmp;
                        try {
                            tmp = java.nio.file.Files.createTempFile("trailcross-calibrated", ".toml");
                            java.nio.file.Files.writeString(tmp, Calibration.withDustProduction(
                                    java.nio.file.Files.readString(c.stream()), cal.dustKgS()));
                        } catch (java.io.IOException e) {
                            throw new java.io.UncheckedIOException(e);
                        }
                        ForecastRun.Result r2;
                        try {
                            r2 = ForecastRun.run(StreamFileReader.read(tmp), ephemeris, st, log);
                        } finally {
                            tmp.toFile().delete();
                        }
                        double z = r2.meetings().stream().filter(m -> m.returnYear() == c.trail() && m.cloud() != null)
                                .findFirst().orElseThrow().cloud().zhr();
                        double rel = z / c.zhr() - 1;
                        out.add(new Outcome(k.quantity(), String.format(Locale.ROOT, "ZHR %.1f with %.4g kg/s", z,
                                cal.dustKgS()), String.format(Locale.ROOT, "%.0f", c.zhr()),
                                String.format(Locale.ROOT, "%+.1e", rel), Math.abs(rel) <= k.tolerance()));
                    } else if (k.quantity().equals("transfer_zhr_factor")) {
                        StreamDefinition cd = ForecastRun.withDust(d, cal.dustKgS());
                        ForecastRun.Result r2 = ForecastRun.run(cd, ephemeris, settings(c, c.transferYear()), log);
                        ForecastRun.Meeting m = r2.meetings().stream().filter(x -> x.returnYear() == c.transferTrail()
                                && x.cloud() != null).findFirst().orElse(null);
                        double pub = (Double) k.published();
                        double z = m == null ? 0 : m.cloud().zhr();
                        double factor = z / pub;
                        out.add(new Outcome(k.quantity(), String.format(Locale.ROOT, "%d trail in %d: ZHR %.0f +- %.0f",
                                c.transferTrail(), c.transferYear(), z, m == null ? 0 : m.cloud().zhrSigma()),
                                String.format(Locale.ROOT, "ZHR %.0f", pub), String.format(Locale.ROOT, "x %.2f", factor),
                                factor > 0 && Math.max(factor, 1 / factor) <= k.tolerance()));
                    } else {
                        throw new IllegalArgumentException(c.file() + ": " + k.quantity() + " is not a calibrate quantity");
                    }
                }
            }
            case "axis" -> {
                AxisMeeting.Root root = axisMeeting(c, d, ephemeris);
                for (ValidationCase.Check k : c.checks()) {
                    if (root == null) {
                        out.add(new Outcome(k.quantity(), "(the axis does not meet the Earth)", String.valueOf(k.published()),
                                "", false));
                        continue;
                    }
                    out.add(switch (k.quantity()) {
                        case "axis_peak_utc" -> time(k, root.peakT(), root.sigmaMin());
                        case "axis_delta_r_au" -> number(k, root.deltaR(), "%+.5f", "au");
                        case "axis_solar_longitude_deg" -> number(k, root.solarLongitudeDeg(), "%.4f", "deg");
                        default -> throw new IllegalArgumentException(c.file() + ": " + k.quantity()
                                + " is not an axis quantity (axis_peak_utc, axis_delta_r_au, axis_solar_longitude_deg)");
                    });
                }
            }
            default -> {
                ForecastRun.Result r = ForecastRun.run(d, ephemeris, settings(c, c.year()), log);
                List<ValidationCase.Check> perTrail = new ArrayList<>();
                for (ValidationCase.Check k : c.checks()) {
                    if (k.quantity().equals("together_peak_utc")) {
                        // The strongest group of trails met together: what an observer's count follows.
                        CombinedActivity best = r.combined(c.year()).stream()
                                .max(java.util.Comparator.comparingDouble(CombinedActivity::peakValue)).orElse(null);
                        out.add(best == null ? new Outcome(k.quantity(), "(no two trails met together)",
                                String.valueOf(k.published()), "", false) : time(k, best.peakT(), best.peakSigmaMin()));
                    } else {
                        perTrail.add(k);
                    }
                }
                if (perTrail.isEmpty()) {
                    break;
                }
                ForecastRun.Meeting mt = r.meetings().stream().filter(t -> t.returnYear() == c.trail()).findFirst()
                        .orElseThrow(() -> new IllegalStateException("the " + c.trail() + " trail does not meet the Earth"));
                TrailEncounter m = mt.cloud();
                for (ValidationCase.Check k : perTrail) {
                    if (m == null && !k.quantity().startsWith("axis_")) {
                        out.add(new Outcome(k.quantity(), "(cloud too thin)", String.valueOf(k.published()), "", false));
                        continue;
                    }
                    if (mt.axis() == null && k.quantity().startsWith("axis_")) {
                        out.add(new Outcome(k.quantity(), "(the axis does not meet the Earth)", String.valueOf(k.published()),
                                "", false));
                        continue;
                    }
                    out.add(switch (k.quantity()) {
                        case "peak_utc" -> time(k, m.peakT(), m.peakSigmaMin());
                        case "axis_peak_utc" -> time(k, mt.axis().peakT(), mt.axis().sigmaMin());
                        case "peak_sigma_min" -> {
                            double bound = (Double) k.published();
                            yield new Outcome(k.quantity(), String.format(Locale.ROOT, "%.1f min", m.peakSigmaMin()),
                                    String.format(Locale.ROOT, "<= %.1f min", bound), "", m.peakSigmaMin() <= bound);
                        }
                        case "abs_delta_r_au" -> {
                            double bound = (Double) k.published();
                            yield new Outcome(k.quantity(), String.format(Locale.ROOT, "%+.5f au", m.deltaR()),
                                    String.format(Locale.ROOT, "< %.4f au", bound), "", Math.abs(m.deltaR()) < bound);
                        }
                        case "axis_delta_r_au" -> number(k, mt.axis().deltaR(), "%+.5f", "au");
                        case "radiant" -> {
                            double[] rd = (double[]) k.published();
                            double sep = Math.toDegrees(Angles.separation(Math.toRadians(m.raDeg()),
                                    Math.toRadians(m.decDeg()), Math.toRadians(rd[0]), Math.toRadians(rd[1])));
                            yield new Outcome(k.quantity(), String.format(Locale.ROOT, "%.2f %+.2f", m.raDeg(), m.decDeg()),
                                    String.format(Locale.ROOT, "%.2f %+.2f", rd[0], rd[1]),
                                    String.format(Locale.ROOT, "%.2f deg", sep), sep <= k.tolerance());
                        }
                        case "solar_longitude_deg" -> number(k, m.solarLongitudeDeg(), "%.4f", "deg");
                        default -> throw new IllegalArgumentException(c.file() + ": " + k.quantity()
                                + " is not a forecast quantity");
                    });
                }
            }
        }
        return out;
    }

    /**
     * The trail's axis alone (no cloud): the parent integrated from the trail's return to the case's year, the
     * family spanning the case's period offsets, its meeting with the Earth in that year ({@link TrailAxis}).
     */
    private static AxisMeeting.Root axisMeeting(ValidationCase c, StreamDefinition d, Ephemeris ephemeris) {
        ParentReturns.Result r = ParentReturns.compute(d.parent(), ephemeris, c.trail(), c.year());
        Perihelion p = r.returns().stream().filter(x -> ParentReturns.yearOf(x.t()) == c.trail()).findFirst()
                .orElseThrow(() -> new IllegalArgumentException(c.file() + ": no perihelion in " + c.trail()));
        double[] years = {ParentReturns.yearStart(c.year()), ParentReturns.yearStart(c.year() + 1)};
        double[] span = c.offsetDays() != null ? c.offsetDays()
                : new double[] {-ValidationCase.DEFAULT_OFFSET_DAYS, ValidationCase.DEFAULT_OFFSET_DAYS};
        List<trailcross.encounter.NodeCrossing> axis = TrailAxis.compute(p, span[0], span[1], ephemeris,
                years[0] - ForecastRun.EDGE_DAYS, years[1] + ForecastRun.EDGE_DAYS, years,
                Runtime.getRuntime().availableProcessors());
        return TrailAxis.meeting(axis, TrailAxis.parentPeriod(p), ephemeris, years[0], years[1]);
    }

    /** A computed time (UTC) against a published one, the tolerance in minutes. */
    private static Outcome time(ValidationCase.Check k, double t, double sigmaMin) {
        double pub = EpochParser.parse((String) k.published()).daysSinceJ2000();
        double min = (t - pub) * 1440;
        return new Outcome(k.quantity(), EpochFormat.utc(Epoch.ofDaysSinceJ2000(t), 0)
                + String.format(Locale.ROOT, " ± %.1f min", sigmaMin), (String) k.published(),
                String.format(Locale.ROOT, "%+.0f min", min), Math.abs(min) <= k.tolerance());
    }

    /**
     * A case's forecast settings: its since year (or, when 0, the forecast's default screened returns) and its
     * particles (0: the forecast's default).
     */
    private static ForecastRun.Settings settings(ValidationCase c, int year) {
        int particles = c.particles() > 0 ? c.particles() : ForecastRun.DEFAULT_PARTICLES;
        boolean screen = c.since() == 0;
        return new ForecastRun.Settings(year, year, screen ? Math.max(1001, year - 250) : c.since(), screen ? 4 : 0, screen,
                particles, 1L, Runtime.getRuntime().availableProcessors(), true);
    }

    private static Outcome number(ValidationCase.Check k, double computed, String format, String unit) {
        double pub = (Double) k.published();
        double diff = computed - pub;
        return new Outcome(k.quantity(), String.format(Locale.ROOT, format, computed) + " " + unit,
                String.format(Locale.ROOT, format, pub) + " " + unit, String.format(Locale.ROOT, "%+.2e", diff),
                Math.abs(diff) <= k.tolerance());
    }
}
