package coordination.core.curve;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.hasItem;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class FastestOfCurveTest {
    private static final int RELAYS_PER_SEED = 200;

    /**
     * The curve takes the time of the stage it has found fastest on a stretch, and leaves out the
     * breakpoints of stages hidden on both sides: each time must be the minimum over the stages to
     * the last bit, at random currents and next to every stage's own breakpoints.
     */
    @ParameterizedTest
    @ValueSource(longs = {11, 12, 13})
    void everyTimeIsTheMinimumOverTheStagesToTheLastBit(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        int dropped = 0;
        for (int n = 0; n < RELAYS_PER_SEED; n++) {
            Relay relay = RandomDevices.relay(r);
            for (TimeCurrentCurve edge : List.of(relay.minimumCurve(), relay.slowestOperatingCurve())) {
                FastestOfCurve curve = (FastestOfCurve) edge;
                List<Double> currents = new ArrayList<>();
                for (TimeCurrentCurve stage : curve.stages()) {
                    for (double b : stage.breakpointsAmps()) {
                        currents.add(Math.nextDown(b));
                        currents.add(b);
                        currents.add(Math.nextUp(b));
                        currents.add(b * (1 + 1e-7));
                        if (!contains(curve.breakpointsAmps(), b)) {
                            dropped++;
                        }
                    }
                }
                for (int k = 0; k < 50; k++) {
                    currents.add(RandomDevices.logUniform(r, 1, 1e6));
                }
                for (double amps : currents) {
                    assertThat(relay + " at " + amps + " A", Double.doubleToRawLongBits(curve.seconds(amps)),
                            equalTo(Double.doubleToRawLongBits(minimumOverStages(curve, amps))));
                }
            }
        }
        // the comparison means something only if breakpoints were left out
        assertThat("stage breakpoints left out", dropped, greaterThan(RELAYS_PER_SEED / 10));
    }

    @Test
    void aKinkOfAStageThatIsNotTheFastestIsNoBreakpoint() {
        // CheckBenchmark's feeder: the inverse stage holds from 20 times its pickup, 5 kA, where
        // the definite-time stage (3 kA, 0.1 s) is faster than the inverse's 0.36 s or more
        Relay feeder = new Relay("F7", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
                DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1, 0.05);
        List<Double> breakpoints = new ArrayList<>();
        for (double b : feeder.slowestOperatingCurve().breakpointsAmps()) {
            breakpoints.add(b);
        }
        assertThat(breakpoints, hasItem(3000.0));
        assertThat(breakpoints, hasItem(10000.0));
        assertThat(breakpoints, not(hasItem(5000.0)));
    }

    private static double minimumOverStages(FastestOfCurve curve, double amps) {
        double t = Double.POSITIVE_INFINITY;
        for (TimeCurrentCurve stage : curve.stages()) {
            t = Math.min(t, stage.seconds(amps));
        }
        return t;
    }

    private static boolean contains(double[] values, double v) {
        for (double x : values) {
            if (x == v) {
                return true;
            }
        }
        return false;
    }
}
