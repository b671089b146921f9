package coordination.core.study;

import java.io.Serializable;

/**
 * One problem in a study file.
 *
 * @param file the file as the user named it
 * @param line 1-based line
 * @param column 1-based column
 * @param path the key path, e.g. {@code devices[2].stages[0].pickup_a}, or empty for the document
 * @param message what is wrong, with the value found and the rule
 * @serial exclude its serial form is its components, documented above
 */
public record Problem(String file, int line, int column, String path, String message) implements Serializable {
    /** The serial form's version. */
    private static final long serialVersionUID = 1L;

    /**
     * The problem as {@code FILE:LINE:COLUMN: path: message}, on one line: any control character
     * the file name, a key or a quoted value holds is escaped, so no problem can print a second,
     * forged line.
     *
     * @return the line
     */
    @Override
    public String toString() {
        return TextRules.printable(file) + ":" + line + ":" + column + ": "
                + (path.isEmpty() ? "" : TextRules.printable(path) + ": ") + TextRules.printable(message);
    }
}
