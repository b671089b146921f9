package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertEquals;

import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.curve.TabulatedCurve;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class GradingCheckTest {

    @Test
    void twoStandardInverseRelaysGradeClosestAtTheHighestCurrent() {
        // worked: both SI with the same pickup; interval (TMS_u - TMS_d) 0.14 / (M^0.02 - 1) falls with M,
        // so its minimum is at the top of the range
        Relay up = Relay.of("U", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 400, 0.4));
        Relay down = new Relay("D", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 400, 0.2)), 1,
                0.0);
        GradingCheckResult r = GradingCheck.check(up, down, 1000, 8000, GradingRequirement.intervalSeconds(0.3));
        double expected = 0.2 * 0.14 / (Math.pow(20, 0.02) - 1);
        assertThat(r.minIntervalSeconds(), closeTo(expected, 1e-12));
        assertThat(r.minIntervalAtAmps(), is(8000.0));
        assertThat(r.toString(), r.pass(), is(true));
    }

    @Test
    void crossingWhereTheUpstreamDefiniteTimeUndercutsTheDownstreamCurve() {
        // worked: downstream VI 0.5 x 13.5 / (I/200 - 1) equals the upstream 0.4 s at I = 200 (1 + 6.75/0.4)
        Relay up = Relay.of("U", DefiniteTimeStage.definiteTime(1000, 0.4));
        Relay down = Relay.of("D", InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 200, 0.5));
        GradingCheckResult r = GradingCheck.check(up, down, 1500, 6000, GradingRequirement.intervalSeconds(0.3));
        assertThat(r.crossingsAmps().length, is(1));
        assertThat(r.crossingsAmps()[0], closeTo(200 * (1 + 6.75 / 0.4), 1e-6));
        assertThat(r.toString(), r.pass(), is(false));
        assertThat(r.minIntervalSeconds(), closeTo(0.4 - 6.75 / (1500 / 200.0 - 1), 1e-12));
    }

    @Test
    void upstreamOperatingWhereDownstreamDoesNotLosesSelectivity() {
        Relay up = Relay.of("U", DefiniteTimeStage.definiteTime(500, 0.6));
        Relay down = Relay.of("D", DefiniteTimeStage.definiteTime(1000, 0.1));
        GradingCheckResult r = GradingCheck.check(up, down, 600, 5000, GradingRequirement.intervalSeconds(0.3));
        assertThat(r.toString(), r.pass(), is(false));
        assertEquals("'U' operates where 'D' does not or slows without bound, at 600 A", r.reason());
    }

    @Test
    void fusePairNeedsTheRatingRatioAndNoOverlap() {
        Fuse up = new Fuse("FU", 160, new TabulatedCurve("m", new double[] {300, 3000}, new double[] {1000, 0.05}),
                new TabulatedCurve("c", new double[] {300, 3000}, new double[] {1100, 0.07}), OptionalDouble.empty());
        Fuse down = new Fuse("FD", 100, new TabulatedCurve("m", new double[] {200, 3000}, new double[] {500, 0.01}),
                new TabulatedCurve("c", new double[] {200, 3000}, new double[] {600, 0.02}), OptionalDouble.empty());
        GradingCheckResult r = GradingCheck.check(up, down, 400, 2500, GradingRequirement.ratingRatio(1.6));
        assertThat(r.ratingRatio(), closeTo(1.6, 1e-15));
        assertThat(r.toString(), r.pass(), is(true));
        GradingCheckResult strict = GradingCheck.check(up, down, 400, 2500, GradingRequirement.ratingRatio(2));
        assertThat(strict.toString(), strict.pass(), is(false));
    }
}
