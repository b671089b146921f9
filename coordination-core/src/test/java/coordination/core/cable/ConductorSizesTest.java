package coordination.core.cable;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.CoordinationException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

class ConductorSizesTest {
    /** NEC Table 8 rounds areas to four significant figures. */
    private static final double TABLE_RELATIVE = 0.002;

    @ParameterizedTest(name = "{0} = {1} cmil")
    @CsvFileSource(resources = "/reference/conductor-sizes-nec-chapter9-table8.csv")
    void areasMatchNecTable8(String size, double cmil) {
        // NFPA 70 Chapter 9 Table 8, from memory; ASTM B258 gauge formula
        assertThat(ConductorSizes.cmil(ConductorSizes.parseMm2(size)), closeTo(cmil, cmil * TABLE_RELATIVE));
    }

    @Test
    void fourOughtIs107Mm2() {
        // ASTM B258: 4/0 AWG is 0.4600 in across, 211,600 cmil, 107.2 mm2
        assertThat(ConductorSizes.awgMm2("4/0"), closeTo(107.2, 0.05));
    }

    @Test
    void zerosCountTheSizesAboveOne() {
        // ASTM B258: 1/0 (0), 2/0 (00), 3/0 (000) and 4/0 (0000) AWG; 2/0 is 133,100 cmil, 67.43 mm2
        assertThat(ConductorSizes.parseMm2("0 AWG"), is(ConductorSizes.awgMm2("1/0")));
        assertThat(ConductorSizes.parseMm2("00 AWG"), closeTo(67.43, 0.01));
        assertThat(ConductorSizes.parseMm2("000 AWG"), is(ConductorSizes.awgMm2("3/0")));
        assertThat(ConductorSizes.parseMm2("0000 AWG"), is(ConductorSizes.awgMm2("4/0")));
    }

    @Test
    void aNegativeAreaHasNoNextSize() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ConductorSizes.nextAwgOrKcmil(-1));
        assertEquals("conductor area: found -1 mm2 - must be a finite number above 0", e.getMessage());
    }

    @Test
    void nextStandardSizes() {
        // IEC 60228 series
        assertThat(ConductorSizes.nextIecSizeMm2(51), is(70.0));
        assertThat(ConductorSizes.nextIecSizeMm2(70), is(70.0));
        assertThat(ConductorSizes.nextAwgOrKcmil(100), is("4/0 AWG"));
        assertThat(ConductorSizes.nextAwgOrKcmil(110), is("250 kcmil"));
    }

    @Test
    void unreadableSizeIsRefused() {
        CoordinationException e = assertThrows(CoordinationException.class, () -> ConductorSizes.parseMm2("big"));
        assertEquals("expected a size such as \"4/0 AWG\" or \"250 kcmil\", found 'big'", e.getMessage());
    }
}
