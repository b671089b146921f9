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
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * A 200-bus radial network: a transformer and 198 cables in ten feeders of branching
 * sub-distribution, each cable behind its own relay; reading it computes the fault levels and
 * derives the checks, evaluating runs them all.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class NetworkBenchmark {
    private final String text = study(198);
    private final Study study = StudyReader.parse("net.yaml", "net", text);

    static String study(int cables) {
        StringBuilder s = new StringBuilder("format: 1\ntitle: Two hundred buses\nvoltage_kv: 0.4\nnetwork:\n"
                + "  buses:\n    - {id: HV, voltage_kv: 11}\n    - {id: B0, voltage_kv: 0.4}\n"
                + "  sources:\n    - {id: G, bus: HV, sk_max_mva: 500, sk_min_mva: 300, x_r: 12}\n"
                + "  transformers:\n    - {id: T, hv_bus: HV, lv_bus: B0, sr_kva: 2000, uk_percent: 6, pk_kw: 18,"
                + " vector_group: Dyn11}\ncables:\n");
        StringBuilder devices = new StringBuilder("devices:\n  - {id: Q0, type: breaker, ir_a: 3200, tr_s: 4,"
                + " isd_a: 16000, tsd_s: 0.4, branch: T, end: lv}\n");
        for (int i = 1; i <= cables; i++) {
            // ten feeders from the main board, each a chain that branches in two
            String from = i <= 10 ? "B0" : "B" + (i - 10 + 1) / 2;
            double size = i <= 10 ? 240 : i <= 50 ? 95 : 35;
            s.append(String.format(Locale.ROOT, "  - {id: C%d, conductor: copper, insulation: xlpe, size_mm2: %s,"
                    + " from: %s, to: B%d, length_m: %d}%n", i, size == 240 ? "240" : size == 95 ? "95" : "35", from, i,
                    20 + i % 50));
            double pickup = size == 240 ? 600 : size == 95 ? 250 : 100;
            double tms = size == 240 ? 0.5 : size == 95 ? 0.25 : 0.1;
            devices.append(String.format(Locale.ROOT, "  - id: R%d%n    type: relay%n    breaker_s: 0.05%n"
                    + "    branch: C%d%n    stages:%n      - {curve: iec-standard-inverse, pickup_a: %s, tms: %s}%n",
                    i, i, pickup, tms));
        }
        return s.append(devices).toString();
    }

    /** @return the study: fault levels computed and checks derived */
    @Benchmark
    public Study readAndDerive() {
        return StudyReader.parse("net.yaml", "net", text);
    }

    /** @return every derived check run */
    @Benchmark
    public StudyReport readDeriveAndRun() {
        return StudyReport.evaluate(StudyReader.parse("net.yaml", "net", text));
    }

    /** @return the checks run on a study already read */
    @Benchmark
    public StudyReport runOnly() {
        return StudyReport.evaluate(study);
    }
}
