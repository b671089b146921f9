package coordination.core.margin;

import coordination.core.internal.Checks;

/**
 * What a grading check asks of two devices in series: a coordination time interval between
 * relays (0.2 s to 0.4 s is common practice), a rating ratio between fuses (1.6:1 is a common rule of
 * thumb), or that the tolerance bands of two breakers do not overlap.
 */
public sealed interface GradingRequirement {

    /**
     * A coordination time interval: the upstream minimum curve at least this far above the
     * downstream maximum curve everywhere.
     *
     * @param seconds interval in seconds, 0 or more
     * @return the requirement
     */
    static GradingRequirement intervalSeconds(double seconds) {
        return new Interval(seconds);
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
     */
    record Interval(double seconds) implements GradingRequirement {
        /** @throws IllegalArgumentException if negative */
        public Interval {
            Checks.nonNegative("required interval", seconds, "s");
        }

        @Override
        public String toString() {
            return Checks.format(seconds) + " s";
        }
    }

    /**
     * A rating ratio.
     *
     * @param ratio required ratio, 1 or more
     */
    record RatingRatio(double ratio) implements GradingRequirement {
        /** @throws IllegalArgumentException if below 1 */
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
