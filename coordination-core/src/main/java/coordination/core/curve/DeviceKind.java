package coordination.core.curve;

/** The kinds of protective device the library models. */
public enum DeviceKind {
    /** An overcurrent relay with its circuit breaker. */
    RELAY("relay"),
    /** A fuse. */
    FUSE("fuse"),
    /** A low-voltage circuit breaker with an electronic trip unit. */
    BREAKER("breaker"),
    /** A miniature circuit breaker to IEC 60898-1. */
    MCB("mcb");

    private final String key;

    DeviceKind(String key) {
        this.key = key;
    }

    /** @return the study-file name of the kind */
    public String key() {
        return key;
    }
}
