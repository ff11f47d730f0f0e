package trailcross.dynamics;

/** Constants of the force model, each with its source. */
public final class PhysicalConstants {

    /** Speed of light, au/day: 299792.458 km/s (SI definition) × 86400 s / 149597870.7 km (IAU 2012 B2). */
    public static final double C_AU_PER_DAY = 299792.458 * 86400.0 / 149597870.7;

    /** Solar radius, au: nominal 695,700 km (IAU 2015 Resolution B3). */
    public static final double SUN_RADIUS_AU = 695700.0 / 149597870.7;

    private PhysicalConstants() {
    }
}
