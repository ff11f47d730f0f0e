package trailcross.time;

import java.util.Locale;
import java.util.Optional;

/**
 * The time scales trailcross reads and writes (IAU 2006 Resolution B3 for TDB; IERS Conventions 2010,
 * chapter 10, for the others).
 *
 * <p>UTC before 1960, where no UTC was defined, stands for Universal Time reconstructed from the
 * tabulated ΔT = TT − UT (see {@link DeltaT}); after the last leap second JSOFA knows, TAI − UTC is held
 * at its last value.
 */
public enum TimeScale {
    UTC, TAI, TT, TDB;

    /** Every spelling accepted after a time string, for error messages. */
    public static final String ACCEPTED = "Z, UTC, TAI, TT, TDB";

    /**
     * The scale named by a suffix such as {@code Z}, {@code UTC}, {@code TT} (case-insensitive).
     *
     * @param word the suffix
     * @return the scale, or empty when the word names none
     */
    public static Optional<TimeScale> fromSuffix(String word) {
        String w = word.trim().toUpperCase(Locale.ROOT);
        if (w.equals("Z") || w.equals("UT") || w.equals("UTC")) {
            return Optional.of(UTC);
        }
        for (TimeScale s : values()) {
            if (s.name().equals(w)) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }
}
