package trailcross.dynamics;

import trailcross.orbit.Elements;

/**
 * One perihelion passage of an integrated body.
 *
 * @param t the passage, TDB days since J2000 (where r·v changes sign from − to +)
 * @param state heliocentric state there
 * @param elements osculating heliocentric elements there (ecliptic J2000, GM☉)
 */
public record Perihelion(double t, double[] state, Elements elements) {
}
