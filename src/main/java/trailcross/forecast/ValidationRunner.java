package trailcross.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import trailcross.dynamics.Perihelion;
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
            default -> {
                ForecastRun.Result r = ForecastRun.run(d, ephemeris, new ForecastRun.Settings(c.year(), c.since(), 0, false,
                        c.particles(), 1L, Runtime.getRuntime().availableProcessors()), log);
                TrailEncounter m = r.trails().stream().filter(t -> t.returnYear() == c.trail() && t.meeting() != null)
                        .map(ForecastRun.Trail::meeting).findFirst().orElseThrow(() -> new IllegalStateException(
                                "the " + c.trail() + " trail has too few particles near the Earth"));
                for (ValidationCase.Check k : c.checks()) {
                    out.add(switch (k.quantity()) {
                        case "peak_utc" -> {
                            double pub = EpochParser.parse((String) k.published()).daysSinceJ2000();
                            double min = (m.peakT() - pub) * 1440;
                            yield new Outcome(k.quantity(), EpochFormat.utc(Epoch.ofDaysSinceJ2000(m.peakT()), 0)
                                    + String.format(Locale.ROOT, " ± %.0f min", m.peakSigmaMin()), (String) k.published(),
                                    String.format(Locale.ROOT, "%+.0f min", min), Math.abs(min) <= k.tolerance());
                        }
                        case "abs_delta_r_au" -> {
                            double bound = (Double) k.published();
                            yield new Outcome(k.quantity(), String.format(Locale.ROOT, "%+.5f au", m.deltaR()),
                                    String.format(Locale.ROOT, "< %.4f au", bound), "", Math.abs(m.deltaR()) < bound);
                        }
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

    private static Outcome number(ValidationCase.Check k, double computed, String format, String unit) {
        double pub = (Double) k.published();
        double diff = computed - pub;
        return new Outcome(k.quantity(), String.format(Locale.ROOT, format, computed) + " " + unit,
                String.format(Locale.ROOT, format, pub) + " " + unit, String.format(Locale.ROOT, "%+.2e", diff),
                Math.abs(diff) <= k.tolerance());
    }
}
