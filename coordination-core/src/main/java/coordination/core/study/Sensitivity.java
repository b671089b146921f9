package coordination.core.study;

import coordination.core.internal.Checks;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;

/**
 * A study run again with its fault currents widened: every check's lowest current times a factor
 * below one and its highest times a factor above one. Fault levels are uncertain by 10 % or more
 * (source impedance, cable lengths, temperatures), so a verdict that flips inside that spread is
 * fragile. {@link ReportWriter} writes it as the report's {@code sensitivity}.
 *
 * @param minFactor factor on each range's lowest current, in (0, 1]
 * @param maxFactor factor on each range's highest current, at least 1
 * @param nominal the report of the study as given
 * @param widened the report with every range widened
 */
public record Sensitivity(double minFactor, double maxFactor, StudyReport nominal, StudyReport widened)
        implements Serializable {

    /** Factor on the lowest currents when none is given: 10 % below (common practice). */
    public static final double DEFAULT_MIN_FACTOR = 0.9;
    /** Factor on the highest currents when none is given: 10 % above (common practice). */
    public static final double DEFAULT_MAX_FACTOR = 1.1;

    /**
     * Validates the run.
     *
     * @param minFactor factor on each range's lowest current, in (0, 1]
     * @param maxFactor factor on each range's highest current, at least 1
     * @param nominal the report of the study as given
     * @param widened the report with every range widened
     * @throws IllegalArgumentException if a factor is out of range or the reports differ in size
     */
    public Sensitivity {
        Checks.given("sensitivity: nominal report", nominal);
        Checks.given("sensitivity: widened report", widened);
        if (!(minFactor > 0 && minFactor <= 1)) {
            throw new IllegalArgumentException("sensitivity: minimum factor is " + minFactor
                    + " - must be above 0 and at most 1");
        }
        if (!(maxFactor >= 1 && Double.isFinite(maxFactor))) {
            throw new IllegalArgumentException("sensitivity: maximum factor is " + maxFactor
                    + " - must be at least 1 and finite");
        }
        if (nominal.results().size() != widened.results().size()) {
            throw new IllegalArgumentException("sensitivity: the reports have " + nominal.results().size() + " and "
                    + widened.results().size() + " checks - must be the same");
        }
    }

    /**
     * Runs a study as given and with its ranges widened.
     *
     * @param study the study
     * @param minFactor factor on each range's lowest current
     * @param maxFactor factor on each range's highest current
     * @return both runs
     */
    public static Sensitivity of(Study study, double minFactor, double maxFactor) {
        StudyReport nominal = StudyReport.evaluate(study);
        StudyReport widened = StudyReport.evaluate(study.withFaultFactors(minFactor, maxFactor));
        return new Sensitivity(minFactor, maxFactor, nominal, widened);
    }

    /** @return the indices of the checks whose verdict differs between the two runs, in study order */
    public List<Integer> flips() {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < nominal.results().size(); i++) {
            if (nominal.results().get(i).pass() != widened.results().get(i).pass()) {
                out.add(i);
            }
        }
        return out;
    }
}
