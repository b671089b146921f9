package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serial;
import java.util.Arrays;

/**
 * A curve digitised from (current, time) points and interpolated linearly in log-log space, which
 * keeps it monotonic between the points: between points i and i+1,
 * {@code log t = log t_i + (log I - log I_i) * (log t_(i+1) - log t_i) / (log I_(i+1) - log I_i)}.
 * The curve has no value outside the first and last current; it says so rather than extrapolate.
 */
public final class TabulatedCurve implements TimeCurrentCurve {
    @Serial
    private static final long serialVersionUID = 1L;

    private final String label;
    private final double[] amps;
    private final double[] seconds;
    private final double[] logAmps;
    private final double[] logSeconds;

    /**
     * Creates the curve.
     *
     * @param label a name for messages, e.g. {@code fuse 'F3': clearing}
     * @param amps currents in amperes, strictly rising, all above 0; at least two
     * @param seconds times in seconds, strictly falling, all above 0
     * @throws IllegalArgumentException naming the offending points if the rules are broken
     */
    public TabulatedCurve(String label, double[] amps, double[] seconds) {
        this.label = Checks.given("digitised curve: label", label);
        Checks.given(label + ": currents", amps);
        Checks.given(label + ": times", seconds);
        String problem = problem(label, amps, seconds);
        if (problem != null) {
            throw new IllegalArgumentException(problem);
        }
        this.amps = amps.clone();
        this.seconds = seconds.clone();
        this.logAmps = new double[amps.length];
        this.logSeconds = new double[amps.length];
        for (int i = 0; i < amps.length; i++) {
            logAmps[i] = Math.log(amps[i]);
            logSeconds[i] = Math.log(seconds[i]);
        }
    }

    /**
     * Describes what is wrong with a set of points, or returns null when they are valid. The study
     * loader uses this to report the problem at the offending point.
     *
     * @param label the curve's name for the message
     * @param amps currents in amperes
     * @param seconds times in seconds
     * @return the message, or null
     */
    public static String problem(String label, double[] amps, double[] seconds) {
        int i = violation(amps, seconds);
        if (i < 0) {
            return null;
        }
        if (amps.length != seconds.length) {
            return label + ": found " + amps.length + " currents and " + seconds.length + " times - must be pairs";
        }
        if (amps.length < 2) {
            return label + ": found " + amps.length + " point(s) - must have at least 2";
        }
        if (!(amps[i] > 0) || !Double.isFinite(amps[i]) || !(seconds[i] > 0) || !Double.isFinite(seconds[i])) {
            return label + ": point " + (i + 1) + " is (" + Checks.format(amps[i]) + " A, "
                    + Checks.format(seconds[i]) + " s) - current and time must be finite numbers above 0";
        }
        if (!(amps[i] > amps[i - 1])) {
            return label + ": current falls from " + Checks.format(amps[i - 1]) + " A to " + Checks.format(amps[i])
                    + " A at points " + i + " and " + (i + 1) + "; currents must rise from point to point";
        }
        if (seconds[i] == seconds[i - 1]) {
            return label + ": time stays at " + Checks.format(seconds[i]) + " s from " + Checks.format(amps[i - 1])
                    + " A to " + Checks.format(amps[i]) + " A; times must fall as current rises";
        }
        return label + ": time rises from " + Checks.format(seconds[i - 1]) + " s at " + Checks.format(amps[i - 1])
                + " A to " + Checks.format(seconds[i]) + " s at " + Checks.format(amps[i])
                + " A; times must fall as current rises";
    }

    /**
     * Index of the first point that breaks the rules (0 for a count problem), or -1.
     *
     * @param amps currents in amperes
     * @param seconds times in seconds
     * @return the index or -1
     */
    public static int violation(double[] amps, double[] seconds) {
        if (amps.length != seconds.length || amps.length < 2) {
            return 0;
        }
        for (int i = 0; i < amps.length; i++) {
            boolean finite = amps[i] > 0 && Double.isFinite(amps[i]) && seconds[i] > 0 && Double.isFinite(seconds[i]);
            if (!finite || i > 0 && (!(amps[i] > amps[i - 1]) || !(seconds[i] < seconds[i - 1]))) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public double seconds(double a) {
        if (!(a >= amps[0] && a <= amps[amps.length - 1])) {
            throw Curves.outside(this, a);
        }
        int i = Arrays.binarySearch(amps, a);
        if (i >= 0) {
            return seconds[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double x = Math.log(a);
        double f = (x - logAmps[lo]) / (logAmps[hi] - logAmps[lo]);
        return Math.exp(logSeconds[lo] + f * (logSeconds[hi] - logSeconds[lo]));
    }

    /**
     * The current at which the curve reaches a time: the inverse of {@link #seconds(double)}.
     *
     * @param s time in seconds
     * @return amperes, or NaN if the time lies outside the digitised times
     */
    public double currentAtSeconds(double s) {
        int n = seconds.length;
        if (!(s <= seconds[0] && s >= seconds[n - 1])) {
            return Double.NaN;
        }
        double y = Math.log(s);
        for (int i = 1; i < n; i++) {
            if (s >= seconds[i]) {
                double f = (y - logSeconds[i - 1]) / (logSeconds[i] - logSeconds[i - 1]);
                return Math.exp(logAmps[i - 1] + f * (logAmps[i] - logAmps[i - 1]));
            }
        }
        return amps[n - 1];
    }

    /** The steepest of the straight log-log pieces the stretch touches; none is stated outside the points. */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        return pieceSlope(fromAmps, toAmps, true);
    }

    /** The least steep of the straight log-log pieces the stretch touches; none is stated outside the points. */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        return pieceSlope(fromAmps, toAmps, false);
    }

    private double pieceSlope(double fromAmps, double toAmps, boolean steepest) {
        int n = amps.length;
        if (!(fromAmps >= amps[0] && toAmps <= amps[n - 1] && toAmps >= fromAmps)) {
            return steepest ? Double.POSITIVE_INFINITY : 0.0;
        }
        // the pieces from the one holding fromAmps to the one holding toAmps
        int first = Math.min(n - 2, pieceAt(fromAmps));
        int last = pieceAt(toAmps);
        if (toAmps == amps[last]) {
            // a stretch that ends at a point lies in the piece below it
            last--;
        }
        last = Math.max(first, Math.min(n - 2, last));
        double slope = steepest ? 0.0 : Double.POSITIVE_INFINITY;
        for (int k = first; k <= last; k++) {
            double piece = (logSeconds[k] - logSeconds[k + 1]) / (logAmps[k + 1] - logAmps[k]);
            slope = steepest ? Math.max(slope, piece) : Math.min(slope, piece);
        }
        // widened, or narrowed, by far more than the rounding of the interpolation
        return slope * (steepest ? 1 + Curves.SLOPE_MARGIN : 1 - Curves.SLOPE_MARGIN);
    }

    // the index k of the point at or below a current: amps[k] <= a, within the points
    private int pieceAt(double a) {
        int i = Arrays.binarySearch(amps, a);
        return i >= 0 ? i : -i - 2;
    }

    @Override
    public double lowestDefinedAmps() {
        return amps[0];
    }

    @Override
    public double highestDefinedAmps() {
        return amps[amps.length - 1];
    }

    @Override
    public double[] breakpointsAmps() {
        return amps.clone();
    }

    /** @return the digitised currents in amperes (a copy) */
    public double[] amps() {
        return amps.clone();
    }

    /** @return the digitised times in seconds (a copy) */
    public double[] secondsPoints() {
        return seconds.clone();
    }

    @Override
    public String toString() {
        return label;
    }
}
