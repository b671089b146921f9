package coordination.core.network;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A cable between two buses, with its impedance per kilometre.
 *
 * @param id the cable's id
 * @param from the sending bus
 * @param to the receiving bus
 * @param lengthM route length, m
 * @param rOhmPerKm conductor resistance at 20 °C per conductor, Ω/km
 * @param xOhmPerKm reactance per conductor, Ω/km
 * @param endTemperatureC conductor temperature at the end of the fault, for minimum currents, °C
 * @param parallel conductors in parallel per phase
 */
public record CableBranch(String id, String from, String to, double lengthM, double rOhmPerKm, double xOhmPerKm,
        double endTemperatureC, int parallel) implements Serializable {

    /** IEC 60909-0:2016, 10.3: R = [1 + α (θe − 20 °C)] R20 with α = 0.004 /K for copper and aluminium. */
    public static final double ALPHA_PER_K = 0.004;

    /**
     * Validates the branch.
     *
     * @param id the cable's id
     * @param from the sending bus
     * @param to the receiving bus
     * @param lengthM route length, m
     * @param rOhmPerKm conductor resistance at 20 °C per conductor, Ω/km
     * @param xOhmPerKm reactance per conductor, Ω/km
     * @param endTemperatureC conductor temperature at the end of the fault, for minimum currents, °C
     * @param parallel conductors in parallel per phase
     * @throws IllegalArgumentException if a value is missing or out of range
     */
    public CableBranch {
        Checks.given("cable: id", id);
        Checks.given("cable '" + id + "': from", from);
        Checks.given("cable '" + id + "': to", to);
        Checks.positive("cable '" + id + "': length_m", lengthM, " m");
        Checks.positive("cable '" + id + "': r_ohm_per_km", rOhmPerKm, " Ω/km");
        if (!(xOhmPerKm >= 0) || Double.isInfinite(xOhmPerKm)) {
            throw new IllegalArgumentException("cable '" + id + "': x_ohm_per_km is " + xOhmPerKm
                    + " - must be 0 or more");
        }
        if (!(endTemperatureC >= 20) || endTemperatureC > 1000) {
            throw new IllegalArgumentException("cable '" + id + "': end_temperature_c is " + endTemperatureC
                    + " - must be from 20 to 1000");
        }
        if (parallel < 1) {
            throw new IllegalArgumentException("cable '" + id + "': parallel is " + parallel + " - must be 1 or more");
        }
        if (from.equals(to)) {
            throw new IllegalArgumentException("cable '" + id + "': runs from bus '" + from + "' to itself");
        }
    }

    /**
     * The phase resistance, all conductors in parallel.
     *
     * @param temperatureC conductor temperature
     * @return Ω
     */
    public double resistanceOhm(double temperatureC) {
        return rOhmPerKm * lengthM / 1000 * (1 + ALPHA_PER_K * (temperatureC - 20)) / parallel;
    }

    /** @return the phase reactance, all conductors in parallel, Ω */
    public double reactanceOhm() {
        return xOhmPerKm * lengthM / 1000 / parallel;
    }
}
