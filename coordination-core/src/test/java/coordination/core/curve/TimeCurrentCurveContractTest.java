package coordination.core.curve;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThanOrEqualTo;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The contract every protective device and its curves must keep. One small subclass per
 * implementation supplies random devices from a seed.
 */
abstract class TimeCurrentCurveContractTest {
    private static final int CASES = 200;
    private static final int POINTS = 400;

    /** @return a random device of the implementation under test */
    abstract ProtectiveDevice device(SplittableRandom random);

    /** @return the lowest current, in amperes, at which the device may operate at all */
    abstract double lowestOperatingAmps(ProtectiveDevice device);

    @Test
    void operatingTimeNeverRisesWithCurrent() {
        SplittableRandom r = new SplittableRandom(42);
        for (int c = 0; c < CASES; c++) {
            ProtectiveDevice d = device(r);
            for (TimeCurrentCurve curve : new TimeCurrentCurve[] {d.minimumCurve(), d.maximumCurve()}) {
                double lo = Math.max(curve.lowestDefinedAmps(), lowestOperatingAmps(d) * 0.5);
                double hi = Math.min(curve.highestDefinedAmps(), lowestOperatingAmps(d) * 200);
                double previous = Double.POSITIVE_INFINITY;
                for (int i = 0; i <= POINTS; i++) {
                    double amps = Math.min(hi, lo * Math.pow(hi / lo, (double) i / POINTS));
                    double t = curve.seconds(amps);
                    assertThat(curve + " at " + amps + " A", t, lessThanOrEqualTo(previous));
                    assertThat(t, greaterThanOrEqualTo(0.0));
                    previous = t;
                }
            }
        }
    }

    @Test
    void doesNotOperateBelowPickup() {
        SplittableRandom r = new SplittableRandom(43);
        for (int c = 0; c < CASES; c++) {
            ProtectiveDevice d = device(r);
            TimeCurrentCurve curve = d.minimumCurve();
            double below = lowestOperatingAmps(d) * 0.999;
            if (curve.isDefinedAt(below)) {
                assertThat(curve + " at " + below + " A", curve.seconds(below), is(Double.POSITIVE_INFINITY));
            } else {
                // a digitised curve says it has no value there rather than make one up
                assertThrows(CurveDomainException.class, () -> curve.seconds(below), curve + " at " + below + " A");
            }
        }
    }

    @Test
    void minimumCurveIsNeverAboveMaximumCurve() {
        SplittableRandom r = new SplittableRandom(44);
        for (int c = 0; c < CASES; c++) {
            ProtectiveDevice d = device(r);
            double lo = Math.max(d.minimumCurve().lowestDefinedAmps(), d.maximumCurve().lowestDefinedAmps());
            lo = Math.max(lo, lowestOperatingAmps(d) * 0.5);
            double hi = Math.min(d.minimumCurve().highestDefinedAmps(), d.maximumCurve().highestDefinedAmps());
            hi = Math.min(hi, lowestOperatingAmps(d) * 200);
            for (int i = 0; i <= POINTS; i++) {
                double amps = Math.min(hi, lo * Math.pow(hi / lo, (double) i / POINTS));
                assertThat(d + " at " + amps + " A", d.minimumCurve().seconds(amps),
                        lessThanOrEqualTo(d.maximumCurve().seconds(amps)));
            }
        }
    }

    @Test
    void breakpointsAscend() {
        SplittableRandom r = new SplittableRandom(45);
        for (int c = 0; c < CASES; c++) {
            double[] b = device(r).maximumCurve().breakpointsAmps();
            for (int i = 1; i < b.length; i++) {
                assertThat(b[i], greaterThanOrEqualTo(b[i - 1]));
            }
        }
    }

    @Test
    void everyStretchFallsBetweenItsStatedFloorAndBound() {
        SplittableRandom r = new SplittableRandom(46);
        for (int c = 0; c < CASES; c++) {
            ProtectiveDevice d = device(r);
            for (TimeCurrentCurve curve : new TimeCurrentCurve[] {d.minimumCurve(), d.maximumCurve()}) {
                double lo = Math.max(curve.lowestDefinedAmps(), lowestOperatingAmps(d) * 0.5);
                double hi = Math.min(curve.highestDefinedAmps(), lowestOperatingAmps(d) * 200);
                coordination.core.internal.SplitPoints splits = new coordination.core.internal.SplitPoints();
                splits.start(lo, hi);
                splits.addAll(curve.breakpointsAmps());
                splits.finish();
                double[] ends = java.util.Arrays.copyOf(splits.points(), splits.count());
                for (int k = 1; k < ends.length; k++) {
                    // the engine asks just inside the breakpoints, where the curve is smooth
                    double a = ends[k - 1] * (1 + 1e-9);
                    double b = ends[k] * (1 - 1e-9);
                    if (!(b > a)) {
                        continue;
                    }
                    double bound = curve.logSlopeBound(a, b);
                    double floor = curve.logSlopeFloor(a, b);
                    assertThat(curve + " on " + a + " to " + b + " A", bound, greaterThanOrEqualTo(0.0));
                    assertThat(curve + " on " + a + " to " + b + " A", floor, greaterThanOrEqualTo(0.0));
                    if (Double.isInfinite(floor)) {
                        // a curve that says it operates nowhere on the stretch
                        assertThat(curve.seconds(a), is(Double.POSITIVE_INFINITY));
                        assertThat(curve.seconds(b), is(Double.POSITIVE_INFINITY));
                        continue;
                    }
                    double previous = curve.seconds(a);
                    for (int i = 1; i <= 50; i++) {
                        double x0 = Math.log(a) + (Math.log(b) - Math.log(a)) * (i - 1) / 50;
                        double x1 = Math.log(a) + (Math.log(b) - Math.log(a)) * i / 50;
                        double t = curve.seconds(Math.min(b, Math.exp(x1)));
                        assertThat(curve + " operates on all or none of " + a + " to " + b + " A",
                                Double.isInfinite(t), is(Double.isInfinite(previous)));
                        if (Double.isFinite(t)) {
                            // 1e-12 covers the rounding of the two logarithms, far below any slope's share
                            double fall = previous == t ? 0.0 : Math.log(previous) - Math.log(t);
                            assertThat(curve + " at " + Math.exp(x1) + " A", fall,
                                    lessThanOrEqualTo(bound * (x1 - x0) + 1e-12));
                            assertThat(curve + " at " + Math.exp(x1) + " A", fall,
                                    greaterThanOrEqualTo(floor * (x1 - x0) - 1e-12));
                        }
                        previous = t;
                    }
                }
            }
        }
    }
}
