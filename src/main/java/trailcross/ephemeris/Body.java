package trailcross.ephemeris;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The bodies an {@link Ephemeris} serves, with their gravitational parameters in au³/d² from the header
 * of JPL's DE440 (Park et al. 2021, AJ 161, 105): GMS, GM1 … GM8 (planetary systems, satellites
 * included), GMB and EMRAT for the Earth and the Moon (GM⊕ = GMB·EMRAT/(1 + EMRAT), GM☾ = GMB/(1 + EMRAT)).
 */
public enum Body {
    SUN("sun", 0.295912208284119561e-03),
    MERCURY("mercury", 0.491250019488931818e-10),
    VENUS("venus", 0.724345233264411869e-09),
    EARTH("earth", Constants.GMB * Constants.EMRAT / (1 + Constants.EMRAT)),
    MOON("moon", Constants.GMB / (1 + Constants.EMRAT)),
    EARTH_MOON_BARYCENTRE("emb", Constants.GMB),
    MARS("mars", 0.954954882972581189e-10),
    JUPITER("jupiter", 0.282534582522579175e-06),
    SATURN("saturn", 0.845970599337629027e-07),
    URANUS("uranus", 0.129202656496823994e-07),
    NEPTUNE("neptune", 0.152435734788519386e-07);

    /** DE440 header constants used for the Earth and the Moon. */
    public static final class Constants {
        /** GM of the Earth–Moon system, au³/d² (DE440 GMB). */
        public static final double GMB = 0.899701139294734660e-09;
        /** Earth/Moon mass ratio (DE440 EMRAT). */
        public static final double EMRAT = 81.3005682214972154;
        /** The astronomical unit in km (IAU 2012 Resolution B2; DE440 AU). */
        public static final double AU_KM = 149597870.7;

        private Constants() {
        }
    }

    /** The planets whose pull the Sun's barycentric offset sums (the Earth and Moon as their barycentre). */
    public static final Body[] MASSIVE_PLANETS = {
        MERCURY, VENUS, EARTH_MOON_BARYCENTRE, MARS, JUPITER, SATURN, URANUS, NEPTUNE
    };

    /** @return GM of the Sun and the {@link #MASSIVE_PLANETS} together, au³/d²: the barycentre's weight */
    public static double systemGm() {
        double m = SUN.gm();
        for (Body b : MASSIVE_PLANETS) {
            m += b.gm();
        }
        return m;
    }

    private final String key;
    private final double gm;

    Body(String key, double gm) {
        this.key = key;
        this.gm = gm;
    }

    /** @return the name used on the command line */
    public String key() {
        return key;
    }

    /** @return GM in au³/d² (DE440) */
    public double gm() {
        return gm;
    }

    /**
     * @param name a body name, any case ({@code earth-moon-barycentre} and {@code emb} both work)
     * @return the body, or empty
     */
    public static Optional<Body> of(String name) {
        String k = name.toLowerCase(Locale.ROOT).replace('_', '-');
        if (k.equals("earth-moon-barycentre") || k.equals("earth-moon-barycenter")) {
            return Optional.of(EARTH_MOON_BARYCENTRE);
        }
        return Arrays.stream(values()).filter(b -> b.key.equals(k)).findFirst();
    }

    /** @return every accepted name, comma-separated */
    public static String names() {
        return Arrays.stream(values()).map(Body::key).collect(Collectors.joining(", "));
    }
}
