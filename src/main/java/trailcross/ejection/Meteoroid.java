package trailcross.ejection;

import trailcross.dynamics.TestParticle;

/**
 * One simulated meteoroid at its ejection: the parent's heliocentric state at the ejection time plus the
 * ejection velocity, and what later stages need to turn particles into fluxes.
 *
 * @param id identifier, unique within its return
 * @param returnT the perihelion of the return it belongs to, TDB days since J2000
 * @param t ejection epoch, TDB days since J2000
 * @param state heliocentric ecliptic J2000 x, y, z (au), vx, vy, vz (au/d)
 * @param radiusM radius, m
 * @param massKg mass, kg
 * @param beta radiation-pressure β
 * @param weight real meteoroids this particle stands for (NaN when the stream gives no dust production)
 * @param speedMs its ejection speed relative to the parent, m/s
 */
public record Meteoroid(long id, double returnT, double t, double[] state, double radiusM, double massKg,
        double beta, double weight, double speedMs) {

    /** @return the particle to propagate */
    public TestParticle toTestParticle() {
        return new TestParticle(id, t, state.clone(), beta);
    }
}
