package trailcross.dynamics;

/**
 * The Sun's attraction reduced by radiation pressure: a = −GM☉ (1 − β) r / r³, β being the ratio of
 * radiation pressure to gravity (Burns, Lamy &amp; Soter 1979, Icarus 40, 1, eq. 19).
 */
public final class SunGravity implements Acceleration {

    private final double mu;

    /**
     * @param gmSun GM of the Sun, au³/d²
     * @param beta radiation-pressure β (0 for the parent)
     */
    public SunGravity(double gmSun, double beta) {
        this.mu = gmSun * (1 - beta);
    }

    @Override
    public void add(double t, double[] x, double[] v, double[] a) {
        double r2 = x[0] * x[0] + x[1] * x[1] + x[2] * x[2];
        double f = -mu / (r2 * Math.sqrt(r2));
        a[0] += f * x[0];
        a[1] += f * x[1];
        a[2] += f * x[2];
    }
}
