package coordination.plot.cli;

import coordination.core.design.MinimumConductor;
import coordination.core.design.RadialGrading;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.MarginRequirement;
import coordination.core.study.Problem;
import coordination.core.study.ReportWriter;
import coordination.core.study.StudyDesign;
import coordination.core.Quantities;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
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
    /** Significant figures of computed values in the text output: the inputs are uncertain by 10 % or more. */
    private static final int FIGURES = 3;

    private final InputStream in;
    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1", paramLabel = "STUDY", description = "a study file")
    Path input;

    @Option(names = "--json", description = "print the proposals as JSON")
    boolean json;

    DesignCommand(InputStream in, PrintStream out, PrintStream err) {
        this.in = in;
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
        StudyInputs.Loaded l = StudyInputs.load(files.get(0), in);
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
                    + Quantities.current(a.check().range().fromAmps(), FIGURES) + " to "
                    + Quantities.current(a.check().range().toAmps(), FIGURES) + " with " + a.check().requirement()
                    + ":");
            MinimumConductor.Result s = a.conductor();
            int parallel = a.cable().limit().parallel();
            String per = parallel > 1 ? " per conductor (" + parallel + " in parallel)" : "";
            out.println("    conductor: now " + a.cable().sizeText() + per + ", smallest " + (!s.found()
                    ? "none: " + s.reason() : num(s.sizeMm2()) + " mm²" + per + bindsAt(s) + " -> " + (Double.isNaN(s.iecSizeMm2())
                    ? "above 2500 mm²" : Quantities.asGiven(s.iecSizeMm2()) + " mm²")
                    + (s.awgOrKcmil() == null ? "" : " or " + s.awgOrKcmil())));
            a.stage().ifPresent(stage -> {
                multiplier(stage.multiplier());
                pickup(stage.pickup());
            });
        }
        for (StudyDesign.GradingChain c : design.chains()) {
            out.println("  grading by time, from the load end:");
            for (int i = 0; i < c.relays().size(); i++) {
                RadialGrading.Setting m = c.relays().get(i);
                StringBuilder line = new StringBuilder("    " + m.id() + ": " + m.kind().key().replace('_', ' ')
                        + " now " + Quantities.asGiven(m.currentMultiplier()) + ", proposed ");
                if (m.proposed().isPresent()) {
                    line.append(Quantities.asGiven(m.proposed().getAsDouble())).append(" (").append(m.binding().words());
                    m.bindingDevice().ifPresent(d -> line.append(" '").append(d).append("'"));
                    if (m.exact().isPresent() && m.binding() != RadialGrading.Binding.SMALLEST_SETTING) {
                        line.append("; exactly ").append(num(m.exact().getAsDouble()));
                    }
                    line.append(")");
                    for (GradingCheckResult g : m.gradings()) {
                        line.append(g.upstream().equals(m.id()) ? "; over '" + g.downstream() + "'" : "; under '"
                                + g.upstream() + "'").append(" ").append(g.pass() ? "meets " : "fails ")
                                .append(g.requirement()).append(" (").append(num(g.minIntervalSeconds())).append(" s)");
                    }
                } else {
                    line.append("none");
                }
                m.problem().ifPresent(p -> line.append(" - ").append(p));
                out.println(line);
            }
        }
    }

    private void multiplier(StudyDesign.MultiplierAid m) {
        String key = m.kind().key().replace('_', ' ');
        out.println("    " + key + ": now " + Quantities.asGiven(m.now()) + ", largest " + (m.proposed().isPresent()
                ? Quantities.asGiven(m.proposed().getAsDouble()) + " (" + m.binding().words() + "; settings "
                + m.range() + ")" : "none") + m.problem().map(p -> " - " + p).orElse(""));
    }

    private void pickup(StudyDesign.PickupAid p) {
        String unit = p.secondary() ? " A secondary" : " A";
        String primary = p.secondary() ? " (" + num(p.now() * p.ctRatio()) + " A primary)" : "";
        StringBuilder line = new StringBuilder("    pickup: now " + Quantities.asGiven(p.now()) + unit + primary
                + ", largest ");
        if (p.proposed().isPresent()) {
            double v = p.proposed().getAsDouble();
            line.append(Quantities.asGiven(v)).append(unit);
            if (p.secondary()) {
                line.append(" (").append(num(v * p.ctRatio())).append(" A primary)");
            }
            line.append(" (").append(p.binding().words()).append(")");
            p.lowestForLoad().ifPresent(l -> line.append(", at least ").append(num(l)).append(unit).append(" for the load"));
        } else {
            line.append("none");
        }
        p.problem().ifPresent(x -> line.append(" - ").append(x));
        out.println(line);
    }

    /** Where the smallest conductor's margin is least: the current that decides its size. */
    private static String bindsAt(MinimumConductor.Result s) {
        if (s.check() == null) {
            return "";
        }
        double at = s.check().requirement() instanceof MarginRequirement.Ratio ? s.check().minRatioAtAmps()
                : s.check().minMarginAtAmps();
        return Double.isFinite(at) ? " (the cable's margin at " + Quantities.current(at, FIGURES) + ")" : "";
    }

    private static String num(double v) {
        return Quantities.significant(v, FIGURES);
    }
}
