package coordination.core.study;

import java.io.Serializable;

/**
 * Something a reader of a result must know: an assumption the result rests on (a defaulted
 * temperature, an assumed κ, a constant let-through) or a warning (a range that hides part of the
 * problem). Notes never change a verdict or an exit code; sheets print them and reports list them.
 *
 * @param code a stable key for tools, e.g. {@code dc-offset-kappa-assumed}
 * @param message one sentence for people
 */
public record Note(String code, String message) implements Serializable {
    /**
     * Validates the note.
     *
     * @param code a stable key for tools, e.g. {@code dc-offset-kappa-assumed}
     * @param message one sentence for people
     * @throws IllegalArgumentException if a part is missing or empty
     */
    public Note {
        if (code == null || code.isEmpty() || message == null || message.isEmpty()) {
            throw new IllegalArgumentException("note: found an empty code or message - both must be given");
        }
    }

    // Written out: a record's own equals and hashCode are bootstrapped at their first call, and every
    // check's notes are compared, so the bootstrap cost a cold run a tenth of its Java time.

    @Override
    public boolean equals(Object o) {
        return o instanceof Note n && code.equals(n.code) && message.equals(n.message);
    }

    @Override
    public int hashCode() {
        return 31 * code.hashCode() + message.hashCode();
    }
}
