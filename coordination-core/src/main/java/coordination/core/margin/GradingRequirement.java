package coordination.core.margin;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * What a grading check asks of two devices in series: a coordination time interval (CTI), a
 * rating ratio between fuses (1.6:1 is a common rule of thumb for gG fuses of one series), or that
 * the tolerance bands of two breakers do not overlap.
 *
 * <p>A CTI between two relays is measured between their operating times, as IEEE Std 242 and IEC
 * practice do: the 0.3 s (electromechanical) or 0.2 s (static and numerical relays) of IEEE 242
 * (from memory) already contains the downstream breaker's interrupting time. So the upstream
 * relay's fastest operating time is compared with the downstream relay's slowest operating time.
 * With any fuse or breaker in the pair, the interval is measured to the downstream device's total
 * clearing time. {@link #intervalBetweenClearingTimes(double)} asks the stricter form explicitly.
 */
public sealed interface GradingRequirement extends Serializable {

    /**
     * A coordination time interval: the upstream minimum curve at least this far above the
     * downstream maximum curve everywhere.
     *
     * @param seconds interval in seconds, 0 or more
     * @return the requirement
     */
    static GradingRequirement intervalSeconds(double seconds) {
        return new Interval(seconds, false);
    }

    /**
     * A coordination time interval measured to the downstream device's clearing time even between
     * relays: the stricter form, where the interval need not contain the breaker's time.
     *
     * @param seconds interval in seconds, 0 or more
     * @return the requirement
     */
    static GradingRequirement intervalBetweenClearingTimes(double seconds) {
        return new Interval(seconds, true);
    }

    /**
     * A rating ratio between fuses, with the curves also required not to overlap.
     *
     * @param ratio upstream rating over downstream rating, 1 or more
     * @return the requirement
     */
    static GradingRequirement ratingRatio(double ratio) {
        return new RatingRatio(ratio);
    }

    /** @return the requirement that the bands do not overlap (any positive interval) */
    static GradingRequirement noOverlap() {
        return new NoOverlap();
    }

    /**
     * A coordination time interval.
     *
     * @param seconds required interval in seconds, 0 or more
     * @param toClearingTime whether a downstream relay is taken at its clearing time rather than
     *     its operating time
     */
    record Interval(double seconds, boolean toClearingTime) implements GradingRequirement {
        /**
         * Validates the interval.
         *
         * @param seconds required interval in seconds, 0 or more
         * @param toClearingTime whether a downstream relay is taken at its clearing time rather than
         *     its operating time
         * @throws IllegalArgumentException if negative
         */
        public Interval {
            Checks.nonNegative("required interval", seconds, "s");
        }

        @Override
        public String toString() {
            return Checks.format(seconds) + " s" + (toClearingTime ? " to the clearing time" : "");
        }
    }

    /**
     * A rating ratio.
     *
     * @param ratio required ratio, 1 or more
     */
    record RatingRatio(double ratio) implements GradingRequirement {
        /**
         * Validates the ratio.
         *
         * @param ratio required ratio, 1 or more
         * @throws IllegalArgumentException if below 1
         */
        public RatingRatio {
            Checks.inRange("required rating ratio", ratio, 1.0, 1000.0, "");
        }

        @Override
        public String toString() {
            return "rating ratio " + Checks.format(ratio);
        }
    }

    /** No overlap of the bands. */
    record NoOverlap() implements GradingRequirement {
        @Override
        public String toString() {
            return "no overlap";
        }
    }
}
