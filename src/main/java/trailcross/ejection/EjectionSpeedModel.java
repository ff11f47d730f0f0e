package trailcross.ejection;

import trailcross.stream.StreamDefinition;

/**
 * An ejection-velocity model: the speed (relative to the nucleus, after the gas drag has ceased) of a
 * meteoroid of a given radius leaving the nucleus at a heliocentric distance. The nucleus and the
 * meteoroids' bulk density are fixed when a model is built; the implementations cite their papers and
 * state their units. The nucleus' own gravity is handled apart ({@link NucleusEscape}) so that each
 * model is its paper's formula alone.
 */
public interface EjectionSpeedModel {

    /**
     * @param rAu heliocentric distance of the nucleus, au
     * @param grainRadiusM meteoroid radius, m
     * @return the ejection speed, m/s (≥ 0)
     */
    double speedMs(double rAu, double grainRadiusM);

    /**
     * The model a stream file names, built from its parent and particle settings (the speed scale and the
     * nucleus' gravity are applied by the generator, not here).
     *
     * @param d the stream
     * @return the model
     */
    static EjectionSpeedModel of(StreamDefinition d) {
        double radiusKm = d.parent().radiusKm();
        double rho = d.particles().densityKgM3();
        return switch (d.ejection().model()) {
            case WHIPPLE_1951 -> new WhippleSpeed(radiusKm, rho);
            case JONES_1995 -> new JonesSpeed(radiusKm, rho);
            case CRIFO_RODIONOV_1997 -> new CrifoRodionovSpeed(radiusKm, rho, d.parent().gasProductionMolS(),
                    d.ejection().productionExponent());
            case FIXED -> new FixedSpeed(d.ejection().fixedSpeedMs());
        };
    }

    /**
     * Mass of a spherical meteoroid.
     *
     * @param radiusM radius, m
     * @param densityKgM3 bulk density, kg/m³
     * @return mass, kg
     */
    static double sphereMassKg(double radiusM, double densityKgM3) {
        return 4.0 / 3.0 * Math.PI * radiusM * radiusM * radiusM * densityKgM3;
    }
}
