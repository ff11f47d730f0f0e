package trailcross.ejection;

import java.util.ArrayList;
import java.util.List;

/**
 * The weights of a cloud drawn in stages from several proposals ({@link EjectionFocus}), combined by the
 * balance heuristic of multiple importance sampling (Veach &amp; Guibas 1995; deterministic-mixture weights,
 * Owen &amp; Zhou 2000): a particle of size bin k and conditions at ejection x stands for
 * <pre>  w = N f_k / Σ_s n_{s,k} a_s(x) / Z_{s,k}</pre>
 * real meteoroids, N the return's meteoroids (M/⟨m⟩), f_k the bin's number fraction, n_{s,k} the particles
 * of stage s in bin k, a_s the stage's acceptance and Z_{s,k} its mean over the prior. Every weighted sum
 * stays an unbiased estimate of the plain cloud's; with every stage the prior, w = N f_k / n_k, the plain
 * cloud's weight, and the importance factor is exactly 1.
 */
public final class ImportanceWeights {

    /**
     * One stage.
     *
     * @param focus its proposal
     * @param firstId its first particle's id
     * @param particles its particles
     * @param z its normalising constant per size bin
     * @param allocation its particles' shares among the size bins (null: equal)
     */
    public record Stage(EjectionFocus focus, long firstId, int particles, double[] z, double[] allocation) {
    }

    private final ParticleGenerator generator;
    private final List<Stage> stages = new ArrayList<>();

    /** @param generator the return's generator (size bins, number fractions, meteoroid count) */
    public ImportanceWeights(ParticleGenerator generator) {
        this.generator = generator;
    }

    /**
     * @param stage a stage drawn with the generator
     * @return this
     */
    public ImportanceWeights add(Stage stage) {
        stages.add(stage);
        return this;
    }

    /** @return the stages so far */
    public List<Stage> stages() {
        return List.copyOf(stages);
    }

    /** @return the particles over all stages */
    public int particles() {
        return stages.stream().mapToInt(Stage::particles).sum();
    }

    /**
     * @param id a particle's id
     * @return its size bin
     */
    public int bin(long id) {
        for (Stage s : stages) {
            if (id >= s.firstId() && id < s.firstId() + s.particles()) {
                return generator.binOf(id - s.firstId(), s.particles(), s.allocation());
            }
        }
        throw new IllegalArgumentException("particle id " + id + " belongs to no stage");
    }

    /**
     * The importance factor: prior density over the stages' mixture density, p / Σ_s (n_s/n) q_s.
     *
     * @param id a particle's id
     * @param x its conditions at ejection
     * @return the factor (1 when every stage is the prior)
     */
    public double importance(long id, EjectionFocus.Features x) {
        int k = bin(id);
        double n = 0;
        double denom = 0;
        for (Stage s : stages) {
            double nk = generator.inBin(k, s.particles(), s.allocation());
            n += nk;
            denom += nk * s.focus().acceptance(x) / s.z()[k];
        }
        return n / denom;
    }

    /**
     * @param id a particle's id
     * @param x its conditions at ejection
     * @return the real meteoroids it stands for (NaN when the stream gives no dust production)
     */
    public double weight(long id, EjectionFocus.Features x) {
        int k = bin(id);
        double n = 0;
        for (Stage s : stages) {
            n += generator.inBin(k, s.particles(), s.allocation());
        }
        return generator.realMeteoroids() * generator.sizes().numberFraction(k) / n * importance(id, x);
    }
}
