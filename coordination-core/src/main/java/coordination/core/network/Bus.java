package coordination.core.network;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A bus: a node of the network at one nominal voltage, with the voltage factors of its faults.
 *
 * @param id the bus's id
 * @param voltageKv nominal voltage Un in kV
 * @param cMax voltage factor for maximum currents
 * @param cMin voltage factor for minimum currents
 */
public record Bus(String id, double voltageKv, double cMax, double cMin) implements Serializable {

    /**
     * Validates the bus.
     *
     * @param id the bus's id
     * @param voltageKv nominal voltage Un in kV
     * @param cMax voltage factor for maximum currents
     * @param cMin voltage factor for minimum currents
     * @throws IllegalArgumentException if a value is missing or out of range
     */
    public Bus {
        Checks.given("bus: id", id);
        Checks.positive("bus '" + id + "': voltage", voltageKv, " kV");
        Checks.positive("bus '" + id + "': c_max", cMax, "");
        Checks.positive("bus '" + id + "': c_min", cMin, "");
        if (cMin > cMax) {
            throw new IllegalArgumentException("bus '" + id + "': c_min " + cMin + " is above c_max " + cMax
                    + " - must be at most c_max");
        }
    }

    /**
     * A bus with the voltage factors of IEC 60909-0:2016, Table 1: up to 1 kV (systems with a
     * tolerance of +6 %) c_max 1.05 and c_min 0.95; above 1 kV c_max 1.10 and c_min 1.00.
     *
     * @param id the id
     * @param voltageKv nominal voltage in kV
     * @return the bus
     */
    public static Bus of(String id, double voltageKv) {
        return new Bus(id, voltageKv, defaultCMax(voltageKv), defaultCMin(voltageKv));
    }

    /**
     * @param voltageKv nominal voltage in kV
     * @return c_max of IEC 60909-0:2016, Table 1
     */
    public static double defaultCMax(double voltageKv) {
        return voltageKv <= 1.0 ? 1.05 : 1.10;
    }

    /**
     * @param voltageKv nominal voltage in kV
     * @return c_min of IEC 60909-0:2016, Table 1
     */
    public static double defaultCMin(double voltageKv) {
        return voltageKv <= 1.0 ? 0.95 : 1.00;
    }
}
