package coordination.core.curve;

import coordination.core.internal.Checks;
import java.util.OptionalDouble;

/**
 * A fuse given by its digitised melting (pre-arcing) and total-clearing curves. The melting curve
 * is the minimum curve and the clearing curve the maximum; where only one is known, give it twice.
 */
public final class Fuse implements ProtectiveDevice {
    private final String id;
    private final double ratingAmps;
    private final TabulatedCurve melting;
    private final TabulatedCurve clearing;
    private final OptionalDouble clearingI2t;

    /**
     * Creates a fuse.
     *
     * @param id identifier
     * @param ratingAmps rated current in amperes, above 0
     * @param melting melting curve
     * @param clearing total-clearing curve
     * @param clearingI2tA2s stated total let-through I²t in A²s for currents above the clearing
     *     curve's last point, or empty
     * @throws IllegalArgumentException if the rating or the I²t is not above 0, or if the clearing
     *     curve lies below the melting curve at a shared current
     */
    public Fuse(String id, double ratingAmps, TabulatedCurve melting, TabulatedCurve clearing,
            OptionalDouble clearingI2tA2s) {
        this.id = Checks.given("fuse: id", id);
        Checks.given("fuse '" + id + "': melting curve", melting);
        Checks.given("fuse '" + id + "': clearing curve", clearing);
        Checks.given("fuse '" + id + "': clearing I2t", clearingI2tA2s);
        this.ratingAmps = Checks.positive("fuse '" + id + "': rating", ratingAmps, "A");
        if (clearingI2tA2s.isPresent()) {
            Checks.positive("fuse '" + id + "': clearing I2t", clearingI2tA2s.getAsDouble(), "A2s");
        }
        for (double a : melting.amps()) {
            if (clearing.isDefinedAt(a) && clearing.seconds(a) < melting.seconds(a)) {
                throw new IllegalArgumentException("fuse '" + id + "': clearing time " + Checks.format(clearing.seconds(a))
                        + " s at " + Checks.format(a) + " A is below the melting time " + Checks.format(melting.seconds(a))
                        + " s; clearing must not be faster than melting");
            }
        }
        this.melting = melting;
        this.clearing = clearing;
        this.clearingI2t = clearingI2tA2s;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public DeviceKind kind() {
        return DeviceKind.FUSE;
    }

    /** @return rated current in amperes */
    public double ratingAmps() {
        return ratingAmps;
    }

    @Override
    public TabulatedCurve minimumCurve() {
        return melting;
    }

    @Override
    public TabulatedCurve maximumCurve() {
        return clearing;
    }

    @Override
    public OptionalDouble clearingI2tA2s() {
        return clearingI2t;
    }

    @Override
    public String toString() {
        return "fuse '" + id + "'";
    }
}
