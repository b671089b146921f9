package coordination.core.study;

import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * Mutates the valid conformance cases (deleted lines, swapped types, extreme numbers, random bytes,
 * truncation) and asserts that every input yields a study whose checks run, or clean problems:
 * never an uncaught exception and never a hang. Reproducible from the seed.
 */
class FuzzTest {
    private static final long SEED = 20261201L;
    private static final int INPUTS = 10_000;
    private static final Pattern PROBLEM = Pattern.compile("^fuzz\\.yaml:[1-9][0-9]*:[1-9][0-9]*: [^\\n]+$");
    private static final String[] NUMBERS = {"0", "-1", "-0.0", "1e308", "-1e308", "1e-300", ".nan", ".inf", "-.inf",
        "123456789012345678901234567890", "0x1F", "3.5", "1", "2"};
    private static final String[] VALUES = {"\"\"", "null", "~", "true", "[1, 2]", "{a: 1}", "[]", "{}", "abc",
        "'quoted'", "\"4/0 AWG\"", "*alias", "&anchor x", "!!binary aGVsbG8=", "[[1, 2], [3]]"};

    static List<String> corpus() throws Exception {
        List<String> texts = new ArrayList<>();
        try (Stream<Path> s = Files.list(Path.of("../spec/cases/valid"))) {
            for (Path p : s.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                texts.add(Files.readString(p, StandardCharsets.UTF_8));
            }
        }
        return texts;
    }

    static String mutate(String text, SplittableRandom r) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int rounds = 1 + r.nextInt(3);
        for (int k = 0; k < rounds && !lines.isEmpty(); k++) {
            int i = r.nextInt(lines.size());
            String line = lines.get(i);
            switch (r.nextInt(9)) {
                case 0 -> lines.remove(i);
                case 1 -> lines.set(i, line.replaceFirst("-?[0-9]+(\\.[0-9]+)?(e-?[0-9]+)?",
                        NUMBERS[r.nextInt(NUMBERS.length)]));
                case 2 -> {
                    int c = line.indexOf(": ");
                    if (c >= 0) {
                        lines.set(i, line.substring(0, c + 2) + VALUES[r.nextInt(VALUES.length)]);
                    }
                }
                case 3 -> {
                    StringBuilder b = new StringBuilder(line);
                    int n = 1 + r.nextInt(4);
                    for (int j = 0; j < n; j++) {
                        b.insert(b.length() == 0 ? 0 : r.nextInt(b.length()), (char) r.nextInt(0x20, 0x7f));
                    }
                    if (r.nextInt(4) == 0) {
                        b.insert(0, (char) r.nextInt(0, 0x20));
                    }
                    lines.set(i, b.toString());
                }
                case 4 -> {
                    String all = String.join("\n", lines);
                    return all.substring(0, r.nextInt(all.length() + 1));
                }
                case 5 -> lines.add(i, line);
                case 6 -> {
                    int j = r.nextInt(lines.size());
                    lines.set(i, lines.get(j));
                    lines.set(j, line);
                }
                case 7 -> lines.set(i, " ".repeat(r.nextInt(5)) + line.strip());
                default -> lines.set(i, line.replace("_a:", "_ka:").replace("_s:", "_ms:"));
            }
        }
        return String.join("\n", lines);
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void everyMutationGivesAStudyOrCleanProblems() throws Exception {
        List<String> corpus = corpus();
        SplittableRandom r = new SplittableRandom(SEED);
        int studies = 0;
        int refused = 0;
        for (int n = 0; n < INPUTS; n++) {
            String input = mutate(corpus.get(r.nextInt(corpus.size())), r);
            try {
                Study s = StudyReader.parse("fuzz.yaml", "fuzz", input);
                StudyReport report = StudyReport.evaluate(s);
                ReportWriter.write(report);
                studies++;
            } catch (StudyFileException e) {
                assertThat(e.problems(), not(empty()));
                for (Problem p : e.problems()) {
                    if (!PROBLEM.matcher(p.toString()).matches() || p.toString().contains("Exception")) {
                        fail("input " + n + " (seed " + SEED + ") gave an unclean problem: " + p + "\n" + input);
                    }
                }
                refused++;
            } catch (RuntimeException | StackOverflowError e) {
                throw new AssertionError("input " + n + " (seed " + SEED + ") threw " + e + "\n" + input, e);
            }
        }
        assertThat(studies + refused, is(INPUTS));
        // both outcomes occur, so the mutations neither only break nor only pass the files
        assertThat(studies, greaterThanOrEqualTo(100));
        assertThat(refused, greaterThanOrEqualTo(100));
    }
}
