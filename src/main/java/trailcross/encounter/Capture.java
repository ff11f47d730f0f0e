package trailcross.encounter;

/**
 * Capture by a gravitating target: a meteoroid arriving with speed v∞ at impact parameter b reaches a
 * least distance q = √((GM/v∞²)² + b²) − GM/v∞² on its hyperbola about the target, so that it is captured
 * inside a radius R when b &lt; R √(1 + v_esc²/v∞²), v_esc² = 2GM/R: the cross-section
 * σ = π R² (1 + v_esc²/v∞²) of gravitational focusing (Öpik 1951, Proc. R. Irish Acad. 54A, 165; the same
 * in Jones &amp; Poole 2007, MNRAS 375, 925, eq. 1; from memory). b and v∞ follow from the relative state at
 * any point of the passage (angular momentum and energy are conserved in the target's two-body field),
 * so the test holds whether or not the integration bent the path. Units: au, au/d, au³/d².
 */
public final class Capture {

    private Capture() {
    }

    /**
     * @param rel a relative state (x, y, z, vx, vy, vz)
     * @param gm the target's GM
     * @return v∞² = v² − 2GM/r (≤ 0 for a bound relative orbit)
     */
    public static double vInfinitySquared(double[] rel, double gm) {
        double r = Math.sqrt(rel[0] * rel[0] + rel[1] * rel[1] + rel[2] * rel[2]);
        double v2 = rel[3] * rel[3] + rel[4] * rel[4] + rel[5] * rel[5];
        return v2 - 2 * gm / r;
    }

    /**
     * @param rel a relative state
     * @param gm the target's GM
     * @return the impact parameter b = |r × v| / v∞ (0 for a bound relative orbit)
     */
    public static double impactParameter(double[] rel, double gm) {
        double v2 = vInfinitySquared(rel, gm);
        if (!(v2 > 0)) {
            return 0;
        }
        double hx = rel[1] * rel[5] - rel[2] * rel[4];
        double hy = rel[2] * rel[3] - rel[0] * rel[5];
        double hz = rel[0] * rel[4] - rel[1] * rel[3];
        return Math.sqrt(hx * hx + hy * hy + hz * hz) / Math.sqrt(v2);
    }

    /**
     * @param b impact parameter
     * @param vInf2 v∞²
     * @param gm the target's GM
     * @return the least distance on the hyperbola
     */
    public static double perigee(double b, double vInf2, double gm) {
        if (gm == 0) {
            return b;
        }
        double a = gm / vInf2;
        return Math.sqrt(a * a + b * b) - a;
    }

    /**
     * @param radius the capture radius
     * @param gm the target's GM
     * @param vInf2 v∞²
     * @return the focused capture radius R √(1 + 2GM/(R v∞²))
     */
    public static double focusedRadius(double radius, double gm, double vInf2) {
        return radius * Math.sqrt(1 + 2 * gm / (radius * vInf2));
    }

    /**
     * @param radius the capture radius
     * @param gm the target's GM
     * @param vInf2 v∞²
     * @return σ = π R² (1 + v_esc²/v∞²)
     */
    public static double crossSection(double radius, double gm, double vInf2) {
        double r = focusedRadius(radius, gm, vInf2);
        return Math.PI * r * r;
    }

    /**
     * @param rel a relative state
     * @param gm the target's GM
     * @param radius the capture radius (0: nothing is captured)
     * @return whether the passage comes inside the radius
     */
    public static boolean captured(double[] rel, double gm, double radius) {
        if (!(radius > 0)) {
            return false;
        }
        double v2 = vInfinitySquared(rel, gm);
        if (!(v2 > 0)) {
            // Bound to the target for the moment: judged by the distance reached on the integrated path.
            return Math.sqrt(rel[0] * rel[0] + rel[1] * rel[1] + rel[2] * rel[2]) < radius;
        }
        return perigee(impactParameter(rel, gm), v2, gm) < radius;
    }
}
