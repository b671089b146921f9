package coordination.core.cable;

import static org.hamcrest.Matchers.nullValue;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

class AdiabaticFactorTest {
    /** The tables give k as whole numbers: a computed k must round to the tabulated one. */
    private static final double TABLE_ROUNDING = 0.5;

    @ParameterizedTest(name = "{0} {1} {2} mm2: k = {5}")
    @CsvFileSource(resources = "/reference/k-values-iec60364-4-43.csv")
    void kForLineConductorsMatchesIec60364Table43A(String material, String insulation, double sizeMm2,
            double initialC, double finalC, double kTable) {
        // IEC 60364-4-43:2008, Table 43A, from memory (see the CSV header)
        CableThermalLimit cable = CableThermalLimit.of("c", ConductorMaterial.byKey(material),
                Insulation.byKey(insulation), sizeMm2, 1);
        assertThat(cable.initialCelsius(), is(initialC));
        assertThat(cable.finalCelsius(), is(finalC));
        assertThat(cable.k(), closeTo(kTable, TABLE_ROUNDING));
    }

    @ParameterizedTest(name = "{0} {1} C to {2} C: k = {3}")
    @CsvFileSource(resources = "/reference/k-values-iec60364-5-54.csv")
    void kForProtectiveConductorsMatchesIec60364Table54(String material, double initialC, double finalC,
            double kTable) {
        // IEC 60364-5-54:2011, Table A.54.2, from memory
        assertThat(ConductorMaterial.byKey(material).k(initialC, finalC), closeTo(kTable, TABLE_ROUNDING));
    }

    @Test
    void copperXlpeFrom90To250IsK143() {
        // common practice: k = 143 for copper with XLPE or EPR from 90 C to 250 C
        assertThat(ConductorMaterial.COPPER.k(90, 250), closeTo(143.0, 0.1));
        assertThat(CableThermalLimit.of("c", ConductorMaterial.COPPER, Insulation.EPR, 70, 1).k(), closeTo(143.0, 0.1));
    }

    @Test
    void pvcShortCircuitLimitIs160CUpTo300Mm2And140CAbove() {
        // common practice: PVC's short-circuit limit of 160 C; IEC 60364-4-43 Table 43A: 140 C above 300 mm2
        assertThat(Insulation.PVC.shortCircuitCelsius(300), is(160.0));
        assertThat(Insulation.PVC.shortCircuitCelsius(400), is(140.0));
        assertThat(Insulation.PVC.maxOperatingCelsius(), is(70.0));
    }

    @Test
    void energyLimitIsKSquaredSSquared() {
        CableThermalLimit cable = CableThermalLimit.of("c", ConductorMaterial.COPPER, Insulation.XLPE, 70, 2);
        double ks = cable.k() * 140;
        assertThat(cable.i2tA2s(), closeTo(ks * ks, ks * ks * 1e-12));
        // I = kS / sqrt(t): worked, 143.08 x 140 / 1 = 20.03 kA for one second
        assertThat(cable.withstandAmps(1.0), closeTo(cable.k() * 140, 1e-9));
    }

    @Test
    void initialTemperatureFromLoadFollowsSquareLaw() {
        // common practice: theta_i = theta_a + (theta_max - theta_a) (I / Iz)^2; worked: 30 + 60 x 0.25 = 45 C
        assertThat(CableThermalLimit.initialFromLoad(30, 90, 50, 100), closeTo(45.0, 1e-12));
        assertThat(CableThermalLimit.initialFromLoad(30, 90, 100, 100), closeTo(90.0, 1e-12));
    }

    @Test
    void initialAtOrAboveFinalIsRefusedWithBothTemperatures() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new CableThermalLimit("F7", ConductorMaterial.COPPER, Insulation.PVC, 70, 1, 160, 160,
                        ThermalMethod.ADIABATIC));
        assertEquals("cable 'F7': initial temperature 160 °C is not below the final temperature 160 °C"
                + " - the initial temperature must be below the final one", e.getMessage());
    }

    @Test
    void sizeAtOrBelowZeroIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CableThermalLimit.of("F7", ConductorMaterial.COPPER, Insulation.PVC, 0, 1));
        assertEquals("cable 'F7': size: found 0 mm2 - must be a finite number above 0", e.getMessage());
    }

    @Test
    void unknownInsulationIsNotFound() {
        assertThat(Insulation.byKey("cotton"), nullValue());
    }
}
