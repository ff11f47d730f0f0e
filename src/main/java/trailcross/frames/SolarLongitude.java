package trailcross.frames;

/**
 * Solar longitude λ☉ as meteor astronomy publishes it: the geometric (no aberration, no light time)
 * geocentric ecliptic longitude of the Sun, mean ecliptic and equinox J2000.0. This convention
 * reproduces published meteor solar longitudes to about 0.002°; including annual aberration would move
 * it by 20.5″ = 0.0057°.
 */
public final class SolarLongitude {

    private SolarLongitude() {
    }

    /**
     * @param earthHelioEcliptic the Earth's heliocentric position, ecliptic J2000 (any length unit)
     * @return λ☉ in radians, [0, 2π)
     */
    public static double of(double[] earthHelioEcliptic) {
        return Angles.normalise(Math.atan2(-earthHelioEcliptic[1], -earthHelioEcliptic[0]));
    }

    /**
     * @param earthHelioEcliptic the Earth's heliocentric position, ecliptic J2000
     * @return λ☉ in degrees, [0, 360)
     */
    public static double degrees(double[] earthHelioEcliptic) {
        return Math.toDegrees(of(earthHelioEcliptic));
    }
}
