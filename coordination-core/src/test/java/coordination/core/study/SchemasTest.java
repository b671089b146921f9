package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class SchemasTest {
    @Test
    void theShippedSchemasAreTheSpecification() throws Exception {
        assertThat(Schemas.study(), is(Files.readString(Path.of("../spec/study.schema.json"), StandardCharsets.UTF_8)));
        assertThat(Schemas.report(), is(Files.readString(Path.of("../spec/report.schema.json"), StandardCharsets.UTF_8)));
        assertThat(Schemas.design(), is(Files.readString(Path.of("../spec/design.schema.json"), StandardCharsets.UTF_8)));
        assertThat(Schemas.withstand(), is(Files.readString(Path.of("../spec/withstand.schema.json"),
                StandardCharsets.UTF_8)));
        assertThat(Schemas.faults(), is(Files.readString(Path.of("../spec/faults.schema.json"), StandardCharsets.UTF_8)));
    }
}
