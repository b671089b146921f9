package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * The accuracy of a relay as IEC 60255-151:2009 states it (clauses 6 and 7, from memory): the
 * operate time within a fraction of its theoretical value or a fixed time, whichever is greater,
 * and the start (pickup) value within a fraction of its setting. The relay's fast edge takes the
 * lower limits, its slow edge the upper ones.
 *
 * @param timeFraction the operate-time error as a fraction of the theoretical time, from 0 to below 1
 * @param timeMinSeconds the smallest operate-time error in seconds, 0 or more
 * @param pickupFraction the start-value error as a fraction of the setting, from 0 to below 1
 */
public record RelayTolerance(double timeFraction, double timeMinSeconds, double pickupFraction)
        implements Serializable {

    /** No stated tolerance: the nominal curve on both edges. */
    public static final RelayTolerance NONE = new RelayTolerance(0, 0, 0);

    /**
     * Validates the tolerance.
     *
     * @param timeFraction the operate-time error as a fraction of the theoretical time, from 0 to below 1
     * @param timeMinSeconds the smallest operate-time error in seconds, 0 or more
     * @param pickupFraction the start-value error as a fraction of the setting, from 0 to below 1
     * @throws IllegalArgumentException if a fraction lies outside [0, 0.5] or the time is negative
     */
    public RelayTolerance {
        Checks.inRange("relay tolerance: time fraction", timeFraction, 0, 0.5, "");
        Checks.nonNegative("relay tolerance: smallest time error", timeMinSeconds, "s");
        Checks.inRange("relay tolerance: pickup fraction", pickupFraction, 0, 0.5, "");
    }

    /** @return whether the relay's tolerance is unknown (taken as none) */
    public boolean isNone() {
        // the record's equals, written out: its first call is bootstrapped, which a cold run pays for
        return Double.compare(timeFraction, 0) == 0 && Double.compare(timeMinSeconds, 0) == 0
                && Double.compare(pickupFraction, 0) == 0;
    }

    /**
     * The time error at a nominal time, with its sign for an edge.
     *
     * @param seconds the nominal time in seconds
     * @param edge the edge
     * @return the time on that edge in seconds, never below 0
     */
    public double seconds(double seconds, Edge edge) {
        if (Double.isInfinite(seconds)) {
            return seconds;
        }
        double error = Math.max(seconds * timeFraction, timeMinSeconds);
        return edge == Edge.FAST ? Math.max(0, seconds - error) : seconds + error;
    }

    /**
     * The start value on an edge: a relay may start below its setting (fast) or above it (slow).
     *
     * @param pickupAmps the setting in amperes
     * @param edge the edge
     * @return the pickup on that edge in amperes
     */
    public double pickupAmps(double pickupAmps, Edge edge) {
        return pickupAmps * (edge == Edge.FAST ? 1 - pickupFraction : 1 + pickupFraction);
    }
}
