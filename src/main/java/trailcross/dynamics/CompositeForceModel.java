package trailcross.dynamics;

import java.util.List;
import trailcross.ephemeris.Ephemeris;

/**
 * A {@link ForceModel} that sums its terms, each evaluated on the heliocentric position and velocity. In
 * barycentric mode the integrated coordinates are first shifted to heliocentric ones with the Sun's
 * barycentric state at the same epoch (read with the planets, once per epoch), so that the terms are the same
 * in both modes and only the planets' indirect terms are left out.
 */
public final class CompositeForceModel implements ForceModel {

    private final Acceleration[] terms;
    private final PlanetaryPerturbations planets;
    private final PlanetPositions positions;
    private final Ephemeris shift;
    private final double[] xh = new double[3];
    private final double[] vh = new double[3];

    /**
     * A heliocentric model.
     *
     * @param terms the acceleration terms (at most one {@link PlanetaryPerturbations}, whose impacts are reported)
     */
    public CompositeForceModel(List<Acceleration> terms) {
        this(terms, null, null);
    }

    /**
     * @param terms the acceleration terms
     * @param positions the planets' reader shared with the terms, for the Sun's barycentric state (barycentric mode)
     * @param shift the ephemeris of the barycentric shift, or null for a heliocentric model
     */
    CompositeForceModel(List<Acceleration> terms, PlanetPositions positions, Ephemeris shift) {
        this.terms = terms.toArray(new Acceleration[0]);
        PlanetaryPerturbations p = null;
        for (Acceleration a : terms) {
            if (a instanceof PlanetaryPerturbations pp) {
                p = pp;
            }
        }
        this.planets = p;
        this.positions = positions;
        this.shift = shift;
        if ((positions == null) != (shift == null)) {
            throw new IllegalArgumentException("a barycentric model needs both the positions' reader and the shift");
        }
    }

    @Override
    public Ephemeris barycentricShift() {
        return shift;
    }

    @Override
    public void acceleration(double t, double[] x, double[] v, double[] a) {
        a[0] = 0;
        a[1] = 0;
        a[2] = 0;
        double[] px = x;
        double[] pv = v;
        if (positions != null) {
            positions.at(t);
            double[] sun = positions.sun;
            for (int k = 0; k < 3; k++) {
                xh[k] = x[k] - sun[k];
                vh[k] = v[k] - sun[3 + k];
            }
            px = xh;
            pv = vh;
        }
        for (Acceleration term : terms) {
            term.add(t, px, pv, a);
        }
    }

    @Override
    public double takeRoundingError() {
        return planets == null ? 0 : planets.takeRoundingError();
    }

    @Override
    public String takeImpact() {
        return planets == null ? null : planets.takeImpact();
    }
}
