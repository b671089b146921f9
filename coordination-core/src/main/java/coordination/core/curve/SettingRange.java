package coordination.core.curve;

import coordination.core.internal.Checks;

/**
 * The values a relay setting can take, from its smallest to its largest.
 *
 * @param min smallest setting, a finite number above 0
 * @param max largest setting, at or above {@code min}
 */
public record SettingRange(double min, double max) {

    /**
     * Validates the range.
     *
     * @throws IllegalArgumentException if an end is not a positive finite number or max is below min
     */
    public SettingRange {
        Checks.positive("setting range: smallest", min, "");
        Checks.positive("setting range: largest", max, "");
        if (max < min) {
            throw new IllegalArgumentException("setting range: largest " + Checks.format(max)
                    + " is below the smallest " + Checks.format(min) + " - must be at or above it");
        }
    }

    /**
     * Whether a setting lies in the range.
     *
     * @param value the setting
     * @return true from min to max inclusive
     */
    public boolean contains(double value) {
        return value >= min && value <= max;
    }

    /**
     * The smallest range that holds this one and a value: a default range widened to a setting
     * that the relay evidently accepts.
     *
     * @param value a setting, above 0
     * @return the widened range
     */
    public SettingRange including(double value) {
        return contains(value) ? this : new SettingRange(Math.min(min, value), Math.max(max, value));
    }

    @Override
    public String toString() {
        return Checks.format(min) + " to " + Checks.format(max);
    }
}
