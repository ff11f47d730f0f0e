package trailcross.forecast;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Consumer;
import java.util.function.LongConsumer;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.Perihelion;
import trailcross.dynamics.Propagator;
import trailcross.dynamics.TestParticle;
import trailcross.ejection.ImportanceWeights;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.ParticleGenerator;
import trailcross.ejection.EjectionFocus;
import trailcross.encounter.Approach;
import trailcross.encounter.ApproachTarget;
import trailcross.encounter.Capture;
import trailcross.encounter.ClosestApproach;
import trailcross.encounter.DensityProfile;
import trailcross.encounter.FluenceProfile;
import trailcross.encounter.TrailEncounter;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.EclipticFrame;
import trailcross.frames.RotationElements;
import trailcross.frames.Spherical;
import trailcross.stream.StreamDefinition;

/**
 * A cloud's approach to a target in space and time: the parent's chosen returns (the single passage of an
 * unbound parent), a plain cloud of the stream's ejection law per return ({@link ParticleGenerator}), its
 * propagation with the full force model over the span ({@link Propagator}), and on the dense output every
 * particle's closest approach to the target ({@link ClosestApproach}); then per particle the relative speed,
 * the radiant seen from the target (the direction opposite the relative velocity at closest approach, in
 * J2000 equatorial, and for a planet in its own equatorial frame, {@link RotationElements}) and capture
 * ({@link Capture}: target radius plus an atmosphere height, gravitational focusing for a massive target);
 * per run the share of the cloud within chosen distances, the fluence profile at the target
 * ({@link FluenceProfile}), the expected number of impacts (fluence × focused cross-section), the parent's
 * own closest approach (on its own integration) and, when nothing arrives, a linear estimate of the extra
 * ejection speed that would have been needed. Each return's cloud is seeded from (seed, return year), as in
 * the forecast.
 */
public final class ApproachRun {

    /** The distances reported by default, au. */
    public static final double[] DEFAULT_WITHIN_AU = {0.001, 0.01, 0.05};
    /** Default atmosphere height added to a planet's radius for capture, km (the meteor region; common practice). */
    public static final double DEFAULT_ATMOSPHERE_KM = 100.0;
    /** Default particles per return. */
    public static final int DEFAULT_PARTICLES = 2000;

    private ApproachRun() {
    }

    /**
     * The run's settings.
     *
     * @param returnYears the returns to eject at (empty: the latest before the span's end, or all since
     *     {@code sinceYear})
     * @param sinceYear every return since this year (null: see returnYears)
     * @param from the span's start, TDB days since J2000
     * @param to its end
     * @param particles particles per return
     * @param seed the seed
     * @param threads worker threads
     * @param atmosphereKm height above a massive target's radius that captures, km
     * @param captureRadiusKm capture radius of a point or track target, km (0: none)
     * @param withinAu the distances to report, au
     * @param minMassKg meteoroids counted in the fluence: above this mass (NaN: above the +6.5-mag mass for the
     *     Earth, all for other targets)
     * @param targeted a bound parent's cloud in two stages, the second concentrated on the periods that come
     *     near the target (false: plain sampling of the ejection law)
     */
    public record Settings(List<Integer> returnYears, Integer sinceYear, double from, double to, int particles,
            long seed, int threads, double atmosphereKm, double captureRadiusKm, double[] withinAu, double minMassKg,
            boolean targeted) {
    }

    /**
     * One particle's approach.
     *
     * @param approach the closest approach
     * @param returnYear the return it was ejected at
     * @param vRelKmS relative speed at closest approach, km/s
     * @param raDeg radiant seen from the target, J2000 equatorial RA, degrees
     * @param decDeg its declination
     * @param planetRaDeg the radiant in the planet's equatorial frame (NaN without one)
     * @param planetDecDeg its declination
     * @param weight real meteoroids the particle stands for
     * @param massKg each one's mass
     * @param ejectionSpeedMs its ejection speed
     * @param ejectionT its ejection, TDB days since J2000
     * @param impactAu the impact parameter b, au
     * @param captured whether it passes inside the capture radius
     * @param counts whether its meteoroids count in the fluence (mass limit)
     */
    public record Row(Approach approach, int returnYear, double vRelKmS, double raDeg, double decDeg,
            double planetRaDeg, double planetDecDeg, double weight, double massKg, double ejectionSpeedMs,
            double ejectionT, double impactAu, boolean captured, boolean counts) {
    }

    /**
     * The cloud within one distance.
     *
     * @param withinAu the distance
     * @param particles particles whose closest approach is inside it
     * @param fraction their share of the cloud's meteoroids (weighted)
     * @param meteoroids the meteoroids they stand for
     * @param massKg their mass
     */
    public record Band(double withinAu, int particles, double fraction, double meteoroids, double massKg) {
    }

    /**
     * The result.
     *
     * @param settings the settings
     * @param target the target's name
     * @param parentName the parent's name
     * @param returns the returns ejected at
     * @param rows one per particle alive in the span, by id
     * @param parent the parent's own closest approach
     * @param fluence the fluence profile of the counted meteoroids, or null when too few pass near
     * @param massLimit the mass limit's description
     * @param bands the cloud within each distance
     * @param captureRadiusKm the capture radius (before focusing), km
     * @param capturedParticles particles captured
     * @param capturedFraction their weighted share of the cloud
     * @param expectedImpacts meteoroids (all sizes) expected to be captured: fluence × focused cross-section
     * @param expectedImpactsSigma its uncertainty
     * @param nearest the particle that came nearest
     * @param extraSpeedMs the extra ejection speed that would have brought the nearest approach to the capture
     *     radius (or the smallest distance reported), m/s: a linear estimate; NaN when the cloud arrives or the
     *     cloud has no spread
     * @param notEjected particles that would have been ejected after the span's end (not propagated)
     * @param absolute whether numbers of meteoroids are absolute (the stream gives a dust production)
     * @param seconds wall-clock seconds
     */
    public record Result(Settings settings, String target, String parentName, List<Integer> returns, List<Row> rows,
            Approach parent, FluenceProfile fluence, String massLimit, List<Band> bands, double captureRadiusKm,
            int capturedParticles, double capturedFraction, double expectedImpacts, double expectedImpactsSigma,
            Row nearest, double extraSpeedMs, int notEjected, boolean absolute, double seconds) {

        /**
         * @return whether the cloud reaches the target: a particle is captured or passes within the smallest
         *     distance reported, or the fluence at the target times its focused cross-section expects at least
         *     one impact
         */
        public boolean reaches() {
            return reaches(capturedParticles, bands, expectedImpacts);
        }

        static boolean reaches(int captured, List<Band> bands, double expectedImpacts) {
            return captured > 0 || bands.get(0).particles() > 0 || expectedImpacts >= 1;
        }
    }

    /**
     * @param stream the stream
     * @param ephemeris the planets
     * @param target the target
     * @param s the settings
     * @param log receives one line per stage
     * @param progress receives the particles propagated so far, or null
     * @return the result
     */
    public static Result run(StreamDefinition stream, Ephemeris ephemeris, ApproachTarget target, Settings s,
            Consumer<String> log, LongConsumer progress) {
        long t0 = System.nanoTime();
        if (!(s.to() > s.from())) {
            throw new IllegalArgumentException("--to must be after --from");
        }
        if (s.to() - s.from() > 100 * 365.25) {
            throw new IllegalArgumentException("--from .. --to: at most 100 years in one run");
        }
        if (s.particles() < 10) {
            throw new IllegalArgumentException("--particles must be >= 10, got " + s.particles());
        }
        if (s.threads() < 1) {
            throw new IllegalArgumentException("--threads must be >= 1, got " + s.threads());
        }
        if (!(s.atmosphereKm() >= 0) || !(s.captureRadiusKm() >= 0)) {
            throw new IllegalArgumentException("--atmosphere-km and --capture-radius-km must be >= 0");
        }
        for (double w : s.withinAu()) {
            if (!(w > 0)) {
                throw new IllegalArgumentException("--within: distances must be positive, got " + w);
            }
        }
        ForecastRun.checkMemory(s.particles(), Runtime.getRuntime().maxMemory());
        for (double t : new double[] {s.from(), s.to()}) {
            ephemeris.checkSpan(t);
            if (t < target.firstDay() || t > target.lastDay()) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "--from/--to: %s is known from JD %.3f to %.3f TDB only", target.name(),
                        target.firstDay() + 2451545, target.lastDay() + 2451545));
            }
        }
        boolean absolute = stream.parent().dustProductionKgS() != null;
        StreamDefinition run = absolute ? stream : ForecastRun.withDust(stream, ForecastRun.REFERENCE_DUST_KG_S);
        double period = stream.parent().elements().period();
        int untilYear = ParentReturns.yearOf(s.to());
        int since;
        if (s.sinceYear() != null) {
            since = s.sinceYear();
        } else if (!s.returnYears().isEmpty()) {
            since = s.returnYears().stream().mapToInt(Integer::intValue).min().orElseThrow();
        } else {
            double back = Double.isFinite(period) ? 1.2 * period + 400 : 2 * 365.25;
            since = ParentReturns.yearOf(Math.min(s.from(), stream.parent().epoch().daysSinceJ2000()) - back);
        }
        since = Math.min(since, ParentReturns.yearOf(s.from()));
        if (since > untilYear) {
            throw new IllegalArgumentException("--since " + since + " is after the span's end");
        }
        ParentReturns.Result returns = ParentReturns.compute(run.parent(), ephemeris, since, untilYear);
        List<Perihelion> before = returns.returns().stream().filter(p -> p.t() < s.to()).toList();
        List<Perihelion> chosen = new ArrayList<>();
        if (!s.returnYears().isEmpty()) {
            for (int y : s.returnYears()) {
                Perihelion p = before.stream().filter(q -> ParentReturns.yearOf(q.t()) == y).findFirst()
                        .orElseThrow(() -> new IllegalArgumentException(String.format(Locale.ROOT,
                                "--return %d: %s has no perihelion passage in %d before the span's end (list them "
                                        + "with 'trailcross returns STREAM --since YEAR')", y, stream.parent().name(), y)));
                chosen.add(p);
            }
        } else if (s.sinceYear() != null) {
            chosen.addAll(before);
        } else if (!before.isEmpty()) {
            chosen.add(before.get(before.size() - 1));
        }
        if (chosen.isEmpty()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s has no perihelion passage between %d and the span's end", stream.parent().name(), since));
        }
        List<Integer> years = chosen.stream().map(p -> ParentReturns.yearOf(p.t())).toList();
        log.accept(String.format(Locale.ROOT, "%s: %d particles per return at %s, to %s from %s to %s",
                stream.parent().name(), s.particles(), String.join(", ", years.stream().map(String::valueOf).toList()),
                target.name(), utc(s.from()), utc(s.to())));

        ClosestApproach parentFinder = new ClosestApproach(target, s.from(), s.to(), -1);
        returns.history().replay(parentFinder);
        Approach parent = parentFinder.result();
        double probeT = parent == null ? Double.NaN : parent.t();
        List<Meteoroid> cloud = new ArrayList<>();
        ConcurrentHashMap<Long, Integer> returnOf = new ConcurrentHashMap<>();
        ConcurrentHashMap<Long, ClosestApproach> finders = new ConcurrentHashMap<>();
        Propagator prop = new Propagator(new ForceModelFactory(ephemeris, true, true), TrailPropagation.EPSILON, 1e4,
                s.threads());
        int notEjected = 0;
        boolean earth = target.name().equals("earth");
        for (int k = 0; k < chosen.size(); k++) {
            Perihelion p = chosen.get(k);
            int ry = years.get(k);
            ParticleGenerator gen = ReturnCloud.from(run, ephemeris, returns.history(), p, ry).generator();
            long seed = s.seed() * 1_000_003L + ry;
            long first = (long) k * s.particles();
            // A bound parent's cloud is drawn in two stages when targeted: a pilot from the ejection law, then a
            // proposal in the period at ejection learned on the pilot particles that came near the target
            // (EjectionFocus, with a defensive floor), importance-weighted by the balance heuristic. An unbound
            // parent's periods are not finite: its cloud is plain.
            boolean staged = s.targeted() && Double.isFinite(p.elements().period());
            int[] sizes = staged ? new int[] {(int) (s.particles() * PILOT_SHARE), 0} : new int[] {s.particles()};
            if (staged) {
                sizes[1] = s.particles() - sizes[0];
            }
            ImportanceWeights weights = new ImportanceWeights(gen);
            List<Meteoroid> ret = new ArrayList<>();
            List<Meteoroid> pilot = null;
            long id = first;
            for (int stage = 0; stage < sizes.length; stage++) {
                EjectionFocus focus = stage == 0 ? EjectionFocus.PRIOR : learn(pilot, finders);
                // At the Earth the later stage shares its particles among the size bins in proportion to the
                // meteoroids bright enough to be seen (at the pilot's median relative speed), as the forecast does.
                double[] allocation = stage == 0 || !earth || !gen.stratified() ? null
                        : TargetedEjection.allocation(gen, TrailEncounter.massLimitKg(medianSpeedKmS(pilot, finders)));
                long stageSeed = stage == 0 ? seed : seed + 7_919_000_003L * stage;
                List<Meteoroid> ms = gen.generate(sizes[stage], stageSeed, false, s.threads(), focus, id, allocation);
                weights.add(new ImportanceWeights.Stage(focus, id, sizes[stage],
                        gen.meanAcceptance(focus, TargetedEjection.Z_DRAWS, stageSeed ^ 0x5DEECE66DL), allocation));
                if (stage == 0) {
                    pilot = ms;
                }
                List<Meteoroid> alive = new ArrayList<>();
                for (Meteoroid m : ms) {
                    if (m.t() > s.to()) {
                        notEjected++;
                    } else {
                        alive.add(m);
                    }
                }
                propagate(prop, alive, target, s, probeT, finders, progress);
                ret.addAll(alive);
                id += sizes[stage];
            }
            for (Meteoroid m : ret) {
                double w = staged ? weights.weight(m.id(), EjectionFocus.Features.of(m.state(), m.beta()))
                        : m.weight();
                cloud.add(new Meteoroid(m.id(), m.returnT(), m.t(), m.state(), m.radiusM(), m.massKg(), m.beta(), w,
                        m.speedMs()));
                returnOf.put(m.id(), ry);
            }
        }
        if (cloud.isEmpty()) {
            throw new IllegalArgumentException("every particle would be ejected after --to: choose a later end");
        }
        double gm = target.gm();
        double radiusKm = target.radiusKm() > 0 ? target.radiusKm() + s.atmosphereKm() : s.captureRadiusKm();
        double radiusAu = radiusKm / Body.Constants.AU_KM;
        String massLimit = !Double.isNaN(s.minMassKg()) ? String.format(Locale.ROOT, "above %.3g kg", s.minMassKg())
                : earth ? "brighter than +6.5 mag" : "all sizes";
        RotationElements rot = target.rotation();
        List<Row> rows = new ArrayList<>();
        for (Meteoroid m : cloud) {
            Approach a = finders.get(m.id()).result();
            if (a == null) {
                continue;
            }
            double[] rel = a.relative();
            double vInf2 = Capture.vInfinitySquared(rel, gm);
            double vKmS = a.speed() * Body.Constants.AU_KM / 86400;
            double[] from = EclipticFrame.equatorialOf(new double[] {-rel[3], -rel[4], -rel[5]});
            Spherical sp = Spherical.of(from);
            double pra = Double.NaN;
            double pdec = Double.NaN;
            if (rot != null) {
                double[] pr = rot.toPlanetEquatorialDeg(a.t(), from);
                pra = pr[0];
                pdec = pr[1];
            }
            double limit;
            if (!Double.isNaN(s.minMassKg())) {
                limit = s.minMassKg();
            } else if (earth) {
                limit = TrailEncounter.massLimitKg(Math.sqrt(Math.max(vInf2, 1e-30)) * Body.Constants.AU_KM / 86400);
            } else {
                limit = 0;
            }
            rows.add(new Row(a, returnOf.get(m.id()), vKmS, trailcross.frames.Angles.normaliseDeg(sp.lonDeg()),
                    sp.latDeg(), pra, pdec, m.weight(), m.massKg(), m.speedMs(), m.t(), Capture.impactParameter(rel, gm),
                    Capture.captured(rel, gm, radiusAu), m.massKg() >= limit));
        }
        int n = rows.size();
        double total = 0;
        for (Row r : rows) {
            total += r.weight();
        }
        double[] within = s.withinAu().clone();
        Arrays.sort(within);
        List<Band> bands = new ArrayList<>();
        for (double d : within) {
            int c = 0;
            double w = 0;
            double mass = 0;
            for (Row r : rows) {
                if (r.approach().distance() <= d) {
                    c++;
                    w += r.weight();
                    mass += r.weight() * r.massKg();
                }
            }
            bands.add(new Band(d, c, total > 0 ? w / total : 0, w, mass));
        }
        int captured = 0;
        double capturedW = 0;
        for (Row r : rows) {
            if (r.captured()) {
                captured++;
                capturedW += r.weight();
            }
        }
        double[] t = new double[n];
        double[] b = new double[n];
        double[] counted = new double[n];
        double[] all = new double[n];
        for (int i = 0; i < n; i++) {
            Row r = rows.get(i);
            t[i] = r.approach().t();
            b[i] = r.impactAu();
            counted[i] = r.counts() ? r.weight() : 0;
            all[i] = r.weight();
        }
        long seed = s.seed() * 7919L + 17;
        FluenceProfile fluence = FluenceProfile.of(t, b, counted, seed);
        // Impacts: every meteoroid inside the sampling disc stands for a fluence; times the focused
        // cross-section at its own v∞ it gives the expected captures.
        double expected = 0;
        double expectedSigma = Double.NaN;
        FluenceProfile allSizes = radiusAu > 0 ? FluenceProfile.of(t, b, all, seed) : null;
        if (allSizes != null) {
            double disc = Math.PI * allSizes.radiusAu() * allSizes.radiusAu();
            double[] part = new double[n];
            for (int i = 0; i < n; i++) {
                if (b[i] <= allSizes.radiusAu()) {
                    double vInf2 = Capture.vInfinitySquared(rows.get(i).approach().relative(), gm);
                    part[i] = all[i] * Capture.crossSection(radiusAu, gm, vInf2) / disc;
                    expected += part[i];
                }
            }
            expectedSigma = expected / Math.sqrt(Math.max(1, DensityProfile.kish(part)));
        }
        Row nearest = rows.stream().min((x, y) -> Double.compare(x.approach().distance(), y.approach().distance()))
                .orElseThrow();
        boolean reaches = Result.reaches(captured, bands, expected);
        double extra = reaches ? Double.NaN
                : extraSpeed(cloud, finders, parent, nearest.approach().distance(), radiusAu > 0 ? radiusAu : within[0],
                        probeT, returns.history());
        return new Result(s, target.name(), stream.parent().name(), years, rows, parent, fluence, massLimit, bands,
                radiusKm, captured, total > 0 ? capturedW / total : 0, expected, expectedSigma, nearest, extra, notEjected,
                absolute, (System.nanoTime() - t0) / 1e9);
    }

    /** Propagates particles to the span's end, each with its closest-approach finder. */
    private static void propagate(Propagator prop, List<Meteoroid> ms, ApproachTarget target, Settings s, double probeT,
            ConcurrentHashMap<Long, ClosestApproach> finders, LongConsumer progress) {
        if (ms.isEmpty()) {
            return;
        }
        prop.propagate(ms.stream().map(Meteoroid::toTestParticle).toList(), s.to(), p -> {
            ClosestApproach f = new ClosestApproach(target, s.from(), s.to(), p.id(), probeT);
            finders.put(p.id(), f);
            return f;
        }, progress);
    }

    /**
     * The second stage's proposal: a kernel density of the periods at ejection of the pilot particles whose
     * closest approach came within {@value #FIRST_HIT_AU} au (doubled until {@value #ENOUGH_HITS} did, up to
     * {@value #MAX_HIT_AU} au), bandwidth by Silverman's rule widened by {@value #WIDEN}; the prior when
     * fewer than three came near.
     */
    private static EjectionFocus learn(List<Meteoroid> pilot, ConcurrentHashMap<Long, ClosestApproach> finders) {
        List<Double> hits = new ArrayList<>();
        for (double w = FIRST_HIT_AU; w <= MAX_HIT_AU * 1.0001 && hits.size() < ENOUGH_HITS; w *= 2) {
            hits.clear();
            for (Meteoroid m : pilot) {
                ClosestApproach f = finders.get(m.id());
                Approach a = f == null ? null : f.result();
                double p0 = ParticleGenerator.periodAtEjection(m.state(), m.beta());
                if (a != null && a.distance() <= w && Double.isFinite(p0)) {
                    hits.add(p0);
                }
            }
        }
        if (hits.size() < 3) {
            return EjectionFocus.PRIOR;
        }
        double[] p = hits.stream().mapToDouble(Double::doubleValue).toArray();
        double[] w = new double[p.length];
        Arrays.fill(w, 1.0);
        double h = Math.max(0.01, WIDEN * DensityProfile.bandwidth(p, w));
        return TargetedEjection.withFloor(EjectionFocus.learn(p, w, h, 1e-9), pilot, f -> EjectionFocus.learn(p, w, h, f));
    }

    /** The pilot's median relative speed at closest approach, km/s. */
    private static double medianSpeedKmS(List<Meteoroid> pilot, ConcurrentHashMap<Long, ClosestApproach> finders) {
        double[] v = pilot.stream().map(m -> finders.get(m.id())).filter(java.util.Objects::nonNull)
                .map(ClosestApproach::result).filter(java.util.Objects::nonNull)
                .mapToDouble(a -> a.speed() * Body.Constants.AU_KM / 86400).sorted().toArray();
        return v.length == 0 ? 30 : v[v.length / 2];
    }

    /** Share of a bound parent's particles in the pilot stage. */
    public static final double PILOT_SHARE = 0.3;
    /** The pilot's particles nearer than this (au) teach the proposal; the distance is doubled until enough. */
    public static final double FIRST_HIT_AU = 0.02;
    /** At most this distance, au. */
    public static final double MAX_HIT_AU = 0.32;
    /** Hits wanted. */
    public static final int ENOUGH_HITS = 10;
    /** The proposal's bandwidth factor (exploration). */
    public static final double WIDEN = 1.5;

    /**
     * The cloud's spreading rate k at the parent's closest approach: the weighted median over the particles
     * alive then of their distance from the parent divided by their ejection speed (au per m/s); the nearest
     * approach's shortfall over k is the extra speed a linear spreading would have needed.
     */
    private static double extraSpeed(List<Meteoroid> cloud, ConcurrentHashMap<Long, ClosestApproach> finders,
            Approach parent, double nearest, double goal, double parentT, trailcross.dynamics.ParentHistory history) {
        if (parent == null) {
            return Double.NaN;
        }
        double[] ps = new double[6];
        history.stateAt(parentT, ps);
        List<Double> rates = new ArrayList<>();
        List<Double> weights = new ArrayList<>();
        for (Meteoroid m : cloud) {
            double[] x = finders.get(m.id()).probe();
            if (x == null || !(m.speedMs() > 0) || m.t() >= parentT) {
                continue;
            }
            double d = Math.sqrt((x[0] - ps[0]) * (x[0] - ps[0]) + (x[1] - ps[1]) * (x[1] - ps[1])
                    + (x[2] - ps[2]) * (x[2] - ps[2]));
            rates.add(d / m.speedMs());
            weights.add(m.weight());
        }
        if (rates.isEmpty()) {
            return Double.NaN;
        }
        double k = DensityProfile.weightedQuantile(rates.stream().mapToDouble(Double::doubleValue).toArray(),
                weights.stream().mapToDouble(Double::doubleValue).toArray(), 0.5);
        double shortfall = nearest - goal;
        return k > 0 && shortfall > 0 ? shortfall / k : Double.NaN;
    }

    private static String utc(double t) {
        return trailcross.time.EpochFormat.utc(trailcross.time.Epoch.ofDaysSinceJ2000(t), 0);
    }
}
