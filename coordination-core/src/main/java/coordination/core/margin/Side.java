package coordination.core.margin;

/** Where, relative to the reported current, an extreme value occurs. */
public enum Side {
    /** At the current itself: an interior point or an end of the range. */
    AT("at"),
    /** Just below the current: the low-current side of a step of the curve. */
    BELOW("below"),
    /** Just above the current: the high-current side of a step of the curve. */
    ABOVE("above");

    private final String key;

    Side(String key) {
        this.key = key;
    }

    /** @return the JSON name */
    public String key() {
        return key;
    }
}
