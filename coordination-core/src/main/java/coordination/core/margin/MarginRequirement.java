package coordination.core.margin;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * The margin a cable check asks for between the device's clearing time and the cable's damage
 * time: either an absolute time margin or a ratio (a vertical distance on the log-log chart).
 */
public sealed interface MarginRequirement extends Serializable {

    /**
     * Whether a computed minimum margin meets this requirement.
     *
     * @param minMarginSeconds minimum of (t_cable - t_device) in seconds
     * @param minRatio minimum of t_cable / t_device
     * @return true if it meets it
     */
    boolean isMetBy(double minMarginSeconds, double minRatio);

    /**
     * A time margin: {@code t_cable - t_device >= seconds} everywhere.
     *
     * @param seconds the margin in seconds, 0 or more
     * @return the requirement
     */
    static MarginRequirement seconds(double seconds) {
        return new Seconds(seconds);
    }

    /**
     * A ratio margin: {@code t_cable / t_device >= ratio} everywhere.
     *
     * @param ratio the ratio, 1 or more
     * @return the requirement
     */
    static MarginRequirement ratio(double ratio) {
        return new Ratio(ratio);
    }

    /**
     * An absolute margin in seconds.
     *
     * @param seconds required margin in seconds, 0 or more
     */
    record Seconds(double seconds) implements MarginRequirement {
        /**
         * Validates the margin.
         *
         * @param seconds required margin in seconds, 0 or more
         * @throws IllegalArgumentException if the margin is negative
         */
        public Seconds {
            Checks.nonNegative("required margin", seconds, "s");
        }

        @Override
        public boolean isMetBy(double minMarginSeconds, double minRatio) {
            return minMarginSeconds >= seconds;
        }

        @Override
        public String toString() {
            return Checks.format(seconds) + " s";
        }
    }

    /**
     * A margin as a ratio of times.
     *
     * @param ratio required ratio, 1 or more
     */
    record Ratio(double ratio) implements MarginRequirement {
        /**
         * Validates the ratio.
         *
         * @param ratio required ratio, 1 or more
         * @throws IllegalArgumentException if the ratio is below 1
         */
        public Ratio {
            Checks.inRange("required margin ratio", ratio, 1.0, 1e6, "");
        }

        @Override
        public boolean isMetBy(double minMarginSeconds, double minRatio) {
            return minRatio >= ratio;
        }

        @Override
        public String toString() {
            return "ratio " + Checks.format(ratio);
        }
    }
}
