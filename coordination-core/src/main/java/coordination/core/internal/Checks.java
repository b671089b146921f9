package coordination.core.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/** Argument checks that produce the project's "found ... - must be ..." messages. */
public final class Checks {
    private static final MathContext SIX_DIGITS = new MathContext(6, RoundingMode.HALF_UP);

    private Checks() {
    }

    /**
     * Requires a finite value strictly above zero.
     *
     * @param subject the subject and parameter name, e.g. {@code "stage pickup"}
     * @param value the value
     * @param unit its unit, e.g. {@code "A"}
     * @return the value
     * @throws IllegalArgumentException if the value is not finite or not above zero
     */
    public static double positive(String subject, double value, String unit) {
        if (!isPositive(value)) {
            throw new IllegalArgumentException(
                    subject + ": found " + format(value) + unitSuffix(unit) + " - must be a finite number above 0");
        }
        return value;
    }

    private static boolean isPositive(double value) {
        return value > 0 && Double.isFinite(value);
    }

    /**
     * Requires a finite value at or above zero.
     *
     * @param subject the subject and parameter name
     * @param value the value
     * @param unit its unit
     * @return the value
     * @throws IllegalArgumentException if the value is negative or not finite
     */
    public static double nonNegative(String subject, double value, String unit) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(
                    subject + ": found " + format(value) + unitSuffix(unit) + " - must be a finite number of 0 or more");
        }
        return value;
    }

    /**
     * Requires a finite value inside a closed range.
     *
     * @param subject the subject and parameter name
     * @param value the value
     * @param min the smallest allowed value
     * @param max the largest allowed value
     * @param unit its unit
     * @return the value
     * @throws IllegalArgumentException if the value lies outside [min, max] or is not finite
     */
    public static double inRange(String subject, double value, double min, double max, String unit) {
        if (!(value >= min && value <= max)) {
            throw new IllegalArgumentException(subject + ": found " + format(value) + unitSuffix(unit)
                    + " - must be from " + format(min) + " to " + format(max) + unitSuffix(unit));
        }
        return value;
    }

    /**
     * Requires an argument to be given.
     *
     * @param subject the subject and argument name, e.g. {@code "fuse: id"}
     * @param value the argument
     * @param <T> its type
     * @return the argument
     * @throws IllegalArgumentException if it is null
     */
    public static <T> T given(String subject, T value) {
        if (value == null) {
            throw new IllegalArgumentException(subject + ": found null - must be given");
        }
        return value;
    }

    /**
     * Requires a range of currents: both ends finite and above zero, the upper at or above the lower.
     *
     * @param subject what the range is, e.g. {@code "check range"}
     * @param fromAmps lower end in amperes
     * @param toAmps upper end in amperes
     * @throws IllegalArgumentException if an end is not positive or the range is inverted
     */
    public static void currentRange(String subject, double fromAmps, double toAmps) {
        // the messages are built only for a failure: a check runs this on every call
        if (!isPositive(fromAmps)) {
            positive(subject + ": lowest current", fromAmps, "A");
        }
        if (!isPositive(toAmps)) {
            positive(subject + ": highest current", toAmps, "A");
        }
        if (toAmps < fromAmps) {
            throw new IllegalArgumentException(subject + ": highest current " + format(toAmps)
                    + " A is below the lowest " + format(fromAmps) + " A - must be at or above it");
        }
    }

    /**
     * Formats a number for a message: up to six significant digits, no exponent for ordinary values.
     *
     * @param value the number
     * @return its text
     */
    public static String format(double value) {
        if (Double.isNaN(value)) {
            return "NaN";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "infinity" : "-infinity";
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        double abs = Math.abs(value);
        if (abs >= 1e-4 && abs < 99999.5) {
            // what %.6g gives here (half-up on the shortest decimal digits, then no trailing zeros),
            // without the formatter's and the regular expressions' cost on the derivation's path
            return new BigDecimal(Double.toString(value)).round(SIX_DIGITS).stripTrailingZeros().toPlainString();
        }
        if (abs >= 1e-4 && abs < 1e9) {
            String s = String.format(Locale.ROOT, "%.6g", value);
            if (s.contains("e") || s.contains("E")) {
                return s;
            }
            if (s.contains(".")) {
                s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            return s;
        }
        return String.format(Locale.ROOT, "%.6g", value);
    }

    private static String unitSuffix(String unit) {
        return unit.isEmpty() ? "" : " " + unit;
    }
}
