package coordination.core.margin;

import coordination.core.curve.BandDevice;
import coordination.core.curve.DeviceKind;
import coordination.core.curve.Fuse;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.LogAxis;
import coordination.core.internal.SegmentWalk;
import coordination.core.internal.SmoothScan;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;

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
 */
public final class GradingCheck {
    /** Narrowest scan step, in ln(I), on which a segment is taken from its ends without a scan. */
    private static final double MIN_STEP = 1e-6;
    /** Fall per scan step, relative to the values' size, that no rounding of them can undo. */
    private static final double STRICT_FALL = 1e-12;

    private final ProtectiveDevice upstream;
    private final ProtectiveDevice downstream;
    private final TimeCurrentCurve up;
    private final TimeCurrentCurve down;
    private final boolean toOperatingTime;
    private final double fromAmps;
    private final double toAmps;
    private final GradingRequirement requirement;
    private final boolean plain;
    // the functions' values at a segment's ends, reused from segment to segment
    private final double[][] endValues = new double[2][2];
    private int flatSegments;
    private int fallingSegments;
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
        this.toOperatingTime = requirement instanceof GradingRequirement.Interval iv && !iv.toClearingTime()
                && upstream.kind() == DeviceKind.RELAY && downstream.kind() == DeviceKind.RELAY;
        this.down = toOperatingTime ? downstream.slowestOperatingCurve() : downstream.maximumCurve();
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        this.requirement = requirement;
        this.plain = plain;
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

    /** @return how many segments of two flat curves were taken from their ends, for tests */
    int flatSegments() {
        return flatSegments;
    }

    /** @return how many segments were taken from their ends by the curves' slope floor and bound, for tests */
    int fallingSegments() {
        return fallingSegments;
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

    /** The upstream fuse's pre-arcing energy at a current, A²s, or NaN. */
    private double upEnergy(double amps) {
        if (upstream.kind() != DeviceKind.FUSE) {
            return Double.NaN;
        }
        if (upstream.preArcing().isPresent() && upstream.preArcing().get().isDefinedAt(amps)) {
            return upstream.preArcing().get().a2s(amps);
        }
        return amps * amps * time(up, amps);
    }

    /** The downstream device's total let-through energy at a current, A²s, or NaN. */
    private double downEnergy(double amps) {
        if (downstream.letThrough().isPresent() && amps >= downstream.letThroughFromAmps()
                && downstream.letThrough().get().isDefinedAt(amps)) {
            return downstream.letThrough().get().a2s(amps);
        }
        return amps * amps * time(down, amps);
    }

    private double logEnergyRatio(double x) {
        double amps = Math.exp(x);
        return Math.log(upEnergy(amps)) - Math.log(downEnergy(amps));
    }

    private boolean energyDefined(double amps) {
        // grading by energy compares current-limiting devices: a fuse over a fuse, or over a stated let-through
        if (downstream.kind() != DeviceKind.FUSE && downstream.letThrough().isEmpty()) {
            return false;
        }
        double u = upEnergy(amps);
        double d = downEnergy(amps);
        return u > 0 && Double.isFinite(u) && d > 0 && Double.isFinite(d);
    }

    private GradingCheckResult compute() {
        RunningMinimum interval = new RunningMinimum();
        RunningMinimum energy = new RunningMinimum();
        CurrentSpan energySpan = new CurrentSpan();
        CurrentSpan undefined = new CurrentSpan();
        SmoothScan scan = new SmoothScan(this::sample, new DoubleUnaryOperator[] {this::interval, this::logRatio}, 1, 1,
                fromAmps, toAmps);
        SegmentWalk.walk(splitPoints(), s -> {
            double mid = s.midAmps();
            double right = s.rightAmps();
            if (!up.isDefinedAt(mid) || !down.isDefinedAt(mid)) {
                scan.interrupt(Double.NaN);
                // the energies' own ends are split points: defined in the middle is defined throughout
                if (energyDefined(mid)) {
                    energySpan.add(s.a(), s.b());
                    energy.offer(LogAxis.minimum(this::logEnergyRatio, s.xa(), s.xb()), s);
                } else {
                    undefined.add(s.a(), s.b());
                }
                return;
            }
            double upRight = time(up, right);
            double downRight = time(down, right);
            boolean upOperates = Double.isFinite(upRight);
            boolean downOperates = Double.isFinite(downRight);
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
            // the times at the segment's ends, the upper end's from the walk where its current is the same
            boolean atRight = right == Math.exp(seg.xb());
            double upB = atRight ? upRight : time(up, Math.exp(seg.xb()));
            double downB = atRight ? downRight : time(down, Math.exp(seg.xb()));
            double ampsA = Math.exp(seg.xa());
            double upA = time(up, ampsA);
            double downA = time(down, ampsA);
            LogAxis.Point[] minima = upA == upB && downA == downB ? flatSegment(scan, seg, upA, downA, upB, downB)
                    : fallingSegment(scan, seg, upA, downA, upB, downB);
            interval.offer((minima != null ? minima : scan.scan(seg))[0], seg);
        });
        Optional<Fuse> fu = fuse(upstream);
        Optional<Fuse> fd = fuse(downstream);
        double ratio = fu.isPresent() && fd.isPresent() ? fu.get().ratingAmps() / fd.get().ratingAmps() : Double.NaN;
        double minInterval = interval.value();
        double minEnergyRatio = energySpan.isEmpty() ? Double.NaN : Math.exp(energy.value());
        boolean timed = !Double.isNaN(minInterval);
        boolean defined = undefined.isEmpty() && (timed || !energySpan.isEmpty());
        // IEC 60269-1: the upstream pre-arcing energy at least the downstream let-through
        boolean energyOk = energySpan.isEmpty() || minEnergyRatio >= 1.0;
        boolean pass;
        if (requirement instanceof GradingRequirement.Interval iv) {
            pass = defined && energyOk && (!timed || minInterval >= iv.seconds());
        } else if (requirement instanceof GradingRequirement.RatingRatio rr) {
            pass = defined && energyOk && (!timed || minInterval > 0) && ratio >= rr.ratio();
        } else {
            pass = defined && energyOk && (!timed || minInterval > 0);
        }
        return new GradingCheckResult(upstream.id(), downstream.id(), fromAmps, toAmps, requirement, toOperatingTime,
                pass, minInterval, interval.at(), interval.side(), scan.crossingsAmps(), ratio, minEnergyRatio,
                energy.at(), energySpan.from(), energySpan.to(), undefined.from(), undefined.to());
    }

    /** The fuse behind a device, also when it was referred to another voltage. */
    private static Optional<Fuse> fuse(ProtectiveDevice d) {
        if (d instanceof Fuse f) {
            return Optional.of(f);
        }
        return d instanceof BandDevice b && b.source() instanceof Fuse f ? Optional.of(f) : Optional.empty();
    }

    /**
     * A segment on which both curves have the same time at both ends (the caller compares them),
     * and so, since no curve's computed time rises with current, the same time at every current
     * between: the interval and the log ratio are the same at every scan point, and the scan's
     * answer is known from the ends (see {@link SmoothScan#flat}). Returns null, for the scan to decide, where a time is not
     * finite, the curves meet, or the segment is so narrow that a falling time could round to the
     * same value at both ends.
     */
    private LogAxis.Point[] flatSegment(SmoothScan scan, SegmentWalk.Segment seg, double tuA, double tdA, double tuB,
            double tdB) {
        // on a narrower segment a falling time could round to equal values at both ends
        if (plain || !((seg.xb() - seg.xa()) / (LogAxis.SCAN_POINTS - 1) >= MIN_STEP)) {
            return null;
        }
        if (!Double.isFinite(tuA) || !Double.isFinite(tdA)) {
            return null;
        }
        double[] atStart = endValues[0];
        double[] atEnd = endValues[1];
        fill(atStart, tuA, tdA);
        fill(atEnd, tuB, tdB);
        if (!(atStart[1] != 0) || Double.isNaN(atStart[1])) {
            return null;
        }
        LogAxis.Point[] minima = scan.flat(seg, atStart, atEnd);
        if (minima != null) {
            flatSegments++;
        }
        return minima;
    }

    /**
     * A segment on which the upstream time provably falls faster than the downstream one can: over
     * a step Δ in ln I the upstream time falls by at least {@code f Δ} times its value at the
     * segment's end, f its curve's {@link TimeCurrentCurve#logSlopeFloor}, and the downstream time
     * by at most {@code s Δ} times its value at the start, s its curve's
     * {@link TimeCurrentCurve#logSlopeBound} (0 where it is flat). Where {@code f tu(end) > s td(start)}
     * the interval falls at every scan step, and the log ratio, of the interval's sign, keeps the
     * sign its ends share. The scan's answer is then the upper end (see
     * {@link SmoothScan#falling}). Returns null, for the scan to decide, where that fall is not far
     * above rounding, a time is not finite, or the curves meet.
     */
    private LogAxis.Point[] fallingSegment(SmoothScan scan, SegmentWalk.Segment seg, double tuA, double tdA, double tuB,
            double tdB) {
        double step = (seg.xb() - seg.xa()) / (LogAxis.SCAN_POINTS - 1);
        if (plain || !(step >= MIN_STEP) || !(tuB > 0)) {
            return null;
        }
        double ampsA = Math.exp(seg.xa());
        double ampsB = Math.exp(seg.xb());
        if (!(tdA >= 0) || !Double.isFinite(tdA) || !Double.isFinite(tuA)) {
            return null;
        }
        double floor = up.logSlopeFloor(ampsA, ampsB);
        if (!(floor > 0) || !Double.isFinite(floor)) {
            return null;
        }
        double bound = tdA == tdB ? 0.0 : down.logSlopeBound(ampsA, ampsB);
        // each step's fall, far above the rounding of values of the size met on the segment
        if (!((floor * tuB - bound * tdA) * step > STRICT_FALL * Math.max(tuA, tdA))) {
            return null;
        }
        double[] atStart = endValues[0];
        double[] atEnd = endValues[1];
        fill(atStart, tuA, tdA);
        fill(atEnd, tuB, tdB);
        boolean oneSign = atStart[1] > 0 && atEnd[1] > 0 || atStart[1] < 0 && atEnd[1] < 0;
        if (!oneSign) {
            return null;
        }
        LogAxis.Point[] minima = scan.falling(seg, atStart, atEnd);
        if (minima != null) {
            fallingSegments++;
        }
        return minima;
    }

    private void sample(double x, double[] values) {
        double amps = Math.exp(x);
        fill(values, time(up, amps), time(down, amps));
    }

    // the interval and the log ratio from the two times, as the scan samples them
    private static void fill(double[] values, double tu, double td) {
        values[0] = tu - td;
        values[1] = Math.log(tu) - Math.log(td);
    }

    private double[] splitPoints() {
        double[] pre = upstream.preArcing().map(LetThroughEnergy::breakpointsAmps).orElse(new double[0]);
        double[] let = downstream.letThrough().map(LetThroughEnergy::breakpointsAmps).orElse(new double[0]);
        return LogAxis.splitPoints(fromAmps, toAmps, up.breakpointsAmps(), down.breakpointsAmps(),
                new double[] {up.lowestDefinedAmps(), up.highestDefinedAmps(), down.lowestDefinedAmps(),
                    down.highestDefinedAmps(), downstream.letThroughFromAmps()}, pre, let);
    }
}
