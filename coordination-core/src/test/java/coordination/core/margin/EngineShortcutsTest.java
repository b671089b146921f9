package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.RandomDevices;
import coordination.core.curve.Relay;
import coordination.core.curve.TimeCurrentCurve;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The cable check's shortcuts: where the device's time is steady on a segment, or the curve's
 * slope bound shows that the margin and the ratio fall throughout it, it takes the segment's
 * minima from its ends instead of scanning it; and it remembers curve times it has computed. The answer must be the plain check's to the last bit: every result is compared, field
 * by field with {@code equals}, against the same check with every segment scanned and every time
 * computed afresh.
 */
class EngineShortcutsTest {
    private static final int CASES_PER_SEED = 400;

    /** A relay of one inverse stage and up to three definite-time or instantaneous stages above it. */
    private static Relay steppedRelay(SplittableRandom r) {
        List<TimeCurrentCurve> stages = new ArrayList<>();
        double pickup = Math.exp(r.nextDouble(Math.log(20), Math.log(2000)));
        InverseTimeFamily[] families = InverseTimeFamily.values();
        stages.add(InverseTimeStage.of(families[r.nextInt(families.length)], pickup, r.nextDouble(0.05, 1.0)));
        double at = pickup;
        double delay = r.nextDouble(0.2, 2.0);
        for (int k = 0, n = 1 + r.nextInt(3); k < n; k++) {
            at *= Math.exp(r.nextDouble(0.7, 2.5));
            delay *= r.nextDouble(0.1, 0.7);
            stages.add(r.nextInt(3) == 0 ? DefiniteTimeStage.instantaneous(at, r.nextBoolean() ? 0.0 : delay)
                    : DefiniteTimeStage.definiteTime(at, delay));
        }
        return new Relay("R", stages, Optional.empty(), r.nextBoolean() ? r.nextDouble(0.03, 0.1) : 0.0);
    }

    private static void compare(ProtectiveDevice device, SplittableRandom r, int[] steady, String what) {
        CableThermalLimit cable = EngineAgainstSamplingTest.cable(r);
        double lo = EngineAgainstSamplingTest.lowCurrent(device, r);
        double hi = lo * Math.exp(r.nextDouble(0.5, 8));
        DcOffset dc = r.nextInt(4) == 0 ? new DcOffset(r.nextDouble(1.1, 2.0), 50) : null;
        MarginRequirement req = MarginRequirement.seconds(r.nextDouble(0, 0.3));
        CableCheck quick = new CableCheck(device, cable, lo, hi, req, dc, false);
        CableCheck scanned = new CableCheck(device, cable, lo, hi, req, dc, true);
        assertThat(what, quick.result(), equalTo(scanned.result()));
        steady[0] += quick.steadySegments();
        steady[1] += quick.shapedSegments();
        assertThat(what + ": the scan-everything check took no shortcut",
                scanned.steadySegments() + scanned.shapedSegments(), equalTo(0));
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {11, 12, 13})
    void aSteadySegmentGivesTheScansAnswer(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        int[] steady = {0, 0};
        for (int n = 0; n < CASES_PER_SEED; n++) {
            compare(steppedRelay(r), r, steady, "seed " + seed + " stepped relay " + n);
            compare(RandomDevices.any(r), r, steady, "seed " + seed + " device " + n);
        }
        // the comparison means something only if each shortcut was taken often
        assertThat("steady segments taken from their ends", steady[0], greaterThan(CASES_PER_SEED / 2));
        assertThat("segments taken from their ends by the slope bound", steady[1], greaterThan(CASES_PER_SEED / 8));
    }

    @Test
    void theBenchmarkRelaysFlatStagesAreTakenFromTheirEnds() {
        // the pair of CheckBenchmark: definite time from 3 kA, instantaneous from 10 kA; the inverse
        // stage's end of range at 20 times its pickup (5 kA) lies where the definite time is the
        // fastest stage, and so does not split that stretch
        Relay feeder = new Relay("F7", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
                DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1, 0.05);
        CableThermalLimit cable = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 70, 1);
        CableCheck quick = new CableCheck(feeder, cable, 1500, 12000, MarginRequirement.seconds(0.1), null, false);
        CableCheck scanned = new CableCheck(feeder, cable, 1500, 12000, MarginRequirement.seconds(0.1), null, true);
        assertThat(quick.steadySegments(), equalTo(2));
        // the inverse stretch, 6 to 12 times pickup: its steepness 0.02 / (1 - 6^-0.02) = 0.57 is far below 2
        assertThat(quick.shapedSegments(), equalTo(1));
        assertThat(quick.result(), equalTo(scanned.result()));
    }
}
