package trailcross.dynamics;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.LongConsumer;

/**
 * Propagates particles on a fixed number of threads. Each particle is integrated alone, on its own step
 * sequence, by a {@link GaussRadau15} and force model private to its task; the planets come from a shared
 * thread-safe ephemeris. Results come back in input order and do not depend on the thread count
 * (bit-identical: nothing a particle computes depends on another).
 */
public final class Propagator {

    private final ForceModelFactory forces;
    private final double epsilon;
    private final double escapeDistance;
    private final int threads;

    /**
     * @param forces the force model factory
     * @param epsilon IAS15 ε
     * @param escapeDistance au beyond which particles are left
     * @param threads threads to use (≥ 1)
     */
    public Propagator(ForceModelFactory forces, double epsilon, double escapeDistance, int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("--threads must be at least 1, got " + threads);
        }
        this.forces = forces;
        this.epsilon = epsilon;
        this.escapeDistance = escapeDistance;
        this.threads = threads;
    }

    /** Receives each particle's steps during propagation (one handler per particle, built per task). */
    @FunctionalInterface
    public interface StepHandlerFactory {
        /**
         * @param particle the particle about to be integrated
         * @return its step handler, or null
         */
        StepHandler forParticle(TestParticle particle);
    }

    /**
     * @param particles particles (each at its own epoch)
     * @param tEnd where to propagate them, TDB days since J2000
     * @param handlers per-particle step handlers, or null
     * @param progress called with the number of particles done so far, or null
     * @return the outcomes, in the order of {@code particles}
     */
    public List<Outcome> propagate(List<TestParticle> particles, double tEnd, StepHandlerFactory handlers,
            LongConsumer progress) {
        if (forces.planets()) {
            // Up front, not when the integration reaches the ephemeris' end: a run past it would otherwise
            // integrate (and fit the cache) up to there before it fails.
            forces.ephemeris().checkSpan(tEnd);
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "trailcross-propagate");
            t.setDaemon(true);
            return t;
        });
        AtomicLong done = new AtomicLong();
        try {
            List<Future<Outcome>> futures = new ArrayList<>(particles.size());
            for (TestParticle p : particles) {
                futures.add(pool.submit(() -> {
                    for (double v : p.state()) {
                        if (!Double.isFinite(v)) {
                            throw new IllegalArgumentException("particle " + p.id() + ": state is not finite");
                        }
                    }
                    GaussRadau15 gr = new GaussRadau15(epsilon, escapeDistance);
                    ForceModel f = forces.create(p.beta());
                    StepHandler h = handlers == null ? null : handlers.forParticle(p);
                    Outcome o = gr.integrate(f, p.t(), p.state(), tEnd, h);
                    long n = done.incrementAndGet();
                    if (progress != null) {
                        progress.accept(n);
                    }
                    return o;
                }));
            }
            List<Outcome> out = new ArrayList<>(particles.size());
            for (Future<Outcome> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("propagation interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
