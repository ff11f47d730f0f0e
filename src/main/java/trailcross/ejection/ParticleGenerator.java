package trailcross.ejection;

import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.SobolSequenceGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.StatUtils;
import trailcross.dynamics.ParentHistory;
import trailcross.ephemeris.Body;
import trailcross.stream.StreamDefinition;
import trailcross.stream.VelocityModel;

/**
 * Turns one return of a parent into a cloud of meteoroids. Each particle takes an ejection time from the
 * production along the active arc ({@link ProductionProfile}), a mass from the power law
 * ({@link SizeDistribution}, stratified in logarithmic bins when the stream asks, particle i in bin
 * i mod K), an ejection speed from the stream's model reduced by the nucleus' gravity and multiplied by the
 * stream's scale, a direction ({@link DirectionSampler}) and β ({@link RadiationPressure}); its state is
 * the parent's integrated state at that time plus the ejection velocity. Under a proposal the direction is
 * drawn on the band of directions that can reach the proposal's periods ({@link PeriodBand}), the same law
 * as keeping each candidate of the ejection law with its acceptance, in fewer candidates.
 *
 * <p>Weights: the return's dust mass M (the integral of the production) holds M / ⟨m⟩ real meteoroids;
 * a particle stands for N_real f_k / n_k of them, f_k the number fraction of its bin and n_k the
 * particles in it (one bin when not stratified), so that the weights sum to N_real and Σ w m estimates M.
 * Grains that a model cannot lift off the nucleus are drawn again: the production counts what leaves.
 *
 * <p>Random numbers: pseudo-random from Commons Math's WELL19937c, one generator per block of
 * {@value #BLOCK} particles ({@value #FOCUSED_BLOCK} under a proposal, whose particles each cost thousands of
 * candidates, so that a stage of a few thousand still spreads over every thread) seeded from (seed, block),
 * or the Sobol sequence (Commons Math; point i + 1 for particle i), so that the cloud depends on the seed
 * only, never on the thread count.
 */
public final class ParticleGenerator {

    /** Particles per random-number block. */
    public static final int BLOCK = 4096;
    /** Particles per random-number block under a proposal (not the prior). */
    public static final int FOCUSED_BLOCK = 64;
    /** m/s → au/d (IAU 2012 au). */
    public static final double M_S_TO_AU_D = 86400.0 / (Body.Constants.AU_KM * 1e3);
    private static final int MAX_REDRAWS = 1000;

    /** The parent's states over the arc, for the candidates' draws. */
    private final trailcross.dynamics.StateTable arcStates;
    private final ActiveArc arc;
    private final ProductionProfile production;
    private final SizeDistribution sizes;
    private final EjectionSpeedModel model;
    private final NucleusEscape escape;
    /** The escape's speed, m/s (NaN without an escape model). */
    private final double escapeSpeed;
    private final DirectionSampler directions;
    private final double speedScale;
    private final double qpr;
    private final double density;
    private final boolean stratified;

    /**
     * @param stream the stream definition
     * @param history the parent's history, covering the arc
     * @param arc the active arc of the return
     */
    public ParticleGenerator(StreamDefinition stream, ParentHistory history, ActiveArc arc) {
        this.arc = arc;
        this.arcStates = new trailcross.dynamics.StateTable(history, arc.start(), arc.end());
        this.production = ProductionProfile.of(history, arc, stream.ejection(), stream.parent().dustProductionKgS());
        var p = stream.particles();
        this.sizes = new SizeDistribution(p.radiusMinM(), p.radiusMaxM(), p.densityKgM3(), p.massIndex(),
                p.stratified() ? p.sizeBins() : 1);
        this.model = EjectionSpeedModel.of(stream);
        this.escape = stream.ejection().model() == VelocityModel.FIXED ? null
                : new NucleusEscape(stream.parent().radiusKm(), stream.parent().densityKgM3());
        this.escapeSpeed = escape == null ? Double.NaN : escape.speedMs();
        this.directions = new DirectionSampler(stream.ejection().directions(), stream.ejection().coneHalfAngleDeg());
        this.speedScale = stream.ejection().speedScale();
        this.qpr = p.radiationPressureEfficiency();
        this.density = p.densityKgM3();
        this.stratified = p.stratified();
    }

    /**
     * @param n number of particles (≥ 1)
     * @param seed the seed
     * @param quasiRandom draw from the Sobol sequence instead of the pseudo-random generator
     * @param threads worker threads (the result does not depend on it)
     * @return the particles, ids 0 … n − 1
     */
    public List<Meteoroid> generate(int n, long seed, boolean quasiRandom, int threads) {
        return generate(n, seed, quasiRandom, threads, EjectionFocus.PRIOR, 0);
    }

    /**
     * A cloud drawn from a proposal: each particle's candidates come from the stream's own ejection law
     * and are kept with the focus' acceptance of their conditions at ejection ({@link EjectionFocus}); with
     * {@link EjectionFocus#PRIOR} this is the plain cloud, bit for bit. Weights are the physical ones; the
     * importance weights come from {@link ImportanceWeights}.
     *
     * @param n number of particles (≥ 1)
     * @param seed the seed
     * @param quasiRandom draw the first candidate of each particle from the Sobol sequence
     * @param threads worker threads (the result does not depend on it)
     * @param focus the proposal
     * @param firstId the first particle's id (ids firstId … firstId + n − 1; size bins by position)
     * @return the particles
     */
    public List<Meteoroid> generate(int n, long seed, boolean quasiRandom, int threads, EjectionFocus focus, long firstId) {
        return generate(n, seed, quasiRandom, threads, focus, firstId, null);
    }

    /**
     * As {@link #generate(int, long, boolean, int, EjectionFocus, long)}, with the particles shared among the size
     * bins in given proportions (stratified sampling with any allocation stays unbiased: a particle of bin k
     * stands for N f_k / n_k meteoroids; Cochran 1977, ch. 5). Bin k takes a contiguous run of positions, its
     * count the largest-remainder rounding of n × share_k.
     *
     * @param n number of particles (≥ 1)
     * @param seed the seed
     * @param quasiRandom draw the first candidate of each particle from the Sobol sequence
     * @param threads worker threads (the result does not depend on it)
     * @param focus the proposal
     * @param firstId the first particle's id
     * @param allocation each bin's share of the particles (null: equal, particle i in bin i mod K)
     * @return the particles
     */
    public List<Meteoroid> generate(int n, long seed, boolean quasiRandom, int threads, EjectionFocus focus, long firstId,
            double[] allocation) {
        return generate(n, seed, quasiRandom, threads, focus, firstId, allocation, true);
    }

    /**
     * The same law as {@link #generate(int, long, boolean, int, EjectionFocus, long, double[])} drawn the plain
     * way: every candidate from the ejection law, kept with its acceptance. The baseline {@code bench eject}
     * times the band's envelope against.
     *
     * @param n number of particles
     * @param seed the seed
     * @param threads worker threads
     * @param focus the proposal
     * @return the particles
     */
    List<Meteoroid> generateByRejection(int n, long seed, int threads, EjectionFocus focus) {
        return generate(n, seed, false, threads, focus, 0, null, false);
    }

    private List<Meteoroid> generate(int n, long seed, boolean quasiRandom, int threads, EjectionFocus focus, long firstId,
            double[] allocation, boolean useBand) {
        if (allocation != null && (!stratified || allocation.length != sizes.bins())) {
            throw new IllegalArgumentException("an allocation needs stratified sizes and one share per bin");
        }
        if (n < 1) {
            throw new IllegalArgumentException("--particles must be >= 1, got " + n);
        }
        Meteoroid[] out = new Meteoroid[n];
        int size = blockSize(focus);
        int blocks = (n + size - 1) / size;
        PeriodBand band = focus.isPrior() || !useBand ? null : band(focus);
        Runnable job = () -> IntStream.range(0, blocks).parallel()
                .forEach(b -> block(b, n, seed, quasiRandom, focus, band, firstId, allocation, out, n));
        if (threads <= 1) {
            for (int b = 0; b < blocks; b++) {
                block(b, n, seed, quasiRandom, focus, band, firstId, allocation, out, n);
            }
        } else {
            ForkJoinPool pool = new ForkJoinPool(threads);
            try {
                pool.submit(job).join();
            } finally {
                pool.shutdown();
            }
        }
        return Arrays.asList(out);
    }

    /** Relative standard error aimed at for a proposal's normalising constant Z. */
    public static final double Z_RELATIVE_ERROR = 0.01;
    /** Most prior draws per size bin spent on Z. */
    public static final int Z_MAX_DRAWS = 3_200_000;
    /** Independently shifted copies of the quasi-random points per size bin, for Z's error. */
    public static final int Z_REPLICATES = 10;

    /**
     * The normalising constant of a proposal per size bin, Z_k = E_p[a(x)] over the stream's own ejection
     * law in bin k (cheap: no integration), by randomised quasi-Monte Carlo: Z_k = E[floor + w (a − floor) /
     * (1 − cos α)] over the ejection time and mass and a direction uniform on the candidate's band of width w
     * ({@link PeriodBand}; off the band a is the floor), a function of four uniform numbers (time, mass in the
     * bin, the band's μ and azimuth), so Z_k is an integral over the unit
     * 4-cube, taken on the Sobol points (Commons Math) under {@value #Z_REPLICATES} independent random shifts
     * modulo 1 (Cranley &amp; Patterson 1976; L'Ecuyer &amp; Lemieux 2002, "Recent advances in randomized
     * quasi-Monte Carlo methods"), whose spread gives the error. Points are added, doubling, from {@code
     * draws} per bin until that error is within {@value #Z_RELATIVE_ERROR} of Z_k or {@value #Z_MAX_DRAWS}
     * candidates are spent (Z's error is shared by every weight of its stage). Grains the model cannot lift
     * are left out of a replicate's mean, as the ejection redraws them. Sampling the direction on the band
     * instead of from the law takes the variance from that of a rare acceptance to that of its share of the
     * band. Measured on the test's proposal (ParticleGeneratorTest): 0.4–0.5% from 20,000 points per bin, where
     * 100,000 independent draws of the law give 1.0–1.5%, about 50 times fewer candidates for one error. Z's error is not carried into the ZHR's σ: at 1% against the
     * demo's smallest relative ZHR σ (5%), it would add 2% to that σ in quadrature.
     *
     * @param focus the proposal
     * @param draws candidates per bin at first
     * @param seed the seed
     * @return Z per bin (all 1 for the prior)
     */
    public double[] meanAcceptance(EjectionFocus focus, int draws, long seed) {
        return meanAcceptanceWithError(focus, draws, seed)[0];
    }

    /**
     * {@link #meanAcceptance} with each bin's standard error.
     *
     * @param focus the proposal
     * @param draws candidates per bin at first
     * @param seed the seed
     * @return {Z per bin, its standard error per bin}
     */
    public double[][] meanAcceptanceWithError(EjectionFocus focus, int draws, long seed) {
        double[] z = new double[sizes.bins()];
        double[] se = new double[sizes.bins()];
        if (focus.isPrior()) {
            Arrays.fill(z, 1.0);
            return new double[][] {z, se};
        }
        PeriodBand band = band(focus);
        if (band == null) {
            Arrays.fill(z, focus.floor());
            return new double[][] {z, se};
        }
        int copies = Z_REPLICATES;
        IntStream.range(0, z.length).parallel().forEach(k -> {
            RandomGenerator rng = new Well19937c(new int[] {(int) seed, (int) (seed >>> 32), -1 - k});
            double[][] shift = new double[copies][4];
            for (double[] sh : shift) {
                fill(rng, sh);
            }
            SobolSequenceGenerator sobol = new SobolSequenceGenerator(4);
            double[] u = new double[4];
            double[] s = new double[6];
            double[] dir = new double[3];
            double[] c = new double[CANDIDATE];
            double[] mu = new double[2];
            double[] sum = new double[copies];
            long[] lifted = new long[copies];
            long points = 0;
            long last = Math.max(1, Z_MAX_DRAWS / copies);
            for (long target = Math.max(1, draws / copies);; target = Math.min(2 * target, last)) {
                for (; points < target; points++) {
                    double[] p = sobol.nextVector();
                    for (int r = 0; r < copies; r++) {
                        for (int j = 0; j < 4; j++) {
                            double v = p[j] + shift[r][j];
                            u[j] = v >= 1 ? v - 1 : v;
                        }
                        if (base(k, u[0], u[1], s, c)) {
                            sum[r] += acceptanceOverBand(focus, band, u[2], u[3], s, dir, c, mu);
                            lifted[r]++;
                        }
                    }
                }
                double[] replicate = new double[copies];
                for (int r = 0; r < copies; r++) {
                    if (lifted[r] == 0) {
                        throw cannotLift();
                    }
                    replicate[r] = sum[r] / lifted[r];
                }
                double mean = StatUtils.mean(replicate);
                double error = Math.sqrt(StatUtils.variance(replicate, mean) / copies);
                if (error <= Z_RELATIVE_ERROR * mean || points >= last) {
                    z[k] = mean;
                    se[k] = error;
                    break;
                }
            }
        });
        return new double[][] {z, se};
    }

    /**
     * An unbiased estimate of E[a | time, size], from one direction uniform on the candidate's band:
     * floor + w (a − floor) / (1 − cos α) when the direction lies in the law's cap ({@link PeriodBand}).
     */
    private double acceptanceOverBand(EjectionFocus focus, PeriodBand band, double x, double y, double[] s, double[] dir,
            double[] c, double[] mu) {
        band.limits(s, c[SPEED] * M_S_TO_AU_D, c[BETA], mu);
        double w = mu[1] - mu[0];
        double floor = band.floor();
        if (!(w > 0) || !bandDirection(s, mu[0], mu[1], x, y, dir)) {
            return floor;
        }
        eject(s, dir, c[SPEED]);
        return floor + w * (focus.acceptance(s, c[BETA]) - floor) / band.capArea();
    }

    /**
     * The orbital period at ejection under the Sun's gravity reduced by radiation pressure, from the
     * vis-viva energy: a = 1/(2/r − v²/μ), P = 2π √(a³/μ), μ = GM☉(1 − β). One function for the proposal and
     * for the crossings' record, so that both see the same number.
     *
     * @param state heliocentric state (au, au/d)
     * @param beta radiation-pressure β
     * @return the period, days (infinite when unbound)
     */
    public static double periodAtEjection(double[] state, double beta) {
        double mu = Body.SUN.gm() * (1 - beta);
        double r = Math.sqrt(state[0] * state[0] + state[1] * state[1] + state[2] * state[2]);
        double v2 = state[3] * state[3] + state[4] * state[4] + state[5] * state[5];
        double inv = 2 / r - v2 / mu;
        if (!(inv > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        double a = 1 / inv;
        return 2 * Math.PI * Math.sqrt(a * a * a / mu);
    }

    /**
     * @param index a particle's position in its cloud (id − first id)
     * @param n the cloud's size
     * @param allocation the bins' shares (null: equal, interleaved)
     * @return its size bin
     */
    public int binOf(long index, int n, double[] allocation) {
        if (!stratified) {
            return 0;
        }
        if (allocation == null) {
            return (int) (index % sizes.bins());
        }
        int[] c = counts(n, allocation);
        long acc = 0;
        for (int k = 0; k < c.length; k++) {
            acc += c[k];
            if (index < acc) {
                return k;
            }
        }
        throw new IllegalArgumentException("position " + index + " beyond the cloud of " + n);
    }

    /**
     * @param bin a size bin
     * @param n the cloud's size
     * @param allocation the bins' shares (null: equal)
     * @return how many of the cloud's particles are in that bin
     */
    public int inBin(int bin, int n, double[] allocation) {
        int bins = sizes.bins();
        if (!stratified) {
            return n;
        }
        return allocation == null ? n / bins + (bin < n % bins ? 1 : 0) : counts(n, allocation)[bin];
    }

    /** Largest-remainder rounding of n × share (ties to the lower bin). */
    static int[] counts(int n, double[] share) {
        double total = 0;
        for (double x : share) {
            total += x;
        }
        int[] c = new int[share.length];
        double[] rest = new double[share.length];
        int used = 0;
        for (int k = 0; k < share.length; k++) {
            double x = n * share[k] / total;
            c[k] = (int) Math.floor(x);
            rest[k] = x - c[k];
            used += c[k];
        }
        while (used < n) {
            int best = 0;
            for (int k = 1; k < share.length; k++) {
                if (rest[k] > rest[best]) {
                    best = k;
                }
            }
            c[best]++;
            rest[best] = -1;
            used++;
        }
        return c;
    }

    /** @return whether sizes are stratified in bins */
    public boolean stratified() {
        return stratified;
    }

    /**
     * Particles lo … hi − 1 of the cloud {@code generate(n, seed, false, 1, focus, firstId, allocation)} would
     * give, bit for bit, drawn without the others after hi (each generator block is seeded from (seed, block);
     * a slice starting inside a block draws that block's earlier particles again and drops them): what a
     * cluster task ejects.
     *
     * @param n the whole cloud's particles
     * @param seed the seed
     * @param focus the proposal
     * @param firstId the first particle's id of the whole cloud
     * @param allocation the size-bin shares, or null
     * @param lo the slice's first position
     * @param hi one past its last
     * @return the slice's particles
     */
    public List<Meteoroid> generateSlice(int n, long seed, EjectionFocus focus, long firstId, double[] allocation, int lo,
            int hi) {
        if (lo < 0 || hi > n || lo >= hi) {
            throw new IllegalArgumentException("slice " + lo + ".." + hi + " is not inside 0.." + n);
        }
        Meteoroid[] out = new Meteoroid[n];
        int size = blockSize(focus);
        PeriodBand band = focus.isPrior() ? null : band(focus);
        for (int b = lo / size; b * size < hi; b++) {
            block(b, n, seed, false, focus, band, firstId, allocation, out, hi);
        }
        return Arrays.asList(Arrays.copyOfRange(out, lo, hi));
    }

    private void block(int b, int n, long seed, boolean quasiRandom, EjectionFocus focus, PeriodBand band,
            long firstId, double[] allocation, Meteoroid[] out, int upTo) {
        RandomGenerator rng = new Well19937c(new int[] {(int) seed, (int) (seed >>> 32), b});
        SobolSequenceGenerator sobol = null;
        int size = blockSize(focus);
        int from = b * size;
        int to = Math.min(Math.min(n, upTo), from + size);
        if (quasiRandom) {
            sobol = new SobolSequenceGenerator(4);
            sobol.skipTo(from + 1);
        }
        double realMeteoroids = production.massKg() / sizes.meanMass();
        double[] u = new double[4];
        double[] s = new double[6];
        double[] dir = new double[3];
        for (int i = from; i < to; i++) {
            if (sobol != null) {
                System.arraycopy(sobol.nextVector(), 0, u, 0, 4);
            } else {
                fill(rng, u);
            }
            int bin = binOf(i, n, allocation);
            double weight = realMeteoroids * sizes.numberFraction(bin) / inBin(bin, n, allocation);
            out[i] = band != null ? drawInBand(firstId + i, bin, weight, u, rng, focus, band, s, dir)
                    : draw(firstId + i, bin, weight, u, rng, focus, s, dir);
        }
    }

    /** @return the particles per random-number block under a focus */
    private static int blockSize(EjectionFocus focus) {
        return focus.isPrior() ? BLOCK : FOCUSED_BLOCK;
    }

    /** One particle: candidates from u (then from rng) until the nucleus lets it go and the focus keeps it. */
    private Meteoroid draw(long id, int bin, double weight, double[] u, RandomGenerator rng, EjectionFocus focus,
            double[] s, double[] dir) {
        double[] c = new double[CANDIDATE];
        int stuck = 0;
        for (long attempt = 0;; attempt++) {
            if (candidate(bin, u, s, dir, c)) {
                // The prior keeps every candidate without a draw, so that its cloud is the plain one bit for bit.
                if (focus.isPrior() || rng.nextDouble() < focus.acceptance(s, c[BETA])) {
                    return particle(id, weight, s, c);
                }
            } else if (++stuck == MAX_REDRAWS) {
                throw cannotLift();
            }
            if (attempt > 100_000_000L) {
                throw new IllegalStateException("targeted ejection: no candidate kept in 1e8 draws");
            }
            fill(rng, u);
        }
    }

    /**
     * One particle from a focus whose acceptance exceeds its floor somewhere, by the band's envelope
     * ({@link PeriodBand}): the same law as {@link #draw}, in fewer candidates.
     */
    private Meteoroid drawInBand(long id, int bin, double weight, double[] u, RandomGenerator rng, EjectionFocus focus,
            PeriodBand band, double[] s, double[] dir) {
        double[] c = new double[CANDIDATE];
        double[] mu = new double[2];
        double floor = band.floor();
        int stuck = 0;
        double u0 = u[0];
        double u1 = u[1];
        for (long attempt = 0;; attempt++) {
            int cell = band.cell(bin, u0);
            double bound = band.bound(bin, cell);
            // The time from the law inside the cell (its slice of the production's probability).
            if (base(bin, (cell + rng.nextDouble()) / PeriodBand.CELLS, u1, s, c)) {
                // Only a run of grains it cannot lift says the model lifts none (a narrow band takes many draws).
                stuck = 0;
                band.limits(s, c[SPEED] * M_S_TO_AU_D, c[BETA], mu);
                double envelope = band.envelope(mu[1] - mu[0]);
                if (envelope > bound) {
                    throw new IllegalStateException(String.format(java.util.Locale.ROOT,
                            "targeted ejection: a candidate's envelope %.6g exceeds its bound %.6g", envelope, bound));
                }
                if (rng.nextDouble() * bound < envelope) {
                    if (rng.nextDouble() * envelope < floor) {
                        directions.direction(rng.nextDouble(), rng.nextDouble(), s, dir);
                        eject(s, dir, c[SPEED]);
                        return particle(id, weight, s, c);
                    }
                    if (bandDirection(s, mu[0], mu[1], rng.nextDouble(), rng.nextDouble(), dir)) {
                        eject(s, dir, c[SPEED]);
                        if (rng.nextDouble() * (1 - floor) < focus.acceptance(s, c[BETA]) - floor) {
                            return particle(id, weight, s, c);
                        }
                    }
                }
            } else if (++stuck == MAX_REDRAWS) {
                throw cannotLift();
            }
            if (attempt > 100_000_000L) {
                throw new IllegalStateException("targeted ejection: no candidate kept in 1e8 draws");
            }
            u0 = rng.nextDouble();
            u1 = rng.nextDouble();
        }
    }

    private Meteoroid particle(long id, double weight, double[] s, double[] c) {
        return new Meteoroid(id, arc.perihelion(), c[TIME], s.clone(), c[RADIUS], c[MASS], c[BETA], weight, c[SPEED]);
    }

    /** @return the error for a stream none of whose grains the ejection model lifts off the nucleus */
    private IllegalArgumentException cannotLift() {
        return new IllegalArgumentException("the ejection model lifts no meteoroid of the stream's sizes off the "
                + "nucleus" + (escape == null ? "" : String.format(java.util.Locale.ROOT, " (escape speed %.2f m/s)",
                        escape.speedMs())) + "; reduce particles.radius_max_m or parent.radius_km");
    }

    /** Slots of a candidate's record ({@link #candidate}). */
    private static final int TIME = 0;
    private static final int MASS = 1;
    private static final int RADIUS = 2;
    private static final int BETA = 3;
    private static final int SPEED = 4;
    private static final int CANDIDATE = 5;

    /**
     * One candidate of the stream's own ejection law from four uniform numbers, without allocation (the
     * normalising constants draw millions).
     *
     * @param bin its size bin
     * @param u four numbers in [0, 1)
     * @param s receives its heliocentric state at ejection
     * @param dir scratch (3)
     * @param c receives its time, mass, radius, β and ejection speed (m/s) at {@link #TIME} … {@link #SPEED}
     * @return false when the model lifts no grain of that size off the nucleus (draw again)
     */
    private boolean candidate(int bin, double[] u, double[] s, double[] dir, double[] c) {
        if (!base(bin, u[0], u[1], s, c)) {
            return false;
        }
        directions.direction(u[2], u[3], s, dir);
        eject(s, dir, c[SPEED]);
        return true;
    }

    /**
     * A candidate's ejection before its direction: time, mass, radius, β and speed in c, the nucleus' state in s.
     *
     * @return false when the model lifts no grain of that size off the nucleus (draw again)
     */
    private boolean base(int bin, double u0, double u1, double[] s, double[] c) {
        double t = production.sample(u0);
        arcStates.stateAt(t, s);
        double mass = massAt(bin, u1);
        double radius = sizes.radius(mass);
        double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
        double v = liftedSpeed(r, radius);
        if (!(v >= 0)) {
            return false;
        }
        c[TIME] = t;
        c[MASS] = mass;
        c[RADIUS] = radius;
        c[BETA] = RadiationPressure.beta(qpr, density, radius);
        c[SPEED] = v;
        return true;
    }

    /** A mass from a uniform number: inside the size bin when sizes are stratified, else from the whole law. */
    private double massAt(int bin, double u) {
        return stratified ? sizes.massInBin(bin, u) : sizes.mass(u);
    }

    /** The ejection speed beyond the nucleus' pull, scaled, m/s (negative when the grain is not lifted). */
    private double liftedSpeed(double rAu, double radius) {
        double v = model.speedMs(rAu, radius);
        if (escape != null) {
            // NucleusEscape.speedAtInfinity with its constant escape speed taken once.
            double v2 = v * v - escapeSpeed * escapeSpeed;
            v = v2 > 0 ? Math.sqrt(v2) : -1;
        }
        return v >= 0 ? v * speedScale : -1;
    }

    /** Adds the ejection velocity (speed in m/s along the unit direction) to the nucleus' state. */
    private static void eject(double[] s, double[] dir, double speedMs) {
        double dv = speedMs * M_S_TO_AU_D;
        s[3] += dv * dir[0];
        s[4] += dv * dir[1];
        s[5] += dv * dir[2];
    }

    /**
     * A direction uniform on the band μ1 ≤ d·v̂ ≤ μ2 about the nucleus' velocity: μ from x, the azimuth from y.
     *
     * @return whether it lies in the direction law's cap (else it is to be rejected)
     */
    private boolean bandDirection(double[] s, double mu1, double mu2, double x, double y, double[] dir) {
        double v = Math.sqrt(s[3] * s[3] + s[4] * s[4] + s[5] * s[5]);
        double[] axis = {s[3] / v, s[4] / v, s[5] / v};
        DirectionSampler.around(axis, mu1 + (mu2 - mu1) * x, 2 * Math.PI * y, dir);
        double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
        double sunward = -(dir[0] * s[0] + dir[1] * s[1] + dir[2] * s[2]) / r;
        return sunward >= directions.cosMax();
    }

    /**
     * The band of directions for a focus, with each time cell's and size bin's bound M_max: the least V Δv
     * there on a grid of {@value #BAND_GRID_TIMES} times (the cell's ends included) and
     * {@value #BAND_GRID_MASSES} masses (the bin's edges included), where speeds are smooth and monotonic.
     *
     * @param focus the proposal (not the prior)
     * @return the band, or null when the acceptance is the floor at every period
     */
    PeriodBand band(EjectionFocus focus) {
        int bins = sizes.bins();
        int cells = PeriodBand.CELLS;
        double[][] least = new double[bins][cells];
        double[] s = new double[6];
        for (int k = 0; k < bins; k++) {
            for (int cell = 0; cell < cells; cell++) {
                least[k][cell] = leastSpeedProduct(k, production.sample(cell / (double) cells),
                        production.sample(Math.min((cell + 1.0) / cells, Math.nextDown(1.0))), s);
            }
        }
        return PeriodBand.of(focus, directions.cosMax(), least);
    }

    /** The least V Δv on the grid of one size bin and one span of ejection times, (au/d)² (0 near no lift). */
    private double leastSpeedProduct(int k, double start, double end, double[] s) {
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < BAND_GRID_TIMES; i++) {
            arcStates.stateAt(start + (end - start) * i / (BAND_GRID_TIMES - 1), s);
            double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
            double speed = Math.sqrt(s[3] * s[3] + s[4] * s[4] + s[5] * s[5]);
            for (int j = 0; j < BAND_GRID_MASSES; j++) {
                double u = Math.min(j / (BAND_GRID_MASSES - 1.0), Math.nextDown(1.0));
                double mass = massAt(k, u);
                double v = liftedSpeed(r, sizes.radius(mass));
                // Near a size the model cannot lift, speeds fall to zero between the grid's masses.
                min = v > 0 ? Math.min(min, speed * v * M_S_TO_AU_D) : 0;
            }
        }
        return Double.isFinite(min) ? min : 0;
    }

    /** Times and masses of the grid that bounds a band's M(u). */
    private static final int BAND_GRID_TIMES = 17;
    private static final int BAND_GRID_MASSES = 9;

    private static void fill(RandomGenerator rng, double[] u) {
        for (int k = 0; k < u.length; k++) {
            u[k] = rng.nextDouble();
        }
    }

    /**
     * Heap per particle of a cloud held in memory (a {@link Meteoroid}, its state array, its list slot: ~200
     * bytes on a 64-bit JVM with compressed pointers), bytes, with a factor 2.5 to spare.
     */
    public static final long BYTES_PER_PARTICLE = 512;

    /**
     * Refuses, before any work, a cloud that would not fit in the heap ({@link #BYTES_PER_PARTICLE} each).
     *
     * @param n particles
     * @param maxHeapBytes the JVM's heap limit
     * @throws IllegalArgumentException with the estimate and the limit
     */
    public static void checkMemory(long n, long maxHeapBytes) {
        checkMemory(n, BYTES_PER_PARTICLE, 200e6, maxHeapBytes);
    }

    /**
     * Refuses, before any work, particles that would not fit in the heap.
     *
     * @param n particles
     * @param bytesEach heap per particle, bytes
     * @param baseBytes heap needed besides them (ephemeris cache, code), bytes
     * @param maxHeapBytes the JVM's heap limit
     * @throws IllegalArgumentException with the estimate and the limit
     */
    public static void checkMemory(long n, long bytesEach, double baseBytes, long maxHeapBytes) {
        double need = (double) n * bytesEach + baseBytes;
        if (need > 0.9 * maxHeapBytes) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "--particles %d needs about %.1f GB of heap, more than the %.1f GB this JVM may use (give fewer "
                            + "particles, or more heap with TRAILCROSS_JAVA_OPTS=-Xmx...)", n, need / 1e9,
                    maxHeapBytes / 1e9));
        }
    }

    /** @return the active arc */
    public ActiveArc arc() {
        return arc;
    }

    /** @return the production along the arc */
    public ProductionProfile production() {
        return production;
    }

    /** @return the size distribution */
    public SizeDistribution sizes() {
        return sizes;
    }

    /** @return the number of real meteoroids the return sheds in the size range (NaN without dust production) */
    public double realMeteoroids() {
        return production.massKg() / sizes.meanMass();
    }
}
