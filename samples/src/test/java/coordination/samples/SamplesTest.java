package coordination.samples;

import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.is;

import coordination.core.study.ReportWriter;
import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import coordination.plot.sheet.OutputFormat;
import coordination.plot.sheet.SheetWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every sample study reads, renders headless, and reports as its committed expected report. */
class SamplesTest {
    static Stream<Path> studies() throws Exception {
        try (Stream<Path> s = Files.list(Path.of("."))) {
            return s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @Test
    void theScenarioHasAtLeastFiveStudiesAndOneFailsOnPurpose() throws Exception {
        List<Path> all = studies().toList();
        assertThat(all.size(), greaterThanOrEqualTo(5));
        long failing = all.stream().filter(p -> !StudyReport.evaluate(StudyReader.read(p)).pass()).count();
        assertThat(failing, is(1L));
    }

    @ParameterizedTest
    @MethodSource("studies")
    void reportMatchesTheCommittedExpectedReport(Path file) throws Exception {
        Study s = StudyReader.read(file);
        String json = ReportWriter.write(StudyReport.evaluate(s));
        Path expected = Path.of("expected", s.name() + ".report.json");
        if (Boolean.getBoolean("samples.regenerate")) {
            Files.createDirectories(expected.getParent());
            Files.writeString(expected, json, StandardCharsets.UTF_8);
        }
        assertThat(json, is(Files.readString(expected, StandardCharsets.UTF_8)));
    }

    @ParameterizedTest
    @MethodSource("studies")
    void rendersHeadlessInEveryFormat(Path file, @TempDir Path tmp) throws Exception {
        Study s = StudyReader.read(file);
        Map<String, byte[]> files = SheetWriter.render(s, StudyReport.evaluate(s), EnumSet.allOf(OutputFormat.class),
                150);
        SheetWriter.write(tmp, files);
        // three formats and the report, and for a network study three formats per path from the source
        long paths = coordination.core.study.StudyPaths.of(s).size();
        try (Stream<Path> written = Files.list(tmp)) {
            assertThat(written.count(), is(4L + 3 * paths));
        }
        assertThat(s.network().isPresent() == (paths > 0), is(true));
    }

    @Test
    void libraryExampleRuns(@TempDir Path tmp) throws Exception {
        LibraryExample.main(new String[] {tmp.toString()});
        assertThat(Files.size(tmp.resolve("library-example.png")), greaterThan(10_000L));
    }
}
