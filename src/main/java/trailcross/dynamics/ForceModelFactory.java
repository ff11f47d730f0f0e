package trailcross.dynamics;

import java.util.ArrayList;
import java.util.List;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;

/**
 * Builds the force model of a particle or parent: the Sun with radiation pressure, the planets, the Earth
 * and the Moon, the Sun's relativistic term, Poynting–Robertson drag when β &gt; 0 and non-gravitational
 * forces when any A is non-zero. One instance per thread (terms keep scratch arrays).
 *
 * <p>With the planets, models integrate in barycentric coordinates by default: the heliocentric frame's
 * indirect terms carry the Sun's monthly wobble about the Earth–Moon pair and its reflex to every planet into
 * each particle's acceleration, which far from the Sun holds an adaptive step near ten days for a force of
 * no consequence (measured: 3,400 steps per Halley-type century heliocentric, see DEVELOPERS.md); the
 * barycentric frame has none of that (the usual frame of small-body ephemerides, e.g. Giorgini et al. 1996,
 * JPL's Horizons system).
 *
 * @param ephemeris the planets
 * @param planets whether to include the planetary perturbations
 * @param relativity whether to include the 1PN solar term
 * @param barycentric whether to integrate in barycentric coordinates (only with the planets)
 * @param only the bodies whose pull is included (null: all of them)
 */
public record ForceModelFactory(Ephemeris ephemeris, boolean planets, boolean relativity, boolean barycentric,
        java.util.Set<Body> only) {

    /**
     * All the planets when asked for.
     *
     * @param ephemeris the planets
     * @param planets whether to include the planetary perturbations
     * @param relativity whether to include the 1PN solar term
     * @param barycentric whether to integrate in barycentric coordinates (only with the planets)
     */
    public ForceModelFactory(Ephemeris ephemeris, boolean planets, boolean relativity, boolean barycentric) {
        this(ephemeris, planets, relativity, barycentric, null);
    }

    /**
     * A reduced model for tests and studies: the Sun and the bodies named only (heliocentric frame).
     *
     * @param ephemeris the planets
     * @param bodies the bodies whose pull is included
     * @return the factory
     */
    public static ForceModelFactory sunAnd(Ephemeris ephemeris, Body... bodies) {
        return new ForceModelFactory(ephemeris, true, false, false, java.util.Set.of(bodies));
    }

    /**
     * The default frame: barycentric with the planets, heliocentric without.
     *
     * @param ephemeris the planets
     * @param planets whether to include the planetary perturbations
     * @param relativity whether to include the 1PN solar term
     */
    public ForceModelFactory(Ephemeris ephemeris, boolean planets, boolean relativity) {
        this(ephemeris, planets, relativity, planets);
    }

    /** Checks the combination. */
    public ForceModelFactory {
        if (barycentric && !planets) {
            throw new IllegalArgumentException("a barycentric force model needs the planets");
        }
        if (only != null && barycentric) {
            throw new IllegalArgumentException("a reduced set of planets is integrated heliocentrically");
        }
    }

    /**
     * @param beta radiation-pressure β (0 for the parent)
     * @param a1 radial non-gravitational parameter, au/d²
     * @param a2 transverse, au/d²
     * @param a3 normal, au/d²
     * @return a new force model
     */
    public ForceModel create(double beta, double a1, double a2, double a3) {
        double gm = Body.SUN.gm();
        List<Acceleration> terms = new ArrayList<>();
        terms.add(new SunGravity(gm, beta));
        PlanetPositions positions = planets ? new PlanetPositions(ephemeris) : null;
        if (planets) {
            terms.add(new PlanetaryPerturbations(ephemeris, positions, !barycentric, only));
        }
        if (relativity) {
            terms.add(new SolarRelativity(gm));
        }
        if (beta > 0) {
            terms.add(new PoyntingRobertsonDrag(gm, beta));
        }
        if (a1 != 0 || a2 != 0 || a3 != 0) {
            terms.add(new NonGravitationalForce(a1, a2, a3));
        }
        return barycentric ? new CompositeForceModel(terms, positions, ephemeris) : new CompositeForceModel(terms);
    }

    /**
     * @param beta radiation-pressure β
     * @return a force model without non-gravitational terms
     */
    public ForceModel create(double beta) {
        return create(beta, 0, 0, 0);
    }
}
