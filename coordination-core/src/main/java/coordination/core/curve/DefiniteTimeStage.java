package coordination.core.curve;

import coordination.core.internal.Checks;

/**
 * A definite-time stage: it operates after a fixed delay at and above its pickup, and not below.
 * An instantaneous stage is a definite-time stage with no intended delay.
 *
 * @param pickupAmps pickup current in amperes, above 0
 * @param delaySeconds operating time in seconds, 0 or more
 * @param instantaneous whether this is an instantaneous stage (for labels only)
 */
public record DefiniteTimeStage(double pickupAmps, double delaySeconds, boolean instantaneous)
        implements TimeCurrentCurve {

    /**
     * Validates the settings.
     *
     * @throws IllegalArgumentException if the pickup is not above 0 or the delay is negative
     */
    public DefiniteTimeStage {
        Checks.positive(name(instantaneous) + ": pickup", pickupAmps, "A");
        Checks.nonNegative(name(instantaneous) + ": delay", delaySeconds, "s");
    }

    /**
     * A definite-time stage.
     *
     * @param pickupAmps pickup in amperes, above 0
     * @param delaySeconds delay in seconds, 0 or more
     * @return the stage
     */
    public static DefiniteTimeStage definiteTime(double pickupAmps, double delaySeconds) {
        return new DefiniteTimeStage(pickupAmps, delaySeconds, false);
    }

    /**
     * An instantaneous stage with its own operating time (often a cycle or less).
     *
     * @param pickupAmps pickup in amperes, above 0
     * @param operateSeconds the stage's own operating time in seconds, 0 or more
     * @return the stage
     */
    public static DefiniteTimeStage instantaneous(double pickupAmps, double operateSeconds) {
        return new DefiniteTimeStage(pickupAmps, operateSeconds, true);
    }

    @Override
    public double seconds(double amps) {
        Curves.checkCurrent(amps);
        return amps >= pickupAmps ? delaySeconds : Double.POSITIVE_INFINITY;
    }

    @Override
    public double[] breakpointsAmps() {
        return new double[] {pickupAmps};
    }

    private static String name(boolean instantaneous) {
        return instantaneous ? "instantaneous stage" : "definite-time stage";
    }

    @Override
    public String toString() {
        return name(instantaneous) + " Ip=" + Checks.format(pickupAmps) + " A t=" + Checks.format(delaySeconds) + " s";
    }
}
