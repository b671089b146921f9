package coordination.plot.cli;

/** Exit codes of every command. */
public final class ExitCodes {
    /** Every check passes (or the command did what it was asked). */
    public static final int PASS = 0;
    /** At least one check fails. */
    public static final int CHECK_FAILED = 1;
    /** Bad input or usage: a study file with problems, an unknown option, an unreadable folder. */
    public static final int BAD_INPUT = 2;
    /** A defect of the tool itself, not of the input: report it with the study that shows it. */
    public static final int INTERNAL_ERROR = 3;

    private ExitCodes() {
    }
}
