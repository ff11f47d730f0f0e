package trailcross.dynamics;

import trailcross.ephemeris.ChebyshevCache;
import trailcross.ephemeris.Vsop87Ephemeris;

/** One embedded-ephemeris cache for all dynamics tests, so that its blocks are fitted once per run. */
final class SharedEphemeris {

    static final ChebyshevCache CACHE = new ChebyshevCache(new Vsop87Ephemeris());
    static final ForceModelFactory FORCES = new ForceModelFactory(CACHE, true, true);

    private SharedEphemeris() {
    }
}
