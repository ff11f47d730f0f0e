package trailcross.stream;

import trailcross.orbit.Elements;
import trailcross.time.Epoch;

/**
 * The parent comet or asteroid of a stream: its osculating orbit at an epoch, its non-gravitational
 * parameters (Marsden, Sekanina &amp; Yeomans 1973, A1 radial, A2 transverse, A3 normal, au/d², with the
 * water-ice g(r) law) and the physical quantities the ejection models need.
 *
 * @param name the parent's designation, for tables
 * @param epoch the osculating epoch of {@code elements}
 * @param elements heliocentric osculating elements, ecliptic J2000, GM of the Sun
 * @param a1 radial non-gravitational parameter, au/d²
 * @param a2 transverse non-gravitational parameter, au/d²
 * @param a3 normal non-gravitational parameter, au/d²
 * @param radiusKm nucleus radius, km
 * @param densityKgM3 nucleus bulk density, kg/m³
 * @param dustProductionKgS dust production at 1 au, kg/s, or null when not known (no ZHR then)
 * @param gasProductionMolS gas (water) production at 1 au, molecules/s, or null (needed by Crifo–Rodionov)
 */
public record ParentBody(String name, Epoch epoch, Elements elements, double a1, double a2, double a3,
        double radiusKm, double densityKgM3, Double dustProductionKgS, Double gasProductionMolS) {

    /** Default nucleus radius, km: a typical Jupiter-family/Halley-type nucleus (common practice). */
    public static final double DEFAULT_RADIUS_KM = 2.0;
    /** Default nucleus bulk density, kg/m³ (67P measured ~533 kg/m³, Pätzold et al. 2016; common practice 500). */
    public static final double DEFAULT_DENSITY_KG_M3 = 500.0;

    /** @return true when any non-gravitational parameter is non-zero */
    public boolean hasNonGravitational() {
        return a1 != 0 || a2 != 0 || a3 != 0;
    }
}
