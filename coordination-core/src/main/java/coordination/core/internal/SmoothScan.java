package coordination.core.internal;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * The part of a check that is the same for every check: on each smooth segment, sample a few
 * functions of x = ln(I) at the scan points, refine the minimum of each minimised function with
 * Brent's method, and solve every sign change of the crossing function. A sign change between the
 * end of one segment and the start of the next is a crossing at the step between them. The check
 * supplies the functions; what they mean and what passes stays with it.
 */
public final class SmoothScan {
    /** Fills the values of every function at one point. */
    @FunctionalInterface
    public interface Sampler {
        /**
         * Evaluates the functions.
         *
         * @param x ln(I)
         * @param values receives the value of function k at index k
         */
        void sample(double x, double[] values);
    }

    private final Sampler sampler;
    private final DoubleUnaryOperator[] functions;
    private final int minimised;
    private final int crossing;
    private double fromAmps;
    private double toAmps;
    private double[] crossings = new double[4];
    private int crossingCount;
    private double previous = Double.NaN;
    // buffers reused from segment to segment and from check to check
    private final double[] xs = new double[LogAxis.SCAN_POINTS];
    private final double[][] values;
    private final double[] at;
    private final double[] atProbe;
    private final double[] minimumX;
    private final double[] minimumValue;

    /**
     * Creates a scan.
     *
     * @param sampler evaluates all functions at once, from one evaluation of each curve
     * @param functions the same functions one at a time, for the solvers, each giving the
     *     sampler's value to the last bit
     * @param minimised how many functions, from index 0, are minimised
     * @param crossing index of the function whose sign changes are crossings
     */
    public SmoothScan(Sampler sampler, DoubleUnaryOperator[] functions, int minimised, int crossing) {
        this.sampler = sampler;
        this.functions = functions.clone();
        this.minimised = minimised;
        this.crossing = crossing;
        this.values = new double[functions.length][LogAxis.SCAN_POINTS];
        this.at = new double[functions.length];
        this.atProbe = new double[functions.length];
        this.minimumX = new double[minimised];
        this.minimumValue = new double[minimised];
    }

    /**
     * Starts a new range: no crossing found, nothing known before its start.
     *
     * @param fromAmps lower end of the range in amperes; roots at the ends are not crossings
     * @param toAmps upper end of the range in amperes
     */
    public void reset(double fromAmps, double toAmps) {
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        crossingCount = 0;
        previous = Double.NaN;
    }

    /**
     * The x = ln(I) of the last segment's minimum of a minimised function.
     *
     * @param f the function's index
     * @return x
     */
    public double minimumX(int f) {
        return minimumX[f];
    }

    /**
     * The last segment's minimum of a minimised function.
     *
     * @param f the function's index
     * @return the value
     */
    public double minimumValue(int f) {
        return minimumValue[f];
    }

    /**
     * Scans a smooth segment; the minimum found on it of each minimised function is then given by
     * {@link #minimumX} and {@link #minimumValue}.
     *
     * @param s the segment, with its evaluated lower end
     */
    public void scan(SegmentWalk.Segment s) {
        for (int i = 0; i < xs.length; i++) {
            xs[i] = LogAxis.scanPoint(s.xa(), s.xb(), i);
        }
        for (int k = 0; k < xs.length; k++) {
            sampler.sample(xs[k], at);
            for (int f = 0; f < at.length; f++) {
                values[f][k] = at[f];
            }
        }
        double[] c = values[crossing];
        if (!s.first() && !Double.isNaN(previous) && crosses(previous, c[0])) {
            addCrossing(s.a());
        }
        for (int f = 0; f < minimised; f++) {
            LogAxis.Point p = LogAxis.minimum(functions[f], xs, values[f]);
            minimumX[f] = p.x();
            minimumValue[f] = p.value();
        }
        for (double root : LogAxis.roots(functions[crossing], xs, c)) {
            double amps = Math.exp(root);
            if (amps > fromAmps && amps < toAmps) {
                addCrossing(amps);
            }
        }
        previous = c[c.length - 1];
    }

    /**
     * Takes a segment on which the caller has shown, from the curves' forms, that every function
     * falls strictly from one scan point to the next and that the crossing function keeps one
     * sign. The scan of such a segment finds each minimum at the upper end, has no root, and asks
     * only whether each function falls when moving inwards from that end; this asks the same with
     * the same probes, so the result is the scan's to the last bit without the points in between.
     *
     * @param s the segment
     * @param atStart the functions' values at its lower end, as the sampler gives them
     * @param atEnd the functions' values at its upper end
     * @return whether the minima are as {@link #scan} gives them; false where a probe finds a
     *     lower value, and the caller should scan the segment
     */
    public boolean falling(SegmentWalk.Segment s, double[] atStart, double[] atEnd) {
        int last = LogAxis.SCAN_POINTS - 1;
        double xb = LogAxis.scanPoint(s.xa(), s.xb(), last);
        double probe = LogAxis.inwardProbe(xb, LogAxis.scanPoint(s.xa(), s.xb(), last - 1));
        sampler.sample(probe, atProbe);
        for (int f = 0; f < minimised; f++) {
            if (atProbe[f] < atEnd[f]) {
                return false;
            }
        }
        for (int f = 0; f < minimised; f++) {
            minimumX[f] = xb;
            minimumValue[f] = atEnd[f];
        }
        if (!s.first() && !Double.isNaN(previous) && crosses(previous, atStart[crossing])) {
            addCrossing(s.a());
        }
        previous = atEnd[crossing];
        return true;
    }

    /**
     * Takes a segment on which the caller has shown that every function has the same value at
     * every scan point, and that the crossing function is not zero there. The scan of such a
     * segment finds each minimum at the lower end, has no root, and asks only whether each function
     * falls when moving inwards from either end; this asks the same with the same probes, so the
     * result is the scan's to the last bit without the points in between.
     *
     * @param s the segment
     * @param atStart the functions' values at its lower end, as the sampler gives them
     * @param atEnd the functions' values at its upper end, the same
     * @return whether the minima are as {@link #scan} gives them; false where a probe finds a
     *     lower value, and the caller should scan the segment
     */
    public boolean flat(SegmentWalk.Segment s, double[] atStart, double[] atEnd) {
        int last = LogAxis.SCAN_POINTS - 1;
        double xa = LogAxis.scanPoint(s.xa(), s.xb(), 0);
        double xb = LogAxis.scanPoint(s.xa(), s.xb(), last);
        double probeA = LogAxis.inwardProbe(xa, LogAxis.scanPoint(s.xa(), s.xb(), 1));
        double probeB = LogAxis.inwardProbe(xb, LogAxis.scanPoint(s.xa(), s.xb(), last - 1));
        for (int f = 0; f < minimised; f++) {
            if (functions[f].applyAsDouble(probeA) < atStart[f] || functions[f].applyAsDouble(probeB) < atEnd[f]) {
                return false;
            }
        }
        for (int f = 0; f < minimised; f++) {
            minimumX[f] = xa;
            minimumValue[f] = atStart[f];
        }
        if (!s.first() && !Double.isNaN(previous) && crosses(previous, atStart[crossing])) {
            addCrossing(s.a());
        }
        previous = atEnd[crossing];
        return true;
    }

    /**
     * Sets what the crossing function is taken to be at the end of a segment that was not scanned:
     * NaN where nothing is known (a curve without value), an infinity of the sign the check chooses
     * where a device does not operate.
     *
     * @param value the value
     */
    public void interrupt(double value) {
        previous = value;
    }

    /** @return the crossing function at the end of the last segment, or the value of the last interrupt */
    public double previous() {
        return previous;
    }

    /** Puts the crossings found so far in ascending order, each once; call after the last segment. */
    public void finish() {
        Arrays.sort(crossings, 0, crossingCount);
        int n = 0;
        for (int k = 0; k < crossingCount; k++) {
            if (n == 0 || crossings[k] != crossings[n - 1]) {
                crossings[n++] = crossings[k];
            }
        }
        crossingCount = n;
    }

    /** @return how many crossings there are, after {@link #finish} */
    public int crossingCount() {
        return crossingCount;
    }

    /**
     * One crossing, after {@link #finish}.
     *
     * @param i its index, ascending
     * @return amperes
     */
    public double crossingAmps(int i) {
        return crossings[i];
    }

    /** @return the crossings, after {@link #finish}, ascending and distinct, in amperes (a copy) */
    public double[] crossingsAmps() {
        return Arrays.copyOf(crossings, crossingCount);
    }

    private void addCrossing(double amps) {
        if (crossingCount == crossings.length) {
            crossings = Arrays.copyOf(crossings, 2 * crossingCount);
        }
        crossings[crossingCount++] = amps;
    }

    private static boolean crosses(double before, double after) {
        return before < 0 && after > 0 || before > 0 && after < 0;
    }
}
