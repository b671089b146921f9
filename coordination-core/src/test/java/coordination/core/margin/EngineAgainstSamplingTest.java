package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThanOrEqualTo;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.DeviceKind;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.curve.RandomDevices;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The engine against a dense-sampling reference on random device/cable pairs. The engine solves
 * for extremes, so it must never report a minimum above any sampled value, and sampling must come
 * within its own resolution of the engine's answer; every sampled sign change must hold a solved
 * crossing.
 */
class EngineAgainstSamplingTest {
    /** 250 cases per seed and four seeds: 1,000 cable checks and 1,000 grading checks. */
    private static final int CASES_PER_SEED = 250;
    private static final int SAMPLES = 100_000;
    /** Rounding allowed when the engine's minimum is compared with a sample: relative to the times. */
    private static final double ROUNDING = 1e-9;
    /**
     * How far a sampled minimum may lie above the solved one: with 1e5 points over at most four
     * decades a sample lies within 1e-4 in ln(I) of the true minimum, and times change there by at
     * most a few times that, relative.
     */
    private static final double SAMPLING_RESOLUTION = 2e-3;

    static CableThermalLimit cable(SplittableRandom r) {
        ConductorMaterial m = ConductorMaterial.values()[r.nextInt(2)];
        Insulation[] ins = {Insulation.PVC, Insulation.XLPE, Insulation.EPR};
        Insulation i = ins[r.nextInt(ins.length)];
        double size = ConductorSizes.iecSizesMm2()[2 + r.nextInt(20)];
        ThermalMethod method = ThermalMethod.values()[r.nextInt(3)];
        return new CableThermalLimit("C", m, i, size, 1 + r.nextInt(2), i.maxOperatingCelsius(),
                i.shortCircuitCelsius(size), method);
    }

    static double lowCurrent(ProtectiveDevice d, SplittableRandom r) {
        double[] b = d.maximumCurve().breakpointsAmps();
        return b[0] * Math.exp(r.nextDouble(-0.2, 1.5));
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {101, 202, 303, 404})
    void cableCheckAgreesWithDenseSampling(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int n = 0; n < CASES_PER_SEED; n++) {
            ProtectiveDevice device = RandomDevices.any(r);
            CableThermalLimit cable = cable(r);
            double lo = lowCurrent(device, r);
            double hi = lo * Math.exp(r.nextDouble(0.5, 8));
            DcOffset dc = r.nextInt(4) == 0 ? new DcOffset(r.nextDouble(1.1, 2.0), 50) : null;
            CableCheck check = new CableCheck(device, cable, lo, hi, MarginRequirement.seconds(0), dc);
            compare(check, cable, lo, hi, SAMPLES, "seed " + seed + " case " + n);
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {7, 8})
    void cableCheckAgreesWithAMillionSamples(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int n = 0; n < 5; n++) {
            ProtectiveDevice device = RandomDevices.any(r);
            CableThermalLimit cable = cable(r);
            double lo = lowCurrent(device, r);
            double hi = lo * Math.exp(r.nextDouble(0.5, 8));
            compare(new CableCheck(device, cable, lo, hi, MarginRequirement.seconds(0), null), cable, lo, hi,
                    1_000_000, "seed " + seed + " case " + n);
        }
    }

    private static void compare(CableCheck check, CableThermalLimit cable, double lo, double hi, int samples,
            String label) {
        CableCheckResult res = check.result();
        double minMargin = Double.POSITIVE_INFINITY;
        double minRatio = Double.POSITIVE_INFINITY;
        boolean notCleared = false;
        boolean undefined = false;
        int signChanges = 0;
        double prev = Double.NaN;
        double prevAmps = Double.NaN;
        double[] crossings = res.crossingsAmps();
        for (int i = 0; i < samples; i++) {
            double amps = i == samples - 1 ? hi : lo * Math.pow(hi / lo, (double) i / (samples - 1));
            double te = check.equivalentSeconds(amps);
            if (Double.isNaN(te)) {
                undefined = true;
                prev = Double.NaN;
                continue;
            }
            double tc = cable.damageSeconds(amps);
            double logRatio = Double.isInfinite(te) ? Double.NEGATIVE_INFINITY : Math.log(tc) - Math.log(te);
            if (Double.isInfinite(te)) {
                notCleared = true;
            } else {
                minMargin = Math.min(minMargin, tc - te);
                minRatio = Math.min(minRatio, tc / te);
            }
            if (!Double.isNaN(prev) && (prev < 0) != (logRatio < 0) && logRatio != 0) {
                signChanges++;
                double a = prevAmps;
                double b = amps;
                boolean found = Arrays.stream(crossings).anyMatch(c -> c >= a * (1 - 1e-9) && c <= b * (1 + 1e-9));
                assertThat(label + ": a crossing between " + a + " A and " + b + " A in " + res, found, is(true));
            }
            prev = logRatio;
            prevAmps = amps;
        }
        for (double c : crossings) {
            // each solved crossing is a root to 1e-6 or a step across the damage curve
            double at = logRatio(check, cable, c);
            boolean root = Math.abs(at) < 1e-6;
            boolean step = Math.signum(logRatio(check, cable, c * (1 - 1e-9)))
                    != Math.signum(logRatio(check, cable, c * (1 + 1e-9)));
            assertThat(label + ": crossing at " + c + " A is neither a root nor a step: " + res, root || step, is(true));
        }
        assertThat(label + " " + res, !Double.isNaN(res.notClearedFromAmps()), is(notCleared));
        assertThat(label + " " + res, !Double.isNaN(res.undefinedFromAmps()), is(undefined));
        assertThat(label + ": crossings " + res, crossings.length, greaterThanOrEqualTo(signChanges));
        if (res.minMarginSeconds() == Double.NEGATIVE_INFINITY) {
            // a pole at a pickup: only next to currents where the device does not clear
            assertThat(label + " " + res, notCleared, is(true));
            return;
        }
        if (Double.isInfinite(minMargin) || Double.isNaN(res.minMarginSeconds())) {
            return;
        }
        double scale = scaleAt(check, cable, res.minMarginAtAmps());
        assertThat(label + ": margin " + res, res.minMarginSeconds(), lessThanOrEqualTo(minMargin + ROUNDING * scale));
        assertThat(label + ": margin " + res, minMargin - res.minMarginSeconds(),
                lessThanOrEqualTo(SAMPLING_RESOLUTION * scale));
        assertThat(label + ": ratio " + res, res.minRatio(), lessThanOrEqualTo(minRatio * (1 + ROUNDING)));
        assertThat(label + ": ratio " + res, minRatio / res.minRatio() - 1, lessThanOrEqualTo(SAMPLING_RESOLUTION));
    }

    private static double logRatio(CableCheck check, CableThermalLimit cable, double amps) {
        double te = check.equivalentSeconds(amps);
        return Double.isInfinite(te) ? Double.NEGATIVE_INFINITY : Math.log(cable.damageSeconds(amps)) - Math.log(te);
    }

    private static double scaleAt(CableCheck check, CableThermalLimit cable, double amps) {
        double s = 0;
        for (double a : new double[] {amps * (1 - 1e-6), amps, amps * (1 + 1e-6)}) {
            double te = check.equivalentSeconds(a);
            if (Double.isFinite(te)) {
                s = Math.max(s, te);
            }
            double tc = cable.damageSeconds(a);
            if (Double.isFinite(tc)) {
                s = Math.max(s, tc);
            }
        }
        return Math.max(s, 1e-6);
    }

    /**
     * The IEC 60269-1 energy comparison, computed here on its own: the upstream fuse's pre-arcing
     * energy (stated, or I² times its melting time) over the downstream let-through (stated, or I²
     * times its clearing time); NaN where either is unknown.
     */
    private static double energyRatio(ProtectiveDevice up, ProtectiveDevice down, TimeCurrentCurve upCurve,
            TimeCurrentCurve downCurve, double amps) {
        if (up.kind() != DeviceKind.FUSE || down.kind() != DeviceKind.FUSE && down.letThrough().isEmpty()) {
            return Double.NaN;
        }
        double u = up.preArcing().isPresent() && up.preArcing().get().isDefinedAt(amps) ? up.preArcing().get().a2s(amps)
                : upCurve.isDefinedAt(amps) ? amps * amps * upCurve.seconds(amps) : Double.NaN;
        double d = down.letThrough().isPresent() && amps >= down.letThroughFromAmps()
                && down.letThrough().get().isDefinedAt(amps) ? down.letThrough().get().a2s(amps)
                : downCurve.isDefinedAt(amps) ? amps * amps * downCurve.seconds(amps) : Double.NaN;
        return u > 0 && Double.isFinite(u) && d > 0 && Double.isFinite(d) ? u / d : Double.NaN;
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {505, 606, 707, 808})
    void gradingCheckAgreesWithDenseSampling(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int n = 0; n < CASES_PER_SEED; n++) {
            ProtectiveDevice up = RandomDevices.any(r);
            ProtectiveDevice down = RandomDevices.any(r);
            double lo = Math.max(lowCurrent(up, r), lowCurrent(down, r));
            double hi = lo * Math.exp(r.nextDouble(0.5, 6));
            GradingCheckResult res = GradingCheck.check(up, down, lo, hi, GradingRequirement.intervalSeconds(0.3));
            // IEEE 242 practice: between two relays the interval is measured to the downstream operating time
            TimeCurrentCurve upCurve = up.minimumCurve();
            TimeCurrentCurve downCurve = up.kind() == DeviceKind.RELAY && down.kind() == DeviceKind.RELAY
                    ? down.slowestOperatingCurve() : down.maximumCurve();
            double min = Double.POSITIVE_INFINITY;
            double minEnergy = Double.POSITIVE_INFINITY;
            double scale = 1e-6;
            boolean undefined = false;
            for (int i = 0; i < SAMPLES / 4; i++) {
                double amps = i == SAMPLES / 4 - 1 ? hi : lo * Math.pow(hi / lo, (double) i / (SAMPLES / 4 - 1));
                if (!upCurve.isDefinedAt(amps) || !downCurve.isDefinedAt(amps)) {
                    double e = energyRatio(up, down, upCurve, downCurve, amps);
                    if (Double.isNaN(e)) {
                        undefined = true;
                    } else {
                        minEnergy = Math.min(minEnergy, e);
                    }
                    continue;
                }
                double tu = upCurve.seconds(amps);
                double td = downCurve.seconds(amps);
                if (Double.isInfinite(tu)) {
                    continue;
                }
                double d = Double.isInfinite(td) ? Double.NEGATIVE_INFINITY : tu - td;
                if (d < min) {
                    min = d;
                    scale = Math.max(1e-6, Math.max(tu, Double.isFinite(td) ? td : 0));
                }
            }
            String label = "seed " + seed + " case " + n + " " + res;
            assertThat(label, !Double.isNaN(res.undefinedFromAmps()), is(undefined));
            if (Double.isFinite(minEnergy)) {
                assertThat(label, res.minEnergyRatio(), lessThanOrEqualTo(minEnergy * (1 + ROUNDING)));
                assertThat(label, minEnergy / res.minEnergyRatio() - 1, lessThanOrEqualTo(SAMPLING_RESOLUTION));
            }
            if (undefined || Double.isInfinite(min) || Double.isNaN(res.minIntervalSeconds())) {
                if (min == Double.NEGATIVE_INFINITY) {
                    assertThat(label, res.minIntervalSeconds(), is(Double.NEGATIVE_INFINITY));
                }
                continue;
            }
            assertThat(label, res.minIntervalSeconds(), lessThanOrEqualTo(min + ROUNDING * scale));
            assertThat(label, min - res.minIntervalSeconds(), lessThanOrEqualTo(SAMPLING_RESOLUTION * scale));
        }
    }
}
