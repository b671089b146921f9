package coordination.core;

/**
 * Base of the domain failures this library reports: a study or a model that cannot be evaluated
 * as asked. Bad arguments to a constructor throw {@link IllegalArgumentException} instead, and a
 * broken internal invariant throws {@link IllegalStateException}.
 */
public class CoordinationException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message what failed, with the value and the rule it broke
     */
    public CoordinationException(String message) {
        super(message);
    }

    /**
     * Creates the exception with a cause.
     *
     * @param message what failed, with the value and the rule it broke
     * @param cause the underlying failure
     */
    public CoordinationException(String message, Throwable cause) {
        super(message, cause);
    }
}
