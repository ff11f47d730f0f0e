package trailcross.orbit;

/**
 * The Sun's gravitational parameter and the constants tied to it, in au³/day².
 *
 * <p>Source: JPL planetary ephemeris DE440 header constant GMS (Park et al. 2021, AJ 161, 105),
 * 0.295912208284119561e-03 au³/d². The Gaussian constant k = 0.01720209895 (IAU 1976) is kept for
 * published examples computed with it (Meeus, orbit catalogues).
 */
public final class GravitationalParameters {

    /** GM of the Sun, au³/d², DE440 (Park et al. 2021). */
    public static final double SUN = 0.295912208284119561e-03;

    /** The Gaussian gravitational constant k (IAU 1976), √(au³/d²). */
    public static final double GAUSSIAN_K = 0.01720209895;

    /** k², the Sun's GM of classical orbit computation, au³/d². */
    public static final double SUN_GAUSSIAN = GAUSSIAN_K * GAUSSIAN_K;

    private GravitationalParameters() {
    }
}
