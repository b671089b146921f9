package coordination.core.margin;

import coordination.core.curve.DeviceKind;
import coordination.core.curve.Fuse;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.LogAxis;
import coordination.core.internal.SegmentWalk;
import coordination.core.internal.SmoothScan;
import java.util.function.DoubleUnaryOperator;

/**
 * Whether two devices in series grade over a current range: the downstream device must clear
 * before the upstream one starts to operate, by the required interval. The interval is the upstream
 * minimum (fastest) curve minus the downstream maximum (clearing) curve, solved exactly segment by
 * segment between the breakpoints of both curves, as in {@link CableCheck}.
 */
public final class GradingCheck {
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
        Checks.given("grading check: upstream device", upstream);
        Checks.given("grading check: downstream device", downstream);
        Checks.given("grading check: requirement", requirement);
        Checks.currentRange("grading range", fromAmps, toAmps);
        if (requirement instanceof GradingRequirement.RatingRatio
                && !(upstream.kind() == DeviceKind.FUSE && downstream.kind() == DeviceKind.FUSE)) {
            throw new IllegalArgumentException("grading check: requirement: a rating ratio applies to two fuses, found "
                    + upstream.kind().key() + " '" + upstream.id() + "' over " + downstream.kind().key() + " '"
                    + downstream.id() + "' - use an interval or no overlap");
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
        RunningMinimum interval = new RunningMinimum();
        CurrentSpan undefined = new CurrentSpan();
        SmoothScan scan = new SmoothScan(this::sample, new DoubleUnaryOperator[] {this::interval, this::logRatio}, 1, 1,
                fromAmps, toAmps);
        SegmentWalk.walk(splitPoints(), s -> {
            double mid = s.midAmps();
            double right = s.rightAmps();
            if (Double.isNaN(time(up, mid)) || Double.isNaN(time(down, mid))) {
                undefined.add(s.a(), s.b());
                scan.interrupt(Double.NaN);
                return;
            }
            boolean upOperates = Double.isFinite(time(up, right));
            boolean downOperates = Double.isFinite(time(down, right));
            if (!upOperates) {
                scan.interrupt(downOperates ? Double.POSITIVE_INFINITY : Double.NaN);
                return;
            }
            if (!downOperates) {
                interval.unbounded(s.a(), s.first());
                scan.interrupt(Double.NEGATIVE_INFINITY);
                return;
            }
            SegmentWalk.Segment seg = s;
            double prev = scan.previous();
            boolean afterGap = s.first() || prev == Double.NEGATIVE_INFINITY || Double.isNaN(prev);
            if (afterGap && LogAxis.divergesAt(v -> time(down, Math.exp(v)), s.xa())) {
                // the downstream curve's asymptote at its pickup: the interval has no lower bound there
                interval.unbounded(s.a(), s.first());
                seg = s.from(Math.min(s.xb(), s.xa() + LogAxis.DIVERGENCE_PROBE));
            }
            interval.offer(scan.scan(seg)[0], seg);
        });
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
        return new GradingCheckResult(upstream.id(), downstream.id(), fromAmps, toAmps, requirement, pass, minInterval,
                interval.at(), interval.side(), scan.crossingsAmps(), ratio, undefined.from(), undefined.to());
    }

    private void sample(double x, double[] values) {
        double amps = Math.exp(x);
        double tu = time(up, amps);
        double td = time(down, amps);
        values[0] = tu - td;
        values[1] = Math.log(tu) - Math.log(td);
    }

    private double[] splitPoints() {
        return LogAxis.splitPoints(fromAmps, toAmps, up.breakpointsAmps(), down.breakpointsAmps(),
                new double[] {up.lowestDefinedAmps(), up.highestDefinedAmps(), down.lowestDefinedAmps(),
                    down.highestDefinedAmps()});
    }
}
