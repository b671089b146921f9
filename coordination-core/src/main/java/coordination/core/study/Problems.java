package coordination.core.study;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The problems found in one study file: each once, the first {@link #SHOWN} kept for the user and
 * the rest only counted, so that a file with a hundred thousand mistakes is refused as quickly as
 * a file with one.
 */
final class Problems {
    /** Problems reported in full; a summary line counts the rest. */
    static final int SHOWN = 100;

    private final String file;
    private final Set<Problem> seen = new HashSet<>();
    private final List<Problem> kept = new ArrayList<>();
    private Problem firstOmitted;
    private int omitted;

    Problems(String file) {
        this.file = file;
    }

    void add(Problem p) {
        if (!seen.add(p)) {
            return;
        }
        if (kept.size() < SHOWN) {
            kept.add(p);
        } else {
            if (firstOmitted == null) {
                firstOmitted = p;
            }
            omitted++;
        }
    }

    void add(int line, int column, String path, String message) {
        add(new Problem(file, line, column, path, message));
    }

    /** @return how many distinct problems were found, shown or not */
    int count() {
        return kept.size() + omitted;
    }

    boolean isEmpty() {
        return count() == 0;
    }

    /** @return the kept problems in file order, and a last line counting the others */
    List<Problem> sorted() {
        List<Problem> out = new ArrayList<>(kept);
        out.sort((x, y) -> x.line() != y.line() ? Integer.compare(x.line(), y.line())
                : Integer.compare(x.column(), y.column()));
        if (omitted > 0) {
            out.add(new Problem(file, firstOmitted.line(), firstOmitted.column(), "", "and " + omitted
                    + " more problem" + (omitted == 1 ? "" : "s") + " - the first " + SHOWN + " are shown"));
        }
        return out;
    }
}
