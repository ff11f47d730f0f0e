package trailcross.dynamics;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.LongConsumer;

/**
 * A long propagation cut into segments of fixed length, each ending in a {@link Checkpoint}: after a crash,
 * {@link #run} with the same checkpoint file resumes from the last segment boundary. Every particle
 * restarts its integration at every boundary whether or not the run was interrupted, so a resumed run
 * gives results identical to an uninterrupted one.
 */
public final class SegmentedPropagation {

    private final Propagator propagator;
    private final double segmentDays;
    private final Path checkpoint;

    /**
     * @param propagator the propagator
     * @param segmentDays segment length in days (&gt; 0)
     * @param checkpoint the checkpoint file, or null for none
     */
    public SegmentedPropagation(Propagator propagator, double segmentDays, Path checkpoint) {
        if (!(segmentDays > 0)) {
            throw new IllegalArgumentException("segment length must be > 0 days");
        }
        this.propagator = propagator;
        this.segmentDays = segmentDays;
        this.checkpoint = checkpoint;
    }

    /**
     * Propagates particles (all at one epoch t0) to tEnd, resuming from the checkpoint if it exists.
     *
     * @param particles the particles at t0
     * @param t0 their common epoch
     * @param tEnd where to propagate
     * @param segmentDone called with each segment's end epoch, or null
     * @param progress per-particle progress inside a segment, or null
     * @return the particles' final entries in input order (stopped ones at their stopping state)
     */
    public List<Checkpoint.Entry> run(List<TestParticle> particles, double t0, double tEnd,
            java.util.function.DoubleConsumer segmentDone, LongConsumer progress) {
        List<Checkpoint.Entry> current = new ArrayList<>();
        double t = t0;
        if (checkpoint != null && Files.exists(checkpoint)) {
            current = Checkpoint.read(checkpoint);
            if (current.size() != particles.size()) {
                throw new IllegalArgumentException(checkpoint + ": holds " + current.size()
                        + " particles, the run has " + particles.size());
            }
            t = current.stream().filter(e -> e.status() == Outcome.Status.DONE).mapToDouble(e -> e.particle().t())
                    .findFirst().orElse(tEnd);
        } else {
            for (TestParticle p : particles) {
                current.add(new Checkpoint.Entry(p, Outcome.Status.DONE));
            }
        }
        double direction = Math.signum(tEnd - t0);
        while (direction * (tEnd - t) > 1e-9) {
            double next = t + direction * segmentDays;
            if (direction * (next - tEnd) > 0) {
                next = tEnd;
            }
            List<Integer> active = new ArrayList<>();
            List<TestParticle> moving = new ArrayList<>();
            for (int k = 0; k < current.size(); k++) {
                if (current.get(k).status() == Outcome.Status.DONE) {
                    active.add(k);
                    moving.add(current.get(k).particle());
                }
            }
            List<Outcome> outcomes = propagator.propagate(moving, next, null, progress);
            for (int k = 0; k < active.size(); k++) {
                Outcome o = outcomes.get(k);
                TestParticle p = moving.get(k);
                current.set(active.get(k), new Checkpoint.Entry(new TestParticle(p.id(), o.t(), o.state(), p.beta()),
                        o.status()));
            }
            t = next;
            if (checkpoint != null) {
                Checkpoint.write(checkpoint, current);
            }
            if (segmentDone != null) {
                segmentDone.accept(t);
            }
        }
        return current;
    }
}
