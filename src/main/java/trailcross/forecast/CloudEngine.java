package trailcross.forecast;

import java.util.List;
import java.util.function.LongConsumer;
import trailcross.ejection.ParticleGenerator;
import trailcross.ejection.EjectionFocus;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Ephemeris;

/**
 * Where one sampling stage of one return is ejected and propagated: on this machine's threads
 * ({@link #LOCAL}) or on a cluster (the {@code cluster} package). Whatever runs it, a stage gives the same
 * crossings in the same order (particle order), because every particle's draw depends only on (seed, stage,
 * position) and its propagation on nothing else.
 */
public interface CloudEngine {

    /**
     * One sampling stage: what it takes to eject its particles anywhere.
     *
     * @param recipe how to rebuild the return's generator
     * @param n particles of the stage
     * @param seed the stage's seed
     * @param focus the stage's proposal
     * @param firstId the first particle's id
     * @param allocation the size-bin shares, or null
     * @param windowStart crossings from here, TDB days since J2000
     * @param windowEnd to here
     */
    record Stage(ReturnRecipe recipe, int n, long seed, EjectionFocus focus, long firstId, double[] allocation,
            double windowStart, double windowEnd) implements java.io.Serializable {
    }

    /**
     * @param stage the stage
     * @param gen the return's generator, built on this machine (an engine elsewhere rebuilds its own from the
     *     recipe)
     * @param ephemeris the planets
     * @param threads worker threads on this machine
     * @param progress called with the stage's particles done so far
     * @return the stage's crossings, in particle order
     */
    List<NodeCrossing> run(Stage stage, ParticleGenerator gen, Ephemeris ephemeris, int threads, LongConsumer progress);

    /** The stage on this machine: the whole cloud ejected, then propagated on the threads. */
    CloudEngine LOCAL = (stage, gen, ephemeris, threads, progress) -> {
        List<trailcross.ejection.Meteoroid> cloud = gen.generate(stage.n(), stage.seed(), false, threads, stage.focus(),
                stage.firstId(), stage.allocation());
        return TrailPropagation.run(cloud, ephemeris, stage.windowStart(), stage.windowEnd(), threads, progress)
                .crossings();
    };
}
