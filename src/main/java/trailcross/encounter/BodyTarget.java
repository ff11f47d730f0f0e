package trailcross.encounter;

import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.frames.RotationElements;

/**
 * A body of the ephemeris as an approach target: its state from the ephemeris, its GM (DE440, {@link Body}),
 * its radius and pole from the IAU rotation elements ({@link RotationElements}); the Moon, without a pole
 * in that table, gets its mean radius 1737.4 km (Archinal et al. 2011, Table 5; from memory).
 *
 * @param ephemeris the planets
 * @param body the body
 */
public record BodyTarget(Ephemeris ephemeris, Body body) implements ApproachTarget {

    /** The Moon's mean radius, km (Archinal et al. 2011; from memory). */
    public static final double MOON_RADIUS_KM = 1737.4;

    /** Checks the body. */
    public BodyTarget {
        if (body == Body.SUN || body == Body.EARTH_MOON_BARYCENTRE) {
            throw new IllegalArgumentException("--target " + body.key() + ": not a body that meteoroids approach "
                    + "(choose a planet, the Moon, l1, l2 or a track file)");
        }
    }

    @Override
    public String name() {
        return body.key();
    }

    @Override
    public void state(double t, double[] out) {
        ephemeris.heliocentric(body, t, out);
    }

    @Override
    public double gm() {
        return body.gm();
    }

    @Override
    public double radiusKm() {
        return body == Body.MOON ? MOON_RADIUS_KM : rotation().radiusKm();
    }

    @Override
    public RotationElements rotation() {
        return RotationElements.of(body.key()).orElse(null);
    }

    @Override
    public double firstDay() {
        return ephemeris.firstDay();
    }

    @Override
    public double lastDay() {
        return ephemeris.lastDay();
    }
}
