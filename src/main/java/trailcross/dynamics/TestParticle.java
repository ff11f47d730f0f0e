package trailcross.dynamics;

/**
 * A massless particle to propagate: its heliocentric ecliptic J2000 state at an epoch and its
 * radiation-pressure β.
 *
 * @param id identifier, kept through propagation and checkpoints
 * @param t epoch of the state, TDB days since J2000
 * @param state x, y, z (au), vx, vy, vz (au/d)
 * @param beta radiation-pressure β
 */
public record TestParticle(long id, double t, double[] state, double beta) {
}
