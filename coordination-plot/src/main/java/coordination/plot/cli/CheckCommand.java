package coordination.plot.cli;

import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.study.Problem;
import coordination.core.study.ReportWriter;
import coordination.core.study.Sensitivity;
import coordination.core.study.Study;
import coordination.core.study.StudyReport;
import coordination.core.study.TextRules;
import coordination.core.Quantities;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.Stack;
import java.util.regex.Pattern;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.IParameterConsumer;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code coordination check}: runs every check of the studies and prints the verdicts. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Runs every check of the study files and prints a table, or the JSON report."
                + " Exit 0 when all pass, 1 when any check fails, 2 on input errors.")
final class CheckCommand implements Callable<Integer> {
    /** Significant figures of computed values in the table: the inputs are uncertain by 10 % or more. */
    private static final int FIGURES = 3;

    private final InputStream in;
    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1..*", paramLabel = "STUDY", description = "study files or folders of them; - reads one"
            + " study from standard input")
    List<Path> inputs;

    @Option(names = "--json", description = "print the JSON report (one study) or a list of reports")
    boolean json;

    @Mixin
    StudySelection selection = new StudySelection();

    @Option(names = "--sensitivity", arity = "0..1", paramLabel = "MIN,MAX",
            parameterConsumer = FactorsConsumer.class,
            description = "run every check again with each range's lowest current times MIN and its highest times"
                    + " MAX (default 0.9,1.1, or --sensitivity=MIN,MAX) and report the verdicts that flip; the exit"
                    + " code stays that of the study as given")
    Factors sensitivity;

    /** The two factors of {@code --sensitivity}. */
    record Factors(double min, double max) {
    }

    /**
     * Takes the next argument as {@code MIN,MAX} only if it is two numbers; anything else (a study
     * file) stays for the positional parameters and the default factors apply.
     */
    static final class FactorsConsumer implements IParameterConsumer {
        @Override
        public void consumeParameters(Stack<String> args, ArgSpec argSpec, CommandSpec commandSpec) {
            Factors f = new Factors(Sensitivity.DEFAULT_MIN_FACTOR, Sensitivity.DEFAULT_MAX_FACTOR);
            if (!args.isEmpty() && TWO_NUMBERS.matcher(args.peek()).matches()) {
                String value = args.pop();
                double[] given = factors(value);
                if (given == null) {
                    throw new ParameterException(commandSpec.commandLine(), "Invalid value for option"
                            + " '--sensitivity': '" + value + "': give MIN,MAX with 0 < MIN <= 1 <= MAX, e.g. 0.9,1.1");
                }
                f = new Factors(given[0], given[1]);
            }
            argSpec.setValue(f);
        }
    }

    private static final Pattern TWO_NUMBERS = Pattern.compile("\\s*[-+0-9.eE]+\\s*,\\s*[-+0-9.eE]+\\s*");

    CheckCommand(InputStream in, PrintStream out, PrintStream err) {
        this.in = in;
        this.out = out;
        this.err = err;
    }

    @Override
    public Integer call() {
        List<Path> files = selection.files(inputs, "check", err);
        if (files == null) {
            return ExitCodes.BAD_INPUT;
        }
        boolean invalid = false;
        boolean failed = false;
        List<StudyReport> reports = new ArrayList<>();
        List<Sensitivity> runs = new ArrayList<>();
        List<ReportWriter.NotRead> notRead = new ArrayList<>();
        for (Path f : files) {
            StudyInputs.Loaded l = StudyInputs.load(f, in);
            if (l.study() == null) {
                List<String> lines = new ArrayList<>();
                for (Problem p : l.problems()) {
                    err.println(p);
                    lines.add(p.toString());
                }
                notRead.add(new ReportWriter.NotRead(TextRules.printable(f.toString()), lines));
                invalid = true;
                continue;
            }
            Sensitivity run = sensitivity == null ? null : Sensitivity.of(l.study(), sensitivity.min(), sensitivity.max());
            StudyReport r = run == null ? StudyReport.evaluate(l.study()) : run.nominal();
            failed |= !r.pass();
            reports.add(r);
            if (run != null) {
                runs.add(run);
            }
        }
        if (json) {
            if (files.size() == 1 && reports.size() == 1) {
                out.print(runs.isEmpty() ? ReportWriter.write(reports.get(0)) : ReportWriter.write(runs.get(0)));
            } else if (files.size() != 1) {
                // several files: the list form, with the studies that could not be read in not_read
                out.print(sensitivity == null ? ReportWriter.write(reports, notRead, !failed && !invalid)
                        : ReportWriter.writeSensitivities(runs, notRead, !failed && !invalid));
            }
        } else {
            for (int i = 0; i < reports.size(); i++) {
                table(reports.get(i));
                if (!runs.isEmpty()) {
                    flips(runs.get(i));
                }
            }
        }
        return invalid ? ExitCodes.BAD_INPUT : failed ? ExitCodes.CHECK_FAILED : ExitCodes.PASS;
    }

    private void table(StudyReport r) {
        out.println(r.study().name() + ": " + r.study().title() + " - " + (r.pass() ? "PASS" : "FAIL"));
        for (int i = 0; i < r.results().size(); i++) {
            CheckResult o = r.results().get(i);
            double[] crossings = o instanceof CableCheckResult c ? c.crossingsAmps()
                    : ((GradingCheckResult) o).crossingsAmps();
            Study.StudyCheck spec = r.study().checks().get(i);
            String fault = spec instanceof Study.GradingCheckSpec g && !g.faultCase().isEmpty()
                    ? " (" + g.faultCase() + " fault)" : spec instanceof Study.CableCheckSpec cs && !cs.faultCase()
                    .isEmpty() ? " (" + cs.faultCase() + ")" : "";
            out.println("  " + (o.pass() ? "pass" : "FAIL") + "  " + describe(o) + fault + ": " + o.reason()
                    + crossings(crossings));
        }
        r.study().network().ifPresent(n -> n.accepted().forEach(a -> out.println("  accepted, not selective:  "
                + a.downstream() + " under " + a.upstream() + ": " + a.reason())));
        notes(r);
    }

    private static String crossings(double[] amps) {
        if (amps.length == 0) {
            return "";
        }
        List<String> s = new ArrayList<>();
        for (double a : amps) {
            s.add(Quantities.current(a, FIGURES));
        }
        return "; crossings at " + String.join(", ", s);
    }

    private void notes(StudyReport r) {
        Set<String> seen = new LinkedHashSet<>();
        for (StudyReport.CheckNotes n : r.notes()) {
            n.assumptions().forEach(a -> seen.add("  assumed  " + a.message()));
        }
        for (StudyReport.CheckNotes n : r.notes()) {
            n.warnings().forEach(w -> seen.add("  warning  " + w.message()));
        }
        r.warnings().forEach(w -> seen.add("  warning  " + w.message()));
        seen.forEach(out::println);
    }

    private void flips(Sensitivity run) {
        List<Integer> flips = run.flips();
        String head = "  sensitivity, lowest currents x " + Quantities.asGiven(run.minFactor()) + " and highest x "
                + Quantities.asGiven(run.maxFactor()) + ": ";
        if (flips.isEmpty()) {
            out.println(head + "no verdict flips");
            return;
        }
        out.println(head + flips.size() + (flips.size() == 1 ? " verdict flips" : " verdicts flip"));
        for (int i : flips) {
            CheckResult w = run.widened().results().get(i);
            out.println("    " + (w.pass() ? "FAIL -> pass  " : "pass -> FAIL  ") + describe(w) + ": " + w.reason());
        }
    }

    private static String describe(CheckResult o) {
        if (o instanceof CableCheckResult c) {
            return "cable    " + c.device() + " protects " + c.cable();
        }
        GradingCheckResult g = (GradingCheckResult) o;
        return "grading  " + g.downstream() + " under " + g.upstream();
    }

    /** The two factors of {@code MIN,MAX}, or null if they are not numbers with 0 < MIN <= 1 <= MAX. */
    static double[] factors(String text) {
        String[] parts = text.split(",", -1);
        if (parts.length != 2) {
            return null;
        }
        try {
            double lo = Double.parseDouble(parts[0].strip());
            double hi = Double.parseDouble(parts[1].strip());
            return lo > 0 && lo <= 1 && hi >= 1 && Double.isFinite(hi) ? new double[] {lo, hi} : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
