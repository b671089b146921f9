package coordination.core.network;

import java.io.Serializable;

/**
 * The short-circuit currents at one point of the network, by IEC 60909-0.
 *
 * @param at the point: a bus id, or a cable's id with {@code :from} or {@code :to}
 * @param bus the bus the point lies on
 * @param ik3MaxAmps maximum initial symmetrical three-phase current I″k3 (c_max, conductors at 20 °C), A
 * @param ik3MinAmps minimum three-phase current (c_min, conductors at their end temperature), A
 * @param ik2MinAmps minimum phase-to-phase current, √3/2 of the minimum three-phase current, A
 * @param kappa the peak factor κ = 1.02 + 0.98 e^(−3R/X), with R/X at the point (maximum case)
 * @param ipAmps peak current ip = κ √2 I″k3 max, A
 * @param rOverX R/X of the maximum case's impedance at the point
 */
public record FaultLevel(String at, String bus, double ik3MaxAmps, double ik3MinAmps, double ik2MinAmps,
        double kappa, double ipAmps, double rOverX) implements Serializable {
}
