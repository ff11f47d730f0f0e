package trailcross.dynamics;

import java.util.Arrays;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.ephemeris.Ephemeris;

/**
 * The planets' heliocentric positions ({@link ChebyshevCache#ALL} order) and the Sun's barycentric state at the
 * epochs a force model is asked about, the last eight of them remembered. One Gauss–Radau step evaluates the
 * forces at eight epochs (its start and seven substeps) and its corrector iterations ask for the same seven
 * substep epochs again (Everhart 1985), so the ephemeris is read once per epoch rather than once per
 * iteration. Answers are those of a fresh read, bit for bit. Not thread-safe: one per force model.
 *
 * <p>The Sun's barycentric position is formed here from the very planet positions served with it,
 * s = −Σ GM_j r_j / (GM☉ + Σ GM_j) (DE440 masses, the Earth and the Moon apart), so that on a distant particle
 * the pulls of the Sun and of each planet balance to first order exactly, whatever small error the planet's
 * position carries: a particle at 19 au then feels only the planets' quadrupoles, not their reflex on the
 * Sun. The Sun's velocity, which only the velocity-dependent terms use, is the ephemeris' own (the cache's
 * fitted Sun, within 1e-13 au/d of the planets' sum). The distances r_j are kept too, for the rounding
 * estimate of the planets' terms.
 */
final class PlanetPositions {

    private static final int SLOTS = 8;
    private static final int BODIES = ChebyshevCache.ALL.length;

    private final Ephemeris ephemeris;
    private final ChebyshevCache.Cursor cursor;
    private final double[] times = new double[SLOTS];
    private final double[][] positionSlots = new double[SLOTS][3 * BODIES];
    private final double[][] sunSlots = new double[SLOTS][6];
    private final double[] scratch = new double[6];
    private final double[] weight = new double[BODIES];
    private final double[][] distanceSlots = new double[SLOTS][BODIES];
    /** Heliocentric distances of the bodies at the epoch of the last {@link #at} call. */
    double[] distances;
    private int next;
    /** The slot {@link #positions} and {@link #sun} are from. */
    private int current;
    /** Positions at the epoch of the last {@link #at} call: 3 per body. */
    double[] positions;
    /** The Sun's barycentric x, y, z, vx, vy, vz at the epoch of the last {@link #at} call. */
    double[] sun;

    /**
     * @param ephemeris the planets' source (read through a cursor of its own when it is a cache)
     */
    PlanetPositions(Ephemeris ephemeris) {
        this.ephemeris = ephemeris;
        this.cursor = ephemeris instanceof ChebyshevCache c ? c.cursor() : null;
        Arrays.fill(times, Double.NaN);
        double total = trailcross.ephemeris.Body.systemGm();
        for (int j = 0; j < BODIES; j++) {
            weight[j] = ChebyshevCache.ALL[j].gm() / total;
        }
        distances = distanceSlots[0];
        positions = positionSlots[0];
        sun = sunSlots[0];
    }

    /**
     * Makes {@link #positions} and {@link #sun} those of epoch t.
     *
     * @param t TDB days since J2000
     */
    void at(double t) {
        if (times[current] == t) {
            return; // the epoch just served: the force model and its planetary term ask in turn
        }
        for (int s = 0; s < SLOTS; s++) {
            if (times[s] == t) {
                current = s;
                positions = positionSlots[s];
                sun = sunSlots[s];
                distances = distanceSlots[s];
                return;
            }
        }
        int s = next;
        times[s] = Double.NaN;
        next = (next + 1) % SLOTS;
        double[] p = positionSlots[s];
        double[] q = sunSlots[s];
        if (cursor != null) {
            cursor.heliocentricPositionsAll(t, p);
            cursor.sunBarycentric(t, q);
        } else {
            for (int j = 0; j < BODIES; j++) {
                ephemeris.heliocentricPosition(ChebyshevCache.ALL[j], t, scratch);
                System.arraycopy(scratch, 0, p, 3 * j, 3);
            }
            ephemeris.sunBarycentric(t, q);
        }
        double[] r = distanceSlots[s];
        double sx = 0;
        double sy = 0;
        double sz = 0;
        for (int j = 0; j < BODIES; j++) {
            double px = p[3 * j];
            double py = p[3 * j + 1];
            double pz = p[3 * j + 2];
            sx -= weight[j] * px;
            sy -= weight[j] * py;
            sz -= weight[j] * pz;
            r[j] = Math.sqrt(px * px + py * py + pz * pz);
        }
        q[0] = sx;
        q[1] = sy;
        q[2] = sz;
        // The slot's epoch is set last, so that a read that throws (outside the span) leaves no stale slot.
        times[s] = t;
        current = s;
        positions = p;
        sun = q;
        distances = r;
    }
}
