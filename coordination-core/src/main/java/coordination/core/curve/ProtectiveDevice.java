package coordination.core.curve;

import java.util.OptionalDouble;

/**
 * A protective device seen through its time-current band: the minimum curve (fastest: a fuse's
 * melting time, a relay's operating time, a breaker's lower tolerance) and the maximum curve
 * (slowest: total clearing time, upper tolerance). Cable checks use the maximum curve; an upstream
 * device in a grading check uses its minimum curve.
 *
 * <p>Implementations are immutable and safe to share between threads.
 */
public interface ProtectiveDevice {

    /** @return the device's identifier, unique in a study */
    String id();

    /** @return the kind of device */
    DeviceKind kind();

    /** @return the fastest operating curve, never above {@link #maximumCurve()} */
    TimeCurrentCurve minimumCurve();

    /** @return the slowest, total-clearing curve */
    TimeCurrentCurve maximumCurve();

    /**
     * Total let-through energy the device's maker states for currents above its digitised
     * clearing curve, where the curve has no value (current-limiting fuses).
     *
     * @return I²t in A²s, or empty if none is stated
     */
    default OptionalDouble clearingI2tA2s() {
        return OptionalDouble.empty();
    }

    /**
     * The device as seen from another voltage level: currents are multiplied by
     * {@code factor = deviceVoltage / referenceVoltage}, so that a transformer primary device and
     * a secondary cable are compared on one base.
     *
     * @param factor positive multiplier of the current axis
     * @return the referred device
     * @throws IllegalArgumentException if the factor is not a positive finite number
     */
    default ProtectiveDevice referredBy(double factor) {
        if (factor == 1.0) {
            return this;
        }
        OptionalDouble i2t = clearingI2tA2s();
        OptionalDouble scaled = i2t.isPresent() ? OptionalDouble.of(i2t.getAsDouble() * factor * factor) : i2t;
        return new BandDevice(id(), kind(), minimumCurve().scaledCurrent(factor), maximumCurve().scaledCurrent(factor),
                scaled);
    }
}
