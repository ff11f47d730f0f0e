package trailcross.ejection;

/**
 * The terminal dust speed fitted by Crifo &amp; Rodionov (1997, Icarus 129, 72) to dusty-gas dynamics:
 * V = V_g / (1.2 + 0.72 √(a/a*)), with V_g the gas expansion speed and a* the grain radius at which the gas
 * drag, acting over about one nucleus radius, would bring a grain to the gas speed (the fit's form as
 * quoted in later trail models; from memory). Here a* = 3 Q m_g / (8π R_N ρ_d V_g), from the gas
 * momentum flux Q m_g V_g / (4π R_N²) at the surface; small grains tend to V_g/1.2 and large ones fall as
 * a^−1/2, Whipple's law.
 *
 * <p>Units: Q the gas production in molecules/s, m_g the molecule's mass in kg (water, 18.015 u),
 * R_N in m, ρ_d in kg/m³, V_g in m/s. The gas speed follows V_g = 580 r^−1/2 m/s (Delsemme 1982, the
 * common gas-expansion law; from memory), the production Q(r) = Q(1 au) r^−n with the stream's
 * production exponent.
 *
 * @param nucleusRadiusKm nucleus radius, km
 * @param grainDensityKgM3 meteoroid bulk density, kg/m³
 * @param gasProductionMolS gas production at 1 au, molecules/s
 * @param productionExponent n of Q ∝ r^−n
 */
public record CrifoRodionovSpeed(double nucleusRadiusKm, double grainDensityKgM3, double gasProductionMolS,
        double productionExponent) implements EjectionSpeedModel {

    /** Mass of a water molecule, kg (18.015 u, u = 1.66053906660e-27 kg, CODATA 2018). */
    public static final double WATER_MOLECULE_KG = 18.015 * 1.66053906660e-27;
    /** Gas expansion speed at 1 au, m/s (Delsemme 1982; from memory). */
    public static final double GAS_SPEED_1AU_M_S = 580.0;

    /**
     * @param rAu heliocentric distance, au
     * @return the gas expansion speed V_g, m/s
     */
    public double gasSpeedMs(double rAu) {
        return GAS_SPEED_1AU_M_S / Math.sqrt(rAu);
    }

    /**
     * @param rAu heliocentric distance, au
     * @return the characteristic radius a*, m
     */
    public double characteristicRadiusM(double rAu) {
        double q = gasProductionMolS * Math.pow(rAu, -productionExponent);
        return 3 * q * WATER_MOLECULE_KG / (8 * Math.PI * nucleusRadiusKm * 1e3 * grainDensityKgM3 * gasSpeedMs(rAu));
    }

    @Override
    public double speedMs(double rAu, double grainRadiusM) {
        return gasSpeedMs(rAu) / (1.2 + 0.72 * Math.sqrt(grainRadiusM / characteristicRadiusM(rAu)));
    }
}
