package trailcross.stream;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** How ejection directions are drawn (key {@code ejection.directions}). */
public enum DirectionLaw {
    /** Uniform over the sphere. */
    ISOTROPIC("isotropic"),
    /** Uniform over the hemisphere facing the Sun (dayside activity). */
    SUNLIT("sunlit"),
    /** Uniform inside a cone about the sunward direction ({@code ejection.cone_half_angle_deg}). */
    CONE("cone");

    private final String key;

    DirectionLaw(String key) {
        this.key = key;
    }

    /** @return the name used in stream files */
    public String key() {
        return key;
    }

    /**
     * @param key a stream-file name
     * @return the law, or empty
     */
    public static Optional<DirectionLaw> of(String key) {
        String k = key.toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(m -> m.key.equals(k)).findFirst();
    }

    /** @return the accepted names, comma-separated */
    public static String names() {
        return Arrays.stream(values()).map(DirectionLaw::key).collect(Collectors.joining(", "));
    }
}
