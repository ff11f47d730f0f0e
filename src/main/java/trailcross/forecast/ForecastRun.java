package trailcross.forecast;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import trailcross.dynamics.Perihelion;
import trailcross.ejection.Meteoroid;
import trailcross.encounter.Encounter;
import trailcross.encounter.NodeCrossing;
import trailcross.encounter.TrailEncounter;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.StreamDefinition;

/**
 * The whole job for one year: the parent's returns in the chosen span, for each the meteoroid cloud
 * ({@link ReturnCloud}), its propagation to the year with node crossings ({@link TrailPropagation}), the
 * crossings' encounter quantities ({@link Encounter}) and the trail's meeting with the Earth
 * ({@link TrailEncounter}). By default the returns are screened by a quick test — the orbit at the return
 * passes within {@value #SCREEN_MOID_AU} au of the Earth's — and the most recent few kept. Each return's cloud is seeded from (seed, return year), so that a trail's
 * particles do not depend on which other returns are run.
 */
public final class ForecastRun {

    /**
     * The run's settings.
     *
     * @param year the forecast year
     * @param sinceYear the first return year examined
     * @param maxReturns at most this many returns, the most recent (0: all in the span)
     * @param screen keep only returns whose orbit passes within {@link #SCREEN_MOID_AU} of the Earth's
     * @param particles particles per return
     * @param seed the seed
     * @param threads worker threads
     */
    public record Settings(int year, int sinceYear, int maxReturns, boolean screen, int particles, long seed, int threads) {
    }

    /**
     * One trail's result.
     *
     * @param perihelion the return
     * @param returnYear its calendar year
     * @param particles the particles ejected
     * @param encounters every crossing's encounter quantities in the year
     * @param meeting the trail's meeting with the Earth, or null when too few particles were near
     */
    public record Trail(Perihelion perihelion, int returnYear, int particles, List<Encounter> encounters,
            TrailEncounter meeting) {
    }

    /**
     * The result.
     *
     * @param settings the settings
     * @param trails one per return, in time order
     * @param seconds wall-clock seconds
     */
    public record Result(Settings settings, List<Trail> trails, double seconds) {

        /** @return the trails that meet the Earth, strongest (ZHR, else smallest |delta r|) first */
        public List<Trail> meetings() {
            return trails.stream().filter(t -> t.meeting() != null).sorted(Comparator
                    .comparingDouble((Trail t) -> Double.isNaN(t.meeting().zhr()) ? 0 : -t.meeting().zhr())
                    .thenComparingDouble(t -> Math.abs(t.meeting().deltaR()))).toList();
        }
    }

    /** The quick test: a return's trail can reach the Earth when its orbit's MOID is below this, au. */
    public static final double SCREEN_MOID_AU = 0.05;

    private ForecastRun() {
    }

    /**
     * @param stream the stream
     * @param ephemeris the planets
     * @param s the settings
     * @param log receives one line per stage
     * @return the result
     */
    public static Result run(StreamDefinition stream, Ephemeris ephemeris, Settings s, Consumer<String> log) {
        return run(stream, ephemeris, s, log, Progress.NONE, null);
    }

    /**
     * @param stream the stream
     * @param ephemeris the planets
     * @param s the settings
     * @param log receives one line per stage
     * @param progress receives the propagation's progress, per trail
     * @param checkpoint where finished trails are saved and read back (null: none)
     * @return the result
     */
    public static Result run(StreamDefinition stream, Ephemeris ephemeris, Settings s, Consumer<String> log,
            Progress progress, TrailCheckpoint checkpoint) {
        long t0 = System.nanoTime();
        if (s.sinceYear() >= s.year()) {
            throw new IllegalArgumentException("--since " + s.sinceYear() + " must be before --year " + s.year());
        }
        if (s.particles() < 10) {
            throw new IllegalArgumentException("--particles must be >= 10, got " + s.particles());
        }
        double windowStart = ParentReturns.yearStart(s.year());
        double windowEnd = ParentReturns.yearStart(s.year() + 1);
        ephemeris.checkSpan(windowStart);
        ephemeris.checkSpan(windowEnd);
        ParentReturns.Result returns = ParentReturns.compute(stream.parent(), ephemeris, s.sinceYear(), s.year());
        List<Perihelion> chosen = new ArrayList<>(returns.returns().stream().filter(p -> p.t() < windowStart - 30)
                .filter(p -> !s.screen() || trailcross.orbit.Moid.of(p.elements(),
                        trailcross.encounter.EarthOrbit.at(ephemeris, p.t())) <= SCREEN_MOID_AU).toList());
        if (s.maxReturns() > 0 && chosen.size() > s.maxReturns()) {
            chosen = new ArrayList<>(chosen.subList(chosen.size() - s.maxReturns(), chosen.size()));
        }
        if (chosen.isEmpty()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s has no perihelion return between %d and %d whose trail could reach %d",
                    stream.parent().name(), s.sinceYear(), s.year(), s.year()));
        }
        log.accept(String.format(Locale.ROOT, "%d returns since %d: %s", chosen.size(), s.sinceYear(),
                String.join(", ", chosen.stream().map(p -> Integer.toString(ParentReturns.yearOf(p.t()))).toList())));
        double period = stream.parent().elements().period();
        List<Trail> trails = new ArrayList<>();
        for (Perihelion p : chosen) {
            int ry = ParentReturns.yearOf(p.t());
            long tp = System.nanoTime();
            List<NodeCrossing> crossings = checkpoint == null ? null : checkpoint.read(ry);
            boolean resumed = crossings != null;
            if (!resumed) {
                ReturnCloud rc = ReturnCloud.from(stream, ephemeris, returns.history(), p, ry);
                List<Meteoroid> cloud = rc.generator().generate(s.particles(), s.seed() * 1_000_003L + ry, false,
                        s.threads());
                try (Progress.Stage stage = progress.open("trail " + ry, cloud.size())) {
                    crossings = TrailPropagation.run(cloud, ephemeris, windowStart, windowEnd, s.threads(), stage)
                            .crossings();
                }
                if (checkpoint != null) {
                    checkpoint.write(ry, crossings);
                }
            }
            List<Encounter> enc = new ArrayList<>();
            for (NodeCrossing c : crossings) {
                enc.add(Encounter.of(c, ephemeris));
            }
            TrailEncounter meeting = TrailEncounter.of(enc, Double.isFinite(period) ? period : p.elements().period(),
                    stream.populationIndex(), ephemeris);
            trails.add(new Trail(p, ry, s.particles(), enc, meeting));
            log.accept(String.format(Locale.ROOT, "trail %d: %d particles %s in %.1f s, %d crossings, %s", ry,
                    s.particles(), resumed ? "read back from the saved run" : "propagated", (System.nanoTime() - tp) / 1e9,
                    enc.size(),
                    meeting == null ? "too few near the Earth" : String.format(Locale.ROOT, "delta r %+.5f au",
                            meeting.deltaR())));
        }
        return new Result(s, trails, (System.nanoTime() - t0) / 1e9);
    }
}
