package trailcross.ejection;

/**
 * Whipple's (1951, ApJ 113, 464) gas-drag ejection speed of a meteoroid from a sublimating icy nucleus:
 * V = 8.03 r^−1.125 ρ^−1/3 R^1/2 m^−1/6 m/s, with r the heliocentric distance in au, ρ the meteoroid
 * density in g/cm³, R the nucleus radius in km and m the meteoroid mass in g. (The form and coefficient
 * as commonly quoted; from memory. The exponents follow from Whipple's physics: V² ∝ gas momentum flux ×
 * R / (ρ s), the flux ∝ r^−2 × the gas speed ∝ r^−1/4.)
 *
 * @param nucleusRadiusKm nucleus radius R, km
 * @param grainDensityKgM3 meteoroid bulk density, kg/m³
 */
public record WhippleSpeed(double nucleusRadiusKm, double grainDensityKgM3) implements EjectionSpeedModel {

    /** The coefficient of the formula, m/s in the units above. */
    public static final double COEFFICIENT = 8.03;
    /** The heliocentric-distance exponent (−9/8). */
    public static final double DISTANCE_EXPONENT = -1.125;

    @Override
    public double speedMs(double rAu, double grainRadiusM) {
        return PowerLawDrag.speed(COEFFICIENT, DISTANCE_EXPONENT, rAu, nucleusRadiusKm, grainDensityKgM3,
                grainRadiusM);
    }
}
