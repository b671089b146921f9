package coordination.core.margin;

import coordination.core.curve.BandDevice;
import coordination.core.curve.DeviceKind;
import coordination.core.curve.Fuse;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.LogAxis;
import coordination.core.internal.SegmentWalk;
import coordination.core.internal.SmoothScan;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;

/**
 * Whether two devices in series grade over a current range: the downstream device must clear
 * before the upstream one starts to operate, by the required interval. The interval is the upstream
 * minimum (fastest) curve minus the downstream maximum (clearing) curve, or between two relays
 * the downstream relay's slowest operating time (see {@link GradingRequirement}), solved exactly
 * segment by segment between the breakpoints of both curves, as in {@link CableCheck}.
 *
 * <p>Where a curve has no value (above a fuse's digitised points) and the upstream device is a
 * fuse, the pair is graded by energy, the principle of IEC 60269-1 for selectivity in the
 * current-limiting region: the upstream fuse's pre-arcing I²t (its stated points, or I² times its
 * melting time where that is defined) must be at least the downstream device's total let-through
 * I²t (its stated points, or I² times its clearing time). The minimum of their ratio is solved on
 * each segment as the interval is.
 */
public final class GradingCheck {
    private final ProtectiveDevice upstream;
    private final ProtectiveDevice downstream;
    private final TimeCurrentCurve up;
    private final TimeCurrentCurve down;
    private final boolean toOperatingTime;
    private final double fromAmps;
    private final double toAmps;
    private final GradingRequirement requirement;
    private final GradingCheckResult result;

    /**
     * Runs the check.
     *
     * @param upstream the device nearer the source; its minimum curve is used
     * @param downstream the device nearer the load; its maximum curve is used
     * @param fromAmps lowest current of the range in amperes, above 0
     * @param toAmps highest current in amperes, at or above {@code fromAmps}
     * @param requirement what is asked
     * @throws IllegalArgumentException if the range is invalid
     */
    public GradingCheck(ProtectiveDevice upstream, ProtectiveDevice downstream, double fromAmps, double toAmps,
            GradingRequirement requirement) {
        Checks.given("grading check: upstream device", upstream);
        Checks.given("grading check: downstream device", downstream);
        Checks.given("grading check: requirement", requirement);
        Checks.currentRange("grading range", fromAmps, toAmps);
        if (requirement instanceof GradingRequirement.RatingRatio
                && !(upstream.kind() == DeviceKind.FUSE && downstream.kind() == DeviceKind.FUSE)) {
            throw new IllegalArgumentException("grading check: requirement: a rating ratio applies to two fuses, found "
                    + upstream.kind().key() + " '" + upstream.id() + "' over " + downstream.kind().key() + " '"
                    + downstream.id() + "' - use an interval or no overlap");
        }
        this.upstream = upstream;
        this.downstream = downstream;
        this.up = upstream.minimumCurve();
        this.toOperatingTime = requirement instanceof GradingRequirement.Interval iv && !iv.toClearingTime()
                && upstream.kind() == DeviceKind.RELAY && downstream.kind() == DeviceKind.RELAY;
        this.down = toOperatingTime ? downstream.slowestOperatingCurve() : downstream.maximumCurve();
        this.fromAmps = fromAmps;
        this.toAmps = toAmps;
        this.requirement = requirement;
        this.result = compute();
    }

    /**
     * Runs a check.
     *
     * @param upstream the device nearer the source
     * @param downstream the device nearer the load
     * @param fromAmps lowest current in amperes
     * @param toAmps highest current in amperes
     * @param requirement what is asked
     * @return the result
     */
    public static GradingCheckResult check(ProtectiveDevice upstream, ProtectiveDevice downstream, double fromAmps,
            double toAmps, GradingRequirement requirement) {
        return new GradingCheck(upstream, downstream, fromAmps, toAmps, requirement).result();
    }

    /** @return the result */
    public GradingCheckResult result() {
        return result;
    }

    private static double time(TimeCurrentCurve c, double amps) {
        return c.isDefinedAt(amps) ? c.seconds(amps) : Double.NaN;
    }

    private double interval(double x) {
        double amps = Math.exp(x);
        return time(up, amps) - time(down, amps);
    }

    private double logRatio(double x) {
        double amps = Math.exp(x);
        return Math.log(time(up, amps)) - Math.log(time(down, amps));
    }

    /** The upstream fuse's pre-arcing energy at a current, A²s, or NaN. */
    private double upEnergy(double amps) {
        if (upstream.kind() != DeviceKind.FUSE) {
            return Double.NaN;
        }
        if (upstream.preArcing().isPresent() && upstream.preArcing().get().isDefinedAt(amps)) {
            return upstream.preArcing().get().a2s(amps);
        }
        return amps * amps * time(up, amps);
    }

    /** The downstream device's total let-through energy at a current, A²s, or NaN. */
    private double downEnergy(double amps) {
        if (downstream.letThrough().isPresent() && amps >= downstream.letThroughFromAmps()
                && downstream.letThrough().get().isDefinedAt(amps)) {
            return downstream.letThrough().get().a2s(amps);
        }
        return amps * amps * time(down, amps);
    }

    private double logEnergyRatio(double x) {
        double amps = Math.exp(x);
        return Math.log(upEnergy(amps)) - Math.log(downEnergy(amps));
    }

    private boolean energyDefined(double amps) {
        // grading by energy compares current-limiting devices: a fuse over a fuse, or over a stated let-through
        if (downstream.kind() != DeviceKind.FUSE && downstream.letThrough().isEmpty()) {
            return false;
        }
        double u = upEnergy(amps);
        double d = downEnergy(amps);
        return u > 0 && Double.isFinite(u) && d > 0 && Double.isFinite(d);
    }

    private GradingCheckResult compute() {
        RunningMinimum interval = new RunningMinimum();
        RunningMinimum energy = new RunningMinimum();
        CurrentSpan energySpan = new CurrentSpan();
        CurrentSpan undefined = new CurrentSpan();
        SmoothScan scan = new SmoothScan(this::sample, new DoubleUnaryOperator[] {this::interval, this::logRatio}, 1, 1,
                fromAmps, toAmps);
        SegmentWalk.walk(splitPoints(), s -> {
            double mid = s.midAmps();
            double right = s.rightAmps();
            if (Double.isNaN(time(up, mid)) || Double.isNaN(time(down, mid))) {
                scan.interrupt(Double.NaN);
                // the energies' own ends are split points: defined in the middle is defined throughout
                if (energyDefined(mid)) {
                    energySpan.add(s.a(), s.b());
                    energy.offer(LogAxis.minimum(this::logEnergyRatio, s.xa(), s.xb()), s);
                } else {
                    undefined.add(s.a(), s.b());
                }
                return;
            }
            boolean upOperates = Double.isFinite(time(up, right));
            boolean downOperates = Double.isFinite(time(down, right));
            if (!upOperates) {
                scan.interrupt(downOperates ? Double.POSITIVE_INFINITY : Double.NaN);
                return;
            }
            if (!downOperates) {
                interval.unbounded(s.a(), s.first());
                scan.interrupt(Double.NEGATIVE_INFINITY);
                return;
            }
            SegmentWalk.Segment seg = s;
            double prev = scan.previous();
            boolean afterGap = s.first() || prev == Double.NEGATIVE_INFINITY || Double.isNaN(prev);
            if (afterGap && LogAxis.divergesAt(v -> time(down, Math.exp(v)), s.xa())) {
                // the downstream curve's asymptote at its pickup: the interval has no lower bound there
                interval.unbounded(s.a(), s.first());
                seg = s.from(Math.min(s.xb(), s.xa() + LogAxis.DIVERGENCE_PROBE));
            }
            interval.offer(scan.scan(seg)[0], seg);
        });
        Optional<Fuse> fu = fuse(upstream);
        Optional<Fuse> fd = fuse(downstream);
        double ratio = fu.isPresent() && fd.isPresent() ? fu.get().ratingAmps() / fd.get().ratingAmps() : Double.NaN;
        double minInterval = interval.value();
        double minEnergyRatio = energySpan.isEmpty() ? Double.NaN : Math.exp(energy.value());
        boolean timed = !Double.isNaN(minInterval);
        boolean defined = undefined.isEmpty() && (timed || !energySpan.isEmpty());
        // IEC 60269-1: the upstream pre-arcing energy at least the downstream let-through
        boolean energyOk = energySpan.isEmpty() || minEnergyRatio >= 1.0;
        boolean pass;
        if (requirement instanceof GradingRequirement.Interval iv) {
            pass = defined && energyOk && (!timed || minInterval >= iv.seconds());
        } else if (requirement instanceof GradingRequirement.RatingRatio rr) {
            pass = defined && energyOk && (!timed || minInterval > 0) && ratio >= rr.ratio();
        } else {
            pass = defined && energyOk && (!timed || minInterval > 0);
        }
        return new GradingCheckResult(upstream.id(), downstream.id(), fromAmps, toAmps, requirement, toOperatingTime,
                pass, minInterval, interval.at(), interval.side(), scan.crossingsAmps(), ratio, minEnergyRatio,
                energy.at(), energySpan.from(), energySpan.to(), undefined.from(), undefined.to());
    }

    /** The fuse behind a device, also when it was referred to another voltage. */
    private static Optional<Fuse> fuse(ProtectiveDevice d) {
        if (d instanceof Fuse f) {
            return Optional.of(f);
        }
        return d instanceof BandDevice b && b.source() instanceof Fuse f ? Optional.of(f) : Optional.empty();
    }

    private void sample(double x, double[] values) {
        double amps = Math.exp(x);
        double tu = time(up, amps);
        double td = time(down, amps);
        values[0] = tu - td;
        values[1] = Math.log(tu) - Math.log(td);
    }

    private double[] splitPoints() {
        double[] pre = upstream.preArcing().map(LetThroughEnergy::breakpointsAmps).orElse(new double[0]);
        double[] let = downstream.letThrough().map(LetThroughEnergy::breakpointsAmps).orElse(new double[0]);
        return LogAxis.splitPoints(fromAmps, toAmps, up.breakpointsAmps(), down.breakpointsAmps(),
                new double[] {up.lowestDefinedAmps(), up.highestDefinedAmps(), down.lowestDefinedAmps(),
                    down.highestDefinedAmps(), downstream.letThroughFromAmps()}, pre, let);
    }
}
