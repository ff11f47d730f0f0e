package trailcross.dynamics;

/**
 * Poynting–Robertson drag, the velocity-dependent part of the radiation force on a grain
 * (Burns, Lamy &amp; Soter 1979, Icarus 40, 1, eq. 5): F = (S A Q_pr / c) [(1 − ṙ/c) r̂ − v/c], whose
 * radial pressure term β GM/r² r̂ is in {@link SunGravity}; this term adds −β GM/r² (ṙ/c r̂ + v/c).
 */
public final class PoyntingRobertsonDrag implements Acceleration {

    private final double betaMu;

    /**
     * @param gmSun GM of the Sun, au³/d²
     * @param beta radiation-pressure β
     */
    public PoyntingRobertsonDrag(double gmSun, double beta) {
        this.betaMu = beta * gmSun;
    }

    @Override
    public void add(double t, double[] x, double[] v, double[] a) {
        double r2 = x[0] * x[0] + x[1] * x[1] + x[2] * x[2];
        double r = Math.sqrt(r2);
        double rdot = (x[0] * v[0] + x[1] * v[1] + x[2] * v[2]) / r;
        double c = PhysicalConstants.C_AU_PER_DAY;
        double f = -betaMu / (r2 * c);
        double fr = f * rdot / r;
        a[0] += fr * x[0] + f * v[0];
        a[1] += fr * x[1] + f * v[1];
        a[2] += fr * x[2] + f * v[2];
    }
}
