package coordination.core.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ChecksTest {

    /** The message form as it was first written: %.6g without trailing zeros. */
    private static String reference(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        String s = String.format(Locale.ROOT, "%.6g", value);
        if (Math.abs(value) < 1e9 && Math.abs(value) >= 1e-4 && !s.contains("e") && s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void numbersInMessagesReadAsTheJdkFormatterWrites(long seed) {
        // java.util.Formatter's %g is the reference: messages, reports and goldens were written with it
        Random random = new Random(seed);
        for (int i = 0; i < 100_000; i++) {
            double v = Math.pow(10, -5 + 15 * random.nextDouble()) * (random.nextBoolean() ? 1 : -1);
            assertEquals(reference(v), Checks.format(v), () -> "for " + v);
            // values with few digits, where half-way cases and trailing zeros live
            double w = Math.round(v * 1e3) / 1e3 + (random.nextInt(3) - 1) * 5e-7 * Math.abs(v);
            assertEquals(reference(w), Checks.format(w), () -> "for " + w);
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.15, 0.25, 1.0000005, 99999.95, 99999.4999, 99999.5, 999999.5, 1.2345650, 0.00012345650,
        0.0001, 0.00009999995, 12345.65, -0.5, 1e-4, 123456.7})
    void halfWayAndBoundaryValuesAgree(double v) {
        assertEquals(reference(v), Checks.format(v));
    }
}
