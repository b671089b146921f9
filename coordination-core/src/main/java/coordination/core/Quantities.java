package coordination.core;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * How quantities are written for people: inputs as the study gave them, computed values
 * to a stated number of significant figures, currents in A or kA. JSON keeps full precision and is
 * written by the report writer, not here.
 */
public final class Quantities {
    private Quantities() {
    }

    /**
     * A number as it was given: the shortest decimal that reads back as the same double, without
     * an exponent or trailing zeros ({@code 0.15}, {@code 1600}, {@code 42.66}).
     *
     * @param value a finite number
     * @return its text; {@code infinity}, {@code -infinity} or {@code NaN} otherwise
     */
    public static String asGiven(double value) {
        if (!Double.isFinite(value)) {
            return nonFinite(value);
        }
        if (value == 0) {
            return "0";
        }
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /**
     * A computed number rounded to significant figures, without trailing zeros; below 1e-4 and from
     * 1e9 on, in exponent form ({@code 1.23e-05}).
     *
     * @param value the number
     * @param digits significant figures, 1 or more
     * @return its text
     */
    public static String significant(double value, int digits) {
        if (!Double.isFinite(value)) {
            return nonFinite(value);
        }
        if (value == 0) {
            return "0";
        }
        double abs = Math.abs(value);
        if (abs < 1e-4 || abs >= 1e9) {
            String s = String.format(Locale.ROOT, "%." + Math.max(0, digits - 1) + "e", value);
            int e = s.indexOf('e');
            String mantissa = s.substring(0, e);
            if (mantissa.contains(".")) {
                mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            return mantissa + s.substring(e);
        }
        return BigDecimal.valueOf(value).round(new MathContext(digits, RoundingMode.HALF_UP)).stripTrailingZeros()
                .toPlainString();
    }

    /**
     * A current in kiloamperes, the number only.
     *
     * @param amps current in amperes
     * @param digits significant figures
     * @return e.g. {@code 5.55} for 5548 A at three figures
     */
    public static String kiloamps(double amps, int digits) {
        return significant(amps / 1000, digits);
    }

    /**
     * A current with its unit: kA from 1 kA, A below.
     *
     * @param amps current in amperes
     * @param digits significant figures
     * @return e.g. {@code 5.55 kA} or {@code 950 A}
     */
    public static String current(double amps, int digits) {
        return Math.abs(amps) >= 1000 ? kiloamps(amps, digits) + " kA" : significant(amps, digits) + " A";
    }

    private static String nonFinite(double value) {
        return Double.isNaN(value) ? "NaN" : value > 0 ? "infinity" : "-infinity";
    }
}
