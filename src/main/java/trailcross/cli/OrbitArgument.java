package trailcross.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import trailcross.encounter.EarthOrbit;
import trailcross.ephemeris.Body;
import trailcross.ephemeris.Ephemeris;
import trailcross.orbit.Elements;
import trailcross.stream.StreamFileReader;

/**
 * An orbit named on the command line: a stream file (its parent's osculating orbit), {@code earth} (the
 * Earth's osculating orbit at a given instant), or elements {@code q=AU,e=E,i=DEG,node=DEG,peri=DEG}.
 */
final class OrbitArgument {

    private OrbitArgument() {
    }

    /**
     * @param text the argument
     * @param name the argument's name, for messages
     * @param ephemeris the planets (for {@code earth})
     * @param t the instant for {@code earth}, TDB days since J2000
     * @return the orbit
     */
    static Elements parse(String text, String name, Ephemeris ephemeris, double t) {
        if (text.equalsIgnoreCase("earth")) {
            return EarthOrbit.at(ephemeris, t);
        }
        if (text.contains("=")) {
            Map<String, Double> v = new HashMap<>();
            for (String part : text.split(",")) {
                String[] kv = part.split("=", 2);
                String key = kv[0].trim().toLowerCase(Locale.ROOT);
                if (kv.length != 2 || !java.util.Set.of("q", "e", "i", "node", "peri").contains(key)) {
                    throw new IllegalArgumentException(name + ": '" + part.trim()
                            + "' is not one of q=AU, e=E, i=DEG, node=DEG, peri=DEG");
                }
                try {
                    v.put(key, Double.parseDouble(kv[1].trim()));
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException(name + ": " + key + ": not a number: '" + kv[1].trim() + "'");
                }
            }
            for (String k : new String[] {"q", "e", "i", "node", "peri"}) {
                if (!v.containsKey(k)) {
                    throw new IllegalArgumentException(name + ": missing " + k + "= (give q=AU,e=E,i=DEG,node=DEG,peri=DEG)");
                }
            }
            if (!(v.get("q") > 0) || !(v.get("e") >= 0) || !Double.isFinite(v.get("e"))) {
                throw new IllegalArgumentException(name + ": need q > 0 and e >= 0");
            }
            return Elements.ofDegrees(v.get("q"), v.get("e"), v.get("i"), v.get("node"), v.get("peri"),
                    t + 2451545.0, Body.SUN.gm());
        }
        Path p = Path.of(text);
        if (!Files.exists(p)) {
            throw new IllegalArgumentException(name + ": '" + text
                    + "' is neither a stream file, 'earth', nor q=AU,e=E,i=DEG,node=DEG,peri=DEG");
        }
        return StreamFileReader.read(p).parent().elements();
    }
}
