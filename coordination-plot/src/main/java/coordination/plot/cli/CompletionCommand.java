package coordination.plot.cli;

import java.io.PrintStream;
import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;

/** {@code coordination completion}: a shell completion script for every command and option. */
@Command(name = "completion", mixinStandardHelpOptions = true,
        description = "Prints a completion script for bash; zsh reads it too after 'autoload -U bashcompinit &&"
                + " bashcompinit'. Load it with: source <(java -jar coordination.jar completion)")
final class CompletionCommand implements Callable<Integer> {
    private final PrintStream out;
    private final PrintStream err;

    CompletionCommand(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    @Override
    public Integer call() {
        out.print(AutoComplete.bash("coordination", Cli.full(out, err)));
        return ExitCodes.PASS;
    }
}
