package coordination.core.curve;

import coordination.core.CoordinationException;

/** Thrown when a curve is asked for a time at a current where it has no value. */
public final class CurveDomainException extends CoordinationException {
    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message names the curve, the current and the defined interval
     */
    public CurveDomainException(String message) {
        super(message);
    }
}
