package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import coordination.core.network.FaultLevel;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/** A study's network gives its fault ranges and its checks; each derived check equals one written by hand. */
class NetworkStudyTest {
    /** Five buses: the grid's 11 kV, the main board, two distribution boards and a motor. */
    private static final String PLANT = """
            format: 1
            title: Five-bus plant
            voltage_kv: 0.4
            network:
              buses:
                - {id: HV, voltage_kv: 11}
                - {id: MSB, voltage_kv: 0.4}
              sources:
                - {id: GRID, bus: HV, sk_max_mva: 250, sk_min_mva: 150, x_r: 10}
              transformers:
                - {id: TX1, hv_bus: HV, lv_bus: MSB, sr_kva: 1000, uk_percent: 6, pk_kw: 10.5, vector_group: Dyn11}
            cables:
              - {id: C1, conductor: copper, insulation: xlpe, size_mm2: 95, from: MSB, to: DB1, length_m: 60}
              - {id: C2, conductor: copper, insulation: pvc, size_mm2: 16, from: DB1, to: M1, length_m: 40,
                 r_ohm_per_km: 1.15, x_ohm_per_km: 0.09}
              - {id: C3, conductor: copper, insulation: xlpe, size_mm2: 70, from: MSB, to: DB2, length_m: 120}
            devices:
              - id: HVR
                type: relay
                voltage_kv: 11
                breaker_s: 0.06
                branch: TX1
                stages:
                  - {curve: iec-extremely-inverse, pickup_a: 80, tms: 0.75}
                  - {curve: instantaneous, pickup_a: 1200, delay_s: 0.03}
              - {id: Q0, type: breaker, ir_a: 1600, tr_s: 3, isd_a: 4000, tsd_s: 0.3, branch: TX1, end: lv}
              - id: R1
                type: relay
                breaker_s: 0.05
                branch: C1
                stages:
                  - {curve: iec-standard-inverse, pickup_a: 300, tms: 0.3}
                  - {curve: definite-time, pickup_a: 2500, delay_s: 0.1}
              - id: F2
                type: fuse
                rating_a: 63
                branch: C2
                melting:  [[130, 1000], [200, 60], [300, 5], [500, 0.3], [800, 0.04], [1500, 0.008]]
                clearing: [[130, 1200], [200, 75], [300, 6.5], [500, 0.4], [800, 0.06], [1500, 0.012]]
                clearing_i2t: [[1.5, 27000], [10, 40000], [30, 50000]]
              - id: R3
                type: relay
                breaker_s: 0.05
                branch: C3
                stages:
                  - {curve: iec-very-inverse, pickup_a: 250, tms: 0.2}
                  - {curve: instantaneous, pickup_a: 6000}
            CHECKS
            """;

    private static Study plant(String checks) {
        return StudyReader.parse("plant.yaml", "plant", PLANT.replace("CHECKS", checks));
    }

    private static String ka(double amps) {
        return String.format(Locale.ROOT, "%.17g", amps / 1000);
    }

    @Test
    void theNetworkDerivesEveryCableAndEveryAdjacentPair() {
        Study s = plant("");
        List<String> derived = new ArrayList<>();
        for (Study.StudyCheck c : s.checks()) {
            if (c instanceof Study.CableCheckSpec cc) {
                assertThat(cc.derived(), is(true));
                derived.add(cc.device() + " protects " + cc.cable());
            } else if (c instanceof Study.GradingCheckSpec g) {
                assertThat(g.derived(), is(true));
                derived.add(g.downstream() + " under " + g.upstream() + (g.faultCase().isEmpty() ? ""
                        : " " + g.faultCase()));
            }
        }
        assertThat(derived, is(List.of("R1 protects C1", "F2 protects C2", "R3 protects C3",
                "Q0 under HVR three-phase", "Q0 under HVR phase-to-phase", "R1 under Q0", "F2 under R1",
                "R3 under Q0")));
    }

    @Test
    void derivedChecksEqualTheSameChecksWrittenByHandWithTheComputedRanges() {
        Study s = plant("");
        var levels = s.network().orElseThrow().levels();
        FaultLevel msb = levels.at("MSB").orElseThrow();
        FaultLevel db1 = levels.at("DB1").orElseThrow();
        FaultLevel m1 = levels.at("M1").orElseThrow();
        FaultLevel db2 = levels.at("DB2").orElseThrow();
        // cable: far-end Ik2 min to sending-end Ik3 max; pair: far end of the downstream branch to its bus
        String hand = "checks:\n"
                + "  - {cable: C1, device: R1, margin_s: 0, range_ka: {min: " + ka(db1.ik2MinAmps()) + ", max: "
                + ka(msb.ik3MaxAmps()) + "}, dc_offset: {kappa: " + msb.kappa() + "}}\n"
                + "  - {cable: C2, device: F2, margin_s: 0, range_ka: {min: " + ka(m1.ik2MinAmps()) + ", max: "
                + ka(db1.ik3MaxAmps()) + "}, dc_offset: {kappa: " + db1.kappa() + "}}\n"
                + "  - {upstream: Q0, downstream: R1, no_overlap: true, range_ka: {min: " + ka(db1.ik2MinAmps())
                + ", max: " + ka(msb.ik3MaxAmps()) + "}}\n"
                + "  - {upstream: R1, downstream: F2, interval_s: 0.2, range_ka: {min: " + ka(m1.ik2MinAmps())
                + ", max: " + ka(db1.ik3MaxAmps()) + "}}\n"
                + "  - {upstream: Q0, downstream: R3, no_overlap: true, range_ka: {min: " + ka(db2.ik2MinAmps())
                + ", max: " + ka(msb.ik3MaxAmps()) + "}}\n";
        StudyReport derived = StudyReport.evaluate(s);
        // the same plant with the checks written out: a written check replaces the derived one of its pair
        Study handStudy = plant(hand);
        StudyReport written = StudyReport.evaluate(handStudy);
        List<CheckResult> byHand = new ArrayList<>();
        for (int i = 0; i < handStudy.checks().size(); i++) {
            Study.StudyCheck c = handStudy.checks().get(i);
            if (c instanceof Study.CableCheckSpec cc && !cc.derived() || c instanceof Study.GradingCheckSpec g
                    && !g.derived()) {
                byHand.add(written.results().get(i));
            }
        }
        for (CheckResult h : byHand) {
            CheckResult d = derived.results().stream().filter(x -> same(x, h)).findFirst().orElseThrow();
            assertThat(h.toString(), d.pass(), is(h.pass()));
            if (h instanceof CableCheckResult hc) {
                CableCheckResult dc = (CableCheckResult) d;
                near(dc.minMarginSeconds(), hc.minMarginSeconds());
                assertThat(dc.fromAmps(), closeTo(hc.fromAmps(), 1e-6));
            } else {
                GradingCheckResult hg = (GradingCheckResult) h;
                GradingCheckResult dg = (GradingCheckResult) d;
                near(dg.minIntervalSeconds(), hg.minIntervalSeconds());
                assertThat(dg.reason(), is(hg.reason()));
                assertThat(dg.toAmps(), closeTo(hg.toAmps(), 1e-6));
            }
        }
        assertThat(byHand.size(), is(5));
    }

    private static void near(double derived, double written) {
        if (Double.isNaN(written)) {
            assertThat(Double.isNaN(derived), is(true));
        } else {
            assertThat(derived, closeTo(written, 1e-9));
        }
    }

    private static boolean same(CheckResult a, CheckResult b) {
        if (a instanceof CableCheckResult x && b instanceof CableCheckResult y) {
            return x.cable().equals(y.cable()) && x.device().equals(y.device());
        }
        if (a instanceof GradingCheckResult x && b instanceof GradingCheckResult y) {
            return x.upstream().equals(y.upstream()) && x.downstream().equals(y.downstream());
        }
        return false;
    }

    @Test
    void aPhaseToPhaseFaultBehindADeltaStarTransformerFeedsTheHvRelayTwoOverRootThree() {
        Study s = plant("");
        Study.GradingCheckSpec pp = s.checks().stream().filter(c -> c instanceof Study.GradingCheckSpec g
                && g.faultCase().equals("phase-to-phase")).map(c -> (Study.GradingCheckSpec) c).findFirst().orElseThrow();
        FaultLevel msb = s.network().orElseThrow().levels().at("MSB").orElseThrow();
        assertThat(pp.range().toAmps(), closeTo(Math.sqrt(3) / 2 * msb.ik3MaxAmps(), 1e-6));
        assertThat(pp.range().fromAmps(), closeTo(msb.ik2MinAmps(), 1e-6));
        int index = s.checks().indexOf(pp);
        GradingCheckResult r = (GradingCheckResult) StudyReport.evaluate(s).results().get(index);
        // the HV relay at 2/sqrt 3 of the LV current: its curve on the LV axis moves down by sqrt 3 / 2
        GradingCheckResult direct = GradingCheck.check(s.device("HVR").referred().referredBy(Math.sqrt(3) / 2),
                s.device("Q0").referred(), pp.range().fromAmps(), pp.range().toAmps(), pp.requirement());
        assertThat(r.minIntervalSeconds(), closeTo(direct.minIntervalSeconds(), 1e-12));
        // relay over breaker: 0.2 s (common practice)
        assertThat(pp.requirement().toString(), is("0.2 s"));
    }

    @Test
    void aWrittenCheckOverridesTheDerivedOneAndTakesItsRange() {
        Study s = plant("checks:\n  - {upstream: R1, downstream: F2, interval_s: 0.4}\n"
                + "  - accept: {upstream: Q0, downstream: R3, reason: the feeder is sacrificed for the board}\n");
        List<Study.GradingCheckSpec> r1f2 = s.checks().stream().filter(c -> c instanceof Study.GradingCheckSpec g
                && g.upstream().equals("R1")).map(c -> (Study.GradingCheckSpec) c).toList();
        assertThat(r1f2.size(), is(1));
        assertThat(r1f2.get(0).derived(), is(false));
        assertThat(r1f2.get(0).requirement().toString(), is("0.4 s"));
        FaultLevel db1 = s.network().orElseThrow().levels().at("DB1").orElseThrow();
        assertThat(r1f2.get(0).range().toAmps(), closeTo(db1.ik3MaxAmps(), 1e-9));
        assertThat(s.checks().stream().anyMatch(c -> c instanceof Study.GradingCheckSpec g
                && g.downstream().equals("R3")), is(false));
        assertThat(s.network().orElseThrow().accepted().get(0).reason(), is("the feeder is sacrificed for the board"));
        assertThat(ReportWriter.write(StudyReport.evaluate(s)), containsString("\"reason\" : \"the feeder is"
                + " sacrificed for the board\""));
    }

    @Test
    void aFaultInsideOneOfParallelConductorsIsCheckedAtItsWorstPosition() {
        // IEC 60364-4-43, 434.4: fed from both ends, the faulted conductor carries more than 1/n
        Study s = plant("").withFaultFactors(1, 1);
        Study two = StudyReader.parse("p.yaml", "p", PLANT.replace("CHECKS", "").replace(
                "{id: C3, conductor: copper, insulation: xlpe, size_mm2: 70,",
                "{id: C3, conductor: copper, insulation: xlpe, size_mm2: 35, parallel: 2,"));
        Study.CableCheckSpec worst = two.checks().stream().filter(c -> c instanceof Study.CableCheckSpec cc
                && !cc.faultCase().isEmpty()).map(c -> (Study.CableCheckSpec) c).findFirst().orElseThrow();
        assertThat(worst.faultCase(), containsString("one of 2 parallel conductors"));
        assertThat(worst.conductorShare() > 0.5, is(true));
        // the whole group sees no more than the bus's I"k3 max; the faulted conductor carries more than half of it
        FaultLevel msb = two.network().orElseThrow().levels().at("MSB").orElseThrow();
        assertThat(worst.range().toAmps() <= msb.ik3MaxAmps() * (1 + 1e-9), is(true));
        // the worst position is no better than equal sharing, checked on the same device and range rules
        StudyReport r = StudyReport.evaluate(two);
        CableCheckResult whole = (CableCheckResult) r.results().get(two.checks().indexOf(two.checks().stream()
                .filter(c -> c instanceof Study.CableCheckSpec cc && cc.cable().equals("C3") && cc.faultCase().isEmpty())
                .findFirst().orElseThrow()));
        CableCheckResult one = (CableCheckResult) r.results().get(two.checks().indexOf(worst));
        assertThat(one.minMarginSeconds() <= whole.minMarginSeconds(), is(true));
        assertThat(s.checks().stream().noneMatch(c -> c instanceof Study.CableCheckSpec cc
                && !cc.faultCase().isEmpty()), is(true));
    }

    @Test
    void theCurrentDivisionInParallelConductorsIsTheCircuitsOwn() {
        // IEC 60364-4-43, 434.4; solved here independently as a circuit: n conductors of impedance 1
        // between S (at 1 V) and F, the fault P at x on the first; KCL at F gives its voltage
        for (int n = 2; n <= 5; n++) {
            for (int i = 1; i < 10; i++) {
                double x = i / 10.0;
                double vf = (n - 1) / ((n - 1) + 1 / (1 - x));
                double near = 1 / x;
                double far = vf / (1 - x);
                double[] split = Derivation.parallelFault(n, x);
                assertThat(split[0], closeTo(Math.max(near, far) / (near + far), 1e-12));
                assertThat(split[1], closeTo(1 / (near + far), 1e-12));
            }
            // at the sending end the faulted conductor carries it all, through no impedance
            assertThat(Derivation.parallelFault(n, 0)[0], closeTo(1, 1e-15));
            assertThat(Derivation.parallelFault(n, 0)[1], closeTo(0, 1e-15));
        }
    }

    private static List<String> problems(String yaml) {
        StudyFileException e = assertThrows(StudyFileException.class, () -> StudyReader.parse("bad.yaml", "bad", yaml));
        return e.problems().stream().map(Problem::toString).toList();
    }

    @Test
    void badNetworksGetOneLocatedErrorEach() {
        assertThat(problems(PLANT.replace("CHECKS", "").replace("{id: GRID, bus: HV,", "{id: GRID, bus: HX,")),
                hasItem("bad.yaml:9:23: network.sources[0].bus: bus 'HX' is not declared"));
        assertThat(problems(PLANT.replace("CHECKS", "").replace("branch: C3", "branch: C9")),
                hasItem(containsString("devices[4].branch: no cable or transformer is called 'C9'")));
        assertThat(problems(PLANT.replace("CHECKS", "").replace("from: MSB, to: DB2", "from: DB1, to: MSB")).get(0),
                containsString("meshed networks are not supported yet"));
        assertThat(problems(PLANT.replace("CHECKS", "").replace("- {id: HV, voltage_kv: 11}",
                "- {id: HV, voltage_kv: 0.23}")).get(0), containsString("must have the higher voltage"));
        assertThat(problems(PLANT.replace("CHECKS", "").replace("sources:\n",
                "sources:\n    - {id: G2, bus: MSB, sk_max_mva: 20, sk_min_mva: 10, x_r: 5}\n")).get(0),
                containsString("feed one radial network"));
        assertThat(problems(PLANT.replace("CHECKS", "checks:\n  - accept: {upstream: HVR, downstream: F2, reason: x}\n"))
                .get(0), containsString("is not a pair the network derives"));
        assertThat(problems(PLANT.replace("CHECKS", "").replace("end: lv", "end: top")).get(0),
                containsString("devices[1].end: found 'top' - write hv or lv for a transformer"));
    }
}
