package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.not;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorSizes;
import coordination.core.margin.CableCheckResult;
import java.util.List;
import org.junit.jupiter.api.Test;

/** What a study's results rest on is said, and each method takes its own standard's defaults. */
class StudyNotesTest {
    private static final String FEEDER = """
            format: 1
            title: Feeder
            voltage_kv: 0.4
            cables:
              - {id: C1, conductor: copper, insulation: xlpe, size_mm2: 70, fault_ka: {min: 1.5, max: 18}}
            devices:
              - id: R1
                type: relay
                breaker_s: 0.05
                stages:
                  - {curve: iec-standard-inverse, pickup_a: 250, tms: 0.2}
                  - {curve: instantaneous, pickup_a: 10000}
              - id: R0
                type: relay
                stages:
                  - {curve: iec-standard-inverse, pickup_a: 600, tms: 0.4}
            checks:
              - {cable: C1, device: R1, margin_s: 0.1DC}
              - {upstream: R0, downstream: R1, interval_s: 0.3, range_ka: {min: 1.5, max: 7}}
            """;

    private static List<String> codes(List<Note> notes) {
        return notes.stream().map(Note::code).toList();
    }

    @Test
    void everyDefaultACheckRestsOnIsListed() {
        StudyReport r = StudyReport.evaluate(StudyReader.parse("f.yaml", "f", FEEDER.replace("DC", "")));
        List<String> cable = codes(r.notes().get(0).assumptions());
        assertThat(cable, is(List.of("initial-temperature-assumed", "final-temperature-assumed",
                "dc-offset-kappa-assumed", "relay-tolerance-not-stated", "instantaneous-time-assumed",
                "high-current-band")));
        assertThat(r.notes().get(0).assumptions().get(2).message(), is("κ 1.8 assumed for the DC-offset heating"
                + " (common practice); state dc_offset: {kappa} or {x_r}"));
    }

    @Test
    void statedKappaOrXOverRIsNoAssumption() {
        for (String dc : new String[] {", dc_offset: {kappa: 1.9}", ", dc_offset: {x_r: 8}"}) {
            StudyReport r = StudyReport.evaluate(StudyReader.parse("f.yaml", "f", FEEDER.replace("DC", dc)));
            assertThat(codes(r.notes().get(0).assumptions()), not(hasItem("dc-offset-kappa-assumed")));
        }
        StudyReport off = StudyReport.evaluate(StudyReader.parse("f.yaml", "f", FEEDER.replace("DC",
                ", dc_offset: none")));
        assertThat(codes(off.notes().get(0).assumptions()), hasItem("dc-offset-off"));
    }

    /** A grading range that stops at 7 kA while the cable below reaches 18 kA hides the top of the range. */
    @Test
    void aGradingRangeNarrowerThanTheCableBelowIsWarnedAbout() {
        StudyReport r = StudyReport.evaluate(StudyReader.parse("f.yaml", "f", FEEDER.replace("DC", "")));
        assertThat(r.notes().get(1).warnings(), is(List.of(new Note("grading-range-narrower", "the grading range 1.5"
                + " to 7 kA is narrower than the 1.5 to 18 kA of cable 'C1' below 'R1': selectivity outside it is not"
                + " checked"))));
        StudyReport wide = StudyReport.evaluate(StudyReader.parse("f.yaml", "f", FEEDER.replace("DC", "")
                .replace("max: 7}", "max: 18}")));
        assertThat(wide.notes().get(1).warnings(), is(List.of()));
    }

    /** The 1.6:1 rating rule holds for gG fuses of one series (common practice): elsewhere it is warned about. */
    @Test
    void aRatingRatioOutsideGgFusesOfOneSeriesIsWarnedAbout() throws Exception {
        String pair = java.nio.file.Files.readString(java.nio.file.Path.of("../spec/cases/valid/fuse-energies-by-points.yaml"));
        StudyReport same = StudyReport.evaluate(StudyReader.parse("p.yaml", "p", pair));
        assertThat(codes(same.notes().get(0).warnings()), not(hasItem("rating-ratio-outside-gg-series")));
        StudyReport other = StudyReport.evaluate(StudyReader.parse("p.yaml", "p", pair.replaceFirst("series: NH-A",
                "series: NH-B")));
        assertThat(codes(other.notes().get(0).warnings()), hasItem("rating-ratio-outside-gg-series"));
    }

    /**
     * ICEA P-32-382 takes 75 °C / 150 °C for thermoplastic insulation (from memory), not IEC's 70 / 160:
     * with its own equation, (I/A)² t = 0.0297 log10((T2 + 234) / (T1 + 234)), the I²t is about 16 % lower
     * than at IEC's temperatures, which the ICEA method once took.
     */
    @Test
    void iceaTakesItsOwnTemperaturesForPvc() {
        Study s = StudyReader.parse("i.yaml", "i", FEEDER.replace("DC", "").replace("insulation: xlpe",
                "insulation: pvc, method: icea"));
        CableThermalLimit icea = s.cable("C1").limit();
        assertThat(icea.initialCelsius(), is(75.0));
        assertThat(icea.finalCelsius(), is(150.0));
        double cmil = ConductorSizes.cmil(70);
        double i2t = 0.0297 * Math.log10((150 + 234.0) / (75 + 234.0)) * cmil * cmil;
        assertThat(icea.i2tA2s(), closeTo(i2t, i2t * 1e-12));
        double atIecTemperatures = 0.0297 * Math.log10((160 + 234.0) / (70 + 234.0)) * cmil * cmil;
        assertThat(1 - icea.i2tA2s() / atIecTemperatures, closeTo(0.16, 0.01));
    }

    /** The DC-offset heating at a stated κ keeps its value where it was applied before: below 0.1 s. */
    @Test
    void statedKappaKeepsTheEnergyRegionResult() throws Exception {
        String clarifier = java.nio.file.Files.readString(java.nio.file.Path.of("../samples/04-clarifier-kcmil.yaml"))
                .replace("{curve: instantaneous, pickup_a: 100}", "{curve: instantaneous, pickup_a: 100, delay_s: 0}");
        CableCheckResult r = (CableCheckResult) StudyReport.evaluate(StudyReader.parse("c.yaml", "c", clarifier))
                .results().get(0);
        // the value this check gave when DC-offset heating was applied below 0.1 s only
        assertThat(r.minMarginSeconds(), is(0.39776519174926045));
        assertThat(r.minMarginAtAmps(), is(25000.0));
    }

    /** Note's written-out equality is the record's: both parts, and a hash that agrees. */
    @Test
    void notesAreEqualByCodeAndMessage() {
        Note a = new Note("dc-offset-kappa-assumed", "κ 1.8 assumed");
        assertThat(a.equals(new Note("dc-offset-kappa-assumed", "κ 1.8 assumed")), is(true));
        assertThat(a.hashCode(), is(new Note("dc-offset-kappa-assumed", "κ 1.8 assumed").hashCode()));
        assertThat(a.equals(new Note("dc-offset-kappa-assumed", "κ 2 assumed")), is(false));
        assertThat(a.equals(new Note("other-code", "κ 1.8 assumed")), is(false));
        assertThat(a.equals(null), is(false));
        assertThat(List.of(a).contains(new Note("dc-offset-kappa-assumed", "κ 1.8 assumed")), is(true));
    }
}
