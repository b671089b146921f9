package coordination.plot.cli;

import coordination.core.design.MinimumConductor;
import coordination.core.design.RadialGrading;
import coordination.core.design.SlowestSetting;
import coordination.core.study.Problem;
import coordination.core.study.ReportWriter;
import coordination.core.study.StudyDesign;
import coordination.plot.Quantities;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code coordination design}: proposes values from the study's checks, beside the current ones. */
@Command(name = "design", mixinStandardHelpOptions = true,
        description = "For each cable check: the smallest conductor the device protects, and for relays the"
                + " largest time multiplier and pickup of the inverse-time stage that still protect the cable."
                + " For relays graded with interval_s: the smallest multipliers that grade, from the load end up.")
final class DesignCommand implements Callable<Integer> {
    /** Significant figures of the proposals in the text output. */
    private static final int FIGURES = 4;

    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1", paramLabel = "STUDY", description = "a study file")
    Path input;

    @Option(names = "--json", description = "print the proposals as JSON")
    boolean json;

    DesignCommand(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    @Override
    public Integer call() {
        List<Path> files = StudyInputs.collect(List.of(input), err);
        if (files == null || files.size() != 1) {
            if (files != null) {
                err.println("coordination design: " + input + ": give one study file");
            }
            return ExitCodes.BAD_INPUT;
        }
        StudyInputs.Loaded l = StudyInputs.load(files.get(0));
        if (l.study() == null) {
            for (Problem p : l.problems()) {
                err.println(p);
            }
            return ExitCodes.BAD_INPUT;
        }
        StudyDesign design = StudyDesign.of(l.study());
        if (json) {
            out.print(ReportWriter.write(design));
        } else {
            text(design);
        }
        return ExitCodes.PASS;
    }

    private void text(StudyDesign design) {
        out.println("design " + design.study().name() + ": " + design.study().title());
        for (StudyDesign.CableAid a : design.cableAids()) {
            out.println("  " + a.check().device() + " protecting " + a.check().cable() + " from "
                    + Quantities.kiloamps(a.check().range().fromAmps(), 3) + " to "
                    + Quantities.kiloamps(a.check().range().toAmps(), 3) + " kA with " + a.check().requirement() + ":");
            MinimumConductor.Result s = a.conductor();
            int parallel = a.cable().limit().parallel();
            out.println("    conductor  now " + a.cable().sizeText() + (parallel > 1 ? " x " + parallel : "")
                    + ", smallest " + (!s.found() ? "none: " + s.reason()
                    : num(s.sizeMm2()) + " mm² -> " + (Double.isNaN(s.iecSizeMm2()) ? "above 2500 mm²"
                    : num(s.iecSizeMm2()) + " mm²") + (s.awgOrKcmil() == null ? "" : " or " + s.awgOrKcmil())));
            a.stage().ifPresent(stage -> {
                setting(stage.stage().multiplierKind().key(), stage.multiplier(), stage.multiplierAtRelayLimit());
                setting("pickup_a", stage.pickup(), false);
            });
        }
        for (StudyDesign.GradingChain c : design.chains()) {
            out.println("  grading chain with " + num(c.intervalSeconds()) + " s, from the load end:");
            for (RadialGrading.Setting m : c.relays()) {
                double interval = m.grading() == null ? Double.NaN : m.grading().minIntervalSeconds();
                out.println("    " + m.id() + " multiplier now " + num(m.currentMultiplier()) + ", proposed "
                        + (Double.isNaN(m.multiplier()) ? "none" : num(m.multiplier()))
                        + (Double.isFinite(interval) ? " (interval " + num(interval) + " s)" : "")
                        + (m.problem() == null ? "" : " - " + m.problem()));
            }
        }
    }

    private void setting(String key, SlowestSetting.Result r, boolean atLimit) {
        out.println("    " + String.format(Locale.ROOT, "%-10s", key) + " now " + num(r.current()) + ", largest "
                + (!r.found() ? "none: " + r.reason() : num(r.largest())
                + (atLimit ? " (the relay's largest setting)" : "")));
    }

    private static String num(double v) {
        return Quantities.significant(v, FIGURES);
    }
}
