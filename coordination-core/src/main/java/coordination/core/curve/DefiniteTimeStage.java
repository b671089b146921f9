package coordination.core.curve;

import coordination.core.internal.Checks;

/**
 * A definite-time stage: it operates after a fixed delay at and above its pickup, and not below.
 * An instantaneous stage is a definite-time stage with no intended delay; it still takes its own
 * operating time, which the study may state. Where it is not stated, the stage operates somewhere
 * in {@link #ASSUMED_INSTANTANEOUS_MIN_SECONDS} to {@link #ASSUMED_INSTANTANEOUS_MAX_SECONDS}: its
 * slow edge (and {@link #seconds}) takes the upper end, its fast edge the lower.
 *
 * @param pickupAmps pickup current in amperes, above 0
 * @param delaySeconds operating time in seconds, 0 or more; the slowest where a band is assumed
 * @param fastestDelaySeconds the fastest operating time in seconds, at most {@code delaySeconds};
 *     equal to it when the time is stated
 * @param instantaneous whether this is an instantaneous stage (for labels only)
 */
public record DefiniteTimeStage(double pickupAmps, double delaySeconds, double fastestDelaySeconds,
        boolean instantaneous) implements RelayStage {

    /** Fastest own operating time of an instantaneous relay element, 20 ms (common practice, from memory). */
    public static final double ASSUMED_INSTANTANEOUS_MIN_SECONDS = 0.02;
    /** Slowest own operating time of an instantaneous relay element, 40 ms (common practice, from memory). */
    public static final double ASSUMED_INSTANTANEOUS_MAX_SECONDS = 0.04;

    /**
     * Validates the settings.
     *
     * @param pickupAmps pickup current in amperes, above 0
     * @param delaySeconds operating time in seconds, 0 or more; the slowest where a band is assumed
     * @param fastestDelaySeconds the fastest operating time in seconds, at most {@code delaySeconds}; equal to it when
     *     the time is stated
     * @param instantaneous whether this is an instantaneous stage (for labels only)
     * @throws IllegalArgumentException if the pickup is not above 0, a delay is negative, or the
     *     fastest delay exceeds the delay
     */
    public DefiniteTimeStage {
        Checks.positive(name(instantaneous) + ": pickup", pickupAmps, "A");
        Checks.nonNegative(name(instantaneous) + ": delay", delaySeconds, "s");
        Checks.inRange(name(instantaneous) + ": fastest delay", fastestDelaySeconds, 0, delaySeconds, "s");
    }

    /**
     * A definite-time stage.
     *
     * @param pickupAmps pickup in amperes, above 0
     * @param delaySeconds delay in seconds, 0 or more
     * @return the stage
     */
    public static DefiniteTimeStage definiteTime(double pickupAmps, double delaySeconds) {
        return new DefiniteTimeStage(pickupAmps, delaySeconds, delaySeconds, false);
    }

    /**
     * An instantaneous stage with its own, stated operating time (often a cycle or less).
     *
     * @param pickupAmps pickup in amperes, above 0
     * @param operateSeconds the stage's own operating time in seconds, 0 or more
     * @return the stage
     */
    public static DefiniteTimeStage instantaneous(double pickupAmps, double operateSeconds) {
        return new DefiniteTimeStage(pickupAmps, operateSeconds, operateSeconds, true);
    }

    /**
     * An instantaneous stage whose operating time is not stated: a band from 20 ms to 40 ms.
     *
     * @param pickupAmps pickup in amperes, above 0
     * @return the stage
     */
    public static DefiniteTimeStage instantaneousTimeAssumed(double pickupAmps) {
        return new DefiniteTimeStage(pickupAmps, ASSUMED_INSTANTANEOUS_MAX_SECONDS, ASSUMED_INSTANTANEOUS_MIN_SECONDS,
                true);
    }

    /** @return whether the operating time is a band assumed in place of a stated time */
    public boolean timeAssumed() {
        return fastestDelaySeconds != delaySeconds;
    }

    @Override
    public double seconds(double amps) {
        Curves.checkCurrent(amps);
        return amps >= pickupAmps ? delaySeconds : Double.POSITIVE_INFINITY;
    }

    /** Flat where it operates; a stretch with the pickup inside it holds a step. */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        return fromAmps >= pickupAmps || toAmps < pickupAmps ? 0.0 : Double.POSITIVE_INFINITY;
    }

    /** Flat where it operates; it operates nowhere below its pickup. */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        return toAmps < pickupAmps ? Double.POSITIVE_INFINITY : 0.0;
    }

    @Override
    public TimeCurrentCurve edge(Edge edge, RelayTolerance tolerance) {
        double pickup = tolerance.pickupAmps(pickupAmps, edge);
        double t;
        if (timeAssumed()) {
            // the assumed band already spans the element's spread of times
            t = edge == Edge.FAST ? fastestDelaySeconds : delaySeconds;
        } else {
            t = tolerance.seconds(delaySeconds, edge);
        }
        return new DefiniteTimeStage(pickup, t, t, instantaneous);
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
