package trailcross.dynamics;

/**
 * The Sun's first post-Newtonian (Schwarzschild) term for a test particle in heliocentric coordinates,
 * PPN β = γ = 1: a = GM/(c² r³) [(4 GM/r − v²) r + 4 (r·v) v] (e.g. Moyer 2003, JPL Monograph 2, eq. 4-61
 * reduced to one central body; Anderson et al. 1975). It advances Mercury's perihelion by 43″/century.
 */
public final class SolarRelativity implements Acceleration {

    private final double gm;
    private final double c2;

    /**
     * @param gmSun GM of the Sun, au³/d²
     */
    public SolarRelativity(double gmSun) {
        this.gm = gmSun;
        this.c2 = PhysicalConstants.C_AU_PER_DAY * PhysicalConstants.C_AU_PER_DAY;
    }

    @Override
    public void add(double t, double[] x, double[] v, double[] a) {
        double r2 = x[0] * x[0] + x[1] * x[1] + x[2] * x[2];
        double r = Math.sqrt(r2);
        double v2 = v[0] * v[0] + v[1] * v[1] + v[2] * v[2];
        double rv = x[0] * v[0] + x[1] * v[1] + x[2] * v[2];
        double f = gm / (c2 * r2 * r);
        double fr = f * (4 * gm / r - v2);
        double fv = f * 4 * rv;
        a[0] += fr * x[0] + fv * v[0];
        a[1] += fr * x[1] + fv * v[1];
        a[2] += fr * x[2] + fv * v[2];
    }
}
