package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThan;
import static org.hamcrest.Matchers.not;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.curve.TripUnitBreaker;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Inputs that once flipped a verdict, forged an error line or stalled the reader. */
class HostileInputTest {
    private static final String BREAKER = """
            format: 1
            title: Trip unit with a ramp
            voltage_kv: 0.4
            devices:
              - {id: Q1, type: breaker, ir_a: 250, tr_s: 10, isd_a: 2500, tsd_s: 0.4, tsd_i2t: RAMP}
            """;

    private static List<String> problems(String yaml) {
        StudyFileException e = assertThrows(StudyFileException.class, () -> StudyReader.parse("h.yaml", "h", yaml));
        return e.problems().stream().map(Problem::toString).toList();
    }

    @Test
    void trueTurnsTheRampOn() {
        Study s = StudyReader.parse("h.yaml", "h", BREAKER.replace("RAMP", "true"));
        assertThat(((TripUnitBreaker) s.device("Q1").device()).settings().shortTimeI2t(), is(true));
    }

    /** YAML 1.1 reads these as booleans; Boolean.parseBoolean once turned every one of them into false. */
    @ParameterizedTest
    @ValueSource(strings = {"yes", "on", "Yes", "ON", "no", "off"})
    void yamlOneOneBooleanWordsAreRefusedNeverReadAsFalse(String word) {
        assertThat(problems(BREAKER.replace("RAMP", word)), contains(
                "h.yaml:5:84: devices[0].tsd_i2t: found '" + word + "' - write true or false"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"0250", "010", "0x1F", "1_000", "+0250"})
    void numbersThatYamlWouldNotReadAsDecimalAreRefused(String number) {
        String yaml = BREAKER.replace("tsd_i2t: RAMP", "tsd_i2t: true").replace("ir_a: 250", "ir_a: " + number);
        assertThat(problems(yaml), contains("h.yaml:5:35: devices[0].ir_a: found " + number + " - write numbers in"
                + " plain decimal, such as 250 or 0.25 (leading zeros, 0x, 0o, _ and : are refused: YAML would not"
                + " read them as decimal)"));
    }

    @Test
    void decimalFormsAreRead() {
        for (String n : new String[] {"250", "250.0", "2.5e2", "+250", "250."}) {
            Study s = StudyReader.parse("h.yaml", "h", BREAKER.replace("RAMP", "true").replace("ir_a: 250", "ir_a: " + n));
            assertThat(n, ((TripUnitBreaker) s.device("Q1").device()).settings().irAmps(), is(250.0));
        }
    }

    @Test
    void tagsAreRefused() {
        assertThat(problems(BREAKER.replace("RAMP", "true").replace("title: Trip unit with a ramp", "title: !!int 5")),
                contains("h.yaml:2:8: title: YAML tags (!!int) are not allowed in a study file - write the value"
                        + " plainly"));
    }

    @Test
    void aKeyWithALineBreakCannotPrintASecondErrorLine() {
        List<String> p = problems(BREAKER.replace("RAMP", "true").replace("voltage_kv: 0.4",
                "voltage_kv: 0.4\n\"x\\nh.yaml:1:1: forged\": 1"));
        assertThat(p, everyItem(not(containsString("\n"))));
        assertThat(p.get(0), is("h.yaml:4:1: x\\u000Ah.yaml:1:1: forged: the key holds the control character U+000A"
                + " - text in a study file is printable characters only"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"\\u0001", "\\e", "\\b", "\\t", "\\u001B[2J", "\\u202E", "\\u2066", "\\uFFFE", "\\x85"})
    void escapedControlAndBidiCharactersAreRefused(String escape) {
        List<String> p = problems(BREAKER.replace("RAMP", "true").replace("title: Trip unit with a ramp",
                "title: \"a" + escape + "b\""));
        assertThat(p, hasSize(1));
        assertThat(p.get(0), containsString("h.yaml:2:8: title: holds the "));
    }

    @Test
    void rawControlCharacterIsLocatedAtItsOwnLine() {
        assertThat(problems(BREAKER.replace("RAMP", "true").replace("ramp", "ramp \u0007")), contains(
                "h.yaml:2:30: the file holds the control character U+0007 - text in a study file is printable"
                        + " characters only"));
    }

    @Test
    void halfASurrogatePairIsRefused() {
        assertThat(problems(BREAKER.replace("RAMP", "true").replace("title: Trip unit with a ramp",
                "title: \"\\ud83d alone\"")), contains("h.yaml:2:9: the escape \\ud83d is half of a surrogate pair"
                        + " - write the character itself"));
    }

    @Test
    void printableEscapesEveryRefusedCharacterAndKeepsPairs() {
        assertEquals("a\\u000Ab\\u001B\\u202E\uD83D\uDE00", TextRules.printable("a\nb\u001B\u202E\uD83D\uDE00"));
        assertEquals("lone \\uD800", TextRules.printable("lone \uD800"));
    }

    /** A file with thirty thousand unknown keys: the work stays bounded, the report says how many more. */
    @Test
    void manyProblemsAreCappedAndCounted() {
        StringBuilder b = new StringBuilder("format: 1\ntitle: t\nvoltage_kv: 0.4\n");
        for (int i = 0; i < 30_000; i++) {
            b.append("unknown_").append(i).append(": 1\n");
        }
        List<String> p = problems(b.toString());
        assertThat(p, hasSize(Problems.SHOWN + 1));
        assertThat(p.get(Problems.SHOWN), is("h.yaml:104:1: and 29900 more problems - the first 100 are shown"));
    }

    /** Two hundred unknown references of 500 characters: short lines, a few known ids each. */
    @Test
    void longUnknownReferencesGiveShortLines() {
        StringBuilder b = new StringBuilder("format: 1\ntitle: t\nvoltage_kv: 0.4\ncables:\n");
        for (int i = 0; i < 200; i++) {
            b.append("  - {id: C").append(i).append(", conductor: copper, insulation: xlpe, size_mm2: 70,"
                    + " fault_ka: {min: 1, max: 2}}\n");
        }
        b.append("devices:\n  - {id: M, type: mcb, curve_type: B, rating_a: 16}\nchecks:\n");
        for (int i = 0; i < 200; i++) {
            b.append("  - {cable: ").append("y".repeat(499)).append(i % 10).append(", device: M}\n");
        }
        List<String> p = problems(b.toString());
        assertThat(p, hasSize(Problems.SHOWN + 1));
        for (String line : p) {
            assertThat(line.length(), lessThan(200));
        }
        assertThat(p.get(0), containsString("' - known: C0, C1, C10, C100, C101 and 195 more"));
    }

    @Test
    void idsLongerThanASheetCanShowAreRefused() {
        assertThat(problems(BREAKER.replace("RAMP", "true").replace("id: Q1", "id: " + "Q".repeat(41))), contains(
                "h.yaml:5:10: devices[0].id: found an id of 41 characters - ids are at most 40, so that sheets can"
                        + " show them whole"));
    }

    @Test
    void datesAndRevisionsHaveTheTextLimit() {
        String yaml = BREAKER.replace("RAMP", "true").replace("voltage_kv: 0.4",
                "voltage_kv: 0.4\ndate: \"" + "2".repeat(99_000) + "\"\nrevision: " + "r".repeat(501));
        assertThat(problems(yaml), contains("h.yaml:4:7: date: found text of 99000 characters - at most 500 are"
                + " accepted", "h.yaml:5:11: revision: found text of 501 characters - at most 500 are accepted"));
    }

    @Test
    void parserMessagesNameNoJavaClass() {
        assertThat(YamlTreeReader.oneLine("while scanning: com.fasterxml.jackson.core.JsonParseException: bad thing"),
                is("while scanning: bad thing"));
    }
}
