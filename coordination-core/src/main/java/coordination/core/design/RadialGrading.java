package coordination.core.design;

import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.MultiplierKind;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.SettingRange;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.internal.RecordForm;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.GradingRequirement;
import java.io.Serial;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Time multipliers for a radial chain of relays that grade, from the load end to the source. Each
 * relay's first inverse-time stage takes the smallest multiplier that meets every lower bound: the
 * relay's smallest setting, the currents it must ride through (a motor start, an inrush), the
 * interval over the relay below it, and the intervals over any fixed devices below it (a breaker, a
 * fuse, a relay outside the chain). The interval only grows with the upstream multiplier, so the
 * bound is found by bisection; the proposal is then rounded up to a setting the relay can take.
 * Each relay's cable is checked at the proposal over its own check's range and heating; a larger
 * multiplier only slows the relay, so a cable that fails at the smallest multiplier fails at every
 * one, and the proposal says that no multiplier meets both.
 */
public final class RadialGrading {
    private RadialGrading() {
    }

    /**
     * One relay of the chain.
     *
     * @param relay the relay; its first inverse-time stage's multiplier is chosen
     * @param referFactor current scale to the chain's common voltage base
     * @param cable the cable check on this relay, if there is one
     * @param interval the interval over the chain's relay below (ignored for the most downstream relay)
     * @param gradingFromAmps lowest current over which this relay grades with the one below, in amperes
     *     on the common base (ignored for the most downstream relay)
     * @param gradingToAmps highest such current
     * @param noTrip currents the relay must ride through, primary amperes at its own voltage
     * @param fixedBelow devices outside the chain (breakers, fuses, relays as set) that this relay must
     *     also grade over, each with its own check's range and requirement
     * @param fixedAbove devices outside the chain that must grade over this relay
     */
    public record Link(Relay relay, double referFactor, Optional<CableDuty> cable,
            GradingRequirement.Interval interval, double gradingFromAmps, double gradingToAmps, List<NoTrip> noTrip,
            List<Fixed> fixedBelow, List<Fixed> fixedAbove) implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }

        /**
         * Validates the link.
         *
         * @param relay the relay; its first inverse-time stage's multiplier is chosen
         * @param referFactor current scale to the chain's common voltage base
         * @param cable the cable check on this relay, if there is one
         * @param interval the interval over the chain's relay below (ignored for the most downstream relay)
         * @param gradingFromAmps lowest current over which this relay grades with the one below, in amperes on the
         *     common base (ignored for the most downstream relay)
         * @param gradingToAmps highest such current
         * @param noTrip currents the relay must ride through, primary amperes at its own voltage
         * @param fixedBelow devices outside the chain (breakers, fuses, relays as set) that this relay must also grade
         *     over, each with its own check's range and requirement
         * @param fixedAbove devices outside the chain that must grade over this relay
         * @throws IllegalArgumentException if a part is missing or a number is out of range
         */
        public Link {
            Checks.given("grading link: relay", relay);
            Checks.given("grading link '" + relay.id() + "': cable", cable);
            Checks.given("grading link '" + relay.id() + "': interval", interval);
            Checks.positive("grading link '" + relay.id() + "': referral factor", referFactor, "");
            Checks.currentRange("grading link '" + relay.id() + "': grading range", gradingFromAmps, gradingToAmps);
            noTrip = List.copyOf(Checks.given("grading link '" + relay.id() + "': no-trip points", noTrip));
            fixedBelow = List.copyOf(Checks.given("grading link '" + relay.id() + "': devices below", fixedBelow));
            fixedAbove = List.copyOf(Checks.given("grading link '" + relay.id() + "': devices above", fixedAbove));
            inverseStage(relay);
        }

        /**
         * A link with no devices beside the chain.
         *
         * @param relay the relay
         * @param referFactor current scale to the common base
         * @param cable the cable check on this relay, if any
         * @param interval the interval over the relay below
         * @param gradingFromAmps lowest grading current
         * @param gradingToAmps highest grading current
         * @param noTrip currents to ride through
         */
        public Link(Relay relay, double referFactor, Optional<CableDuty> cable, GradingRequirement.Interval interval,
                double gradingFromAmps, double gradingToAmps, List<NoTrip> noTrip) {
            this(relay, referFactor, cable, interval, gradingFromAmps, gradingToAmps, noTrip, List.of(), List.of());
        }
    }

    /**
     * A device beside a relay of the chain, above or below it, whose curve the chain does not choose.
     *
     * @param device the device, referred to the chain's common base
     * @param fromAmps lowest current of the grading check, amperes on the common base
     * @param toAmps highest current
     * @param requirement the check's requirement
     */
    public record Fixed(ProtectiveDevice device, double fromAmps, double toAmps, GradingRequirement requirement)
            implements Serializable {
        /**
         * Validates the device.
         *
         * @param device the device, referred to the chain's common base
         * @param fromAmps lowest current of the grading check, amperes on the common base
         * @param toAmps highest current
         * @param requirement the check's requirement
         * @throws IllegalArgumentException if a part is missing or the range is empty
         */
        public Fixed {
            Checks.given("fixed device: device", device);
            Checks.given("fixed device '" + device.id() + "': requirement", requirement);
            Checks.currentRange("fixed device '" + device.id() + "': range", fromAmps, toAmps);
        }
    }

    /** What decides a proposed multiplier. */
    public enum Binding {
        /** The relay offers nothing smaller. */
        SMALLEST_SETTING("the relay's smallest setting"),
        /** A current the relay must ride through. */
        NO_TRIP("a current it must ride through"),
        /** The interval over a device below. */
        GRADING("the interval over the device below");

        private final String words;

        Binding(String words) {
            this.words = words;
        }

        /** @return the binding constraint in words */
        public String words() {
            return words;
        }
    }

    /**
     * The proposal for one relay.
     *
     * @param id relay id
     * @param kind TMS or time dial
     * @param range the multiplier's settings
     * @param currentMultiplier the multiplier as set
     * @param exact the smallest multiplier meeting every lower bound, unrounded, or empty if none in range
     * @param proposed the exact value rounded up to the relay's step, or empty if none in range
     * @param binding which lower bound decides
     * @param bindingDevice the device below whose interval decides, with {@link Binding#GRADING}
     * @param gradings the gradings at the proposal: over the chain's relay below first (none for the most
     *     downstream), then over each fixed device below, then under each fixed device above
     * @param cable the cable check at the proposal, or empty without a cable
     * @param problem what cannot be met, or empty
     */
    public record Setting(String id, MultiplierKind kind, SettingRange range, double currentMultiplier, OptionalDouble exact,
            OptionalDouble proposed, Binding binding, Optional<String> bindingDevice,
            List<GradingCheckResult> gradings, Optional<CableCheckResult> cable, Optional<String> problem)
            implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }

        /**
         * Copies the list in.
         *
         * @param id relay id
         * @param kind TMS or time dial
         * @param range the multiplier's settings
         * @param currentMultiplier the multiplier as set
         * @param exact the smallest multiplier meeting every lower bound, unrounded, or empty if none in range
         * @param proposed the exact value rounded up to the relay's step, or empty if none in range
         * @param binding which lower bound decides
         * @param bindingDevice the device below whose interval decides, with {@link Binding#GRADING}
         * @param gradings the gradings at the proposal: over the chain's relay below first (none for the most
         *     downstream), then over each fixed device below, then under each fixed device above
         * @param cable the cable check at the proposal, or empty without a cable
         * @param problem what cannot be met, or empty
         */
        public Setting {
            gradings = List.copyOf(gradings);
        }
    }

    /**
     * Grades a chain.
     *
     * @param chain relays from the load end (index 0) to the source
     * @return one setting per relay, in chain order
     */
    public static List<Setting> grade(List<Link> chain) {
        List<Setting> out = new ArrayList<>();
        ProtectiveDevice below = null;
        for (Link link : chain) {
            int index = inverseStage(link.relay());
            InverseTimeStage stage = (InverseTimeStage) link.relay().stages().get(index);
            SettingRange range = stage.multiplierRange();
            String key = stage.multiplierKind().key();
            double exact = range.min();
            Binding binding = Binding.SMALLEST_SETTING;
            Optional<String> bindingDevice = Optional.empty();
            Optional<String> problem = Optional.empty();
            if (!link.noTrip().isEmpty()) {
                OptionalDouble ride = SlowestSetting.smallestMultiplierRidingThrough(link.relay(), index, link.noTrip(),
                        range.max());
                if (ride.isEmpty()) {
                    problem = Optional.of("no " + key + " up to " + Checks.format(range.max()) + " rides through "
                            + link.noTrip());
                } else if (ride.getAsDouble() > exact) {
                    exact = ride.getAsDouble();
                    binding = Binding.NO_TRIP;
                }
            }
            List<Fixed> belows = new ArrayList<>();
            if (below != null) {
                belows.add(new Fixed(below, link.gradingFromAmps(), link.gradingToAmps(), link.interval()));
            }
            belows.addAll(link.fixedBelow());
            for (Fixed b : belows) {
                if (problem.isPresent()) {
                    break;
                }
                OptionalDouble graded = smallestGrading(link, index, stage, b, range);
                if (graded.isEmpty()) {
                    problem = Optional.of("no " + key + " up to " + Checks.format(range.max()) + " gives "
                            + b.requirement() + " over '" + b.device().id() + "': " + check(with(link, index, stage,
                            range.max()), b).reason());
                } else if (graded.getAsDouble() > exact) {
                    exact = graded.getAsDouble();
                    binding = Binding.GRADING;
                    bindingDevice = Optional.of(b.device().id());
                }
            }
            OptionalDouble proposed = OptionalDouble.empty();
            List<GradingCheckResult> gradings = new ArrayList<>();
            Optional<CableCheckResult> cable = Optional.empty();
            if (problem.isEmpty()) {
                double p = range.atOrAbove(exact);
                proposed = OptionalDouble.of(p);
                ProtectiveDevice at = with(link, index, stage, p);
                for (Fixed b : belows) {
                    gradings.add(check(at, b));
                }
                // a fixed device above grades worst over the slowest multiplier, so the smallest one is the test
                for (Fixed a : link.fixedAbove()) {
                    GradingCheckResult g = GradingCheck.check(a.device(), at, a.fromAmps(), a.toAmps(), a.requirement());
                    gradings.add(g);
                    if (!g.pass() && problem.isEmpty()) {
                        problem = Optional.of(binding.words() + bindingDevice.map(d -> " '" + d + "'").orElse("")
                                + " needs " + key + " " + Checks.format(p) + ", at which '" + a.device().id()
                                + "' above does not grade (" + g.reason() + "); no multiplier meets both");
                    }
                }
                if (link.cable().isPresent()) {
                    CableCheckResult c = link.cable().get().check(at);
                    cable = Optional.of(c);
                    if (!c.pass() && problem.isEmpty()) {
                        problem = Optional.of(binding.words() + bindingDevice.map(d -> " '" + d + "'").orElse("")
                                + " needs " + key + " " + Checks.format(p) + ", at which '"
                                + link.cable().get().cable().id() + "' is not protected (" + c.reason()
                                + "); no multiplier meets both");
                    }
                }
            }
            out.add(new Setting(link.relay().id(), stage.multiplierKind(), range, stage.multiplier(), problem.isEmpty() || proposed.isPresent()
                    ? OptionalDouble.of(exact) : OptionalDouble.empty(), proposed, binding, bindingDevice, gradings,
                    cable, problem));
            // the chain above grades against this relay as proposed, or as set where nothing fits
            below = with(link, index, stage, proposed.orElse(stage.multiplier()));
        }
        return out;
    }

    private static GradingCheckResult check(ProtectiveDevice upstream, Fixed b) {
        return GradingCheck.check(upstream, b.device(), b.fromAmps(), b.toAmps(), b.requirement());
    }

    private static OptionalDouble smallestGrading(Link link, int index, InverseTimeStage stage, Fixed b,
            SettingRange range) {
        if (check(with(link, index, stage, range.min()), b).pass()) {
            return OptionalDouble.of(range.min());
        }
        if (!check(with(link, index, stage, range.max()), b).pass()) {
            return OptionalDouble.empty();
        }
        double m = Boundary.solve(v -> !check(with(link, index, stage, v), b).pass(), range.min(), range.max());
        // the boundary's failing side: step just onto the passing side
        return OptionalDouble.of(m * (1 + 2 * Boundary.RELATIVE));
    }

    static int inverseStage(Relay relay) {
        for (int i = 0; i < relay.stages().size(); i++) {
            if (relay.stages().get(i) instanceof InverseTimeStage) {
                return i;
            }
        }
        throw new IllegalArgumentException("relay '" + relay.id() + "': no inverse-time stage to grade");
    }

    private static ProtectiveDevice with(Link link, int index, InverseTimeStage stage, double multiplier) {
        List<TimeCurrentCurve> stages = new ArrayList<>(link.relay().stages());
        stages.set(index, stage.withMultiplier(multiplier));
        return link.relay().withStages(stages).referredBy(link.referFactor());
    }
}
