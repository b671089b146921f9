package coordination.core.curve;

/**
 * What an inverse-time stage does above the highest multiple of pickup for which its standard
 * defines the curve. IEC 60255-151 defines the characteristic up to its effective range, at least
 * 20 times the setting (from memory); above it a relay, and its saturating current transformer,
 * operate no faster than at that limit, and some keep following the equation.
 */
public enum HighCurrentBehaviour {
    /** Keep following the equation at any current. */
    FOLLOW_EQUATION("follow"),
    /** Hold the time reached at the upper multiple, as many relays do. */
    HOLD_AT_UPPER_MULTIPLE("hold"),
    /**
     * Not known: a band between the two. The fast edge follows the equation, the slow edge holds,
     * so each check takes the edge that is conservative for the device's role. The default.
     */
    BAND("band");

    private final String key;

    HighCurrentBehaviour(String key) {
        this.key = key;
    }

    /** @return the study-file word, {@code follow} or {@code hold} */
    public String key() {
        return key;
    }
}
