package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;

import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.RandomDevices;
import coordination.core.curve.Relay;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The grading check's shortcuts: where both curves are flat on a segment, or the downstream one
 * is flat and the upstream one provably falls, it takes the segment's minimum from its ends
 * instead of scanning it. The answer must be the plain check's to the last
 * bit: every result is compared with {@code equals} against the same check with every segment
 * scanned.
 */
class GradingShortcutTest {
    private static final int CASES_PER_SEED = 400;

    private static GradingRequirement requirement(SplittableRandom r) {
        return GradingRequirement.intervalSeconds(r.nextDouble(0.1, 0.4));
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {21, 22, 23})
    void aFlatSegmentGivesTheScansAnswer(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        int flat = 0;
        int falling = 0;
        for (int n = 0; n < CASES_PER_SEED; n++) {
            ProtectiveDevice up = r.nextBoolean() ? RandomDevices.relay(r) : RandomDevices.any(r);
            ProtectiveDevice down = r.nextBoolean() ? RandomDevices.relay(r) : RandomDevices.any(r);
            double lo = EngineAgainstSamplingTest.lowCurrent(down, r);
            double hi = lo * Math.exp(r.nextDouble(0.5, 8));
            GradingRequirement req = requirement(r);
            GradingCheck quick = new GradingCheck(up, down, lo, hi, req, false);
            GradingCheck scanned = new GradingCheck(up, down, lo, hi, req, true);
            assertThat("seed " + seed + " pair " + n, quick.result(), equalTo(scanned.result()));
            assertThat(scanned.flatSegments() + scanned.fallingSegments(), equalTo(0));
            flat += quick.flatSegments();
            falling += quick.fallingSegments();
        }
        // the comparison means something only if the shortcut was taken often
        assertThat("flat segments taken from their ends", flat, greaterThan(CASES_PER_SEED / 8));
        assertThat("segments taken from their ends by the slope floor", falling, greaterThan(CASES_PER_SEED / 8));
    }

    @Test
    void theBenchmarkPairsFlatStretchesAreTakenFromTheirEnds() {
        // the wide pair of CheckBenchmark: above 8 kA the incomer's definite time is its fastest
        // stage, the feeder's definite time and then its instantaneous stage are flat
        Relay feeder = new Relay("F7", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
                DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1, 0.05);
        Relay incomer = new Relay("F0", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 600, 0.3),
                DefiniteTimeStage.definiteTime(8000, 0.5)), 1, 0.05);
        GradingRequirement req = GradingRequirement.intervalSeconds(0.3);
        GradingCheck quick = new GradingCheck(incomer, feeder, 1500, 12000, req, false);
        GradingCheck scanned = new GradingCheck(incomer, feeder, 1500, 12000, req, true);
        assertThat(quick.flatSegments(), equalTo(2));
        // below 8 kA the incomer's inverse stage falls faster than the feeder's can: above 3 kA the feeder is flat,
        // below it 0.631 x 1.28 s at 3 kA (floor x time) is above 0.568 x 0.767 s at 1.5 kA (bound x time)
        assertThat(quick.fallingSegments(), equalTo(2));
        assertThat(quick.result(), equalTo(scanned.result()));
    }
}
