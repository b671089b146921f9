package coordination.core.internal;

/**
 * The walk a check makes over its current range: from one split point to the next, each segment
 * smooth, its ends moved just inside the steps so that both one-sided values of a step are seen.
 * At a step the value exactly at the breakpoint belongs to the higher-current side, so a segment
 * that ends at a step stops a hair below it and the next one starts a hair above it.
 *
 * <p>The segments are kept in reusable arrays, so that a check walks them more than once (for
 * the window edges, then for the margins) from one logarithm per split point, and a check run
 * again allocates nothing.
 */
public final class SegmentWalk {
    /** Offset in ln(I) used to take one-sided limits at a step of a curve. */
    public static final double SIDE_OFFSET = 1e-11;

    private double[] a = new double[8];
    private double[] b = new double[8];
    private double[] xa = new double[8];
    private double[] xb = new double[8];
    private int count;

    /**
     * One segment between two split points: a view that a walk fills, reused from segment to
     * segment.
     */
    public static final class Segment {
        private double a;
        private double b;
        private double xa;
        private double xb;
        private boolean first;
        private boolean last;

        /** @return lower current in amperes */
        public double a() {
            return a;
        }

        /** @return upper current in amperes */
        public double b() {
            return b;
        }

        /** @return lowest ln(I) evaluated: ln(a), just above a step unless a is the range's start */
        public double xa() {
            return xa;
        }

        /** @return highest ln(I) evaluated: ln(b), just below a step unless b is the range's end */
        public double xb() {
            return xb;
        }

        /** @return whether a is the lower end of the range (not a step) */
        public boolean first() {
            return first;
        }

        /** @return whether b is the upper end of the range */
        public boolean last() {
            return last;
        }

        /** @return the current in the middle of the evaluated part, in amperes */
        public double midAmps() {
            return Math.exp(0.5 * (xa + xb));
        }

        /**
         * The current at the upper evaluated end, in amperes: the range's end itself on the last
         * segment, where exp(ln b) could round past the end of a curve that stops there.
         *
         * @return amperes
         */
        public double rightAmps() {
            return last ? b : Math.exp(xb);
        }

        /**
         * Makes this the given segment evaluated from a later start (past a pole at its lower end).
         *
         * @param s the segment
         * @param x the new lowest ln(I), at most {@code s.xb()}
         * @return this
         */
        public Segment setFrom(Segment s, double x) {
            a = s.a;
            b = s.b;
            xa = x;
            xb = s.xb;
            first = s.first;
            last = s.last;
            return this;
        }
    }

    /**
     * Makes the segments between consecutive split points; a range of one point is one segment of
     * zero width.
     *
     * @param points split points, ascending and distinct
     * @param n how many of them, at least one
     */
    public void fill(double[] points, int n) {
        count = Math.max(1, n - 1);
        if (a.length < count) {
            int size = Math.max(count, 2 * a.length);
            a = new double[size];
            b = new double[size];
            xa = new double[size];
            xb = new double[size];
        }
        // each point's logarithm once: it is the upper end of one segment and the lower of the next
        double logB = Math.log(points[0]);
        for (int i = 0; i < count; i++) {
            double lo = points[i];
            double hi = n == 1 ? lo : points[i + 1];
            double logA = logB;
            logB = n == 1 ? logA : Math.log(hi);
            a[i] = lo;
            b[i] = hi;
            xa[i] = logA + (i == 0 ? 0.0 : SIDE_OFFSET);
            xb[i] = Math.max(xa[i], logB - (i == count - 1 ? 0.0 : SIDE_OFFSET));
        }
    }

    /** @return how many segments the last {@link #fill} made */
    public int count() {
        return count;
    }

    /**
     * Loads one segment into a view.
     *
     * @param i its index, from 0 in ascending order
     * @param into the view
     * @return the view
     */
    public Segment load(int i, Segment into) {
        into.a = a[i];
        into.b = b[i];
        into.xa = xa[i];
        into.xb = xb[i];
        into.first = i == 0;
        into.last = i == count - 1;
        return into;
    }
}
