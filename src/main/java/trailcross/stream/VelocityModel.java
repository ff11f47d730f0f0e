package trailcross.stream;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** The ejection-velocity models a stream file can name (key {@code ejection.model}). */
public enum VelocityModel {
    /** Whipple (1951), ApJ 113, 464: gas-drag terminal speed of a sublimating nucleus. */
    WHIPPLE_1951("whipple1951"),
    /** Jones (1995), MNRAS 275, 773: Whipple's model revised for the nucleus' gas flow. */
    JONES_1995("jones1995"),
    /** Crifo &amp; Rodionov (1997), Icarus 129, 72: fitted to dusty-gas dynamics; needs the gas production. */
    CRIFO_RODIONOV_1997("crifo1997"),
    /** One speed for every meteoroid ({@code ejection.fixed_speed_m_s}), for studies. */
    FIXED("fixed");

    private final String key;

    VelocityModel(String key) {
        this.key = key;
    }

    /** @return the name used in stream files */
    public String key() {
        return key;
    }

    /**
     * @param key a stream-file name
     * @return the model, or empty
     */
    public static Optional<VelocityModel> of(String key) {
        String k = key.toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(m -> m.key.equals(k)).findFirst();
    }

    /** @return the accepted names, comma-separated */
    public static String names() {
        return Arrays.stream(values()).map(VelocityModel::key).collect(Collectors.joining(", "));
    }
}
