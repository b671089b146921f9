package coordination.core.curve;

import java.util.OptionalDouble;

/**
 * A device given directly by its two curves; used for devices referred to another voltage base.
 *
 * @param id identifier
 * @param kind kind of device
 * @param minimumCurve fastest curve
 * @param maximumCurve slowest curve
 * @param clearingI2tA2s stated let-through I²t in A²s above the digitised range, or empty
 */
public record BandDevice(String id, DeviceKind kind, TimeCurrentCurve minimumCurve, TimeCurrentCurve maximumCurve,
        OptionalDouble clearingI2tA2s) implements ProtectiveDevice {

    /**
     * Validates that nothing is missing.
     *
     * @throws IllegalArgumentException if a part is null
     */
    public BandDevice {
        if (id == null || kind == null || minimumCurve == null || maximumCurve == null || clearingI2tA2s == null) {
            throw new IllegalArgumentException("device: found a null part - id, kind and both curves must be given");
        }
    }
}
