package trailcross.forecast;

import java.nio.file.Path;
import trailcross.dynamics.Perihelion;
import trailcross.ejection.ParticleGenerator;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;

/**
 * How a forecast builds one return's particle generator, in a few serialisable values, so that another
 * machine rebuilds exactly the same generator: the stream file's text, the dust production the run uses,
 * the span of the parent's history (the forecast integrates it once from {@code sinceYear} to
 * {@code untilYear}) and the return's year. The rebuilt history and generator are bit for bit the driver's:
 * the same deterministic integration of the same inputs.
 *
 * @param source the stream file's name (for messages)
 * @param text the stream file's text
 * @param dustKgS the dust production the run uses (the stream's own, or the reference one)
 * @param sinceYear the history's first year
 * @param untilYear its last year
 * @param returnYear the return's calendar year
 */
public record ReturnRecipe(String source, String text, double dustKgS, int sinceYear, int untilYear, int returnYear)
        implements java.io.Serializable {

    /** @return the stream as the run uses it */
    public StreamDefinition stream() {
        return ForecastRun.withDust(StreamFileReader.parse(Path.of(source), text), dustKgS);
    }

    /**
     * @param ephemeris the planets
     * @return the return's generator
     */
    public ParticleGenerator generator(Ephemeris ephemeris) {
        StreamDefinition run = stream();
        ParentReturns.Result returns = ParentReturns.compute(run.parent(), ephemeris, sinceYear, untilYear);
        Perihelion p = returns.returns().stream().filter(q -> ParentReturns.yearOf(q.t()) == returnYear).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no perihelion in " + returnYear));
        return ReturnCloud.from(run, ephemeris, returns.history(), p, returnYear).generator();
    }
}
