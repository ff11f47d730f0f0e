package trailcross.ejection;

/**
 * Jones's (1995, MNRAS 275, 773) revision of Whipple's ejection speed, which follows the gas flow over
 * the nucleus and its cooling by sublimation: V = 10.2 r^−1.038 ρ^−1/3 R^1/2 m^−1/6 m/s, with r in au,
 * ρ the meteoroid density in g/cm³, R the nucleus radius in km and m the meteoroid mass in g (the
 * empirical fit as commonly quoted; from memory).
 *
 * @param nucleusRadiusKm nucleus radius R, km
 * @param grainDensityKgM3 meteoroid bulk density, kg/m³
 */
public record JonesSpeed(double nucleusRadiusKm, double grainDensityKgM3) implements EjectionSpeedModel {

    /** The coefficient of the fit, m/s in the units above. */
    public static final double COEFFICIENT = 10.2;
    /** The heliocentric-distance exponent of the fit. */
    public static final double DISTANCE_EXPONENT = -1.038;

    @Override
    public double speedMs(double rAu, double grainRadiusM) {
        return PowerLawDrag.speed(COEFFICIENT, DISTANCE_EXPONENT, rAu, nucleusRadiusKm, grainDensityKgM3,
                grainRadiusM);
    }
}
