package coordination.core.curve;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.CoordinationException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

class InverseTimeStageTest {
    /** Times computed by an independent script from the same equation: agreement to rounding. */
    private static final double EQUATION_RELATIVE = 1e-12;
    /** Published tables give three significant figures. */
    private static final double TABLE_RELATIVE = 0.005;

    @ParameterizedTest(name = "{0} Ip={1} A M={2} at {3} A")
    @CsvFileSource(resources = "/reference/inverse-time-operate-times.csv")
    void operateTimeMatchesIec60255AndIeeeC37112Equations(String curve, double pickup, double multiplier,
            double amps, double seconds) {
        // IEC 60255-151:2009 clause 5.4 and IEEE C37.112, computed by src/test/python/inverse_time_reference.py
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.byKey(curve), pickup, multiplier);
        assertThat(stage.seconds(amps), closeTo(seconds, seconds * EQUATION_RELATIVE));
    }

    @ParameterizedTest(name = "{0} at 10 x pickup")
    @CsvFileSource(resources = "/reference/inverse-time-published-points.csv")
    void operateTimeAtTenTimesPickupMatchesTabulatedValue(String curve, double seconds) {
        // commonly tabulated values at M = 10 and multiplier 1, from memory
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.byKey(curve), 100, 1.0);
        assertThat(stage.seconds(1000), closeTo(seconds, seconds * TABLE_RELATIVE));
    }

    @Test
    void doesNotOperateAtOrBelowPickup() {
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2);
        assertThat(stage.seconds(250), is(Double.POSITIVE_INFINITY));
        assertThat(stage.seconds(100), is(Double.POSITIVE_INFINITY));
    }

    @Test
    void followsTheEquationAboveTwentyTimesByDefault() {
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 100, 1.0);
        // 13.5 / (40 - 1) = 0.346154 s
        assertThat(stage.seconds(4000), closeTo(13.5 / 39, 1e-12));
    }

    @Test
    void holdsTheTimeAtTwentyTimesWhenAsked() {
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 100, 1.0)
                .withHighCurrent(HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE, 20);
        assertThat(stage.seconds(4000), closeTo(13.5 / 19, 1e-12));
        assertThat(stage.seconds(2000), closeTo(13.5 / 19, 1e-12));
        assertThat(stage.breakpointsAmps()[1], is(2000.0));
    }

    @Test
    void ieeeResetFollowsTheElectromechanicalCharacteristic() {
        // IEEE C37.112: t_r = TD tr / (1 - M^2); very inverse tr = 21.6 s; worked: TD 2, M 0.5 -> 57.6 s
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEEE_VERY_INVERSE, 100, 2.0);
        assertThat(stage.resetSeconds(50), closeTo(57.6, 1e-12));
        assertThat(stage.resetSeconds(0), closeTo(43.2, 1e-12));
    }

    @Test
    void iecFamilyHasNoResetCharacteristic() {
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 100, 0.1);
        CoordinationException e = assertThrows(CoordinationException.class, () -> stage.resetSeconds(50));
        assertEquals("iec-standard-inverse: the curve defines no reset characteristic", e.getMessage());
    }

    @Test
    void currentAtSecondsInvertsTheEquation() {
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEEE_EXTREMELY_INVERSE, 300, 3.0);
        for (double amps : new double[] {330, 600, 3000, 30000}) {
            assertThat(stage.currentAtSeconds(stage.seconds(amps)), closeTo(amps, amps * 1e-12));
        }
    }

    @Test
    void userCoefficientsFollowTheGeneralForm() {
        InverseTimeStage stage = InverseTimeStage.custom(10, 0.5, 1.5, 100, MultiplierKind.TMS, 2);
        // 2 x (10 / (4^1.5 - 1) + 0.5) = 2 x (10/7 + 0.5)
        assertThat(stage.seconds(400), closeTo(2 * (10.0 / 7 + 0.5), 1e-12));
    }

    @Test
    void zeroPickupIsRefusedWithValueAndRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 0, 0.1));
        assertEquals("iec-standard-inverse: pickup: found 0 A - must be a finite number above 0", e.getMessage());
    }

    @Test
    void negativeTmsIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 100, -0.1));
        assertEquals("iec-standard-inverse: time multiplier: found -0.1 - must be a finite number above 0",
                e.getMessage());
    }

    @ParameterizedTest(name = "IEC standard inverse from M = {0}")
    @org.junit.jupiter.params.provider.ValueSource(doubles = {1.1, 2, 6, 19.5})
    void theSlopeBoundIsTheEquationsSteepnessAtTheStretchsStart(double m) {
        // IEC 60255-151:2009 clause 5.4, B = 0: d ln t / d ln I = -p M^p / (M^p - 1), steepest at the lowest M
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 100, 0.2);
        double p = 0.02;
        double exact = p * Math.pow(m, p) / (Math.pow(m, p) - 1);
        assertThat(stage.logSlopeBound(100 * m, 100 * m * 1.5), closeTo(exact, exact * 1e-8));
        // a central difference of the curve itself agrees
        double h = 1e-5;
        double numeric = (Math.log(stage.seconds(100 * m * Math.exp(-h))) - Math.log(stage.seconds(100 * m * Math.exp(h))))
                / (2 * h);
        assertThat(numeric, closeTo(exact, exact * 1e-6));
    }

    @org.junit.jupiter.api.Test
    void aStretchFromThePickupHasNoBoundAndOneBelowItIsFlat() {
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 100, 0.2);
        assertThat(stage.logSlopeBound(100, 200), is(Double.POSITIVE_INFINITY));
        assertThat(stage.logSlopeBound(50, 100), is(0.0));
        InverseTimeStage held = stage.withHighCurrent(HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE, 20);
        assertThat(held.logSlopeBound(2000, 5000), is(0.0));
    }

    @ParameterizedTest(name = "IEEE very inverse up to M = {0}")
    @org.junit.jupiter.params.provider.ValueSource(doubles = {1.5, 4, 15})
    void theSlopeFloorIsTheEquationsSteepnessAtTheStretchsEnd(double m) {
        // IEEE C37.112: t = TD (A / (M^p - 1) + B), A = 19.61 s, B = 0.491 s, p = 2;
        // d ln t / d ln I = -p M^p A / ((M^p - 1)(A + B (M^p - 1))), least steep at the highest M
        InverseTimeStage stage = InverseTimeStage.of(InverseTimeFamily.IEEE_VERY_INVERSE, 100, 2);
        double d = m * m - 1;
        double exact = 2 * m * m * 19.61 / (d * (19.61 + 0.491 * d));
        assertThat(stage.logSlopeFloor(100 * m / 1.2, 100 * m), closeTo(exact, exact * 1e-8));
        double h = 1e-5;
        double numeric = (Math.log(stage.seconds(100 * m * Math.exp(-h))) - Math.log(stage.seconds(100 * m * Math.exp(h))))
                / (2 * h);
        assertThat(numeric, closeTo(exact, exact * 1e-6));
    }
}
