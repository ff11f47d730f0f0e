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
     *     embedded theory behind a {@link ChebyshevCache}
     */
    public static Ephemeris fast(Path jplFile) {
        return jplFile == null ? new ChebyshevCache(new Vsop87Ephemeris()) : new JplEphemeris(jplFile);
    }
}
