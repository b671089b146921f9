package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThan;
import static org.hamcrest.Matchers.notANumber;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.HighCurrentBehaviour;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.McbType;
import coordination.core.curve.MiniatureBreaker;
import coordination.core.curve.Relay;
import coordination.core.curve.RelayTolerance;
import coordination.core.curve.TabulatedCurve;
import coordination.core.curve.TripUnitBreaker;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** No default or convention turns an unprotected cable or a non-grading pair into a pass. */
class ConservativeDefaultsTest {
    /** Solved values against closed forms: relative, far below any engineering figure. */
    private static final double SOLVED = 1e-9;
    private static final CableThermalLimit CU_XLPE_16 = CableThermalLimit.of("B5-cable", ConductorMaterial.COPPER,
            Insulation.XLPE, 16, 1);

    private static Relay blowerRelay(HighCurrentBehaviour hc) {
        return new Relay("B5-relay", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 160, 0.3)
                .withHighCurrent(hc, 20), DefiniteTimeStage.definiteTime(1600, 0.4)), 1.0, 0.05);
    }

    /**
     * Above 20 times pickup the band's slow edge holds: IEC 60255-151 curve B held at M = 20 is
     * TMS 13.5 / 19 s, and the cable check takes it.
     */
    @Test
    void beyondTheEffectiveRangeACableCheckTakesTheHeldTime() {
        double held = 0.3 * 13.5 / (20 - 1) + 0.05;
        double kS = CU_XLPE_16.k() * 16;
        CableCheckResult band = CableCheck.check(blowerRelay(HighCurrentBehaviour.BAND), CU_XLPE_16, 1000, 10000,
                MarginRequirement.seconds(0.1));
        CableCheckResult hold = CableCheck.check(blowerRelay(HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE), CU_XLPE_16,
                1000, 10000, MarginRequirement.seconds(0.1));
        assertThat(band, is(hold));
        // at 10 kA: (kS / I)^2 - held, and the crossing where the damage time equals the held time
        assertThat(band.minMarginSeconds(), closeTo(Math.pow(kS / 10000, 2) - held, SOLVED));
        assertThat(band.crossingsAmps()[0], closeTo(kS / Math.sqrt(held), kS * SOLVED));
        CableCheckResult follow = CableCheck.check(blowerRelay(HighCurrentBehaviour.FOLLOW_EQUATION), CU_XLPE_16,
                1000, 10000, MarginRequirement.seconds(0.1));
        assertThat(follow.minMarginSeconds() > band.minMarginSeconds(), is(true));
    }

    /** An upstream relay in grading takes the band's fast edge: the equation followed past 20 x. */
    @Test
    void beyondTheEffectiveRangeAnUpstreamRelayTakesTheFastEdge() {
        Relay up = Relay.of("U", InverseTimeStage.of(InverseTimeFamily.IEC_EXTREMELY_INVERSE, 100, 0.5));
        // IEC 60255-151 curve C at M = 40: 0.5 x 80 / (40^2 - 1)
        assertThat(up.minimumCurve().seconds(4000), closeTo(0.5 * 80 / (1600 - 1), 1e-15));
        assertThat(up.maximumCurve().seconds(4000), closeTo(0.5 * 80 / (400 - 1), 1e-15));
    }

    /**
     * IEC 60909-0 thermal equivalent current: the heating factor is continuous in the duration, so
     * a device at 0.101 s and one at 0.099 s are judged alike.
     */
    @Test
    void dcOffsetHeatingIsContinuousAtOneTenthSecond() {
        DcOffset dc = new DcOffset(1.8, 50);
        CableThermalLimit cable = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 35, 1);
        double[] ratios = new double[2];
        double[] times = {0.101, 0.099};
        for (int i = 0; i < 2; i++) {
            Relay r = Relay.of("R", DefiniteTimeStage.definiteTime(1000, times[i]));
            ratios[i] = new CableCheck(r, cable, 10000, 10000, MarginRequirement.seconds(0), dc).result().minRatio();
        }
        assertThat(Math.abs(ratios[0] / ratios[1] - 1), lessThan(0.03));
        // the factor itself: m = 1 / (2 f T ln(kappa - 1)) (e^(4 f T ln(kappa - 1)) - 1)
        double x = 4 * 50 * 0.5 * Math.log(0.8);
        assertThat(dc.m(0.5), closeTo((Math.exp(x) - 1) / (2 * 50 * 0.5 * Math.log(0.8)), 1e-12));
    }

    @Test
    void kappaFollowsIec60909FromXOverR() {
        // IEC 60909-0:2016, equation (55): kappa = 1.02 + 0.98 e^(-3 R/X)
        assertThat(DcOffset.kappa(10), closeTo(1.02 + 0.98 * Math.exp(-0.3), 1e-15));
        assertThat(DcOffset.kappa(10), closeTo(1.746, 5e-4));
    }

    /** IEC 60949 covers faults of up to 5 s: beyond, the adiabatic time bounds the withstand. */
    @Test
    void nonAdiabaticCreditStopsAtFiveSeconds() {
        CableThermalLimit na = CU_XLPE_16.withMethod(ThermalMethod.NON_ADIABATIC);
        double kS = CU_XLPE_16.k() * 16;
        // at 511 A the non-adiabatic time would be about 39 s; the adiabatic (kS/I)^2 is 20 s
        assertThat(na.damageSeconds(511), closeTo(Math.pow(kS / 511, 2), 1e-9));
        assertThat(na.beyondNonAdiabaticScope(511), is(true));
        // below about 198 A the non-adiabatic losses carried the current for ever; no longer
        assertThat(na.damageSeconds(150), closeTo(Math.pow(kS / 150, 2), 1e-9));
        // within 5 s the non-adiabatic factor of IEC 60949 still applies
        double t1 = 1.0;
        assertThat(na.damageSeconds(na.withstandAmps(t1)), closeTo(t1, 1e-9));
        assertThat(na.withstandAmps(t1) / CU_XLPE_16.withstandAmps(t1), closeTo(na.nonAdiabaticFactor(t1), 1e-12));
        // and just outside the scope the cable holds for 5 s
        double edge = na.withstandAmps(5.0);
        assertThat(na.damageSeconds(edge * 0.999), closeTo(5.0, 1e-9));
    }

    /** IEEE 242: the coordination time interval between relays is measured between their operating times. */
    @Test
    void relaysGradeOnOperatingTimes() {
        Relay up = new Relay("U", List.of(DefiniteTimeStage.definiteTime(500, 0.5)), 1, 0.05);
        Relay down = new Relay("D", List.of(DefiniteTimeStage.definiteTime(200, 0.2)), 1, 0.05);
        GradingCheckResult operating = GradingCheck.check(up, down, 1000, 5000, GradingRequirement.intervalSeconds(0.3));
        assertThat(operating.minIntervalSeconds(), closeTo(0.3, 1e-12));
        assertThat(operating.toString(), operating.pass(), is(true));
        GradingCheckResult clearing = GradingCheck.check(up, down, 1000, 5000,
                GradingRequirement.intervalBetweenClearingTimes(0.3));
        assertThat(clearing.minIntervalSeconds(), closeTo(0.25, 1e-12));
        assertThat(clearing.toString(), clearing.pass(), is(false));
    }

    /** A relay over a fuse is graded on the fuse's total clearing time. */
    @Test
    void aRelayOverAFuseIsGradedToTheFusesClearingTime() {
        Relay up = Relay.of("U", DefiniteTimeStage.definiteTime(500, 0.5));
        Fuse f = new Fuse("F", 100, new TabulatedCurve("m", new double[] {200, 5000}, new double[] {100, 0.01}),
                new TabulatedCurve("c", new double[] {200, 5000}, new double[] {120, 0.02}), java.util.OptionalDouble.empty());
        GradingCheckResult r = GradingCheck.check(up, f, 1000, 5000, GradingRequirement.intervalSeconds(0.2));
        assertThat(r.toOperatingTime(), is(false));
        assertThat(r.minIntervalSeconds(), closeTo(0.5 - f.maximumCurve().seconds(1000), 1e-12));
    }

    @Test
    void shortTimeAndInstantaneousPickupsSpreadTwentyPercentByDefault() {
        // IEC 60947-2 (from memory): short-circuit releases trip within +/-20 % of their setting
        TripUnitBreaker b = new TripUnitBreaker("Q", TripUnitBreaker.Settings.of(400, 10, 4000, 0.2, false, 8000));
        // the fast edge: Ii at 80 % of 8 kA, tsd 20 % short
        assertThat(b.minimumCurve().seconds(6399), closeTo(0.16, 1e-12));
        assertThat(b.minimumCurve().seconds(6401), closeTo(0.01, 1e-12));
        // the slow edge: Isd at 120 % of 4 kA, tsd 20 % long
        assertThat(b.maximumCurve().seconds(4799) > 0.24, is(true));
        assertThat(b.maximumCurve().seconds(4800), closeTo(0.24, 1e-12));
    }

    @Test
    void anInstantaneousStageWithoutAStatedTimeIsABandOfTwentyToFortyMilliseconds() {
        Relay r = Relay.of("R", DefiniteTimeStage.instantaneousTimeAssumed(2000));
        assertThat(r.minimumCurve().seconds(3000), is(0.02));
        assertThat(r.maximumCurve().seconds(3000), is(0.04));
    }

    /** IEC 60255-151: the operate time within a percentage or a fixed time, whichever is greater. */
    @Test
    void aStatedRelayToleranceGivesTheEdges() {
        RelayTolerance tol = new RelayTolerance(0.05, 0.03, 0.05);
        Relay dt = new Relay("R", List.of(DefiniteTimeStage.definiteTime(100, 0.5)), Optional.empty(), 0, tol);
        // the definite-time stage: 5 % of 0.5 s is 25 ms, less than 30 ms
        assertThat(dt.maximumCurve().seconds(10_000), closeTo(0.53, 1e-12));
        assertThat(dt.minimumCurve().seconds(10_000), closeTo(0.47, 1e-12));
        Relay si = new Relay("R", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 50, 0.1)),
                Optional.empty(), 0, tol);
        // at 10 x the slow pickup (52.5 A): 0.1 x 0.14 / (10^0.02 - 1) = 0.297 s; 5 % of it is 15 ms, so 30 ms
        double nominal = 0.1 * 0.14 / (Math.pow(10, 0.02) - 1);
        assertThat(si.maximumCurve().seconds(525), closeTo(nominal + 0.03, 1e-12));
        assertThat(si.minimumCurve().seconds(475), closeTo(nominal - 0.03, 1e-12));
        // at 2 x the slow pickup the time is 1.0 s: 5 % (50 ms) is now the larger error
        double two = 0.1 * 0.14 / (Math.pow(2, 0.02) - 1);
        assertThat(si.maximumCurve().seconds(105), closeTo(two * 1.05, 1e-12));
        // no operation below the slow edge's pickup, 5 % above the setting
        assertThat(si.maximumCurve().seconds(52), is(Double.POSITIVE_INFINITY));
    }

    /**
     * A C16 breaker with a stated let-through of 25 kA²s on 2.5 mm² Cu PVC: k²S² = (115 x 2.5)² =
     * 82.7 kA²s (k = 115, IEC 60364-4-43 Table 43A), so it passes by energy with 3.3 x headroom.
     */
    @Test
    void aStatedLetThroughDecidesTheEnergyRegime() {
        CableThermalLimit cable = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.PVC, 2.5, 1);
        MiniatureBreaker mcb = new MiniatureBreaker("M", McbType.C, 16, MiniatureBreaker.DEFAULT_FASTEST_SECONDS,
                Optional.of(LetThroughEnergy.constant(25_000)));
        CableCheckResult r = new CableCheck(mcb, cable, 5000, 5000, MarginRequirement.seconds(0), new DcOffset(1.8, 50))
                .result();
        assertThat(r.toString(), r.pass(), is(true));
        assertThat(r.minRatio(), closeTo(cable.i2tA2s() / 25_000, 1e-12));
        assertThat(cable.i2tA2s(), closeTo(82_700, 200));
        assertThat(r.regions().get(0).method(), is(ThermalRegion.ENERGY_LET_THROUGH));
    }

    /** IEC 60269-1: above the digitised curves, the upstream pre-arcing I²t must cover the downstream let-through. */
    @Test
    void fusesGradeByEnergyAboveTheirDigitisedCurves() {
        TabulatedCurve m = new TabulatedCurve("m", new double[] {300, 3500}, new double[] {100, 0.01});
        TabulatedCurve c = new TabulatedCurve("c", new double[] {300, 3500}, new double[] {120, 0.015});
        Fuse down = new Fuse("FD", 100, m, c, Optional.of(LetThroughEnergy.points(new double[] {3500, 50_000},
                new double[] {2e5, 4e5})), Optional.empty(), Optional.of("gG"), Optional.of("S1"));
        TabulatedCurve mu = new TabulatedCurve("mu", new double[] {800, 8000}, new double[] {100, 0.01});
        TabulatedCurve cu = new TabulatedCurve("cu", new double[] {800, 8000}, new double[] {120, 0.015});
        for (double pre : new double[] {5e5, 3e5}) {
            Fuse up = new Fuse("FU", 250, mu, cu, Optional.empty(), Optional.of(LetThroughEnergy.points(
                    new double[] {8000, 50_000}, new double[] {pre, pre})), Optional.of("gG"), Optional.of("S1"));
            GradingCheckResult r = GradingCheck.check(up, down, 8000, 50_000, GradingRequirement.noOverlap());
            assertThat(r.undefinedFromAmps(), notANumber());
            // the smallest ratio sits where the downstream let-through is largest: 50 kA
            assertThat(r.minEnergyRatio(), closeTo(pre / 4e5, 1e-12));
            assertThat(r.toString(), r.pass(), is(pre >= 4e5));
        }
    }

    /** No finite minimum where the device does not clear: margin and ratio both say so. */
    @Test
    void aNotClearedRangeHasNeitherMarginNorRatio() {
        // an inverse stage slows without bound towards its pickup, inside the range
        Relay r = Relay.of("R", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 2000, 0.1));
        CableCheckResult res = CableCheck.check(r, CU_XLPE_16, 1000, 10000, MarginRequirement.seconds(0));
        assertThat(res.minMarginSeconds(), is(Double.NEGATIVE_INFINITY));
        assertThat(res.minRatio(), notANumber());
        assertThat(res.notClearedFromAmps(), is(1000.0));
    }
}
