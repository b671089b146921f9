package coordination.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.HighCurrentBehaviour;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.McbType;
import coordination.core.curve.MiniatureBreaker;
import coordination.core.curve.MultiplierKind;
import coordination.core.curve.Relay;
import coordination.core.curve.SettingRange;
import coordination.core.curve.TabulatedCurve;
import coordination.core.design.RadialGrading;
import coordination.core.margin.CableCheck;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Every public constructor refuses a bad argument with a message that names it. */
class ArgumentValidationTest {
    private static final Relay RELAY = Relay.of("R", DefiniteTimeStage.definiteTime(100, 0.2));
    private static final CableThermalLimit CABLE = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE,
            35, 1);

    private static void refused(String message, Executable e) {
        assertEquals(message, assertThrows(IllegalArgumentException.class, e).getMessage());
    }

    @Test
    void resetConstantMustBePositiveAndFinite() {
        for (double reset : new double[] {-1, Double.POSITIVE_INFINITY}) {
            refused("custom: reset constant: found " + (reset < 0 ? "-1" : "infinity") + " s - must be a finite number"
                    + " above 0", () -> new InverseTimeStage(10, 0, 1, reset, 100, 1, MultiplierKind.TMS,
                    new SettingRange(0.05, 1, 0.01), HighCurrentBehaviour.FOLLOW_EQUATION, 20, "custom"));
        }
    }

    @Test
    void gradingWithoutARequirementIsRefused() {
        refused("grading check: requirement: found null - must be given",
                () -> GradingCheck.check(RELAY, RELAY, 100, 1000, null));
        refused("cable check: requirement: found null - must be given",
                () -> CableCheck.check(RELAY, CABLE, 100, 1000, null));
    }

    @Test
    void aRatingRatioBetweenRelaysIsRefused() {
        refused("grading check: requirement: a rating ratio applies to two fuses, found relay 'R' over relay 'R' - use"
                + " an interval or no overlap", () -> GradingCheck.check(RELAY, RELAY, 100, 1000,
                GradingRequirement.ratingRatio(1.6)));
    }

    @Test
    void aGradingLinkWithoutAValidRangeOrCableIsRefused() {
        Relay si = Relay.of("S", coordination.core.curve.InverseTimeStage.of(
                coordination.core.curve.InverseTimeFamily.IEC_STANDARD_INVERSE, 100, 0.1));
        refused("grading link 'S': grading range: lowest current: found NaN A - must be a finite number above 0",
                () -> new RadialGrading.Link(si, 1, java.util.Optional.empty(), new GradingRequirement.Interval(0.3, false), Double.NaN, 1000, java.util.List.of()));
        refused("grading link 'S': cable: found null - must be given",
                () -> new RadialGrading.Link(si, 1, null, new GradingRequirement.Interval(0.3, false), 100, 1000, java.util.List.of()));
        refused("relay 'R': no inverse-time stage to grade",
                () -> new RadialGrading.Link(RELAY, 1, java.util.Optional.empty(), new GradingRequirement.Interval(0.3, false), 100, 1000, java.util.List.of()));
    }

    @Test
    void idsMustBeGiven() {
        TabulatedCurve c = new TabulatedCurve("c", new double[] {100, 1000}, new double[] {10, 0.1});
        refused("fuse: id: found null - must be given", () -> new Fuse(null, 100, c, c, OptionalDouble.empty()));
        refused("mcb: id: found null - must be given", () -> MiniatureBreaker.of(null, McbType.B, 16));
        refused("relay: found a null id, stage list or CT - each must be given", () -> Relay.of(null,
                DefiniteTimeStage.definiteTime(100, 0.2)));
        refused("cable: id: found null - must be given", () -> new CableThermalLimit(null, ConductorMaterial.COPPER,
                Insulation.XLPE, 35, 1, 90, 250, ThermalMethod.ADIABATIC));
        refused("inverse-time stage: label: found null - must be given", () -> new InverseTimeStage(0.14, 0, 0.02,
                Double.NaN, 100, 0.1, MultiplierKind.TMS, new SettingRange(0.05, 1, 0.01),
                HighCurrentBehaviour.FOLLOW_EQUATION, 20, null));
    }
}
