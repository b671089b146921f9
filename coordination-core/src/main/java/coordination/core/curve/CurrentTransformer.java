package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A protection current transformer by its rated primary and secondary currents.
 *
 * @param primaryAmps rated primary current in amperes, above 0
 * @param secondaryAmps rated secondary current in amperes, above 0 (commonly 1 A or 5 A)
 */
public record CurrentTransformer(double primaryAmps, double secondaryAmps) implements Serializable {

    /**
     * Validates the ratings.
     *
     * @param primaryAmps rated primary current in amperes, above 0
     * @param secondaryAmps rated secondary current in amperes, above 0 (commonly 1 A or 5 A)
     * @throws IllegalArgumentException if a rating is not a positive finite number
     */
    public CurrentTransformer {
        Checks.positive("current transformer: primary", primaryAmps, "A");
        Checks.positive("current transformer: secondary", secondaryAmps, "A");
    }

    /** @return primary amperes per secondary ampere */
    public double ratio() {
        return primaryAmps / secondaryAmps;
    }
}
