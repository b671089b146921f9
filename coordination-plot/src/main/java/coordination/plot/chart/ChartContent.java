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
 * @param faultMinAmps lowest prospective fault current to mark, or NaN
 * @param faultMaxAmps highest prospective fault current to mark, or NaN
 * @param cableResults cable check results whose crossings and minimum margins are marked
 * @param gradingResults grading results whose crossings are marked
 */
public record ChartContent(String title, double referenceKv, List<ProtectiveDevice> devices,
        List<CableThermalLimit> cables, double faultMinAmps, double faultMaxAmps, List<CableCheckResult> cableResults,
        List<GradingCheckResult> gradingResults) {

    /** Copies the lists in. */
    public ChartContent {
        devices = List.copyOf(devices);
        cables = List.copyOf(cables);
        cableResults = List.copyOf(cableResults);
        gradingResults = List.copyOf(gradingResults);
    }

    /**
     * The chart of a whole study: every device (referred to the reference voltage), every cable,
     * the widest fault range of its cables and every check's result.
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
        double lo = Double.NaN;
        double hi = Double.NaN;
        for (Study.StudyCable c : study.cables()) {
            cables.add(c.limit());
            if (c.fault().isPresent()) {
                Study.CurrentRange f = c.fault().get();
                lo = Double.isNaN(lo) ? f.fromAmps() : Math.min(lo, f.fromAmps());
                hi = Double.isNaN(hi) ? f.toAmps() : Math.max(hi, f.toAmps());
            }
        }
        return new ChartContent(study.title(), study.voltageKv(), devices, cables, lo, hi,
                report.results(CableCheckResult.class), report.results(GradingCheckResult.class));
    }
}
