package trailcross.encounter;

import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.orbit.Elements;
import trailcross.orbit.StateVector;

/**
 * The Earth's osculating heliocentric orbit at an epoch, from the ephemeris (the Earth itself, not the
 * Earth–Moon barycentre, with GM☉ + GM⊕ — the convention that reproduces published Earth MOIDs), the
 * orbit against which MOIDs, node distances and theoretical radiants are measured.
 */
public final class EarthOrbit {

    private EarthOrbit() {
    }

    /**
     * @param ephemeris the planets
     * @param t TDB days since J2000
     * @return the Earth's osculating elements, ecliptic J2000
     */
    public static Elements at(Ephemeris ephemeris, double t) {
        ephemeris.checkSpan(t);
        double[] s = new double[6];
        ephemeris.heliocentric(Body.EARTH, t, s);
        return Elements.of(StateVector.of(s), t + 2451545.0, Body.SUN.gm() + Body.EARTH.gm());
    }
}
