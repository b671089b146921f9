package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;

import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.cable.WithstandTable;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.Serializable;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Studies, reports, design proposals and sensitivity runs cross a Java serialization round trip (as in a
 * batch engine that ships them between machines) and come back giving the same JSON, byte for byte.
 */
class SerializationTest {
    static Stream<Path> studies() throws Exception {
        try (Stream<Path> valid = Files.list(Path.of("../spec/cases/valid"));
                Stream<Path> samples = Files.list(Path.of("../samples"))) {
            return Stream.concat(Stream.concat(valid, samples).filter(p -> p.toString().endsWith(".yaml")).sorted(),
                    Stream.of(Path.of("../samples/large/network-200.yaml"))).toList().stream();
        }
    }

    @SuppressWarnings("unchecked")
    static <T extends Serializable> T roundTrip(T value) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(value);
        }
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            return (T) in.readObject();
        }
    }

    @ParameterizedTest
    @MethodSource("studies")
    void aStudyAndItsResultsComeBackTheSame(Path file) throws Exception {
        Study study = StudyReader.read(file);
        StudyReport report = StudyReport.evaluate(study);
        String json = ReportWriter.write(report);

        Study studyBack = roundTrip(study);
        assertThat(studyBack.name(), is(study.name()));
        assertThat("the study read back runs to the same report", ReportWriter.write(StudyReport.evaluate(studyBack)),
                is(json));
        assertThat("the report read back writes the same JSON", ReportWriter.write(roundTrip(report)), is(json));
        for (int i = 0; i < report.results().size(); i++) {
            assertThat(ReportWriter.write(roundTrip(report.results().get(i))), is(ReportWriter.write(report.results()
                    .get(i))));
        }
        StudyDesign design = StudyDesign.of(study);
        assertThat(ReportWriter.write(roundTrip(design)), is(ReportWriter.write(design)));
        Sensitivity run = Sensitivity.of(study, Sensitivity.DEFAULT_MIN_FACTOR, Sensitivity.DEFAULT_MAX_FACTOR);
        assertThat(ReportWriter.write(roundTrip(run)), is(ReportWriter.write(run)));
        if (study.network().isPresent()) {
            assertThat(ReportWriter.writeFaults(studyBack), is(ReportWriter.writeFaults(study)));
        }
    }

    @ParameterizedTest
    @MethodSource("methods")
    void aWithstandTableComesBackTheSame(ThermalMethod method) throws Exception {
        WithstandTable t = WithstandTable.of(ConductorMaterial.COPPER, Insulation.XLPE, method, 2,
                new double[] {16, 70}, List.of("16", "70"), OptionalDouble.empty(), OptionalDouble.of(250),
                new double[] {0.1, 1});
        assertThat(ReportWriter.write(roundTrip(t)), is(ReportWriter.write(t)));
    }

    static Stream<ThermalMethod> methods() {
        return Stream.of(ThermalMethod.values());
    }
}
