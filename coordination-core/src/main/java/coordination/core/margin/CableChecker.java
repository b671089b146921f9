package coordination.core.margin;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.LogAxis;
import coordination.core.internal.SegmentWalk;
import coordination.core.internal.SmoothScan;
import coordination.core.internal.SplitPoints;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * A {@link CableCheck} to run again and again: each {@link #run} computes the same check, to the
 * last bit, and keeps its outcome until the next. Its working arrays are kept from run to run, so
 * that checking the same devices again (other cables, other ranges) allocates nothing once they
 * have grown to the checks' size; only {@link #result()} builds a record. The breakpoints of the
 * last device and cable are kept by identity, as curves and cables do not change. One thread's:
 * a checker is not safe for concurrent use.
 *
 * <p>A segment that no shortcut settles is scanned, and the solvers of Apache Commons Math that
 * refine its minima and roots allocate their own objects.
 */
public final class CableChecker {
    private static final double[] WINDOW_EDGES_SECONDS = {CableThermalLimit.ADIABATIC_MIN_SECONDS,
        CableThermalLimit.ADIABATIC_MAX_SECONDS};
    private static final double[] LOG_WINDOW_EDGES = {Math.log(CableThermalLimit.ADIABATIC_MIN_SECONDS),
        Math.log(CableThermalLimit.ADIABATIC_MAX_SECONDS)};
    /** Relative distance from a window edge beyond which no rounding puts a time on its other side. */
    private static final double EDGE_CLEARANCE = 1e-9;
    /** Narrowest scan step, in ln(I), on which a steady device's segment is taken from its ends. */
    private static final double MIN_STEADY_STEP = 1e-6;
    /** Fall per scan step, relative to the values' size, that no rounding of them can undo. */
    private static final double STRICT_FALL = 1e-12;

    private final boolean plain;
    private final CurveMemory memory = new CurveMemory(null);
    private final SmoothScan scan;
    private final RunningMinimum margin = new RunningMinimum();
    private final RunningMinimum ratio = new RunningMinimum();
    private final CurrentSpan notCleared = new CurrentSpan();
    private final CurrentSpan undefined = new CurrentSpan();
    private final SplitPoints splits = new SplitPoints();
    private final SegmentWalk segments = new SegmentWalk();
    private final SegmentWalk.Segment segment = new SegmentWalk.Segment();
    private final SegmentWalk.Segment trimmed = new SegmentWalk.Segment();
    // the functions' values at a segment's ends, reused from segment to segment
    private final double[] atStart = new double[2];
    private final double[] atEnd = new double[2];
    private final DoubleUnaryOperator deviceTime = this::deviceTimeAt;
    private final DoubleUnaryOperator edgeFunction = this::edgeDistance;
    private double edgeLogLimit;
    // the method used in each part of the range, merged where it is the same
    private double[] regionFrom = new double[4];
    private double[] regionTo = new double[4];
    private String[] regionMethod = new String[4];
    private int regionCount;
    // the breakpoints of the last curve, let-through and cable, which do not change
    private final KeptBreakpoints curveBreaks = new KeptBreakpoints();
    private final KeptBreakpoints letThroughBreaks = new KeptBreakpoints();
    private final KeptBreakpoints cableBreaks = new KeptBreakpoints();

    private ProtectiveDevice device;
    private CableThermalLimit cable;
    private double fromAmps;
    private double toAmps;
    private MarginRequirement requirement;
    private DcOffset dcOffset;
    private TimeCurrentCurve curve;
    private LetThroughEnergy letThrough;
    private double letThroughFrom;
    private double adiabaticI2t;
    private boolean pass;
    private double minRatio;
    private int steadySegments;
    private int shapedSegments;

    /** Creates a checker. */
    public CableChecker() {
        this(false);
    }

    /**
     * Creates a checker; with {@code plain} every segment is scanned, every curve time computed
     * afresh and every segment searched for a window edge: the reference the tests hold the
     * shortcuts to.
     */
    CableChecker(boolean plain) {
        this.plain = plain;
        this.scan = new SmoothScan(this::sampleDevice, new DoubleUnaryOperator[] {this::margin, this::logRatio}, 2, 1);
    }

    /**
     * Runs a check, as {@link CableCheck} does.
     *
     * @param device the protective device; its maximum curve is checked
     * @param cable the cable
     * @param fromAmps lowest prospective fault current in amperes, above 0
     * @param toAmps highest prospective fault current in amperes, at or above {@code fromAmps}
     * @param requirement the margin asked for
     * @param dcOffset DC-offset heating, or null to leave it out
     * @return whether the device protects the cable over the whole range with that margin
     * @throws IllegalArgumentException if the range is invalid
     */
    public boolean run(ProtectiveDevice device, CableThermalLimit cable, double fromAmps, double toAmps,
            MarginRequirement requirement, DcOffset dcOffset) {
        Checks.given("cable check: device", device);
        Checks.given("cable check: cable", cable);
        Checks.given("cable check: requirement", requirement);
        Checks.currentRange("check range", fromAmps, toAmps);
        this.device = device;
        this.cable = cable;
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        this.requirement = requirement;
        this.dcOffset = dcOffset;
        this.curve = device.maximumCurve();
        this.letThrough = device.letThrough().orElse(null);
        this.letThroughFrom = device.letThroughFromAmps();
        this.adiabaticI2t = cable.method() == ThermalMethod.NON_ADIABATIC ? Double.NaN : cable.i2tA2s();
        memory.reset(curve);
        steadySegments = 0;
        shapedSegments = 0;
        compute();
        return pass;
    }

    /**
     * The last run's outcome as a record.
     *
     * @return the result
     * @throws IllegalStateException before the first run
     */
    public CableCheckResult result() {
        if (device == null) {
            throw new IllegalStateException("cable checker: no check has run");
        }
        List<ThermalRegion> regions = new ArrayList<>(regionCount);
        for (int i = 0; i < regionCount; i++) {
            regions.add(new ThermalRegion(regionFrom[i], regionTo[i], regionMethod[i]));
        }
        return new CableCheckResult(device.id(), cable.id(), fromAmps, toAmps, requirement, pass, margin.value(),
                margin.at(), margin.side(), minRatio, ratio.at(), ratio.side(), scan.crossingsAmps(),
                notCleared.from(), notCleared.to(), undefined.from(), undefined.to(), regions);
    }

    /** @return whether the last check passed */
    public boolean pass() {
        return pass;
    }

    /** @return the last check's minimum of t_cable - t_device in seconds, NaN if it clears nowhere */
    public double minMarginSeconds() {
        return margin.value();
    }

    /** @return the current of that minimum in amperes */
    public double minMarginAtAmps() {
        return margin.at();
    }

    /** @return the side of {@link #minMarginAtAmps()} on which it occurs */
    public Side minMarginSide() {
        return margin.side();
    }

    /** @return the last check's minimum of t_cable / t_device, NaN if it clears nowhere */
    public double minRatio() {
        return minRatio;
    }

    /** @return the current of that minimum in amperes */
    public double minRatioAtAmps() {
        return ratio.at();
    }

    /** @return the side of {@link #minRatioAtAmps()} on which it occurs */
    public Side minRatioSide() {
        return ratio.side();
    }

    /** @return how many times the device curve crosses the damage curve in the last check */
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

    /** @return the lowest current of the last range at which the device does not clear, or NaN */
    public double notClearedFromAmps() {
        return notCleared.from();
    }

    /** @return the highest such current, or NaN */
    public double notClearedToAmps() {
        return notCleared.to();
    }

    /** @return the lowest current of the last range at which the device curve has no value, or NaN */
    public double undefinedFromAmps() {
        return undefined.from();
    }

    /** @return the highest such current, or NaN */
    public double undefinedToAmps() {
        return undefined.to();
    }

    /** @return how many segments of a steady device time the last run took from their ends */
    int steadySegments() {
        return steadySegments;
    }

    /** @return how many segments the last run took from their ends by the curve's slope bound */
    int shapedSegments() {
        return shapedSegments;
    }

    double curveSeconds(double amps) {
        return CurveMemory.of(curve, amps);
    }

    boolean usesLetThrough(double amps) {
        return letThroughStated(amps) && usesLetThrough(amps, curveSeconds(amps));
    }

    private boolean letThroughStated(double amps) {
        return letThrough != null && amps >= letThroughFrom && letThrough.isDefinedAt(amps);
    }

    // t is the curve's time at amps, NaN where the curve has no value
    private boolean usesLetThrough(double amps, double t) {
        if (!letThroughStated(amps)) {
            return false;
        }
        if (!Double.isNaN(t)) {
            return t <= CableThermalLimit.ADIABATIC_MIN_SECONDS;
        }
        return amps > curve.highestDefinedAmps();
    }

    double deviceSeconds(double amps) {
        return deviceSeconds(amps, curveSeconds(amps));
    }

    private double deviceSeconds(double amps, double t) {
        return usesLetThrough(amps, t) ? letThrough.a2s(amps) / (amps * amps) : t;
    }

    double equivalentSeconds(double amps) {
        return equivalentSeconds(amps, curveSeconds(amps));
    }

    private double equivalentSeconds(double amps, double t) {
        if (usesLetThrough(amps, t)) {
            return letThrough.a2s(amps) / (amps * amps);
        }
        if (dcOffset != null && t > 0 && Double.isFinite(t)) {
            return t * (1 + dcOffset.m(t));
        }
        return t;
    }

    // the curve's time, remembered during the check unless it is the plain reference
    private double remembered(double amps) {
        return plain ? curveSeconds(amps) : memory.seconds(amps);
    }

    // the cable's damage time with k²S² computed once per check
    private double cableSeconds(double amps) {
        return Double.isNaN(adiabaticI2t) ? cable.damageSeconds(amps) : adiabaticI2t / (amps * amps);
    }

    private void compute() {
        margin.reset();
        ratio.reset();
        notCleared.reset();
        undefined.reset();
        regionCount = 0;
        scan.reset(fromAmps, toAmps);
        split();
        for (int i = 0; i < segments.count(); i++) {
            visit(segments.load(i, segment));
        }
        scan.finish();
        boolean clearsEverywhere = notCleared.isEmpty() && undefined.isEmpty();
        // no finite minimum where the device does not clear or slows without bound: both say so
        minRatio = ratio.value() == Double.NEGATIVE_INFINITY ? Double.NaN : Math.exp(ratio.value());
        pass = clearsEverywhere && !Double.isNaN(margin.value()) && requirement.isMetBy(margin.value(), minRatio);
    }

    private void visit(SegmentWalk.Segment s) {
        double mid = s.midAmps();
        double right = s.rightAmps();
        double tMid = deviceSeconds(mid, remembered(mid));
        double tRight = deviceSeconds(right, remembered(right));
        if (Double.isNaN(tMid) || Double.isNaN(tRight)) {
            undefined.add(s.a(), s.b());
            addRegion(s.a(), s.b(), ThermalRegion.UNDEFINED);
            scan.interrupt(Double.NaN);
            return;
        }
        if (Double.isInfinite(tRight)) {
            notCleared.add(s.a(), s.b());
            addRegion(s.a(), s.b(), ThermalRegion.NOT_CLEARED);
            scan.interrupt(Double.NEGATIVE_INFINITY);
            return;
        }
        addRegion(s.a(), s.b(), method(mid, tMid));
        SegmentWalk.Segment seg = s;
        // a pole can only sit where the device starts to operate: at the range start or after a gap
        boolean afterGap = s.first() || scan.previous() == Double.NEGATIVE_INFINITY;
        if (afterGap && LogAxis.divergesAt(deviceTime, s.xa())) {
            // an inverse stage's asymptote at its pickup: the margin has no lower bound there
            margin.unbounded(s.a(), s.first());
            ratio.unbounded(s.a(), s.first());
            if (s.first() && Double.isInfinite(deviceSeconds(s.a(), remembered(s.a())))) {
                notCleared.add(s.a(), s.a());
            }
            seg = trimmed.setFrom(s, Math.min(s.xb(), s.xa() + LogAxis.DIVERGENCE_PROBE));
        }
        if (!fallingSegment(seg)) {
            scan.scan(seg);
        }
        margin.offer(scan.minimumX(0), scan.minimumValue(0), seg);
        ratio.offer(scan.minimumX(1), scan.minimumValue(1), seg);
    }

    /** Fills the margin and the log ratio at x and returns the device's equivalent time there. */
    private void sampleDevice(double x, double[] values) {
        sampleDeviceAt(Math.exp(x), values);
    }

    private double sampleDeviceAt(double amps, double[] values) {
        double te = equivalentSeconds(amps, remembered(amps));
        double tc = cableSeconds(amps);
        values[0] = tc - te;
        values[1] = te == 0.0 ? Double.POSITIVE_INFINITY : Math.log(tc / te);
        return te;
    }

    /**
     * Whether a segment is shown to have a strictly falling margin and log ratio, so that the
     * scan's answer is known from the ends (see {@link SmoothScan#falling}), which then holds it.
     * Against an adiabatic limit k²S²/I², over a step Δ in ln I the cable's time falls by at least
     * 2Δ times its value at the segment's end and its log by 2Δ; the device's log time falls by at
     * most s Δ, where s is the curve's {@link TimeCurrentCurve#logSlopeBound}, and so its time by
     * at most s Δ times its value at the start. Both falls win when {@code 2 tc(end) > s te(start)}
     * and s &lt; 2. A device whose time is the same at both ends is steady throughout (s = 0),
     * since a device's time never rises with current; that holds with a DC offset too. False, for
     * the scan to decide, wherever this is not shown beyond rounding: a let-through energy that may
     * take over inside, a non-adiabatic cable, a DC offset on a curve that is not steady, a time of
     * 0 or infinity, a crossing, a curve without a bound, or a segment so narrow that neighbouring
     * scan points could round to equal values.
     */
    private boolean fallingSegment(SegmentWalk.Segment seg) {
        if (plain || letThrough != null || Double.isNaN(adiabaticI2t)) {
            return false;
        }
        double step = (seg.xb() - seg.xa()) / (LogAxis.SCAN_POINTS - 1);
        if (!(step >= MIN_STEADY_STEP)) {
            return false;
        }
        double ampsA = Math.exp(seg.xa());
        double ampsB = Math.exp(seg.xb());
        double ta = sampleDeviceAt(ampsA, atStart);
        double tb = sampleDeviceAt(ampsB, atEnd);
        if (!(ta > 0) || !Double.isFinite(ta) || !(tb > 0) || !Double.isFinite(tb)) {
            return false;
        }
        boolean oneSign = atStart[1] > 0 && atEnd[1] > 0 || atStart[1] < 0 && atEnd[1] < 0;
        if (!oneSign || !Double.isFinite(atStart[1]) || !Double.isFinite(atEnd[1])) {
            return false;
        }
        // the curve's own times equal too, not only the DC-offset equivalents made of them
        boolean steady = ta == tb && remembered(ampsA) == remembered(ampsB);
        double slope;
        if (steady) {
            slope = 0.0;
        } else if (dcOffset == null) {
            slope = curve.logSlopeBound(ampsA, ampsB);
        } else {
            return false;
        }
        if (!(slope < 2)) {
            return false;
        }
        // each step's fall, far above the rounding of values of the size met on the segment
        double tcStart = cableSeconds(ampsA);
        double tcEnd = cableSeconds(ampsB);
        boolean marginFalls = (2 * tcEnd - slope * ta) * step > STRICT_FALL * Math.max(tcStart, ta);
        boolean ratioFalls = (2 - slope) * step
                > STRICT_FALL * Math.max(1.0, Math.max(Math.abs(atStart[1]), Math.abs(atEnd[1])));
        if (!(marginFalls && ratioFalls) || !scan.falling(seg, atStart, atEnd)) {
            return false;
        }
        if (steady) {
            steadySegments++;
        } else {
            shapedSegments++;
        }
        return true;
    }

    private double deviceTimeAt(double x) {
        double amps = Math.exp(x);
        return deviceSeconds(amps, remembered(amps));
    }

    private double margin(double x) {
        double amps = Math.exp(x);
        return cableSeconds(amps) - equivalentSeconds(amps, remembered(amps));
    }

    private double logRatio(double x) {
        double amps = Math.exp(x);
        double te = equivalentSeconds(amps, remembered(amps));
        if (te == 0.0) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.log(cableSeconds(amps) / te);
    }

    private String method(double amps, double deviceSeconds) {
        if (usesLetThrough(amps, remembered(amps))) {
            return ThermalRegion.ENERGY_LET_THROUGH;
        }
        if (deviceSeconds < CableThermalLimit.ADIABATIC_MIN_SECONDS) {
            return dcOffset != null ? ThermalRegion.ENERGY_DC_OFFSET : ThermalRegion.ENERGY;
        }
        if (cable.method() == ThermalMethod.ICEA) {
            return ThermalRegion.ICEA;
        }
        if (cable.method() == ThermalMethod.NON_ADIABATIC) {
            return cable.beyondNonAdiabaticScope(amps) ? ThermalRegion.OUTSIDE_IEC_60949 : ThermalRegion.NON_ADIABATIC;
        }
        return deviceSeconds > CableThermalLimit.ADIABATIC_MAX_SECONDS ? ThermalRegion.ADIABATIC_CONSERVATIVE
                : ThermalRegion.ADIABATIC;
    }

    private void addRegion(double a, double b, String method) {
        if (regionCount > 0 && regionMethod[regionCount - 1].equals(method)) {
            regionTo[regionCount - 1] = b;
            return;
        }
        if (regionCount == regionFrom.length) {
            regionFrom = Arrays.copyOf(regionFrom, 2 * regionCount);
            regionTo = Arrays.copyOf(regionTo, 2 * regionCount);
            regionMethod = Arrays.copyOf(regionMethod, 2 * regionCount);
        }
        regionFrom[regionCount] = a;
        regionTo[regionCount] = b;
        regionMethod[regionCount] = method;
        regionCount++;
    }

    /**
     * Whether both times lie on the same side of each window edge by far more than the rounding of
     * their logarithms, so that the root search would find no edge between them.
     */
    private static boolean clearOfWindowEdges(double tA, double tB) {
        for (double limit : WINDOW_EDGES_SECONDS) {
            boolean above = tA > limit * (1 + EDGE_CLEARANCE) && tB > limit * (1 + EDGE_CLEARANCE);
            boolean below = tA < limit * (1 - EDGE_CLEARANCE) && tB < limit * (1 - EDGE_CLEARANCE);
            if (!above && !below) {
                return false;
            }
        }
        return true;
    }

    // the log clearing time's distance from the window edge being searched for
    private double edgeDistance(double x) {
        double amps = Math.exp(x);
        return Math.log(remembered(amps)) - edgeLogLimit;
    }

    /**
     * Splits the range at its ends, the device's and the cable's breakpoints inside, the
     * let-through's, and the window edges, the currents where the clearing time passes 0.1 s and
     * 5 s inside a smooth segment, and makes the segments between them.
     */
    private void split() {
        splits.start(fromAmps, toAmps);
        splits.addAll(curveBreaks.of(curve));
        splits.add(curve.lowestDefinedAmps());
        splits.add(curve.highestDefinedAmps());
        splits.add(letThroughFrom);
        splits.addAll(letThroughBreaks.of(letThrough));
        splits.addAll(cableBreaks.of(cable));
        splits.finish();
        segments.fill(splits.points(), splits.count());
        int before = splits.count();
        for (int i = 0; i < segments.count(); i++) {
            SegmentWalk.Segment s = segments.load(i, segment);
            if (!(s.xb() > s.xa()) || Double.isNaN(remembered(s.midAmps()))) {
                continue;
            }
            // the clearing time never rises with current, so each limit is passed at most once per segment
            double tA = remembered(Math.exp(s.xa()));
            double tB = remembered(Math.exp(s.xb()));
            if (!plain && clearOfWindowEdges(tA, tB)) {
                continue;
            }
            double logA = Math.log(tA);
            double logB = Math.log(tB);
            for (double logLimit : LOG_WINDOW_EDGES) {
                edgeLogLimit = logLimit;
                double r = LogAxis.monotoneRoot(edgeFunction, s.xa(), s.xb(), logA - logLimit, logB - logLimit);
                if (!Double.isNaN(r)) {
                    // past the base points: the range's ends and the others found are in place
                    splits.add(Math.exp(r));
                }
            }
        }
        if (splits.count() != before) {
            splits.finish();
            segments.fill(splits.points(), splits.count());
        }
    }
}
