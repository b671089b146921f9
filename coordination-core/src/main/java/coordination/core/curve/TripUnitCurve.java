package coordination.core.curve;

import coordination.core.internal.Checks;

/**
 * One edge (minimum or maximum) of an electronic trip unit's band: a long-time region of constant
 * I²t, an optional short-time region (flat, or with an I²t ramp that meets the flat delay), and an
 * optional instantaneous region. The fastest applicable region sets the time:
 *
 * <ul>
 *   <li>long time, I above {@code longTimePickupAmps}: {@code t = longTimeI2t / I²};</li>
 *   <li>short time, I at or above {@code shortTimePickupAmps}: {@code t = shortTimeSeconds}, or
 *       {@code max(shortTimeSeconds, shortTimeRampI2t / I²)} with the ramp;</li>
 *   <li>instantaneous, I at or above {@code instantaneousPickupAmps}: {@code t = instantaneousSeconds}.</li>
 * </ul>
 *
 * No region clears faster than {@code instantaneousSeconds}: the breaker's own opening and
 * arcing time bounds every trip, so the constant-I²t regions are held at it where they would fall
 * below it.
 *
 * @param longTimePickupAmps long-time pickup in amperes, above 0
 * @param longTimeI2tA2s long-time constant I²t in A²s, above 0
 * @param shortTimePickupAmps short-time pickup in amperes, or infinity for none
 * @param shortTimeSeconds short-time flat delay in seconds, 0 or more
 * @param shortTimeRampI2tA2s short-time ramp I²t in A²s, or NaN for a flat delay
 * @param instantaneousPickupAmps instantaneous pickup in amperes, or infinity for none
 * @param instantaneousSeconds instantaneous clearing time in seconds, 0 or more
 * @param label a name for messages
 */
public record TripUnitCurve(
        double longTimePickupAmps,
        double longTimeI2tA2s,
        double shortTimePickupAmps,
        double shortTimeSeconds,
        double shortTimeRampI2tA2s,
        double instantaneousPickupAmps,
        double instantaneousSeconds,
        String label) implements TimeCurrentCurve {

    /**
     * Validates the settings.
     *
     * @param longTimePickupAmps long-time pickup in amperes, above 0
     * @param longTimeI2tA2s long-time constant I²t in A²s, above 0
     * @param shortTimePickupAmps short-time pickup in amperes, or infinity for none
     * @param shortTimeSeconds short-time flat delay in seconds, 0 or more
     * @param shortTimeRampI2tA2s short-time ramp I²t in A²s, or NaN for a flat delay
     * @param instantaneousPickupAmps instantaneous pickup in amperes, or infinity for none
     * @param instantaneousSeconds instantaneous clearing time in seconds, 0 or more
     * @param label a name for messages
     * @throws IllegalArgumentException if a setting is out of its range
     */
    public TripUnitCurve {
        Checks.given("trip unit curve: label", label);
        Checks.positive(label + ": long-time pickup", longTimePickupAmps, "A");
        Checks.positive(label + ": long-time I2t", longTimeI2tA2s, "A2s");
        if (!(shortTimePickupAmps > 0)) {
            throw new IllegalArgumentException(label + ": short-time pickup: found " + Checks.format(shortTimePickupAmps)
                    + " A - must be above 0 A");
        }
        Checks.nonNegative(label + ": short-time delay", shortTimeSeconds, "s");
        if (!Double.isNaN(shortTimeRampI2tA2s)) {
            Checks.positive(label + ": short-time ramp I2t", shortTimeRampI2tA2s, "A2s");
        }
        if (!(instantaneousPickupAmps > 0)) {
            throw new IllegalArgumentException(label + ": instantaneous pickup: found "
                    + Checks.format(instantaneousPickupAmps) + " A - must be above 0 A");
        }
        Checks.nonNegative(label + ": instantaneous time", instantaneousSeconds, "s");
    }

    @Override
    public double seconds(double amps) {
        Curves.checkCurrent(amps);
        double t = Double.POSITIVE_INFINITY;
        if (amps > longTimePickupAmps) {
            t = longTimeI2tA2s / (amps * amps);
        }
        if (amps >= shortTimePickupAmps) {
            double st = Double.isNaN(shortTimeRampI2tA2s)
                    ? shortTimeSeconds
                    : Math.max(shortTimeSeconds, shortTimeRampI2tA2s / (amps * amps));
            t = Math.min(t, st);
        }
        if (amps >= instantaneousPickupAmps) {
            t = Math.min(t, instantaneousSeconds);
        }
        return Double.isInfinite(t) ? t : Math.max(t, instantaneousSeconds);
    }

    @Override
    public double[] breakpointsAmps() {
        double[] b = new double[6];
        int n = 0;
        b[n++] = longTimePickupAmps;
        if (instantaneousSeconds > 0) {
            // where the long-time region reaches the opening-time floor
            b[n++] = Math.sqrt(longTimeI2tA2s / instantaneousSeconds);
        }
        if (Double.isFinite(shortTimePickupAmps)) {
            b[n++] = shortTimePickupAmps;
            if (!Double.isNaN(shortTimeRampI2tA2s) && shortTimeSeconds > 0) {
                b[n++] = Math.sqrt(shortTimeRampI2tA2s / shortTimeSeconds);
            }
            if (shortTimeSeconds > 0) {
                double handover = Math.sqrt(longTimeI2tA2s / shortTimeSeconds);
                if (handover > shortTimePickupAmps) {
                    b[n++] = handover;
                }
            }
        }
        if (Double.isFinite(instantaneousPickupAmps)) {
            b[n++] = instantaneousPickupAmps;
        }
        return Curves.union(java.util.Arrays.copyOf(b, n));
    }

    @Override
    public String toString() {
        return label;
    }
}
