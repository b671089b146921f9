package coordination.core.margin;

import coordination.core.curve.ProtectiveDevice;

/**
 * Whether two devices in series grade over a current range: the downstream device must clear
 * before the upstream one starts to operate, by the required interval. The interval is the upstream
 * minimum (fastest) curve minus the downstream maximum (clearing) curve, or between two relays
 * the downstream relay's slowest operating time (see {@link GradingRequirement}), solved exactly
 * segment by segment between the breakpoints of both curves, as in {@link CableCheck}.
 *
 * <p>Where a curve has no value (above a fuse's digitised points) and the upstream device is a
 * fuse, the pair is graded by energy, the principle of IEC 60269-1 for selectivity in the
 * current-limiting region: the upstream fuse's pre-arcing I²t (its stated points, or I² times its
 * melting time where that is defined) must be at least the downstream device's total let-through
 * I²t (its stated points, or I² times its clearing time). The minimum of their ratio is solved on
 * each segment as the interval is.
 *
 * <p>A {@link GradingChecker} runs the same check again and again without allocating.
 */
public final class GradingCheck {
    private final GradingChecker checker;
    private final GradingCheckResult result;

    /**
     * Runs the check.
     *
     * @param upstream the device nearer the source; its minimum curve is used
     * @param downstream the device nearer the load; its maximum curve is used
     * @param fromAmps lowest current of the range in amperes, above 0
     * @param toAmps highest current in amperes, at or above {@code fromAmps}
     * @param requirement what is asked
     * @throws IllegalArgumentException if the range is invalid
     */
    public GradingCheck(ProtectiveDevice upstream, ProtectiveDevice downstream, double fromAmps, double toAmps,
            GradingRequirement requirement) {
        this(upstream, downstream, fromAmps, toAmps, requirement, false);
    }

    /**
     * As the public constructor; with {@code plain} every segment is scanned: the reference the
     * tests hold the shortcut to.
     */
    GradingCheck(ProtectiveDevice upstream, ProtectiveDevice downstream, double fromAmps, double toAmps,
            GradingRequirement requirement, boolean plain) {
        this.checker = new GradingChecker(plain);
        checker.run(upstream, downstream, fromAmps, toAmps, requirement);
        this.result = checker.result();
    }

    /**
     * Runs a check.
     *
     * @param upstream the device nearer the source
     * @param downstream the device nearer the load
     * @param fromAmps lowest current in amperes
     * @param toAmps highest current in amperes
     * @param requirement what is asked
     * @return the result
     */
    public static GradingCheckResult check(ProtectiveDevice upstream, ProtectiveDevice downstream, double fromAmps,
            double toAmps, GradingRequirement requirement) {
        return new GradingCheck(upstream, downstream, fromAmps, toAmps, requirement).result();
    }

    /** @return the result */
    public GradingCheckResult result() {
        return result;
    }

    /** @return how many segments of two flat curves were taken from their ends, for tests */
    int flatSegments() {
        return checker.flatSegments();
    }

    /** @return how many segments were taken from their ends by the curves' slope floor and bound, for tests */
    int fallingSegments() {
        return checker.fallingSegments();
    }
}
