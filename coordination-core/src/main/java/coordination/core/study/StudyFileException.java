package coordination.core.study;

import coordination.core.CoordinationException;
import java.util.List;

/** A study file that cannot be read; carries every problem found, each with its location and key. */
public final class StudyFileException extends CoordinationException {
    private static final long serialVersionUID = 1L;
    /** An array, not a list, so that the problems survive serialisation (a batch engine's trip between machines). */
    private final Problem[] problems;

    /**
     * Creates the exception.
     *
     * @param problems one or more problems, in file order
     */
    public StudyFileException(List<Problem> problems) {
        super(problems.isEmpty() ? "invalid study" : problems.get(0).toString());
        this.problems = problems.toArray(Problem[]::new);
    }

    /** @return every problem found, in file order */
    public List<Problem> problems() {
        return List.of(problems);
    }
}
