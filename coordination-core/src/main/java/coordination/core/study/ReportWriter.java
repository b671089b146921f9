package coordination.core.study;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.WithstandTable;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.MiniatureBreaker;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.curve.TripUnitBreaker;
import coordination.core.design.MinimumConductor;
import coordination.core.design.RadialGrading;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import coordination.core.margin.ThermalRegion;
import java.io.Serializable;
import java.util.List;

/**
 * The one writer of the project's JSON: the study report ({@code spec/report-format.md}), the form
 * for several studies, the design proposals and the withstand table. Keys keep a fixed order and
 * numbers their full precision, so the same input always gives the same bytes.
 */
public final class ReportWriter {
    private ReportWriter() {
    }

    /**
     * The report of one study.
     *
     * @param report the evaluated study
     * @return the JSON text, ending with a newline
     */
    public static String write(StudyReport report) {
        JsonOut j = new JsonOut();
        report(j, report, null);
        return j.finish();
    }

    /**
     * The report of one study with its sensitivity run as {@code sensitivity}.
     *
     * @param run the study as given and widened
     * @return the JSON text
     */
    public static String write(Sensitivity run) {
        JsonOut j = new JsonOut();
        report(j, run.nominal(), run);
        return j.finish();
    }

    /**
     * The reports of several studies with their sensitivity runs, in the form of
     * {@link #write(List, boolean)}.
     *
     * @param runs the studies as given and widened
     * @param pass whether every study was read and every check passes as given
     * @return the JSON text
     */
    public static String writeSensitivities(List<Sensitivity> runs, boolean pass) {
        return writeSensitivities(runs, List.of(), pass);
    }

    /**
     * The reports of several studies with their sensitivity runs, and the studies that could not
     * be read: {@code {"format", "pass", "studies", "not_read"}}.
     *
     * @param runs the studies' runs
     * @param notRead the files that could not be read, with their error lines
     * @param pass whether every study was read and every check passes
     * @return the JSON text
     */
    public static String writeSensitivities(List<Sensitivity> runs, List<NotRead> notRead, boolean pass) {
        JsonOut j = new JsonOut().startObject();
        j.integer("format", StudyReport.FORMAT).bool("pass", pass).startArray("studies");
        for (Sensitivity r : runs) {
            report(j, r.nominal(), r);
        }
        j.endArray();
        return notRead(j, notRead).endObject().finish();
    }

    /**
     * A study file that could not be read, in a list of reports.
     *
     * @param file the file as it was named
     * @param errors its error lines, each {@code FILE:LINE:COLUMN: key: message}
     */
    public record NotRead(String file, List<String> errors) implements Serializable {
        /**
         * Copies the list in.
         *
         * @param file the file as it was named
         * @param errors its error lines
         */
        public NotRead {
            errors = List.copyOf(errors);
        }
    }

    private static JsonOut notRead(JsonOut j, List<NotRead> notRead) {
        j.startArray("not_read");
        for (NotRead n : notRead) {
            j.startObject().text("file", n.file()).startArray("errors");
            n.errors().forEach(j::element);
            j.endArray().endObject();
        }
        return j.endArray();
    }

    /**
     * The reports of several studies: {@code {"format", "pass", "studies"}}.
     *
     * @param reports the evaluated studies
     * @param pass whether every study was read and every check passes
     * @return the JSON text
     */
    public static String write(List<StudyReport> reports, boolean pass) {
        return write(reports, List.of(), pass);
    }

    /**
     * The reports of several studies and the studies that could not be read:
     * {@code {"format", "pass", "studies", "not_read"}}.
     *
     * @param reports the evaluated studies
     * @param notRead the files that could not be read, with their error lines
     * @param pass whether every study was read and every check passes
     * @return the JSON text
     */
    public static String write(List<StudyReport> reports, List<NotRead> notRead, boolean pass) {
        JsonOut j = new JsonOut().startObject();
        j.integer("format", StudyReport.FORMAT).bool("pass", pass).startArray("studies");
        for (StudyReport r : reports) {
            report(j, r, null);
        }
        j.endArray();
        return notRead(j, notRead).endObject().finish();
    }

    /**
     * One check's result, as it appears in a report's {@code checks}.
     *
     * @param result the result
     * @return the JSON text
     */
    public static String write(CheckResult result) {
        JsonOut j = new JsonOut();
        check(j, result, new StudyReport.CheckNotes(List.of(), List.of()), null);
        return j.finish();
    }

    /**
     * The design proposals of a study.
     *
     * @param design the proposals
     * @return the JSON text
     */
    public static String write(StudyDesign design) {
        JsonOut j = new JsonOut().startObject();
        j.integer("format", StudyReport.FORMAT).text("study", design.study().name()).text("title",
                design.study().title());
        j.startArray("cable_checks");
        for (StudyDesign.CableAid a : design.cableAids()) {
            cableAid(j, a);
        }
        j.endArray().startArray("grading_chains");
        for (StudyDesign.GradingChain c : design.chains()) {
            j.startObject().startArray("relays");
            for (int i = 0; i < c.relays().size(); i++) {
                RadialGrading.Setting s = c.relays().get(i);
                GradingRequirement.Interval interval = c.intervals().get(i);
                j.startObject().text("relay", s.id()).number("interval_s", interval.seconds())
                        .text("interval_to", interval.toClearingTime() ? "clearing-time" : "operating-time")
                        .number("now", s.currentMultiplier()).number("exact", s.exact().orElse(Double.NaN))
                        .number("proposed", s.proposed().orElse(Double.NaN)).number("step", s.range().step())
                        .text("binding", s.binding().words()).text("binding_device", s.bindingDevice().orElse(null))
                        .startArray("gradings");
                for (GradingCheckResult g : s.gradings()) {
                    j.startObject().text("upstream", g.upstream()).text("downstream", g.downstream())
                            .text("requirement", g.requirement().toString()).bool("pass", g.pass())
                            .number("min_interval_s", g.minIntervalSeconds()).number("at_a", g.minIntervalAtAmps())
                            .endObject();
                }
                j.endArray().number("cable_min_margin_s", s.cable().map(CableCheckResult::minMarginSeconds)
                                .orElse(Double.NaN))
                        .text("problem", s.problem().orElse(null)).endObject();
            }
            j.endArray().endObject();
        }
        return j.endArray().endObject().finish();
    }

    /**
     * A withstand table.
     *
     * @param table the table
     * @return the JSON text
     */
    public static String write(WithstandTable table) {
        CableThermalLimit first = table.rows().get(0).cable();
        JsonOut j = new JsonOut().startObject();
        j.integer("format", StudyReport.FORMAT).text("conductor", first.material().key())
                .text("insulation", first.insulation().key()).text("method", first.method().key()).startArray("sizes");
        double[] times = table.timesSeconds();
        for (WithstandTable.Row row : table.rows()) {
            CableThermalLimit c = row.cable();
            j.startObject().text("size", row.label()).number("size_mm2", c.sizeMm2()).integer("parallel", c.parallel())
                    .number("k", c.k()).number("initial_c", c.initialCelsius()).number("final_c", c.finalCelsius())
                    .number("i2t_a2s", c.i2tA2s()).startArray("withstand");
            double[] amps = row.withstandAmps(times);
            for (int i = 0; i < times.length; i++) {
                j.startObject().number("time_s", times[i]).number("withstand_a", amps[i]).endObject();
            }
            j.endArray().endObject();
        }
        return j.endArray().endObject().finish();
    }

    /**
     * The fault levels of a study's network: {@code {"format", "study", "faults"}}.
     *
     * @param study a study with a network
     * @return the JSON text
     */
    public static String writeFaults(Study study) {
        JsonOut j = new JsonOut().startObject();
        j.integer("format", StudyReport.FORMAT).text("study", study.name()).text("title", study.title());
        faults(j, study);
        return j.endObject().finish();
    }

    private static void faults(JsonOut j, Study study) {
        j.startArray("faults");
        study.network().ifPresent(n -> {
            for (coordination.core.network.FaultLevel f : n.levels().levels()) {
                j.startObject().text("at", f.at()).text("bus", f.bus()).number("ik3_max_ka", f.ik3MaxAmps() / 1000)
                        .number("ik3_min_ka", f.ik3MinAmps() / 1000).number("ik2_min_ka", f.ik2MinAmps() / 1000)
                        .number("kappa", f.kappa()).number("ip_ka", f.ipAmps() / 1000).number("r_x", f.rOverX())
                        .endObject();
            }
        });
        j.endArray();
    }

    // --------------------------------------------------------------------------------------- report

    private static void report(JsonOut j, StudyReport report, Sensitivity run) {
        Study study = report.study();
        j.startObject().integer("format", StudyReport.FORMAT).text("study", study.name()).text("title", study.title())
                .text("revision", study.revision().isEmpty() ? null : study.revision())
                .text("date", study.date().isEmpty() ? null : study.date())
                .number("reference_voltage_kv", study.voltageKv()).number("frequency_hz", study.frequencyHz())
                .bool("pass", report.pass());
        j.startArray("checks");
        for (int i = 0; i < report.results().size(); i++) {
            check(j, report.results().get(i), report.notes().get(i), study.checks().get(i));
        }
        j.endArray().startArray("cables");
        for (Study.StudyCable c : study.cables()) {
            cable(j, c);
        }
        j.endArray().startArray("devices");
        for (Study.StudyDevice d : study.devices()) {
            device(j, d);
        }
        j.endArray();
        notes(j, "warnings", report.warnings());
        faults(j, study);
        j.startArray("accepted");
        study.network().ifPresent(n -> {
            for (Study.Accepted a : n.accepted()) {
                j.startObject().text("upstream", a.upstream()).text("downstream", a.downstream())
                        .text("reason", a.reason()).endObject();
            }
        });
        j.endArray();
        if (run != null) {
            j.startObject("sensitivity").number("min_factor", run.minFactor()).number("max_factor", run.maxFactor())
                    .startArray("flips");
            for (int i : run.flips()) {
                CheckResult w = run.widened().results().get(i);
                j.startObject().integer("check", i).bool("pass", w.pass()).text("reason", w.reason()).endObject();
            }
            j.endArray().endObject();
        }
        j.endObject();
    }

    private static void check(JsonOut j, CheckResult result, StudyReport.CheckNotes notes, Study.StudyCheck spec) {
        if (result instanceof CableCheckResult c) {
            cableCheck(j, c);
            Study.CableCheckSpec cs = spec instanceof Study.CableCheckSpec x ? x : null;
            j.bool("derived", cs != null && cs.derived())
                    .text("fault_case", cs == null || cs.faultCase().isEmpty() ? null : cs.faultCase());
        } else if (result instanceof GradingCheckResult g) {
            gradingCheck(j, g);
            Study.GradingCheckSpec gs = spec instanceof Study.GradingCheckSpec x ? x : null;
            j.bool("derived", gs != null && gs.derived())
                    .text("fault_case", gs == null || gs.faultCase().isEmpty() ? null : gs.faultCase());
        }
        notes(j, "assumptions", notes.assumptions());
        notes(j, "warnings", notes.warnings());
        j.endObject();
    }

    private static void notes(JsonOut j, String key, List<Note> notes) {
        j.startArray(key);
        for (Note n : notes) {
            j.startObject().text("code", n.code()).text("message", n.message()).endObject();
        }
        j.endArray();
    }

    private static void cableCheck(JsonOut j, CableCheckResult r) {
        j.startObject().text("kind", "cable").text("device", r.device()).text("cable", r.cable()).bool("pass", r.pass());
        if (r.requirement() instanceof MarginRequirement.Seconds s) {
            j.number("required_margin_s", s.seconds());
        } else if (r.requirement() instanceof MarginRequirement.Ratio ratio) {
            j.number("required_ratio", ratio.ratio());
        }
        j.pair("range_a", r.fromAmps(), r.toAmps()).number("min_margin_s", r.minMarginSeconds())
                .number("min_margin_at_a", r.minMarginAtAmps())
                .text("min_margin_side", Double.isNaN(r.minMarginSeconds()) ? null : r.minMarginSide().key())
                .number("min_ratio", r.minRatio()).number("min_ratio_at_a", r.minRatioAtAmps())
                .numbers("crossings_a", r.crossingsAmps());
        span(j, "not_cleared_a", r.notClearedFromAmps(), r.notClearedToAmps());
        span(j, "undefined_a", r.undefinedFromAmps(), r.undefinedToAmps());
        j.startArray("methods");
        for (ThermalRegion region : r.regions()) {
            j.startObject().number("from_a", region.fromAmps()).number("to_a", region.toAmps())
                    .text("method", region.method()).endObject();
        }
        j.endArray().text("reason", r.reason());
    }

    private static void gradingCheck(JsonOut j, GradingCheckResult r) {
        j.startObject().text("kind", "grading").text("upstream", r.upstream()).text("downstream", r.downstream())
                .bool("pass", r.pass()).pair("range_a", r.fromAmps(), r.toAmps())
                .number("required_s", r.requiredSeconds());
        if (r.requirement() instanceof GradingRequirement.Interval) {
            j.text("interval_to", r.toOperatingTime() ? "operating-time" : "clearing-time");
        }
        if (r.requirement() instanceof GradingRequirement.RatingRatio ratio) {
            j.number("required_rating_ratio", ratio.ratio()).number("rating_ratio", r.ratingRatio());
        }
        if (r.requirement() instanceof GradingRequirement.NoOverlap) {
            j.bool("required_no_overlap", true);
        }
        j.number("min_interval_s", r.minIntervalSeconds()).number("min_interval_at_a", r.minIntervalAtAmps())
                .text("min_interval_side", Double.isNaN(r.minIntervalAtAmps()) ? null : r.minIntervalSide().key())
                .numbers("crossings_a", r.crossingsAmps());
        span(j, "energy_a", r.energyFromAmps(), r.energyToAmps());
        j.number("min_energy_ratio", r.minEnergyRatio()).number("min_energy_ratio_at_a", r.minEnergyRatioAtAmps());
        span(j, "undefined_a", r.undefinedFromAmps(), r.undefinedToAmps());
        j.text("reason", r.reason());
    }

    private static void span(JsonOut j, String key, double from, double to) {
        if (Double.isNaN(from)) {
            j.nullValue(key);
        } else {
            j.pair(key, from, to);
        }
    }

    private static void cable(JsonOut j, Study.StudyCable c) {
        CableThermalLimit l = c.limit();
        j.startObject().text("id", l.id()).text("conductor", l.material().key()).text("insulation", l.insulation().key())
                .text("size", c.sizeText()).number("size_mm2", l.sizeMm2()).integer("parallel", l.parallel())
                .number("initial_c", l.initialCelsius()).number("final_c", l.finalCelsius())
                .text("method", l.method().key()).number("k", l.k()).number("i2t_a2s", l.i2tA2s())
                .number("withstand_0_1s_a", l.withstandAmps(0.1)).number("withstand_1s_a", l.withstandAmps(1.0))
                .number("withstand_5s_a", l.withstandAmps(5.0));
        if (c.fault().isPresent()) {
            j.pair("fault_a", c.fault().get().fromAmps(), c.fault().get().toAmps());
        } else {
            j.nullValue("fault_a");
        }
        j.endObject();
    }

    // -------------------------------------------------------------------------------------- devices

    private static void device(JsonOut j, Study.StudyDevice d) {
        ProtectiveDevice device = d.device();
        double f = d.referralFactor();
        j.startObject().text("id", d.id()).text("kind", device.kind().key()).number("voltage_kv", d.voltageKv())
                .number("referral_factor", f);
        if (device instanceof Relay relay) {
            j.number("breaker_s", relay.breakerSeconds());
            if (relay.tolerance().isNone()) {
                j.nullValue("tolerance");
            } else {
                j.startObject("tolerance").number("time_fraction", relay.tolerance().timeFraction())
                        .number("time_min_s", relay.tolerance().timeMinSeconds())
                        .number("pickup_fraction", relay.tolerance().pickupFraction()).endObject();
            }
            if (relay.currentTransformer().isPresent()) {
                j.pair("ct_a", relay.currentTransformer().get().primaryAmps(),
                        relay.currentTransformer().get().secondaryAmps());
            } else {
                j.nullValue("ct_a");
            }
            j.startArray("stages");
            for (TimeCurrentCurve s : relay.stages()) {
                stage(j, s, relay.ctRatio(), f);
            }
            j.endArray();
        } else if (device instanceof Fuse fuse) {
            j.number("rating_a", fuse.ratingAmps())
                    .integer("melting_points", fuse.minimumCurve().amps().length)
                    .integer("clearing_points", fuse.maximumCurve().amps().length)
                    .text("category", fuse.category().orElse(null)).text("series", fuse.series().orElse(null));
            energy(j, "let_through", fuse.letThrough());
            energy(j, "pre_arcing", fuse.preArcing());
        } else if (device instanceof TripUnitBreaker breaker) {
            TripUnitBreaker.Settings s = breaker.settings();
            j.number("ir_a", s.irAmps()).number("ir_referred_a", s.irAmps() * f).number("tr_s", s.trSeconds())
                    .number("isd_a", s.isdAmps()).number("isd_referred_a", s.isdAmps() * f)
                    .number("tsd_s", Double.isFinite(s.isdAmps()) ? s.tsdSeconds() : Double.NaN)
                    .bool("tsd_i2t", s.shortTimeI2t()).number("ii_a", s.iiAmps()).number("ii_referred_a", s.iiAmps() * f)
                    .number("pickup_tolerance", s.pickupTolerance()).number("time_tolerance", s.timeTolerance())
                    .pair("long_time_band", s.longTimeLowMultiple(), s.longTimeHighMultiple())
                    .pair("instantaneous_s", s.instantaneousMinSeconds(), s.instantaneousMaxSeconds());
        } else if (device instanceof MiniatureBreaker mcb) {
            j.text("curve_type", mcb.type().name()).number("rating_a", mcb.ratedAmps())
                    .number("rating_referred_a", mcb.ratedAmps() * f).number("fastest_s", mcb.fastestSeconds())
                    .number("let_through_from_a", mcb.letThroughFromAmps());
            energy(j, "let_through", mcb.letThrough());
        }
        j.endObject();
    }

    private static void stage(JsonOut j, TimeCurrentCurve s, double ctRatio, double factor) {
        j.startObject();
        if (s instanceof InverseTimeStage inv) {
            j.text("curve", inv.label());
            pickups(j, inv.pickupAmps(), ctRatio, factor);
            j.text("multiplier_kind", inv.multiplierKind().key()).number("multiplier", inv.multiplier())
                    .pair("multiplier_range", inv.multiplierRange().min(), inv.multiplierRange().max())
                    .text("high_current", inv.highCurrent().key()).number("upper_multiple", inv.upperMultiple());
        } else if (s instanceof DefiniteTimeStage dt) {
            j.text("curve", dt.instantaneous() ? "instantaneous" : "definite-time");
            pickups(j, dt.pickupAmps(), ctRatio, factor);
            j.number("delay_s", dt.delaySeconds()).number("fastest_delay_s", dt.fastestDelaySeconds());
        } else {
            j.text("curve", s.toString());
        }
        j.endObject();
    }

    private static void energy(JsonOut j, String key, java.util.Optional<LetThroughEnergy> e) {
        if (e.isEmpty()) {
            j.nullValue(key);
            return;
        }
        j.startObject(key);
        if (e.get().isConstant()) {
            j.number("constant_a2s", e.get().energiesA2s()[0]);
        } else {
            double[] a = e.get().amps();
            double[] w = e.get().energiesA2s();
            j.startArray("points_a_a2s");
            for (int i = 0; i < a.length; i++) {
                j.startArray().element(a[i]).element(w[i]).endArray();
            }
            j.endArray();
        }
        j.endObject();
    }

    private static void pickups(JsonOut j, double pickup, double ctRatio, double factor) {
        j.number("pickup_a", pickup).number("pickup_primary_a", pickup * ctRatio)
                .number("pickup_referred_a", pickup * ctRatio * factor);
    }

    // --------------------------------------------------------------------------------------- design

    private static void cableAid(JsonOut j, StudyDesign.CableAid a) {
        Study.CableCheckSpec spec = a.check();
        j.startObject().text("cable", spec.cable()).text("device", spec.device())
                .pair("range_a", spec.range().fromAmps(), spec.range().toAmps())
                .text("requirement", spec.requirement().toString());
        MinimumConductor.Result size = a.conductor();
        CableThermalLimit limit = a.cable().limit();
        j.startObject("conductor").text("now", a.cable().sizeText()).number("now_mm2", limit.sizeMm2())
                .integer("parallel", limit.parallel()).bool("per_conductor", limit.parallel() > 1)
                .number("smallest_mm2", size.sizeMm2())
                .number("next_iec_mm2", size.found() ? size.iecSizeMm2() : Double.NaN)
                .text("next_awg_kcmil", size.found() ? size.awgOrKcmil() : null)
                .text("binding", size.found() ? "the cable's margin" : null)
                .number("binding_at_a", !size.found() || size.check() == null ? Double.NaN
                        : size.check().requirement() instanceof MarginRequirement.Ratio ? size.check().minRatioAtAmps()
                        : size.check().minMarginAtAmps())
                .text("problem", size.reason())
                .endObject();
        if (a.stage().isPresent()) {
            StudyDesign.StageAid s = a.stage().get();
            StudyDesign.MultiplierAid m = s.multiplier();
            j.text("stage", s.stage().label());
            j.startObject("multiplier").text("kind", m.kind().key()).number("now", m.now())
                    .pair("range", m.range().min(), m.range().max()).number("step", m.range().step())
                    .number("largest", m.largest().orElse(Double.NaN))
                    .number("smallest_for_no_trip", m.smallest().orElse(Double.NaN))
                    .number("proposed", m.proposed().orElse(Double.NaN)).text("binding", m.binding().words())
                    .text("problem", m.problem().orElse(null)).endObject();
            StudyDesign.PickupAid p = s.pickup();
            double ct = p.ctRatio();
            j.startObject("pickup").text("unit", p.secondary() ? "A secondary" : "A").number("now", p.now())
                    .number("now_primary_a", p.now() * ct).number("step", p.step())
                    .number("largest", p.largest().orElse(Double.NaN))
                    .number("lowest_for_load", p.lowestForLoad().orElse(Double.NaN))
                    .number("proposed", p.proposed().orElse(Double.NaN))
                    .number("proposed_primary_a", p.proposed().orElse(Double.NaN) * ct)
                    .text("binding", p.binding().words()).text("problem", p.problem().orElse(null)).endObject();
        }
        j.endObject();
    }
}
