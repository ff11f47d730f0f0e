package trailcross.orbit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The minimum orbit intersection distance between two heliocentric orbits, elliptic, parabolic or
 * hyperbolic, and every local minimum of the distance between them (a parent can approach the Earth's
 * orbit on both legs). A global method: the squared distance is sampled on a grid of both orbits'
 * parameters (eccentric anomaly for ellipses, true anomaly for the rest; steps of at most 2° and 3% of
 * the distance from the Sun), every local minimum of the
 * grid is refined by Newton's method on the exact gradient and Hessian (with a gradient step whenever the
 * Hessian is not positive), and duplicates are merged. This is the sampling-and-refinement scheme
 * whose robustness Wiśniowski &amp; Rickman (2013, Acta Astron. 63, 293) discuss; their test orbits are
 * the check cases. An unbound orbit is taken out to {@link #MAX_DISTANCE_AU} from the Sun.
 */
public final class Moid {

    /** How far along an unbound orbit the search goes, au. */
    public static final double MAX_DISTANCE_AU = 100.0;
    /** Grid points per full turn of anomaly at most spacing (a local minimum's basin is much wider than 2°). */
    public static final int GRID = 180;

    /**
     * One local minimum of the distance.
     *
     * @param distance the distance, au
     * @param trueAnomalyA the true anomaly of the point on the first orbit, rad
     * @param trueAnomalyB the true anomaly of the point on the second orbit, rad
     * @param pointA the point on the first orbit (x, y, z), au
     * @param pointB the point on the second orbit, au
     */
    public record Minimum(double distance, double trueAnomalyA, double trueAnomalyB, double[] pointA,
            double[] pointB) {

        /** @return the heliocentric distance of the point on orbit A, au */
        public double radiusA() {
            return Math.sqrt(pointA[0] * pointA[0] + pointA[1] * pointA[1] + pointA[2] * pointA[2]);
        }

        /** @return the heliocentric distance of the point on orbit B, au */
        public double radiusB() {
            return Math.sqrt(pointB[0] * pointB[0] + pointB[1] * pointB[1] + pointB[2] * pointB[2]);
        }
    }

    private Moid() {
    }

    /**
     * @param a one orbit
     * @param b the other
     * @return the MOID, au
     */
    public static double of(Elements a, Elements b) {
        return minima(a, b).get(0).distance();
    }

    /**
     * @param a one orbit
     * @param b the other
     * @return every local minimum of the distance, smallest first
     */
    public static List<Minimum> minima(Elements a, Elements b) {
        ConicPath pa = new ConicPath(a, MAX_DISTANCE_AU);
        ConicPath pb = new ConicPath(b, MAX_DISTANCE_AU);
        double[] ua = params(pa);
        double[] ub = params(pb);
        int na = ua.length;
        int nb = ub.length;
        double[] xa = positions(pa, ua);
        double[] xb = positions(pb, ub);
        double[] d2 = new double[na * nb];
        for (int i = 0; i < na; i++) {
            double px = xa[3 * i];
            double py = xa[3 * i + 1];
            double pz = xa[3 * i + 2];
            for (int j = 0; j < nb; j++) {
                double dx = px - xb[3 * j];
                double dy = py - xb[3 * j + 1];
                double dz = pz - xb[3 * j + 2];
                d2[i * nb + j] = dx * dx + dy * dy + dz * dz;
            }
        }
        List<double[]> seeds = new ArrayList<>();
        for (int i = 0; i < na; i++) {
            for (int j = 0; j < nb; j++) {
                double v = d2[i * nb + j];
                boolean min = true;
                for (int di = -1; di <= 1 && min; di++) {
                    for (int dj = -1; dj <= 1; dj++) {
                        if (di == 0 && dj == 0) {
                            continue;
                        }
                        int ii = wrap(i + di, na, pa.elliptic);
                        int jj = wrap(j + dj, nb, pb.elliptic);
                        if (ii < 0 || jj < 0) {
                            continue;
                        }
                        if (d2[ii * nb + jj] < v) {
                            min = false;
                            break;
                        }
                    }
                }
                if (min) {
                    seeds.add(new double[] {ua[i], ub[j], v});
                }
            }
        }
        seeds.sort(Comparator.comparingDouble(s -> s[2]));
        List<Minimum> out = new ArrayList<>();
        for (double[] s : seeds.subList(0, Math.min(seeds.size(), 32))) {
            Minimum m = refine(pa, pb, s[0], s[1]);
            boolean dup = false;
            for (Minimum o : out) {
                if (Math.abs(Math.IEEEremainder(o.trueAnomalyA() - m.trueAnomalyA(), 2 * Math.PI)) < 1e-6
                        && Math.abs(Math.IEEEremainder(o.trueAnomalyB() - m.trueAnomalyB(), 2 * Math.PI)) < 1e-6) {
                    dup = true;
                    break;
                }
            }
            if (!dup) {
                out.add(m);
            }
        }
        out.sort(Comparator.comparingDouble(Minimum::distance));
        return out;
    }

    /**
     * Refines a local minimum from a starting guess (used to follow one branch while an orbit is changed
     * slightly).
     *
     * @param a one orbit
     * @param b the other
     * @param trueAnomalyA a guess on the first orbit, rad
     * @param trueAnomalyB a guess on the second orbit, rad
     * @return the local minimum reached
     */
    public static Minimum near(Elements a, Elements b, double trueAnomalyA, double trueAnomalyB) {
        ConicPath pa = new ConicPath(a, MAX_DISTANCE_AU);
        ConicPath pb = new ConicPath(b, MAX_DISTANCE_AU);
        return refine(pa, pb, toParam(pa, a.e(), trueAnomalyA), toParam(pb, b.e(), trueAnomalyB));
    }

    private static double toParam(ConicPath p, double e, double nu) {
        if (!p.elliptic) {
            return Math.max(p.lo, Math.min(p.hi, nu));
        }
        return 2 * Math.atan2(Math.sqrt(1 - e) * Math.sin(nu / 2), Math.sqrt(1 + e) * Math.cos(nu / 2));
    }

    private static int wrap(int k, int n, boolean periodic) {
        if (k >= 0 && k < n) {
            return k;
        }
        return periodic ? Math.floorMod(k, n) : -1;
    }

    /**
     * Sample parameters: steps of at most 2° of anomaly and at most 3% of the local distance from the Sun
     * along the path, so that the far, fast-opening parts of high-e and unbound orbits are not skipped.
     */
    private static double[] params(ConicPath p) {
        double[] buf = new double[9];
        double maxStep = 2 * Math.PI / GRID;
        double[] out = new double[64];
        int n = 0;
        double u = p.lo;
        double end = p.elliptic ? p.hi - 1e-9 : p.hi;
        while (u < end) {
            if (n == out.length) {
                out = java.util.Arrays.copyOf(out, 2 * n);
            }
            out[n++] = u;
            p.point(u, buf);
            double r = Math.sqrt(buf[0] * buf[0] + buf[1] * buf[1] + buf[2] * buf[2]);
            double speed = Math.sqrt(buf[3] * buf[3] + buf[4] * buf[4] + buf[5] * buf[5]);
            u += Math.min(maxStep, 0.03 * r / speed);
        }
        if (!p.elliptic) {
            out = java.util.Arrays.copyOf(out, n + 1);
            out[n++] = p.hi;
        }
        return java.util.Arrays.copyOf(out, n);
    }

    private static double[] positions(ConicPath p, double[] us) {
        double[] out = new double[3 * us.length];
        double[] buf = new double[9];
        for (int k = 0; k < us.length; k++) {
            p.point(us[k], buf);
            System.arraycopy(buf, 0, out, 3 * k, 3);
        }
        return out;
    }

    /** Newton's method on f(u, v) = |A(u) − B(v)|²/2, gradient steps when the Hessian is not positive. */
    private static Minimum refine(ConicPath pa, ConicPath pb, double u, double v) {
        double[] ra = new double[9];
        double[] rb = new double[9];
        double f = eval(pa, pb, u, v, ra, rb);
        for (int iter = 0; iter < 100; iter++) {
            double dx = ra[0] - rb[0];
            double dy = ra[1] - rb[1];
            double dz = ra[2] - rb[2];
            double gu = dx * ra[3] + dy * ra[4] + dz * ra[5];
            double gv = -(dx * rb[3] + dy * rb[4] + dz * rb[5]);
            double huu = ra[3] * ra[3] + ra[4] * ra[4] + ra[5] * ra[5] + dx * ra[6] + dy * ra[7] + dz * ra[8];
            double hvv = rb[3] * rb[3] + rb[4] * rb[4] + rb[5] * rb[5] - (dx * rb[6] + dy * rb[7] + dz * rb[8]);
            double huv = -(ra[3] * rb[3] + ra[4] * rb[4] + ra[5] * rb[5]);
            double det = huu * hvv - huv * huv;
            double su;
            double sv;
            if (huu > 0 && det > 0) {
                su = -(hvv * gu - huv * gv) / det;
                sv = -(huu * gv - huv * gu) / det;
            } else {
                double scale = Math.max(Math.abs(huu), Math.abs(hvv)) + 1e-30;
                su = -gu / scale;
                sv = -gv / scale;
            }
            // Backtrack until f decreases (Newton is exact near the minimum, the first step is taken).
            double lambda = 1;
            double nu = u;
            double nv = v;
            double nf = f;
            for (int k = 0; k < 40; k++) {
                nu = clamp(pa, u + lambda * su);
                nv = clamp(pb, v + lambda * sv);
                nf = eval(pa, pb, nu, nv, ra, rb);
                if (nf <= f) {
                    break;
                }
                lambda *= 0.5;
            }
            if (nf > f) {
                eval(pa, pb, u, v, ra, rb);
                break;
            }
            double step = Math.abs(nu - u) + Math.abs(nv - v);
            u = nu;
            v = nv;
            f = nf;
            if (step < 1e-15) {
                break;
            }
        }
        eval(pa, pb, u, v, ra, rb);
        return new Minimum(Math.sqrt(2 * f), pa.trueAnomaly(u), pb.trueAnomaly(v),
                new double[] {ra[0], ra[1], ra[2]}, new double[] {rb[0], rb[1], rb[2]});
    }

    private static double clamp(ConicPath p, double u) {
        return p.elliptic ? u : Math.max(p.lo, Math.min(p.hi, u));
    }

    private static double eval(ConicPath pa, ConicPath pb, double u, double v, double[] ra, double[] rb) {
        pa.point(u, ra);
        pb.point(v, rb);
        double dx = ra[0] - rb[0];
        double dy = ra[1] - rb[1];
        double dz = ra[2] - rb[2];
        return 0.5 * (dx * dx + dy * dy + dz * dz);
    }
}
