package coordination.samples;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.not;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The JSON Schemas of spec/ accept every sample study and report, and refuse a study with a typo. */
class SchemaTest {
    private static final JsonSchemaFactory FACTORY = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012);

    private static JsonSchema schema(String name) throws Exception {
        return FACTORY.getSchema(new ObjectMapper().readTree(Path.of("../spec", name).toFile()));
    }

    static Stream<Path> studies() throws Exception {
        try (Stream<Path> corpus = Files.list(Path.of("../spec/cases/valid"))) {
            return Stream.concat(SamplesTest.studies(),
                    corpus.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream());
        }
    }

    static Stream<Path> reports() throws Exception {
        try (Stream<Path> s = Files.list(Path.of("expected"));
                Stream<Path> corpus = Files.list(Path.of("../spec/cases/valid"))) {
            return Stream.concat(s.sorted().toList().stream(),
                    corpus.filter(p -> p.toString().endsWith(".expected.json")).sorted().toList().stream());
        }
    }

    /** The study examples in README.md and spec/study-format.md are valid studies. */
    @Test
    void documentedExamplesAreValidStudies() throws Exception {
        for (String doc : new String[] {"../README.md", "../spec/study-format.md"}) {
            String text = Files.readString(Path.of(doc));
            int start = text.indexOf("```yaml\n");
            String yaml = text.substring(start + 8, text.indexOf("```", start + 8));
            coordination.core.study.Study study = coordination.core.study.StudyReader.parse(doc, "example", yaml);
            assertThat(doc, study.checks(), not(empty()));
            Set<ValidationMessage> errors = schema("study.schema.json").validate(new YAMLMapper().readTree(yaml));
            assertThat(doc + ": " + errors, errors, empty());
        }
    }

    @ParameterizedTest
    @MethodSource("studies")
    void studySchemaAcceptsEverySample(Path file) throws Exception {
        JsonNode study = new YAMLMapper().readTree(file.toFile());
        Set<ValidationMessage> errors = schema("study.schema.json").validate(study);
        assertThat(file + ": " + errors, errors, empty());
    }

    @ParameterizedTest
    @MethodSource("reports")
    void reportSchemaAcceptsEveryExpectedReport(Path file) throws Exception {
        Set<ValidationMessage> errors = schema("report.schema.json").validate(new ObjectMapper().readTree(file.toFile()));
        assertThat(file + ": " + errors, errors, empty());
    }

    @Test
    void studySchemaRefusesAnUnknownKey() throws Exception {
        JsonNode study = new YAMLMapper().readTree(Files.readString(Path.of("05-blower-feeder-undersized.yaml"))
                .replace("pickup_a: 160,", "pickup: 160,"));
        assertThat(schema("study.schema.json").validate(study), not(empty()));
    }
}
