package coordination.core.margin;

import coordination.core.curve.Fuse;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.LogAxis;
import java.util.ArrayList;
import java.util.List;

/**
 * Whether two devices in series grade over a current range: the downstream device must clear
 * before the upstream one starts to operate, by the required interval. The interval is the upstream
 * minimum (fastest) curve minus the downstream maximum (clearing) curve, solved exactly segment by
 * segment between the breakpoints of both curves, as in {@link CableCheck}.
 */
public final class GradingCheck {
    private static final double SIDE_OFFSET = 1e-11;

    private final ProtectiveDevice upstream;
    private final ProtectiveDevice downstream;
    private final TimeCurrentCurve up;
    private final TimeCurrentCurve down;
    private final double fromAmps;
    private final double toAmps;
    private final GradingRequirement requirement;
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
        Checks.positive("grading range: lowest current", fromAmps, "A");
        Checks.positive("grading range: highest current", toAmps, "A");
        if (toAmps < fromAmps) {
            throw new IllegalArgumentException("grading range: highest current " + Checks.format(toAmps)
                    + " A is below the lowest " + Checks.format(fromAmps) + " A - must be at or above it");
        }
        this.upstream = upstream;
        this.downstream = downstream;
        this.up = upstream.minimumCurve();
        this.down = downstream.maximumCurve();
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        this.requirement = requirement;
        this.result = compute();
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

    private static double time(TimeCurrentCurve c, double amps) {
        return c.isDefinedAt(amps) ? c.seconds(amps) : Double.NaN;
    }

    private double interval(double x) {
        double amps = Math.exp(x);
        return time(up, amps) - time(down, amps);
    }

    private double logRatio(double x) {
        double amps = Math.exp(x);
        return Math.log(time(up, amps)) - Math.log(time(down, amps));
    }

    private GradingCheckResult compute() {
        double[] points = splitPoints();
        RunningMinimum interval = new RunningMinimum();
        CurrentSpan undefined = new CurrentSpan();
        List<Double> crossings = new ArrayList<>();
        double prevLog = Double.NaN;
        int segments = Math.max(1, points.length - 1);
        for (int i = 0; i < segments; i++) {
            double a = points[i];
            double b = points.length == 1 ? a : points[i + 1];
            boolean first = i == 0;
            boolean last = i == segments - 1;
            double xa = Math.log(a) + (first ? 0 : SIDE_OFFSET);
            double xb = Math.max(xa, Math.log(b) - (last ? 0 : SIDE_OFFSET));
            double mid = Math.exp(0.5 * (xa + xb));
            double right = Math.exp(xb);
            if (Double.isNaN(time(up, mid)) || Double.isNaN(time(down, mid))) {
                undefined.add(a, b);
                prevLog = Double.NaN;
                continue;
            }
            boolean upOperates = Double.isFinite(time(up, right));
            boolean downOperates = Double.isFinite(time(down, right));
            if (!upOperates) {
                prevLog = downOperates ? Double.POSITIVE_INFINITY : Double.NaN;
                continue;
            }
            if (!downOperates) {
                interval.unbounded(a, first);
                prevLog = Double.NEGATIVE_INFINITY;
                continue;
            }
            boolean afterGap = first || prevLog == Double.NEGATIVE_INFINITY || Double.isNaN(prevLog);
            if (afterGap && LogAxis.divergesAt(v -> time(down, Math.exp(v)), xa)) {
                // the downstream curve's asymptote at its pickup: the interval has no lower bound there
                interval.unbounded(a, first);
                xa = Math.min(xb, xa + LogAxis.DIVERGENCE_PROBE);
            }
            double[] xs = LogAxis.scanPoints(xa, xb);
            double[] intervals = new double[xs.length];
            double[] logs = new double[xs.length];
            for (int k = 0; k < xs.length; k++) {
                double amps = Math.exp(xs[k]);
                double tu = time(up, amps);
                double td = time(down, amps);
                intervals[k] = tu - td;
                logs[k] = Math.log(tu) - Math.log(td);
            }
            double leftLog = logs[0];
            if (!first && !Double.isNaN(prevLog) && CableCheck.crosses(prevLog, leftLog)) {
                crossings.add(a);
            }
            interval.offer(LogAxis.minimum(this::interval, xs, intervals), a, b, xa, xb, first, last);
            for (double r : LogAxis.roots(this::logRatio, xs, logs)) {
                double amps = Math.exp(r);
                if (amps > fromAmps && amps < toAmps) {
                    crossings.add(amps);
                }
            }
            prevLog = logs[logs.length - 1];
        }
        double ratio = upstream instanceof Fuse fu && downstream instanceof Fuse fd
                ? fu.ratingAmps() / fd.ratingAmps() : Double.NaN;
        double minInterval = interval.value();
        boolean defined = undefined.isEmpty() && !Double.isNaN(minInterval);
        boolean pass;
        if (requirement instanceof GradingRequirement.Interval iv) {
            pass = defined && minInterval >= iv.seconds();
        } else if (requirement instanceof GradingRequirement.RatingRatio rr) {
            pass = defined && minInterval > 0 && ratio >= rr.ratio();
        } else {
            pass = defined && minInterval > 0;
        }
        double[] c = CableCheck.sortedDistinct(crossings);
        return new GradingCheckResult(upstream.id(), downstream.id(), fromAmps, toAmps, requirement, pass, minInterval,
                interval.at(), interval.side(), c, ratio, undefined.from(), undefined.to());
    }

    private double[] splitPoints() {
        return LogAxis.splitPoints(fromAmps, toAmps, up.breakpointsAmps(), down.breakpointsAmps(),
                new double[] {up.lowestDefinedAmps(), up.highestDefinedAmps(), down.lowestDefinedAmps(),
                    down.highestDefinedAmps()});
    }
}
