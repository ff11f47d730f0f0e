package trailcross.ephemeris;

import org.jastronomy.jsofa.JSOFA;
import trailcross.frames.EclipticFrame;

/**
 * The embedded ephemeris: the planets from the complete VSOP87B series ({@link Vsop87Series}), the Moon
 * from IAU SOFA's {@code iauMoon98} (Meeus 1998, ch. 47, ELP-2000/82 truncated; geocentric, GCRS), the
 * Earth–Moon barycentre from the two with DE440's EMRAT, and the Sun's barycentric offset from the
 * planets' masses (DE440 GMs; Pluto neglected, ≈ 3e-7 au). Every call sums the series: slow (about a
 * millisecond per body), exact to the theory; wrap it in a {@link ChebyshevCache} for integration.
 */
public final class Vsop87Ephemeris implements Ephemeris {

    /** First day served: 1000 AD (VSOP87's full precision holds over ±1000 yr for every planet). */
    public static final double FIRST_DAY = -365250.0;
    /** Last day served: 3000 AD. */
    public static final double LAST_DAY = 365250.0;

    private static final double MOON_FRACTION = 1 / (1 + Body.Constants.EMRAT);

    private final Vsop87Series series = Vsop87Series.get();

    @Override
    public String name() {
        return "VSOP87B + Moon98 (embedded)";
    }

    @Override
    public double firstDay() {
        return FIRST_DAY;
    }

    @Override
    public double lastDay() {
        return LAST_DAY;
    }

    /**
     * The Moon's geocentric state in ecliptic J2000 (SOFA {@code iauMoon98}, GCRS rotated by ε0).
     *
     * @param t TDB days since J2000 (TT is used for TDB: they differ by &lt; 2 ms)
     * @param out receives x, y, z, vx, vy, vz
     */
    public static void moonGeocentric(double t, double[] out) {
        double[][] pv = JSOFA.jauMoon98(2451545.0, t);
        out[0] = pv[0][0];
        out[1] = pv[0][1];
        out[2] = pv[0][2];
        out[3] = pv[1][0];
        out[4] = pv[1][1];
        out[5] = pv[1][2];
        EclipticFrame.toEcliptic(out, 0);
        EclipticFrame.toEcliptic(out, 3);
    }

    @Override
    public void heliocentric(Body body, double t, double[] out) {
        checkSpan(t);
        state(body, t, out, true);
    }

    @Override
    public void heliocentricPosition(Body body, double t, double[] out) {
        checkSpan(t);
        double[] s = new double[6];
        state(body, t, s, false);
        System.arraycopy(s, 0, out, 0, 3);
    }

    private void state(Body body, double t, double[] out, boolean withVelocity) {
        switch (body) {
            case SUN -> java.util.Arrays.fill(out, 0, 6, 0.0);
            case MOON, EARTH_MOON_BARYCENTRE -> {
                series.heliocentric(Vsop87Series.indexOf(Body.EARTH), t, out, withVelocity);
                double[] moon = new double[6];
                moonGeocentric(t, moon);
                double f = body == Body.MOON ? 1.0 : MOON_FRACTION;
                int n = withVelocity ? 6 : 3;
                for (int k = 0; k < n; k++) {
                    out[k] += f * moon[k];
                }
            }
            default -> series.heliocentric(Vsop87Series.indexOf(body), t, out, withVelocity);
        }
    }

    /**
     * Heliocentric positions of a planet or the Earth–Moon barycentre on a lattice of times
     * t = start + j·step + offsets[i] ({@link Vsop87Series#positionsOnLattice}; the barycentre adds the Moon's
     * share at each time, from Moon98).
     *
     * @param body a planet of VSOP87B or {@link Body#EARTH_MOON_BARYCENTRE}
     * @param start the first row, TDB days since J2000
     * @param step days between rows
     * @param count rows
     * @param offsets offsets within a row, days
     * @param out receives x, y, z of time (j, i) at {@code out[j * offsets.length + i]}
     */
    public void positionsOnLattice(Body body, double start, double step, int count, double[] offsets, double[][] out) {
        checkSpan(start);
        boolean emb = body == Body.EARTH_MOON_BARYCENTRE;
        series.positionsOnLattice(Vsop87Series.indexOf(emb ? Body.EARTH : body), start, step, count, offsets, out);
        if (emb) {
            double[] moon = new double[6];
            for (int j = 0, p = 0; j < count; j++) {
                for (int i = 0; i < offsets.length; i++, p++) {
                    double t = start + j * step + offsets[i];
                    checkSpan(t);
                    moonGeocentric(t, moon);
                    for (int k = 0; k < 3; k++) {
                        out[p][k] += MOON_FRACTION * moon[k];
                    }
                }
            }
        }
    }

    @Override
    public void moonGeocentricPosition(double t, double[] out) {
        checkSpan(t);
        double[] s = new double[6];
        moonGeocentric(t, s);
        System.arraycopy(s, 0, out, 0, 3);
    }

    @Override
    public void sunBarycentric(double t, double[] out) {
        checkSpan(t);
        double total = Body.systemGm();
        double[] sum = new double[6];
        double[] s = new double[6];
        for (Body b : Body.MASSIVE_PLANETS) {
            state(b, t, s, true);
            for (int k = 0; k < 6; k++) {
                sum[k] += b.gm() * s[k];
            }
        }
        for (int k = 0; k < 6; k++) {
            out[k] = -sum[k] / total;
        }
    }
}
