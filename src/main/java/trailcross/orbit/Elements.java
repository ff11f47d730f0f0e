package trailcross.orbit;

import org.hipparchus.util.FastMath;

/**
 * Osculating heliocentric orbital elements in perihelion form, valid for every conic (e = 0 … e ≫ 1):
 * perihelion distance q, eccentricity e, inclination i, longitude of the ascending node Ω, argument of
 * perihelion ω and time of perihelion T. Angles in radians, referred to the frame of the state vectors
 * (ecliptic and equinox J2000 in trailcross).
 *
 * <p>Elements → state: the perihelion state is written down exactly and carried to t by universal
 * variables ({@link TwoBody}), so there is no singularity at e = 1. State → elements: the angular
 * momentum and Laplace–Runge–Lenz vectors (Danby 1988, §6.12), and the time from perihelion through
 * the universal anomaly from Stumpff functions, which stays exact for near-parabolic orbits.
 *
 * @param q perihelion distance (au)
 * @param e eccentricity
 * @param i inclination (rad)
 * @param node longitude of the ascending node Ω (rad)
 * @param peri argument of perihelion ω (rad)
 * @param perihelionJd time of perihelion T, Julian date TDB
 * @param gm the central body's GM (au³/d²)
 */
public record Elements(double q, double e, double i, double node, double peri, double perihelionJd,
        double gm) {

    /** Eccentricity below which an orbit is treated as circular (ω = 0, anomaly from the node). */
    private static final double CIRCULAR = 1e-12;
    /** Inclination (rad) below which the node is undefined and taken as 0. */
    private static final double EQUATORIAL = 1e-14;

    /**
     * Elements from the usual catalogue units.
     *
     * @param q perihelion distance, au
     * @param e eccentricity
     * @param iDeg inclination, degrees
     * @param nodeDeg longitude of the ascending node, degrees
     * @param periDeg argument of perihelion, degrees
     * @param perihelionJd time of perihelion, JD TDB
     * @param gm GM, au³/d²
     * @return the elements
     */
    public static Elements ofDegrees(double q, double e, double iDeg, double nodeDeg, double periDeg,
            double perihelionJd, double gm) {
        return new Elements(q, e, Math.toRadians(iDeg), Math.toRadians(nodeDeg), Math.toRadians(periDeg),
                perihelionJd, gm);
    }

    /**
     * Elements from a mean anomaly at an epoch (the form asteroid catalogues give), for e ≠ 1.
     *
     * @param q perihelion distance
     * @param e eccentricity (≠ 1)
     * @param i inclination, rad
     * @param node Ω, rad
     * @param peri ω, rad
     * @param meanAnomaly M at {@code epochJd}, rad; the perihelion is at {@code epochJd − M/n}
     * @param epochJd the epoch of M, JD TDB
     * @param gm GM
     * @return the elements
     */
    public static Elements ofMeanAnomaly(double q, double e, double i, double node, double peri,
            double meanAnomaly, double epochJd, double gm) {
        if (e == 1) {
            throw new IllegalArgumentException("a mean anomaly does not define a parabolic orbit");
        }
        double a = q / (1 - e);
        double n = Math.sqrt(gm / Math.abs(a * a * a));
        return new Elements(q, e, i, node, peri, epochJd - meanAnomaly / n, gm);
    }

    /** @return semi-major axis q/(1 − e): positive for ellipses, negative for hyperbolas, infinite for e = 1 */
    public double a() {
        return e == 1 ? Double.POSITIVE_INFINITY : q / (1 - e);
    }

    /** @return semi-latus rectum p = q (1 + e) */
    public double p() {
        return q * (1 + e);
    }

    /** @return aphelion distance, infinite for e ≥ 1 */
    public double aphelion() {
        return e < 1 ? q * (1 + e) / (1 - e) : Double.POSITIVE_INFINITY;
    }

    /** @return mean motion √(GM/|a|³) in rad/day (0 for the parabola) */
    public double meanMotion() {
        double a = Math.abs(a());
        return Double.isInfinite(a) ? 0.0 : Math.sqrt(gm / (a * a * a));
    }

    /** @return orbital period in days, infinite for e ≥ 1 */
    public double period() {
        return e < 1 ? 2 * Math.PI / meanMotion() : Double.POSITIVE_INFINITY;
    }

    /**
     * @param jd a Julian date, TDB
     * @return the mean anomaly n (t − T) in radians (not reduced), 0 for the parabola
     */
    public double meanAnomalyAt(double jd) {
        return meanMotion() * (jd - perihelionJd);
    }

    /** @return Tisserand's parameter with respect to Jupiter (a_J = 5.2026 au, Standish 1992 mean), e &lt; 1 or not */
    public double tisserandJupiter() {
        double aj = 5.2026;
        return aj / a() + 2 * Math.cos(i) * Math.sqrt(p() / aj);
    }

    /**
     * The state at a time.
     *
     * @param jd Julian date, TDB
     * @return position and velocity in the elements' frame
     */
    public StateVector stateAt(double jd) {
        double[] s = perihelionState();
        double dt = jd - perihelionJd;
        if (e < 1) {
            // The period from the exact a, not from the state's energy, which loses digits when q ≪ a.
            double period = period();
            dt -= Math.rint(dt / period) * period;
        }
        TwoBody.propagate(s, dt, gm, s);
        return StateVector.of(s);
    }

    /**
     * The state at a true anomaly (ignores T), for e &lt; 1 any ν, for e ≥ 1 |ν| below the asymptote.
     *
     * @param nu true anomaly, rad
     * @return position and velocity
     */
    public StateVector stateAtTrueAnomaly(double nu) {
        double p = p();
        double r = p / (1 + e * Math.cos(nu));
        double vr = Math.sqrt(gm / p);
        double[] pq = axes();
        double cx = r * Math.cos(nu);
        double cy = r * Math.sin(nu);
        double wx = -vr * Math.sin(nu);
        double wy = vr * (e + Math.cos(nu));
        return new StateVector(cx * pq[0] + cy * pq[3], cx * pq[1] + cy * pq[4], cx * pq[2] + cy * pq[5],
                wx * pq[0] + wy * pq[3], wx * pq[1] + wy * pq[4], wx * pq[2] + wy * pq[5]);
    }

    /**
     * @param jd Julian date, TDB
     * @return the true anomaly at that time, rad, in (−π, π]
     */
    public double trueAnomalyAt(double jd) {
        StateVector s = stateAt(jd);
        double[] pq = axes();
        double x = s.x() * pq[0] + s.y() * pq[1] + s.z() * pq[2];
        double y = s.x() * pq[3] + s.y() * pq[4] + s.z() * pq[5];
        return Math.atan2(y, x);
    }

    /**
     * The unit vectors P (towards perihelion) and Q (90° ahead in the plane of motion).
     *
     * @return {Px, Py, Pz, Qx, Qy, Qz}
     */
    public double[] axes() {
        double co = Math.cos(node);
        double so = Math.sin(node);
        double cw = Math.cos(peri);
        double sw = Math.sin(peri);
        double ci = Math.cos(i);
        double si = Math.sin(i);
        return new double[] {
            co * cw - so * sw * ci, so * cw + co * sw * ci, sw * si,
            -co * sw - so * cw * ci, -so * sw + co * cw * ci, cw * si
        };
    }

    private double[] perihelionState() {
        double[] pq = axes();
        double v = Math.sqrt(gm * (1 + e) / q);
        return new double[] {q * pq[0], q * pq[1], q * pq[2], v * pq[3], v * pq[4], v * pq[5]};
    }

    /**
     * Osculating elements of a state.
     *
     * @param s position and velocity
     * @param jd the state's Julian date, TDB
     * @param gm GM of the central body
     * @return the elements; for an ellipse T is the perihelion nearest to {@code jd}
     * @throws IllegalArgumentException for a rectilinear (zero angular momentum) state
     */
    public static Elements of(StateVector s, double jd, double gm) {
        double x = s.x();
        double y = s.y();
        double z = s.z();
        double vx = s.vx();
        double vy = s.vy();
        double vz = s.vz();
        double r = Math.sqrt(x * x + y * y + z * z);
        double v2 = vx * vx + vy * vy + vz * vz;
        double eta = x * vx + y * vy + z * vz;
        double hx = y * vz - z * vy;
        double hy = z * vx - x * vz;
        double hz = x * vy - y * vx;
        double h2 = hx * hx + hy * hy + hz * hz;
        double h = Math.sqrt(h2);
        if (!(h > 0) || !Double.isFinite(r)) {
            throw new IllegalArgumentException("state has no orbital plane (zero angular momentum or not finite)");
        }
        double ex = ((v2 - gm / r) * x - eta * vx) / gm;
        double ey = ((v2 - gm / r) * y - eta * vy) / gm;
        double ez = ((v2 - gm / r) * z - eta * vz) / gm;
        double e = Math.sqrt(ex * ex + ey * ey + ez * ez);
        double q = h2 / (gm * (1 + e));
        double inc = Math.atan2(Math.hypot(hx, hy), hz);
        double node = inc > EQUATORIAL ? Math.atan2(hx, -hy) : 0.0;
        if (node < 0) {
            node += 2 * Math.PI;
        }
        // In-plane axes: n along the node line, m = ĥ × n.
        double nx = Math.cos(node);
        double ny = Math.sin(node);
        double mx = -hz * ny / h;
        double my = hz * nx / h;
        double mz = (hx * ny - hy * nx) / h;
        double beta = 2 * gm / r - v2;
        double peri;
        double sAnomaly;
        if (e < CIRCULAR) {
            e = 0;
            q = h2 / gm;
            peri = 0;
            double u = Math.atan2(x * mx + y * my + z * mz, x * nx + y * ny);
            sAnomaly = u / Math.sqrt(beta);
        } else {
            peri = Math.atan2(ex * mx + ey * my + ez * mz, ex * nx + ey * ny);
            if (peri < 0) {
                peri += 2 * Math.PI;
            }
            sAnomaly = universalAnomalyFromPerihelion(r, eta, beta, e, gm);
        }
        double[] c = new double[4];
        Stumpff.evaluate(beta * sAnomaly * sAnomaly, c);
        double sinceperihelion = q * sAnomaly * c[1] + gm * sAnomaly * sAnomaly * sAnomaly * c[3];
        return new Elements(q, e, inc, node, peri, jd - sinceperihelion, gm);
    }

    /**
     * The universal anomaly s since perihelion, from r = a(1 − e cos E), η = e √(μa) sin E and
     * s = E/√β (and their hyperbolic and parabolic counterparts).
     */
    private static double universalAnomalyFromPerihelion(double r, double eta, double beta, double e,
            double gm) {
        if (beta > 0) {
            double a = gm / beta;
            double anomaly = Math.atan2(eta / Math.sqrt(gm * a), 1 - r / a);
            return anomaly / Math.sqrt(beta);
        }
        if (beta < 0) {
            double a = gm / beta;
            double anomaly = FastMath.asinh(eta / (e * Math.sqrt(-gm * a)));
            return anomaly / Math.sqrt(-beta);
        }
        return eta / (gm * e);
    }
}
