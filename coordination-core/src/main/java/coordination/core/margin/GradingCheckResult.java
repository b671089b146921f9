package coordination.core.margin;

import coordination.core.Quantities;
import coordination.core.internal.Checks;
import java.util.Arrays;
import java.util.Objects;

/**
 * The outcome of a {@link GradingCheck}.
 *
 * @param upstream upstream device id
 * @param downstream downstream device id
 * @param fromAmps lower end of the range in amperes
 * @param toAmps upper end of the range in amperes
 * @param requirement what was asked
 * @param toOperatingTime whether the interval was measured to the downstream relay's operating
 *     time (two relays) rather than to the downstream device's clearing time
 * @param pass whether the pair grades as asked over the whole range
 * @param minIntervalSeconds minimum of (upstream minimum - downstream maximum) in seconds, negative
 *     infinity where the upstream device operates and the downstream one does not, NaN if neither
 *     operates anywhere
 * @param minIntervalAtAmps current of that minimum in amperes
 * @param minIntervalSide side of {@code minIntervalAtAmps} on which it occurs
 * @param crossingsAmps currents where the two curves cross (selectivity is lost beyond), ascending
 * @param ratingRatio upstream rating over downstream rating for fuse pairs, or NaN
 * @param minEnergyRatio where the pair is graded by energy, the minimum of the upstream fuse's
 *     pre-arcing I²t over the downstream device's let-through I²t; NaN where it is not
 * @param minEnergyRatioAtAmps current of that minimum in amperes, or NaN
 * @param energyFromAmps lowest current graded by energy, or NaN
 * @param energyToAmps highest such current, or NaN
 * @param undefinedFromAmps lowest current at which a curve has no value, or NaN
 * @param undefinedToAmps highest such current, or NaN
 */
public record GradingCheckResult(
        String upstream,
        String downstream,
        double fromAmps,
        double toAmps,
        GradingRequirement requirement,
        boolean toOperatingTime,
        boolean pass,
        double minIntervalSeconds,
        double minIntervalAtAmps,
        Side minIntervalSide,
        double[] crossingsAmps,
        double ratingRatio,
        double minEnergyRatio,
        double minEnergyRatioAtAmps,
        double energyFromAmps,
        double energyToAmps,
        double undefinedFromAmps,
        double undefinedToAmps) implements CheckResult {

    /**
     * Copies the array in.
     *
     * @param upstream upstream device id
     * @param downstream downstream device id
     * @param fromAmps lower end of the range in amperes
     * @param toAmps upper end of the range in amperes
     * @param requirement what was asked
     * @param toOperatingTime whether the interval was measured to the downstream relay's operating time (two relays)
     *     rather than to the downstream device's clearing time
     * @param pass whether the pair grades as asked over the whole range
     * @param minIntervalSeconds minimum of (upstream minimum - downstream maximum) in seconds, negative infinity where
     *     the upstream device operates and the downstream one does not, NaN if neither operates anywhere
     * @param minIntervalAtAmps current of that minimum in amperes
     * @param minIntervalSide side of {@code minIntervalAtAmps} on which it occurs
     * @param crossingsAmps currents where the two curves cross (selectivity is lost beyond), ascending
     * @param ratingRatio upstream rating over downstream rating for fuse pairs, or NaN
     * @param minEnergyRatio where the pair is graded by energy, the minimum of the upstream fuse's pre-arcing I²t over
     *     the downstream device's let-through I²t; NaN where it is not
     * @param minEnergyRatioAtAmps current of that minimum in amperes, or NaN
     * @param energyFromAmps lowest current graded by energy, or NaN
     * @param energyToAmps highest such current, or NaN
     * @param undefinedFromAmps lowest current at which a curve has no value, or NaN
     * @param undefinedToAmps highest such current, or NaN
     */
    public GradingCheckResult {
        crossingsAmps = crossingsAmps.clone();
    }

    @Override
    public double[] crossingsAmps() {
        return crossingsAmps.clone();
    }

    /** @return the interval the requirement asks for in seconds (0 for a ratio or no overlap) */
    public double requiredSeconds() {
        return requirement instanceof GradingRequirement.Interval i ? i.seconds() : 0.0;
    }

    @Override
    public String reason() {
        if (!Double.isNaN(undefinedFromAmps)) {
            return "a curve has no value from " + Quantities.current(undefinedFromAmps, 3) + " to "
                    + Quantities.current(undefinedToAmps, 3);
        }
        String energy = Double.isNaN(minEnergyRatio) ? "" : "pre-arcing to let-through energy at least "
                + Quantities.significant(minEnergyRatio, 3) + " at " + Quantities.current(minEnergyRatioAtAmps, 3);
        if (Double.isNaN(minIntervalSeconds) && energy.isEmpty()) {
            return "neither device operates in the range";
        }
        if (minIntervalSeconds == Double.NEGATIVE_INFINITY) {
            return "'" + upstream + "' operates where '" + downstream + "' does not or slows without bound, at "
                    + Quantities.current(minIntervalAtAmps, 3);
        }
        String s = Double.isNaN(minIntervalSeconds) ? "" : "minimum interval "
                + Quantities.significant(minIntervalSeconds, 3)
                + " s at " + Quantities.current(minIntervalAtAmps, 3);
        if (!energy.isEmpty()) {
            s += (s.isEmpty() ? "" : "; ") + energy;
        }
        if (requirement instanceof GradingRequirement.RatingRatio) {
            s += ", rating ratio " + Quantities.significant(ratingRatio, 3);
        }
        return (pass ? "meets " : "fails ") + requirement + ": " + s;
    }

    @Override
    public String toString() {
        return "grading check '" + upstream + "' over '" + downstream + "' " + Checks.format(fromAmps) + " A to "
                + Checks.format(toAmps) + " A: " + (pass ? "PASS" : "FAIL") + ", " + reason();
    }

    // component by component, as a record compares, with the array compared by content
    @Override
    public boolean equals(Object o) {
        return o instanceof GradingCheckResult r && upstream.equals(r.upstream) && downstream.equals(r.downstream)
                && Double.compare(fromAmps, r.fromAmps) == 0 && Double.compare(toAmps, r.toAmps) == 0
                && requirement.equals(r.requirement) && toOperatingTime == r.toOperatingTime && pass == r.pass
                && Double.compare(minIntervalSeconds, r.minIntervalSeconds) == 0
                && Double.compare(minIntervalAtAmps, r.minIntervalAtAmps) == 0 && minIntervalSide == r.minIntervalSide
                && Arrays.equals(crossingsAmps, r.crossingsAmps) && Double.compare(ratingRatio, r.ratingRatio) == 0
                && Double.compare(minEnergyRatio, r.minEnergyRatio) == 0
                && Double.compare(minEnergyRatioAtAmps, r.minEnergyRatioAtAmps) == 0
                && Double.compare(energyFromAmps, r.energyFromAmps) == 0 && Double.compare(energyToAmps, r.energyToAmps) == 0
                && Double.compare(undefinedFromAmps, r.undefinedFromAmps) == 0
                && Double.compare(undefinedToAmps, r.undefinedToAmps) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(upstream, downstream, fromAmps, toAmps, requirement, toOperatingTime, pass,
                minIntervalSeconds, minIntervalAtAmps, minIntervalSide, Arrays.hashCode(crossingsAmps), ratingRatio,
                minEnergyRatio, minEnergyRatioAtAmps, energyFromAmps, energyToAmps, undefinedFromAmps, undefinedToAmps);
    }
}
