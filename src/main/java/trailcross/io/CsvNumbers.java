package trailcross.io;

import java.util.Locale;

/**
 * Numbers in the project's CSV files: written with 17 significant digits, so that a double reads back bit
 * for bit, and read with a one-line message naming the column when the text is not a finite number.
 */
public final class CsvNumbers {

    private CsvNumbers() {
    }

    /**
     * @param v a number
     * @return its text with 17 significant digits
     */
    public static String exact(double v) {
        return String.format(Locale.ROOT, "%.17g", v);
    }

    /**
     * @param text a cell
     * @param column its column, for the message
     * @return the number
     * @throws IllegalArgumentException when the text is not a finite number
     */
    public static double finite(String text, String column) {
        double v;
        try {
            v = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(column + ": not a number: '" + text + "'");
        }
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(column + ": not a finite number: '" + text + "'");
        }
        return v;
    }
}
