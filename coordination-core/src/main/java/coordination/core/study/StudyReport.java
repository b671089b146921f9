package coordination.core.study;

import coordination.core.Quantities;
import coordination.core.margin.CableChecker;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingChecker;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;

/**
 * The results of every check of a study, in study order, with what each rests on. {@link ReportWriter}
 * writes its JSON form ({@code spec/report-format.md}).
 *
 * @param study the study
 * @param results one result per check, in the order of the study's checks
 * @param notes the assumptions and warnings of each check, in the same order
 * @param warnings warnings about the study as a whole
 */
public record StudyReport(Study study, List<CheckResult> results, List<CheckNotes> notes, List<Note> warnings)
        implements Serializable {

    /** Version of the report format. */
    public static final int FORMAT = 1;

    /**
     * What one check rests on.
     *
     * @param assumptions defaults and assumptions its result depends on
     * @param warnings what its context says it leaves out
     */
    public record CheckNotes(List<Note> assumptions, List<Note> warnings) implements Serializable {
        /**
         * Copies the lists in.
         *
         * @param assumptions defaults and assumptions its result depends on
         * @param warnings what its context says it leaves out
         */
        public CheckNotes {
            assumptions = List.copyOf(assumptions);
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * Copies the lists in.
     *
     * @param study the study
     * @param results one result per check, in the order of the study's checks
     * @param notes the assumptions and warnings of each check, in the same order
     * @param warnings warnings about the study as a whole
     * @throws IllegalArgumentException if there are not as many notes as results
     */
    public StudyReport {
        results = List.copyOf(results);
        notes = List.copyOf(notes);
        warnings = List.copyOf(warnings);
        if (notes.size() != results.size()) {
            throw new IllegalArgumentException("study report: found " + notes.size() + " notes for " + results.size()
                    + " results - must be one each");
        }
    }

    /**
     * Runs every check of a study.
     *
     * @param study the study
     * @return the report
     */
    public static StudyReport evaluate(Study study) {
        List<CheckResult> results = new ArrayList<>();
        List<CheckNotes> notes = new ArrayList<>();
        StudyNotes noting = new StudyNotes(study);
        // one checker of each kind for the whole study: a check run again on it is the same to the last bit
        CableChecker cableChecker = new CableChecker();
        GradingChecker gradingChecker = new GradingChecker();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec cc) {
                results.add(cableCheck(study.device(cc.device()).referred(), study.cable(cc.cable()).limit(), cc,
                        cableChecker));
            } else if (c instanceof Study.GradingCheckSpec g) {
                gradingChecker.run(study.device(g.upstream()).referred().referredBy(1 / g.upstreamScale()),
                        study.device(g.downstream()).referred(), g.range().fromAmps(), g.range().toAmps(),
                        g.requirement());
                results.add(gradingChecker.result());
            }
            notes.add(noting.of(c, results.get(results.size() - 1)));
        }
        List<Note> warnings = new ArrayList<>(rideThrough(study));
        study.network().ifPresent(n -> n.warnings().stream().filter(w -> !StudyNotes.isCableAssumption(w))
                .forEach(warnings::add));
        return new StudyReport(study, results, notes, warnings);
    }

    /**
     * Runs one cable check on a device, already referred to the study's voltage, and its cable. A
     * check of one conductor of a parallel group compares that conductor with the device seen
     * through the conductor's share of its current.
     *
     * @param device the protecting device at the study's voltage
     * @param limit the cable's limit, all its conductors
     * @param cc the check
     * @return the result
     */
    static coordination.core.margin.CableCheckResult cableCheck(coordination.core.curve.ProtectiveDevice device,
            coordination.core.cable.CableThermalLimit limit, Study.CableCheckSpec cc) {
        return cableCheck(device, limit, cc, new CableChecker());
    }

    /**
     * Runs one cable check as {@link #cableCheck(coordination.core.curve.ProtectiveDevice,
     * coordination.core.cable.CableThermalLimit, Study.CableCheckSpec)} does, on a checker the
     * caller runs again.
     *
     * @param device the protecting device at the study's voltage
     * @param limit the cable's limit, all its conductors
     * @param cc the check
     * @param checker the checker to run it on
     * @return the result
     */
    static coordination.core.margin.CableCheckResult cableCheck(coordination.core.curve.ProtectiveDevice device,
            coordination.core.cable.CableThermalLimit limit, Study.CableCheckSpec cc, CableChecker checker) {
        coordination.core.curve.ProtectiveDevice seen = device;
        coordination.core.cable.CableThermalLimit conductor = limit;
        if (cc.conductorShare() != 1.0) {
            seen = device.referredBy(cc.conductorShare());
            conductor = limit.withParallel(1);
        }
        checker.run(seen, conductor, cc.range().fromAmps(), cc.range().toAmps(), cc.requirement(),
                cc.dcOffset().orElse(null));
        return checker.result();
    }

    /** A device that trips on a current the study says it must ride through does its job badly. */
    private static List<Note> rideThrough(Study study) {
        List<Note> out = new ArrayList<>();
        for (Study.StudyDevice d : study.devices()) {
            for (coordination.core.design.NoTrip p : d.limits().noTrip()) {
                double t = d.device().minimumCurve().seconds(p.currentAmps());
                if (t < p.seconds()) {
                    out.add(new Note("no-trip-not-met", "'" + d.id() + "' can operate at "
                            + Quantities.current(p.currentAmps(), 3) + " in " + Quantities.significant(t, 3)
                            + " s, before the " + Quantities.significant(p.seconds(), 3) + " s it must ride through"));
                }
            }
        }
        return out;
    }

    /**
     * The results of one kind, in study order.
     *
     * @param kind the result type, e.g. {@code CableCheckResult.class}
     * @param <T> the result type
     * @return the results of that kind
     */
    public <T extends CheckResult> List<T> results(Class<T> kind) {
        return results.stream().filter(kind::isInstance).map(kind::cast).toList();
    }

    /** @return whether every check passes (true for a study without checks) */
    public boolean pass() {
        return results.stream().allMatch(CheckResult::pass);
    }

    /** @return the number of failing checks */
    public int failures() {
        return (int) results.stream().filter(r -> !r.pass()).count();
    }
}
