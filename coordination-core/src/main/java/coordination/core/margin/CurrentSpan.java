package coordination.core.margin;

/** The smallest interval of currents covering every part of a range marked so far. */
final class CurrentSpan {
    private double from = Double.NaN;
    private double to = Double.NaN;

    /** Forgets every part marked, for the next check. */
    void reset() {
        from = Double.NaN;
        to = Double.NaN;
    }

    /**
     * Marks a part of the range.
     *
     * @param a lower current in amperes
     * @param b upper current in amperes
     */
    void add(double a, double b) {
        from = Double.isNaN(from) ? a : Math.min(from, a);
        to = Double.isNaN(to) ? b : Math.max(to, b);
    }

    /** @return whether nothing was marked */
    boolean isEmpty() {
        return Double.isNaN(from);
    }

    /** @return the lowest marked current, NaN if none */
    double from() {
        return from;
    }

    /** @return the highest marked current, NaN if none */
    double to() {
        return to;
    }
}
