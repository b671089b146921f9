package coordination.plot.cli;

import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.study.Problem;
import coordination.core.study.ReportWriter;
import coordination.core.study.StudyReport;
import coordination.plot.Quantities;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code coordination check}: runs every check of the studies and prints the verdicts. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Runs every check of the study files and prints a table, or the JSON report."
                + " Exit 0 when all pass, 1 when any check fails, 2 on input errors.")
final class CheckCommand implements Callable<Integer> {
    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1..*", paramLabel = "STUDY", description = "study files or folders of them")
    List<Path> inputs;

    @Option(names = "--json", description = "print the JSON report (one study) or a list of reports")
    boolean json;

    CheckCommand(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    @Override
    public Integer call() {
        List<Path> files = StudyInputs.collect(inputs, err);
        if (files == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (files.isEmpty()) {
            err.println("coordination check: no study files (*.yaml) in " + inputs);
            return ExitCodes.BAD_INPUT;
        }
        boolean invalid = false;
        boolean failed = false;
        List<StudyReport> reports = new ArrayList<>();
        for (Path f : files) {
            StudyInputs.Loaded l = StudyInputs.load(f);
            if (l.study() == null) {
                for (Problem p : l.problems()) {
                    err.println(p);
                }
                invalid = true;
                continue;
            }
            StudyReport r = StudyReport.evaluate(l.study());
            failed |= !r.pass();
            reports.add(r);
        }
        if (json) {
            if (files.size() == 1 && reports.size() == 1) {
                out.print(ReportWriter.write(reports.get(0)));
            } else if (!reports.isEmpty() || !invalid) {
                out.print(ReportWriter.write(reports, !failed && !invalid));
            }
        } else {
            for (StudyReport r : reports) {
                table(r);
            }
        }
        return invalid ? ExitCodes.BAD_INPUT : failed ? ExitCodes.CHECK_FAILED : ExitCodes.PASS;
    }

    private void table(StudyReport r) {
        out.println(r.study().name() + ": " + r.study().title() + " - " + (r.pass() ? "PASS" : "FAIL"));
        for (CheckResult o : r.results()) {
            String verdict = "  " + (o.pass() ? "pass" : "FAIL");
            if (o instanceof CableCheckResult c) {
                out.println(verdict + "  cable    " + c.device() + " protects " + c.cable() + ": " + c.reason()
                        + crossings(c.crossingsAmps()));
            } else if (o instanceof GradingCheckResult g) {
                out.println(verdict + "  grading  " + g.downstream() + " under " + g.upstream() + ": " + g.reason()
                        + crossings(g.crossingsAmps()));
            }
        }
    }

    private static String crossings(double[] amps) {
        if (amps.length == 0) {
            return "";
        }
        List<String> s = new ArrayList<>();
        for (double a : amps) {
            s.add(Quantities.significant(a, 6));
        }
        return "; crossings at " + String.join(", ", s) + " A";
    }
}
