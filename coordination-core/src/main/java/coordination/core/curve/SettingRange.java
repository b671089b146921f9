package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * The values a relay setting can take: from its smallest to its largest, in steps.
 *
 * @param min smallest setting, a finite number above 0
 * @param max largest setting, at or above {@code min}
 * @param step the setting's resolution, a finite number above 0: settings are whole multiples of it
 */
public record SettingRange(double min, double max, double step) implements Serializable {

    /**
     * Validates the range.
     *
     * @param min smallest setting, a finite number above 0
     * @param max largest setting, at or above {@code min}
     * @param step the setting's resolution, a finite number above 0: settings are whole multiples of it
     * @throws IllegalArgumentException if an end or the step is not a positive finite number, or max is below min
     */
    public SettingRange {
        Checks.positive("setting range: smallest", min, "");
        Checks.positive("setting range: largest", max, "");
        Checks.positive("setting range: step", step, "");
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
        return contains(value) ? this : new SettingRange(Math.min(min, value), Math.max(max, value), step);
    }

    /**
     * The largest setting the relay can take at or below a value: a largest allowed value rounded
     * down, so that the setting keeps the property that bounded it.
     *
     * @param value a bound
     * @return a whole number of steps, within the range, or NaN if the bound lies below the range
     */
    public double atOrBelow(double value) {
        if (value < min * (1 - ROUNDING)) {
            return Double.NaN;
        }
        return Math.max(min, Math.min(max, snap(Math.floor(value / step * (1 + ROUNDING)))));
    }

    /**
     * The smallest setting the relay can take at or above a value: a smallest allowed value
     * rounded up.
     *
     * @param value a bound
     * @return a whole number of steps, within the range, or NaN if the bound lies above the range
     */
    public double atOrAbove(double value) {
        if (value > max * (1 + ROUNDING)) {
            return Double.NaN;
        }
        return Math.min(max, Math.max(min, snap(Math.ceil(value / step * (1 - ROUNDING)))));
    }

    /** Relative slack for a bound that sits on a step within rounding. */
    private static final double ROUNDING = 1e-9;

    // a whole number of steps, written as the decimal the step is (0.07, not 0.07000000000000001)
    private double snap(double steps) {
        return java.math.BigDecimal.valueOf(step).multiply(java.math.BigDecimal.valueOf((long) steps)).doubleValue();
    }

    @Override
    public String toString() {
        return Checks.format(min) + " to " + Checks.format(max) + " in steps of " + Checks.format(step);
    }
}
