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
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

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
 * <p>The comparison is of heating: with a {@link DcOffset} the device's time is increased at every
 * duration to the thermally equivalent {@code (1 + m) t} of IEC 60909-0, the heating of the decaying
 * DC component. Below 0.1 s it is the comparison of let-through energy, I² t_device against k²S².
 * Where the device's maker states its let-through energy (a current-limiting fuse beyond its
 * digitised curve or wherever it clears within 0.1 s, an energy-limiting breaker above its
 * instantaneous multiple), that energy is compared with k²S² directly, without the DC-offset
 * factor, which the maker's figure already contains. Above 5 s the adiabatic limit is
 * conservative and reported as such; the non-adiabatic method credits heat loss only up to 5 s.
 */
public final class CableCheck {
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

    private final ProtectiveDevice device;
    private final CableThermalLimit cable;
    private final double fromAmps;
    private final double toAmps;
    private final MarginRequirement requirement;
    private final DcOffset dcOffset;
    private final TimeCurrentCurve curve;
    private final LetThroughEnergy letThrough;
    private final double letThroughFrom;
    private final double adiabaticI2t;
    private final boolean plain;
    private int steadySegments;
    private int shapedSegments;
    // the edge search's segments, walked again by the check where the search added no split point
    private SegmentWalk.Segment[] searchedSegments;
    private final CurveMemory memory;
    // the functions' values at a segment's ends, reused from segment to segment
    private final double[][] endValues = new double[2][2];
    private final CableCheckResult result;

    /**
     * Runs the check.
     *
     * @param device the protective device; its maximum curve is checked
     * @param cable the cable
     * @param fromAmps lowest prospective fault current in amperes, above 0
     * @param toAmps highest prospective fault current in amperes, at or above {@code fromAmps}
     * @param requirement the margin asked for
     * @param dcOffset DC-offset heating, or null to leave it out
     * @throws IllegalArgumentException if the range is invalid
     */
    public CableCheck(ProtectiveDevice device, CableThermalLimit cable, double fromAmps, double toAmps,
            MarginRequirement requirement, DcOffset dcOffset) {
        this(device, cable, fromAmps, toAmps, requirement, dcOffset, false);
    }

    /**
     * As the public constructor; with {@code plain} every segment is scanned, every curve time
     * computed afresh and every segment searched for a window edge: the reference the tests hold
     * the shortcuts to.
     */
    CableCheck(ProtectiveDevice device, CableThermalLimit cable, double fromAmps, double toAmps,
            MarginRequirement requirement, DcOffset dcOffset, boolean plain) {
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
        this.plain = plain;
        this.memory = plain ? null : new CurveMemory(curve);
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

    /** @return how many segments of a steady device time were taken from their ends, for tests */
    int steadySegments() {
        return steadySegments;
    }

    /** @return how many segments were taken from their ends by the curve's slope bound, for tests */
    int shapedSegments() {
        return shapedSegments;
    }

    /**
     * The device's clearing time from its curve.
     *
     * @param amps current in amperes
     * @return seconds, infinity where it does not clear, NaN where the curve has no value
     */
    public double curveSeconds(double amps) {
        return CurveMemory.of(curve, amps);
    }

    /**
     * Whether the maker's let-through energy decides the check at a current: it is stated there,
     * and the device limits the current (clears within 0.1 s, or lies beyond its digitised curve).
     *
     * @param amps current in amperes
     * @return true where the let-through energy is compared with k²S²
     */
    public boolean usesLetThrough(double amps) {
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

    /**
     * The device's clearing time, or where its let-through energy decides, the time a steady
     * current needs to let that energy through.
     *
     * @param amps current in amperes
     * @return seconds, infinity where it does not clear, NaN where it has no value
     */
    public double deviceSeconds(double amps) {
        return deviceSeconds(amps, curveSeconds(amps));
    }

    private double deviceSeconds(double amps, double t) {
        return usesLetThrough(amps, t) ? letThrough.a2s(amps) / (amps * amps) : t;
    }

    /**
     * The device's thermally equivalent time: its clearing time times {@code (1 + m)} for the
     * DC-offset heating when one is given; the let-through time as it is.
     *
     * @param amps current in amperes
     * @return seconds
     */
    public double equivalentSeconds(double amps) {
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
        return memory == null ? curveSeconds(amps) : memory.seconds(amps);
    }

    // the cable's damage time with k²S² computed once per check
    private double cableSeconds(double amps) {
        return Double.isNaN(adiabaticI2t) ? cable.damageSeconds(amps) : adiabaticI2t / (amps * amps);
    }

    private CableCheckResult compute() {
        RunningMinimum margin = new RunningMinimum();
        RunningMinimum ratio = new RunningMinimum();
        CurrentSpan notCleared = new CurrentSpan();
        CurrentSpan undefined = new CurrentSpan();
        List<ThermalRegion> regions = new ArrayList<>();
        SmoothScan scan = new SmoothScan(this::sampleDevice, new DoubleUnaryOperator[] {this::margin, this::logRatio},
                2, 1, fromAmps, toAmps);
        walkSegments(s -> {
            double mid = s.midAmps();
            double right = s.rightAmps();
            double tMid = deviceSeconds(mid, remembered(mid));
            double tRight = deviceSeconds(right, remembered(right));
            if (Double.isNaN(tMid) || Double.isNaN(tRight)) {
                undefined.add(s.a(), s.b());
                addRegion(regions, s.a(), s.b(), ThermalRegion.UNDEFINED);
                scan.interrupt(Double.NaN);
                return;
            }
            if (Double.isInfinite(tRight)) {
                notCleared.add(s.a(), s.b());
                addRegion(regions, s.a(), s.b(), ThermalRegion.NOT_CLEARED);
                scan.interrupt(Double.NEGATIVE_INFINITY);
                return;
            }
            addRegion(regions, s.a(), s.b(), method(mid, tMid));
            SegmentWalk.Segment seg = s;
            // a pole can only sit where the device starts to operate: at the range start or after a gap
            boolean afterGap = s.first() || scan.previous() == Double.NEGATIVE_INFINITY;
            if (afterGap && divergesAt(s.xa())) {
                // an inverse stage's asymptote at its pickup: the margin has no lower bound there
                margin.unbounded(s.a(), s.first());
                ratio.unbounded(s.a(), s.first());
                if (s.first() && Double.isInfinite(deviceSeconds(s.a(), remembered(s.a())))) {
                    notCleared.add(s.a(), s.a());
                }
                seg = s.from(Math.min(s.xb(), s.xa() + LogAxis.DIVERGENCE_PROBE));
            }
            LogAxis.Point[] minima = fallingSegment(scan, seg);
            if (minima == null) {
                minima = scan.scan(seg);
            }
            margin.offer(minima[0], seg);
            ratio.offer(minima[1], seg);
        });
        boolean clearsEverywhere = notCleared.isEmpty() && undefined.isEmpty();
        // no finite minimum where the device does not clear or slows without bound: both say so
        double minRatio = ratio.value() == Double.NEGATIVE_INFINITY ? Double.NaN : Math.exp(ratio.value());
        boolean pass = clearsEverywhere && !Double.isNaN(margin.value()) && requirement.isMetBy(margin.value(), minRatio);
        return new CableCheckResult(device.id(), cable.id(), fromAmps, toAmps, requirement, pass, margin.value(),
                margin.at(), margin.side(), minRatio, ratio.at(), ratio.side(), scan.crossingsAmps(),
                notCleared.from(), notCleared.to(), undefined.from(), undefined.to(), regions);
    }

    /** Fills the margin and the log ratio at x and returns the device's equivalent time there. */
    private double sampleDevice(double x, double[] values) {
        return sampleDeviceAt(Math.exp(x), values);
    }

    private double sampleDeviceAt(double amps, double[] values) {
        double te = equivalentSeconds(amps, remembered(amps));
        double tc = cableSeconds(amps);
        values[0] = tc - te;
        values[1] = te == 0.0 ? Double.POSITIVE_INFINITY : Math.log(tc / te);
        return te;
    }

    /**
     * A segment on which the margin and the log ratio are shown to fall strictly, so that the
     * scan's answer is known from the ends (see {@link SmoothScan#falling}). Against an adiabatic
     * limit k²S²/I², over a step Δ in ln I the cable's time falls by at least 2Δ times its value at
     * the segment's end and its log by 2Δ; the device's log time falls by at most s Δ, where s is
     * the curve's {@link TimeCurrentCurve#logSlopeBound}, and so its time by at most s Δ times its
     * value at the start. Both falls win when {@code 2 tc(end) > s te(start)} and s &lt; 2. A
     * device whose time is the same at both ends is steady throughout (s = 0), since a device's
     * time never rises with current; that holds with a DC offset too. Returns null, for the scan to
     * decide, wherever this is not shown beyond rounding: a let-through energy that may take over
     * inside, a non-adiabatic cable, a DC offset on a curve that is not steady, a time of 0 or
     * infinity, a crossing, a curve without a bound, or a segment so narrow that neighbouring scan
     * points could round to equal values.
     */
    private LogAxis.Point[] fallingSegment(SmoothScan scan, SegmentWalk.Segment seg) {
        if (plain || letThrough != null || Double.isNaN(adiabaticI2t)) {
            return null;
        }
        double step = (seg.xb() - seg.xa()) / (LogAxis.SCAN_POINTS - 1);
        if (!(step >= MIN_STEADY_STEP)) {
            return null;
        }
        double[] atStart = endValues[0];
        double[] atEnd = endValues[1];
        double ampsA = Math.exp(seg.xa());
        double ampsB = Math.exp(seg.xb());
        double ta = sampleDeviceAt(ampsA, atStart);
        double tb = sampleDeviceAt(ampsB, atEnd);
        if (!(ta > 0) || !Double.isFinite(ta) || !(tb > 0) || !Double.isFinite(tb)) {
            return null;
        }
        boolean oneSign = atStart[1] > 0 && atEnd[1] > 0 || atStart[1] < 0 && atEnd[1] < 0;
        if (!oneSign || !Double.isFinite(atStart[1]) || !Double.isFinite(atEnd[1])) {
            return null;
        }
        // the curve's own times equal too, not only the DC-offset equivalents made of them
        boolean steady = ta == tb && remembered(ampsA) == remembered(ampsB);
        double slope;
        if (steady) {
            slope = 0.0;
        } else if (dcOffset == null) {
            slope = curve.logSlopeBound(ampsA, ampsB);
        } else {
            return null;
        }
        if (!(slope < 2)) {
            return null;
        }
        // each step's fall, far above the rounding of values of the size met on the segment
        double tcStart = cableSeconds(ampsA);
        double tcEnd = cableSeconds(ampsB);
        boolean marginFalls = (2 * tcEnd - slope * ta) * step > STRICT_FALL * Math.max(tcStart, ta);
        boolean ratioFalls = (2 - slope) * step
                > STRICT_FALL * Math.max(1.0, Math.max(Math.abs(atStart[1]), Math.abs(atEnd[1])));
        LogAxis.Point[] minima = marginFalls && ratioFalls ? scan.falling(seg, atStart, atEnd) : null;
        if (minima != null) {
            if (steady) {
                steadySegments++;
            } else {
                shapedSegments++;
            }
        }
        return minima;
    }

    private boolean divergesAt(double x) {
        return LogAxis.divergesAt(v -> {
            double amps = Math.exp(v);
            return deviceSeconds(amps, remembered(amps));
        }, x);
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

    private static void addRegion(List<ThermalRegion> regions, double a, double b, String method) {
        if (!regions.isEmpty() && regions.get(regions.size() - 1).method().equals(method)) {
            ThermalRegion last = regions.remove(regions.size() - 1);
            regions.add(new ThermalRegion(last.fromAmps(), b, method));
        } else {
            regions.add(new ThermalRegion(a, b, method));
        }
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

    private double logCurveSeconds(double x) {
        double amps = Math.exp(x);
        return Math.log(remembered(amps));
    }

    /** Visits the segments between the split points, the edge search's own where no edge was found. */
    private void walkSegments(SegmentWalk.Visitor visitor) {
        double[] points = splitPoints();
        if (searchedSegments == null) {
            SegmentWalk.walk(points, visitor);
            return;
        }
        for (SegmentWalk.Segment s : searchedSegments) {
            visitor.visit(s);
        }
    }

    /**
     * The range ends, the device's and the cable's breakpoints inside, the let-through's, and the
     * window edges. Where no window edge lies inside a segment, the search's segments are kept in
     * {@link #searchedSegments} for the check's own walk.
     */
    private double[] splitPoints() {
        double[] energy = letThrough == null ? new double[0] : letThrough.breakpointsAmps();
        double[] base = LogAxis.splitPoints(fromAmps, toAmps, curve.breakpointsAmps(),
                new double[] {curve.lowestDefinedAmps(), curve.highestDefinedAmps(), letThroughFrom}, energy,
                cable.breakpointsAmps());
        // window edges: where the clearing time passes 0.1 s and 5 s inside a smooth segment
        double[] edges = new double[2 * base.length];
        SegmentWalk.Segment[] searched = new SegmentWalk.Segment[Math.max(1, base.length - 1)];
        int[] m = {0, 0};
        SegmentWalk.walk(base, s -> {
            searched[m[1]++] = s;
            if (!(s.xb() > s.xa()) || Double.isNaN(remembered(s.midAmps()))) {
                return;
            }
            // the clearing time never rises with current, so each limit is passed at most once per segment
            double tA = remembered(Math.exp(s.xa()));
            double tB = remembered(Math.exp(s.xb()));
            if (!plain && clearOfWindowEdges(tA, tB)) {
                return;
            }
            double logA = Math.log(tA);
            double logB = Math.log(tB);
            for (double logLimit : LOG_WINDOW_EDGES) {
                double r = LogAxis.monotoneRoot(x -> logCurveSeconds(x) - logLimit, s.xa(), s.xb(), logA - logLimit,
                        logB - logLimit);
                if (!Double.isNaN(r)) {
                    edges[m[0]++] = Math.exp(r);
                }
            }
        });
        if (m[0] == 0 && !plain) {
            // no edge inside: the split points are the base ones, and so are the segments
            searchedSegments = searched;
            return base;
        }
        return LogAxis.splitPoints(fromAmps, toAmps, base, Arrays.copyOf(edges, m[0]));
    }
}
