import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One-off converter of the VSOP87B series (Bretagnon &amp; Francou 1988, A&amp;A 202, 309: heliocentric
 * ecliptic spherical coordinates L, B, R referred to the ecliptic and equinox J2000) from the data files
 * of the npm package {@code astronomia} (MIT licence), {@code data/vsop87B<planet>.js}, into the text
 * resource trailcross reads, {@code src/main/resources/trailcross/ephemeris/vsop87b.txt}.
 *
 * <p>Run once, from the project root, after {@code npm pack astronomia} and unpacking it:
 * {@code java tools/Vsop87Convert.java /path/to/package/data src/main/resources/trailcross/ephemeris/vsop87b.txt}.
 * The numbers are copied as written in the source (no rounding).
 */
public final class Vsop87Convert {

    private static final String[] PLANETS = {
        "mercury", "venus", "earth", "mars", "jupiter", "saturn", "uranus", "neptune"
    };
    private static final Pattern SERIES = Pattern.compile("\"(\\d)\"\\s*:\\s*\\[(.*?)\\]\\s*\\]", Pattern.DOTALL);
    private static final Pattern TERM = Pattern.compile("\\[\\s*([-0-9.eE+]+)\\s*,\\s*([-0-9.eE+]+)\\s*,\\s*([-0-9.eE+]+)\\s*\\]");
    private static final Pattern COORD = Pattern.compile("\\b([LBR])\\s*:\\s*\\{(.*?)\\n  \\}", Pattern.DOTALL);

    private Vsop87Convert() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 3) {
            System.err.println("usage: java tools/Vsop87Convert.java ASTRONOMIA_DATA_DIR OUTPUT VERSION");
            System.exit(2);
        }
        Path dir = Path.of(args[0]);
        Path out = Path.of(args[1]);
        Files.createDirectories(out.toAbsolutePath().getParent());
        Path tmp = out.resolveSibling(out.getFileName() + ".tmp");
        int total = 0;
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(tmp, StandardCharsets.US_ASCII))) {
            w.println("# VSOP87B: heliocentric ecliptic spherical coordinates L, B (rad), R (au) of the planets,");
            w.println("# referred to the VSOP87 ecliptic and equinox J2000 (Bretagnon & Francou 1988, A&A 202, 309).");
            w.println("# Complete series. Converted by tools/Vsop87Convert.java from the npm package astronomia "
                    + args[2] + " (MIT),");
            w.println("# files data/vsop87B<planet>.js; numbers copied as written there.");
            w.println("# value = sum over alpha of T^alpha * sum of A cos(B + C T), T in Julian millennia (TDB) from J2000.0");
            w.println("# lines: 'planet NAME', 'series COORD ALPHA COUNT', then COUNT lines 'A B C'.");
            for (String p : PLANETS) {
                String text = Files.readString(dir.resolve("vsop87B" + p + ".js"));
                w.println("planet " + p);
                Matcher coords = COORD.matcher(text);
                int found = 0;
                while (coords.find()) {
                    found++;
                    Matcher series = SERIES.matcher(coords.group(2) + "]");
                    while (series.find()) {
                        List<String> terms = new ArrayList<>();
                        Matcher t = TERM.matcher(series.group(2) + "]");
                        while (t.find()) {
                            terms.add(t.group(1) + " " + t.group(2) + " " + t.group(3));
                        }
                        w.println("series " + coords.group(1) + " " + series.group(1) + " " + terms.size());
                        terms.forEach(w::println);
                        total += terms.size();
                    }
                }
                if (found != 3) {
                    throw new IllegalStateException(p + ": expected L, B and R, found " + found);
                }
            }
        }
        Files.move(tmp, out, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        System.out.println("wrote " + total + " terms to " + out);
    }
}
