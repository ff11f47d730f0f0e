package trailcross.ejection;

/**
 * The ratio β of radiation pressure to solar gravity on a sphere: β = 5.7e-4 Q_pr / (ρ s), ρ in kg/m³
 * and s (the radius) in m (Burns, Lamy &amp; Soter 1979, Icarus 40, 1, eq. 19 in SI form).
 */
public final class RadiationPressure {

    /** The constant of β = C Q_pr/(ρ s), kg m⁻² (Burns, Lamy &amp; Soter 1979). */
    public static final double CONSTANT = 5.7e-4;

    private RadiationPressure() {
    }

    /**
     * @param qpr radiation-pressure efficiency Q_pr
     * @param densityKgM3 bulk density, kg/m³
     * @param radiusM radius, m
     * @return β
     */
    public static double beta(double qpr, double densityKgM3, double radiusM) {
        return CONSTANT * qpr / (densityKgM3 * radiusM);
    }

    /**
     * The least β that unbinds a grain released at zero relative speed from a parent at perihelion:
     * β = (1 − e)/2 (Burns, Lamy &amp; Soter 1979), from v_q² = GM(1 + e)/q against 2GM(1 − β)/q.
     *
     * @param e the parent's eccentricity
     * @return the critical β (≤ 0 for e ≥ 1: every grain is unbound)
     */
    public static double criticalBetaAtPerihelion(double e) {
        return (1 - e) / 2;
    }
}
