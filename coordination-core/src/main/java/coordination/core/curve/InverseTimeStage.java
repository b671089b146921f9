package coordination.core.curve;

import coordination.core.CoordinationException;
import coordination.core.internal.Checks;

/**
 * An inverse-time overcurrent stage in the general form of IEC 60255-151:2009, clause 5.4, and
 * IEEE C37.112: {@code t(I) = M * (A / ((I/Ip)^p - 1) + B)} for I above the pickup Ip, and no
 * operation at or below it.
 *
 * @param aSeconds constant A in seconds, above 0
 * @param bSeconds constant B in seconds, 0 or more
 * @param exponent exponent p, above 0
 * @param resetConstantSeconds reset constant tr in seconds, or NaN if none
 * @param pickupAmps pickup current Ip in amperes, above 0
 * @param multiplier time multiplier setting (TMS) or time dial (TD), above 0
 * @param multiplierKind whether the multiplier is a TMS or a time dial
 * @param multiplierRange the settings the relay offers for the multiplier
 * @param highCurrent behaviour above {@code upperMultiple * Ip}
 * @param upperMultiple multiple of pickup above which {@code highCurrent} applies, above 1
 * @param label a name for messages, e.g. the family key
 */
public record InverseTimeStage(
        double aSeconds,
        double bSeconds,
        double exponent,
        double resetConstantSeconds,
        double pickupAmps,
        double multiplier,
        MultiplierKind multiplierKind,
        SettingRange multiplierRange,
        HighCurrentBehaviour highCurrent,
        double upperMultiple,
        String label) implements RelayStage, Invertible {

    /** The upper multiple of pickup that IEC 60255-151 states for the curves (common practice: 20). */
    public static final double STANDARD_UPPER_MULTIPLE = 20.0;

    /**
     * Validates the parameters.
     *
     * @param aSeconds constant A in seconds, above 0
     * @param bSeconds constant B in seconds, 0 or more
     * @param exponent exponent p, above 0
     * @param resetConstantSeconds reset constant tr in seconds, or NaN if none
     * @param pickupAmps pickup current Ip in amperes, above 0
     * @param multiplier time multiplier setting (TMS) or time dial (TD), above 0
     * @param multiplierKind whether the multiplier is a TMS or a time dial
     * @param multiplierRange the settings the relay offers for the multiplier
     * @param highCurrent behaviour above {@code upperMultiple * Ip}
     * @param upperMultiple multiple of pickup above which {@code highCurrent} applies, above 1
     * @param label a name for messages, e.g. the family key
     * @throws IllegalArgumentException if a constant or setting is out of its range
     */
    public InverseTimeStage {
        if (label == null) {
            throw new IllegalArgumentException("inverse-time stage: label: found null - must be given");
        }
        Checks.positive(label + ": constant A", aSeconds, "s");
        Checks.nonNegative(label + ": constant B", bSeconds, "s");
        Checks.positive(label + ": exponent p", exponent, "");
        Checks.positive(label + ": pickup", pickupAmps, "A");
        Checks.positive(label + ": time multiplier", multiplier, "");
        if (!Double.isNaN(resetConstantSeconds)) {
            Checks.positive(label + ": reset constant", resetConstantSeconds, "s");
        }
        if (multiplierKind == null || multiplierRange == null) {
            throw new IllegalArgumentException(label + ": multiplier kind and range: found null - both must be given");
        }
        if (!(upperMultiple > 1.0) || !Double.isFinite(upperMultiple)) {
            throw new IllegalArgumentException(label + ": upper multiple: found " + Checks.format(upperMultiple)
                    + " - must be a finite number above 1");
        }
        if (highCurrent == null) {
            throw new IllegalArgumentException(label + ": high-current behaviour: found null - must be given");
        }
    }

    /**
     * A stage of a standard family, following the equation at all currents.
     *
     * @param family the standard curve
     * @param pickupAmps pickup current in amperes, above 0
     * @param multiplier TMS for IEC families, time dial for IEEE families, above 0
     * @return the stage, with the kind's default setting range widened to the multiplier if need be,
     *     and a band between following and holding above 20 times pickup
     * @throws IllegalArgumentException if a setting is out of range
     */
    public static InverseTimeStage of(InverseTimeFamily family, double pickupAmps, double multiplier) {
        MultiplierKind kind = family.multiplierKind();
        return new InverseTimeStage(family.aSeconds(), family.bSeconds(), family.exponent(), family.resetSeconds(),
                pickupAmps, multiplier, kind, defaultRange(family.key(), kind, multiplier), HighCurrentBehaviour.BAND,
                STANDARD_UPPER_MULTIPLE, family.key());
    }

    /**
     * A stage with constants of its own, in the general form.
     *
     * @param aSeconds constant A in seconds, above 0
     * @param bSeconds constant B in seconds, 0 or more
     * @param exponent exponent p, above 0
     * @param pickupAmps pickup in amperes, above 0
     * @param kind whether the multiplier is a TMS or a time dial
     * @param multiplier the multiplier, above 0
     * @return the stage, with a band between following and holding above 20 times pickup, and the
     *     kind's default range
     * @throws IllegalArgumentException if a constant or setting is out of range
     */
    public static InverseTimeStage custom(double aSeconds, double bSeconds, double exponent, double pickupAmps,
            MultiplierKind kind, double multiplier) {
        return new InverseTimeStage(aSeconds, bSeconds, exponent, Double.NaN, pickupAmps, multiplier, kind,
                defaultRange("custom", kind, multiplier), HighCurrentBehaviour.BAND, STANDARD_UPPER_MULTIPLE, "custom");
    }

    private static SettingRange defaultRange(String label, MultiplierKind kind, double multiplier) {
        if (kind == null) {
            throw new IllegalArgumentException(label + ": multiplier kind: found null - must be given");
        }
        Checks.positive(label + ": time multiplier", multiplier, "");
        return kind.defaultRange().including(multiplier);
    }

    /**
     * This stage with another behaviour above an upper multiple of pickup.
     *
     * @param behaviour what to do above {@code multiple * pickup}
     * @param multiple the upper multiple, above 1
     * @return the new stage
     */
    public InverseTimeStage withHighCurrent(HighCurrentBehaviour behaviour, double multiple) {
        return new InverseTimeStage(aSeconds, bSeconds, exponent, resetConstantSeconds, pickupAmps, multiplier,
                multiplierKind, multiplierRange, behaviour, multiple, label);
    }

    /**
     * This stage with another setting range for its multiplier.
     *
     * @param range the settings the relay offers
     * @return the new stage
     */
    public InverseTimeStage withMultiplierRange(SettingRange range) {
        return new InverseTimeStage(aSeconds, bSeconds, exponent, resetConstantSeconds, pickupAmps, multiplier,
                multiplierKind, range, highCurrent, upperMultiple, label);
    }

    /**
     * This stage with another time multiplier; the setting range stays as it is, so design aids
     * can probe values outside it.
     *
     * @param newMultiplier TMS or time dial, above 0
     * @return the new stage
     */
    public InverseTimeStage withMultiplier(double newMultiplier) {
        return new InverseTimeStage(aSeconds, bSeconds, exponent, resetConstantSeconds, pickupAmps, newMultiplier,
                multiplierKind, multiplierRange, highCurrent, upperMultiple, label);
    }

    /**
     * This stage with another pickup.
     *
     * @param newPickupAmps pickup in amperes, above 0
     * @return the new stage
     */
    public InverseTimeStage withPickupAmps(double newPickupAmps) {
        return new InverseTimeStage(aSeconds, bSeconds, exponent, resetConstantSeconds, newPickupAmps, multiplier,
                multiplierKind, multiplierRange, highCurrent, upperMultiple, label);
    }

    /**
     * The operating time by the equation, held above the upper multiple when the stage holds. A
     * {@link HighCurrentBehaviour#BAND} stage follows the equation here; a relay takes the band's
     * edges through {@link #edge}.
     */
    @Override
    public double seconds(double amps) {
        Curves.checkCurrent(amps);
        if (amps <= pickupAmps) {
            return Double.POSITIVE_INFINITY;
        }
        double m = amps / pickupAmps;
        if (highCurrent == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE && m > upperMultiple) {
            m = upperMultiple;
        }
        return atMultiple(m);
    }

    private double atMultiple(double m) {
        // expm1 keeps (M^p - 1) accurate for small p and M close to 1
        double denominator = Math.expm1(exponent * Math.log(m));
        return multiplier * (aSeconds / denominator + bSeconds);
    }

    /** @return whether the stage holds its time at a current, above its upper multiple */
    boolean heldAt(double amps) {
        return highCurrent == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE && amps / pickupAmps > upperMultiple;
    }

    /** @return the held time, {@link #seconds} wherever {@link #heldAt} is true, to the last bit */
    double heldSeconds() {
        return atMultiple(upperMultiple);
    }

    /**
     * The steepness {@code p / (1 - M^-p)} at the stretch's lowest multiple M: the slope of the
     * equation with B = 0, which B above 0 only lessens, and which falls as M rises. A held stretch
     * is flat.
     */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        if (toAmps <= pickupAmps) {
            return 0.0;
        }
        if (fromAmps <= pickupAmps) {
            // the time falls from infinity at the pickup
            return Double.POSITIVE_INFINITY;
        }
        double m = fromAmps / pickupAmps;
        if (highCurrent == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE && m >= upperMultiple) {
            return 0.0;
        }
        // widened by far more than the rounding of its own evaluation
        return (1 + Curves.SLOPE_MARGIN) * exponent / -Math.expm1(-exponent * Math.log(m));
    }

    /**
     * The steepness {@code p M^p A / ((M^p - 1)(A + B (M^p - 1)))} at the stretch's highest
     * multiple M, where it is least: both factors fall as M rises. A stretch that reaches a held
     * region, or starts at or below the pickup, has no floor; one below the pickup operates nowhere.
     */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        if (toAmps <= pickupAmps) {
            return Double.POSITIVE_INFINITY;
        }
        double m = toAmps / pickupAmps;
        if (fromAmps <= pickupAmps || highCurrent == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE && m > upperMultiple) {
            return 0.0;
        }
        double d = Math.expm1(exponent * Math.log(m));
        // narrowed by far more than the rounding of its own evaluation
        return (1 - Curves.SLOPE_MARGIN) * exponent * (d + 1) / d * (aSeconds / (aSeconds + bSeconds * d));
    }

    @Override
    public TimeCurrentCurve edge(Edge edge, RelayTolerance tolerance) {
        InverseTimeStage s = this;
        if (highCurrent == HighCurrentBehaviour.BAND) {
            s = withHighCurrent(edge == Edge.FAST ? HighCurrentBehaviour.FOLLOW_EQUATION
                    : HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE, upperMultiple);
        }
        if (tolerance.pickupFraction() > 0) {
            s = s.withPickupAmps(tolerance.pickupAmps(pickupAmps, edge));
        }
        if (tolerance.timeFraction() > 0 || tolerance.timeMinSeconds() > 0) {
            return new TolerancedInverse(s, tolerance, edge);
        }
        return s.highCurrent == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE ? new HeldInverse(s) : s;
    }

    /**
     * Reset time after the current falls to a value below pickup, from the electromechanical reset
     * characteristic of IEEE C37.112 (and IEC 60255-151, clause 5.5):
     * {@code t_r = M * tr / (1 - (I/Ip)^2)}.
     *
     * @param amps current in amperes, from 0 to below pickup
     * @return reset time in seconds
     * @throws CoordinationException if the stage has no reset constant
     * @throws IllegalArgumentException if the current is not below pickup
     */
    public double resetSeconds(double amps) {
        if (Double.isNaN(resetConstantSeconds)) {
            throw new CoordinationException(label + ": the curve defines no reset characteristic");
        }
        Curves.checkCurrent(amps);
        if (amps >= pickupAmps) {
            throw new IllegalArgumentException(label + ": reset current: found " + Checks.format(amps)
                    + " A - must be below the pickup of " + Checks.format(pickupAmps) + " A");
        }
        double m = amps / pickupAmps;
        return multiplier * resetConstantSeconds / (1.0 - m * m);
    }

    /**
     * The current at which the stage operates in a given time: the inverse of {@link #seconds}.
     *
     * @param seconds operating time in seconds
     * @return current in amperes, or NaN where no current gives that time (at or below the
     *     asymptote {@code M * B}, or inside a held region's flat time)
     */
    @Override
    public double currentAtSeconds(double seconds) {
        double reduced = seconds / multiplier - bSeconds;
        if (!(reduced > 0) || Double.isInfinite(seconds)) {
            return Double.NaN;
        }
        double m = Math.exp(Math.log1p(aSeconds / reduced) / exponent);
        if (highCurrent == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE && m > upperMultiple) {
            return Double.NaN;
        }
        return m * pickupAmps;
    }

    @Override
    public double[] breakpointsAmps() {
        if (highCurrent != HighCurrentBehaviour.FOLLOW_EQUATION) {
            return new double[] {pickupAmps, pickupAmps * upperMultiple};
        }
        return new double[] {pickupAmps};
    }

    @Override
    public String toString() {
        return label + " Ip=" + Checks.format(pickupAmps) + " A " + multiplierKind.key() + "="
                + Checks.format(multiplier);
    }
}
