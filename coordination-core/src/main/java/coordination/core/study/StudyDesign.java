package coordination.core.study;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.curve.SettingRange;
import coordination.core.design.MinimumConductor;
import coordination.core.design.RadialGrading;
import coordination.core.design.SlowestSetting;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Design proposals for a study, beside its current values: for each cable check the smallest
 * conductor the device protects and, behind a relay, the slowest settings of its first inverse-time
 * stage that still protect the cable; for chains of relays graded by a time interval, the smallest
 * multipliers that grade from the load end up. {@link ReportWriter} writes its JSON form.
 *
 * @param study the study
 * @param cableAids one entry per cable check, in study order
 * @param chains one entry per chain of relays linked by interval grading checks
 */
public record StudyDesign(Study study, List<CableAid> cableAids, List<GradingChain> chains) {

    /** Copies the lists in. */
    public StudyDesign {
        cableAids = List.copyOf(cableAids);
        chains = List.copyOf(chains);
    }

    /**
     * Proposals for one cable check.
     *
     * @param check the check
     * @param cable its cable
     * @param conductor the smallest conductor the device protects
     * @param stage proposals for the relay's first inverse-time stage, if the device is such a relay
     */
    public record CableAid(Study.CableCheckSpec check, Study.StudyCable cable, MinimumConductor.Result conductor,
            Optional<StageAid> stage) {
    }

    /**
     * Proposals for an inverse-time stage.
     *
     * @param stage the stage as set
     * @param multiplier the largest multiplier that still protects the cable, up to the stage's range
     * @param multiplierAtRelayLimit whether that multiplier is the largest the relay offers
     * @param pickup the largest pickup that still protects the cable
     */
    public record StageAid(InverseTimeStage stage, SlowestSetting.Result multiplier, boolean multiplierAtRelayLimit,
            SlowestSetting.Result pickup) {
    }

    /**
     * A chain of relays graded by one interval.
     *
     * @param intervalSeconds the coordination time interval in seconds
     * @param relays one setting per relay, from the load end up
     */
    public record GradingChain(double intervalSeconds, List<RadialGrading.Setting> relays) {
        /** Copies the list in. */
        public GradingChain {
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

    private static CableAid cableAid(Study study, Study.CableCheckSpec spec) {
        Study.StudyCable cable = study.cable(spec.cable());
        Study.StudyDevice device = study.device(spec.device());
        CableThermalLimit limit = cable.limit();
        double from = spec.range().fromAmps();
        double to = spec.range().toAmps();
        MinimumConductor.Result size = MinimumConductor.solve(device.referred(), limit,
                cable.finalSource() == Study.TemperatureSource.INSULATION_DEFAULT, from, to, spec.requirement());
        Optional<StageAid> stage = Optional.empty();
        if (device.device() instanceof Relay relay) {
            int index = firstInverse(relay);
            if (index >= 0) {
                InverseTimeStage s = (InverseTimeStage) relay.stages().get(index);
                SettingRange range = s.multiplierRange();
                double factor = device.referralFactor();
                SlowestSetting.Result multiplier = SlowestSetting.largestMultiplier(relay, index, factor, limit, from,
                        to, spec.requirement(), range.max());
                SlowestSetting.Result pickup = SlowestSetting.largestPickup(relay, index, factor, limit, from, to,
                        spec.requirement());
                stage = Optional.of(new StageAid(s, multiplier, multiplier.found() && multiplier.largest() >= range.max(),
                        pickup));
            }
        }
        return new CableAid(spec, cable, size, stage);
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
        List<GradingChain> result = new ArrayList<>();
        for (String start : above.keySet()) {
            if (belowCount.containsKey(start)) {
                continue;
            }
            List<RadialGrading.Link> links = new ArrayList<>();
            List<String> ids = new ArrayList<>();
            String id = start;
            double interval = ((GradingRequirement.Interval) above.get(start).requirement()).seconds();
            while (id != null && !ids.contains(id)) {
                Study.GradingCheckSpec g = above.get(id);
                Study.StudyDevice d = study.device(id);
                Relay relay = (Relay) d.device();
                InverseTimeStage stage = (InverseTimeStage) relay.stages().get(firstInverse(relay));
                Optional<Study.CableCheckSpec> cc = cableCheckOf(study, id);
                Study.CurrentRange range = g != null ? g.range() : cc.isPresent() ? cc.get().range()
                        : new Study.CurrentRange(links.get(links.size() - 1).faultMinAmps(),
                        links.get(links.size() - 1).faultMaxAmps());
                SettingRange r = stage.multiplierRange();
                links.add(new RadialGrading.Link(relay, d.referralFactor(),
                        cc.map(spec -> study.cable(spec.cable()).limit()).orElse(null),
                        cc.map(Study.CableCheckSpec::requirement).orElse(MarginRequirement.seconds(0)),
                        range.fromAmps(), range.toAmps(), r.min(), r.max()));
                ids.add(id);
                id = g == null ? null : g.upstream();
            }
            result.add(new GradingChain(interval, RadialGrading.grade(links, interval)));
        }
        return result;
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
