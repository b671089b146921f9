package coordination.core.internal;

/**
 * The walk a check makes over its current range: from one split point to the next, each segment
 * smooth, its ends moved just inside the steps so that both one-sided values of a step are seen.
 * At a step the value exactly at the breakpoint belongs to the higher-current side, so a segment
 * that ends at a step stops a hair below it and the next one starts a hair above it.
 */
public final class SegmentWalk {
    /** Offset in ln(I) used to take one-sided limits at a step of a curve. */
    public static final double SIDE_OFFSET = 1e-11;

    private SegmentWalk() {
    }

    /**
     * One segment between two split points.
     *
     * @param a lower current in amperes
     * @param b upper current in amperes
     * @param xa lowest ln(I) evaluated: ln(a), just above a step unless a is the range's start
     * @param xb highest ln(I) evaluated: ln(b), just below a step unless b is the range's end
     * @param first whether a is the lower end of the range (not a step)
     * @param last whether b is the upper end of the range
     */
    public record Segment(double a, double b, double xa, double xb, boolean first, boolean last) {
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
         * The same segment evaluated from a later start (past a pole at its lower end).
         *
         * @param x the new lowest ln(I), at most {@code xb}
         * @return the segment
         */
        public Segment from(double x) {
            return new Segment(a, b, x, xb, first, last);
        }
    }

    /** Receives the segments of a walk in ascending order. */
    @FunctionalInterface
    public interface Visitor {
        /**
         * Visits a segment.
         *
         * @param segment the segment
         */
        void visit(Segment segment);
    }

    /**
     * Visits every segment between consecutive split points; a range of one point is one segment
     * of zero width.
     *
     * @param points split points, ascending and distinct, at least one
     * @param visitor receives the segments
     */
    public static void walk(double[] points, Visitor visitor) {
        int segments = Math.max(1, points.length - 1);
        // each point's logarithm once: it is the upper end of one segment and the lower of the next
        double logB = Math.log(points[0]);
        for (int i = 0; i < segments; i++) {
            double a = points[i];
            double b = points.length == 1 ? a : points[i + 1];
            boolean first = i == 0;
            boolean last = i == segments - 1;
            double logA = logB;
            logB = points.length == 1 ? logA : Math.log(b);
            double xa = logA + (first ? 0.0 : SIDE_OFFSET);
            double xb = Math.max(xa, logB - (last ? 0.0 : SIDE_OFFSET));
            visitor.visit(new Segment(a, b, xa, xb, first, last));
        }
    }
}
