package trailcross.dynamics;

import trailcross.ephemeris.ChebyshevCache;

/** One embedded-ephemeris cache for all dynamics tests, so that its blocks are fitted once per run. */
final class SharedEphemeris {

    static final ChebyshevCache CACHE = (ChebyshevCache) trailcross.ephemeris.Ephemerides.fast(null);
    static final ForceModelFactory FORCES = new ForceModelFactory(CACHE, true, true);

    private SharedEphemeris() {
    }
}
