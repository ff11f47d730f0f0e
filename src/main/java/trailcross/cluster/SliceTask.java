package trailcross.cluster;

import java.util.ArrayList;
import java.util.List;
import trailcross.ejection.Meteoroid;
import trailcross.ejection.ParticleGenerator;
import trailcross.encounter.NodeCrossing;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.CloudEngine;
import trailcross.forecast.TrailPropagation;

/**
 * One cluster task: slice k of a stage ejected ({@link ParticleGenerator#generateSlice}, bit for bit the
 * local cloud's particles at those positions) and propagated on one thread; its crossings in particle order.
 */
public final class SliceTask {

    private SliceTask() {
    }

    /**
     * @param stage the stage
     * @param ephemerisFile the JPL DE file, or null for the embedded ephemeris
     * @param slice the slice index
     * @return its crossings
     */
    public static ArrayList<NodeCrossing> run(CloudEngine.Stage stage, String ephemerisFile, int slice) {
        return timed(stage, ephemerisFile, slice).crossings();
    }

    /**
     * A task's output with its cost.
     *
     * @param crossings the slice's crossings
     * @param nanos the task's wall time in the executor, ns
     * @param particles the slice's particles
     */
    public record Result(ArrayList<NodeCrossing> crossings, long nanos, int particles) implements java.io.Serializable {
    }

    /**
     * @param stage the stage
     * @param ephemerisFile the JPL DE file, or null for the embedded ephemeris
     * @param slice the slice index
     * @return its crossings and the task's time
     */
    public static Result timed(CloudEngine.Stage stage, String ephemerisFile, int slice) {
        long t0 = System.nanoTime();
        Ephemeris eph = ExecutorCache.ephemeris(ephemerisFile);
        ParticleGenerator gen = ExecutorCache.generator(stage.recipe(), eph);
        int lo = slice * SparkEngine.SLICE;
        int hi = Math.min(stage.n(), lo + SparkEngine.SLICE);
        List<Meteoroid> particles = gen.generateSlice(stage.n(), stage.seed(), stage.focus(), stage.firstId(),
                stage.allocation(), lo, hi);
        ArrayList<NodeCrossing> c = new ArrayList<>(TrailPropagation.run(particles, eph, stage.windowStart(),
                stage.windowEnd(), 1, null).crossings());
        return new Result(c, System.nanoTime() - t0, hi - lo);
    }
}
