package coordination.core.study;

import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.MultiplierKind;
import coordination.core.curve.Relay;
import coordination.core.curve.SettingRange;
import coordination.core.design.CableDuty;
import coordination.core.design.MinimumConductor;
import coordination.core.design.RadialGrading;
import coordination.core.design.SlowestSetting;
import coordination.core.internal.Checks;
import coordination.core.internal.RecordForm;
import coordination.core.margin.GradingRequirement;
import java.io.Serial;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Design proposals for a study, beside its current values. For each cable check: the smallest
 * conductor the device protects and, behind a relay, the slowest settings of its first inverse-time
 * stage that still protect the cable and respect the relay's other limits (its setting range and
 * steps, its load, the sensitivity to the lowest fault, the currents it must ride through). For
 * chains of relays graded by a time interval: the smallest multipliers that grade, from the load
 * end up. Every proposal is judged by the study's own checks (their ranges and DC-offset heating),
 * is rounded to a setting the relay can take, and names the constraint that decides it.
 * {@link ReportWriter} writes its JSON form.
 *
 * @param study the study
 * @param cableAids one entry per cable check, in study order
 * @param chains one entry per chain of relays linked by interval grading checks
 */
public record StudyDesign(Study study, List<CableAid> cableAids, List<GradingChain> chains) implements Serializable {

    /**
     * Copies the lists in.
     *
     * @param study the study
     * @param cableAids one entry per cable check, in study order
     * @param chains one entry per chain of relays linked by interval grading checks
     */
    public StudyDesign {
        cableAids = List.copyOf(cableAids);
        chains = List.copyOf(chains);
    }

    /**
     * Proposals for one cable check.
     *
     * @param check the check
     * @param cable its cable
     * @param conductor the smallest conductor (per conductor, with parallel conductors) the device protects
     * @param stage proposals for the relay's first inverse-time stage, if the device is such a relay
     */
    public record CableAid(Study.CableCheckSpec check, Study.StudyCable cable, MinimumConductor.Result conductor,
            Optional<StageAid> stage) implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }
    }

    /** What decides the largest proposal of a setting. */
    public enum UpperBound {
        /** The cable's margin. */
        CABLE("the cable's margin"),
        /** The relay offers nothing larger. */
        LARGEST_SETTING("the relay's largest setting"),
        /** The lowest fault current over the sensitivity factor. */
        SENSITIVITY("sensitivity to the lowest fault");

        private final String words;

        UpperBound(String words) {
            this.words = words;
        }

        /** @return the constraint in words */
        public String words() {
            return words;
        }
    }

    /**
     * The slowest multiplier of a stage that still protects its cable.
     *
     * @param kind TMS or time dial
     * @param range the relay's settings
     * @param now the multiplier as set
     * @param largest the largest passing multiplier, unrounded, or empty if none passes
     * @param smallest the smallest that rides through the stated currents, or empty if none stated
     * @param proposed the largest setting the relay can take within every bound, or empty
     * @param binding what decides the proposal
     * @param problem what cannot be met, or empty
     */
    public record MultiplierAid(MultiplierKind kind, SettingRange range, double now, OptionalDouble largest,
            OptionalDouble smallest, OptionalDouble proposed, UpperBound binding, Optional<String> problem)
            implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }
    }

    /**
     * The largest pickup of a stage that still protects its cable, in the stage's own units.
     *
     * @param now the pickup as set
     * @param ctRatio CT primary per secondary ampere, 1 for primary settings
     * @param step the pickup's resolution
     * @param largest the largest passing pickup, unrounded, or empty if none passes
     * @param lowestForLoad the smallest pickup the load allows ({@value Study.DesignLimits#LOAD_FACTOR} x load), or
     *     empty if no load is stated
     * @param proposed the largest setting within every bound, or empty
     * @param binding what decides the proposal
     * @param problem what cannot be met, or empty
     */
    public record PickupAid(double now, double ctRatio, double step, OptionalDouble largest,
            OptionalDouble lowestForLoad, OptionalDouble proposed, UpperBound binding, Optional<String> problem)
            implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }

        /** @return whether the pickup is set in CT-secondary amperes */
        public boolean secondary() {
            return ctRatio != 1.0;
        }
    }

    /**
     * Proposals for an inverse-time stage.
     *
     * @param stage the stage as set
     * @param multiplier its slowest multiplier
     * @param pickup its largest pickup
     */
    public record StageAid(InverseTimeStage stage, MultiplierAid multiplier, PickupAid pickup) implements Serializable {
    }

    /**
     * A chain of relays linked by interval grading checks.
     *
     * @param intervals the interval over the relay below, one per relay (the first, the load end's, is
     *     that of the check linking it upward)
     * @param relays one setting per relay, from the load end up
     */
    public record GradingChain(List<GradingRequirement.Interval> intervals, List<RadialGrading.Setting> relays)
            implements Serializable {
        /**
         * Copies the list in.
         *
         * @param intervals the interval over the relay below, one per relay (the first, the load end's, is that of the
         *     check linking it upward)
         * @param relays one setting per relay, from the load end up
         */
        public GradingChain {
            intervals = List.copyOf(intervals);
            relays = List.copyOf(relays);
        }
    }

    /**
     * Solves the proposals of a study.
     *
     * @param study the study
     * @return the proposals
     */
    public static StudyDesign of(Study study) {
        List<CableAid> aids = new ArrayList<>();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec spec) {
                aids.add(cableAid(study, spec));
            }
        }
        return new StudyDesign(study, aids, chains(study));
    }

    private static CableDuty duty(Study study, Study.CableCheckSpec spec) {
        return new CableDuty(study.cable(spec.cable()).limit(), spec.range().fromAmps(), spec.range().toAmps(),
                spec.requirement(), spec.dcOffset());
    }

    private static CableAid cableAid(Study study, Study.CableCheckSpec spec) {
        Study.StudyCable cable = study.cable(spec.cable());
        Study.StudyDevice device = study.device(spec.device());
        CableDuty duty = duty(study, spec);
        MinimumConductor.Result size = MinimumConductor.solve(device.referred(), duty,
                cable.finalSource() == Study.TemperatureSource.INSULATION_DEFAULT);
        Optional<StageAid> stage = Optional.empty();
        if (device.device() instanceof Relay relay && firstInverse(relay) >= 0) {
            int index = firstInverse(relay);
            InverseTimeStage s = (InverseTimeStage) relay.stages().get(index);
            stage = Optional.of(new StageAid(s, multiplierAid(relay, index, s, device, duty),
                    pickupAid(relay, index, s, device, duty)));
        }
        return new CableAid(spec, cable, size, stage);
    }

    private static MultiplierAid multiplierAid(Relay relay, int index, InverseTimeStage s, Study.StudyDevice device,
            CableDuty duty) {
        SettingRange range = s.multiplierRange();
        SlowestSetting.Result r = SlowestSetting.largestMultiplier(relay, index, device.referralFactor(), duty,
                range.max());
        OptionalDouble smallest = OptionalDouble.empty();
        if (!device.limits().noTrip().isEmpty()) {
            smallest = SlowestSetting.smallestMultiplierRidingThrough(relay, index, device.limits().noTrip(),
                    range.max());
        }
        String key = s.multiplierKind().key();
        if (!r.found()) {
            return new MultiplierAid(s.multiplierKind(), range, s.multiplier(), OptionalDouble.empty(), smallest,
                    OptionalDouble.empty(), UpperBound.CABLE, Optional.of(r.reason()));
        }
        UpperBound binding = r.largest() >= range.max() ? UpperBound.LARGEST_SETTING : UpperBound.CABLE;
        double proposed = range.atOrBelow(Math.min(r.largest(), range.max()));
        Optional<String> problem = Optional.empty();
        if (Double.isNaN(proposed)) {
            problem = Optional.of("the cable needs " + key + " at most " + Checks.format(r.largest())
                    + ", below the relay's smallest setting " + Checks.format(range.min()));
        } else if (!device.limits().noTrip().isEmpty() && (smallest.isEmpty() || smallest.getAsDouble() > proposed)) {
            problem = Optional.of(smallest.isEmpty() ? "no " + key + " rides through " + device.limits().noTrip()
                    : "riding through " + device.limits().noTrip() + " needs " + key + " at least "
                    + Checks.format(smallest.getAsDouble()) + ", the cable allows at most " + Checks.format(proposed)
                    + "; no " + key + " meets both");
        }
        return new MultiplierAid(s.multiplierKind(), range, s.multiplier(), OptionalDouble.of(r.largest()), smallest,
                Double.isNaN(proposed) || problem.isPresent() ? OptionalDouble.empty() : OptionalDouble.of(proposed),
                binding, problem);
    }

    private static PickupAid pickupAid(Relay relay, int index, InverseTimeStage s, Study.StudyDevice device,
            CableDuty duty) {
        Study.DesignLimits limits = device.limits();
        double ct = relay.ctRatio();
        SlowestSetting.Result r = SlowestSetting.largestPickup(relay, index, device.referralFactor(), duty);
        // IEC 60255 practice: the pickup must see the lowest fault with a factor, and carry the load with one
        double sensitive = duty.fromAmps() / device.referralFactor() / ct / limits.sensitivityFactor();
        OptionalDouble forLoad = limits.loadAmps().isPresent()
                ? OptionalDouble.of(limits.loadAmps().getAsDouble() * Study.DesignLimits.LOAD_FACTOR / ct)
                : OptionalDouble.empty();
        SettingRange steps = new SettingRange(limits.pickupStepAmps(), Double.MAX_VALUE, limits.pickupStepAmps());
        if (!r.found()) {
            return new PickupAid(s.pickupAmps(), ct, limits.pickupStepAmps(), OptionalDouble.empty(), forLoad,
                    OptionalDouble.empty(), UpperBound.CABLE, Optional.of(r.reason()));
        }
        UpperBound binding = r.largest() <= sensitive ? UpperBound.CABLE : UpperBound.SENSITIVITY;
        double proposed = steps.atOrBelow(Math.min(r.largest(), sensitive));
        Optional<String> problem = Optional.empty();
        String unit = ct != 1.0 ? " A (secondary)" : " A";
        if (Double.isNaN(proposed)) {
            problem = Optional.of(binding.words() + " allows a pickup of at most " + Checks.format(Math.min(r.largest(),
                    sensitive)) + unit + ", below one step of " + Checks.format(limits.pickupStepAmps()) + unit);
        } else if (forLoad.isPresent() && forLoad.getAsDouble() > proposed) {
            problem = Optional.of("the load needs a pickup of at least " + Checks.format(forLoad.getAsDouble()) + unit
                    + " (" + Checks.format(Study.DesignLimits.LOAD_FACTOR) + " x " + Checks.format(
                    limits.loadAmps().getAsDouble()) + " A), " + binding.words() + " allows at most "
                    + Checks.format(proposed) + unit + "; no pickup meets both");
        }
        return new PickupAid(s.pickupAmps(), ct, limits.pickupStepAmps(), OptionalDouble.of(r.largest()), forLoad,
                Double.isNaN(proposed) || problem.isPresent() ? OptionalDouble.empty() : OptionalDouble.of(proposed),
                binding, problem);
    }

    private static int firstInverse(Relay relay) {
        for (int i = 0; i < relay.stages().size(); i++) {
            if (relay.stages().get(i) instanceof InverseTimeStage) {
                return i;
            }
        }
        return -1;
    }

    private static boolean gradable(Study study, String id) {
        return study.device(id).device() instanceof Relay r && firstInverse(r) >= 0;
    }

    /** Chains of relays linked by interval grading checks, each from its load end up. */
    private static List<GradingChain> chains(Study study) {
        Map<String, Study.GradingCheckSpec> above = new LinkedHashMap<>();
        Map<String, Integer> belowCount = new HashMap<>();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.GradingCheckSpec g && g.requirement() instanceof GradingRequirement.Interval
                    && gradable(study, g.upstream()) && gradable(study, g.downstream())
                    && !above.containsKey(g.downstream())) {
                above.put(g.downstream(), g);
                belowCount.merge(g.upstream(), 1, Integer::sum);
            }
        }
        List<String> starts = new ArrayList<>();
        for (String id : above.keySet()) {
            if (!belowCount.containsKey(id)) {
                starts.add(id);
            }
        }
        // a relay graded by an interval only over breakers or fuses is a chain of its own
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.GradingCheckSpec g && g.requirement() instanceof GradingRequirement.Interval
                    && gradable(study, g.upstream()) && !above.containsKey(g.upstream())
                    && !belowCount.containsKey(g.upstream()) && !starts.contains(g.upstream())) {
                starts.add(g.upstream());
            }
        }
        List<GradingChain> result = new ArrayList<>();
        for (String start : starts) {
            List<RadialGrading.Link> links = new ArrayList<>();
            List<String> ids = new ArrayList<>();
            String id = start;
            Study.GradingCheckSpec belowSpec = null;
            List<GradingRequirement.Interval> intervals = new ArrayList<>();
            while (id != null && !ids.contains(id)) {
                Study.GradingCheckSpec g = above.get(id);
                Study.StudyDevice d = study.device(id);
                Optional<Study.CableCheckSpec> cc = cableCheckOf(study, id);
                // this relay grades with the one below over the range of the check that links them
                Study.GradingCheckSpec link = belowSpec != null ? belowSpec : g != null ? g : firstInterval(study, id);
                GradingRequirement.Interval interval = (GradingRequirement.Interval) link.requirement();
                intervals.add(interval);
                links.add(new RadialGrading.Link((Relay) d.device(), d.referralFactor(),
                        cc.map(spec -> duty(study, spec)), interval, link.range().fromAmps(), link.range().toAmps(),
                        d.limits().noTrip(),
                        fixed(study, id, belowSpec, g, true), fixed(study, id, belowSpec, g, false)));
                ids.add(id);
                belowSpec = g;
                id = g == null ? null : g.upstream();
            }
            result.add(new GradingChain(intervals, RadialGrading.grade(links)));
        }
        return result;
    }

    /**
     * The grading checks of a chain relay with devices the chain does not set: below it (other than the
     * chain's relay below) or above it (other than the chain's relay above).
     */
    private static List<RadialGrading.Fixed> fixed(Study study, String id, Study.GradingCheckSpec linkBelow,
            Study.GradingCheckSpec linkAbove, boolean below) {
        List<RadialGrading.Fixed> out = new ArrayList<>();
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.GradingCheckSpec g && g != linkBelow && g != linkAbove
                    && (below ? g.upstream() : g.downstream()).equals(id)) {
                Study.StudyDevice other = study.device(below ? g.downstream() : g.upstream());
                out.add(new RadialGrading.Fixed(other.referred(), g.range().fromAmps(), g.range().toAmps(),
                        g.requirement()));
            }
        }
        return out;
    }

    private static Study.GradingCheckSpec firstInterval(Study study, String upstream) {
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.GradingCheckSpec g && g.upstream().equals(upstream)
                    && g.requirement() instanceof GradingRequirement.Interval) {
                return g;
            }
        }
        throw new IllegalStateException("no interval grading check above '" + upstream + "'");
    }

    private static Optional<Study.CableCheckSpec> cableCheckOf(Study study, String device) {
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec cc && cc.device().equals(device)) {
                return Optional.of(cc);
            }
        }
        return Optional.empty();
    }
}
