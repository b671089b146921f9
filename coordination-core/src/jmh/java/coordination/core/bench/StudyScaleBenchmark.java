package coordination.core.bench;

import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * How a study's run grows: 1, 10 or 50 cable checks, each a three-stage relay over its own cable,
 * over a narrow range (1.5 to 3 kA, one stage's curve) or a wide one (0.3 to 30 kA, every stage
 * and the 0.1 s and 5 s edges). Divide the time by the number of checks for the cost of one.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class StudyScaleBenchmark {
    @Param({"1", "10", "50"})
    int checks;

    @Param({"narrow", "wide"})
    String range;

    private Study study;

    @Setup
    public void read() {
        String fault = range.equals("narrow") ? "{min: 1.5, max: 3}" : "{min: 0.3, max: 30}";
        StringBuilder cables = new StringBuilder("cables:\n");
        StringBuilder devices = new StringBuilder("devices:\n");
        StringBuilder list = new StringBuilder("checks:\n");
        for (int i = 1; i <= checks; i++) {
            cables.append(String.format(Locale.ROOT, "  - {id: C%d, conductor: copper, insulation: xlpe, size_mm2: %d,"
                    + " fault_ka: %s}%n", i, 70 + 5 * (i % 10), fault));
            devices.append(String.format(Locale.ROOT, "  - id: R%d%n    type: relay%n    breaker_s: 0.05%n    stages:%n"
                    + "      - {curve: iec-standard-inverse, pickup_a: %d, tms: 0.2}%n"
                    + "      - {curve: definite-time, pickup_a: 3000, delay_s: 0.1}%n"
                    + "      - {curve: instantaneous, pickup_a: 10000, delay_s: 0.02}%n", i, 200 + 10 * (i % 7)));
            list.append(String.format(Locale.ROOT, "  - {cable: C%d, device: R%d, margin_s: 0.1}%n", i, i));
        }
        study = StudyReader.parse("scale.yaml", "scale", "format: 1\ntitle: Scale\nvoltage_kv: 0.4\n" + cables
                + devices + list);
    }

    /** @return every check of the study run */
    @Benchmark
    public StudyReport run() {
        return StudyReport.evaluate(study);
    }
}
