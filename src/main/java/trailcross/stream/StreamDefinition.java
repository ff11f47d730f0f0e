package trailcross.stream;

import java.nio.file.Path;

/**
 * Everything a stream file says: the parent, the ejection and the particles, with defaults filled in.
 *
 * @param source the file it was read from
 * @param name the stream's name
 * @param description free text, may be empty
 * @param populationIndex population index r of the shower (for ZHR, Koschack &amp; Rendtel 1990)
 * @param parent the parent body
 * @param ejection the ejection settings
 * @param particles the particle settings
 */
public record StreamDefinition(Path source, String name, String description, double populationIndex,
        ParentBody parent, EjectionSettings ejection, ParticleSettings particles) {

    /** Default population index (r = 2.5 for showers without a measurement; common practice). */
    public static final double DEFAULT_POPULATION_INDEX = 2.5;
}
