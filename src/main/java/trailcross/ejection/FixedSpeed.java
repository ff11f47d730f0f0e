package trailcross.ejection;

/**
 * One ejection speed for every meteoroid, whatever its size and distance: for studies of how a trail's
 * structure depends on the speed alone.
 *
 * @param speedMs the speed, m/s
 */
public record FixedSpeed(double speedMs) implements EjectionSpeedModel {

    @Override
    public double speedMs(double rAu, double grainRadiusM) {
        return speedMs;
    }
}
