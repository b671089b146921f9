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
import coordination.core.internal.SplitPoints;
import java.util.function.DoubleUnaryOperator;

/**
 * A {@link GradingCheck} to run again and again: each {@link #run} computes the same check, to
 * the last bit, and keeps its outcome until the next. Its working arrays are kept from run to run,
 * so that grading the same devices again (other ranges, other requirements) allocates nothing once
 * they have grown to the checks' size; only {@link #result()} builds a record. The breakpoints of
 * the last pair's curves and energies are kept by identity, as they do not change. One thread's: a
 * checker is not safe for concurrent use.
 *
 * <p>A segment that no shortcut settles is scanned, and the solvers of Apache Commons Math that
 * refine its minima and roots allocate their own objects; so does grading by energy.
 */
public final class GradingChecker {
    /** Narrowest scan step, in ln(I), on which a segment is taken from its ends without a scan. */
    private static final double MIN_STEP = 1e-6;
    /** Fall per scan step, relative to the values' size, that no rounding of them can undo. */
    private static final double STRICT_FALL = 1e-12;

    private final boolean plain;
    private final SmoothScan scan;
    private final RunningMinimum interval = new RunningMinimum();
    private final RunningMinimum energy = new RunningMinimum();
    private final CurrentSpan energySpan = new CurrentSpan();
    private final CurrentSpan undefined = new CurrentSpan();
    private final SplitPoints splits = new SplitPoints();
    private final SegmentWalk segments = new SegmentWalk();
    private final SegmentWalk.Segment segment = new SegmentWalk.Segment();
    private final SegmentWalk.Segment trimmed = new SegmentWalk.Segment();
    // the functions' values at a segment's ends, reused from segment to segment
    private final double[] atStart = new double[2];
    private final double[] atEnd = new double[2];
    private final DoubleUnaryOperator downTime = this::downTimeAt;
    private final DoubleUnaryOperator energyRatio = this::logEnergyRatio;
    // the breakpoints of the last curves and energies, which do not change
    private final KeptBreakpoints upBreaks = new KeptBreakpoints();
    private final KeptBreakpoints downBreaks = new KeptBreakpoints();
    private final KeptBreakpoints preArcingBreaks = new KeptBreakpoints();
    private final KeptBreakpoints letThroughBreaks = new KeptBreakpoints();

    private ProtectiveDevice upstream;
    private ProtectiveDevice downstream;
    private TimeCurrentCurve up;
    private TimeCurrentCurve down;
    private LetThroughEnergy preArcing;
    private LetThroughEnergy letThrough;
    private boolean toOperatingTime;
    private double fromAmps;
    private double toAmps;
    private GradingRequirement requirement;
    private boolean pass;
    private double ratingRatio;
    private double minEnergyRatio;
    private int flatSegments;
    private int fallingSegments;

    /** Creates a checker. */
    public GradingChecker() {
        this(false);
    }

    /**
     * Creates a checker; with {@code plain} every segment is scanned: the reference the tests hold
     * the shortcuts to.
     */
    GradingChecker(boolean plain) {
        this.plain = plain;
        this.scan = new SmoothScan(this::sample, new DoubleUnaryOperator[] {this::interval, this::logRatio}, 1, 1);
    }

    /**
     * Runs a check, as {@link GradingCheck} does.
     *
     * @param upstream the device nearer the source; its minimum curve is used
     * @param downstream the device nearer the load; its maximum curve is used
     * @param fromAmps lowest current of the range in amperes, above 0
     * @param toAmps highest current in amperes, at or above {@code fromAmps}
     * @param requirement what is asked
     * @return whether the pair grades over the range as asked
     * @throws IllegalArgumentException if the range is invalid, or a rating ratio is asked of a
     *     pair that is not two fuses
     */
    public boolean run(ProtectiveDevice upstream, ProtectiveDevice downstream, double fromAmps, double toAmps,
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
        this.toOperatingTime = requirement instanceof GradingRequirement.Interval iv && !iv.toClearingTime()
                && upstream.kind() == DeviceKind.RELAY && downstream.kind() == DeviceKind.RELAY;
        this.down = toOperatingTime ? downstream.slowestOperatingCurve() : downstream.maximumCurve();
        this.preArcing = upstream.preArcing().orElse(null);
        this.letThrough = downstream.letThrough().orElse(null);
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        this.requirement = requirement;
        flatSegments = 0;
        fallingSegments = 0;
        compute();
        return pass;
    }

    /**
     * The last run's outcome as a record.
     *
     * @return the result
     * @throws IllegalStateException before the first run
     */
    public GradingCheckResult result() {
        if (upstream == null) {
            throw new IllegalStateException("grading checker: no check has run");
        }
        return new GradingCheckResult(upstream.id(), downstream.id(), fromAmps, toAmps, requirement, toOperatingTime,
                pass, interval.value(), interval.at(), interval.side(), scan.crossingsAmps(), ratingRatio,
                minEnergyRatio, energy.at(), energySpan.from(), energySpan.to(), undefined.from(), undefined.to());
    }

    /** @return whether the last check passed */
    public boolean pass() {
        return pass;
    }

    /** @return the last check's minimum interval in seconds, NaN where it was graded by energy alone */
    public double minIntervalSeconds() {
        return interval.value();
    }

    /** @return the current of that minimum in amperes */
    public double minIntervalAtAmps() {
        return interval.at();
    }

    /** @return the side of {@link #minIntervalAtAmps()} on which it occurs */
    public Side minIntervalSide() {
        return interval.side();
    }

    /** @return how many times the two curves cross in the last check */
    public int crossingCount() {
        return scan.crossingCount();
    }

    /**
     * One crossing of the last check.
     *
     * @param i its index, from 0, ascending in current
     * @return amperes
     */
    public double crossingAmps(int i) {
        return scan.crossingAmps(i);
    }

    /** @return the last check's minimum ratio of the upstream pre-arcing to the downstream let-through energy, or NaN */
    public double minEnergyRatio() {
        return minEnergyRatio;
    }

    /** @return how many segments of two flat curves the last run took from their ends */
    int flatSegments() {
        return flatSegments;
    }

    /** @return how many segments the last run took from their ends by the curves' slope floor and bound */
    int fallingSegments() {
        return fallingSegments;
    }

    // a grading check asks for few times twice: remembering them costs more than it saves
    private double upTime(double amps) {
        return CurveMemory.of(up, amps);
    }

    private double downTime(double amps) {
        return CurveMemory.of(down, amps);
    }

    private double interval(double x) {
        double amps = Math.exp(x);
        return upTime(amps) - downTime(amps);
    }

    private double logRatio(double x) {
        double amps = Math.exp(x);
        return Math.log(upTime(amps)) - Math.log(downTime(amps));
    }

    private double downTimeAt(double x) {
        return downTime(Math.exp(x));
    }

    /** The upstream fuse's pre-arcing energy at a current, A²s, or NaN. */
    private double upEnergy(double amps) {
        if (upstream.kind() != DeviceKind.FUSE) {
            return Double.NaN;
        }
        if (preArcing != null && preArcing.isDefinedAt(amps)) {
            return preArcing.a2s(amps);
        }
        return amps * amps * upTime(amps);
    }

    /** The downstream device's total let-through energy at a current, A²s, or NaN. */
    private double downEnergy(double amps) {
        if (letThrough != null && amps >= downstream.letThroughFromAmps() && letThrough.isDefinedAt(amps)) {
            return letThrough.a2s(amps);
        }
        return amps * amps * downTime(amps);
    }

    private double logEnergyRatio(double x) {
        double amps = Math.exp(x);
        return Math.log(upEnergy(amps)) - Math.log(downEnergy(amps));
    }

    private boolean energyDefined(double amps) {
        // grading by energy compares current-limiting devices: a fuse over a fuse, or over a stated let-through
        if (downstream.kind() != DeviceKind.FUSE && letThrough == null) {
            return false;
        }
        double u = upEnergy(amps);
        double d = downEnergy(amps);
        return u > 0 && Double.isFinite(u) && d > 0 && Double.isFinite(d);
    }

    private void compute() {
        interval.reset();
        energy.reset();
        energySpan.reset();
        undefined.reset();
        scan.reset(fromAmps, toAmps);
        split();
        for (int i = 0; i < segments.count(); i++) {
            visit(segments.load(i, segment));
        }
        scan.finish();
        Fuse fu = fuse(upstream);
        Fuse fd = fuse(downstream);
        ratingRatio = fu != null && fd != null ? fu.ratingAmps() / fd.ratingAmps() : Double.NaN;
        double minInterval = interval.value();
        minEnergyRatio = energySpan.isEmpty() ? Double.NaN : Math.exp(energy.value());
        boolean timed = !Double.isNaN(minInterval);
        boolean defined = undefined.isEmpty() && (timed || !energySpan.isEmpty());
        // IEC 60269-1: the upstream pre-arcing energy at least the downstream let-through
        boolean energyOk = energySpan.isEmpty() || minEnergyRatio >= 1.0;
        if (requirement instanceof GradingRequirement.Interval iv) {
            pass = defined && energyOk && (!timed || minInterval >= iv.seconds());
        } else if (requirement instanceof GradingRequirement.RatingRatio rr) {
            pass = defined && energyOk && (!timed || minInterval > 0) && ratingRatio >= rr.ratio();
        } else {
            pass = defined && energyOk && (!timed || minInterval > 0);
        }
    }

    private void visit(SegmentWalk.Segment s) {
        double mid = s.midAmps();
        double right = s.rightAmps();
        if (!up.isDefinedAt(mid) || !down.isDefinedAt(mid)) {
            scan.interrupt(Double.NaN);
            // the energies' own ends are split points: defined in the middle is defined throughout
            if (energyDefined(mid)) {
                energySpan.add(s.a(), s.b());
                LogAxis.Point p = LogAxis.minimum(energyRatio, s.xa(), s.xb());
                energy.offer(p.x(), p.value(), s);
            } else {
                undefined.add(s.a(), s.b());
            }
            return;
        }
        double upRight = upTime(right);
        double downRight = downTime(right);
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
        if (afterGap && LogAxis.divergesAt(downTime, s.xa())) {
            // the downstream curve's asymptote at its pickup: the interval has no lower bound there
            interval.unbounded(s.a(), s.first());
            seg = trimmed.setFrom(s, Math.min(s.xb(), s.xa() + LogAxis.DIVERGENCE_PROBE));
        }
        // the times at the segment's ends, the upper end's from the walk where its current is the same
        boolean atRight = right == Math.exp(seg.xb());
        double upB = atRight ? upRight : upTime(Math.exp(seg.xb()));
        double downB = atRight ? downRight : downTime(Math.exp(seg.xb()));
        double ampsA = Math.exp(seg.xa());
        double upA = upTime(ampsA);
        double downA = downTime(ampsA);
        boolean settled = upA == upB && downA == downB ? flatSegment(seg, upA, downA, upB, downB)
                : fallingSegment(seg, upA, downA, upB, downB);
        if (!settled) {
            scan.scan(seg);
        }
        interval.offer(scan.minimumX(0), scan.minimumValue(0), seg);
    }

    /** The fuse behind a device, also when it was referred to another voltage; null if none. */
    private static Fuse fuse(ProtectiveDevice d) {
        if (d instanceof Fuse f) {
            return f;
        }
        return d instanceof BandDevice b && b.source() instanceof Fuse f ? f : null;
    }

    /**
     * Whether a segment on which both curves have the same time at both ends (the caller compares
     * them) is settled from its ends: since no curve's computed time rises with current, they
     * have the same time at every current between, the interval and the log ratio are the same at
     * every scan point, and the scan's answer is known from the ends (see
     * {@link SmoothScan#flat}). False, for the scan to decide, where a time is not finite, the
     * curves meet, or the segment is so narrow that a falling time could round to the same value
     * at both ends.
     */
    private boolean flatSegment(SegmentWalk.Segment seg, double tuA, double tdA, double tuB, double tdB) {
        // on a narrower segment a falling time could round to equal values at both ends
        if (plain || !((seg.xb() - seg.xa()) / (LogAxis.SCAN_POINTS - 1) >= MIN_STEP)) {
            return false;
        }
        if (!Double.isFinite(tuA) || !Double.isFinite(tdA)) {
            return false;
        }
        fill(atStart, tuA, tdA);
        fill(atEnd, tuB, tdB);
        if (!(atStart[1] != 0) || Double.isNaN(atStart[1])) {
            return false;
        }
        if (!scan.flat(seg, atStart, atEnd)) {
            return false;
        }
        flatSegments++;
        return true;
    }

    /**
     * Whether a segment on which the upstream time provably falls faster than the downstream one
     * can is settled from its ends: over a step Δ in ln I the upstream time falls by at least
     * {@code f Δ} times its value at the segment's end, f its curve's
     * {@link TimeCurrentCurve#logSlopeFloor}, and the downstream time by at most {@code s Δ} times
     * its value at the start, s its curve's {@link TimeCurrentCurve#logSlopeBound} (0 where it is
     * flat). Where {@code f tu(end) > s td(start)} the interval falls at every scan step, and the
     * log ratio, of the interval's sign, keeps the sign its ends share. The scan's answer is then
     * the upper end (see {@link SmoothScan#falling}). False, for the scan to decide, where that
     * fall is not far above rounding, a time is not finite, or the curves meet.
     */
    private boolean fallingSegment(SegmentWalk.Segment seg, double tuA, double tdA, double tuB, double tdB) {
        double step = (seg.xb() - seg.xa()) / (LogAxis.SCAN_POINTS - 1);
        if (plain || !(step >= MIN_STEP) || !(tuB > 0)) {
            return false;
        }
        double ampsA = Math.exp(seg.xa());
        double ampsB = Math.exp(seg.xb());
        if (!(tdA >= 0) || !Double.isFinite(tdA) || !Double.isFinite(tuA)) {
            return false;
        }
        double floor = up.logSlopeFloor(ampsA, ampsB);
        if (!(floor > 0) || !Double.isFinite(floor)) {
            return false;
        }
        double bound = tdA == tdB ? 0.0 : down.logSlopeBound(ampsA, ampsB);
        // each step's fall, far above the rounding of values of the size met on the segment
        if (!((floor * tuB - bound * tdA) * step > STRICT_FALL * Math.max(tuA, tdA))) {
            return false;
        }
        fill(atStart, tuA, tdA);
        fill(atEnd, tuB, tdB);
        boolean oneSign = atStart[1] > 0 && atEnd[1] > 0 || atStart[1] < 0 && atEnd[1] < 0;
        if (!oneSign || !scan.falling(seg, atStart, atEnd)) {
            return false;
        }
        fallingSegments++;
        return true;
    }

    private void sample(double x, double[] values) {
        double amps = Math.exp(x);
        fill(values, upTime(amps), downTime(amps));
    }

    // the interval and the log ratio from the two times, as the scan samples them
    private static void fill(double[] values, double tu, double td) {
        values[0] = tu - td;
        values[1] = Math.log(tu) - Math.log(td);
    }

    private void split() {
        splits.start(fromAmps, toAmps);
        splits.addAll(upBreaks.of(up));
        splits.addAll(downBreaks.of(down));
        splits.add(up.lowestDefinedAmps());
        splits.add(up.highestDefinedAmps());
        splits.add(down.lowestDefinedAmps());
        splits.add(down.highestDefinedAmps());
        splits.add(downstream.letThroughFromAmps());
        splits.addAll(preArcingBreaks.of(preArcing));
        splits.addAll(letThroughBreaks.of(letThrough));
        splits.finish();
        segments.fill(splits.points(), splits.count());
    }
}
