package trailcross.orbit;

/**
 * The geometric path of an orbit (no timing): heliocentric position and its first two derivatives as
 * functions of one parameter — the eccentric anomaly E for ellipses (points spread evenly along the
 * path even at high e), the true anomaly ν for parabolas and hyperbolas, limited there to the part of
 * the branch within a set distance from the Sun.
 */
final class ConicPath {

    final boolean elliptic;
    final double lo;
    final double hi;
    private final double e;
    private final double a;
    private final double b;
    private final double p;
    private final double[] pq;

    ConicPath(Elements el, double maxDistanceAu) {
        this.e = el.e();
        this.p = el.p();
        this.pq = el.axes();
        this.elliptic = e < 1;
        if (elliptic) {
            a = el.a();
            b = a * Math.sqrt((1 - e) * (1 + e));
            lo = -Math.PI;
            hi = Math.PI;
        } else {
            a = Double.NaN;
            b = Double.NaN;
            // r(ν) = p/(1 + e cos ν) = maxDistance at the cap; beyond the asymptote the branch does not exist.
            double c = (p / Math.max(maxDistanceAu, el.q() * 1.000001) - 1) / e;
            double cap = Math.acos(Math.max(-1, Math.min(1, c)));
            lo = -cap;
            hi = cap;
        }
    }

    /** @return the parameter's span */
    double span() {
        return hi - lo;
    }

    /**
     * @param u the parameter (E or ν)
     * @param out receives x, y, z, x', y', z', x'', y'', z''
     */
    void point(double u, double[] out) {
        double cx;
        double cy;
        double dx;
        double dy;
        double ex;
        double ey;
        double cu = Math.cos(u);
        double su = Math.sin(u);
        if (elliptic) {
            cx = a * (cu - e);
            cy = b * su;
            dx = -a * su;
            dy = b * cu;
            ex = -a * cu;
            ey = -b * su;
        } else {
            double r = p / (1 + e * cu);
            double r1 = r * r * e * su / p;
            double r2 = (2 * r * r1 * e * su + r * r * e * cu) / p;
            cx = r * cu;
            cy = r * su;
            dx = r1 * cu - r * su;
            dy = r1 * su + r * cu;
            ex = r2 * cu - 2 * r1 * su - r * cu;
            ey = r2 * su + 2 * r1 * cu - r * su;
        }
        for (int k = 0; k < 3; k++) {
            out[k] = cx * pq[k] + cy * pq[3 + k];
            out[3 + k] = dx * pq[k] + dy * pq[3 + k];
            out[6 + k] = ex * pq[k] + ey * pq[3 + k];
        }
    }

    /**
     * @param u the parameter
     * @return the true anomaly there
     */
    double trueAnomaly(double u) {
        if (!elliptic) {
            return u;
        }
        return 2 * Math.atan2(Math.sqrt(1 + e) * Math.sin(u / 2), Math.sqrt(1 - e) * Math.cos(u / 2));
    }
}
