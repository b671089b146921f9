package coordination.core.curve;

/**
 * What an inverse-time stage does above the highest multiple of pickup for which its standard
 * defines the curve (IEC 60255-151 states accuracy over 2 to 20 times the setting).
 */
public enum HighCurrentBehaviour {
    /** Keep following the equation at any current. */
    FOLLOW_EQUATION("follow"),
    /** Hold the time reached at the upper multiple, as many relays do. */
    HOLD_AT_UPPER_MULTIPLE("hold");

    private final String key;

    HighCurrentBehaviour(String key) {
        this.key = key;
    }

    /** @return the study-file word, {@code follow} or {@code hold} */
    public String key() {
        return key;
    }
}
