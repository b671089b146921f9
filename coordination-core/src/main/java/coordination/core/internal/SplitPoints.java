package coordination.core.internal;

import java.util.Arrays;

/**
 * The points at which a check splits its range into smooth segments, gathered in a reusable
 * array: the range's ends and every candidate strictly inside (breakpoints, domain edges and other
 * split points), ascending and each once, without allocating once the array has grown to the
 * checks' size.
 */
public final class SplitPoints {
    private double[] points = new double[16];
    private int count;
    private double from;
    private double to;

    /**
     * Starts a new set with the range's ends.
     *
     * @param from lower end
     * @param to upper end, at or above {@code from}
     */
    public void start(double from, double to) {
        this.from = from;
        this.to = to;
        count = 0;
        push(from);
        push(to);
    }

    /**
     * Adds a candidate; one outside the open range is left out.
     *
     * @param v the candidate
     */
    public void add(double v) {
        if (v > from && v < to) {
            push(v);
        }
    }

    /**
     * Adds candidates.
     *
     * @param vs the candidates, in any order
     */
    public void addAll(double[] vs) {
        for (double v : vs) {
            add(v);
        }
    }

    /** Sorts the points and keeps each once. */
    public void finish() {
        Arrays.sort(points, 0, count);
        int m = 0;
        for (int k = 0; k < count; k++) {
            if (m == 0 || points[k] > points[m - 1]) {
                points[m++] = points[k];
            }
        }
        count = m;
    }

    /** @return how many points there are */
    public int count() {
        return count;
    }

    /** @return the points in their first {@link #count()} places: the buffer itself, to read only */
    public double[] points() {
        return points;
    }

    private void push(double v) {
        if (count == points.length) {
            points = Arrays.copyOf(points, 2 * count);
        }
        points[count++] = v;
    }
}
