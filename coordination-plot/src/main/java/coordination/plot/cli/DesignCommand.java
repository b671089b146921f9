package coordination.plot.cli;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.design.MinimumConductor;
import coordination.core.design.RadialGrading;
import coordination.core.design.SlowestSetting;
import coordination.core.internal.Checks;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import coordination.core.study.Problem;
import coordination.core.study.ReportJson;
import coordination.core.study.Study;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
    /** Setting ranges of common relays (from memory): TMS 0.05 to 1, time dial 0.5 to 15. */
    static final double[] TMS_RANGE = {0.05, 1.0};
    static final double[] TIME_DIAL_RANGE = {0.5, 15.0};

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
        Study study = l.study();
        Map<String, Object> report = new LinkedHashMap<>();
        report.put("study", study.name());
        report.put("title", study.title());
        List<Object> cables = new ArrayList<>();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec spec) {
                cables.add(cableAid(study, spec));
            }
        }
        report.put("cable_checks", cables);
        report.put("grading_chains", chains(study));
        if (json) {
            out.print(ReportJson.write(report));
        } else {
            text(report);
        }
        return ExitCodes.PASS;
    }

    private Map<String, Object> cableAid(Study study, Study.CableCheckSpec spec) {
        Study.StudyCable cable = study.cable(spec.cable());
        Study.StudyDevice device = study.device(spec.device());
        CableThermalLimit limit = cable.limit();
        boolean defaults = limit.initialCelsius() == limit.insulation().maxOperatingCelsius()
                && limit.finalCelsius() == limit.insulation().shortCircuitCelsius(limit.sizeMm2());
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("cable", spec.cable());
        m.put("device", spec.device());
        m.put("range_a", List.of(spec.fromAmps(), spec.toAmps()));
        m.put("requirement", spec.requirement().toString());
        MinimumConductor.Result size = MinimumConductor.solve(device.referred(), limit, defaults, spec.fromAmps(),
                spec.toAmps(), spec.requirement());
        Map<String, Object> s = new LinkedHashMap<>();
        s.put("now", cable.sizeText());
        s.put("now_mm2", limit.sizeMm2());
        s.put("parallel", limit.parallel());
        s.put("smallest_mm2", size.found() ? size.sizeMm2() : null);
        s.put("next_iec_mm2", size.found() && !Double.isNaN(size.iecSizeMm2()) ? size.iecSizeMm2() : null);
        s.put("next_awg_kcmil", size.found() ? size.awgOrKcmil() : null);
        s.put("problem", size.reason());
        m.put("conductor", s);
        if (device.device() instanceof Relay relay && firstInverse(relay) >= 0) {
            int index = firstInverse(relay);
            InverseTimeStage stage = (InverseTimeStage) relay.stages().get(index);
            double factor = device.voltageKv() / study.voltageKv();
            double[] range = range(stage);
            SlowestSetting.Result tms = SlowestSetting.largestMultiplier(relay, index, factor, limit, spec.fromAmps(),
                    spec.toAmps(), spec.requirement(), range[1]);
            SlowestSetting.Result pickup = SlowestSetting.largestPickup(relay, index, factor, limit, spec.fromAmps(),
                    spec.toAmps(), spec.requirement());
            m.put("stage", stage.label());
            Map<String, Object> t = setting(tms);
            t.put("at_relay_limit", tms.found() && tms.largest() >= range[1]);
            m.put(multiplierKey(stage), t);
            m.put("pickup_a", setting(pickup));
        }
        return m;
    }

    private static Map<String, Object> setting(SlowestSetting.Result r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("now", r.current());
        m.put("largest", r.found() ? r.largest() : null);
        m.put("problem", r.reason());
        return m;
    }

    private static String multiplierKey(InverseTimeStage s) {
        InverseTimeFamily f = InverseTimeFamily.byKey(s.label());
        return f != null && f.isIeee() ? "time_dial" : "tms";
    }

    private static double[] range(InverseTimeStage s) {
        return multiplierKey(s).equals("time_dial") ? TIME_DIAL_RANGE : TMS_RANGE;
    }

    static int firstInverse(Relay relay) {
        for (int i = 0; i < relay.stages().size(); i++) {
            if (relay.stages().get(i) instanceof InverseTimeStage) {
                return i;
            }
        }
        return -1;
    }

    /** Chains of relays linked by interval grading checks, each from its load end up. */
    private List<Object> chains(Study study) {
        Map<String, Study.GradingCheckSpec> above = new LinkedHashMap<>();
        Map<String, Integer> belowCount = new HashMap<>();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.GradingCheckSpec g && g.requirement() instanceof GradingRequirement.Interval
                    && study.device(g.upstream()).device() instanceof Relay ru && firstInverse(ru) >= 0
                    && study.device(g.downstream()).device() instanceof Relay rd && firstInverse(rd) >= 0
                    && !above.containsKey(g.downstream())) {
                above.put(g.downstream(), g);
                belowCount.merge(g.upstream(), 1, Integer::sum);
            }
        }
        List<Object> result = new ArrayList<>();
        for (String start : above.keySet()) {
            if (belowCount.containsKey(start)) {
                continue;
            }
            List<RadialGrading.Link> links = new ArrayList<>();
            List<String> ids = new ArrayList<>();
            String id = start;
            double interval = ((GradingRequirement.Interval) above.get(start).requirement()).seconds();
            while (id != null && !ids.contains(id)) {
                Study.GradingCheckSpec g = above.get(id);
                Study.StudyDevice d = study.device(id);
                Relay relay = (Relay) d.device();
                InverseTimeStage stage = (InverseTimeStage) relay.stages().get(firstInverse(relay));
                Study.CableCheckSpec cc = cableCheckOf(study, id);
                double lo = g != null ? g.fromAmps() : cc != null ? cc.fromAmps() : links.get(links.size() - 1).faultMinAmps();
                double hi = g != null ? g.toAmps() : cc != null ? cc.toAmps() : links.get(links.size() - 1).faultMaxAmps();
                double[] r = range(stage);
                links.add(new RadialGrading.Link(relay, d.voltageKv() / study.voltageKv(),
                        cc == null ? null : study.cable(cc.cable()).limit(),
                        cc == null ? MarginRequirement.seconds(0) : cc.requirement(), lo, hi, r[0], r[1]));
                ids.add(id);
                id = g == null ? null : g.upstream();
            }
            List<Object> settings = new ArrayList<>();
            for (RadialGrading.Setting s : RadialGrading.grade(links, interval)) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("relay", s.id());
                m.put("now", s.currentMultiplier());
                m.put("proposed", Double.isNaN(s.multiplier()) ? null : s.multiplier());
                m.put("min_interval_s", s.grading() == null || !Double.isFinite(s.grading().minIntervalSeconds()) ? null
                        : s.grading().minIntervalSeconds());
                m.put("cable_min_margin_s", s.cable() == null || !Double.isFinite(s.cable().minMarginSeconds()) ? null
                        : s.cable().minMarginSeconds());
                m.put("problem", s.problem());
                settings.add(m);
            }
            Map<String, Object> chain = new LinkedHashMap<>();
            chain.put("interval_s", interval);
            chain.put("relays", settings);
            result.add(chain);
        }
        return result;
    }

    private static Study.CableCheckSpec cableCheckOf(Study study, String device) {
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec cc && cc.device().equals(device)) {
                return cc;
            }
        }
        return null;
    }

    @SuppressWarnings("unchecked")
    private void text(Map<String, Object> report) {
        out.println("design " + report.get("study") + ": " + report.get("title"));
        for (Object o : (List<Object>) report.get("cable_checks")) {
            Map<String, Object> m = (Map<String, Object>) o;
            List<Double> range = (List<Double>) m.get("range_a");
            out.println("  " + m.get("device") + " protecting " + m.get("cable") + " from " + kA(range.get(0)) + " to "
                    + kA(range.get(1)) + " kA with " + m.get("requirement") + ":");
            Map<String, Object> s = (Map<String, Object>) m.get("conductor");
            out.println("    conductor  now " + s.get("now") + (((int) s.get("parallel")) > 1 ? " x " + s.get("parallel")
                    : "") + ", smallest " + (s.get("smallest_mm2") == null ? "none: " + s.get("problem")
                    : num((Double) s.get("smallest_mm2")) + " mm² -> "
                    + (s.get("next_iec_mm2") == null ? "above 2500 mm²" : num((Double) s.get("next_iec_mm2")) + " mm²")
                    + (s.get("next_awg_kcmil") == null ? "" : " or " + s.get("next_awg_kcmil"))));
            for (String key : new String[] {"tms", "time_dial", "pickup_a"}) {
                if (m.containsKey(key)) {
                    Map<String, Object> v = (Map<String, Object>) m.get(key);
                    out.println("    " + String.format(java.util.Locale.ROOT, "%-10s", key) + " now "
                            + num((Double) v.get("now")) + ", largest " + (v.get("largest") == null ? "none: "
                            + v.get("problem") : num((Double) v.get("largest"))
                            + (Boolean.TRUE.equals(v.get("at_relay_limit")) ? " (the relay's largest setting)" : "")));
                }
            }
        }
        for (Object o : (List<Object>) report.get("grading_chains")) {
            Map<String, Object> c = (Map<String, Object>) o;
            out.println("  grading chain with " + num((Double) c.get("interval_s")) + " s, from the load end:");
            for (Object r : (List<Object>) c.get("relays")) {
                Map<String, Object> m = (Map<String, Object>) r;
                out.println("    " + m.get("relay") + " multiplier now " + num((Double) m.get("now")) + ", proposed "
                        + (m.get("proposed") == null ? "none" : num((Double) m.get("proposed")))
                        + (m.get("min_interval_s") == null ? "" : " (interval " + num((Double) m.get("min_interval_s"))
                        + " s)") + (m.get("problem") == null ? "" : " - " + m.get("problem")));
            }
        }
    }

    private static String kA(double amps) {
        return Checks.format(Math.round(amps / 10.0) / 100.0);
    }

    private static String num(Double v) {
        if (v == null) {
            return "-";
        }
        double scale = Math.pow(10, 3 - Math.floor(Math.log10(Math.abs(v))));
        return Checks.format(Math.round(v * scale) / scale);
    }
}
