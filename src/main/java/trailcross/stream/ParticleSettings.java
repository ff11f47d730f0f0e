package trailcross.stream;

/**
 * The {@code [particles]} section: the meteoroids' sizes, density and optical properties.
 *
 * @param radiusMinM smallest meteoroid radius, m
 * @param radiusMaxM largest meteoroid radius, m
 * @param densityKgM3 meteoroid bulk density, kg/m³
 * @param massIndex differential mass index s (dN ∝ m^−s dm), s &gt; 1
 * @param radiationPressureEfficiency Q_pr of β = 5.7e-4 Q_pr/(ρ s) (Burns, Lamy &amp; Soter 1979)
 * @param sizeBins number of logarithmic size bins for stratified sampling
 * @param stratified equal particles per size bin, weights correcting, so that rare large ones appear
 */
public record ParticleSettings(double radiusMinM, double radiusMaxM, double densityKgM3, double massIndex,
        double radiationPressureEfficiency, int sizeBins, boolean stratified) {

    /** Default smallest radius, m: 0.1 mm, about the faintest visual meteors at 60–70 km/s. */
    public static final double DEFAULT_RADIUS_MIN_M = 1e-4;
    /** Default largest radius, m: 1 cm, fireball-producing meteoroids. */
    public static final double DEFAULT_RADIUS_MAX_M = 1e-2;
    /** Default bulk density, kg/m³ (cometary meteoroids ~ 250–1000, Babadzhanov 2002; common practice 1000). */
    public static final double DEFAULT_DENSITY_KG_M3 = 1000.0;
    /** Default differential mass index (s ≈ 2 for dust trails; common practice). */
    public static final double DEFAULT_MASS_INDEX = 2.0;
    /** Default Q_pr: 1 for grains much larger than the wavelength (Burns, Lamy &amp; Soter 1979). */
    public static final double DEFAULT_QPR = 1.0;
    /** Default number of size bins. */
    public static final int DEFAULT_SIZE_BINS = 5;
}
