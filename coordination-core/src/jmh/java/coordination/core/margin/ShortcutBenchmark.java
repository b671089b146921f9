package coordination.core.margin;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * The cable check of {@code CheckBenchmark} with and without its shortcuts (steady segments taken
 * from their ends, curve times remembered), in one run: the answers are the same to the last bit,
 * so this measures only what the shortcuts save.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class ShortcutBenchmark {
    /** Whether every segment is scanned and every curve time computed afresh. */
    @Param({"false", "true"})
    public boolean plain;

    private final CableThermalLimit cable = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 70, 1);
    private final Relay feeder = new Relay("F7", List.of(
            InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
            DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1, 0.05);

    /** Creates the benchmark state. */
    public ShortcutBenchmark() {
    }

    /** @return the cable check */
    @Benchmark
    public CableCheckResult cableCheck() {
        return new CableCheck(feeder, cable, 1500, 12000, MarginRequirement.seconds(0.1), null, plain).result();
    }
}
