package coordination.core.curve;

/**
 * Instantaneous tripping types of IEC 60898-1:2015, Table 7: the breaker must not trip within
 * 0.1 s at the lower multiple of its rated current and must trip within 0.1 s at the upper one.
 */
public enum McbType {
    /** Type B: 3 In to 5 In. */
    B(3.0, 5.0),
    /** Type C: 5 In to 10 In. */
    C(5.0, 10.0),
    /** Type D: 10 In to 20 In. */
    D(10.0, 20.0);

    private final double lowMultiple;
    private final double highMultiple;

    McbType(double lowMultiple, double highMultiple) {
        this.lowMultiple = lowMultiple;
        this.highMultiple = highMultiple;
    }

    /** @return the lower edge of the instantaneous range, a multiple of In */
    public double lowMultiple() {
        return lowMultiple;
    }

    /** @return the upper edge of the instantaneous range, a multiple of In */
    public double highMultiple() {
        return highMultiple;
    }
}
