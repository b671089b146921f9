package coordination.core.margin;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;

/**
 * Whether a protective device clears every fault in a current range before a cable reaches its
 * short-circuit temperature, and by how much: the minimum time margin, the minimum time ratio, the
 * currents where they occur, and every crossing of the two curves, solved exactly.
 *
 * <p>The device's maximum (slowest, clearing) curve is used. The range is split at every
 * breakpoint of the device curve and at the currents where its clearing time passes 0.1 s and 5 s,
 * the edges of the adiabatic window. On each segment the curves are smooth, and the extremes and
 * roots are solved with Brent's methods on the log-current axis (Apache Commons Math). At a step
 * of the device curve both one-sided limits are compared, so a minimum at a step is reported at the
 * step with the side on which it occurs.
 *
 * <p>The comparison is of heating: with a {@link DcOffset} the device's time is increased at every
 * duration to the thermally equivalent {@code (1 + m) t} of IEC 60909-0, the heating of the decaying
 * DC component. Below 0.1 s it is the comparison of let-through energy, I² t_device against k²S².
 * Where the device's maker states its let-through energy (a current-limiting fuse beyond its
 * digitised curve or wherever it clears within 0.1 s, an energy-limiting breaker above its
 * instantaneous multiple), that energy is compared with k²S² directly, without the DC-offset
 * factor, which the maker's figure already contains. Above 5 s the adiabatic limit is
 * conservative and reported as such; the non-adiabatic method credits heat loss only up to 5 s.
 *
 * <p>A {@link CableChecker} runs the same check again and again without allocating.
 */
public final class CableCheck {
    private final CableChecker checker;
    private final CableCheckResult result;

    /**
     * Runs the check.
     *
     * @param device the protective device; its maximum curve is checked
     * @param cable the cable
     * @param fromAmps lowest prospective fault current in amperes, above 0
     * @param toAmps highest prospective fault current in amperes, at or above {@code fromAmps}
     * @param requirement the margin asked for
     * @param dcOffset DC-offset heating, or null to leave it out
     * @throws IllegalArgumentException if the range is invalid
     */
    public CableCheck(ProtectiveDevice device, CableThermalLimit cable, double fromAmps, double toAmps,
            MarginRequirement requirement, DcOffset dcOffset) {
        this(device, cable, fromAmps, toAmps, requirement, dcOffset, false);
    }

    /**
     * As the public constructor; with {@code plain} every segment is scanned, every curve time
     * computed afresh and every segment searched for a window edge: the reference the tests hold
     * the shortcuts to.
     */
    CableCheck(ProtectiveDevice device, CableThermalLimit cable, double fromAmps, double toAmps,
            MarginRequirement requirement, DcOffset dcOffset, boolean plain) {
        this.checker = new CableChecker(plain);
        checker.run(device, cable, fromAmps, toAmps, requirement, dcOffset);
        this.result = checker.result();
    }

    /**
     * Runs a check without DC-offset heating.
     *
     * @param device the protective device
     * @param cable the cable
     * @param fromAmps lowest fault current in amperes
     * @param toAmps highest fault current in amperes
     * @param requirement the margin asked for
     * @return the result
     */
    public static CableCheckResult check(ProtectiveDevice device, CableThermalLimit cable, double fromAmps,
            double toAmps, MarginRequirement requirement) {
        return new CableCheck(device, cable, fromAmps, toAmps, requirement, null).result();
    }

    /** @return the result */
    public CableCheckResult result() {
        return result;
    }

    /** @return how many segments of a steady device time were taken from their ends, for tests */
    int steadySegments() {
        return checker.steadySegments();
    }

    /** @return how many segments were taken from their ends by the curve's slope bound, for tests */
    int shapedSegments() {
        return checker.shapedSegments();
    }

    /**
     * The device's clearing time from its curve.
     *
     * @param amps current in amperes
     * @return seconds, infinity where it does not clear, NaN where the curve has no value
     */
    public double curveSeconds(double amps) {
        return checker.curveSeconds(amps);
    }

    /**
     * Whether the maker's let-through energy decides the check at a current: it is stated there,
     * and the device limits the current (clears within 0.1 s, or lies beyond its digitised curve).
     *
     * @param amps current in amperes
     * @return true where the let-through energy is compared with k²S²
     */
    public boolean usesLetThrough(double amps) {
        return checker.usesLetThrough(amps);
    }

    /**
     * The device's clearing time, or where its let-through energy decides, the time a steady
     * current needs to let that energy through.
     *
     * @param amps current in amperes
     * @return seconds, infinity where it does not clear, NaN where it has no value
     */
    public double deviceSeconds(double amps) {
        return checker.deviceSeconds(amps);
    }

    /**
     * The device's thermally equivalent time: its clearing time times {@code (1 + m)} for the
     * DC-offset heating when one is given; the let-through time as it is.
     *
     * @param amps current in amperes
     * @return seconds
     */
    public double equivalentSeconds(double amps) {
        return checker.equivalentSeconds(amps);
    }
}
