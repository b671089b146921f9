package coordination.samples;

import static coordination.core.matchers.CoordinationMatchers.gradesUnder;
import static coordination.core.matchers.CoordinationMatchers.protects;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.not;

import coordination.core.cable.CableThermalLimit;
import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * A design-automation test as a user would write it: the feeders of the sample scenario must
 * protect their cables and grade with the switchboard incomer.
 */
class FeederDesignTest {
    private static final Study SWITCHBOARD = StudyReader.read(Path.of("01-main-switchboard-incomer.yaml"));
    private static final Study BLOWER = StudyReader.read(Path.of("05-blower-feeder-undersized.yaml"));

    @Test
    void pumpHouseFeederProtectsItsCableWithATenthOfASecond() {
        CableThermalLimit cable = SWITCHBOARD.cable("P1-cable").limit();
        assertThat(SWITCHBOARD.device("P1-relay").referred(),
                protects(cable).between(2_000, 18_000).withMarginOfSeconds(0.1));
    }

    @Test
    void pumpHouseFeederGradesUnderTheIncomer() {
        assertThat(SWITCHBOARD.device("P1-relay").referred(),
                gradesUnder(SWITCHBOARD.device("Q0-incomer").referred()).between(2_000, 7_000).withoutOverlap());
    }

    @Test
    void undersizedBlowerCableIsCaught() {
        // the sample that fails on purpose: the relay does not protect the 16 mm² cable above about 5.5 kA
        CableThermalLimit cable = BLOWER.cable("B5-cable").limit();
        assertThat(BLOWER.device("B5-relay").referred(),
                not(protects(cable).between(1_000, 10_000).withMarginOfSeconds(0.1)));
    }
}
