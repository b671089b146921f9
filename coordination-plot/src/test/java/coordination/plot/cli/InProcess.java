package coordination.plot.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process with captured streams, for the tests of every package. */
public final class InProcess {
    private InProcess() {
    }

    /**
     * The outcome of one run.
     *
     * @param code exit code
     * @param out standard output
     * @param err standard error
     */
    public record Run(int code, String out, String err) {
    }

    /**
     * Runs the command line.
     *
     * @param args the arguments
     * @return what it did
     */
    public static Run run(String... args) {
        return withInput("", args);
    }

    /**
     * Runs the command line with a text on standard input.
     *
     * @param stdin the text
     * @param args the arguments
     * @return what it did
     */
    public static Run withInput(String stdin, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.run(new java.io.ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8),
                args);
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }
}
