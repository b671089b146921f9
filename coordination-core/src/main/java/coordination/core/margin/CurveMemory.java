package coordination.core.margin;

import coordination.core.curve.TimeCurrentCurve;
import java.util.Arrays;

/**
 * A curve's times at the currents a check has already asked for. A check asks again at the same
 * currents (the ends and middles of its segments, from its walks, scans and probes), and a curve's
 * time is a function of the current alone, so a remembered time is the computed one to the last
 * bit. Sixteen slots, chosen by a hash of the current; a newer current takes over a slot. One
 * check's own, on the thread that runs it, emptied for the next.
 */
final class CurveMemory {
    private static final int BITS = 4;

    private TimeCurrentCurve curve;
    private final double[] amps = new double[1 << BITS];
    private final double[] seconds = new double[1 << BITS];

    /**
     * Creates an empty memory.
     *
     * @param curve the curve
     */
    CurveMemory(TimeCurrentCurve curve) {
        this.curve = curve;
    }

    /**
     * Empties the memory for another curve, or for the same one in the next check.
     *
     * @param newCurve the curve
     */
    void reset(TimeCurrentCurve newCurve) {
        curve = newCurve;
        Arrays.fill(amps, 0.0);
    }

    /**
     * The curve's time at a current.
     *
     * @param current amperes
     * @return seconds, infinity where the device does not operate, NaN where the curve has no value
     */
    double seconds(double current) {
        long bits = Double.doubleToRawLongBits(current);
        int slot = (int) ((bits * 0x9E3779B97F4A7C15L) >>> (64 - BITS));
        // an empty slot holds 0 A, a current no check asks for; if one did, it is computed afresh
        if (amps[slot] == current && current != 0.0) {
            return seconds[slot];
        }
        double t = of(curve, current);
        amps[slot] = current;
        seconds[slot] = t;
        return t;
    }

    /**
     * A curve's time without memory.
     *
     * @param curve the curve
     * @param current amperes
     * @return seconds, infinity where the device does not operate, NaN where the curve has no value
     */
    static double of(TimeCurrentCurve curve, double current) {
        return curve.isDefinedAt(current) ? curve.seconds(current) : Double.NaN;
    }
}
