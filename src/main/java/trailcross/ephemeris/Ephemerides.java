package trailcross.ephemeris;

import java.nio.file.Path;

/** Chooses the ephemeris a command uses: a JPL DE file when one is named, else the embedded theory. */
public final class Ephemerides {

    private Ephemerides() {
    }

    /**
     * @param jplFile a JPL DE file, or null for the embedded VSOP87B + Moon98
     * @return the ephemeris, exact to its source (no cache)
     */
    public static Ephemeris exact(Path jplFile) {
        return jplFile == null ? new Vsop87Ephemeris() : new JplEphemeris(jplFile);
    }

    /**
     * @param jplFile a JPL DE file, or null
     * @return an ephemeris fast enough for integration: the JPL file itself (already Chebyshev), or the
     *     embedded theory behind the process' one {@link ChebyshevCache}
     */
    public static Ephemeris fast(Path jplFile) {
        return jplFile == null ? Embedded.CACHE : new JplEphemeris(jplFile);
    }

    /**
     * The embedded theory's cache, one per JVM. Fitting its blocks from the series is most of a short run's
     * time (measured: a 250-year parent history of the demo comet, 45 s of a 52-s forecast of 200 particles);
     * the blocks are the same whoever fits them first, so every run in one process (a calibration's
     * repeated forecasts, the test suite, a cluster executor) shares them, with identical results.
     */
    private static final class Embedded {
        static final ChebyshevCache CACHE = new ChebyshevCache(new Vsop87Ephemeris());
    }
}
