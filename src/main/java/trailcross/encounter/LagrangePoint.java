package trailcross.encounter;

import org.hipparchus.analysis.solvers.BrentSolver;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;

/**
 * The Sun–Earth L1 or L2 point, where solar and astrophysical observatories fly: the collinear point of the
 * circular restricted three-body problem of the Sun and the Earth–Moon barycentre, placed on the
 * instantaneous Sun–barycentre line and scaled with its length, so that on an eccentric orbit it pulsates
 * with the barycentre (the usual "pulsating" frame). Its distance from the barycentre, γ in units of the
 * Sun–barycentre distance, is the root of the collinear-point quintic (Szebehely 1967, Theory of Orbits,
 * §4.5): γ⁵ ∓ (3 − μ)γ⁴ + (3 − 2μ)γ³ − μγ² ± 2μγ − μ = 0 (upper sign L1, lower L2), with
 * μ = GM_EMB/(GM_Sun + GM_EMB) from DE440; solved with Brent's method (Hipparchus).
 *
 * @param ephemeris the planets
 * @param which 1 or 2
 * @param gamma γ, the point's distance from the barycentre in units of the Sun–barycentre distance
 */
public record LagrangePoint(Ephemeris ephemeris, int which, double gamma) implements ApproachTarget {

    /**
     * @param ephemeris the planets
     * @param which 1 (sunward) or 2 (anti-sunward)
     */
    public LagrangePoint(Ephemeris ephemeris, int which) {
        this(ephemeris, which, gamma(which, massRatio()));
    }

    /** Checks the point. */
    public LagrangePoint {
        if (which != 1 && which != 2) {
            throw new IllegalArgumentException("only the Sun-Earth L1 and L2 are targets, got L" + which);
        }
    }

    /** @return μ = GM_EMB/(GM_Sun + GM_EMB), DE440 */
    public static double massRatio() {
        double m = Body.EARTH_MOON_BARYCENTRE.gm();
        return m / (Body.SUN.gm() + m);
    }

    /**
     * @param which 1 or 2
     * @param mu the mass ratio
     * @return γ of that point
     */
    public static double gamma(int which, double mu) {
        double s = which == 1 ? -1 : 1;
        double hill = Math.cbrt(mu / 3);
        return new BrentSolver(1e-16, 1e-16).solve(200, g -> g * g * g * g * g + s * (3 - mu) * g * g * g * g
                + (3 - 2 * mu) * g * g * g - mu * g * g - s * 2 * mu * g - mu, 0.5 * hill, 1.5 * hill);
    }

    @Override
    public String name() {
        return "l" + which;
    }

    @Override
    public void state(double t, double[] out) {
        ephemeris.heliocentric(Body.EARTH_MOON_BARYCENTRE, t, out);
        double f = which == 1 ? 1 - gamma : 1 + gamma;
        for (int k = 0; k < 6; k++) {
            out[k] *= f;
        }
    }

    @Override
    public double firstDay() {
        return ephemeris.firstDay();
    }

    @Override
    public double lastDay() {
        return ephemeris.lastDay();
    }
}
