package trailcross.ejection;

import trailcross.stream.DirectionLaw;

/**
 * Ejection directions from two uniform numbers: uniform over the sphere, over the hemisphere facing the
 * Sun, or inside a cone of given half-angle about the sunward direction. A uniform density on the
 * sphere has cos θ uniform (Archimedes' hat-box theorem), so a cap of half-angle α is drawn with
 * cos θ uniform in [cos α, 1] and the azimuth uniform; the sphere is α = π and the hemisphere α = π/2.
 */
public final class DirectionSampler {

    private final double cosMax;

    /**
     * @param law the direction law
     * @param coneHalfAngleDeg the cone's half-angle, degrees (used by {@link DirectionLaw#CONE})
     */
    public DirectionSampler(DirectionLaw law, double coneHalfAngleDeg) {
        double alpha = switch (law) {
            case ISOTROPIC -> Math.PI;
            case SUNLIT -> Math.PI / 2;
            case CONE -> Math.toRadians(coneHalfAngleDeg);
        };
        this.cosMax = law == DirectionLaw.SUNLIT ? 0.0 : law == DirectionLaw.ISOTROPIC ? -1.0 : Math.cos(alpha);
    }

    /**
     * @param u1 uniform in [0, 1): the polar angle
     * @param u2 uniform in [0, 1): the azimuth
     * @param position the nucleus' heliocentric position (the axis is the sunward direction −r̂)
     * @param out receives the unit direction, heliocentric ecliptic axes
     */
    public void direction(double u1, double u2, double[] position, double[] out) {
        double r = Math.sqrt(position[0] * position[0] + position[1] * position[1] + position[2] * position[2]);
        double[] axis = {-position[0] / r, -position[1] / r, -position[2] / r};
        around(axis, 1 - u1 * (1 - cosMax), 2 * Math.PI * u2, out);
    }

    /**
     * The unit vector at a given cosine from an axis and a given azimuth about it (the azimuth's origin is
     * fixed by the axis alone).
     *
     * @param axis a unit vector
     * @param c the cosine of the angle from the axis, in [−1, 1]
     * @param phi the azimuth, radians
     * @param out receives the unit vector
     */
    public static void around(double[] axis, double c, double phi, double[] out) {
        double ax = axis[0];
        double ay = axis[1];
        double az = axis[2];
        // Two unit vectors perpendicular to the axis; the helper is the coordinate axis least aligned.
        double hx = 0;
        double hy = 0;
        double hz = 0;
        if (Math.abs(ax) <= Math.abs(ay) && Math.abs(ax) <= Math.abs(az)) {
            hx = 1;
        } else if (Math.abs(ay) <= Math.abs(az)) {
            hy = 1;
        } else {
            hz = 1;
        }
        double e1x = ay * hz - az * hy;
        double e1y = az * hx - ax * hz;
        double e1z = ax * hy - ay * hx;
        double n = Math.sqrt(e1x * e1x + e1y * e1y + e1z * e1z);
        e1x /= n;
        e1y /= n;
        e1z /= n;
        double e2x = ay * e1z - az * e1y;
        double e2y = az * e1x - ax * e1z;
        double e2z = ax * e1y - ay * e1x;
        double s = Math.sqrt(Math.max(0, 1 - c * c));
        double cp = Math.cos(phi) * s;
        double sp = Math.sin(phi) * s;
        out[0] = c * ax + cp * e1x + sp * e2x;
        out[1] = c * ay + cp * e1y + sp * e2y;
        out[2] = c * az + cp * e1z + sp * e2z;
    }

    /** @return the cosine of the largest angle from the sunward direction */
    public double cosMax() {
        return cosMax;
    }
}
