package coordination.core.design;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.internal.Checks;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.MarginRequirement;
import java.io.Serializable;

/**
 * The smallest conductor cross-section a device protects over a fault range with a required
 * margin. The cable's damage time grows with its cross-section (as S² for the adiabatic limit), so
 * the check's margin rises with S and the smallest passing S is found by bisection to 1e-10
 * relative. PVC's short-circuit limit falls from 160 °C to 140 °C above 300 mm², so the search is
 * made on each side of 300 mm² with its own limit.
 */
public final class MinimumConductor {
    private static final double MIN_MM2 = 0.01;
    private static final double MAX_MM2 = 5000;

    private MinimumConductor() {
    }

    /**
     * The result.
     *
     * @param sizeMm2 smallest cross-section per conductor in mm², NaN if none up to 5000 mm² passes
     * @param iecSizeMm2 the next IEC 60228 size at or above it, or NaN
     * @param awgOrKcmil the next AWG or kcmil size at or above it, or null
     * @param check the check at the smallest size, or at 5000 mm² if none passes
     * @param reason why no size passes, or null
     */
    public record Result(double sizeMm2, double iecSizeMm2, String awgOrKcmil, CableCheckResult check,
            String reason) implements Serializable {
        /** @return whether a size was found */
        public boolean found() {
            return !Double.isNaN(sizeMm2);
        }
    }

    /**
     * Solves for the smallest conductor.
     *
     * @param device the protecting device
     * @param template a cable giving the id, material, insulation, parallel count, method and, if it
     *     was given explicitly, the temperatures; its size is ignored
     * @param defaultTemperatures whether the temperatures follow the insulation's defaults for each
     *     size (true) or stay as in the template (false)
     * @param fromAmps lowest fault current in amperes
     * @param toAmps highest fault current in amperes
     * @param requirement the margin
     * @return the result
     */
    public static Result solve(ProtectiveDevice device, CableThermalLimit template, boolean defaultTemperatures,
            double fromAmps, double toAmps, MarginRequirement requirement) {
        return solve(device, new CableDuty(template, fromAmps, toAmps, requirement, java.util.Optional.empty()),
                defaultTemperatures);
    }

    /**
     * Solves for the smallest conductor under a cable check's duty, DC-offset heating included.
     *
     * @param device the protecting device
     * @param duty the check: its cable gives the id, material, insulation, parallel count, method and,
     *     if stated, the temperatures; its size is ignored
     * @param defaultTemperatures whether the final temperature follows the insulation's default for each size
     * @return the result
     */
    public static Result solve(ProtectiveDevice device, CableDuty duty, boolean defaultTemperatures) {
        CableThermalLimit template = duty.cable();
        double split = Insulation.PVC_LARGE_SECTION_MM2;
        double[][] regimes = defaultTemperatures ? new double[][] {{MIN_MM2, split}, {split * (1 + 1e-12), MAX_MM2}}
                : new double[][] {{MIN_MM2, MAX_MM2}};
        CableCheckResult last = null;
        for (double[] regime : regimes) {
            CableCheckResult atTop = check(device, duty, defaultTemperatures, regime[1]);
            last = atTop;
            if (!atTop.pass()) {
                continue;
            }
            double s;
            if (check(device, duty, defaultTemperatures, regime[0]).pass()) {
                s = regime[0];
            } else {
                s = Boundary.solve(x -> check(device, duty, defaultTemperatures, x).pass(), regime[1], regime[0]);
            }
            double mm2 = s;
            CableCheckResult at = check(device, duty, defaultTemperatures, mm2);
            return new Result(mm2, ConductorSizes.nextIecSizeMm2(mm2), ConductorSizes.nextAwgOrKcmil(mm2), at, null);
        }
        String why = !Double.isNaN(last.notClearedFromAmps()) || !Double.isNaN(last.undefinedFromAmps())
                ? last.reason() + " - no conductor size changes that"
                : "even " + Checks.format(MAX_MM2) + " mm² per conductor fails: " + last.reason();
        return new Result(Double.NaN, Double.NaN, null, last, why);
    }

    static CableCheckResult check(ProtectiveDevice device, CableThermalLimit template, boolean defaults, double mm2,
            double fromAmps, double toAmps, MarginRequirement requirement) {
        return CableCheck.check(device, sized(template, defaults, mm2), fromAmps, toAmps, requirement);
    }

    private static CableCheckResult check(ProtectiveDevice device, CableDuty duty, boolean defaults, double mm2) {
        return duty.withCable(sized(duty.cable(), defaults, mm2)).check(device);
    }

    static CableThermalLimit sized(CableThermalLimit t, boolean defaults, double mm2) {
        // ICEA's short-circuit temperatures do not depend on the size
        if (!defaults || t.method() == ThermalMethod.ICEA) {
            return t.withSizeMm2(mm2);
        }
        Insulation ins = t.insulation();
        ConductorMaterial m = t.material();
        ThermalMethod method = t.method();
        return new CableThermalLimit(t.id(), m, ins, mm2, t.parallel(), t.initialCelsius(),
                ins.shortCircuitCelsius(mm2), method);
    }

    /**
     * The closed-form size at one current: the conductor that the adiabatic limit lets carry a
     * current for a time, {@code S = I √t / k} (IEC 60364-4-43, 434.5.2, rearranged), divided over
     * the parallel conductors.
     *
     * @param amps current in amperes
     * @param seconds clearing time in seconds
     * @param k the adiabatic factor
     * @param parallel conductors in parallel
     * @return cross-section per conductor in mm²
     */
    public static double closedForm(double amps, double seconds, double k, int parallel) {
        return amps * Math.sqrt(seconds) / k / parallel;
    }
}
