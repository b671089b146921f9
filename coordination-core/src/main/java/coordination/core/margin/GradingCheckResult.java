package coordination.core.margin;

import coordination.core.internal.Checks;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The outcome of a {@link GradingCheck}.
 *
 * @param upstream upstream device id
 * @param downstream downstream device id
 * @param fromAmps lower end of the range in amperes
 * @param toAmps upper end of the range in amperes
 * @param requirement what was asked
 * @param pass whether the pair grades as asked over the whole range
 * @param minIntervalSeconds minimum of (upstream minimum - downstream maximum) in seconds, negative
 *     infinity where the upstream device operates and the downstream one does not, NaN if neither
 *     operates anywhere
 * @param minIntervalAtAmps current of that minimum in amperes
 * @param minIntervalSide side of {@code minIntervalAtAmps} on which it occurs
 * @param crossingsAmps currents where the two curves cross (selectivity is lost beyond), ascending
 * @param ratingRatio upstream rating over downstream rating for fuse pairs, or NaN
 * @param undefinedFromAmps lowest current at which a curve has no value, or NaN
 * @param undefinedToAmps highest such current, or NaN
 */
public record GradingCheckResult(
        String upstream,
        String downstream,
        double fromAmps,
        double toAmps,
        GradingRequirement requirement,
        boolean pass,
        double minIntervalSeconds,
        double minIntervalAtAmps,
        Side minIntervalSide,
        double[] crossingsAmps,
        double ratingRatio,
        double undefinedFromAmps,
        double undefinedToAmps) {

    /** Copies the array in. */
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

    /** @return a one-line explanation of the verdict */
    public String reason() {
        if (!Double.isNaN(undefinedFromAmps)) {
            return "a curve has no value from " + Checks.format(undefinedFromAmps) + " A to "
                    + Checks.format(undefinedToAmps) + " A";
        }
        if (Double.isNaN(minIntervalSeconds)) {
            return "neither device operates in the range";
        }
        if (minIntervalSeconds == Double.NEGATIVE_INFINITY) {
            return "'" + upstream + "' operates where '" + downstream + "' does not or slows without bound, at "
                    + Checks.format(minIntervalAtAmps) + " A";
        }
        String s = "minimum interval " + Checks.format(minIntervalSeconds) + " s at " + Checks.format(minIntervalAtAmps)
                + " A";
        if (requirement instanceof GradingRequirement.RatingRatio) {
            s += ", rating ratio " + Checks.format(ratingRatio);
        }
        return (pass ? "meets " : "fails ") + requirement + ": " + s;
    }

    /**
     * The stable JSON form (documented in {@code spec/report-format.md}).
     *
     * @return an ordered map of JSON values
     */
    public Map<String, Object> toJson() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("kind", "grading");
        m.put("upstream", upstream);
        m.put("downstream", downstream);
        m.put("pass", pass);
        m.put("range_a", List.of(fromAmps, toAmps));
        m.put("required_s", requiredSeconds());
        if (requirement instanceof GradingRequirement.RatingRatio r) {
            m.put("required_rating_ratio", r.ratio());
            m.put("rating_ratio", CableCheckResult.number(ratingRatio));
        }
        if (requirement instanceof GradingRequirement.NoOverlap) {
            m.put("required_no_overlap", true);
        }
        m.put("min_interval_s", CableCheckResult.number(minIntervalSeconds));
        m.put("min_interval_at_a", CableCheckResult.number(minIntervalAtAmps));
        m.put("min_interval_side", Double.isNaN(minIntervalAtAmps) ? null : minIntervalSide.key());
        List<Double> crossings = new ArrayList<>();
        for (double c : crossingsAmps) {
            crossings.add(c);
        }
        m.put("crossings_a", crossings);
        m.put("undefined_a", Double.isNaN(undefinedFromAmps) ? null : List.of(undefinedFromAmps, undefinedToAmps));
        m.put("reason", reason());
        return m;
    }

    @Override
    public String toString() {
        return "grading check '" + upstream + "' over '" + downstream + "' " + Checks.format(fromAmps) + " A to "
                + Checks.format(toAmps) + " A: " + (pass ? "PASS" : "FAIL") + ", " + reason();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GradingCheckResult r && toJson().equals(r.toJson());
    }

    @Override
    public int hashCode() {
        return toJson().hashCode();
    }
}
