package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.RandomDevices;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A checker run again keeps nothing of the run before: one checker, taken through a random
 * sequence of devices, cables, ranges, DC offsets and requirements (the same device now and then,
 * as a sizing loop has it), must give every result a fresh check gives, to the last bit, and its
 * getters must read as that result.
 */
class CheckerReuseTest {
    private static final int RUNS_PER_SEED = 300;

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {41, 42})
    void aReusedCableCheckerGivesEveryFreshResult(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        CableChecker checker = new CableChecker();
        ProtectiveDevice device = RandomDevices.any(r);
        for (int n = 0; n < RUNS_PER_SEED; n++) {
            if (r.nextInt(3) > 0) {
                device = RandomDevices.any(r);
            }
            CableThermalLimit cable = EngineAgainstSamplingTest.cable(r);
            double lo = EngineAgainstSamplingTest.lowCurrent(device, r);
            double hi = lo * Math.exp(r.nextDouble(0.0, 8));
            DcOffset dc = r.nextInt(4) == 0 ? new DcOffset(r.nextDouble(1.1, 2.0), 50) : null;
            MarginRequirement req = r.nextBoolean() ? MarginRequirement.seconds(r.nextDouble(0, 0.3))
                    : MarginRequirement.ratio(r.nextDouble(1.0, 2.0));
            boolean pass = checker.run(device, cable, lo, hi, req, dc);
            CableCheckResult fresh = new CableCheck(device, cable, lo, hi, req, dc).result();
            String what = "seed " + seed + " run " + n;
            assertThat(what, checker.result(), equalTo(fresh));
            assertThat(what, pass, equalTo(fresh.pass()));
            assertThat(what, checker.pass(), equalTo(fresh.pass()));
            assertThat(what, checker.minMarginSeconds(), equalTo(fresh.minMarginSeconds()));
            assertThat(what, checker.minMarginAtAmps(), equalTo(fresh.minMarginAtAmps()));
            assertThat(what, checker.minMarginSide(), equalTo(fresh.minMarginSide()));
            assertThat(what, checker.minRatio(), equalTo(fresh.minRatio()));
            assertThat(what, checker.minRatioAtAmps(), equalTo(fresh.minRatioAtAmps()));
            assertThat(what, checker.minRatioSide(), equalTo(fresh.minRatioSide()));
            assertThat(what, crossings(checker), equalTo(Arrays.toString(fresh.crossingsAmps())));
            assertThat(what, checker.notClearedFromAmps(), equalTo(fresh.notClearedFromAmps()));
            assertThat(what, checker.notClearedToAmps(), equalTo(fresh.notClearedToAmps()));
            assertThat(what, checker.undefinedFromAmps(), equalTo(fresh.undefinedFromAmps()));
            assertThat(what, checker.undefinedToAmps(), equalTo(fresh.undefinedToAmps()));
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {43, 44})
    void aReusedGradingCheckerGivesEveryFreshResult(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        GradingChecker checker = new GradingChecker();
        ProtectiveDevice up = RandomDevices.any(r);
        for (int n = 0; n < RUNS_PER_SEED; n++) {
            if (r.nextInt(3) > 0) {
                up = r.nextBoolean() ? RandomDevices.relay(r) : RandomDevices.any(r);
            }
            ProtectiveDevice down = r.nextBoolean() ? RandomDevices.relay(r) : RandomDevices.any(r);
            double lo = EngineAgainstSamplingTest.lowCurrent(down, r);
            double hi = lo * Math.exp(r.nextDouble(0.0, 8));
            GradingRequirement req = r.nextBoolean() ? GradingRequirement.intervalSeconds(r.nextDouble(0.1, 0.4))
                    : GradingRequirement.noOverlap();
            boolean pass = checker.run(up, down, lo, hi, req);
            GradingCheckResult fresh = GradingCheck.check(up, down, lo, hi, req);
            String what = "seed " + seed + " run " + n;
            assertThat(what, checker.result(), equalTo(fresh));
            assertThat(what, pass, equalTo(fresh.pass()));
            assertThat(what, checker.pass(), equalTo(fresh.pass()));
            assertThat(what, checker.minIntervalSeconds(), equalTo(fresh.minIntervalSeconds()));
            assertThat(what, checker.minIntervalAtAmps(), equalTo(fresh.minIntervalAtAmps()));
            assertThat(what, checker.minIntervalSide(), equalTo(fresh.minIntervalSide()));
            assertThat(what, crossings(checker), equalTo(Arrays.toString(fresh.crossingsAmps())));
            assertThat(what, checker.minEnergyRatio(), equalTo(fresh.minEnergyRatio()));
        }
    }

    @Test
    void aCheckerThatHasNotRunHasNoResult() {
        assertThrows(IllegalStateException.class, () -> new CableChecker().result());
        assertThrows(IllegalStateException.class, () -> new GradingChecker().result());
    }

    private static String crossings(CableChecker c) {
        double[] v = new double[c.crossingCount()];
        for (int i = 0; i < v.length; i++) {
            v[i] = c.crossingAmps(i);
        }
        return Arrays.toString(v);
    }

    private static String crossings(GradingChecker c) {
        double[] v = new double[c.crossingCount()];
        for (int i = 0; i < v.length; i++) {
            v[i] = c.crossingAmps(i);
        }
        return Arrays.toString(v);
    }
}
