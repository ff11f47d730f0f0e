package trailcross.stream;

/**
 * The {@code [ejection]} section: how meteoroids leave the parent at each return.
 *
 * @param model the ejection-velocity model
 * @param speedScale factor on the model's speed (fragmentation events need 2–4×)
 * @param fixedSpeedMs the speed of the {@code fixed} model, m/s
 * @param directions how directions are drawn
 * @param coneHalfAngleDeg half-angle of the sunward cone, degrees (used by {@code cone})
 * @param activeInboundAu activity starts inside this heliocentric distance before perihelion, au
 * @param activeOutboundAu activity ends beyond this heliocentric distance after perihelion, au
 * @param productionExponent n of the production law Q ∝ r^−n
 * @param productionTableDays optional table: days from perihelion (strictly increasing), or null
 * @param productionTableRelative optional table: relative production at those days (≥ 0), or null
 */
public record EjectionSettings(VelocityModel model, double speedScale, double fixedSpeedMs,
        DirectionLaw directions, double coneHalfAngleDeg, double activeInboundAu, double activeOutboundAu,
        double productionExponent, double[] productionTableDays, double[] productionTableRelative) {

    /** Default model: Jones (1995). */
    public static final VelocityModel DEFAULT_MODEL = VelocityModel.JONES_1995;
    /** Default speed of the fixed model, m/s (typical Halley-type ejection speed at 1 au; common practice). */
    public static final double DEFAULT_FIXED_SPEED_M_S = 20.0;
    /** Default direction law: the sunlit hemisphere. */
    public static final DirectionLaw DEFAULT_DIRECTIONS = DirectionLaw.SUNLIT;
    /** Default cone half-angle, degrees. */
    public static final double DEFAULT_CONE_HALF_ANGLE_DEG = 45.0;
    /** Default activity limit, au: water-ice sublimation becomes weak beyond ~3 au (common practice). */
    public static final double DEFAULT_ACTIVE_AU = 3.0;
    /** Default production exponent: insolation, Q ∝ r^−2 (common practice). */
    public static final double DEFAULT_PRODUCTION_EXPONENT = 2.0;

    /** @return true when a production table replaces the r^−n law */
    public boolean hasProductionTable() {
        return productionTableDays != null;
    }
}
