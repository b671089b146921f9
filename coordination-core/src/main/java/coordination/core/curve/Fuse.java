package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serial;
import java.io.Serializable;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A fuse given by its digitised melting (pre-arcing) and total-clearing curves. The melting curve
 * is the minimum curve and the clearing curve the maximum; where only one is known, give it twice.
 * Above the digitised curves a current-limiting fuse is described by energies: its total
 * let-through (for cable checks) and its pre-arcing I²t (for grading by energy), each stated by
 * the maker against prospective current. Its utilization category (IEC 60269-1: gG, aM, ...) and
 * series matter for the rating-ratio rule of selectivity.
 */
public final class Fuse implements ProtectiveDevice {
    @Serial
    private static final long serialVersionUID = 1L;

    private final String id;
    private final double ratingAmps;
    private final TabulatedCurve melting;
    private final TabulatedCurve clearing;
    private final Optional<LetThroughEnergy> letThrough;
    private final Optional<LetThroughEnergy> preArcing;
    private final Optional<String> category;
    private final Optional<String> series;

    /**
     * Creates a fuse with a single stated let-through I²t, or none.
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
        this(id, ratingAmps, melting, clearing, Checks.given("fuse '" + id + "': clearing I2t", clearingI2tA2s)
                .isPresent() ? Optional.of(LetThroughEnergy.constant(clearingI2tA2s.getAsDouble())) : Optional.empty(),
                Optional.empty(), Optional.empty(), Optional.empty());
    }

    /**
     * Creates a fuse.
     *
     * @param id identifier
     * @param ratingAmps rated current in amperes, above 0
     * @param melting melting curve
     * @param clearing total-clearing curve
     * @param letThrough the maker's total let-through energy, or empty
     * @param preArcing the maker's pre-arcing energy, or empty
     * @param category utilization category of IEC 60269-1 (gG, gM, aM, gR, aR, gD, gN), or empty
     * @param series the maker's series, or empty
     * @throws IllegalArgumentException if a part is missing, the rating is not above 0, or the
     *     clearing curve lies below the melting curve at a shared current
     */
    public Fuse(String id, double ratingAmps, TabulatedCurve melting, TabulatedCurve clearing,
            Optional<LetThroughEnergy> letThrough, Optional<LetThroughEnergy> preArcing, Optional<String> category,
            Optional<String> series) {
        this.id = Checks.given("fuse: id", id);
        Checks.given("fuse '" + id + "': melting curve", melting);
        Checks.given("fuse '" + id + "': clearing curve", clearing);
        this.letThrough = Checks.given("fuse '" + id + "': let-through energy", letThrough);
        this.preArcing = Checks.given("fuse '" + id + "': pre-arcing energy", preArcing);
        this.category = Checks.given("fuse '" + id + "': category", category);
        this.series = Checks.given("fuse '" + id + "': series", series);
        this.ratingAmps = Checks.positive("fuse '" + id + "': rating", ratingAmps, "A");
        for (double a : melting.amps()) {
            if (clearing.isDefinedAt(a) && clearing.seconds(a) < melting.seconds(a)) {
                throw new IllegalArgumentException("fuse '" + id + "': clearing time " + Checks.format(clearing.seconds(a))
                        + " s at " + Checks.format(a) + " A is below the melting time " + Checks.format(melting.seconds(a))
                        + " s; clearing must not be faster than melting");
            }
        }
        this.melting = melting;
        this.clearing = clearing;
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
    public Optional<LetThroughEnergy> letThrough() {
        return letThrough;
    }

    @Override
    public Optional<LetThroughEnergy> preArcing() {
        return preArcing;
    }

    /** @return the utilization category of IEC 60269-1, e.g. {@code gG}, if stated */
    public Optional<String> category() {
        return category;
    }

    /** @return the maker's series, if stated */
    public Optional<String> series() {
        return series;
    }

    @Override
    public String toString() {
        return "fuse '" + id + "'";
    }

    /** The inputs go, without optionals; the constructor checks them again on reading. */
    private record SerialForm(String id, double ratingAmps, TabulatedCurve melting, TabulatedCurve clearing,
            LetThroughEnergy letThrough, LetThroughEnergy preArcing, String category, String series)
            implements Serializable {
        @Serial
        private Object readResolve() {
            return new Fuse(id, ratingAmps, melting, clearing, Optional.ofNullable(letThrough),
                    Optional.ofNullable(preArcing), Optional.ofNullable(category), Optional.ofNullable(series));
        }
    }

    @Serial
    private Object writeReplace() {
        return new SerialForm(id, ratingAmps, melting, clearing, letThrough.orElse(null), preArcing.orElse(null),
                category.orElse(null), series.orElse(null));
    }

    @Serial
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw new InvalidObjectException("a fuse is read through its serial form");
    }
}
