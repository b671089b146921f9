package coordination.samples;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.is;
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
import java.util.List;
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
            return Stream.concat(Stream.concat(SamplesTest.studies(), Stream.of(Path.of("large/network-200.yaml"))),
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

    /** A report with its sensitivity run, one of whose verdicts flips, fits the report schema. */
    @Test
    void reportSchemaAcceptsASensitivityRun() throws Exception {
        String yaml = Files.readString(Path.of("05-blower-feeder-undersized.yaml"))
                .replace("margin_s: 0.1}", "margin_s: 0}").replace("max: 10}", "max: 4}");
        coordination.core.study.Sensitivity run = coordination.core.study.Sensitivity.of(
                coordination.core.study.StudyReader.parse("flip.yaml", "flip", yaml), 0.9, 1.1);
        assertThat(run.flips(), is(java.util.List.of(0)));
        Set<ValidationMessage> errors = schema("report.schema.json").validate(new ObjectMapper().readTree(
                coordination.core.study.ReportWriter.write(run)));
        assertThat(errors.toString(), errors, empty());
    }

    /** design --json of every sample fits its schema. */
    @ParameterizedTest
    @MethodSource("coordination.samples.SamplesTest#studies")
    void designSchemaAcceptsTheProposalsOfEverySample(Path file) throws Exception {
        String json = coordination.core.study.ReportWriter.write(coordination.core.study.StudyDesign.of(
                coordination.core.study.StudyReader.read(file)));
        Set<ValidationMessage> errors = schema("design.schema.json").validate(new ObjectMapper().readTree(json));
        assertThat(file + ": " + errors, errors, empty());
    }

    /** withstand --json and faults --json fit theirs, and a wrong key is refused. */
    @Test
    void withstandAndFaultsSchemasAcceptWhatTheCommandsPrint() throws Exception {
        for (String[] args : List.of(new String[] {"withstand", "--conductor", "copper", "--insulation", "xlpe", "--json"},
                new String[] {"withstand", "--conductor", "aluminium", "--insulation", "pvc", "--size", "4/0 AWG",
                    "--parallel", "2", "--method", "icea", "--json"})) {
            assertThat(String.join(" ", args), schema("withstand.schema.json").validate(json(args)), empty());
        }
        JsonNode faults = json("faults", "--json", "07-works-network.yaml");
        assertThat(schema("faults.schema.json").validate(faults), empty());
        ((com.fasterxml.jackson.databind.node.ObjectNode) faults).put("extra", 1);
        assertThat(schema("faults.schema.json").validate(faults).isEmpty(), is(false));
    }

    private static JsonNode json(String... args) throws Exception {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        int code = coordination.plot.cli.Cli.run(new java.io.PrintStream(out, true, "UTF-8"),
                new java.io.PrintStream(new java.io.ByteArrayOutputStream(), true, "UTF-8"), args);
        assertThat(String.join(" ", args), code, is(0));
        return new ObjectMapper().readTree(out.toString(java.nio.charset.StandardCharsets.UTF_8));
    }

    /** What check --json prints for several files, one of them unreadable, fits the schema's list form. */
    @Test
    void reportSchemaAcceptsTheListOfSeveralStudies() throws Exception {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
        Path bad = Files.createTempFile("unreadable", ".yaml");
        try {
            Files.writeString(bad, "format: 1\ntitle: [\n");
            int code = coordination.plot.cli.Cli.run(new java.io.PrintStream(out, true, "UTF-8"),
                    new java.io.PrintStream(err, true, "UTF-8"), "check", "--json", "01-main-switchboard-incomer.yaml",
                    bad.toString());
            assertThat(code, is(2));
        } finally {
            Files.delete(bad);
        }
        JsonNode list = new ObjectMapper().readTree(out.toString(java.nio.charset.StandardCharsets.UTF_8));
        assertThat(list.get("studies").size(), is(1));
        assertThat(list.get("not_read").get(0).get("file").asText(), is(bad.toString()));
        assertThat(list.get("not_read").get(0).get("errors").get(0).asText(), org.hamcrest.Matchers.startsWith(
                bad + ":"));
        Set<ValidationMessage> errors = schema("report.schema.json").validate(list);
        assertThat(errors.toString(), errors, empty());
        // and a bare report is not mistaken for the list, nor the list for a report
        ((com.fasterxml.jackson.databind.node.ObjectNode) list).remove("not_read");
        assertThat(schema("report.schema.json").validate(list).isEmpty(), is(false));
    }

    /**
     * Invalid cases of the corpus that the study schema accepts, each with the reason no JSON
     * Schema can refuse it: the rule is about YAML itself, relates two values, or needs a model.
     */
    static final java.util.Map<String, String> SCHEMA_CANNOT_TELL = java.util.Map.ofEntries(
            java.util.Map.entry("breaker-band-inverted", "relates two values: the band's high edge to its low edge"),
            java.util.Map.entry("grading-no-range", "relates sections: a grading range may be left out when the study"
                    + " has a network that derives it"),
            java.util.Map.entry("network-accept-not-derived", "needs a model: which pairs the network derives"),
            java.util.Map.entry("network-branch-without-network", "relates sections: branch keys need a network"),
            java.util.Map.entry("network-bus-not-declared", "relates ids across lists: the bus must be declared"),
            java.util.Map.entry("network-device-on-unknown-branch", "relates ids across lists: the branch must exist"),
            java.util.Map.entry("network-loop", "needs a model: the network's topology"),
            java.util.Map.entry("network-transformer-voltages", "relates values across lists: the buses' voltages"),
            java.util.Map.entry("network-two-sources", "needs a model: the network's topology"),
            java.util.Map.entry("breaker-isd-below-ir", "relates two values: Isd must lie above Ir"),
            java.util.Map.entry("cable-duplicate-id", "ids unique by one key across the list"),
            java.util.Map.entry("cable-fault-inverted", "relates two values: max at or above min"),
            java.util.Map.entry("cable-initial-above-final", "relates two temperatures, one of them a default"),
            java.util.Map.entry("check-no-range", "the default range comes from the cable the check names"),
            java.util.Map.entry("check-unknown-cable", "a reference to another part of the document"),
            java.util.Map.entry("check-unknown-device", "a reference to another part of the document"),
            java.util.Map.entry("duplicate-key", "the YAML parser keeps one of the two keys before any schema sees them"),
            java.util.Map.entry("empty-file", "there is no document to validate"),
            java.util.Map.entry("fuse-clearing-below-melting", "compares two curves point by point"),
            java.util.Map.entry("fuse-rising-curve", "an order between list items"),
            java.util.Map.entry("fuse-energy-currents-fall", "an order between list items"),
            java.util.Map.entry("grading-ratio-on-relays", "depends on the kinds of the devices the check names"),
            java.util.Map.entry("relay-multiplier-outside-range", "relates a setting to its stated range"),
            java.util.Map.entry("syntax-error", "not YAML"),
            java.util.Map.entry("two-documents", "a stream of two documents; a schema sees only the first"),
            java.util.Map.entry("hostile-bidi-override", "the character rules hold for every string; no schema states them"),
            java.util.Map.entry("hostile-control-character-escaped", "the character rules hold for every string"),
            java.util.Map.entry("hostile-control-character-raw", "not YAML"),
            java.util.Map.entry("hostile-lone-surrogate", "the parser has turned the escape into '?' already"),
            java.util.Map.entry("hostile-boolean-on", "the YAML 1.1 parser has read 'on' as true already"),
            java.util.Map.entry("hostile-boolean-yes", "the YAML 1.1 parser has read 'yes' as true already"),
            java.util.Map.entry("hostile-hex-format", "the YAML 1.1 parser has read 0x1 as 1 already"),
            java.util.Map.entry("hostile-octal-pickup", "the YAML 1.1 parser has read 0250 as 168 already"),
            java.util.Map.entry("hostile-underscore-number", "the YAML 1.1 parser has read 3_000 as 3000 already"),
            java.util.Map.entry("hostile-kcmil-huge", "the area is computed from the size's text"),
            java.util.Map.entry("hostile-long-unknown-references", "a reference to another part of the document"));

    static Stream<Path> invalidStudies() throws Exception {
        try (Stream<Path> corpus = Files.list(Path.of("../spec/cases/invalid"))) {
            return corpus.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @ParameterizedTest
    @MethodSource("invalidStudies")
    void studySchemaRefusesEveryInvalidCaseItCanExpress(Path file) throws Exception {
        String name = file.getFileName().toString().replace(".yaml", "");
        JsonNode study;
        try {
            study = new YAMLMapper().readTree(file.toFile());
        } catch (java.io.IOException e) {
            // not YAML at all: nothing for a schema to judge
            assertThat(name + " does not parse, so it must be listed", SCHEMA_CANNOT_TELL.containsKey(name), is(true));
            return;
        }
        Set<ValidationMessage> errors = study == null || study.isMissingNode() ? Set.of()
                : schema("study.schema.json").validate(study);
        if (SCHEMA_CANNOT_TELL.containsKey(name)) {
            assertThat(name + " is listed as beyond the schema but the schema refuses it: " + errors, errors, empty());
        } else {
            assertThat(name + ": the schema accepts it", errors, not(empty()));
        }
    }

    @Test
    void studySchemaRefusesAnUnknownKey() throws Exception {
        JsonNode study = new YAMLMapper().readTree(Files.readString(Path.of("05-blower-feeder-undersized.yaml"))
                .replace("pickup_a: 160,", "pickup: 160,"));
        assertThat(schema("study.schema.json").validate(study), not(empty()));
    }
}
