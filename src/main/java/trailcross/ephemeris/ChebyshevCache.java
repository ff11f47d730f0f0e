package trailcross.ephemeris;

import java.util.concurrent.atomic.AtomicReferenceArray;

/**
 * A fast stand-in for a slow ephemeris: each body's position is interpolated, block by block, by a Chebyshev
 * series on the Chebyshev–Gauss–Lobatto points (Trefethen 2013, <i>Approximation Theory and Approximation
 * Practice</i>, ch. 3–4; JPL's own ephemerides are Chebyshev blocks too, Newhall 1989, Celest. Mech. 45, 305),
 * and velocities are the derivative of the series. The Lobatto points include both ends of a block, so two
 * adjacent blocks take the same source value at their shared end: positions are continuous across block
 * boundaries up to rounding ({@link #JUMP_BOUND_AU}), which an adaptive integrator needs (a jump in the
 * forces cannot be resolved by shrinking the step). Blocks are fitted lazily on first use, thread-safely (a
 * block computed twice by two threads is the same block), and kept.
 *
 * <p>Fitted items: the eight planets (the Earth as the Earth–Moon barycentre, which is smooth), the
 * geocentric Moon, and the Sun's offset from the barycentre of the Sun and those eight planets with their
 * DE440 masses (fitted from this cache's own planets, so that a barycentric integration sees the barycentre
 * of exactly the planets it is perturbed by). The Earth and the Moon follow from the barycentre and the
 * geocentric Moon with EMRAT. Block lengths and degrees per item were chosen so that the fit stays within
 * {@link #FIT_BOUND_AU} of the source everywhere (measured in the tests).
 *
 * <p>Hot loops call through a {@link Cursor}, one per thread, which remembers each item's current block;
 * the cache's own calls use a cursor per calling thread.
 */
public final class ChebyshevCache implements Ephemeris {

    /** Bound on the fit's error against its source, au (measured in the tests, 5e-11). */
    public static final double FIT_BOUND_AU = 1e-10;
    /**
     * Bound on a position's jump between adjacent blocks, au: the rounding of two series evaluations at the
     * shared end (measured in the tests: 5e-14 au, some fifteen ulp of an outer planet's distance).
     */
    public static final double JUMP_BOUND_AU = 1e-13;

    /** The fitted items, in order; {@link #MOON_ITEM} is the geocentric Moon, {@link #SUN_ITEM} the barycentric Sun. */
    private static final Body[] ITEMS = {
        Body.MERCURY, Body.VENUS, Body.EARTH_MOON_BARYCENTRE, Body.MARS, Body.JUPITER, Body.SATURN,
        Body.URANUS, Body.NEPTUNE, Body.MOON, Body.SUN
    };
    private static final int MOON_ITEM = 8;
    private static final int SUN_ITEM = 9;
    private static final int EMB_ITEM = 2;
    private static final int PLANETS = 8;
    /** Block length in days, per item (powers of two, so that 2/length is exact). */
    private static final double[] LENGTH = {8, 32, 8, 32, 32, 32, 32, 16, 8, 32};
    /**
     * Number of Chebyshev coefficients per component, per item: the fewest that bring the interpolation to
     * the series' own evaluation noise (~2e-11 au; measured over 60 random blocks in 1000–3000 AD: Mercury
     * 4.4e-11 au, the Moon 5e-12 au, the others 3e-12 … 2.5e-11 au).
     */
    private static final int[] COEFFS = {11, 11, 11, 11, 11, 11, 11, 11, 13, 13};
    /** The largest entry of {@link #COEFFS}. */
    private static final int MAX_COEFFS = 13;
    /**
     * Items in the order a cursor evaluates them: grouped by block length, so that the Chebyshev
     * polynomials T_k(x) of one block position serve every item of the group.
     */
    private static final int[] EVALUATION_ORDER = {0, EMB_ITEM, MOON_ITEM, 7, 1, 3, 4, 5, 6};

    /** The bodies of {@link #heliocentricAll}, in its output order. */
    public static final Body[] ALL = {
        Body.MERCURY, Body.VENUS, Body.EARTH, Body.MOON, Body.MARS, Body.JUPITER, Body.SATURN, Body.URANUS,
        Body.NEPTUNE
    };
    /** Where each item's position goes in {@link #heliocentricAll}'s output (EMB and Moon are split after). */
    private static final int[] SLOT = {0, 1, 2, 4, 5, 6, 7, 8, 3};

    private static final double MOON_FRACTION = 1 / (1 + Body.Constants.EMRAT);

    private final Ephemeris source;
    private final double origin;
    private final double last;
    private final AtomicReferenceArray<double[]>[] blocks;
    private final double[][] nodes;
    private final double[][][] cosines;
    private final double[] massWeight = new double[PLANETS];
    /** The last block of each item (the span's last instant belongs to it, not to the block after). */
    private final int[] lastIndex = new int[ITEMS.length];
    private final ThreadLocal<Cursor> cursors = ThreadLocal.withInitial(Cursor::new);

    /**
     * @param source the ephemeris to fit (its span becomes this cache's span)
     */
    @SuppressWarnings("unchecked")
    public ChebyshevCache(Ephemeris source) {
        this.source = source;
        this.origin = source.firstDay();
        // Whole blocks only, so that every fitting node lies inside the source's span.
        double whole = Double.POSITIVE_INFINITY;
        for (double len : LENGTH) {
            whole = Math.min(whole, Math.floor((source.lastDay() - origin) / len) * len);
        }
        this.last = origin + whole;
        for (int i = 0; i < ITEMS.length; i++) {
            lastIndex[i] = (int) Math.round(whole / LENGTH[i]) - 1;
        }
        blocks = new AtomicReferenceArray[ITEMS.length];
        nodes = new double[ITEMS.length][];
        cosines = new double[ITEMS.length][][];
        for (int i = 0; i < ITEMS.length; i++) {
            blocks[i] = new AtomicReferenceArray<>(lastIndex[i] + 1);
            int n = COEFFS[i];
            nodes[i] = new double[n];
            cosines[i] = new double[n][n];
            for (int j = 0; j < n; j++) {
                double theta = Math.PI * j / (n - 1);
                // Exact ±1 at the ends, so that the end nodes fall on the block boundaries.
                nodes[i][j] = j == 0 ? 1.0 : j == n - 1 ? -1.0 : Math.cos(theta);
                for (int k = 0; k < n; k++) {
                    cosines[i][k][j] = Math.cos(k * theta);
                }
            }
        }
        double m = Body.systemGm();
        for (int i = 0; i < PLANETS; i++) {
            massWeight[i] = ITEMS[i].gm() / m;
        }
    }

    @Override
    public double discontinuityAu() {
        return JUMP_BOUND_AU;
    }

    @Override
    public String name() {
        return source.name() + ", Chebyshev cache";
    }

    @Override
    public double firstDay() {
        return origin;
    }

    @Override
    public double lastDay() {
        return last;
    }

    /** @return a new cursor: fast calls for one thread at a time */
    public Cursor cursor() {
        return new Cursor();
    }

    @Override
    public void heliocentric(Body body, double t, double[] out) {
        checkSpan(t);
        Cursor c = cursors.get();
        switch (body) {
            case SUN -> java.util.Arrays.fill(out, 0, 6, 0.0);
            case EARTH, MOON -> {
                double[] pair = c.pair;
                c.item(EMB_ITEM, t, pair, 0, 6);
                c.item(MOON_ITEM, t, pair, 6, 6);
                splitEarthMoon(pair, 0, 6, 6);
                System.arraycopy(pair, body == Body.EARTH ? 0 : 6, out, 0, 6);
            }
            default -> c.item(itemOf(body), t, out, 0, 6);
        }
    }

    /**
     * The heliocentric states of every body of {@link #ALL} at once.
     *
     * @param t TDB days since J2000
     * @param out receives 6 numbers per body, in the order of {@link #ALL} (length ≥ 54)
     */
    public void heliocentricAll(double t, double[] out) {
        cursors.get().heliocentricAll(t, out);
    }

    /**
     * The heliocentric positions (no velocities) of every body of {@link #ALL}.
     *
     * @param t TDB days since J2000
     * @param out receives 3 numbers per body, in the order of {@link #ALL} (length ≥ 27)
     */
    public void heliocentricPositionsAll(double t, double[] out) {
        cursors.get().heliocentricPositionsAll(t, out);
    }

    /**
     * The Sun's offset from the barycentre of the Sun and the eight planets (DE440 masses), from its own
     * fitted item.
     */
    @Override
    public void sunBarycentric(double t, double[] out) {
        checkSpan(t);
        cursors.get().item(SUN_ITEM, t, out, 0, 6);
    }

    /**
     * Turns the Earth–Moon barycentre at {@code emb} and the geocentric Moon at {@code moon} into the
     * heliocentric Earth and Moon, in place: Earth = EMB − Moon/(1 + EMRAT), Moon = EMB + Moon·EMRAT/(1 + EMRAT).
     */
    private static void splitEarthMoon(double[] v, int emb, int moon, int width) {
        for (int k = 0; k < width; k++) {
            double b = v[emb + k];
            double m = v[moon + k];
            v[emb + k] = b - MOON_FRACTION * m;
            v[moon + k] = b + (1 - MOON_FRACTION) * m;
        }
    }

    private static int itemOf(Body body) {
        for (int i = 0; i < PLANETS; i++) {
            if (ITEMS[i] == body) {
                return i;
            }
        }
        throw new AssertionError(body);
    }

    /**
     * Fits now, on several threads, every block that covers [from, to] (clipped to the span) and is not yet
     * fitted, instead of one at a time on first use. A forecast's first integration, the parent's over
     * centuries, otherwise fits them on one thread: measured on the demo (2 cores), 47 s of the full
     * planetary theory's evaluations before any meteoroid moves. The planets and the Moon go first, the Sun's
     * offset (fitted from the planets' own blocks) after them. The blocks are the ones a lazy fit would make,
     * bit for bit.
     *
     * @param from first instant, TDB days since J2000
     * @param to last instant
     * @param threads worker threads
     */
    public void prefill(double from, double to, int threads) {
        double a = Math.max(from, origin);
        double b = Math.min(to, last);
        if (!(b >= a)) {
            return;
        }
        java.util.List<int[]> planets = new java.util.ArrayList<>();
        java.util.List<int[]> sun = new java.util.ArrayList<>();
        for (int i = 0; i < ITEMS.length; i++) {
            for (int k = indexOf(i, a), end = indexOf(i, b); k <= end; k++) {
                if (blocks[i].get(k) == null) {
                    (i == SUN_ITEM ? sun : planets).add(new int[] {i, k});
                    if (onLattice(i)) {
                        // One job per chunk: its first missing block fits the whole chunk.
                        k = (k / CHUNK + 1) * CHUNK - 1;
                    }
                }
            }
        }
        java.util.concurrent.ForkJoinPool pool = new java.util.concurrent.ForkJoinPool(Math.max(1, threads));
        try {
            for (java.util.List<int[]> jobs : java.util.List.of(planets, sun)) {
                pool.submit(() -> jobs.parallelStream().forEach(j -> block(j[0], j[1]))).join();
            }
        } finally {
            pool.shutdown();
        }
    }

    /** The block of item i with the given index, fitted on first use. */
    private double[] block(int i, int index) {
        double[] c = blocks[i].get(index);
        return c != null ? c : fit(i, index);
    }

    /** The start of block {@code index} of item i (the one expression every caller uses). */
    private double blockStart(int i, int index) {
        return origin + index * LENGTH[i];
    }

    /** The index of item i's block holding t: [start, start + length), the last block closed at the span's end. */
    private int indexOf(int i, double t) {
        int index = Math.min(Math.max((int) ((t - origin) / LENGTH[i]), 0), lastIndex[i]);
        // The division may round across a boundary; settle on the block whose [start, end) holds t.
        while (index > 0 && t < blockStart(i, index)) {
            index--;
        }
        while (index < lastIndex[i] && t >= blockStart(i, index + 1)) {
            index++;
        }
        return index;
    }

    /** Blocks fitted together from one lattice of the planetary theory ({@link #fitChunk}). */
    static final int CHUNK = 32;

    /** @return whether item i's blocks come from lattices of the VSOP87 series (a planet or the EMB) */
    private boolean onLattice(int i) {
        return source instanceof Vsop87Ephemeris && i < PLANETS;
    }

    private double[] fit(int i, int index) {
        if (onLattice(i)) {
            fitChunk(i, index / CHUNK);
            return blocks[i].get(index);
        }
        int n = COEFFS[i];
        double length = LENGTH[i];
        double start = blockStart(i, index);
        double end = start + length;
        double[][] values = new double[n][3];
        double[] planet = new double[3];
        Cursor own = i == SUN_ITEM ? new Cursor() : null;
        for (int j = 0; j < n; j++) {
            double t = j == 0 ? end : j == n - 1 ? start : start + 0.5 * length * (nodes[i][j] + 1);
            if (i == MOON_ITEM) {
                source.moonGeocentricPosition(t, values[j]);
            } else if (i == SUN_ITEM) {
                for (int p = 0; p < PLANETS; p++) {
                    own.item(p, t, planet, 0, 3);
                    for (int k = 0; k < 3; k++) {
                        values[j][k] -= massWeight[p] * planet[k];
                    }
                }
            } else {
                source.heliocentricPosition(ITEMS[i], t, values[j]);
            }
        }
        return store(i, index, values);
    }

    /**
     * Fits the blocks CHUNK·chunk … CHUNK·chunk + CHUNK − 1 of a planet or the EMB (those inside the span) from
     * one lattice of the series' values at their nodes ({@link Vsop87Ephemeris#positionsOnLattice}: about 6
     * times fewer operations than a full evaluation per node). Neighbouring blocks share their boundary node's
     * value, so they join exactly: inside the chunk from the lattice, at the chunk's two ends from the series
     * evaluated there in full (as the neighbouring chunks do). Which blocks a chunk holds, and so every
     * coefficient, does not depend on which block was asked for first.
     */
    private void fitChunk(int i, int chunk) {
        int first = chunk * CHUNK;
        int count = Math.min(CHUNK, lastIndex[i] + 1 - first);
        int n = COEFFS[i];
        double length = LENGTH[i];
        // Per row: the block's start, then its interior nodes (the end is the next row's start).
        double[] offsets = new double[n - 1];
        for (int j = 1; j < n - 1; j++) {
            offsets[j] = 0.5 * length * (nodes[i][j] + 1);
        }
        double[][] lattice = new double[count * (n - 1)][3];
        ((Vsop87Ephemeris) source).positionsOnLattice(ITEMS[i], blockStart(i, first), length, count, offsets, lattice);
        source.heliocentricPosition(ITEMS[i], blockStart(i, first), lattice[0]);
        double[] end = new double[3];
        source.heliocentricPosition(ITEMS[i], blockStart(i, first + count), end);
        for (int b = 0; b < count; b++) {
            if (blocks[i].get(first + b) != null) {
                continue;
            }
            double[][] values = new double[n][];
            int row = b * (n - 1);
            values[0] = b + 1 < count ? lattice[row + n - 1] : end;
            for (int j = 1; j < n - 1; j++) {
                values[j] = lattice[row + j];
            }
            values[n - 1] = lattice[row];
            store(i, first + b, values);
        }
    }

    /** The block's coefficients from its values at the nodes, kept unless another thread stored it first. */
    private double[] store(int i, int index, double[][] values) {
        int n = COEFFS[i];
        double length = LENGTH[i];
        // Interpolation on the Lobatto points x_j = cos(πj/N), N = n − 1 (discrete cosine transform of type I):
        // c_k = (2/N) Σ'' f_j cos(πjk/N), the end terms halved in the sum, and c_0, c_N halved.
        int big = n - 1;
        double[] c = new double[6 * n];
        for (int comp = 0; comp < 3; comp++) {
            for (int k = 0; k < n; k++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    double w = j == 0 || j == big ? 0.5 : 1.0;
                    sum += w * values[j][comp] * cosines[i][k][j];
                }
                double ck = 2 * sum / big;
                c[comp * n + k] = k == 0 || k == big ? 0.5 * ck : ck;
            }
            // Derivative series: d_{k-1} = d_{k+1} + 2 k c_k (d_n = d_{n+1} = 0), d_0 halved; then d/dt = (2/L) d/dx.
            int v = (3 + comp) * n;
            double next = 0;
            double nextNext = 0;
            for (int k = n - 1; k >= 1; k--) {
                double d = nextNext + 2 * k * c[comp * n + k];
                c[v + k - 1] = d;
                nextNext = next;
                next = d;
            }
            c[v + n - 1] = 0;
            c[v] *= 0.5;
            for (int k = 0; k < n; k++) {
                c[v + k] *= 2 / length;
            }
        }
        // Interleave as {px, py, pz, vx, vy, vz} per k, the order a cursor reads them in.
        double[] interleaved = new double[6 * n];
        for (int m = 0; m < 6; m++) {
            for (int k = 0; k < n; k++) {
                interleaved[6 * k + m] = c[m * n + k];
            }
        }
        if (blocks[i].compareAndSet(index, null, interleaved)) {
            return interleaved;
        }
        return blocks[i].get(index);
    }

    /**
     * Fast calls on the cache for one thread: it remembers each item's current block (its coefficients and
     * span), so that consecutive calls close in time, an integrator's, skip the block lookup, and it reuses
     * T_k(x) across the items that share a block length. Results equal the cache's own calls bit for bit.
     * Not thread-safe: one cursor per thread.
     */
    public final class Cursor {

        private final double[][] coefficients = new double[ITEMS.length][];
        private final double[] low = new double[ITEMS.length];
        private final double[] high = new double[ITEMS.length];
        private final double[] tk = new double[MAX_COEFFS];
        private final double[] pair = new double[12];
        /** The block start and length T_k in {@link #tk} were computed for (NaN: none). */
        private double tkStart = Double.NaN;
        private double tkLength = Double.NaN;
        private double tkTime = Double.NaN;

        private Cursor() {
            java.util.Arrays.fill(low, Double.NaN);
            java.util.Arrays.fill(high, Double.NaN);
        }

        /**
         * @param t TDB days since J2000
         * @param out receives 3 numbers per body, in the order of {@link #ALL} (length ≥ 27)
         */
        public void heliocentricPositionsAll(double t, double[] out) {
            all(t, out, 3);
        }

        /**
         * @param t TDB days since J2000
         * @param out receives 6 numbers per body, in the order of {@link #ALL} (length ≥ 54)
         */
        public void heliocentricAll(double t, double[] out) {
            all(t, out, 6);
        }

        /**
         * @param t TDB days since J2000
         * @param out receives the Sun's barycentric x, y, z, vx, vy, vz (see {@link ChebyshevCache#sunBarycentric})
         */
        public void sunBarycentric(double t, double[] out) {
            checkSpan(t);
            item(SUN_ITEM, t, out, 0, 6);
        }

        private void all(double t, double[] out, int width) {
            checkSpan(t);
            for (int i : EVALUATION_ORDER) {
                item(i, t, out, width * SLOT[i], width);
            }
            splitEarthMoon(out, 2 * width, 3 * width, width);
        }

        /** Position (width 3) or state (width 6) of item i at t into out[offset …]. */
        void item(int i, double t, double[] out, int offset, int width) {
            double[] c = coefficients[i];
            if (!(t >= low[i] && t < high[i])) {
                int index = indexOf(i, t);
                c = block(i, index);
                coefficients[i] = c;
                low[i] = blockStart(i, index);
                high[i] = index == lastIndex[i] ? Double.POSITIVE_INFINITY : blockStart(i, index + 1);
            }


            int n = COEFFS[i];
            double start = low[i];
            double length = LENGTH[i];
            if (t != tkTime || start != tkStart || length != tkLength) {
                double x = (t - start) * (2 / length) - 1;
                double x2 = 2 * x;
                tk[0] = 1;
                tk[1] = x;
                for (int k = 2; k < MAX_COEFFS; k++) {
                    tk[k] = x2 * tk[k - 1] - tk[k - 2];
                }
                tkTime = t;
                tkStart = start;
                tkLength = length;
            }
            // Positions and velocities in one pass: six independent sums, so that the additions do not wait
            // on one another (fused multiply-adds, one rounding each). The position sums are the same in both
            // branches, bit for bit.
            if (width == 6) {
                double px = 0;
                double py = 0;
                double pz = 0;
                double vx = 0;
                double vy = 0;
                double vz = 0;
                for (int k = 0, j = 0; k < n; k++, j += 6) {
                    double tv = tk[k];
                    px = Math.fma(c[j], tv, px);
                    py = Math.fma(c[j + 1], tv, py);
                    pz = Math.fma(c[j + 2], tv, pz);
                    vx = Math.fma(c[j + 3], tv, vx);
                    vy = Math.fma(c[j + 4], tv, vy);
                    vz = Math.fma(c[j + 5], tv, vz);
                }
                out[offset] = px;
                out[offset + 1] = py;
                out[offset + 2] = pz;
                out[offset + 3] = vx;
                out[offset + 4] = vy;
                out[offset + 5] = vz;
            } else {
                double px = 0;
                double py = 0;
                double pz = 0;
                for (int k = 0, j = 0; k < n; k++, j += 6) {
                    double tv = tk[k];
                    px = Math.fma(c[j], tv, px);
                    py = Math.fma(c[j + 1], tv, py);
                    pz = Math.fma(c[j + 2], tv, pz);
                }
                out[offset] = px;
                out[offset + 1] = py;
                out[offset + 2] = pz;
            }
        }
    }
}
