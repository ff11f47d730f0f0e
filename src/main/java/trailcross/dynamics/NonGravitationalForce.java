package trailcross.dynamics;

/**
 * Cometary non-gravitational acceleration of Marsden, Sekanina &amp; Yeomans (1973, AJ 78, 211):
 * a = g(r) (A1 r̂ + A2 t̂ + A3 n̂) with the water-ice sublimation law
 * g(r) = α (r/r0)^−m (1 + (r/r0)^n)^−k, α = 0.111262, r0 = 2.808 au, m = 2.15, n = 5.093, k = 4.6142
 * (g(1 au) = 1); r̂ radial, n̂ along r × v, t̂ = n̂ × r̂ (transverse, in the direction of motion).
 */
public final class NonGravitationalForce implements Acceleration {

    private static final double ALPHA = 0.111262;
    private static final double R0 = 2.808;
    private static final double M = 2.15;
    private static final double N = 5.093;
    private static final double K = 4.6142;

    private final double a1;
    private final double a2;
    private final double a3;

    /**
     * @param a1 radial parameter, au/d²
     * @param a2 transverse parameter, au/d²
     * @param a3 normal parameter, au/d²
     */
    public NonGravitationalForce(double a1, double a2, double a3) {
        this.a1 = a1;
        this.a2 = a2;
        this.a3 = a3;
    }

    /**
     * @param r heliocentric distance, au
     * @return g(r) of Marsden et al. (1973)
     */
    public static double g(double r) {
        double s = r / R0;
        return ALPHA * Math.pow(s, -M) * Math.pow(1 + Math.pow(s, N), -K);
    }

    @Override
    public void add(double t, double[] x, double[] v, double[] a) {
        double r = Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2]);
        double hx = x[1] * v[2] - x[2] * v[1];
        double hy = x[2] * v[0] - x[0] * v[2];
        double hz = x[0] * v[1] - x[1] * v[0];
        double h = Math.sqrt(hx * hx + hy * hy + hz * hz);
        double rx = x[0] / r;
        double ry = x[1] / r;
        double rz = x[2] / r;
        double nx = hx / h;
        double ny = hy / h;
        double nz = hz / h;
        double tx = ny * rz - nz * ry;
        double ty = nz * rx - nx * rz;
        double tz = nx * ry - ny * rx;
        double gr = g(r);
        a[0] += gr * (a1 * rx + a2 * tx + a3 * nx);
        a[1] += gr * (a1 * ry + a2 * ty + a3 * ny);
        a[2] += gr * (a1 * rz + a2 * tz + a3 * nz);
    }
}
