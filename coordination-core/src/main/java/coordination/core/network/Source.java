package coordination.core.network;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A network feeder: the upstream system seen at a bus through its short-circuit power.
 *
 * @param id the source's id
 * @param bus the bus it feeds
 * @param skMaxMva initial symmetrical short-circuit power S″kQ for maximum currents, MVA
 * @param skMinMva the same for minimum currents, MVA
 * @param xOverR the ratio X/R of its impedance
 */
public record Source(String id, String bus, double skMaxMva, double skMinMva, double xOverR) implements Serializable {

    /**
     * Validates the source.
     *
     * @param id the source's id
     * @param bus the bus it feeds
     * @param skMaxMva initial symmetrical short-circuit power S″kQ for maximum currents, MVA
     * @param skMinMva the same for minimum currents, MVA
     * @param xOverR the ratio X/R of its impedance
     * @throws IllegalArgumentException if a value is missing or out of range
     */
    public Source {
        Checks.given("source: id", id);
        Checks.given("source '" + id + "': bus", bus);
        Checks.positive("source '" + id + "': sk_max_mva", skMaxMva, " MVA");
        Checks.positive("source '" + id + "': sk_min_mva", skMinMva, " MVA");
        Checks.positive("source '" + id + "': x_r", xOverR, "");
        if (skMinMva > skMaxMva) {
            throw new IllegalArgumentException("source '" + id + "': sk_min_mva " + skMinMva + " is above sk_max_mva "
                    + skMaxMva + " - must be at most sk_max_mva");
        }
    }
}
