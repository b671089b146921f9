package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.curve.Relay;
import java.util.List;
import org.junit.jupiter.api.Test;

class StudyReaderTest {
    static final String VALID = """
            format: 1
            title: Example works - feeder F7
            voltage_kv: 0.4
            frequency_hz: 50
            cables:
              - id: F7-cable
                conductor: copper
                insulation: xlpe
                size_mm2: 70
                fault_ka: {min: 1.5, max: 12}
            devices:
              - id: F7-relay
                type: relay
                breaker_s: 0.05
                stages:
                  - {curve: iec-standard-inverse, pickup_a: 250, tms: 0.2}
                  - {curve: definite-time, pickup_a: 3000, delay_s: 0.1}
                  - {curve: instantaneous, pickup_a: 10000}
              - id: F0-relay
                type: relay
                stages:
                  - {curve: ieee-very-inverse, pickup_a: 600, time_dial: 2}
            checks:
              - {cable: F7-cable, device: F7-relay, margin_s: 0.1}
              - {upstream: F0-relay, downstream: F7-relay, interval_s: 0.3, range_ka: {min: 1.5, max: 12}}
            """;

    static List<String> problems(String yaml) {
        StudyFileException e = assertThrows(StudyFileException.class, () -> StudyReader.parse("study.yaml", "study", yaml));
        return e.problems().stream().map(Problem::toString).toList();
    }

    @Test
    void readsTheIssueExample() {
        Study s = StudyReader.parse("study.yaml", "study", VALID);
        assertThat(s.title(), is("Example works - feeder F7"));
        assertThat(s.cable("F7-cable").fault().orElseThrow().fromAmps(), is(1500.0));
        assertThat(s.cable("F7-cable").limit().k(), closeTo(143.08, 0.01));
        assertThat(((Relay) s.device("F7-relay").device()).breakerSeconds(), is(0.05));
        assertThat(s.checks().size(), is(2));
    }

    @Test
    void unknownKeyIsReportedWithASuggestion() {
        assertThat(problems(VALID.replace("pickup_a: 250", "pickup: 250")), contains(
                "study.yaml:16:9: devices[0].stages[0].pickup_a: missing",
                "study.yaml:16:39: devices[0].stages[0].pickup: unknown key - did you mean 'pickup_a'?"));
    }

    @Test
    void textWhereANumberBelongs() {
        assertThat(problems(VALID.replace("pickup_a: 3000", "pickup_a: abc")), contains(
                "study.yaml:17:42: devices[0].stages[1].pickup_a: expected a number, found 'abc'"));
    }

    @Test
    void duplicateKeyIsAnError() {
        assertThat(problems(VALID.replace("    size_mm2: 70\n", "    size_mm2: 70\n    size_mm2: 95\n")), contains(
                "study.yaml:10:5: cables[0].size_mm2: duplicate key - already given at line 9"));
    }

    @Test
    void fuseCurveThatRisesNamesThePoints() {
        String fuse = VALID.replace("""
                  - id: F0-relay
                """, """
                  - id: F9-fuse
                    type: fuse
                    rating_a: 160
                    melting: [[320, 600], [500, 20], [800, 1]]
                    clearing: [[320, 650], [500, 23], [800, 30]]
                  - id: F0-relay
                """);
        assertThat(problems(fuse), contains("study.yaml:23:39: devices[1].clearing[2]: fuse 'F9-fuse': clearing:"
                + " time rises from 23 s at 500 A to 30 s at 800 A; times must fall as current rises"));
    }

    @Test
    void initialTemperatureAboveFinal() {
        assertThat(problems(VALID.replace("    size_mm2: 70\n", "    size_mm2: 70\n    initial_c: 260\n")), contains(
                "study.yaml:10:16: cables[0].initial_c: initial temperature 260 °C is not below the final"
                        + " temperature 250 °C - the initial temperature must be below the final one"));
    }

    @Test
    void checkNamingAnUnknownDevice() {
        assertThat(problems(VALID.replace("device: F7-relay, margin_s", "device: F7-rely, margin_s")), contains(
                "study.yaml:24:31: checks[0].device: no device has the id 'F7-rely' - did you mean 'F7-relay'?"));
    }

    @Test
    void aliasesAndAnchorsAreRefused() {
        String yaml = VALID.replace("fault_ka: {min: 1.5, max: 12}", "fault_ka: &range {min: 1.5, max: 12}")
                .replace("range_ka: {min: 1.5, max: 12}", "range_ka: *range");
        assertThat(problems(yaml), contains(
                "study.yaml:10:15: cables[0].fault_ka: YAML anchors (&range) are not allowed in a study file"
                        + " - write each value out",
                "study.yaml:25:75: checks[1].range_ka: YAML aliases (*range) are not allowed in a study file"
                        + " - write the value out"));
    }

    @Test
    void allProblemsOfAFileAreReportedAtOnce() {
        String yaml = VALID.replace("voltage_kv: 0.4", "voltage_kv: -1").replace("insulation: xlpe", "insulation: cotton")
                .replace("tms: 0.2", "tms: 0");
        assertThat(problems(yaml), contains(
                "study.yaml:3:13: voltage_kv: found -1 kV - must be above 0 and at most 1000 kV",
                "study.yaml:8:17: cables[0].insulation: found 'cotton' - must be one of pvc, pvc-90, xlpe, epr,"
                        + " rubber-60, mineral-pvc, mineral-bare, paper",
                "study.yaml:16:59: devices[0].stages[0].tms: found 0 - must be above 0 and at most 100"));
    }

    @Test
    void wrongMultiplierNameForTheFamily() {
        assertThat(problems(VALID.replace("time_dial: 2", "tms: 2")), contains(
                "study.yaml:22:9: devices[1].stages[0].time_dial: missing",
                "study.yaml:22:51: devices[1].stages[0].tms: ieee-very-inverse is set by time_dial, not tms"));
    }

    @Test
    void syntaxErrorHasALocation() {
        List<String> p = problems("format: 1\ntitle: [unclosed\n");
        assertThat(p.size(), is(1));
        assertThat(p.get(0), is("study.yaml:2:17: not valid YAML: while parsing a flow sequence:"
                + " expected ',' or ']', but got <stream end>"));
    }

    @Test
    void emptyFileIsRefused() {
        assertThat(problems(""), contains("study.yaml:1:1: the file is empty - a study needs at least format, title,"
                + " voltage_kv, cables, devices and checks"));
    }

    @Test
    void sizesInCircularMilsAreRead() {
        Study s = StudyReader.parse("study.yaml", "study", VALID.replace("size_mm2: 70", "size: \"4/0 AWG\""));
        assertThat(s.cable("F7-cable").limit().sizeMm2(), closeTo(107.2, 0.05));
        assertThat(s.cable("F7-cable").sizeText(), is("4/0 AWG"));
    }

    @Test
    void deviceOnAnotherVoltageIsReferredToTheReference() {
        Study s = StudyReader.parse("study.yaml", "study", VALID.replace("  - id: F0-relay\n    type: relay\n",
                "  - id: F0-relay\n    type: relay\n    voltage_kv: 11\n"));
        // 600 A at 11 kV is 16.5 kA at 0.4 kV
        assertThat(s.device("F0-relay").referred().maximumCurve().breakpointsAmps()[0], closeTo(16500, 1e-9));
    }
}
