package trailcross.cluster;

import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import trailcross.ejection.ParticleGenerator;
import trailcross.ephemeris.Ephemerides;
import trailcross.ephemeris.Ephemeris;
import trailcross.forecast.ReturnRecipe;

/**
 * What an executor JVM builds once and its tasks share: the ephemeris (the embedded one with its Chebyshev
 * cache, or a JPL DE file) and each return's particle generator (the parent's history integrated once per
 * recipe). Thread-safe.
 */
public final class ExecutorCache {

    private static final Map<String, Ephemeris> EPHEMERIDES = new ConcurrentHashMap<>();
    private static final Map<ReturnRecipe, ParticleGenerator> GENERATORS = new ConcurrentHashMap<>();
    private static final String EMBEDDED = "";

    private ExecutorCache() {
    }

    /**
     * @param file a JPL DE file, or null for the embedded ephemeris
     * @return this JVM's ephemeris for it
     */
    public static Ephemeris ephemeris(String file) {
        return EPHEMERIDES.computeIfAbsent(file == null ? EMBEDDED : file,
                f -> Ephemerides.fast(f.isEmpty() ? null : Path.of(f)));
    }

    /**
     * @param recipe a return's recipe
     * @param ephemeris the planets
     * @return this JVM's generator for it
     */
    public static ParticleGenerator generator(ReturnRecipe recipe, Ephemeris ephemeris) {
        return GENERATORS.computeIfAbsent(recipe, r -> r.generator(ephemeris));
    }
}
