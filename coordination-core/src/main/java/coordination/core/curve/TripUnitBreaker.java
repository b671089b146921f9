package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A low-voltage circuit breaker with an electronic trip unit: long-time (Ir, tr), optional
 * short-time (Isd, tsd, optional I²t ramp) and optional instantaneous (Ii) protection, with a
 * tolerance band that gives the minimum and maximum curves.
 *
 * <p>The long-time delay tr is the time at 6 Ir (the convention of IEC 60947-2 makers' data), so the
 * long-time region is {@code t = tr * (6 Ir)² / I²}. The long-time band runs from the conventional
 * non-tripping to the conventional tripping current of IEC 60947-2, Table 6 (1.05 Ir and 1.30 Ir,
 * from memory). The short-time ramp, when on, has constant I²t through the point (10 Ir, tsd)
 * (common practice). Times and short-time/instantaneous pickups spread by the stated tolerances;
 * without a stated pickup tolerance, the +/-20 % of IEC 60947-2 (a release trips at 120 % of its
 * setting at most, and not below 80 %).
 *
 * @param id identifier
 * @param settings the trip unit's settings
 */
public record TripUnitBreaker(String id, Settings settings) implements ProtectiveDevice {

    /**
     * Pickup tolerance of short-time and instantaneous releases where none is stated: the +/-20 % that
     * IEC 60947-2 allows (from memory). A maker's tighter figure may be stated instead.
     */
    public static final double DEFAULT_PICKUP_TOLERANCE = 0.20;

    /** Multiple of Ir at which tr is stated (common practice). */
    public static final double LONG_TIME_REFERENCE_MULTIPLE = 6.0;
    /** Multiple of Ir through which the short-time I²t ramp passes at tsd (common practice). */
    public static final double SHORT_TIME_RAMP_MULTIPLE = 10.0;

    /**
     * Settings of an electronic trip unit.
     *
     * @param irAmps long-time pickup Ir in amperes, above 0
     * @param trSeconds long-time delay at 6 Ir in seconds, above 0
     * @param isdAmps short-time pickup Isd in amperes, or infinity for none
     * @param tsdSeconds short-time delay in seconds, 0 or more
     * @param shortTimeI2t whether the short-time I²t ramp is on
     * @param iiAmps instantaneous pickup Ii in amperes, or infinity for none
     * @param instantaneousMinSeconds fastest instantaneous clearing time in seconds
     * @param instantaneousMaxSeconds slowest instantaneous clearing time in seconds
     * @param longTimeLowMultiple lower edge of the long-time pickup band as a multiple of Ir
     * @param longTimeHighMultiple upper edge of the long-time pickup band as a multiple of Ir
     * @param pickupTolerance relative tolerance of Isd and Ii, from 0 to below 1
     * @param timeTolerance relative tolerance of tr and tsd, from 0 to below 1
     */
    public record Settings(double irAmps, double trSeconds, double isdAmps, double tsdSeconds, boolean shortTimeI2t,
            double iiAmps, double instantaneousMinSeconds, double instantaneousMaxSeconds, double longTimeLowMultiple,
            double longTimeHighMultiple, double pickupTolerance, double timeTolerance) implements Serializable {

        /**
         * Validates the settings.
         *
         * @param irAmps long-time pickup Ir in amperes, above 0
         * @param trSeconds long-time delay at 6 Ir in seconds, above 0
         * @param isdAmps short-time pickup Isd in amperes, or infinity for none
         * @param tsdSeconds short-time delay in seconds, 0 or more
         * @param shortTimeI2t whether the short-time I²t ramp is on
         * @param iiAmps instantaneous pickup Ii in amperes, or infinity for none
         * @param instantaneousMinSeconds fastest instantaneous clearing time in seconds
         * @param instantaneousMaxSeconds slowest instantaneous clearing time in seconds
         * @param longTimeLowMultiple lower edge of the long-time pickup band as a multiple of Ir
         * @param longTimeHighMultiple upper edge of the long-time pickup band as a multiple of Ir
         * @param pickupTolerance relative tolerance of Isd and Ii, from 0 to below 1
         * @param timeTolerance relative tolerance of tr and tsd, from 0 to below 1
         * @throws IllegalArgumentException if a setting is out of range
         */
        public Settings {
            Checks.positive("trip unit: Ir", irAmps, "A");
            Checks.positive("trip unit: tr", trSeconds, "s");
            Checks.nonNegative("trip unit: tsd", tsdSeconds, "s");
            Checks.nonNegative("trip unit: fastest instantaneous time", instantaneousMinSeconds, "s");
            Checks.nonNegative("trip unit: slowest instantaneous time", instantaneousMaxSeconds, "s");
            if (instantaneousMaxSeconds < instantaneousMinSeconds) {
                throw new IllegalArgumentException("trip unit: slowest instantaneous time: found "
                        + Checks.format(instantaneousMaxSeconds) + " s - must be at least the fastest, "
                        + Checks.format(instantaneousMinSeconds) + " s");
            }
            Checks.inRange("trip unit: long-time band low multiple", longTimeLowMultiple, 1.0, 2.0, "");
            Checks.inRange("trip unit: long-time band high multiple", longTimeHighMultiple, longTimeLowMultiple, 2.0, "");
            Checks.inRange("trip unit: pickup tolerance", pickupTolerance, 0.0, 0.5, "");
            Checks.inRange("trip unit: time tolerance", timeTolerance, 0.0, 0.5, "");
            if (!(isdAmps > irAmps)) {
                throw new IllegalArgumentException("trip unit: Isd: found " + Checks.format(isdAmps)
                        + " A - must be above Ir, " + Checks.format(irAmps) + " A");
            }
            if (shortTimeI2t && !(tsdSeconds > 0)) {
                throw new IllegalArgumentException("trip unit: tsd: found " + Checks.format(tsdSeconds)
                        + " s - the short-time I2t ramp needs a delay above 0 s");
            }
            if (!(iiAmps > irAmps)) {
                throw new IllegalArgumentException("trip unit: Ii: found " + Checks.format(iiAmps)
                        + " A - must be above Ir, " + Checks.format(irAmps) + " A");
            }
        }

        /**
         * Settings with the tolerances stated in the class documentation (band 1.05 to 1.30 Ir,
         * ±20 % on Isd and Ii, ±20 % on times) and an instantaneous clearing band of 10 ms to 50 ms.
         *
         * @param irAmps Ir in amperes
         * @param trSeconds tr at 6 Ir in seconds
         * @param isdAmps Isd in amperes, or infinity
         * @param tsdSeconds tsd in seconds
         * @param shortTimeI2t whether the short-time ramp is on
         * @param iiAmps Ii in amperes, or infinity
         * @return the settings
         */
        public static Settings of(double irAmps, double trSeconds, double isdAmps, double tsdSeconds,
                boolean shortTimeI2t, double iiAmps) {
            return new Settings(irAmps, trSeconds, isdAmps, tsdSeconds, shortTimeI2t, iiAmps, 0.01, 0.05, 1.05, 1.30,
                    DEFAULT_PICKUP_TOLERANCE, 0.20);
        }
    }

    /**
     * Validates the parts.
     *
     * @param id identifier
     * @param settings the trip unit's settings
     * @throws IllegalArgumentException if a part is missing
     */
    public TripUnitBreaker {
        if (id == null || settings == null) {
            throw new IllegalArgumentException("breaker: found a null id or settings - both must be given");
        }
        // build both edges now, so that a combination of settings that cannot be drawn fails here
        edge(id, settings, -1);
        edge(id, settings, +1);
    }

    @Override
    public DeviceKind kind() {
        return DeviceKind.BREAKER;
    }

    @Override
    public TripUnitCurve minimumCurve() {
        return edge(id, settings, -1);
    }

    @Override
    public TripUnitCurve maximumCurve() {
        return edge(id, settings, +1);
    }

    private static TripUnitCurve edge(String id, Settings s, int side) {
        double timeFactor = 1 + side * s.timeTolerance();
        double pickupFactor = 1 + side * s.pickupTolerance();
        double ltPickup = s.irAmps() * (side < 0 ? s.longTimeLowMultiple() : s.longTimeHighMultiple());
        double ref = LONG_TIME_REFERENCE_MULTIPLE * s.irAmps();
        double ltI2t = s.trSeconds() * timeFactor * ref * ref;
        double tsd = s.tsdSeconds() * timeFactor;
        double ramp = Double.NaN;
        if (s.shortTimeI2t()) {
            double rampRef = SHORT_TIME_RAMP_MULTIPLE * s.irAmps();
            ramp = tsd * rampRef * rampRef;
        }
        return new TripUnitCurve(ltPickup, ltI2t, s.isdAmps() * pickupFactor, tsd, ramp, s.iiAmps() * pickupFactor,
                side < 0 ? s.instantaneousMinSeconds() : s.instantaneousMaxSeconds(),
                "breaker '" + id + "' " + (side < 0 ? "minimum" : "maximum"));
    }

    @Override
    public String toString() {
        return "breaker '" + id + "'";
    }
}
