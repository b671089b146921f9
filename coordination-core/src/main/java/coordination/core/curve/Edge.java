package coordination.core.curve;

/**
 * Which edge of a device's band a check takes. A cable check and a downstream device take the
 * slow edge; an upstream device takes the fast one. Where a setting or a behaviour is not known
 * exactly, each edge takes the conservative value for its role.
 */
public enum Edge {
    /** The fastest the device may operate. */
    FAST,
    /** The slowest the device may operate. */
    SLOW
}
