package coordination.core.margin;

import coordination.core.internal.Checks;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

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
        List<ThermalRegion> regions) {

    /** Copies the arrays and lists in. */
    public CableCheckResult {
        crossingsAmps = crossingsAmps.clone();
        regions = List.copyOf(regions);
    }

    @Override
    public double[] crossingsAmps() {
        return crossingsAmps.clone();
    }

    /** @return a one-line explanation of the verdict */
    public String reason() {
        if (!Double.isNaN(undefinedFromAmps)) {
            return "the curve of '" + device + "' has no value from " + Checks.format(undefinedFromAmps) + " A to "
                    + Checks.format(undefinedToAmps) + " A";
        }
        if (!Double.isNaN(notClearedFromAmps)) {
            return "'" + device + "' does not clear from " + Checks.format(notClearedFromAmps) + " A to "
                    + Checks.format(notClearedToAmps) + " A";
        }
        if (minMarginSeconds == Double.NEGATIVE_INFINITY) {
            return "'" + device + "' slows without bound towards its pickup at " + Checks.format(minMarginAtAmps)
                    + " A: no margin there";
        }
        String where = "minimum margin " + Checks.format(minMarginSeconds) + " s at " + Checks.format(minMarginAtAmps)
                + " A, ratio " + Checks.format(minRatio) + " at " + Checks.format(minRatioAtAmps) + " A";
        return (pass ? "meets " : "fails ") + requirement + ": " + where;
    }

    /**
     * The stable JSON form: snake_case keys, SI units in the names, numbers as plain numbers and
     * null where a value does not exist (documented in {@code spec/report-format.md}).
     *
     * @return an ordered map of JSON values
     */
    public Map<String, Object> toJson() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("kind", "cable");
        m.put("device", device);
        m.put("cable", cable);
        m.put("pass", pass);
        if (requirement instanceof MarginRequirement.Seconds s) {
            m.put("required_margin_s", s.seconds());
        } else if (requirement instanceof MarginRequirement.Ratio r) {
            m.put("required_ratio", r.ratio());
        }
        m.put("range_a", List.of(fromAmps, toAmps));
        m.put("min_margin_s", number(minMarginSeconds));
        m.put("min_margin_at_a", number(minMarginAtAmps));
        m.put("min_margin_side", Double.isNaN(minMarginSeconds) ? null : minMarginSide.key());
        m.put("min_ratio", number(minRatio));
        m.put("min_ratio_at_a", number(minRatioAtAmps));
        List<Double> crossings = new ArrayList<>();
        for (double c : crossingsAmps) {
            crossings.add(c);
        }
        m.put("crossings_a", crossings);
        m.put("not_cleared_a", Double.isNaN(notClearedFromAmps) ? null : List.of(notClearedFromAmps, notClearedToAmps));
        m.put("undefined_a", Double.isNaN(undefinedFromAmps) ? null : List.of(undefinedFromAmps, undefinedToAmps));
        List<Map<String, Object>> methods = new ArrayList<>();
        for (ThermalRegion r : regions) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("from_a", r.fromAmps());
            e.put("to_a", r.toAmps());
            e.put("method", r.method());
            methods.add(e);
        }
        m.put("methods", methods);
        m.put("reason", reason());
        return m;
    }

    static Double number(double v) {
        return Double.isFinite(v) ? v : null;
    }

    @Override
    public String toString() {
        return "cable check '" + device + "' -> '" + cable + "' " + Checks.format(fromAmps) + " A to "
                + Checks.format(toAmps) + " A: " + (pass ? "PASS" : "FAIL") + ", " + reason()
                + (crossingsAmps.length > 0 ? ", crossings " + java.util.Arrays.toString(crossingsAmps) + " A" : "");
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CableCheckResult r && toJson().equals(r.toJson());
    }

    @Override
    public int hashCode() {
        return toJson().hashCode();
    }
}
