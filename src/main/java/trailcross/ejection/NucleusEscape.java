package trailcross.ejection;

/**
 * The nucleus' gravity on a departing meteoroid: a gas-drag terminal speed V at the surface leaves
 * √(V² − v_esc²) at infinity, with v_esc² = 2GM/R = (8π/3) G ρ_n R² for a spherical nucleus; a grain whose
 * drag speed is below v_esc is not ejected. (Whipple 1951 writes the same subtraction in his full
 * expression, for ρ_n = 1 g/cm³.)
 *
 * @param radiusKm nucleus radius, km
 * @param densityKgM3 nucleus bulk density, kg/m³
 */
public record NucleusEscape(double radiusKm, double densityKgM3) {

    /** Newtonian constant of gravitation, m³ kg⁻¹ s⁻² (CODATA 2018). */
    public static final double G = 6.67430e-11;

    /** @return the escape speed from the surface, m/s */
    public double speedMs() {
        double r = radiusKm * 1e3;
        return Math.sqrt(8 * Math.PI / 3 * G * densityKgM3) * r;
    }

    /**
     * @param dragSpeedMs a terminal speed at the surface, m/s
     * @return the speed left far from the nucleus, m/s, or a negative number when the grain cannot escape
     */
    public double speedAtInfinity(double dragSpeedMs) {
        double ve = speedMs();
        double v2 = dragSpeedMs * dragSpeedMs - ve * ve;
        return v2 > 0 ? Math.sqrt(v2) : -1;
    }
}
