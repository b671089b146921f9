package coordination.core.study;

import coordination.core.cable.CableThermalLimit;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The results of every check of a study, and its JSON form ({@code spec/report-format.md}).
 *
 * @param study the study
 * @param cableResults results of the cable checks, in study order
 * @param gradingResults results of the grading checks, in study order
 * @param order the results of all checks in study order
 */
public record StudyReport(Study study, List<CableCheckResult> cableResults, List<GradingCheckResult> gradingResults,
        List<Object> order) {

    /** Version of the report format. */
    public static final int FORMAT = 1;

    /** Copies the lists in. */
    public StudyReport {
        cableResults = List.copyOf(cableResults);
        gradingResults = List.copyOf(gradingResults);
        order = List.copyOf(order);
    }

    /**
     * Runs every check of a study.
     *
     * @param study the study
     * @return the report
     */
    public static StudyReport evaluate(Study study) {
        List<CableCheckResult> cables = new ArrayList<>();
        List<GradingCheckResult> gradings = new ArrayList<>();
        List<Object> order = new ArrayList<>();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec cc) {
                CableCheckResult r = new CableCheck(study.device(cc.device()).referred(), study.cable(cc.cable()).limit(),
                        cc.fromAmps(), cc.toAmps(), cc.requirement(), cc.dcOffset()).result();
                cables.add(r);
                order.add(r);
            } else if (c instanceof Study.GradingCheckSpec g) {
                GradingCheckResult r = GradingCheck.check(study.device(g.upstream()).referred(),
                        study.device(g.downstream()).referred(), g.fromAmps(), g.toAmps(), g.requirement());
                gradings.add(r);
                order.add(r);
            }
        }
        return new StudyReport(study, cables, gradings, order);
    }

    /** @return whether every check passes (true for a study without checks) */
    public boolean pass() {
        return cableResults.stream().allMatch(CableCheckResult::pass)
                && gradingResults.stream().allMatch(GradingCheckResult::pass);
    }

    /** @return the number of failing checks */
    public int failures() {
        return (int) (cableResults.stream().filter(r -> !r.pass()).count()
                + gradingResults.stream().filter(r -> !r.pass()).count());
    }

    /**
     * The JSON form: {@code format}, {@code title}, {@code pass}, {@code reference_voltage_kv},
     * {@code checks} and {@code cables}.
     *
     * @return an ordered map of JSON values
     */
    public Map<String, Object> toJson() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("format", FORMAT);
        m.put("study", study.name());
        m.put("title", study.title());
        m.put("revision", study.revision().isEmpty() ? null : study.revision());
        m.put("date", study.date().isEmpty() ? null : study.date());
        m.put("reference_voltage_kv", study.voltageKv());
        m.put("frequency_hz", study.frequencyHz());
        m.put("pass", pass());
        List<Object> checks = new ArrayList<>();
        for (Object r : order) {
            checks.add(r instanceof CableCheckResult c ? c.toJson() : ((GradingCheckResult) r).toJson());
        }
        m.put("checks", checks);
        List<Object> cables = new ArrayList<>();
        for (Study.StudyCable c : study.cables()) {
            CableThermalLimit l = c.limit();
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("id", l.id());
            e.put("conductor", l.material().key());
            e.put("insulation", l.insulation().key());
            e.put("size", c.sizeText());
            e.put("size_mm2", l.sizeMm2());
            e.put("parallel", l.parallel());
            e.put("initial_c", l.initialCelsius());
            e.put("final_c", l.finalCelsius());
            e.put("method", l.method().key());
            e.put("k", l.k());
            e.put("i2t_a2s", l.i2tA2s());
            e.put("withstand_0_1s_a", l.withstandAmps(0.1));
            e.put("withstand_1s_a", l.withstandAmps(1.0));
            e.put("withstand_5s_a", l.withstandAmps(5.0));
            e.put("fault_a", Double.isNaN(c.faultMinAmps()) ? null : List.of(c.faultMinAmps(), c.faultMaxAmps()));
            cables.add(e);
        }
        m.put("cables", cables);
        return m;
    }
}
