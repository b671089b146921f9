package coordination.core.design;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A current a relay must carry without operating for a time: a motor start, a transformer's
 * inrush. The relay's fastest operating time at that current must be at least the time.
 *
 * @param currentAmps current in primary amperes at the relay's voltage, above 0
 * @param seconds how long, in seconds, above 0
 */
public record NoTrip(double currentAmps, double seconds) implements Serializable {
    /**
     * Validates the point.
     *
     * @param currentAmps current in primary amperes at the relay's voltage, above 0
     * @param seconds how long, in seconds, above 0
     * @throws IllegalArgumentException if a value is not positive and finite
     */
    public NoTrip {
        Checks.positive("no-trip point: current", currentAmps, "A");
        Checks.positive("no-trip point: time", seconds, "s");
    }

    @Override
    public String toString() {
        return "no trip at " + Checks.format(currentAmps) + " A for " + Checks.format(seconds) + " s";
    }
}
