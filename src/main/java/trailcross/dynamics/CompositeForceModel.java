package trailcross.dynamics;

import java.util.List;

/** A {@link ForceModel} that sums its terms. */
public final class CompositeForceModel implements ForceModel {

    private final Acceleration[] terms;
    private final PlanetaryPerturbations planets;

    /**
     * @param terms the acceleration terms (at most one {@link PlanetaryPerturbations}, whose impacts are reported)
     */
    public CompositeForceModel(List<Acceleration> terms) {
        this.terms = terms.toArray(new Acceleration[0]);
        PlanetaryPerturbations p = null;
        for (Acceleration a : terms) {
            if (a instanceof PlanetaryPerturbations pp) {
                p = pp;
            }
        }
        this.planets = p;
    }

    @Override
    public void acceleration(double t, double[] x, double[] v, double[] a) {
        a[0] = 0;
        a[1] = 0;
        a[2] = 0;
        for (Acceleration term : terms) {
            term.add(t, x, v, a);
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
