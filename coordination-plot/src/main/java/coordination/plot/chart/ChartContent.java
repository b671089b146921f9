package coordination.plot.chart;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.study.Study;
import coordination.core.study.StudyReport;
import java.util.ArrayList;
import java.util.List;

/**
 * What a time-current chart shows. Currents are in amperes at the reference voltage; devices on
 * other voltage levels must already be referred to it.
 *
 * @param title chart title
 * @param referenceKv reference voltage of the current axis in kV
 * @param devices devices to draw, in legend order
 * @param cables cable limits to draw
 * @param faults prospective fault-current ranges to mark, one per cable that has one
 * @param cableResults cable check results whose crossings and minimum margins are marked
 * @param gradingResults grading results whose ranges and crossings are marked
 */
public record ChartContent(String title, double referenceKv, List<ProtectiveDevice> devices,
        List<CableThermalLimit> cables, List<FaultRange> faults, List<CableCheckResult> cableResults,
        List<GradingCheckResult> gradingResults) {

    /**
     * A cable's prospective fault currents.
     *
     * @param cable the cable's id, or empty for a chart of one range
     * @param minAmps lowest fault current
     * @param maxAmps highest fault current
     */
    public record FaultRange(String cable, double minAmps, double maxAmps) {
    }

    /**
     * Copies the lists in.
     *
     * @param title chart title
     * @param referenceKv reference voltage of the current axis in kV
     * @param devices devices to draw, in legend order
     * @param cables cable limits to draw
     * @param faults prospective fault-current ranges to mark, one per cable that has one
     * @param cableResults cable check results whose crossings and minimum margins are marked
     * @param gradingResults grading results whose ranges and crossings are marked
     */
    public ChartContent {
        devices = List.copyOf(devices);
        cables = List.copyOf(cables);
        faults = List.copyOf(faults);
        cableResults = List.copyOf(cableResults);
        gradingResults = List.copyOf(gradingResults);
    }

    /**
     * A chart with one fault range, or none.
     *
     * @param title chart title
     * @param referenceKv reference voltage in kV
     * @param devices devices to draw
     * @param cables cable limits to draw
     * @param faultMinAmps lowest prospective fault current to mark, or NaN for none
     * @param faultMaxAmps highest prospective fault current to mark, or NaN
     * @param cableResults cable check results to mark
     * @param gradingResults grading results to mark
     */
    public ChartContent(String title, double referenceKv, List<ProtectiveDevice> devices,
            List<CableThermalLimit> cables, double faultMinAmps, double faultMaxAmps,
            List<CableCheckResult> cableResults, List<GradingCheckResult> gradingResults) {
        this(title, referenceKv, devices, cables, Double.isNaN(faultMinAmps) ? List.of()
                : List.of(new FaultRange("", faultMinAmps, faultMaxAmps)), cableResults, gradingResults);
    }

    /**
     * The chart of a whole study: every device (referred to the reference voltage), every cable
     * with its own fault range (stated, or its first cable check's), and every check's result.
     *
     * @param study the study
     * @param report its evaluated report
     * @return the content
     */
    public static ChartContent of(Study study, StudyReport report) {
        List<ProtectiveDevice> devices = new ArrayList<>();
        for (Study.StudyDevice d : study.devices()) {
            devices.add(d.referred());
        }
        List<CableThermalLimit> cables = new ArrayList<>();
        List<FaultRange> faults = new ArrayList<>();
        boolean named = study.cables().size() > 1;
        for (Study.StudyCable c : study.cables()) {
            cables.add(c.limit());
            Study.CurrentRange range = c.fault().orElse(null);
            for (Study.StudyCheck check : study.checks()) {
                if (range == null && check instanceof Study.CableCheckSpec cc && cc.cable().equals(c.id())) {
                    range = cc.range();
                }
            }
            if (range != null) {
                faults.add(new FaultRange(named ? c.id() : "", range.fromAmps(), range.toAmps()));
            }
        }
        return new ChartContent(study.title(), study.voltageKv(), devices, cables, faults,
                report.results(CableCheckResult.class), report.results(GradingCheckResult.class));
    }

    /** @return the lowest fault current of any range, or NaN without ranges */
    public double faultMinAmps() {
        return faults.stream().mapToDouble(FaultRange::minAmps).min().orElse(Double.NaN);
    }

    /** @return the highest fault current of any range, or NaN without ranges */
    public double faultMaxAmps() {
        return faults.stream().mapToDouble(FaultRange::maxAmps).max().orElse(Double.NaN);
    }
}
