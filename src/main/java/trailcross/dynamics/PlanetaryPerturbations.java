package trailcross.dynamics;

import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.ephemeris.Ephemeris;

/**
 * The pull of the planets, the Earth and the Moon as point masses on a particle integrated in heliocentric
 * coordinates, with the indirect term of the Sun's acceleration towards each body:
 * a = Σ GM_j [(r_j − r)/|r_j − r|³ − r_j/r_j³] (e.g. Murray &amp; Dermott 1999, eq. 6.8). Positions from
 * the {@link Ephemeris} (all at once from a {@link ChebyshevCache}). Passing inside a body's radius is
 * recorded as an impact.
 */
public final class PlanetaryPerturbations implements Acceleration {

    /** Mean radii in km (IAU WG on Cartographic Coordinates, Archinal et al. 2018), in {@link ChebyshevCache#ALL} order. */
    private static final double[] RADII_KM = {2439.4, 6051.8, 6371.0, 1737.4, 3389.5, 69911, 58232, 25362, 24622};

    private final Ephemeris ephemeris;
    private final ChebyshevCache cache;
    private final Body[] bodies = ChebyshevCache.ALL;
    private final double[] gm = new double[bodies.length];
    private final double[] radius2 = new double[bodies.length];
    private final double[] positions = new double[3 * bodies.length];
    private final double[] scratch = new double[6];
    private final double jump;
    private String impact;
    private double rounding;

    /** Unit roundoff of double precision, 2^−53. */
    private static final double U = 0x1p-53;

    /**
     * @param ephemeris the planets' source; a {@link ChebyshevCache} is used through its all-body call
     */
    public PlanetaryPerturbations(Ephemeris ephemeris) {
        this.ephemeris = ephemeris;
        this.cache = ephemeris instanceof ChebyshevCache c ? c : null;
        this.jump = ephemeris.discontinuityAu();
        for (int j = 0; j < bodies.length; j++) {
            gm[j] = bodies[j].gm();
            double r = RADII_KM[j] / Body.Constants.AU_KM;
            radius2[j] = r * r;
        }
    }

    @Override
    public void add(double t, double[] x, double[] v, double[] a) {
        if (cache != null) {
            cache.heliocentricPositionsAll(t, positions);
        } else {
            for (int j = 0; j < bodies.length; j++) {
                ephemeris.heliocentricPosition(bodies[j], t, scratch);
                positions[3 * j] = scratch[0];
                positions[3 * j + 1] = scratch[1];
                positions[3 * j + 2] = scratch[2];
            }
        }
        double ax = 0;
        double ay = 0;
        double az = 0;
        double r = Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2]);
        // The particle's own position is rounded to ~U of its length, which jitters the Sun's pull by
        // ~3U of itself; the planets' terms below add the jitter of each separation.
        double noise = 3 * U * Body.SUN.gm() / (r * r);
        for (int j = 0; j < bodies.length; j++) {
            double px = positions[3 * j];
            double py = positions[3 * j + 1];
            double pz = positions[3 * j + 2];
            double dx = px - x[0];
            double dy = py - x[1];
            double dz = pz - x[2];
            double d2 = dx * dx + dy * dy + dz * dz;
            if (d2 < radius2[j]) {
                impact = bodies[j].key();
            }
            double p2 = px * px + py * py + pz * pz;
            double d = Math.sqrt(d2);
            double fd = gm[j] / (d2 * d);
            double fp = gm[j] / (p2 * Math.sqrt(p2));
            // The separation is the difference of two heliocentric vectors, each rounded to ~U of its
            // length: its relative error (r + r_j) U / d, tripled in GM/d² r̂ (magnitude and direction).
            noise += 3 * U * (r + Math.sqrt(p2)) / d * fd * d;
            // A piecewise ephemeris jumps by up to `jump` between pieces; the indirect term GM r_j/r_j³
            // jumps with it by ~2 GM/r_j³ × jump. Counted on every step, this term lifts the integrator's
            // tolerance floor to ~1e-7 near 1 au and far higher far from the Sun. Measured: it cures a stall
            // of an unbound orbit ~190 au out (whose cause was not a block boundary: none lies there), cuts
            // a Halley-type century from 9,625 to 3,356 steps, and leaves the agreement with Hipparchus DP853
            // unchanged (1.1e-10 au over that century, 6e-11 au through a Jupiter encounter). It also makes
            // eps below ~1e-7 ineffective; see DEVELOPERS.md.
            noise += 2 * fp * jump;
            ax += fd * dx - fp * px;
            ay += fd * dy - fp * py;
            az += fd * dz - fp * pz;
        }
        a[0] += ax;
        a[1] += ay;
        a[2] += az;
        rounding = Math.max(rounding, noise);
    }

    /** @return the largest rounding estimate since the last call; cleared by the call */
    double takeRoundingError() {
        double n = rounding;
        rounding = 0;
        return n;
    }

    /** @return the body last passed inside of, or null; cleared by the call */
    String takeImpact() {
        String i = impact;
        impact = null;
        return i;
    }
}
