package coordination.core.margin;

import static org.hamcrest.Matchers.notANumber;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.contains;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.study.ReportWriter;
import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.HighCurrentBehaviour;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.curve.TabulatedCurve;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class CableCheckTest {
    /** Crossings are solved to 1e-12 in ln(I); the issue asks for 1e-6 relative. */
    private static final double CROSSING_RELATIVE = 1e-9;
    /** Minima solved by Brent's method to 1e-12 in ln(I): values agree to rounding. */
    private static final double VALUE_ABSOLUTE = 1e-9;

    private static final CableThermalLimit CU_XLPE_35 =
            CableThermalLimit.of("C35", ConductorMaterial.COPPER, Insulation.XLPE, 35, 1);

    @Test
    void definiteTimeRelayAgainstAdiabaticLimitWorkedByHand() {
        // worked: t_c = (kS)^2 / I^2 and t_d = 0.5 + 0.05 s; crossing at I = kS / sqrt(0.55)
        Relay relay = new Relay("R", List.of(DefiniteTimeStage.definiteTime(1000, 0.5)), 1, 0.05);
        CableCheckResult r = CableCheck.check(relay, CU_XLPE_35, 1500, 12000, MarginRequirement.seconds(0.1));
        double ks = CU_XLPE_35.k() * 35;
        assertThat(r.crossingsAmps().length, is(1));
        assertThat(r.crossingsAmps()[0], closeTo(ks / Math.sqrt(0.55), ks * CROSSING_RELATIVE));
        assertThat(r.minMarginSeconds(), closeTo(Math.pow(ks / 12000, 2) - 0.55, VALUE_ABSOLUTE));
        assertThat(r.minMarginAtAmps(), is(12000.0));
        assertThat(r.minRatio(), closeTo(Math.pow(ks / 12000, 2) / 0.55, VALUE_ABSOLUTE));
        assertThat(r.toString(), r.pass(), is(false));
    }

    @Test
    void minimumAtAStepIsReportedAtTheStepFromBelow() {
        // worked: just below the 10 kA instantaneous step the 0.1 s stage clears; margin (kS/10 kA)^2 - 0.1
        Relay relay = Relay.of("R", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
                DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.02));
        CableCheckResult r = CableCheck.check(relay, CU_XLPE_35, 1500, 12000, MarginRequirement.seconds(0.1));
        double ks = CU_XLPE_35.k() * 35;
        assertThat(r.minMarginAtAmps(), is(10000.0));
        assertThat(r.minMarginSide(), is(Side.BELOW));
        assertThat(r.minMarginSeconds(), closeTo(Math.pow(ks / 10000, 2) - 0.1, 1e-8));
        assertThat(r.toString(), r.pass(), is(true));
        assertThat(r.crossingsAmps().length, is(0));
    }

    @Test
    void inverseCurveCrossingSatisfiesBothEquations() {
        Relay relay = Relay.of("R", InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 400, 0.8));
        CableCheckResult r = CableCheck.check(relay, CU_XLPE_35, 600, 20000, MarginRequirement.ratio(1));
        assertThat(r.crossingsAmps().length, is(1));
        double c = r.crossingsAmps()[0];
        // at the crossing both equations give the same time: 0.8 x 13.5 / (c/400 - 1) = (kS/c)^2
        double device = 0.8 * 13.5 / (c / 400 - 1);
        double cable = Math.pow(CU_XLPE_35.k() * 35 / c, 2);
        assertThat(device / cable, closeTo(1.0, 1e-9));
    }

    @Test
    void rangeBelowPickupDoesNotClearAndNamesTheCurrents() {
        Relay relay = Relay.of("R", DefiniteTimeStage.definiteTime(2000, 0.2));
        CableCheckResult r = CableCheck.check(relay, CU_XLPE_35, 1500, 12000, MarginRequirement.seconds(0));
        assertThat(r.toString(), r.pass(), is(false));
        assertThat(r.notClearedFromAmps(), is(1500.0));
        assertThat(r.notClearedToAmps(), is(2000.0));
        assertEquals("'R' does not clear from 1.5 kA to 2 kA", r.reason());
        // crossing up at the pickup step, and down again where (kS/I)^2 = 0.2 s
        assertThat(r.crossingsAmps().length, is(2));
        assertThat(r.crossingsAmps()[0], is(2000.0));
        assertThat(r.crossingsAmps()[1], closeTo(CU_XLPE_35.k() * 35 / Math.sqrt(0.2), 1e-6));
    }

    @Test
    void regionsSayWhichMethodAppliedWhere() {
        Relay relay = Relay.of("R", InverseTimeStage.of(InverseTimeFamily.IEC_EXTREMELY_INVERSE, 200, 0.5)
                .withHighCurrent(HighCurrentBehaviour.FOLLOW_EQUATION, 20));
        CableCheckResult r = CableCheck.check(relay, CU_XLPE_35, 300, 20000, MarginRequirement.seconds(0));
        // a stage that follows its equation: 0.5 x 80 / (M^2 - 1) = 5 s at M = 3, = 0.1 s at M = sqrt(401)
        assertThat(r.regions().stream().map(ThermalRegion::method).toList(),
                contains("adiabatic-conservative", "adiabatic", "energy"));
        assertThat(r.regions().get(1).fromAmps(), closeTo(600, 1e-6));
        assertThat(r.regions().get(2).fromAmps(), closeTo(200 * Math.sqrt(401), 1e-6));
    }

    @Test
    void dcOffsetRaisesTheEquivalentTimeBelowOneTenthSecond() {
        Relay relay = Relay.of("R", DefiniteTimeStage.instantaneous(1000, 0.05));
        DcOffset dc = new DcOffset(1.8, 50);
        CableCheckResult plain = CableCheck.check(relay, CU_XLPE_35, 2000, 30000, MarginRequirement.seconds(0));
        CableCheckResult withDc = new CableCheck(relay, CU_XLPE_35, 2000, 30000, MarginRequirement.seconds(0), dc)
                .result();
        double ks = CU_XLPE_35.k() * 35;
        assertThat(plain.minRatio(), closeTo(ks * ks / (30000.0 * 30000 * 0.05), 1e-9));
        assertThat(withDc.minRatio(), closeTo(ks * ks / (30000.0 * 30000 * 0.05 * (1 + dc.m(0.05))), 1e-9));
        assertThat(withDc.regions().get(0).method(), is("energy-dc-offset"));
    }

    @Test
    void fuseStatedI2tIsUsedAboveItsDigitisedRange() {
        Fuse fuse = new Fuse("F", 100, new TabulatedCurve("m", new double[] {200, 2000}, new double[] {100, 0.01}),
                new TabulatedCurve("c", new double[] {200, 2000}, new double[] {120, 0.02}), OptionalDouble.of(5e4));
        CableCheckResult r = CableCheck.check(fuse, CU_XLPE_35, 1000, 20000, MarginRequirement.ratio(1));
        // above 2 kA the let-through is 5e4 A2s; below it I^2 t falls with current along the log-log line
        // t = 120 (I/200)^s, s = ln(0.02/120)/ln(10), so the largest let-through is at 1 kA
        double k2s2 = CU_XLPE_35.i2tA2s();
        double slope = Math.log(0.02 / 120) / Math.log(10);
        double letThrough1kA = 1000.0 * 1000 * 120 * Math.pow(5, slope);
        assertThat(r.minRatio(), closeTo(k2s2 / Math.max(5e4, letThrough1kA), 1e-9));
        assertThat(r.minRatioAtAmps(), is(1000.0));
        assertThat(r.undefinedFromAmps(), notANumber());
        CableCheckResult below = CableCheck.check(fuse, CU_XLPE_35, 100, 1000, MarginRequirement.ratio(1));
        assertEquals("the curve of 'F' has no value from 100 A to 200 A", below.reason());
    }

    @Test
    void dcOffsetFactorTendsToTwoAsKappaTendsToTwo() {
        // IEC 60909-0 clause 12: m -> 2 as kappa -> 2 (the 0/0 limit), m -> 0 as kappa -> 1
        assertThat(new DcOffset(2.0, 50).m(0.1), closeTo(2.0, 1e-12));
        assertThat(new DcOffset(2.0 - 1e-12, 50).m(0.1), closeTo(2.0, 1e-9));
        assertThat(new DcOffset(1.0 + 1e-12, 50).m(0.1), closeTo(0.0, 0.01));
        // worked: kappa 1.8, 50 Hz, 0.1 s: x = 20 ln 0.8 = -4.46287, m = 2 (1 - e^x) / 4.46287 = 0.443
        assertThat(new DcOffset(1.8, 50).m(0.1), closeTo(2 * -Math.expm1(20 * Math.log(0.8)) / (-20 * Math.log(0.8)),
                1e-15));
        assertThat(new DcOffset(1.8, 50).m(0.1), closeTo(0.443, 0.001));
    }

    @Test
    void invertedRangeIsRefused() {
        Relay relay = Relay.of("R", DefiniteTimeStage.definiteTime(100, 0.2));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CableCheck.check(relay, CU_XLPE_35, 2000, 1000, MarginRequirement.seconds(0)));
        assertEquals("check range: highest current 1000 A is below the lowest 2000 A - must be at or above it",
                e.getMessage());
    }

    @Test
    void jsonFormHasTheDocumentedKeys() throws Exception {
        Relay relay = new Relay("R", List.of(DefiniteTimeStage.definiteTime(1000, 0.5)), 1, 0.05);
        String text = ReportWriter.write(CableCheck.check(relay, CU_XLPE_35, 1500, 12000,
                MarginRequirement.seconds(0.1)));
        List<String> keys = new java.util.ArrayList<>();
        new com.fasterxml.jackson.databind.ObjectMapper().readTree(text).fieldNames().forEachRemaining(keys::add);
        assertThat(keys, contains("kind", "device", "cable", "pass", "required_margin_s",
                "range_a", "min_margin_s", "min_margin_at_a", "min_margin_side", "min_ratio", "min_ratio_at_a",
                "crossings_a", "not_cleared_a", "undefined_a", "methods", "reason", "derived", "fault_case", "assumptions", "warnings"));
    }
}
