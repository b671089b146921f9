package coordination.core.curve;

import java.io.Serializable;

/**
 * An operating-time characteristic: the time in seconds a device takes to operate (or clear) for
 * a steady current in amperes. Time never rises as current rises.
 *
 * <p>A curve is defined on a current interval {@link #lowestDefinedAmps()} to
 * {@link #highestDefinedAmps()}; inside it, {@link #seconds(double)} returns a time or
 * {@link Double#POSITIVE_INFINITY} where the device does not operate (below pickup). Outside it
 * (beyond the points of a digitised curve) the curve has no value and says so by throwing.
 *
 * <p>Implementations are immutable and safe to share between threads.
 */
public interface TimeCurrentCurve extends Serializable {

    /**
     * Operating time at a current.
     *
     * @param amps current in amperes, within the defined interval
     * @return time in seconds, at or above 0, or {@link Double#POSITIVE_INFINITY} where the device
     *     does not operate
     * @throws CurveDomainException if {@code amps} lies outside the defined interval
     * @throws IllegalArgumentException if {@code amps} is NaN or negative
     */
    double seconds(double amps);

    /**
     * Lowest current, in amperes, at which this curve has a value; 0 for equation-based curves.
     *
     * @return amperes, at or above 0
     */
    default double lowestDefinedAmps() {
        return 0.0;
    }

    /**
     * Highest current, in amperes, at which this curve has a value; infinity for equation-based
     * curves.
     *
     * @return amperes
     */
    default double highestDefinedAmps() {
        return Double.POSITIVE_INFINITY;
    }

    /**
     * Currents, in amperes and ascending, at which the curve is not smooth: pickups, steps, the
     * ends of held regions, digitised points. Between two consecutive breakpoints the curve is
     * continuous and differentiable, which is what lets the margin engine solve instead of sample.
     * At a step the value exactly at the breakpoint belongs to the higher-current side.
     *
     * @return a new array, ascending, possibly empty
     */
    double[] breakpointsAmps();

    /**
     * A bound on how steeply the curve falls between two currents with no breakpoint between them:
     * for any two currents I1 &lt; I2 in {@code [fromAmps, toAmps]}, {@code ln t(I1) - ln t(I2)} is at
     * most the bound times {@code ln I2 - ln I1}, and the curve either operates at every current of
     * the stretch or at none. The margin engine uses it to show that a margin falls throughout a
     * segment, so that the segment's minimum is at its end without a scan. A curve that states no
     * bound returns infinity, and the engine scans.
     *
     * @param fromAmps lower current in amperes, above 0
     * @param toAmps upper current in amperes, at or above {@code fromAmps}
     * @return the bound, 0 or more, or {@link Double#POSITIVE_INFINITY} where none is stated
     */
    default double logSlopeBound(double fromAmps, double toAmps) {
        return Double.POSITIVE_INFINITY;
    }

    /**
     * A floor under how steeply the curve falls between two currents with no breakpoint between
     * them: for any two currents I1 &lt; I2 in {@code [fromAmps, toAmps]} at which the curve
     * operates, {@code ln t(I1) - ln t(I2)} is at least the floor times {@code ln I2 - ln I1}. The
     * grading check uses it to show that an interval falls throughout a segment. A curve that
     * states no floor returns 0; one that operates nowhere on the stretch may return infinity.
     *
     * @param fromAmps lower current in amperes, above 0
     * @param toAmps upper current in amperes, at or above {@code fromAmps}
     * @return the floor, 0 or more
     */
    default double logSlopeFloor(double fromAmps, double toAmps) {
        return 0.0;
    }

    /**
     * Whether {@link #seconds(double)} has a value at a current.
     *
     * @param amps current in amperes
     * @return true inside the defined interval
     */
    default boolean isDefinedAt(double amps) {
        return amps >= lowestDefinedAmps() && amps <= highestDefinedAmps();
    }

    /**
     * This curve with its current axis multiplied by a factor: the curve a current transformer, or
     * a voltage base change, makes of it. The scaled curve operates at {@code factor * I} as this one
     * does at {@code I}.
     *
     * @param factor positive multiplier of the current axis
     * @return the scaled curve
     * @throws IllegalArgumentException if the factor is not a positive finite number
     */
    default TimeCurrentCurve scaledCurrent(double factor) {
        return factor == 1.0 ? this : new ScaledCurve(this, factor, 0.0);
    }

    /**
     * This curve with a constant time added where it operates: the interrupting time of a circuit
     * breaker turns a relay's operating time into a clearing time.
     *
     * @param seconds added time in seconds, 0 or more
     * @return the delayed curve
     * @throws IllegalArgumentException if the time is negative or not finite
     */
    default TimeCurrentCurve delayedBy(double seconds) {
        return seconds == 0.0 ? this : new ScaledCurve(this, 1.0, seconds);
    }
}
