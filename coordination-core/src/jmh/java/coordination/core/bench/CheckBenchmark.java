package coordination.core.bench;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.curve.TabulatedCurve;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CableChecker;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.GradingChecker;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * One cable check and grading checks of relays and of fuses, each as a record and again on a
 * reused checker, which allocates nothing, and a 10,000-point sampling check for comparison.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class CheckBenchmark {
    private final CableThermalLimit cable = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 70, 1);
    private final Relay feeder = new Relay("F7", List.of(
            InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
            DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1, 0.05);
    private final Relay incomer = new Relay("F0", List.of(
            InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 600, 0.3),
            DefiniteTimeStage.definiteTime(8000, 0.5)), 1, 0.05);

    private final MarginRequirement margin = MarginRequirement.seconds(0.1);
    private final GradingRequirement relayInterval = GradingRequirement.intervalSeconds(0.3);
    private final GradingRequirement fuseInterval = GradingRequirement.intervalSeconds(0.1);
    private final CableChecker cableChecker = new CableChecker();
    private final GradingChecker gradingChecker = new GradingChecker();

    // fuses digitised from points of our own, the same shape at two ratings (no maker's data)
    private final Fuse upstreamFuse = fuse("F400", 400);
    private final Fuse downstreamFuse = fuse("F160", 160);

    private static Fuse fuse(String id, double rating) {
        double[] amps = {2 * rating, 3 * rating, 5 * rating, 8 * rating, 12 * rating, 20 * rating};
        return new Fuse(id, rating, new TabulatedCurve("melting", amps, new double[] {300, 30, 3, 0.5, 0.1, 0.02}),
                new TabulatedCurve("clearing", amps, new double[] {330, 34, 3.6, 0.65, 0.15, 0.035}), Optional.empty(),
                Optional.empty(), Optional.empty(), Optional.empty());
    }

    /** @return the exact cable check */
    @Benchmark
    public CableCheckResult cableCheck() {
        return CableCheck.check(feeder, cable, 1500, 12000, MarginRequirement.seconds(0.1));
    }

    /** @return the exact grading check */
    @Benchmark
    public GradingCheckResult gradingCheck() {
        return GradingCheck.check(incomer, feeder, 1500, 6000, GradingRequirement.intervalSeconds(0.3));
    }

    /** @return the exact grading check over a range where both curves are flat above 10 kA */
    @Benchmark
    public GradingCheckResult gradingCheckWide() {
        return GradingCheck.check(incomer, feeder, 1500, 12000, GradingRequirement.intervalSeconds(0.3));
    }

    /** @return the exact grading check of two fuses, each digitised from six points */
    @Benchmark
    public GradingCheckResult fuseGradingCheck() {
        return GradingCheck.check(upstreamFuse, downstreamFuse, 1000, 3000, GradingRequirement.intervalSeconds(0.1));
    }

    /** @return the exact cable check's minimum margin, on a reused checker */
    @Benchmark
    public double reusedCableCheck() {
        cableChecker.run(feeder, cable, 1500, 12000, margin, null);
        return cableChecker.minMarginSeconds();
    }

    /** @return the exact grading check's minimum interval, on a reused checker */
    @Benchmark
    public double reusedGradingCheck() {
        gradingChecker.run(incomer, feeder, 1500, 6000, relayInterval);
        return gradingChecker.minIntervalSeconds();
    }

    /** @return the wide grading check's minimum interval, on a reused checker */
    @Benchmark
    public double reusedGradingCheckWide() {
        gradingChecker.run(incomer, feeder, 1500, 12000, relayInterval);
        return gradingChecker.minIntervalSeconds();
    }

    /** @return the fuses' grading check's minimum interval, on a reused checker */
    @Benchmark
    public double reusedFuseGradingCheck() {
        gradingChecker.run(upstreamFuse, downstreamFuse, 1000, 3000, fuseInterval);
        return gradingChecker.minIntervalSeconds();
    }

    /** @return the minimum margin found by sampling 10,000 log-spaced currents */
    @Benchmark
    public double sampledCableCheck10k() {
        TimeCurrentCurve c = feeder.maximumCurve();
        double min = Double.POSITIVE_INFINITY;
        double minRatio = Double.POSITIVE_INFINITY;
        int crossings = 0;
        double prev = Double.NaN;
        int n = 10_000;
        for (int i = 0; i < n; i++) {
            double amps = 1500 * Math.pow(8.0, (double) i / (n - 1));
            double td = c.seconds(amps);
            double tc = cable.damageSeconds(amps);
            min = Math.min(min, tc - td);
            minRatio = Math.min(minRatio, tc / td);
            double s = tc - td;
            if (!Double.isNaN(prev) && (prev < 0) != (s < 0)) {
                crossings++;
            }
            prev = s;
        }
        return min + minRatio + crossings;
    }
}
