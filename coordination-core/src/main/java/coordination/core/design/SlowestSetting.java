package coordination.core.design;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.MarginRequirement;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

/**
 * The slowest settings of one inverse-time stage of a relay that still protect a cable: the
 * largest time multiplier, and separately the largest pickup. An inverse stage's time rises with
 * either setting at every current, and the relay's time is the fastest of its stages, so the
 * check's margin never rises with them; the boundary is found by bisection to 1e-10 relative.
 */
public final class SlowestSetting {
    private SlowestSetting() {
    }

    /**
     * The result.
     *
     * @param current the setting now
     * @param largest the largest setting that passes, NaN if none does
     * @param check the check at the largest setting (or at the current one if none passes)
     * @param reason why no setting passes, or null
     */
    public record Result(double current, double largest, CableCheckResult check, String reason)
            implements Serializable {
        /** @return whether a passing setting was found */
        public boolean found() {
            return !Double.isNaN(largest);
        }
    }

    private static InverseTimeStage stage(Relay relay, int index) {
        if (index < 0 || index >= relay.stages().size() || !(relay.stages().get(index) instanceof InverseTimeStage s)) {
            throw new IllegalArgumentException("relay '" + relay.id() + "': stage " + index
                    + " - must be an inverse-time stage");
        }
        return s;
    }

    private static Relay with(Relay relay, int index, InverseTimeStage s) {
        List<TimeCurrentCurve> stages = new ArrayList<>(relay.stages());
        stages.set(index, s);
        return relay.withStages(stages);
    }

    /**
     * The largest time multiplier (TMS or time dial) of a stage that still passes.
     *
     * @param relay the relay as set
     * @param index the stage's index among the relay's stages
     * @param referFactor current scale to the cable's voltage base (1 on the same base)
     * @param cable the cable
     * @param fromAmps lowest fault current in amperes
     * @param toAmps highest fault current in amperes
     * @param requirement the margin
     * @param maxMultiplier the relay's largest multiplier; the search does not go above it
     * @return the result
     * @throws IllegalArgumentException if the stage is not an inverse-time stage
     */
    public static Result largestMultiplier(Relay relay, int index, double referFactor, CableThermalLimit cable,
            double fromAmps, double toAmps, MarginRequirement requirement, double maxMultiplier) {
        return largestMultiplier(relay, index, referFactor, new CableDuty(cable, fromAmps, toAmps, requirement,
                java.util.Optional.empty()), maxMultiplier);
    }

    /**
     * The largest time multiplier of a stage that still passes a cable check's duty.
     *
     * @param relay the relay as set
     * @param index the stage's index
     * @param referFactor current scale to the cable's voltage base
     * @param duty the cable check
     * @param maxMultiplier the search's ceiling
     * @return the result
     */
    public static Result largestMultiplier(Relay relay, int index, double referFactor, CableDuty duty,
            double maxMultiplier) {
        InverseTimeStage s = stage(relay, index);
        return search(m -> with(relay, index, s.withMultiplier(m)).referredBy(referFactor), s.multiplier(),
                maxMultiplier, duty, "multiplier");
    }

    /**
     * The smallest time multiplier with which a stage rides through currents it must carry: at
     * each point the relay's fastest operating time is at least the point's time.
     *
     * @param relay the relay as set
     * @param index the stage's index
     * @param points the currents to ride through, primary amperes at the relay's voltage
     * @param maxMultiplier the largest multiplier the relay offers
     * @return the smallest multiplier, or empty if none up to the largest rides through
     */
    public static java.util.OptionalDouble smallestMultiplierRidingThrough(Relay relay, int index, List<NoTrip> points,
            double maxMultiplier) {
        InverseTimeStage s = stage(relay, index);
        java.util.function.DoublePredicate rides = m -> {
            Relay r = with(relay, index, s.withMultiplier(m));
            return points.stream().allMatch(p -> r.minimumCurve().seconds(p.currentAmps()) >= p.seconds());
        };
        if (!rides.test(maxMultiplier)) {
            return java.util.OptionalDouble.empty();
        }
        double floor = s.multiplier() * 1e-6;
        if (rides.test(floor)) {
            return java.util.OptionalDouble.of(floor);
        }
        double m = Boundary.solve(v -> !rides.test(v), floor, maxMultiplier);
        return java.util.OptionalDouble.of(m * (1 + 2 * Boundary.RELATIVE));
    }

    /**
     * The largest pickup of a stage that still passes; the pickup stays below the lowest fault
     * current referred to the relay's settings, since above it the stage would not operate there.
     *
     * @param relay the relay as set (pickups in the relay's own units, secondary amperes with a CT)
     * @param index the stage's index
     * @param referFactor current scale to the cable's voltage base
     * @param cable the cable
     * @param fromAmps lowest fault current in amperes
     * @param toAmps highest fault current in amperes
     * @param requirement the margin
     * @return the result, the pickup in the stage's own units
     */
    public static Result largestPickup(Relay relay, int index, double referFactor, CableThermalLimit cable,
            double fromAmps, double toAmps, MarginRequirement requirement) {
        return largestPickup(relay, index, referFactor, new CableDuty(cable, fromAmps, toAmps, requirement,
                java.util.Optional.empty()));
    }

    /**
     * The largest pickup of a stage that still passes a cable check's duty; it stays below the
     * lowest fault current referred to the relay's settings.
     *
     * @param relay the relay as set (pickups in the relay's own units)
     * @param index the stage's index
     * @param referFactor current scale to the cable's voltage base
     * @param duty the cable check
     * @return the result, the pickup in the stage's own units
     */
    public static Result largestPickup(Relay relay, int index, double referFactor, CableDuty duty) {
        InverseTimeStage s = stage(relay, index);
        double ceiling = duty.fromAmps() / referFactor / relay.ctRatio();
        return search(p -> with(relay, index, s.withPickupAmps(p)).referredBy(referFactor), s.pickupAmps(), ceiling,
                duty, "pickup");
    }

    private static Result search(DoubleFunction<ProtectiveDevice> device, double now, double ceiling, CableDuty duty,
            String what) {
        double floor = now * 1e-6;
        CableCheckResult atFloor = duty.check(device.apply(floor));
        if (!atFloor.pass()) {
            return new Result(now, Double.NaN, duty.check(device.apply(now)),
                    "no " + what + " passes: even near zero the check " + atFloor.reason());
        }
        CableCheckResult atCeiling = duty.check(device.apply(ceiling));
        double best = atCeiling.pass() ? ceiling : Boundary.solve(v -> duty.check(device.apply(v)).pass(), floor,
                ceiling);
        return new Result(now, best, duty.check(device.apply(best)), null);
    }
}
