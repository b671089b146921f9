package coordination.core.matchers;

import static coordination.core.matchers.CoordinationMatchers.gradesUnder;
import static coordination.core.matchers.CoordinationMatchers.protects;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.not;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.internal.Checks;
import java.util.List;
import org.junit.jupiter.api.Test;

class CoordinationMatchersTest {
    private static final CableThermalLimit CABLE =
            CableThermalLimit.of("F7-cable", ConductorMaterial.COPPER, Insulation.XLPE, 70, 1);
    private static final Relay FEEDER = new Relay("F7-relay", List.of(
            InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
            DefiniteTimeStage.definiteTime(3000, 0.1), DefiniteTimeStage.instantaneous(10000, 0.0)), 1, 0.05);
    private static final Relay INCOMER = new Relay("F0-relay", List.of(
            InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 600, 0.3),
            DefiniteTimeStage.definiteTime(8000, 0.5)), 1, 0.05);

    @Test
    void passingProtectionReadsNaturally() {
        assertThat(FEEDER, protects(CABLE).between(1500, 12000).withMarginOfSeconds(0.1));
        assertThat(FEEDER, gradesUnder(INCOMER).between(1500, 6000).withIntervalOfSeconds(0.3));
    }

    @Test
    void failingProtectionStatesCurrentTimesAndShortfall() {
        Relay slow = Relay.of("slow", DefiniteTimeStage.definiteTime(1000, 1.5));
        AssertionError e = assertThrows(AssertionError.class,
                () -> assertThat(slow, protects(CABLE).between(1500, 12000).withMarginOfSeconds(0.1)));
        // worked: the cable's damage time at 12 kA is (kS / 12 kA)^2
        double tc = Math.pow(CABLE.k() * 70 / 12000, 2);
        assertEquals("\nExpected: a device that protects cable 'F7-cable' from 1500 A to 12000 A with a margin of 0.1 s"
                + "\n     but: at 12000 A 'slow' clears in 1.5 s and 'F7-cable' is damaged in " + Checks.format(tc)
                + " s: margin " + Checks.format(tc - 1.5) + " s, " + Checks.format(0.1 - (tc - 1.5))
                + " s short of 0.1 s", e.getMessage());
    }

    @Test
    void failingGradingStatesCurrentTimesAndShortfall() {
        Relay closeIncomer = new Relay("F0-relay", List.of(
                InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 600, 0.15),
                DefiniteTimeStage.definiteTime(8000, 0.5)), 1, 0.05);
        AssertionError e = assertThrows(AssertionError.class,
                () -> assertThat(FEEDER, gradesUnder(closeIncomer).between(1500, 6000).withIntervalOfSeconds(0.3)));
        // worked: just below the feeder's 3 kA definite-time step both relays are on their SI curves; between
        // two relays the interval is measured to the downstream relay's operating time (IEEE 242 practice)
        double tu = 0.15 * 0.14 / (Math.pow(3000 / 600.0, 0.02) - 1);
        double td = 0.2 * 0.14 / (Math.pow(3000 / 250.0, 0.02) - 1);
        assertEquals("\nExpected: a device that grades under 'F0-relay' from 1500 A to 6000 A with an interval of 0.3 s"
                + "\n     but: at 3000 A (just below) 'F0-relay' operates in " + Checks.format(tu) + " s and 'F7-relay'"
                + " operates in " + Checks.format(td) + " s: interval " + Checks.format(tu - td) + " s, "
                + Checks.format(0.3 - (tu - td)) + " s short of 0.3 s", e.getMessage());
    }

    @Test
    void notMatcherComposes() {
        Relay slow = Relay.of("slow", DefiniteTimeStage.definiteTime(1000, 1.5));
        assertThat(slow, not(protects(CABLE).between(1500, 12000)));
    }
}
