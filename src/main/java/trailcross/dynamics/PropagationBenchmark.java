package trailcross.dynamics;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import trailcross.ephemeris.Body;
import trailcross.orbit.Elements;

/**
 * The standard propagation workload: Halley-type test particles (q ≈ 0.98 au, e ≈ 0.905, i ≈ 162.5°,
 * a ≈ 10.3 au, small spreads; seeded), Sun + planets + Earth + Moon + 1PN (the default barycentric frame),
 * 100 years backwards from 2000. Measures particle-years per CPU-second (thread CPU time) and the final
 * position error against a reference run that shares neither the step criterion nor the tolerance with the
 * measured one (Gauss–Radau with the timescale criterion at ε = 1e-16), itself cross-checked on a subset
 * against Hipparchus's Gragg–Bulirsch–Stoer at tight tolerance: a reference counts only where two methods
 * agree. (Hipparchus's DP853 is no reference here: in the barycentric frame its rounding holds it near
 * 3e-9 au over this century at any tolerance; see {@code AgainstReferenceIntegratorsTest}.)
 */
public final class PropagationBenchmark {

    /** One measured variant. */
    public record Figure(String integrator, int threads, double particleYearsPerCpuSecond, double medianErrorAu,
            double maxErrorAu, double wallSeconds) {
        /** @return the machine-readable line of the bench contract */
        public String line() {
            return String.format(Locale.ROOT, "bench propagate %s threads=%d particle_years_per_cpu_s=%.1f "
                    + "median_error_au=%.3e max_error_au=%.3e wall_s=%.2f", integrator, threads,
                    particleYearsPerCpuSecond, medianErrorAu, maxErrorAu, wallSeconds);
        }
    }

    /** The reference cross-check: how far the reference is from GBS on the subset. */
    public record ReferenceCheck(int particles, double medianAu, double maxAu) {
    }

    private static final double YEARS = 100;
    /** Particles integrated, untimed, before each measured run. */
    private static final int WARM_UP = 100;
    private final ForceModelFactory forces;
    private final List<TestParticle> particles;
    private final double tEnd;
    private double[][] reference;

    /**
     * @param forces the force model (planets from a shared cache)
     * @param count number of particles
     * @param seed the cloud's seed
     */
    public PropagationBenchmark(ForceModelFactory forces, int count, long seed) {
        this.forces = forces;
        this.particles = cloud(count, seed, 0.0);
        this.tEnd = -YEARS * 365.25;
    }

    /**
     * The benchmark's Halley-type cloud.
     *
     * @param n particles
     * @param seed seed
     * @param t0 epoch, TDB days since J2000
     * @return the particles
     */
    public static List<TestParticle> cloud(int n, long seed, double t0) {
        Random r = new Random(seed);
        List<TestParticle> out = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double q = 0.98 + 0.005 * r.nextGaussian();
            double e = 0.905 + 0.001 * r.nextGaussian();
            Elements el = Elements.ofDegrees(q, e, 162.5 + 0.1 * r.nextGaussian(), 235.3 + 0.1 * r.nextGaussian(),
                    172.5 + 0.1 * r.nextGaussian(), t0 + 2451545.0 - 600 + 1200 * r.nextDouble(), Body.SUN.gm());
            out.add(new TestParticle(k, t0, el.stateAt(t0 + 2451545.0).toArray(), 0.0));
        }
        return out;
    }

    /**
     * Runs the reference (all particles) and its GBS cross-check on {@code checkCount} of them.
     *
     * @param threads threads for the reference run
     * @param checkCount particles cross-checked with GBS
     * @return the cross-check
     */
    public ReferenceCheck reference(int threads, int checkCount) throws Exception {
        reference = run(threads, k -> new GaussRadau15(1e-16, 1e4, GaussRadau15.Criterion.TIMESCALE)
                .integrate(forces.create(0), 0, particles.get(k).state(), tEnd, null).state(), particles.size()).states;
        int n = Math.min(checkCount, particles.size());
        double[][] dp = run(threads, k -> new ReferenceIntegrator(ReferenceIntegrator.Kind.GBS, 1e-16, 1e-14)
                .integrate(forces.create(0), 0, particles.get(k).state(), tEnd), n).states;
        double[] d = new double[n];
        for (int k = 0; k < n; k++) {
            d[k] = distance(dp[k], reference[k]);
        }
        return new ReferenceCheck(n, median(d), Arrays.stream(d).max().orElse(0));
    }

    /**
     * @param integrator "gauss-radau" (ε = 1e-9, IAS15's customary value) or "dp853" (relative tolerance 1e-12)
     * @param threads threads
     * @return the figure
     */
    public Figure measure(String integrator, int threads) throws Exception {
        return measure(integrator, threads, 1e-9);
    }

    /**
     * @param integrator "gauss-radau" or "dp853" (relative tolerance 1e-12)
     * @param threads threads
     * @param epsilon Gauss–Radau's ε
     * @return the figure
     */
    public Figure measure(String integrator, int threads, double epsilon) throws Exception {
        Task task = switch (integrator) {
            case "gauss-radau" -> k -> new GaussRadau15(epsilon, 1e4).integrate(forces.create(0), 0,
                    particles.get(k).state(), tEnd, null).state();
            case "dp853" -> k -> new ReferenceIntegrator(ReferenceIntegrator.Kind.DP853, 1e-14, 1e-12)
                    .integrate(forces.create(0), 0, particles.get(k).state(), tEnd);
            default -> throw new IllegalArgumentException("unknown integrator " + integrator);
        };
        // Untimed warm-up of this very variant: the JIT recompiles the integrator for the branch it takes
        // (the reference ran another criterion), and a figure taken during that is the JIT's, not ours.
        run(threads, task, Math.min(WARM_UP, particles.size()));
        long wall = System.nanoTime();
        Run r = run(threads, task, particles.size());
        double wallSeconds = (System.nanoTime() - wall) / 1e9;
        double[] err = new double[particles.size()];
        for (int k = 0; k < err.length; k++) {
            err[k] = distance(r.states[k], reference[k]);
        }
        return new Figure(integrator, threads, particles.size() * YEARS / r.cpuSeconds, median(err),
                Arrays.stream(err).max().orElse(0), wallSeconds);
    }

    private interface Task {
        double[] run(int k) throws Exception;
    }

    private record Run(double[][] states, double cpuSeconds) {
    }

    private static Run run(int threads, Task task, int n) throws Exception {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<double[]>> fs = new ArrayList<>();
            double[] cpu = new double[n];
            for (int k = 0; k < n; k++) {
                final int i = k;
                fs.add(pool.submit(() -> {
                    long c = mx.getCurrentThreadCpuTime();
                    double[] s = task.run(i);
                    cpu[i] = (mx.getCurrentThreadCpuTime() - c) / 1e9;
                    return s;
                }));
            }
            double[][] states = new double[n][];
            for (int k = 0; k < n; k++) {
                states[k] = fs.get(k).get();
            }
            return new Run(states, Arrays.stream(cpu).sum());
        } finally {
            pool.shutdown();
        }
    }

    private static double distance(double[] a, double[] b) {
        return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]) + (a[2] - b[2]) * (a[2] - b[2]));
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length == 0 ? 0 : s.length % 2 == 1 ? s[s.length / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
    }
}
