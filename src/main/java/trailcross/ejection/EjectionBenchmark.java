package trailcross.ejection;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.random.Well19937c;
import trailcross.dynamics.ForceModelFactory;
import trailcross.dynamics.ParentHistory;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.orbit.Elements;
import trailcross.stream.DirectionLaw;
import trailcross.stream.EjectionSettings;
import trailcross.stream.ParentBody;
import trailcross.stream.ParticleSettings;
import trailcross.stream.StreamDefinition;
import trailcross.stream.VelocityModel;
import trailcross.time.Epoch;

/**
 * The standard ejection workload: an invented Halley-type parent (q 0.95 au, e 0.91, i 140°) integrated
 * with the planets over its return, active inside 3 au, Jones (1995) speeds, sunlit directions, five
 * stratified size bins from 0.1 mm to 1 cm. It times the generator (pseudo-random and Sobol) against the
 * bare cost of drawing its four uniform numbers per particle, measured in the same run, and a proposal's
 * draws on the band of directions against plain rejection.
 */
public final class EjectionBenchmark {

    /**
     * One figure.
     *
     * @param variant what was timed
     * @param threads worker threads
     * @param particlesPerSecond particles per wall-clock second
     * @param vsUniformDraws ratio to the time of drawing the particles' uniform numbers alone
     */
    public record Figure(String variant, int threads, double particlesPerSecond, double vsUniformDraws) {
        /** @return the machine-readable line */
        public String line() {
            return String.format(Locale.ROOT, "bench eject %s threads=%d particles_per_s=%.0f time_vs_uniform_draws=%.2f",
                    variant, threads, particlesPerSecond, vsUniformDraws);
        }
    }

    private final ParticleGenerator generator;

    /** @param ephemeris the planets for the parent's history */
    public EjectionBenchmark(Ephemeris ephemeris) {
        double t = 10300.0;
        Elements el = Elements.ofDegrees(0.95, 0.91, 140.0, 75.0, 155.0, t + 2451545.0, Body.SUN.gm());
        ParentBody parent = new ParentBody("benchmark parent (invented)", Epoch.ofDaysSinceJ2000(t), el, 0, 0, 0, 3.0,
                500.0, 2000.0, null);
        EjectionSettings ej = new EjectionSettings(VelocityModel.JONES_1995, 1.0, 20, DirectionLaw.SUNLIT, 45, 3.0, 3.0,
                2.0, null, null);
        ParticleSettings ps = new ParticleSettings(1e-4, 1e-2, 800.0, 2.0, 1.0, 5, true);
        StreamDefinition d = new StreamDefinition(Path.of("benchmark"), "benchmark", "", 2.5, parent, ej, ps);
        ParentHistory h = ParentHistory.compute(parent, new ForceModelFactory(ephemeris, true, true), 1e-10, t - 400,
                t + 400);
        generator = new ParticleGenerator(d, h, ActiveArc.find(h, t, el, ej));
    }

    /**
     * @param particles particles per timed run
     * @param threads thread counts
     * @return the figures
     */
    public List<Figure> run(int particles, int[] threads) {
        generator.generate(Math.min(particles, 200_000), 1L, false, 1);
        generator.generate(Math.min(particles, 200_000), 1L, true, 1);
        double drawNs = uniformDraws(particles);
        List<Figure> out = new ArrayList<>();
        for (int n : threads) {
            for (boolean sobol : new boolean[] {false, true}) {
                long t0 = System.nanoTime();
                List<Meteoroid> c = generator.generate(particles, 2L, sobol, n);
                double ns = (System.nanoTime() - t0) / (double) c.size();
                out.add(new Figure(sobol ? "sobol" : "pseudo-random", n, 1e9 / ns, ns / drawNs));
            }
        }
        return out;
    }

    /**
     * A proposal like a forecast's main stage (a Gaussian of 3 days in P0 about the law's median period, floor
     * 0.001) drawn on the band of directions that reach it ({@link PeriodBand}) and, as the baseline in the same
     * run, by keeping each candidate of the ejection law with its acceptance.
     *
     * @param particles particles per timed run
     * @param threads worker threads
     * @return the band's figure, then the baseline's (their time ratio is the band's gain)
     */
    public List<Figure> focused(int particles, int threads) {
        List<Meteoroid> law = generator.generate(20_000, 4L, false, threads);
        double[] p0 = law.stream().mapToDouble(m -> ParticleGenerator.periodAtEjection(m.state(), m.beta())).sorted()
                .toArray();
        EjectionFocus focus = EjectionFocus.around(p0[p0.length / 2], 3.0, 0.001);
        generator.generate(Math.max(1, particles / 10), 1L, false, threads, focus, 0, null);
        generator.generateByRejection(Math.max(1, particles / 10), 1L, threads, focus);
        double drawNs = uniformDraws(200_000);
        long t0 = System.nanoTime();
        generator.generate(particles, 5L, false, threads, focus, 0, null);
        double band = (System.nanoTime() - t0) / (double) particles;
        t0 = System.nanoTime();
        generator.generateByRejection(particles, 5L, threads, focus);
        double plain = (System.nanoTime() - t0) / (double) particles;
        return List.of(new Figure("focused-band", threads, 1e9 / band, band / drawNs),
                new Figure("focused-rejection", threads, 1e9 / plain, plain / drawNs));
    }

    /** Nanoseconds per particle to draw four WELL19937c uniforms, the generator's least possible cost. */
    private static double uniformDraws(int particles) {
        Well19937c rng = new Well19937c(3L);
        double sink = 0;
        for (int k = 0; k < 4 * Math.min(particles, 200_000); k++) {
            sink += rng.nextDouble();
        }
        long t0 = System.nanoTime();
        for (int k = 0; k < 4 * particles; k++) {
            sink += rng.nextDouble();
        }
        double ns = (System.nanoTime() - t0) / (double) particles;
        return sink < 0 ? -ns : ns;
    }
}
