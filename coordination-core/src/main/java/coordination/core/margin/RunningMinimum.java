package coordination.core.margin;

import coordination.core.internal.SegmentWalk;

/**
 * The smallest value met over the segments of a check's range, the current where it occurs and
 * the side of a step it occurs on. A minimum at a segment end that is a step of the curve is
 * reported at the step, from the side of the segment it was found in.
 */
final class RunningMinimum {
    private double value = Double.NaN;
    private double at = Double.NaN;
    private Side side = Side.AT;

    /** Forgets every value offered, for the next check. */
    void reset() {
        value = Double.NaN;
        at = Double.NaN;
        side = Side.AT;
    }

    /**
     * Offers a segment's minimum.
     *
     * @param x where the minimum was found on the segment, in x = ln(I)
     * @param v the minimum
     * @param s the segment, with the ends that were evaluated
     */
    void offer(double x, double v, SegmentWalk.Segment s) {
        double a = s.a();
        double b = s.b();
        double xa = s.xa();
        double xb = s.xb();
        boolean first = s.first();
        boolean last = s.last();
        if (!Double.isNaN(value) && !(v < value)) {
            return;
        }
        value = v;
        if (x <= xa) {
            at = a;
            side = first ? Side.AT : Side.ABOVE;
        } else if (x >= xb) {
            at = b;
            side = last ? Side.AT : Side.BELOW;
        } else {
            at = Math.exp(x);
            side = Side.AT;
        }
    }

    /**
     * Records a value without lower bound (a pole, or a device that does not operate) at the lower
     * end of a segment; the first such place is kept.
     *
     * @param a the segment's lower current
     * @param first whether a is the range's lower end
     */
    void unbounded(double a, boolean first) {
        if (value != Double.NEGATIVE_INFINITY) {
            value = Double.NEGATIVE_INFINITY;
            at = a;
            side = first ? Side.AT : Side.ABOVE;
        }
    }

    /** @return the minimum, NaN if nothing was offered */
    double value() {
        return value;
    }

    /** @return its current in amperes */
    double at() {
        return at;
    }

    /** @return its side */
    Side side() {
        return side;
    }
}
