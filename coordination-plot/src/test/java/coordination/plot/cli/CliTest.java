package coordination.plot.cli;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CliTest {
    private static final Path SAMPLES = Path.of("../samples");

    static InProcess.Run run(String... args) {
        return InProcess.run(args);
    }

    static List<String> files(Path dir) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void checkExitsZeroWhenAllPass() {
        InProcess.Run r = run("check", SAMPLES.resolve("01-main-switchboard-incomer.yaml").toString());
        assertThat(r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("01-main-switchboard-incomer: Riverside WTW - main switchboard, pump house"
                + " feeder P1 - PASS"));
    }

    @Test
    void checkExitsOneWhenACheckFails() {
        InProcess.Run r = run("check", SAMPLES.toString());
        assertThat(r.code(), is(ExitCodes.CHECK_FAILED));
        assertThat(r.out(), containsString("FAIL  cable    B5-relay protects B5-cable"));
    }

    @Test
    void checkJsonPrintsTheReport() {
        InProcess.Run r = run("check", "--json", SAMPLES.resolve("05-blower-feeder-undersized.yaml").toString());
        assertThat(r.code(), is(ExitCodes.CHECK_FAILED));
        assertThat(r.out(), containsString("\"kind\" : \"cable\""));
        assertThat(r.out(), containsString("\"crossings_a\" : [\n        4125.28"));
    }

    @Test
    void badStudyExitsTwoWithLocatedErrorsAndWritesNothing(@TempDir Path tmp) throws Exception {
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, Files.readString(SAMPLES.resolve("05-blower-feeder-undersized.yaml"))
                .replace("pickup_a: 160,", "pickup_a: lots,"));
        Path out = tmp.resolve("out");
        InProcess.Run r = run("sheet", bad.toString(), "-o", out.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertEquals(bad + ":27:45: devices[0].stages[0].pickup_a: expected a number, found 'lots'\n", r.err());
        assertThat(Files.exists(out) ? files(out).size() : 0, is(0));
    }

    @Test
    void existingSheetsSurviveAFailedRun(@TempDir Path tmp) throws Exception {
        Path out = tmp.resolve("out");
        Path good = tmp.resolve("feeder.yaml");
        Files.copy(SAMPLES.resolve("05-blower-feeder-undersized.yaml"), good);
        assertThat(run("sheet", good.toString(), "-o", out.toString(), "--format", "svg,png").code(),
                is(ExitCodes.CHECK_FAILED));
        byte[] before = Files.readAllBytes(out.resolve("feeder.png"));
        Files.writeString(good, "format: 1\ntitle: [broken\n");
        assertThat(run("sheet", good.toString(), "-o", out.toString(), "--format", "svg,png").code(),
                is(ExitCodes.BAD_INPUT));
        assertThat("feeder.png was changed by the failed run", java.util.Arrays.equals(before, Files.readAllBytes(out.resolve("feeder.png"))), is(true));
        assertThat(files(out), is(List.of("feeder.png", "feeder.report.json", "feeder.svg")));
    }

    @Test
    void sheetWritesSheetsAndReportsForAFolder(@TempDir Path tmp) throws Exception {
        InProcess.Run r = run("sheet", SAMPLES.toString(), "-o", tmp.toString(), "--format", "svg,png,pdf");
        assertThat(r.code(), is(ExitCodes.CHECK_FAILED));
        // the network study adds a sheet per path: two paths in three formats
        assertThat(r.out(), containsString("sheets: 7 studies, 6 pass, 1 fail, 0 not read; 34 files in"));
        assertThat(files(tmp).size(), is(34));
    }

    @Test
    void aSheetIsSvgUnlessAskedOtherwise(@TempDir Path tmp) throws Exception {
        InProcess.Run r = run("sheet", SAMPLES.toString(), "-o", tmp.toString());
        assertThat(r.code(), is(ExitCodes.CHECK_FAILED));
        // nine sheets (the network study draws two paths besides its summary) and seven reports
        assertThat(r.out(), containsString("sheets: 7 studies, 6 pass, 1 fail, 0 not read; 16 files in"));
        assertThat(files(tmp).stream().filter(f -> !f.endsWith(".svg") && !f.endsWith(".report.json")).toList(),
                is(List.of()));
    }

    @Test
    void unknownOptionIsAUsageError() {
        InProcess.Run r = run("check", "--jsn", SAMPLES.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString("coordination: Unknown option: '--jsn'"));
    }

    @Test
    void missingFileIsAnInputError() {
        InProcess.Run r = run("check", "no-such-study.yaml");
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertEquals("no-such-study.yaml: no such study file or folder\n", r.err());
    }

    @Test
    void withstandOfCopperXlpe70SquareMillimetresForOneSecond() {
        // common practice: k = 143 for copper XLPE 90 to 250 C; I = kS/sqrt(t) = 143.08 x 70 = 10.02 kA
        InProcess.Run r = run("withstand", "--conductor", "copper", "--insulation", "xlpe", "--size", "70", "--time", "1");
        assertThat(r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("70 mm²         143.1      90-250    10.02"));
    }

    @Test
    void withstandRefusesAnUnknownInsulation() {
        InProcess.Run r = run("withstand", "--conductor", "copper", "--insulation", "cotton");
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertEquals("coordination withstand: --insulation: found 'cotton' - must be one of pvc, pvc-90, xlpe, epr,"
                + " rubber-60, mineral-pvc, mineral-bare, paper\n", r.err());
    }

    @Test
    void helpAndVersionAnswer() {
        assertThat(run("--help").code(), is(0));
        assertThat(run("sheet", "--help").out(), containsString("-o, --output=OUTDIR"));
        assertThat(run("--version").out(), containsString("coordination"));
    }

    @Test
    void idsWithSlashesNeverSteerWritesOutsideTheFolder(@TempDir Path tmp) throws Exception {
        Path study = tmp.resolve("..%2F..%2Fescape.yaml");
        Files.copy(SAMPLES.resolve("02-filter-house-fuse.yaml"), study);
        Path out = tmp.resolve("out");
        assertThat(run("sheet", study.toString(), "-o", out.toString()).code(), is(ExitCodes.PASS));
        assertThat(files(out), is(List.of("..%2F..%2Fescape.report.json", "..%2F..%2Fescape.svg").stream().map(coordination.plot.sheet.SheetWriter::safeName).toList()));
    }

    @Test
    void aBlockedTargetLeavesTheExistingSheetsAsTheyWere(@TempDir Path tmp) throws Exception {
        Path out = tmp.resolve("out");
        Path study = tmp.resolve("feeder.yaml");
        Files.copy(SAMPLES.resolve("02-filter-house-fuse.yaml"), study);
        assertThat(run("sheet", study.toString(), "-o", out.toString()).code(), is(ExitCodes.PASS));
        byte[] svg = Files.readAllBytes(out.resolve("feeder.svg"));
        // a new revision of the study, whose report cannot be written: a folder holds its name
        Files.writeString(study, Files.readString(study).replace("revision: A", "revision: B"));
        Files.delete(out.resolve("feeder.report.json"));
        Files.createDirectory(out.resolve("feeder.report.json"));
        InProcess.Run r = run("sheet", study.toString(), "-o", out.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString("feeder.report.json is a folder or a link - it is not replaced"));
        assertThat("feeder.svg was changed by the failed run", java.util.Arrays.equals(svg, Files.readAllBytes(out.resolve("feeder.svg"))), is(true));
        assertThat(files(out), is(List.of("feeder.report.json", "feeder.svg")));
    }

    @Test
    void anOutputPathThatIsAFileIsRefused(@TempDir Path tmp) throws Exception {
        Path out = tmp.resolve("taken");
        Files.writeString(out, "not a folder");
        InProcess.Run r = run("sheet", SAMPLES.resolve("02-filter-house-fuse.yaml").toString(), "-o", out.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString("cannot write to " + out + ": it is a file, not a folder"));
        assertThat(Files.readString(out), is("not a folder"));
    }

    @Test
    void aBadStudyAmongGoodOnesStopsOnlyItself(@TempDir Path tmp) throws Exception {
        Path in = tmp.resolve("in");
        Files.createDirectories(in);
        Files.copy(SAMPLES.resolve("02-filter-house-fuse.yaml"), in.resolve("good.yaml"));
        Files.writeString(in.resolve("bad.yaml"), "format: 1\ntitle: x\nvoltage_kv: [\n");
        byte[] before = Files.readAllBytes(in.resolve("good.yaml"));
        Path out = tmp.resolve("out");
        InProcess.Run r = run("sheet", in.toString(), "-o", out.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(files(out), is(List.of("good.report.json", "good.svg")));
        // the user's study files are never touched
        assertThat("the study file good.yaml was changed", java.util.Arrays.equals(before, Files.readAllBytes(in.resolve("good.yaml"))), is(true));
    }

    @Test
    void controlCharactersInAFileNameAreRefusedAndNothingIsWritten(@TempDir Path tmp) throws Exception {
        Path study = tmp.resolve("line\nbreak\tand\u0007bell.yaml");
        Files.copy(SAMPLES.resolve("02-filter-house-fuse.yaml"), study);
        Path out = tmp.resolve("out");
        InProcess.Run r = run("sheet", study.toString(), "-o", out.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.err(), containsString("line\\u000Abreak\\u0009and\\u0007bell.yaml:1:1: the file name holds the"
                + " control character U+000A"));
        assertThat(Files.exists(out) ? files(out) : List.of(), is(List.of()));
    }

    @Test
    void designProposesSizesSettingsAndGrading() {
        InProcess.Run r = run("design", SAMPLES.resolve("01-main-switchboard-incomer.yaml").toString());
        assertThat(r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("conductor: now 95 mm², smallest 56.3 mm² (the cable's margin at 18 kA)"
                + " -> 70 mm² or 2/0 AWG"));
        assertThat(r.out(), containsString("pickup: now 320 A, largest 1333 A (sensitivity to the lowest fault), at"
                + " least 200 A for the load"));
        // the pump start binds the feeder relay, the incomer breaker below binds the transformer relay
        assertThat(r.out(), containsString("P1-relay: tms now 0.8, proposed 0.75 (a current it must ride through;"
                + " exactly 0.746)"));
        assertThat(r.out(), containsString("TX1-HV-relay: tms now 0.75, proposed 0.69 (the interval over the device"
                + " below 'Q0-incomer'; exactly 0.686); over 'P1-relay' meets 0.3 s"));
        InProcess.Run j = run("design", "--json", SAMPLES.resolve("05-blower-feeder-undersized.yaml").toString());
        // the held very-inverse time beyond 20 x pickup, with DC-offset heating, needs 44.6 mm2: the next
        // IEC 60228 size is 50 mm2
        assertThat(j.out(), containsString("\"next_iec_mm2\" : 50.0"));
    }

    /**
     * The multiplier's kind and range come from the study, not from the curve's name: a custom
     * curve with the IEEE C37.112 very-inverse constants set by time dial gets the same proposals
     * as the named curve.
     */
    @Test
    void designOfACustomCurveSetByTimeDialMatchesTheNamedIeeeCurve(@TempDir Path tmp) throws Exception {
        String study = Files.readString(SAMPLES.resolve("05-blower-feeder-undersized.yaml"));
        Path named = tmp.resolve("named.yaml");
        Files.writeString(named, study.replace("{curve: iec-very-inverse, pickup_a: 160, tms: 0.3}",
                "{curve: ieee-very-inverse, pickup_a: 160, time_dial: 5}"));
        Path custom = tmp.resolve("custom.yaml");
        // IEEE C37.112: very inverse, A = 19.61 s, B = 0.491 s, p = 2
        Files.writeString(custom, study.replace("{curve: iec-very-inverse, pickup_a: 160, tms: 0.3}",
                "{curve: custom, pickup_a: 160, a_s: 19.61, b_s: 0.491, p: 2, time_dial: 5}"));
        InProcess.Run n = run("design", "--json", named.toString());
        InProcess.Run c = run("design", "--json", custom.toString());
        assertThat(n.code(), is(ExitCodes.PASS));
        assertThat(c.out(), containsString("\"kind\" : \"time_dial\""));
        assertEquals(n.out().replace("\"named\"", "\"study\"").replace("ieee-very-inverse", "curve"),
                c.out().replace("\"stage\" : \"custom\"", "\"stage\" : \"curve\"").replace("\"custom\"", "\"study\""));
        InProcess.Run text = run("design", custom.toString());
        assertThat(text.out(), containsString("time dial: now 5, largest"));
    }

    @Test
    void sensitivityReportsTheVerdictsThatFlip(@TempDir Path tmp) throws Exception {
        // passes at margin 0 up to 4 kA; the curves cross at 4.13 kA, inside 4 kA x 1.1
        Path s = tmp.resolve("flip.yaml");
        Files.writeString(s, Files.readString(SAMPLES.resolve("05-blower-feeder-undersized.yaml"))
                .replace("margin_s: 0.1}", "margin_s: 0}").replace("fault_ka: {min: 1.0, max: 10}",
                        "fault_ka: {min: 1.0, max: 4}"));
        InProcess.Run r = run("check", "--sensitivity", s.toString());
        assertThat(r.err(), r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("sensitivity, lowest currents x 0.9 and highest x 1.1: 1 verdict flips\n"
                + "    pass -> FAIL  cable    B5-relay protects B5-cable: fails 0 s: minimum margin -0.0373 s at"
                + " 4.4 kA"));
        InProcess.Run narrow = run("check", "--sensitivity=1,1.02", s.toString());
        assertThat(narrow.out(), containsString("sensitivity, lowest currents x 1 and highest x 1.02: no verdict"
                + " flips"));
        InProcess.Run bad = run("check", "--sensitivity=1.2,1.1", s.toString());
        assertThat(bad.code(), is(ExitCodes.BAD_INPUT));
        assertThat(bad.err(), containsString("give MIN,MAX with 0 < MIN <= 1 <= MAX"));
    }

    @Test
    void faultsPrintsTheNetworksLevelsOrRefusesAStudyWithoutOne() {
        InProcess.Run r = run("faults", SAMPLES.resolve("07-works-network.yaml").toString());
        assertThat(r.err(), r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("MSB                         24.4 kA    20.6 kA    17.8 kA     1.6    55.3 kA"));
        InProcess.Run j = run("faults", "--json", SAMPLES.resolve("07-works-network.yaml").toString());
        assertThat(j.out(), containsString("\"at\" : \"P1-cable:to\""));
        InProcess.Run none = run("faults", SAMPLES.resolve("05-blower-feeder-undersized.yaml").toString());
        assertThat(none.code(), is(ExitCodes.BAD_INPUT));
        assertThat(none.err(), containsString("the study has no network section"));
    }

    @Test
    void designOfABadStudyIsAnInputError() {
        InProcess.Run r = run("design", "no-such.yaml");
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertEquals("no-such.yaml: no such study file or folder\n", r.err());
    }

    @Test
    void noArgumentsIsAMistake() {
        InProcess.Run r = run();
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.out(), is(""));
        assertThat(r.err(), containsString("Usage: coordination"));
        assertThat(r.err(), containsString("completion"));
    }

    @Test
    void aStudyOnStandardInputIsCheckedAndDrawnAsStdin(@TempDir Path tmp) throws Exception {
        String study = Files.readString(SAMPLES.resolve("05-blower-feeder-undersized.yaml"));
        InProcess.Run r = InProcess.withInput(study, "check", "-");
        assertThat(r.err(), r.code(), is(ExitCodes.CHECK_FAILED));
        assertThat(r.out(), containsString("stdin: "));
        InProcess.Run s = InProcess.withInput(study, "sheet", "-", "-o", tmp.toString(), "--format", "svg");
        assertThat(s.err(), s.code(), is(ExitCodes.CHECK_FAILED));
        assertThat(files(tmp), is(List.of("stdin.report.json", "stdin.svg")));
        InProcess.Run bad = InProcess.withInput(study.replace("pickup_a: 160,", "pickup_a: lots,"), "check", "-");
        assertThat(bad.code(), is(ExitCodes.BAD_INPUT));
        assertThat(bad.err(), containsString("<stdin>:27:45: devices[0].stages[0].pickup_a: expected a number"));
        assertThat(run("check", "-", "-").err(), containsString("standard input can be read once"));
    }

    @Test
    void recursiveFindsStudiesInSubfoldersButNotHiddenOnes(@TempDir Path tmp) throws Exception {
        Path deep = Files.createDirectories(tmp.resolve("a/b"));
        Path hidden = Files.createDirectories(tmp.resolve(".old"));
        Files.copy(SAMPLES.resolve("01-main-switchboard-incomer.yaml"), deep.resolve("one.yaml"));
        Files.copy(SAMPLES.resolve("01-main-switchboard-incomer.yaml"), hidden.resolve("two.yaml"));
        assertThat(run("check", tmp.toString()).code(), is(ExitCodes.BAD_INPUT));
        InProcess.Run r = run("check", "--recursive", tmp.toString());
        assertThat(r.err(), r.code(), is(ExitCodes.PASS));
        assertThat(r.out(), containsString("one: "));
        assertThat(r.out().contains("two: "), is(false));
        // a subfolder that cannot be entered is a located error, not a crash
        Path locked = Files.createDirectories(tmp.resolve("a/locked"));
        Files.copy(SAMPLES.resolve("01-main-switchboard-incomer.yaml"), locked.resolve("three.yaml"));
        java.nio.file.Files.setPosixFilePermissions(locked, java.util.Set.of());
        try {
            org.junit.jupiter.api.Assumptions.assumeFalse(Files.isReadable(locked), "permissions bite (not root)");
            InProcess.Run denied = run("check", "--recursive", tmp.toString());
            assertThat(denied.code(), is(ExitCodes.BAD_INPUT));
            assertThat(denied.err(), containsString(tmp + ": cannot list the folder: permission denied"));
        } finally {
            java.nio.file.Files.setPosixFilePermissions(locked, java.nio.file.attribute.PosixFilePermissions
                    .fromString("rwx------"));
        }
    }

    @Test
    void quietSheetsPrintNothingButErrors(@TempDir Path tmp) throws Exception {
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, "format: 1\ntitle: [\n");
        InProcess.Run r = run("sheet", "--quiet", SAMPLES.resolve("01-main-switchboard-incomer.yaml").toString(),
                bad.toString(), "-o", tmp.resolve("out").toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.out(), is(""));
        assertThat(r.err(), containsString(bad + ":"));
    }

    @Test
    void helpListsTheAllowedValuesAndCompletionCoversEveryCommand() {
        assertThat(run("withstand", "--help").out(), containsString("copper, aluminium"));
        assertThat(run("sheet", "--help").out(), containsString("svg, png, pdf"));
        InProcess.Run c = run("completion");
        assertThat(c.code(), is(ExitCodes.PASS));
        for (String command : List.of("sheet", "check", "withstand", "design", "faults")) {
            assertThat(c.out(), containsString(command));
        }
        assertThat(c.out(), containsString("--recursive"));
        InProcess.Run j = run("withstand", "--conductor", "copper", "--insulation", "xlpe", "--size", "70", "--json");
        assertThat(j.err(), j.code(), is(ExitCodes.PASS));
        assertThat(j.out(), containsString("\"format\" : 1"));
    }

    @Test
    void incrementalRunsDrawOnlyWhatChangedOrWentMissing(@TempDir Path tmp) throws Exception {
        Path in = Files.createDirectories(tmp.resolve("in"));
        Files.copy(SAMPLES.resolve("01-main-switchboard-incomer.yaml"), in.resolve("a.yaml"));
        Files.copy(SAMPLES.resolve("05-blower-feeder-undersized.yaml"), in.resolve("b.yaml"));
        Path out = tmp.resolve("out");
        String[] args = {"sheet", in.toString(), "-o", out.toString(), "--format", "svg", "--incremental"};
        InProcess.Run first = run(args);
        assertThat(first.code(), is(ExitCodes.CHECK_FAILED));
        assertThat(first.out(), containsString("; 4 files in "));
        byte[] before = Files.readAllBytes(out.resolve("a.svg"));
        InProcess.Run again = run(args);
        // the cached verdict still decides the exit code
        assertThat(again.code(), is(ExitCodes.CHECK_FAILED));
        assertThat(again.out(), containsString("; 0 files in " + out + "; 2 unchanged, not drawn again"));
        // an edit or a lost file: drawn again; then other formats of the same studies
        Files.writeString(in.resolve("a.yaml"), Files.readString(in.resolve("a.yaml")) + "\n# edited\n");
        Files.delete(out.resolve("b.report.json"));
        InProcess.Run third = run(args);
        assertThat(third.out(), containsString("; 4 files in "));
        assertThat(Files.readAllBytes(out.resolve("a.svg")), is(before));
        assertThat(run("sheet", in.toString(), "-o", out.toString(), "--format", "svg,png", "--incremental").out(),
                containsString("; 6 files in "));
        // a cache that cannot be read is no cache
        Files.writeString(out.resolve(OutputCache.FILE), "garbage\n");
        assertThat(run(args).out(), containsString("; 4 files in "));
    }

    @Test
    void shardsTakeEveryNthStudyAndTogetherTakeThemAll() {
        List<String> seen = new java.util.ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            InProcess.Run r = run("check", "--shard", i + "/3", SAMPLES.toString());
            r.out().lines().filter(l -> l.matches("^0[0-9]-.*")).map(l -> l.substring(0, 2)).forEach(seen::add);
        }
        assertThat(seen.stream().sorted().toList(), is(List.of("01", "02", "03", "04", "05", "06", "07")));
        assertThat(run("check", "--shard", "1/3", SAMPLES.toString()).out(), containsString("04-"));
        InProcess.Run empty = run("check", "--shard", "9/9", SAMPLES.toString());
        assertThat(empty.code(), is(ExitCodes.PASS));
        InProcess.Run bad = run("sheet", "--shard", "4/3", SAMPLES.toString(), "-o", "never");
        assertThat(bad.code(), is(ExitCodes.BAD_INPUT));
        assertThat(bad.err(), containsString("--shard: found '4/3' - give I/N with 1 <= I <= N"));
    }
}
