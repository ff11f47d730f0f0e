package trailcross.dynamics;

import trailcross.ephemeris.Body;
import trailcross.ephemeris.ChebyshevCache;
import trailcross.ephemeris.Ephemeris;

/**
 * The pull of the planets, the Earth and the Moon as point masses on a particle: the direct terms
 * GM_j (r_j − r)/|r_j − r|³ and, when the particle is integrated in heliocentric coordinates, the indirect
 * term −GM_j r_j/r_j³ of the Sun's own acceleration towards each body (e.g. Murray &amp; Dermott 1999, eq.
 * 6.8); in barycentric coordinates there is no indirect term. The separations are formed from heliocentric
 * positions in either case (r_j − r is the same vector in both frames). Positions come from a
 * {@link PlanetPositions} shared with the force model. Passing inside a body's radius is recorded as an impact.
 */
public final class PlanetaryPerturbations implements Acceleration {

    /** Mean radii in km (IAU WG on Cartographic Coordinates, Archinal et al. 2018), in {@link ChebyshevCache#ALL} order. */
    private static final double[] RADII_KM = {2439.4, 6051.8, 6371.0, 1737.4, 3389.5, 69911, 58232, 25362, 24622};

    private final PlanetPositions planets;
    private final boolean indirect;
    private final Body[] bodies = ChebyshevCache.ALL;
    private final double[] gm = new double[bodies.length];
    private final double[] radius2 = new double[bodies.length];
    private final double jump;
    private String impact;
    private double rounding;

    /** Unit roundoff of double precision, 2^−53. */
    private static final double U = 0x1p-53;

    /**
     * @param ephemeris the planets' source
     * @param planets the positions' reader, shared with the force model
     * @param indirect whether to add the indirect terms (heliocentric integration)
     * @param only the bodies included (null: all)
     */
    PlanetaryPerturbations(Ephemeris ephemeris, PlanetPositions planets, boolean indirect, java.util.Set<Body> only) {
        this.planets = planets;
        this.indirect = indirect;
        this.jump = ephemeris.discontinuityAu();
        for (int j = 0; j < bodies.length; j++) {
            gm[j] = only == null || only.contains(bodies[j]) ? bodies[j].gm() : 0;
            double r = RADII_KM[j] / Body.Constants.AU_KM;
            radius2[j] = r * r;
        }
    }

    @Override
    public void add(double t, double[] x, double[] v, double[] a) {
        planets.at(t);
        double[] positions = planets.positions;
        double[] distances = planets.distances;
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
            double d = Math.sqrt(d2);
            double fd = gm[j] / (d2 * d);
            double rj = distances[j];
            // The separation is the difference of two heliocentric vectors, each rounded to ~U of its
            // length: its relative error (r + r_j) U / d, tripled in GM/d² r̂ (magnitude and direction).
            noise += 3 * U * (r + rj) * fd;
            // A piecewise ephemeris may jump by up to `jump` between pieces (the cache: rounding only, 1e-13
            // au); a term GM (r_j − r)/d³ jumps with it by ~2 GM/d³ × jump, which no step can resolve.
            noise += 2 * fd * jump;
            ax += fd * dx;
            ay += fd * dy;
            az += fd * dz;
            if (indirect) {
                double fp = gm[j] / (rj * rj * rj);
                noise += 2 * fp * jump;
                ax -= fp * px;
                ay -= fp * py;
                az -= fp * pz;
            }
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
