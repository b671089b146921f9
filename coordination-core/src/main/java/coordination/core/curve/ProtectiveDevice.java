package coordination.core.curve;

import java.io.Serializable;
import java.util.Optional;

/**
 * A protective device seen through its time-current band: the minimum curve (fastest: a fuse's
 * melting time, a relay's operating time, a breaker's lower tolerance) and the maximum curve
 * (slowest: total clearing time, upper tolerance). Cable checks use the maximum curve; an upstream
 * device in a grading check uses its minimum curve.
 *
 * <p>Implementations are immutable and safe to share between threads.
 */
public interface ProtectiveDevice extends Serializable {

    /** @return the device's identifier, unique in a study */
    String id();

    /** @return the kind of device */
    DeviceKind kind();

    /** @return the fastest operating curve, never above {@link #maximumCurve()} */
    TimeCurrentCurve minimumCurve();

    /** @return the slowest, total-clearing curve */
    TimeCurrentCurve maximumCurve();

    /**
     * The slow edge of the device's operating time, the curve a coordination time interval between
     * relays is measured from: for a relay, its operating time without the breaker's interrupting
     * time (IEEE 242 practice); for fuses and breakers, their total clearing time.
     *
     * @return the curve, never below {@link #minimumCurve()}
     */
    default TimeCurrentCurve slowestOperatingCurve() {
        return maximumCurve();
    }

    /**
     * The total let-through energy the device's maker states, against prospective current: used
     * for cable checks where the device limits the current (clearing within 0.1 s, or beyond its
     * digitised curve) from {@link #letThroughFromAmps()} up.
     *
     * @return the energy, or empty if none is stated
     */
    default Optional<LetThroughEnergy> letThrough() {
        return Optional.empty();
    }

    /** @return the lowest prospective current, in amperes, at which {@link #letThrough()} applies */
    default double letThroughFromAmps() {
        return 0.0;
    }

    /**
     * The pre-arcing energy a fuse's maker states, against prospective current: what an upstream
     * fuse withstands without melting in the current-limiting region.
     *
     * @return the energy, or empty if none is stated
     */
    default Optional<LetThroughEnergy> preArcing() {
        return Optional.empty();
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
        return new BandDevice(id(), kind(), minimumCurve().scaledCurrent(factor), maximumCurve().scaledCurrent(factor),
                slowestOperatingCurve().scaledCurrent(factor), letThrough().map(e -> e.scaled(factor)),
                letThroughFromAmps() * factor, preArcing().map(e -> e.scaled(factor)), this);
    }
}
