package coordination.core.margin;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.LogAxis;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;

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
 * <p>Below 0.1 s the comparison is of let-through energy, I² t_device against k²S², which on
 * these axes is the same comparison; with a {@link DcOffset} the device's time there is increased
 * to the thermally equivalent {@code (1 + m) t} of IEC 60909-0. Above the device's digitised range,
 * a fuse's stated clearing I²t is used as constant let-through energy. Above 5 s the adiabatic
 * limit is conservative and reported as such, unless the cable uses the non-adiabatic method.
 */
public final class CableCheck {
    /** Offset in ln(I) used to take one-sided limits at a step of a curve. */
    private static final double SIDE_OFFSET = 1e-11;

    private final ProtectiveDevice device;
    private final CableThermalLimit cable;
    private final double fromAmps;
    private final double toAmps;
    private final MarginRequirement requirement;
    private final DcOffset dcOffset;
    private final TimeCurrentCurve curve;
    private final double letThrough;
    private final double adiabaticI2t;
    private final CableCheckResult result;

    /**
     * Runs the check.
     *
     * @param device the protective device; its maximum curve is checked
     * @param cable the cable
     * @param fromAmps lowest prospective fault current in amperes, above 0
     * @param toAmps highest prospective fault current in amperes, at or above {@code fromAmps}
     * @param requirement the margin asked for
     * @param dcOffset DC-offset heating below 0.1 s, or null to ignore it
     * @throws IllegalArgumentException if the range is invalid
     */
    public CableCheck(ProtectiveDevice device, CableThermalLimit cable, double fromAmps, double toAmps,
            MarginRequirement requirement, DcOffset dcOffset) {
        Checks.positive("check range: lowest current", fromAmps, "A");
        Checks.positive("check range: highest current", toAmps, "A");
        if (toAmps < fromAmps) {
            throw new IllegalArgumentException("check range: highest current " + Checks.format(toAmps)
                    + " A is below the lowest " + Checks.format(fromAmps) + " A - must be at or above it");
        }
        this.device = device;
        this.cable = cable;
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        this.requirement = requirement;
        this.dcOffset = dcOffset;
        this.curve = device.maximumCurve();
        OptionalDouble i2t = device.clearingI2tA2s();
        this.letThrough = i2t.isPresent() ? i2t.getAsDouble() : Double.NaN;
        this.adiabaticI2t = cable.method() == ThermalMethod.NON_ADIABATIC ? Double.NaN : cable.i2tA2s();
        this.result = compute();
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

    /**
     * Device clearing time at a current, with the stated let-through energy above a digitised range.
     *
     * @param amps current in amperes
     * @return seconds, infinity where it does not clear, NaN where it has no value
     */
    public double deviceSeconds(double amps) {
        if (curve.isDefinedAt(amps)) {
            return curve.seconds(amps);
        }
        if (amps > curve.highestDefinedAmps() && !Double.isNaN(letThrough)) {
            return letThrough / (amps * amps);
        }
        return Double.NaN;
    }

    /**
     * The device's thermally equivalent time: its clearing time, increased below 0.1 s by the
     * DC-offset factor when one is given.
     *
     * @param amps current in amperes
     * @return seconds
     */
    public double equivalentSeconds(double amps) {
        double t = deviceSeconds(amps);
        if (dcOffset != null && t > 0 && t < CableThermalLimit.ADIABATIC_MIN_SECONDS) {
            return t * (1 + dcOffset.m(t));
        }
        return t;
    }

    // the cable's damage time with k²S² computed once per check
    private double cableSeconds(double amps) {
        return Double.isNaN(adiabaticI2t) ? cable.damageSeconds(amps) : adiabaticI2t / (amps * amps);
    }

    private CableCheckResult compute() {
        double[] points = splitPoints();
        RunningMinimum margin = new RunningMinimum();
        RunningMinimum ratio = new RunningMinimum();
        CurrentSpan notCleared = new CurrentSpan();
        CurrentSpan undefined = new CurrentSpan();
        List<Double> crossings = new ArrayList<>();
        List<ThermalRegion> regions = new ArrayList<>();
        double prevRatioLog = Double.NaN;
        for (int i = 0; i + 1 < points.length || i == 0 && points.length == 1; i++) {
            double a = points[i];
            double b = points.length == 1 ? a : points[i + 1];
            double xa = Math.log(a) + (i == 0 ? 0.0 : SIDE_OFFSET);
            double xb = Math.log(b) - (i + 2 == points.length || points.length == 1 ? 0.0 : SIDE_OFFSET);
            if (xb < xa) {
                xb = xa;
            }
            double tMid = deviceSeconds(Math.exp(0.5 * (xa + xb)));
            double tRight = deviceSeconds(Math.exp(xb));
            if (Double.isNaN(tMid) || Double.isNaN(tRight)) {
                undefined.add(a, b);
                addRegion(regions, a, b, ThermalRegion.UNDEFINED);
                prevRatioLog = Double.NaN;
                continue;
            }
            if (Double.isInfinite(tRight)) {
                notCleared.add(a, b);
                addRegion(regions, a, b, ThermalRegion.NOT_CLEARED);
                prevRatioLog = Double.NEGATIVE_INFINITY;
                continue;
            }
            addRegion(regions, a, b, method(tMid));
            // a pole can only sit where the device starts to operate: at the range start or after a gap
            boolean afterGap = i == 0 || prevRatioLog == Double.NEGATIVE_INFINITY;
            if (afterGap && divergesAt(xa)) {
                // an inverse stage's asymptote at its pickup: the margin has no lower bound there
                margin.unbounded(a, i == 0);
                ratio.unbounded(a, i == 0);
                if (i == 0 && Double.isInfinite(deviceSeconds(a))) {
                    notCleared.add(a, a);
                }
                xa = Math.min(xb, xa + LogAxis.DIVERGENCE_PROBE);
            }
            double[] xs = LogAxis.scanPoints(xa, xb);
            double[] margins = new double[xs.length];
            double[] ratios = new double[xs.length];
            for (int k = 0; k < xs.length; k++) {
                double amps = Math.exp(xs[k]);
                double te = equivalentSeconds(amps);
                double tc = cableSeconds(amps);
                margins[k] = tc - te;
                ratios[k] = te == 0.0 ? Double.POSITIVE_INFINITY : Math.log(tc / te);
            }
            if (i > 0 && !Double.isNaN(prevRatioLog) && crosses(prevRatioLog, ratios[0])) {
                crossings.add(a);
            }
            // minimum time margin and minimum ratio on this smooth segment
            boolean last = i + 2 == points.length || points.length == 1;
            margin.offer(LogAxis.minimum(this::margin, xs, margins), a, b, xa, xb, i == 0, last);
            ratio.offer(LogAxis.minimum(this::logRatio, xs, ratios), a, b, xa, xb, i == 0, last);
            for (double root : LogAxis.roots(this::logRatio, xs, ratios)) {
                double amps = Math.exp(root);
                if (amps > fromAmps && amps < toAmps) {
                    crossings.add(amps);
                }
            }
            prevRatioLog = ratios[ratios.length - 1];
            if (points.length == 1) {
                break;
            }
        }
        double[] c = sortedDistinct(crossings);
        boolean clearsEverywhere = notCleared.isEmpty() && undefined.isEmpty();
        boolean pass = clearsEverywhere && !Double.isNaN(margin.value())
                && requirement.isMetBy(margin.value(), Math.exp(ratio.value()));
        return new CableCheckResult(device.id(), cable.id(), fromAmps, toAmps, requirement, pass, margin.value(),
                margin.at(), margin.side(), Math.exp(ratio.value()), ratio.at(), ratio.side(), c,
                notCleared.from(), notCleared.to(), undefined.from(), undefined.to(), regions);
    }

    private boolean divergesAt(double x) {
        return LogAxis.divergesAt(v -> deviceSeconds(Math.exp(v)), x);
    }

    static double[] sortedDistinct(List<Double> values) {
        double[] v = new double[values.size()];
        for (int k = 0; k < v.length; k++) {
            v[k] = values.get(k);
        }
        Arrays.sort(v);
        int n = 0;
        for (int k = 0; k < v.length; k++) {
            if (n == 0 || v[k] != v[n - 1]) {
                v[n++] = v[k];
            }
        }
        return n == v.length ? v : Arrays.copyOf(v, n);
    }

    static boolean crosses(double before, double after) {
        return before < 0 && after > 0 || before > 0 && after < 0;
    }

    private double margin(double x) {
        double amps = Math.exp(x);
        return cableSeconds(amps) - equivalentSeconds(amps);
    }

    private double logRatio(double x) {
        double amps = Math.exp(x);
        double te = equivalentSeconds(amps);
        if (te == 0.0) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.log(cableSeconds(amps) / te);
    }

    private String method(double deviceSeconds) {
        if (deviceSeconds < CableThermalLimit.ADIABATIC_MIN_SECONDS) {
            return dcOffset != null ? ThermalRegion.ENERGY_DC_OFFSET : ThermalRegion.ENERGY;
        }
        if (cable.method() == ThermalMethod.ICEA) {
            return ThermalRegion.ICEA;
        }
        if (cable.method() == ThermalMethod.NON_ADIABATIC) {
            return ThermalRegion.NON_ADIABATIC;
        }
        return deviceSeconds > CableThermalLimit.ADIABATIC_MAX_SECONDS ? ThermalRegion.ADIABATIC_CONSERVATIVE
                : ThermalRegion.ADIABATIC;
    }

    private static void addRegion(List<ThermalRegion> regions, double a, double b, String method) {
        if (!regions.isEmpty() && regions.get(regions.size() - 1).method().equals(method)) {
            ThermalRegion last = regions.remove(regions.size() - 1);
            regions.add(new ThermalRegion(last.fromAmps(), b, method));
        } else {
            regions.add(new ThermalRegion(a, b, method));
        }
    }

    /** The range ends, the device's breakpoints inside, and the window edges. */
    private double[] splitPoints() {
        double[] base = LogAxis.splitPoints(fromAmps, toAmps, curve.breakpointsAmps(),
                new double[] {curve.lowestDefinedAmps(), curve.highestDefinedAmps()});
        // window edges: where the clearing time passes 0.1 s and 5 s inside a smooth segment
        double[] edges = new double[2 * base.length];
        int m = 0;
        for (int i = 0; i + 1 < base.length; i++) {
            double xa = Math.log(base[i]) + (i == 0 ? 0 : SIDE_OFFSET);
            double xb = Math.log(base[i + 1]) - (i + 2 == base.length ? 0 : SIDE_OFFSET);
            if (!(xb > xa) || Double.isNaN(deviceSeconds(Math.exp(0.5 * (xa + xb))))) {
                continue;
            }
            // the clearing time never rises with current, so each limit is passed at most once per segment
            for (double limit : new double[] {CableThermalLimit.ADIABATIC_MIN_SECONDS,
                CableThermalLimit.ADIABATIC_MAX_SECONDS}) {
                double logLimit = Math.log(limit);
                double r = LogAxis.monotoneRoot(x -> Math.log(deviceSeconds(Math.exp(x))) - logLimit, xa, xb);
                if (!Double.isNaN(r)) {
                    edges[m++] = Math.exp(r);
                }
            }
        }
        return LogAxis.splitPoints(fromAmps, toAmps, base, Arrays.copyOf(edges, m));
    }
}
