package coordination.core.margin;

import coordination.core.Quantities;
import coordination.core.internal.Checks;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * The outcome of a {@link CableCheck}. Margins are taken over the part of the range where the
 * device clears; where it does not clear, or its curve has no value, the check fails and says where.
 *
 * @param device device id
 * @param cable cable id
 * @param fromAmps lower end of the range in amperes
 * @param toAmps upper end of the range in amperes
 * @param requirement the margin asked for
 * @param pass whether the device protects the cable over the whole range with that margin
 * @param minMarginSeconds minimum of t_cable - t_device in seconds, NaN if it clears nowhere
 * @param minMarginAtAmps current of that minimum in amperes
 * @param minMarginSide side of {@code minMarginAtAmps} on which it occurs
 * @param minRatio minimum of t_cable / t_device, NaN if it clears nowhere
 * @param minRatioAtAmps current of that minimum in amperes
 * @param minRatioSide side of {@code minRatioAtAmps} on which it occurs
 * @param crossingsAmps currents where the device curve crosses the damage curve, ascending
 * @param notClearedFromAmps lowest current of the range at which the device does not clear, or NaN
 * @param notClearedToAmps highest such current, or NaN
 * @param undefinedFromAmps lowest current at which the device curve has no value, or NaN
 * @param undefinedToAmps highest such current, or NaN
 * @param regions the method used in each part of the range
 */
public record CableCheckResult(
        String device,
        String cable,
        double fromAmps,
        double toAmps,
        MarginRequirement requirement,
        boolean pass,
        double minMarginSeconds,
        double minMarginAtAmps,
        Side minMarginSide,
        double minRatio,
        double minRatioAtAmps,
        Side minRatioSide,
        double[] crossingsAmps,
        double notClearedFromAmps,
        double notClearedToAmps,
        double undefinedFromAmps,
        double undefinedToAmps,
        List<ThermalRegion> regions) implements CheckResult {

    /**
     * Copies the arrays and lists in.
     *
     * @param device device id
     * @param cable cable id
     * @param fromAmps lower end of the range in amperes
     * @param toAmps upper end of the range in amperes
     * @param requirement the margin asked for
     * @param pass whether the device protects the cable over the whole range with that margin
     * @param minMarginSeconds minimum of t_cable - t_device in seconds, NaN if it clears nowhere
     * @param minMarginAtAmps current of that minimum in amperes
     * @param minMarginSide side of {@code minMarginAtAmps} on which it occurs
     * @param minRatio minimum of t_cable / t_device, NaN if it clears nowhere
     * @param minRatioAtAmps current of that minimum in amperes
     * @param minRatioSide side of {@code minRatioAtAmps} on which it occurs
     * @param crossingsAmps currents where the device curve crosses the damage curve, ascending
     * @param notClearedFromAmps lowest current of the range at which the device does not clear, or NaN
     * @param notClearedToAmps highest such current, or NaN
     * @param undefinedFromAmps lowest current at which the device curve has no value, or NaN
     * @param undefinedToAmps highest such current, or NaN
     * @param regions the method used in each part of the range
     */
    public CableCheckResult {
        crossingsAmps = crossingsAmps.clone();
        regions = List.copyOf(regions);
    }

    @Override
    public double[] crossingsAmps() {
        return crossingsAmps.clone();
    }

    @Override
    public String reason() {
        if (!Double.isNaN(undefinedFromAmps)) {
            return "the curve of '" + device + "' has no value from " + Quantities.current(undefinedFromAmps, 3)
                    + " to "
                    + Quantities.current(undefinedToAmps, 3);
        }
        if (!Double.isNaN(notClearedFromAmps)) {
            return "'" + device + "' does not clear from " + Quantities.current(notClearedFromAmps, 3) + " to "
                    + Quantities.current(notClearedToAmps, 3);
        }
        if (minMarginSeconds == Double.NEGATIVE_INFINITY) {
            return "'" + device + "' slows without bound towards its pickup at " + Quantities.significant(minMarginAtAmps, 3)
                    + " A: no margin there";
        }
        String where = "minimum margin " + Quantities.significant(minMarginSeconds, 3) + " s at "
                + Quantities.current(minMarginAtAmps, 3) + ", ratio " + Quantities.significant(minRatio, 3) + " at "
                + Quantities.current(minRatioAtAmps, 3);
        return (pass ? "meets " : "fails ") + requirement + ": " + where;
    }

    @Override
    public String toString() {
        return "cable check '" + device + "' -> '" + cable + "' " + Checks.format(fromAmps) + " A to "
                + Checks.format(toAmps) + " A: " + (pass ? "PASS" : "FAIL") + ", " + reason()
                + (crossingsAmps.length > 0 ? ", crossings " + Arrays.toString(crossingsAmps) + " A" : "");
    }

    // component by component, as a record compares, with the array compared by content
    @Override
    public boolean equals(Object o) {
        return o instanceof CableCheckResult r && device.equals(r.device) && cable.equals(r.cable)
                && Double.compare(fromAmps, r.fromAmps) == 0 && Double.compare(toAmps, r.toAmps) == 0
                && requirement.equals(r.requirement) && pass == r.pass
                && Double.compare(minMarginSeconds, r.minMarginSeconds) == 0
                && Double.compare(minMarginAtAmps, r.minMarginAtAmps) == 0 && minMarginSide == r.minMarginSide
                && Double.compare(minRatio, r.minRatio) == 0 && Double.compare(minRatioAtAmps, r.minRatioAtAmps) == 0
                && minRatioSide == r.minRatioSide && Arrays.equals(crossingsAmps, r.crossingsAmps)
                && Double.compare(notClearedFromAmps, r.notClearedFromAmps) == 0
                && Double.compare(notClearedToAmps, r.notClearedToAmps) == 0
                && Double.compare(undefinedFromAmps, r.undefinedFromAmps) == 0
                && Double.compare(undefinedToAmps, r.undefinedToAmps) == 0 && regions.equals(r.regions);
    }

    @Override
    public int hashCode() {
        return Objects.hash(device, cable, fromAmps, toAmps, requirement, pass, minMarginSeconds, minMarginAtAmps,
                minMarginSide, minRatio, minRatioAtAmps, minRatioSide, Arrays.hashCode(crossingsAmps),
                notClearedFromAmps, notClearedToAmps, undefinedFromAmps, undefinedToAmps, regions);
    }
}
