package trailcross.ejection;

import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.SobolSequenceGenerator;
import org.apache.commons.math3.random.Well19937c;
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
 * the parent's integrated state at that time plus the ejection velocity.
 *
 * <p>Weights: the return's dust mass M (the integral of the production) holds M / ⟨m⟩ real meteoroids;
 * a particle stands for N_real f_k / n_k of them, f_k the number fraction of its bin and n_k the
 * particles in it (one bin when not stratified), so that the weights sum to N_real and Σ w m estimates M.
 * Grains that a model cannot lift off the nucleus are drawn again: the production counts what leaves.
 *
 * <p>Random numbers: pseudo-random from Commons Math's WELL19937c, one generator per block of
 * {@value #BLOCK} particles seeded from (seed, block), or the Sobol sequence (Commons Math; point i + 1
 * for particle i), so that the cloud depends on the seed only, never on the thread count.
 */
public final class ParticleGenerator {

    /** Particles per random-number block. */
    public static final int BLOCK = 4096;
    /** m/s → au/d (IAU 2012 au). */
    public static final double M_S_TO_AU_D = 86400.0 / (Body.Constants.AU_KM * 1e3);
    private static final int MAX_REDRAWS = 1000;

    private final ParentHistory history;
    private final ActiveArc arc;
    private final ProductionProfile production;
    private final SizeDistribution sizes;
    private final EjectionSpeedModel model;
    private final NucleusEscape escape;
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
        this.history = history;
        this.arc = arc;
        this.production = ProductionProfile.of(history, arc, stream.ejection(), stream.parent().dustProductionKgS());
        var p = stream.particles();
        this.sizes = new SizeDistribution(p.radiusMinM(), p.radiusMaxM(), p.densityKgM3(), p.massIndex(),
                p.stratified() ? p.sizeBins() : 1);
        this.model = EjectionSpeedModel.of(stream);
        this.escape = stream.ejection().model() == VelocityModel.FIXED ? null
                : new NucleusEscape(stream.parent().radiusKm(), stream.parent().densityKgM3());
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
        if (n < 1) {
            throw new IllegalArgumentException("--particles must be >= 1, got " + n);
        }
        Meteoroid[] out = new Meteoroid[n];
        int blocks = (n + BLOCK - 1) / BLOCK;
        Runnable job = () -> IntStream.range(0, blocks).parallel().forEach(b -> block(b, n, seed, quasiRandom, out));
        if (threads <= 1) {
            for (int b = 0; b < blocks; b++) {
                block(b, n, seed, quasiRandom, out);
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

    private void block(int b, int n, long seed, boolean quasiRandom, Meteoroid[] out) {
        RandomGenerator rng = new Well19937c(new int[] {(int) seed, (int) (seed >>> 32), b});
        SobolSequenceGenerator sobol = null;
        int from = b * BLOCK;
        int to = Math.min(n, from + BLOCK);
        if (quasiRandom) {
            sobol = new SobolSequenceGenerator(4);
            sobol.skipTo(from + 1);
        }
        int bins = sizes.bins();
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
            int bin = stratified ? i % bins : 0;
            int inBin = stratified ? n / bins + (bin < n % bins ? 1 : 0) : n;
            double weight = realMeteoroids * sizes.numberFraction(bin) / inBin;
            for (int attempt = 0;; attempt++) {
                double t = production.sample(u[0]);
                history.stateAt(t, s);
                double mass = stratified ? sizes.massInBin(bin, u[1]) : sizes.mass(u[1]);
                double radius = sizes.radius(mass);
                double r = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
                double v = model.speedMs(r, radius);
                if (escape != null) {
                    v = escape.speedAtInfinity(v);
                }
                if (v >= 0) {
                    v *= speedScale;
                    directions.direction(u[2], u[3], s, dir);
                    double dv = v * M_S_TO_AU_D;
                    s[3] += dv * dir[0];
                    s[4] += dv * dir[1];
                    s[5] += dv * dir[2];
                    out[i] = new Meteoroid(i, arc.perihelion(), t, s.clone(), radius, mass,
                            RadiationPressure.beta(qpr, density, radius), weight, v);
                    break;
                }
                if (attempt == MAX_REDRAWS) {
                    throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                            "the ejection model lifts no meteoroid of the stream's sizes off the nucleus "
                                    + "(escape speed %.2f m/s); reduce particles.radius_max_m or parent.radius_km",
                            escape.speedMs()));
                }
                fill(rng, u);
            }
        }
    }

    private static void fill(RandomGenerator rng, double[] u) {
        for (int k = 0; k < u.length; k++) {
            u[k] = rng.nextDouble();
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
