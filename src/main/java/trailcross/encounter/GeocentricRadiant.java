package trailcross.encounter;

import trailcross.ephemeris.Body;
import trailcross.frames.Angles;
import trailcross.frames.EclipticFrame;
import trailcross.frames.SolarLongitude;
import trailcross.frames.Spherical;

/**
 * A geocentric radiant: the direction (equatorial J2000) from which meteoroids arrive, −(v − v⊕), their
 * geocentric speed Vg before the Earth's attraction, and the solar longitude (geometric, J2000) of the
 * encounter.
 *
 * @param raDeg right ascension, degrees [0, 360)
 * @param decDeg declination, degrees
 * @param vgKmS geocentric speed Vg, km/s
 * @param solarLongitudeDeg solar longitude, degrees [0, 360)
 */
public record GeocentricRadiant(double raDeg, double decDeg, double vgKmS, double solarLongitudeDeg) {

    /** au/d → km/s. */
    public static final double AU_D_TO_KM_S = Body.Constants.AU_KM / 86400.0;

    /**
     * @param meteoroidVelocity heliocentric ecliptic J2000 velocity of the meteoroid, au/d
     * @param earthPosition heliocentric ecliptic J2000 position of the Earth, au
     * @param earthVelocity heliocentric ecliptic J2000 velocity of the Earth, au/d
     * @return the radiant
     */
    public static GeocentricRadiant of(double[] meteoroidVelocity, double[] earthPosition, double[] earthVelocity) {
        double[] d = {
            -(meteoroidVelocity[0] - earthVelocity[0]), -(meteoroidVelocity[1] - earthVelocity[1]),
            -(meteoroidVelocity[2] - earthVelocity[2])
        };
        double vg = Math.sqrt(d[0] * d[0] + d[1] * d[1] + d[2] * d[2]) * AU_D_TO_KM_S;
        Spherical eq = Spherical.of(EclipticFrame.equatorialOf(d));
        return new GeocentricRadiant(Angles.normaliseDeg(eq.lonDeg()), eq.latDeg(), vg,
                SolarLongitude.degrees(earthPosition));
    }

    /** @return V∞, the speed at the top of the atmosphere after the Earth's attraction, km/s */
    public double vInfinityKmS() {
        return Velocities.vInfinity(vgKmS);
    }
}
