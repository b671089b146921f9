package coordination.plot.conformance;

import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.both;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.is;
import static org.hamcrest.Matchers.lessThanOrEqualTo;

import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import coordination.plot.cli.ExitCodes;
import coordination.plot.cli.InProcess;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Runs the conformance corpus of {@code spec/cases} through the command line in-process: every
 * valid case must print its expected report, every invalid case its expected error lines with exit
 * code 2. Expected files are rewritten with {@code -Dcorpus.regenerate=true}; review the diff.
 */
class ConformanceTest {
    static final Path CASES = Path.of("../spec/cases");
    private static final boolean REGENERATE = Boolean.getBoolean("corpus.regenerate");
    private static final int SAMPLES = 200_000;

    static Stream<Path> valid() throws Exception {
        return list("valid");
    }

    static Stream<Path> invalid() throws Exception {
        return list("invalid");
    }

    private static Stream<Path> list(String folder) throws Exception {
        try (Stream<Path> s = Files.list(CASES.resolve(folder))) {
            return s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    static InProcess.Run run(String... args) {
        return InProcess.run(args);
    }

    private static String expected(Path file, String suffix, String actual) throws Exception {
        String name = file.getFileName().toString().replace(".yaml", suffix);
        Path e = file.resolveSibling(name);
        if (REGENERATE) {
            Files.writeString(e, actual, StandardCharsets.UTF_8);
        }
        return Files.readString(e, StandardCharsets.UTF_8);
    }

    @Test
    void corpusIsLargeEnough() throws Exception {
        assertThat(valid().count(), greaterThanOrEqualTo(20L));
        assertThat(invalid().count(), greaterThanOrEqualTo(40L));
    }

    @ParameterizedTest
    @MethodSource("valid")
    void validCasePrintsItsExpectedReport(Path file) throws Exception {
        InProcess.Run r = run("check", "--json", file.toString());
        assertThat(r.err(), is(""));
        assertThat(r.out(), is(expected(file, ".expected.json", r.out())));
        boolean pass = r.out().contains("\n  \"pass\" : true,");
        assertThat(r.code(), is(pass ? ExitCodes.PASS : ExitCodes.CHECK_FAILED));
    }

    @ParameterizedTest
    @MethodSource("invalid")
    void invalidCasePrintsItsExpectedErrors(Path file) throws Exception {
        InProcess.Run r = run("check", file.toString());
        assertThat(r.code(), is(ExitCodes.BAD_INPUT));
        assertThat(r.out(), is(""));
        // expected lines are stored without the folder, as the file's own name
        String errors = r.err().replace(file.getParent().toString() + java.io.File.separator, "");
        assertThat(errors, is(expected(file, ".expected.txt", errors)));
        assertThat(errors, not(containsString("Exception")));
        assertThat(errors, not(containsString("\tat ")));
    }

    /**
     * The cable checks of every valid case, against an independent computation: the minimum
     * margin and ratio found by sampling the same device and cable models at 200,000 currents,
     * without the engine's segmentation and solvers. The engine's minimum is never above the
     * sampled one, and within the sampling resolution of it.
     */
    @ParameterizedTest
    @MethodSource("valid")
    void cableMarginsAgreeWithDenseSampling(Path file) throws Exception {
        Study study = StudyReader.read(file);
        for (Study.StudyCheck c : study.checks()) {
            if (!(c instanceof Study.CableCheckSpec spec)) {
                continue;
            }
            double from = spec.range().fromAmps();
            double to = spec.range().toAmps();
            CableCheck check = new CableCheck(study.device(spec.device()).referred(), study.cable(spec.cable()).limit(),
                    from, to, spec.requirement(), spec.dcOffset().orElse(null));
            CableCheckResult r = check.result();
            if (!Double.isFinite(r.minMarginSeconds())) {
                continue;
            }
            double min = Double.POSITIVE_INFINITY;
            double scale = 0;
            for (int i = 0; i < SAMPLES; i++) {
                double amps = from * Math.pow(to / from, (double) i / (SAMPLES - 1));
                double te = check.equivalentSeconds(amps);
                double tc = study.cable(spec.cable()).limit().damageSeconds(amps);
                if (Double.isFinite(te) && tc - te < min) {
                    min = tc - te;
                    scale = Math.max(Math.abs(tc), Math.abs(te));
                }
            }
            String label = file.getFileName() + " " + r;
            assertThat(label, r.minMarginSeconds(), lessThanOrEqualTo(min + 1e-9 * scale));
            assertThat(label, min - r.minMarginSeconds(), lessThanOrEqualTo(1e-3 * scale));
        }
    }

    @Test
    void reportsOfTheCorpusAreTheSameSeriallyAndInParallel() throws Exception {
        Path a = Files.createTempDirectory("serial");
        Path b = Files.createTempDirectory("parallel");
        try {
            run("sheet", CASES.resolve("valid").toString(), "-o", a.toString(), "--threads", "1", "--format",
                    "svg,png,pdf");
            run("sheet", CASES.resolve("valid").toString(), "-o", b.toString(), "--threads", "4", "--format",
                    "svg,png,pdf");
            try (Stream<Path> files = Files.list(a)) {
                for (Path f : files.sorted().toList()) {
                    assertThat(f + " differs between one and four threads", java.util.Arrays.equals(Files.readAllBytes(f),
                            Files.readAllBytes(b.resolve(f.getFileName()))), is(true));
                }
            }
            try (Stream<Path> fa = Files.list(a); Stream<Path> fb = Files.list(b)) {
                assertThat(fa.count(), is(fb.count()));
            }
        } finally {
            deleteTree(a);
            deleteTree(b);
        }
    }

    /**
     * Extreme numbers in the valid cases, through the whole command line including the sheets:
     * every run ends with exit code 0, 1 or 2 and never prints a stack trace.
     */
    @Test
    void extremeNumbersNeverCrashTheCommandLine() throws Exception {
        String[] numbers = {"0", "-1", "1e308", "1e-300", ".nan", ".inf", "0.0001", "99999"};
        java.util.SplittableRandom r = new java.util.SplittableRandom(7);
        java.util.List<Path> cases = valid().toList();
        Path tmp = Files.createTempDirectory("fuzz");
        try {
            for (int n = 0; n < 150; n++) {
                String text = Files.readString(cases.get(r.nextInt(cases.size())));
                java.util.regex.Matcher m = java.util.regex.Pattern.compile("(?<=: )[0-9.]+").matcher(text);
                java.util.List<int[]> spans = new java.util.ArrayList<>();
                while (m.find()) {
                    spans.add(new int[] {m.start(), m.end()});
                }
                int[] at = spans.get(r.nextInt(spans.size()));
                String mutated = text.substring(0, at[0]) + numbers[r.nextInt(numbers.length)] + text.substring(at[1]);
                Path f = tmp.resolve("case.yaml");
                Files.writeString(f, mutated);
                InProcess.Run run = n % 5 == 0 ? run("sheet", f.toString(), "-o", tmp.resolve("out").toString())
                        : run("check", "--json", f.toString());
                assertThat(mutated + "\n" + run.err(), run.code(), both(greaterThanOrEqualTo(0)).and(lessThanOrEqualTo(2)));
                assertThat(mutated, run.err(), not(containsString("\tat ")));
                assertThat(mutated, run.err(), not(containsString("internal error")));
            }
        } finally {
            deleteTree(tmp);
        }
    }

    static void deleteTree(Path p) throws Exception {
        try (Stream<Path> s = Files.walk(p)) {
            for (Path q : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(q);
            }
        }
    }

}
