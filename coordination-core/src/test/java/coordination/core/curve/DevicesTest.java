package coordination.core.curve;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThanOrEqualTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class DevicesTest {

    @Test
    void fastestStageWinsAndBreakerTimeIsAdded() {
        Relay relay = new Relay("R1", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
                DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1.0, 0.05);
        double idmt = 0.2 * 0.14 / (Math.pow(2000 / 250.0, 0.02) - 1);
        assertThat(relay.minimumCurve().seconds(2000), closeTo(idmt, 1e-12));
        assertThat(relay.minimumCurve().seconds(5000), closeTo(0.1, 1e-15));
        assertThat(relay.maximumCurve().seconds(5000), closeTo(0.15, 1e-15));
        assertThat(relay.maximumCurve().seconds(12000), closeTo(0.05, 1e-15));
        assertThat(relay.maximumCurve().seconds(200), is(Double.POSITIVE_INFINITY));
    }

    @Test
    void ctRatioRefersSecondarySettingsToThePrimary() {
        // 1 A secondary pickup on a 400/1 CT is 400 A primary
        Relay relay = new Relay("R2", List.of(InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 1.0, 0.1)), 400,
                0.0);
        assertThat(relay.minimumCurve().seconds(4000), closeTo(0.1 * 13.5 / 9, 1e-12));
        assertThat(relay.minimumCurve().breakpointsAmps()[0], is(400.0));
    }

    @Test
    void fusePointsThatRiseAreRefusedNamingThePoints() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new TabulatedCurve(
                "fuse 'F3': clearing", new double[] {1000, 2000, 4000}, new double[] {10, 0.2, 5}));
        assertEquals("fuse 'F3': clearing: time rises from 0.2 s at 2000 A to 5 s at 4000 A;"
                + " times must fall as current rises", e.getMessage());
    }

    @Test
    void fuseCurveInterpolatesInLogLogAndRefusesOutsideItsPoints() {
        TabulatedCurve c = new TabulatedCurve("fuse 'F': clearing", new double[] {100, 1000}, new double[] {100, 1});
        // a straight line of slope -2 in log-log: t = 100 (100/I)^2
        assertThat(c.seconds(316.22776601683796), closeTo(10, 1e-9));
        CurveDomainException e = assertThrows(CurveDomainException.class, () -> c.seconds(2000));
        assertEquals("fuse 'F': clearing: no value at 2000 A; the curve is defined from 100 A to 1000 A",
                e.getMessage());
    }

    @Test
    void miniatureBreakerBandFollowsIec60898Table7() {
        // IEC 60898-1:2015, Table 7
        MiniatureBreaker b = MiniatureBreaker.of("M1", McbType.B, 16);
        assertThat(b.minimumCurve().seconds(1.13 * 16), is(3600.0));
        assertThat(b.maximumCurve().seconds(1.44 * 16), is(Double.POSITIVE_INFINITY));
        assertThat(b.maximumCurve().seconds(1.45 * 16), closeTo(3600.0, 1e-9));
        assertThat(b.minimumCurve().seconds(2.55 * 16), closeTo(1.0, 1e-12));
        assertThat(b.maximumCurve().seconds(2.55 * 16), closeTo(60.0, 1e-9));
        assertThat(b.minimumCurve().seconds(2.99 * 16), greaterThanOrEqualTo(0.1));
        assertThat(b.maximumCurve().seconds(5 * 16), lessThanOrEqualTo(0.1));
        MiniatureBreaker big = MiniatureBreaker.of("M2", McbType.D, 63);
        assertThat(big.maximumCurve().seconds(2.55 * 63), closeTo(120.0, 1e-9));
        assertThat(big.minimumCurve().seconds(9.99 * 63), greaterThanOrEqualTo(0.1));
        assertThat(big.maximumCurve().seconds(20 * 63), lessThanOrEqualTo(0.1));
    }

    @Test
    void tripUnitLongTimeTrIsTheTimeAtSixTimesIr() {
        TripUnitBreaker b = new TripUnitBreaker("Q1", new TripUnitBreaker.Settings(400, 10, 2400, 0.2, false, 6000,
                0.01, 0.05, 1.05, 1.30, 0.0, 0.0));
        // constant I²t through (6 Ir, tr) with no tolerance: t = tr (6 Ir / I)²
        assertThat(b.maximumCurve().seconds(2400 * 0.999), closeTo(10 * Math.pow(2400 / (2400 * 0.999), 2), 1e-9));
        assertThat(b.maximumCurve().seconds(3000), closeTo(0.2, 1e-15));
        assertThat(b.maximumCurve().seconds(6000), closeTo(0.05, 1e-15));
        assertThat(b.minimumCurve().seconds(6000), closeTo(0.01, 1e-15));
        assertThat(b.minimumCurve().seconds(1.05 * 400), is(Double.POSITIVE_INFINITY));
        assertThat(b.maximumCurve().seconds(1.29 * 400), is(Double.POSITIVE_INFINITY));
    }

    @Test
    void shortTimeRampMeetsTheFlatDelayAtTenTimesIr() {
        TripUnitBreaker b = new TripUnitBreaker("Q2", new TripUnitBreaker.Settings(400, 10, 2000, 0.2, true,
                Double.POSITIVE_INFINITY, 0.01, 0.05, 1.05, 1.30, 0.0, 0.0));
        assertThat(b.maximumCurve().seconds(4000), closeTo(0.2, 1e-12));
        assertThat(b.maximumCurve().seconds(2000), closeTo(0.2 * 4, 1e-12));
        assertThat(b.maximumCurve().seconds(8000), closeTo(0.2, 1e-12));
    }

    @Test
    void referredDeviceScalesCurrentsByTheVoltageRatio() {
        // an 11 kV device referred to a 0.4 kV base: 100 A at 11 kV is 2750 A at 0.4 kV
        Relay hv = Relay.of("HV", DefiniteTimeStage.definiteTime(100, 0.5));
        ProtectiveDevice lv = hv.referredBy(11 / 0.4);
        assertThat(lv.maximumCurve().seconds(2749), is(Double.POSITIVE_INFINITY));
        assertThat(lv.maximumCurve().seconds(2751), is(0.5));
        Fuse f = new Fuse("F", 100, new TabulatedCurve("m", new double[] {200, 2000}, new double[] {100, 0.01}),
                new TabulatedCurve("c", new double[] {200, 2000}, new double[] {120, 0.02}), OptionalDouble.of(1e5));
        assertThat(f.referredBy(2).letThrough().orElseThrow().a2s(1000), closeTo(4e5, 1e-6));
    }
}
