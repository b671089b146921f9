package coordination.core.design;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThanOrEqualTo;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class DesignAidsTest {
    private static final GradingRequirement.Interval INTERVAL = (GradingRequirement.Interval) GradingRequirement
            .intervalSeconds(0.3);
    /** The solvers bisect to 1e-10 relative; values are compared a little wider. */
    private static final double SOLVED = 1e-8;
    private static final CableThermalLimit CU_XLPE =
            CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 70, 1);

    @Test
    void minimumConductorBehindADefiniteTimeStageIsTheClosedForm() {
        // worked: the adiabatic limit is closest at the top of the range, S = I sqrt(t) / k with t = 0.55 s
        Relay relay = new Relay("R", List.of(DefiniteTimeStage.definiteTime(1000, 0.5)), 1, 0.05);
        MinimumConductor.Result r = MinimumConductor.solve(relay, CU_XLPE, true, 1500, 12000,
                MarginRequirement.ratio(1));
        double closed = MinimumConductor.closedForm(12000, 0.55, CU_XLPE.k(), 1);
        assertThat(r.sizeMm2(), closeTo(closed, closed * SOLVED));
        assertThat(r.iecSizeMm2(), is(70.0));
        assertThat(r.awgOrKcmil(), is("2/0 AWG"));
    }

    @Test
    void parallelConductorsShareTheSize() {
        Relay relay = new Relay("R", List.of(DefiniteTimeStage.definiteTime(1000, 0.5)), 1, 0.05);
        MinimumConductor.Result one = MinimumConductor.solve(relay, CU_XLPE, true, 1500, 12000,
                MarginRequirement.ratio(1));
        MinimumConductor.Result two = MinimumConductor.solve(relay, CU_XLPE.withParallel(2), true, 1500, 12000,
                MarginRequirement.ratio(1));
        assertThat(two.sizeMm2(), closeTo(one.sizeMm2() / 2, one.sizeMm2() * SOLVED));
    }

    @Test
    void noConductorHelpsADeviceThatDoesNotClear() {
        Relay relay = Relay.of("R", DefiniteTimeStage.definiteTime(2000, 0.2));
        MinimumConductor.Result r = MinimumConductor.solve(relay, CU_XLPE, true, 1500, 12000,
                MarginRequirement.seconds(0));
        assertThat(r.toString(), r.found(), is(false));
        assertThat(r.reason(), is("'R' does not clear from 1.5 kA to 2 kA - no conductor size changes that"));
    }

    @Test
    void largestStandardInverseMultiplierIsTheClosedForm() {
        // worked: with one SI stage, t_c / t_d = (kS/I)^2 (M^0.02 - 1) / (0.14 TMS); the smallest ratio over the
        // range sits at one of its ends, so the largest TMS for ratio 1 is the smaller of the two end values
        Relay relay = Relay.of("R", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 400, 0.1)
                .withHighCurrent(coordination.core.curve.HighCurrentBehaviour.FOLLOW_EQUATION, 20));
        SlowestSetting.Result r = SlowestSetting.largestMultiplier(relay, 0, 1, CU_XLPE, 1500, 12000,
                MarginRequirement.ratio(1), 100);
        double ks2 = Math.pow(CU_XLPE.k() * 70, 2);
        double atLow = ks2 / (1500.0 * 1500) * (Math.pow(1500 / 400.0, 0.02) - 1) / 0.14;
        double atHigh = ks2 / (12000.0 * 12000) * (Math.pow(12000 / 400.0, 0.02) - 1) / 0.14;
        assertThat(r.largest(), closeTo(Math.min(atLow, atHigh), Math.min(atLow, atHigh) * SOLVED));
    }

    @Test
    void gradingTwoStandardInverseRelaysIsTheClosedForm() {
        // worked: same pickup, interval (M_u - M_d) 0.14 / (m^0.02 - 1) is smallest at the top of the range
        Relay down = Relay.of("D", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 300, 0.3));
        Relay up = Relay.of("U", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 300, 0.9));
        List<RadialGrading.Setting> s = RadialGrading.grade(List.of(
                new RadialGrading.Link(down, 1, Optional.empty(), INTERVAL, 1000, 6000, List.of()),
                new RadialGrading.Link(up, 1, Optional.empty(), INTERVAL, 1000, 6000, List.of())));
        assertThat(s.get(0).proposed().getAsDouble(), is(0.05));
        assertThat(s.get(0).binding(), is(RadialGrading.Binding.SMALLEST_SETTING));
        double expected = 0.05 + 0.3 * (Math.pow(6000 / 300.0, 0.02) - 1) / 0.14;
        assertThat(s.get(1).exact().getAsDouble(), closeTo(expected, expected * SOLVED));
        // rounded up to the relay's 0.01 step, so that the interval still holds
        assertThat(s.get(1).proposed().getAsDouble(), is(Math.ceil(expected * 100) / 100));
        assertThat(s.get(1).binding(), is(RadialGrading.Binding.GRADING));
        assertThat(s.get(1).gradings().get(0).toString(), s.get(1).gradings().get(0).pass(), is(true));
    }

    @Test
    void aCableTheGradingLeavesUnprotectedIsReported() {
        CableThermalLimit small = CableThermalLimit.of("small", ConductorMaterial.COPPER, Insulation.PVC, 6, 1);
        Relay down = Relay.of("D", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 300, 0.3));
        Relay up = Relay.of("U", InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 300, 0.9));
        List<RadialGrading.Setting> s = RadialGrading.grade(List.of(
                new RadialGrading.Link(down, 1, Optional.empty(), INTERVAL, 1000, 6000, List.of()),
                new RadialGrading.Link(up, 1, Optional.of(new CableDuty(small, 1000, 8000, MarginRequirement.seconds(0),
                        Optional.empty())), INTERVAL, 1000, 6000, List.of())));
        assertThat(s.get(1).problem().orElseThrow(), containsString("no multiplier meets both"));
    }

    private static Relay randomRelay(SplittableRandom r) {
        InverseTimeFamily f = InverseTimeFamily.values()[r.nextInt(InverseTimeFamily.values().length)];
        double pickup = Math.exp(r.nextDouble(Math.log(50), Math.log(800)));
        List<TimeCurrentCurve> stages = new ArrayList<>();
        stages.add(InverseTimeStage.of(f, pickup, f.multiplierKind() == coordination.core.curve.MultiplierKind.TIME_DIAL ? r.nextDouble(0.5, 8) : r.nextDouble(0.05, 0.8)));
        if (r.nextBoolean()) {
            stages.add(DefiniteTimeStage.definiteTime(pickup * r.nextDouble(4, 12), r.nextDouble(0.05, 0.5)));
        }
        return new Relay("R", stages, 1, r.nextBoolean() ? 0.05 : 0);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3})
    void marginNeverRisesWithTheMultiplierOrThePickup(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int n = 0; n < 60; n++) {
            Relay relay = randomRelay(r);
            InverseTimeStage s = (InverseTimeStage) relay.stages().get(0);
            double lo = s.pickupAmps() * r.nextDouble(1.5, 4);
            double hi = lo * r.nextDouble(2, 20);
            double previous = Double.POSITIVE_INFINITY;
            for (double f = 0.2; f <= 3; f *= 1.25) {
                List<TimeCurrentCurve> stages = new ArrayList<>(relay.stages());
                stages.set(0, s.withMultiplier(s.multiplier() * f));
                double m = CableCheck.check(relay.withStages(stages), CU_XLPE, lo, hi, MarginRequirement.seconds(0))
                        .minMarginSeconds();
                assertThat(m, lessThanOrEqualTo(previous + 1e-12));
                previous = m;
            }
            previous = Double.POSITIVE_INFINITY;
            for (double f = 0.2; f * s.pickupAmps() < lo; f *= 1.2) {
                List<TimeCurrentCurve> stages = new ArrayList<>(relay.stages());
                stages.set(0, s.withPickupAmps(s.pickupAmps() * f));
                double m = CableCheck.check(relay.withStages(stages), CU_XLPE, lo, hi, MarginRequirement.seconds(0))
                        .minMarginSeconds();
                assertThat(m, lessThanOrEqualTo(previous + 1e-12));
                previous = m;
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {10, 20})
    void everyProposalPassesAndOnePercentBeyondFails(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int n = 0; n < 40; n++) {
            Relay relay = randomRelay(r);
            InverseTimeStage s = (InverseTimeStage) relay.stages().get(0);
            double lo = s.pickupAmps() * r.nextDouble(1.5, 4);
            double hi = lo * r.nextDouble(2, 20);
            MarginRequirement req = r.nextBoolean() ? MarginRequirement.seconds(r.nextDouble(0, 0.3))
                    : MarginRequirement.ratio(r.nextDouble(1, 2));
            MinimumConductor.Result c = MinimumConductor.solve(relay, CU_XLPE, true, lo, hi, req);
            if (c.found() && c.sizeMm2() > 0.02) {
                CableCheckResult at = MinimumConductor.check(relay, CU_XLPE, true, c.sizeMm2(), lo, hi, req);
                CableCheckResult below = MinimumConductor.check(relay, CU_XLPE, true, c.sizeMm2() * 0.99, lo, hi, req);
                assertThat(at.toString(), at.pass(), is(true));
                assertThat(below.toString(), below.pass(), is(false));
            }
            SlowestSetting.Result m = SlowestSetting.largestMultiplier(relay, 0, 1, CU_XLPE, lo, hi, req, 100);
            if (m.found() && m.largest() < 100) {
                assertThat(m.toString(), passesWith(relay, s.withMultiplier(m.largest()), lo, hi, req), is(true));
                assertThat(m.toString(), passesWith(relay, s.withMultiplier(m.largest() * 1.01), lo, hi, req), is(false));
            }
            SlowestSetting.Result p = SlowestSetting.largestPickup(relay, 0, 1, CU_XLPE, lo, hi, req);
            if (p.found() && p.largest() < lo * 0.999) {
                assertThat(p.toString(), passesWith(relay, s.withPickupAmps(p.largest()), lo, hi, req), is(true));
                assertThat(p.toString(), passesWith(relay, s.withPickupAmps(p.largest() * 1.01), lo, hi, req), is(false));
            }
        }
    }

    @Test
    void everyGradedMultiplierMeetsTheIntervalAndOnePercentLessDoesNot() {
        SplittableRandom r = new SplittableRandom(5);
        for (int n = 0; n < 30; n++) {
            Relay down = randomRelay(r);
            Relay up = randomRelay(r);
            double lo = Math.max(((InverseTimeStage) up.stages().get(0)).pickupAmps(),
                    ((InverseTimeStage) down.stages().get(0)).pickupAmps()) * 1.5;
            double hi = lo * 5;
            List<RadialGrading.Setting> s = RadialGrading.grade(List.of(
                    new RadialGrading.Link(down, 1, Optional.empty(), INTERVAL, lo, hi, List.of()),
                    new RadialGrading.Link(up, 1, Optional.empty(), INTERVAL, lo, hi, List.of())));
            if (s.get(1).binding() != RadialGrading.Binding.GRADING || s.get(1).exact().isEmpty()) {
                continue;
            }
            double m = s.get(1).exact().getAsDouble();
            InverseTimeStage us = (InverseTimeStage) up.stages().get(0);
            InverseTimeStage ds = (InverseTimeStage) down.stages().get(0);
            Relay downAt = withStage(down, ds.withMultiplier(s.get(0).proposed().getAsDouble()));
            GradingRequirement req = GradingRequirement.intervalSeconds(0.3);
            GradingCheckResult at = GradingCheck.check(withStage(up, us.withMultiplier(m)), downAt, lo, hi, req);
            GradingCheckResult less = GradingCheck.check(withStage(up, us.withMultiplier(m * 0.99)), downAt, lo, hi, req);
            assertThat(at.toString(), at.pass(), is(true));
            assertThat(less.toString(), less.pass(), is(false));
        }
    }

    private static Relay withStage(Relay relay, InverseTimeStage s) {
        List<TimeCurrentCurve> stages = new ArrayList<>(relay.stages());
        stages.set(0, s);
        return relay.withStages(stages);
    }

    private static boolean passesWith(Relay relay, InverseTimeStage s, double lo, double hi, MarginRequirement req) {
        return CableCheck.check(withStage(relay, s), CU_XLPE, lo, hi, req).pass();
    }
}
