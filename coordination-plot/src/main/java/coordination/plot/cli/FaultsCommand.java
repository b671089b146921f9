package coordination.plot.cli;

import coordination.core.Quantities;
import coordination.core.network.FaultLevel;
import coordination.core.study.Problem;
import coordination.core.study.ReportWriter;
import coordination.core.study.Study;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code coordination faults}: the short-circuit currents of a study's network, alone. */
@Command(name = "faults", mixinStandardHelpOptions = true,
        description = "Prints the short-circuit currents of the study's network by IEC 60909-0 at every bus and"
                + " cable end: I\"k3 max, I\"k3 min, I\"k2 min, kappa and ip. Exit 0, or 2 for a bad study or one"
                + " without a network section.")
final class FaultsCommand implements Callable<Integer> {
    private static final int FIGURES = 3;

    private final InputStream in;
    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1", paramLabel = "STUDY", description = "a study file with a network section")
    Path input;

    @Option(names = "--json", description = "print the levels as JSON")
    boolean json;

    FaultsCommand(InputStream in, PrintStream out, PrintStream err) {
        this.in = in;
        this.out = out;
        this.err = err;
    }

    @Override
    public Integer call() {
        List<Path> files = StudyInputs.collect(List.of(input), err);
        if (files == null || files.size() != 1) {
            if (files != null) {
                err.println("coordination faults: " + input + ": give one study file");
            }
            return ExitCodes.BAD_INPUT;
        }
        StudyInputs.Loaded l = StudyInputs.load(files.get(0), in);
        if (l.study() == null) {
            for (Problem p : l.problems()) {
                err.println(p);
            }
            return ExitCodes.BAD_INPUT;
        }
        Study s = l.study();
        if (s.network().isEmpty()) {
            err.println(files.get(0) + ": the study has no network section, so no fault levels to compute");
            return ExitCodes.BAD_INPUT;
        }
        if (json) {
            out.print(ReportWriter.writeFaults(s));
            return ExitCodes.PASS;
        }
        out.println("faults " + s.name() + ": " + s.title() + " (IEC 60909-0)");
        out.println(String.format(java.util.Locale.ROOT, "  %-24s %10s %10s %10s %7s %10s", "at", "Ik3 max",
                "Ik3 min", "Ik2 min", "kappa", "ip"));
        for (FaultLevel f : s.network().get().levels().levels()) {
            out.println(String.format(java.util.Locale.ROOT, "  %-24s %10s %10s %10s %7s %10s", f.at(),
                    Quantities.current(f.ik3MaxAmps(), FIGURES), Quantities.current(f.ik3MinAmps(), FIGURES),
                    Quantities.current(f.ik2MinAmps(), FIGURES), Quantities.significant(f.kappa(), FIGURES),
                    Quantities.current(f.ipAmps(), FIGURES)));
        }
        return ExitCodes.PASS;
    }
}
