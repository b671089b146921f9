package coordination.core.study;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.Fuse;
import coordination.core.internal.Checks;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.ThermalRegion;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The assumptions each check rests on and the warnings its context gives, for the report and the sheet. */
final class StudyNotes {
    private final Study study;
    private final Map<String, Study.StudyDevice> devices = new HashMap<>();
    private final Map<String, Study.StudyCable> cables = new HashMap<>();
    /** The network's assumptions about each cable's impedance, by the cable's note prefix. */
    private final Map<String, List<Note>> cableAssumptions = new HashMap<>();
    private final List<Note> busFactors = new ArrayList<>();
    private final Map<String, List<Study.CableCheckSpec>> cableChecksByDevice = new HashMap<>();

    /** Indexes a study once, so that notes for many checks cost no repeated searches. */
    StudyNotes(Study study) {
        this.study = study;
        study.devices().forEach(d -> devices.putIfAbsent(d.id(), d));
        study.cables().forEach(c -> cables.putIfAbsent(c.id(), c));
        study.network().ifPresent(n -> n.warnings().forEach(w -> {
            if (w.code().equals("bus-voltage-factors-assumed")) {
                busFactors.add(w);
            }
            // under every prefix that ends at a colon, since an id may hold one
            for (int colon = w.message().indexOf(':'); isCableAssumption(w) && colon > 0;
                    colon = w.message().indexOf(':', colon + 1)) {
                cableAssumptions.computeIfAbsent(w.message().substring(0, colon), k -> new ArrayList<>()).add(w);
            }
        }));
        for (Study.StudyCheck c : study.checks()) {
            if (c instanceof Study.CableCheckSpec cc) {
                cableChecksByDevice.computeIfAbsent(cc.device(), k -> new ArrayList<>()).add(cc);
            }
        }
    }

    private Study.StudyDevice device(String id) {
        Study.StudyDevice d = devices.get(id);
        return d != null ? d : study.device(id);
    }

    StudyReport.CheckNotes of(Study.StudyCheck spec, CheckResult result) {
        List<Note> assumptions = new ArrayList<>();
        List<Note> warnings = new ArrayList<>();
        if (spec instanceof Study.CableCheckSpec c) {
            cable(c, (CableCheckResult) result, assumptions);
        } else if (spec instanceof Study.GradingCheckSpec g) {
            assumptions.addAll(device(g.upstream()).assumptions());
            for (Note n : device(g.downstream()).assumptions()) {
                if (!assumptions.contains(n)) {
                    assumptions.add(n);
                }
            }
            grading(g, warnings);
        }
        // the currents of a check the network gives rest on its buses' voltage factors
        boolean derivedRange = spec instanceof Study.CableCheckSpec cc && cc.dcSource() == Study.DcSource.FROM_NETWORK
                || spec instanceof Study.GradingCheckSpec gs && gs.derived();
        if (derivedRange) {
            busFactors.stream().filter(w -> !assumptions.contains(w)).forEach(assumptions::add);
        }
        return new StudyReport.CheckNotes(assumptions, warnings);
    }

    private void cable(Study.CableCheckSpec c, CableCheckResult r, List<Note> out) {
        Study.StudyCable cable = cables.containsKey(c.cable()) ? cables.get(c.cable()) : study.cable(c.cable());
        CableThermalLimit l = cable.limit();
        String who = "cable '" + l.id() + "'";
        if (cable.initialSource() == Study.TemperatureSource.INSULATION_DEFAULT) {
            out.add(new Note("initial-temperature-assumed", who + ": initial temperature "
                    + Checks.format(l.initialCelsius()) + " °C assumed, the maximum operating temperature of "
                    + l.insulation().key() + " (" + l.method().key() + ")"));
        }
        if (cable.finalSource() == Study.TemperatureSource.INSULATION_DEFAULT) {
            out.add(new Note("final-temperature-assumed", who + ": final temperature " + Checks.format(l.finalCelsius())
                    + " °C assumed, the short-circuit limit of " + l.insulation().key() + " (" + l.method().key() + ")"));
        }
        if (c.dcSource() == Study.DcSource.ASSUMED_KAPPA) {
            out.add(new Note("dc-offset-kappa-assumed", "κ " + Checks.format(c.dcOffset().orElseThrow().kappa())
                    + " assumed for the DC-offset heating (common practice); state dc_offset: {kappa} or {x_r}"));
        } else if (c.dcSource() == Study.DcSource.NONE) {
            out.add(new Note("dc-offset-off", "DC-offset heating not counted (dc_offset: none)"));
        }
        if (r.regions().stream().anyMatch(g -> g.method().equals(ThermalRegion.OUTSIDE_IEC_60949))) {
            out.add(new Note("outside-iec-60949", who + ": beyond 5 s, outside IEC 60949's scope, no heat loss is"
                    + " credited; the cable withstands 5 s or its adiabatic time, whichever is longer"));
        }
        out.addAll(device(c.device()).assumptions());
        // the network's defaults for this cable's impedance decide its fault range
        out.addAll(cableAssumptions.getOrDefault(who, List.of()));
    }

    /** Whether a network note is an assumption about a cable's impedance rather than a warning. */
    static boolean isCableAssumption(Note n) {
        return n.code().equals("cable-resistance-assumed") || n.code().equals("cable-reactance-assumed")
                || n.code().equals("bus-voltage-factors-assumed");
    }

    private void grading(Study.GradingCheckSpec g, List<Note> out) {
        for (Study.CableCheckSpec c : cableChecksByDevice.getOrDefault(g.downstream(), List.of())) {
            if ((c.range().fromAmps() < g.range().fromAmps() || c.range().toAmps() > g.range().toAmps())) {
                out.add(new Note("grading-range-narrower", "the grading range " + ka(g.range()) + " is narrower than"
                        + " the " + ka(c.range()) + " of cable '" + c.cable() + "' below '" + g.downstream()
                        + "': selectivity outside it is not checked"));
            }
        }
        if (g.requirement() instanceof GradingRequirement.RatingRatio) {
            Optional<Fuse> up = fuse(g.upstream());
            Optional<Fuse> down = fuse(g.downstream());
            boolean oneGgSeries = up.isPresent() && down.isPresent()
                    && up.get().category().equals(Optional.of("gG")) && down.get().category().equals(Optional.of("gG"))
                    && up.get().series().isPresent() && up.get().series().equals(down.get().series());
            if (!oneGgSeries) {
                out.add(new Note("rating-ratio-outside-gg-series", "the rating-ratio rule holds for gG fuses of one"
                        + " series (common practice); state category: gG and one series for both, or grade by time"
                        + " and energy"));
            }
        }
    }

    private Optional<Fuse> fuse(String id) {
        return device(id).device() instanceof Fuse f ? Optional.of(f) : Optional.empty();
    }

    private static String ka(Study.CurrentRange r) {
        return Checks.format(r.fromAmps() / 1000) + " to " + Checks.format(r.toAmps() / 1000) + " kA";
    }
}
