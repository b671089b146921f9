package coordination.core.curve;

import coordination.core.internal.Checks;
import coordination.core.internal.RecordForm;
import java.io.Serial;
import java.util.Optional;

/**
 * A device given directly by its curves; used for a device referred to another voltage base,
 * which keeps the device it was referred from.
 *
 * @param id identifier
 * @param kind kind of device
 * @param minimumCurve fastest curve
 * @param maximumCurve slowest, total-clearing curve
 * @param slowestOperatingCurve slowest operating curve (a relay's, without its breaker)
 * @param letThrough stated total let-through energy, or empty
 * @param letThroughFromAmps lowest prospective current at which the let-through applies, amperes
 * @param preArcing stated pre-arcing energy, or empty
 * @param source the device as set, before referral
 */
public record BandDevice(String id, DeviceKind kind, TimeCurrentCurve minimumCurve, TimeCurrentCurve maximumCurve,
        TimeCurrentCurve slowestOperatingCurve, Optional<LetThroughEnergy> letThrough, double letThroughFromAmps,
        Optional<LetThroughEnergy> preArcing, ProtectiveDevice source) implements ProtectiveDevice {
    /** Optionals cannot be serialized: the record goes as its components. */
    @Serial
    private Object writeReplace() {
        return RecordForm.of(this);
    }

    /**
     * Validates that nothing is missing.
     *
     * @param id identifier
     * @param kind kind of device
     * @param minimumCurve fastest curve
     * @param maximumCurve slowest, total-clearing curve
     * @param slowestOperatingCurve slowest operating curve (a relay's, without its breaker)
     * @param letThrough stated total let-through energy, or empty
     * @param letThroughFromAmps lowest prospective current at which the let-through applies, amperes
     * @param preArcing stated pre-arcing energy, or empty
     * @param source the device as set, before referral
     * @throws IllegalArgumentException if a part is null or the let-through start is negative
     */
    public BandDevice {
        if (id == null || kind == null || minimumCurve == null || maximumCurve == null || slowestOperatingCurve == null
                || letThrough == null || preArcing == null || source == null) {
            throw new IllegalArgumentException("device: found a null part - id, kind, curves, energies and source must"
                    + " be given");
        }
        Checks.nonNegative("device '" + id + "': let-through start", letThroughFromAmps, "A");
    }
}
