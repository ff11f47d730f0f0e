package trailcross.forecast;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import trailcross.dynamics.Perihelion;
import trailcross.ejection.ParticleGenerator;
import trailcross.encounter.AxisMeeting;
import trailcross.encounter.CombinedActivity;
import trailcross.encounter.Encounter;
import trailcross.encounter.NodeCrossing;
import trailcross.encounter.TrailEncounter;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.ParentBody;
import trailcross.stream.StreamDefinition;

/**
 * The whole job for one year or a span of years: the parent's returns in the chosen span, for each the
 * meteoroid cloud ({@link ReturnCloud}) drawn in stages by targeted ejection ({@link TargetedEjection}), its
 * propagation to the span's end with node crossings ({@link TrailPropagation}), the trail's axis
 * ({@link TrailAxis}), and per year the cloud's meeting with the Earth ({@link TrailEncounter}) and the
 * axis' ({@link AxisMeeting}). By default the returns are screened by a quick test — the orbit at the return
 * passes within {@value #SCREEN_MOID_AU} au of the Earth's — and the most recent few kept. Each return's
 * cloud is seeded from (seed, return year), so that a trail's particles do not depend on which other returns
 * are run. A stream without a dust production is run with {@value #REFERENCE_DUST_KG_S} kg/s, so that
 * intensities can be compared among its trails; no ZHR is shown for it.
 */
public final class ForecastRun {

    /**
     * The run's settings.
     *
     * @param firstYear the first forecast year
     * @param lastYear the last (the same for one year)
     * @param sinceYear the first return year examined
     * @param maxReturns at most this many returns, the most recent (0: all in the span)
     * @param screen keep only returns whose orbit passes within {@link #SCREEN_MOID_AU} of the Earth's
     * @param particles particles per return
     * @param seed the seed
     * @param threads worker threads
     * @param targeted draw the cloud by targeted ejection (false: plain sampling of the ejection law)
     */
    public record Settings(int firstYear, int lastYear, int sinceYear, int maxReturns, boolean screen, int particles,
            long seed, int threads, boolean targeted) {

        /**
         * One year, targeted.
         *
         * @param year the forecast year
         * @param sinceYear the first return year examined
         * @param maxReturns at most this many returns (0: all)
         * @param screen whether to screen the returns
         * @param particles particles per return
         * @param seed the seed
         * @param threads worker threads
         */
        public Settings(int year, int sinceYear, int maxReturns, boolean screen, int particles, long seed, int threads) {
            this(year, year, sinceYear, maxReturns, screen, particles, seed, threads, true);
        }

        /** @return the first forecast year */
        public int year() {
            return firstYear;
        }

        /** @return whether the run spans more than one year */
        public boolean span() {
            return lastYear > firstYear;
        }
    }

    /**
     * One trail's meeting with the Earth in one year.
     *
     * @param year the year
     * @param returnYear the trail's return year
     * @param revolutions the parent's revolutions since the return
     * @param cloud the cloud's figures, or null when too few particles were near
     * @param axis the axis' meeting nearest the Earth's path, or null when the axis does not meet the Earth
     *     that year
     */
    public record Meeting(int year, int returnYear, int revolutions, TrailEncounter cloud, AxisMeeting.Root axis) {

        /** @return the peak time shown: the cloud's, else the axis' */
        public double peakT() {
            return cloud != null ? cloud.peakT() : axis.peakT();
        }

        /**
         * @return whether the cloud's and the axis' peak times differ by more than twice their combined
         *     uncertainty
         */
        public boolean timesDisagree() {
            if (cloud == null || axis == null) {
                return false;
            }
            double sigma = Math.hypot(cloud.peakSigmaMin(), axis.sigmaMin());
            return Math.abs(cloud.peakT() - axis.peakT()) * 1440 > 2 * sigma;
        }
    }

    /**
     * One trail's result.
     *
     * @param perihelion the return
     * @param returnYear its calendar year
     * @param particles the particles ejected
     * @param encounters every crossing's encounter quantities in the span
     * @param axisCrossings the axis family's crossings
     * @param meetings its meetings, by year
     */
    public record Trail(Perihelion perihelion, int returnYear, int particles, List<Encounter> encounters,
            List<NodeCrossing> axisCrossings, List<Meeting> meetings) {

        /** @return the first year's cloud meeting, or null */
        public TrailEncounter meeting() {
            return meetings.stream().filter(m -> m.cloud() != null).map(Meeting::cloud).findFirst().orElse(null);
        }
    }

    /**
     * Trails met together in one year.
     *
     * @param year the year
     * @param activity their summed activity
     */
    public record Together(int year, CombinedActivity activity) {
    }

    /**
     * The result.
     *
     * @param settings the settings
     * @param trails one per return, in time order
     * @param seconds wall-clock seconds
     * @param absolute whether ZHRs are absolute (the stream gives a dust production)
     * @param combined the trails' activity summed, wherever two or more trails' clouds meet the Earth within
     *        overlapping hours of a year ({@link CombinedActivity#overlapping}), by year and time
     */
    public record Result(Settings settings, List<Trail> trails, double seconds, boolean absolute,
            List<Together> combined) {

        /**
         * @param year a year of the span
         * @return the summed activities of that year's overlapping trails, in time order (empty when no two
         *     trails' activity overlaps)
         */
        public List<CombinedActivity> combined(int year) {
            return combined.stream().filter(c -> c.year() == year).map(Together::activity).toList();
        }

        /** @return the factor that turns the clouds' profile values into what the outputs show: 1 for absolute
         *     ZHRs, else 1 over the run's strongest cloud meeting's (NaN when every one is zero) */
        public double intensityScale() {
            double max = strongestCloud();
            return absolute ? 1 : max > 0 ? 1 / max : Double.NaN;
        }

        /** @return every meeting, by year, then strongest (ZHR, else smallest |delta r|) first */
        public List<Meeting> meetings() {
            List<Meeting> all = new ArrayList<>();
            for (Trail t : trails) {
                all.addAll(t.meetings());
            }
            all.sort(Comparator.comparingInt(Meeting::year)
                    .thenComparingDouble((Meeting m) -> m.cloud() == null ? 0 : -m.cloud().zhr())
                    .thenComparingDouble(m -> Math.abs(m.cloud() != null ? m.cloud().deltaR() : m.axis().deltaR())));
            return all;
        }

        /**
         * @param m one of the run's meetings
         * @return its cloud's ZHR relative to the run's strongest cloud meeting (NaN without a cloud or when
         *     every ZHR is zero)
         */
        public double relativeIntensity(Meeting m) {
            double max = strongestCloud();
            return m.cloud() == null || max == 0 ? Double.NaN : m.cloud().zhr() / max;
        }

        private double strongestCloud() {
            double max = 0;
            for (Trail t : trails) {
                for (Meeting x : t.meetings()) {
                    if (x.cloud() != null) {
                        max = Math.max(max, x.cloud().zhr());
                    }
                }
            }
            return max;
        }
    }

    /**
     * Default particles per return, over all sampling stages: measured on 2 cores, the Leonids 1999 forecast
     * (four returns) takes 99–127 s and the demo 156–199 s (six runs).
     */
    public static final int DEFAULT_PARTICLES = 6000;
    /** The quick test: a return's trail can reach the Earth when its orbit's MOID is below this, au. */
    public static final double SCREEN_MOID_AU = 0.05;
    /** Dust production assumed for a stream that gives none (relative intensities only), kg/s. */
    public static final double REFERENCE_DUST_KG_S = 1.0;
    /** Crossings are collected this many days beyond the span's ends, for meetings near 1 January. */
    public static final double EDGE_DAYS = 40.0;

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
        return run(stream, ephemeris, s, log, progress, checkpoint, CloudEngine.LOCAL);
    }

    /**
     * @param stream the stream
     * @param ephemeris the planets
     * @param s the settings
     * @param log receives one line per stage
     * @param progress receives the propagation's progress, per trail
     * @param checkpoint where finished trails are saved and read back (null: none)
     * @param engine where each return's sampling stages are ejected and propagated (the rest runs here)
     * @return the result, the same whatever the engine
     */
    public static Result run(StreamDefinition stream, Ephemeris ephemeris, Settings s, Consumer<String> log,
            Progress progress, TrailCheckpoint checkpoint, CloudEngine engine) {
        long t0 = System.nanoTime();
        if (s.lastYear() < s.firstYear()) {
            throw new IllegalArgumentException("--year " + s.firstYear() + ".." + s.lastYear() + ": the span is reversed");
        }
        if (s.lastYear() - s.firstYear() > 200) {
            throw new IllegalArgumentException("--year " + s.firstYear() + ".." + s.lastYear() + ": at most 200 years in one run");
        }
        if (s.sinceYear() >= s.firstYear()) {
            throw new IllegalArgumentException("--since " + s.sinceYear() + " must be before --year " + s.firstYear());
        }
        if (s.particles() < 50) {
            throw new IllegalArgumentException("--particles must be >= 50, got " + s.particles());
        }
        checkMemory(s.particles(), Runtime.getRuntime().maxMemory());
        boolean absolute = stream.parent().dustProductionKgS() != null;
        StreamDefinition run = absolute ? stream : withDust(stream, REFERENCE_DUST_KG_S);
        double[] years = new double[s.lastYear() - s.firstYear() + 2];
        for (int y = 0; y < years.length; y++) {
            years[y] = ParentReturns.yearStart(s.firstYear() + y);
        }
        double spanStart = years[0];
        double spanEnd = years[years.length - 1];
        double windowStart = spanStart - EDGE_DAYS;
        double windowEnd = spanEnd + EDGE_DAYS;
        if (!(windowStart >= ephemeris.firstDay() && windowEnd <= ephemeris.lastDay())) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "--year %s lies outside the span of the ephemeris %s (years %d..%d)",
                    s.span() ? s.firstYear() + ".." + s.lastYear() : Integer.toString(s.firstYear()), ephemeris.name(),
                    ParentReturns.yearOf(ephemeris.firstDay()) + 1, ParentReturns.yearOf(ephemeris.lastDay()) - 1));
        }
        if (ephemeris instanceof trailcross.ephemeris.ChebyshevCache cache) {
            // Every block the parent's and the meteoroids' integrations will ask for, fitted on all threads.
            double epoch = run.parent().epoch().daysSinceJ2000();
            cache.prefill(Math.min(ParentReturns.yearStart(s.sinceYear()), epoch) - 40,
                    Math.max(windowEnd, epoch) + 40, s.threads());
        }
        ParentReturns.Result returns = ParentReturns.compute(run.parent(), ephemeris, s.sinceYear(), s.firstYear());
        List<Perihelion> chosen = new ArrayList<>(returns.returns().stream().filter(p -> p.t() < spanStart - 30)
                .filter(p -> !s.screen() || trailcross.orbit.Moid.of(p.elements(),
                        trailcross.encounter.EarthOrbit.at(ephemeris, p.t())) <= SCREEN_MOID_AU).toList());
        if (s.maxReturns() > 0 && chosen.size() > s.maxReturns()) {
            chosen = new ArrayList<>(chosen.subList(chosen.size() - s.maxReturns(), chosen.size()));
        }
        if (chosen.isEmpty()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s has no perihelion return between %d and %d whose trail could reach %d",
                    stream.parent().name(), s.sinceYear(), s.firstYear(), s.firstYear()));
        }
        log.accept(String.format(Locale.ROOT, "%d returns since %d: %s", chosen.size(), s.sinceYear(),
                String.join(", ", chosen.stream().map(p -> Integer.toString(ParentReturns.yearOf(p.t()))).toList())));
        double period = stream.parent().elements().period();
        List<Trail> trails = new ArrayList<>();
        for (Perihelion p : chosen) {
            int ry = ParentReturns.yearOf(p.t());
            long tp = System.nanoTime();
            TrailCheckpoint.Saved saved = checkpoint == null ? null : checkpoint.read(ry, log);
            boolean resumed = saved != null;
            double axisPeriod = TrailAxis.parentPeriod(p);
            List<Encounter> enc;
            List<NodeCrossing> axis;
            String sampling;
            if (resumed) {
                enc = new ArrayList<>();
                for (NodeCrossing c : saved.crossings()) {
                    enc.add(Encounter.of(c, ephemeris, spanStart, spanEnd));
                }
                axis = saved.axis();
                sampling = "read back from the saved run";
            } else {
                ReturnCloud rc = ReturnCloud.from(run, ephemeris, returns.history(), p, ry);
                ReturnRecipe recipe = engine == CloudEngine.LOCAL ? null
                        : new ReturnRecipe(stream.source().toString(), text(stream), run.parent().dustProductionKgS(),
                                s.sinceYear(), s.firstYear(), ry);
                TargetedEjection.Cloud cloud = TargetedEjection.run(rc.generator(),
                        new trailcross.dynamics.ForceModelFactory(ephemeris, true, true), ephemeris, windowStart,
                        windowEnd, spanStart, spanEnd, s.particles(), s.seed() * 1_000_003L + ry, s.targeted(),
                        s.threads(), progress, "trail " + ry, engine, recipe);
                enc = cloud.encounters();
                sampling = cloud.description();
                // A parent on an unbound orbit passes once: its debris has no trail axis in the periodic sense.
                if (Double.isFinite(axisPeriod)) {
                    double[] range = cloud.periodRange(axisPeriod);
                    axis = TrailAxis.compute(p, range[0], range[1], ephemeris, windowStart, windowEnd, years, s.threads());
                } else {
                    axis = List.of();
                }
                if (checkpoint != null) {
                    checkpoint.write(ry, cloud.crossings(), axis);
                }
            }
            double parentPeriod = Double.isFinite(period) ? period : p.elements().period();
            List<Meeting> meetings = new ArrayList<>();
            for (int y = 0; y + 1 < years.length; y++) {
                double from = years[y];
                double to = years[y + 1];
                List<Encounter> inYear = enc.stream().filter(e -> e.earthT() >= from && e.earthT() < to).toList();
                TrailEncounter cloudMeeting = TrailEncounter.of(inYear, parentPeriod, stream.populationIndex(), ephemeris);
                if (cloudMeeting != null && (cloudMeeting.peakT() < from || cloudMeeting.peakT() >= to)) {
                    cloudMeeting = null;
                }
                AxisMeeting.Root root = TrailAxis.meeting(axis, axisPeriod, ephemeris, from, to);
                if (cloudMeeting != null || (root != null && Math.abs(root.deltaR()) <= AXIS_MEETING_AU)) {
                    double peak = cloudMeeting != null ? cloudMeeting.peakT() : root.peakT();
                    meetings.add(new Meeting(s.firstYear() + y, ry, (int) Math.round((peak - p.t()) / parentPeriod),
                            cloudMeeting, root));
                }
            }
            trails.add(new Trail(p, ry, s.particles(), enc, axis, meetings));
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "trail %d: %d particles %s in %.1f s, %d crossings",
                    ry, s.particles(), sampling, (System.nanoTime() - tp) / 1e9, enc.size()));
            for (Meeting m : meetings) {
                line.append(String.format(Locale.ROOT, "; %d: ", m.year()));
                line.append(m.cloud() == null ? "cloud too thin" : String.format(Locale.ROOT,
                        "delta r %+.5f au, ESS %.0f", m.cloud().deltaR(), m.cloud().ess()));
                if (m.axis() != null) {
                    line.append(String.format(Locale.ROOT, ", axis delta r %+.5f au", m.axis().deltaR()));
                }
            }
            if (meetings.isEmpty()) {
                line.append(", too few near the Earth");
            }
            log.accept(line.toString());
        }
        // Each year's trails together, as an observer counts them (their profiles summed).
        List<Together> combined = new ArrayList<>();
        for (int y = s.firstYear(); y <= s.lastYear(); y++) {
            List<TrailEncounter> clouds = new ArrayList<>();
            for (Trail t : trails) {
                for (Meeting m : t.meetings()) {
                    if (m.year() == y && m.cloud() != null) {
                        clouds.add(m.cloud());
                    }
                }
            }
            long seed = s.seed() * 1_000_003L ^ y;
            for (List<TrailEncounter> group : CombinedActivity.overlapping(clouds)) {
                CombinedActivity c = group.size() < 2 ? null : CombinedActivity.ofMeetings(group, seed++);
                if (c != null) {
                    combined.add(new Together(y, c));
                }
            }
        }
        return new Result(s, trails, (System.nanoTime() - t0) / 1e9, absolute, combined);
    }

    /**
     * Heap held per particle of a trail while it is propagated (its state, its crossing finder, its crossings
     * and their encounter quantities), bytes: an upper figure from the measured peak heap of `bench forecast`
     * (see README), with a factor 2 to spare.
     */
    public static final long BYTES_PER_PARTICLE = 8192;

    /**
     * Refuses, before any work, a particle count whose trail would not fit in the heap.
     *
     * @param particles particles per return
     * @param maxHeapBytes the JVM's heap limit
     * @throws IllegalArgumentException with the estimate and the limit
     */
    public static void checkMemory(int particles, long maxHeapBytes) {
        ParticleGenerator.checkMemory(particles, BYTES_PER_PARTICLE, 300e6, maxHeapBytes);
    }

    private static String text(StreamDefinition stream) {
        try {
            return java.nio.file.Files.readString(stream.source());
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(stream.source() + ": cannot read: " + e.getMessage(), e);
        }
    }

    /** An axis meeting farther from the Earth's path than this, without a cloud meeting, is not listed, au. */
    public static final double AXIS_MEETING_AU = 0.01;

    /**
     * @param stream a stream
     * @param kgS a dust production
     * @return the same stream with that dust production
     */
    public static StreamDefinition withDust(StreamDefinition stream, double kgS) {
        ParentBody b = stream.parent();
        ParentBody nb = new ParentBody(b.name(), b.epoch(), b.elements(), b.a1(), b.a2(), b.a3(), b.radiusKm(),
                b.densityKgM3(), kgS, b.gasProductionMolS());
        return new StreamDefinition(stream.source(), stream.name(), stream.description(), stream.populationIndex(), nb,
                stream.ejection(), stream.particles());
    }
}
