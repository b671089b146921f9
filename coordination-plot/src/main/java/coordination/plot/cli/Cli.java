package coordination.plot.cli;

import java.io.InputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code coordination} command and its entry point. */
@Command(name = "coordination", mixinStandardHelpOptions = true, versionProvider = Cli.Version.class,
        description = "Checks that protective devices protect their cables and grade with each other,"
                + " and draws coordination sheets.",
        exitCodeOnInvalidInput = ExitCodes.BAD_INPUT, exitCodeOnExecutionException = ExitCodes.INTERNAL_ERROR)
public final class Cli implements Callable<Integer> {
    /**
     * The subcommands, in the order help lists them. They are registered by hand rather than in
     * the annotation, so that a run builds the model of the one it asks for: building all five
     * cost a quarter of a cold start.
     */
    private static final List<Class<?>> SUBCOMMANDS = List.of(SheetCommand.class, CheckCommand.class,
            WithstandCommand.class, DesignCommand.class, FaultsCommand.class, CompletionCommand.class);
    private final PrintStream out;
    private final PrintStream err;

    /**
     * A command writing to the given streams.
     *
     * @param out standard output
     * @param err standard error
     */
    public Cli(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    /** With no subcommand there is nothing to do: the usage goes to standard error, as a mistake's would. */
    @Override
    public Integer call() {
        err.print(full(out, err).getUsageMessage());
        return ExitCodes.BAD_INPUT;
    }

    /**
     * The whole command line, every subcommand built: for usage and for the completion script.
     *
     * @param out standard output
     * @param err standard error
     * @return the command line
     */
    static CommandLine full(PrintStream out, PrintStream err) {
        return withSubcommands(new CommandLine(new Cli(out, err), new Factory(System.in, out, err)), null);
    }

    /**
     * Adds the subcommand the arguments name, or every one when they name none (help, version,
     * a mistyped name that deserves suggestions).
     */
    private static CommandLine withSubcommands(CommandLine cl, String first) {
        for (Class<?> c : SUBCOMMANDS) {
            if (c.getAnnotation(Command.class).name().equals(first)) {
                return cl.addSubcommand(c);
            }
        }
        SUBCOMMANDS.forEach(cl::addSubcommand);
        return cl;
    }

    /**
     * Runs the command line in-process.
     *
     * @param out standard output
     * @param err standard error
     * @param args the arguments
     * @return the exit code
     */
    public static int run(PrintStream out, PrintStream err, String... args) {
        return run(System.in, out, err, args);
    }

    /**
     * Runs the command line in-process, with a study on standard input for the argument {@code -}.
     *
     * @param in standard input
     * @param out standard output
     * @param err standard error
     * @param args the arguments
     * @return the exit code
     */
    public static int run(InputStream in, PrintStream out, PrintStream err, String... args) {
        Cli cli = new Cli(out, err);
        CommandLine cl = withSubcommands(new CommandLine(cli, new Factory(in, out, err)),
                args.length > 0 ? args[0] : null);
        cl.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
        cl.setErr(new PrintWriter(err, true, StandardCharsets.UTF_8));
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("coordination: " + ex.getMessage());
            err.println("run 'coordination " + (ex.getCommandLine().getCommandName().equals("coordination") ? ""
                    : ex.getCommandLine().getCommandName() + " ") + "--help' for usage");
            return ExitCodes.BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, p) -> {
            // a defect, not a user mistake: one line, and the trace only when asked for
            err.println("coordination: internal error: " + ex);
            if (System.getenv("COORDINATION_DEBUG") != null) {
                ex.printStackTrace(err);
            }
            return ExitCodes.INTERNAL_ERROR;
        });
        return cl.execute(args);
    }

    /**
     * Entry point of the runnable jar.
     *
     * @param args the arguments
     */
    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        PrintStream out = new PrintStream(new java.io.FileOutputStream(java.io.FileDescriptor.out), true,
                StandardCharsets.UTF_8);
        System.exit(run(out, System.err, args));
    }

    /** Builds subcommands with the injected streams. */
    private record Factory(InputStream in, PrintStream out, PrintStream err) implements CommandLine.IFactory {
        @Override
        public <K> K create(Class<K> cls) throws Exception {
            if (cls == SheetCommand.class) {
                return cls.cast(new SheetCommand(in, out, err));
            }
            if (cls == CheckCommand.class) {
                return cls.cast(new CheckCommand(in, out, err));
            }
            if (cls == WithstandCommand.class) {
                return cls.cast(new WithstandCommand(out, err));
            }
            if (cls == DesignCommand.class) {
                return cls.cast(new DesignCommand(in, out, err));
            }
            if (cls == FaultsCommand.class) {
                return cls.cast(new FaultsCommand(in, out, err));
            }
            if (cls == CompletionCommand.class) {
                return cls.cast(new CompletionCommand(out, err));
            }
            return CommandLine.defaultFactory().create(cls);
        }
    }

    /** The version from the jar's manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Cli.class.getPackage().getImplementationVersion();
            return new String[] {"coordination " + (v == null ? "development build" : v)};
        }
    }
}
