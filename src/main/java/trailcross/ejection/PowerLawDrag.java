package trailcross.ejection;

/**
 * The common form of the Whipple (1951) and Jones (1995) speeds, C r^k ρ^−1/3 R^1/2 m^−1/6 in their
 * cgs-and-km units, evaluated from SI inputs.
 */
final class PowerLawDrag {

    private PowerLawDrag() {
    }

    static double speed(double coefficient, double distanceExponent, double rAu, double nucleusRadiusKm,
            double grainDensityKgM3, double grainRadiusM) {
        double rhoCgs = grainDensityKgM3 * 1e-3;
        double massG = EjectionSpeedModel.sphereMassKg(grainRadiusM, grainDensityKgM3) * 1e3;
        // ρ^−1/3 m^−1/6 = (ρ² m)^−1/6: one cube root of a product instead of two powers.
        return coefficient * Math.pow(rAu, distanceExponent) * Math.sqrt(nucleusRadiusKm)
                / Math.sqrt(Math.cbrt(rhoCgs * rhoCgs * massG));
    }
}
