package coordination.core.design;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.internal.Checks;
import coordination.core.internal.RecordForm;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.DcOffset;
import coordination.core.margin.MarginRequirement;
import java.io.Serial;
import java.io.Serializable;
import java.util.Optional;

/**
 * What a device must do for a cable, as its cable check states it: the cable, the range of fault
 * currents, the margin and the DC-offset heating. A design proposal is judged by the same check.
 *
 * @param cable the cable
 * @param fromAmps lowest prospective fault current in amperes
 * @param toAmps highest prospective fault current in amperes
 * @param requirement the margin
 * @param dcOffset the DC-offset heating, unless left out
 */
public record CableDuty(CableThermalLimit cable, double fromAmps, double toAmps, MarginRequirement requirement,
        Optional<DcOffset> dcOffset) implements Serializable {
    /** Optionals cannot be serialized: the record goes as its components. */
    @Serial
    private Object writeReplace() {
        return RecordForm.of(this);
    }

    /**
     * Validates the duty.
     *
     * @param cable the cable
     * @param fromAmps lowest prospective fault current in amperes
     * @param toAmps highest prospective fault current in amperes
     * @param requirement the margin
     * @param dcOffset the DC-offset heating, unless left out
     * @throws IllegalArgumentException if a part is missing or the range is invalid
     */
    public CableDuty {
        Checks.given("cable duty: cable", cable);
        Checks.given("cable duty: requirement", requirement);
        Checks.given("cable duty: DC offset", dcOffset);
        Checks.currentRange("cable duty", fromAmps, toAmps);
    }

    /**
     * Runs the cable check with a device.
     *
     * @param device the protecting device, currents at the cable's voltage
     * @return the result
     */
    public CableCheckResult check(ProtectiveDevice device) {
        return new CableCheck(device, cable, fromAmps, toAmps, requirement, dcOffset.orElse(null)).result();
    }

    /**
     * The same duty for another cable.
     *
     * @param other the cable
     * @return the duty
     */
    public CableDuty withCable(CableThermalLimit other) {
        return new CableDuty(other, fromAmps, toAmps, requirement, dcOffset);
    }
}
