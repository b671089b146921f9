package coordination.core.margin;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * Heating by the decaying DC component of a short-circuit current, as the factor m of
 * IEC 60909-0:2016, clause 12 (thermal equivalent short-circuit current; formula from memory):
 *
 * <pre>m = 1 / (2 f T ln(κ - 1)) × (e^(4 f T ln(κ - 1)) - 1)</pre>
 *
 * With the AC factor n = 1 (far from generators) the thermal equivalent current is
 * {@code Ith = Ik'' √(m + n)}, so the fault heats the conductor as a steady current for
 * {@code (1 + m) T}; this holds at every duration, and m falls towards 0 as T grows. As κ approaches
 * 2 the formula becomes 0/0; its limit, m = 2, is taken there through {@code expm1(x)/x}.
 *
 * @param kappa peak factor κ of the fault current, above 1 and at most 2
 * @param frequencyHz system frequency in Hz, above 0
 */
public record DcOffset(double kappa, double frequencyHz) implements Serializable {

    /** The peak factor assumed where a study states neither κ nor X/R: 1.8 (common practice). */
    public static final double ASSUMED_KAPPA = 1.8;

    /**
     * The peak factor of IEC 60909-0:2016, equation (55): {@code κ = 1.02 + 0.98 e^(-3R/X)}.
     *
     * @param xOverR the ratio X/R at the fault location, above 0
     * @return κ, from 1.02 to 2
     * @throws IllegalArgumentException if X/R is not a positive finite number
     */
    public static double kappa(double xOverR) {
        Checks.positive("X/R", xOverR, "");
        return 1.02 + 0.98 * Math.exp(-3.0 / xOverR);
    }

    /**
     * DC-offset heating for a fault location's X/R.
     *
     * @param xOverR X/R, above 0
     * @param frequencyHz system frequency in Hz
     * @return the heating
     */
    public static DcOffset fromXOverR(double xOverR, double frequencyHz) {
        return new DcOffset(kappa(xOverR), frequencyHz);
    }

    /**
     * Validates the parameters.
     *
     * @param kappa peak factor κ of the fault current, above 1 and at most 2
     * @param frequencyHz system frequency in Hz, above 0
     * @throws IllegalArgumentException if κ is not in (1, 2] or the frequency is not above 0
     */
    public DcOffset {
        if (!(kappa > 1.0 && kappa <= 2.0)) {
            throw new IllegalArgumentException("peak factor kappa: found " + Checks.format(kappa)
                    + " - must be above 1 and at most 2");
        }
        Checks.positive("frequency", frequencyHz, "Hz");
    }

    /**
     * The factor m for a fault duration.
     *
     * @param seconds fault duration T in seconds, above 0
     * @return m, from 0 to 2
     */
    public double m(double seconds) {
        double x = 4.0 * frequencyHz * seconds * Math.log(kappa - 1.0);
        if (Math.abs(x) < 1e-9) {
            return 2.0 * (1.0 + x / 2.0);
        }
        return 2.0 * Math.expm1(x) / x;
    }
}
