package coordination.plot.cli;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.is;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The launcher's training run: every command it runs succeeds, so the archive holds what users load. */
class ArchiveTrainingTest {
    @Test
    void everyTrainingCommandRunsCleanOnTheBundledSamples(@TempDir Path dir) throws IOException {
        // a command that failed on a bad argument would leave its classes out of the archive unnoticed
        assertThat(ArchiveTraining.run(dir), everyItem(is(0)));
    }

    @Test
    void theBundledStudiesAreTheSamplesAsTheyStand() throws IOException {
        for (String name : ArchiveTraining.STUDIES) {
            try (var in = ArchiveTraining.class.getResourceAsStream("training/" + name)) {
                assertThat(name, new String(in.readAllBytes()),
                        is(Files.readString(Path.of("../samples").resolve(name))));
            }
        }
    }
}
