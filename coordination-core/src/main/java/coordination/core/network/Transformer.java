package coordination.core.network;

import coordination.core.internal.Checks;
import java.io.Serializable;

/**
 * A two-winding transformer between an HV and an LV bus, rated at its buses' voltages.
 *
 * @param id the transformer's id
 * @param hvBus the HV bus
 * @param lvBus the LV bus
 * @param srKva rated power SrT, kVA
 * @param ukPercent short-circuit voltage ukr, %
 * @param pkKw load losses PkrT at rated current, kW
 * @param vectorGroup the vector group, e.g. Dyn11
 */
public record Transformer(String id, String hvBus, String lvBus, double srKva, double ukPercent, double pkKw,
        String vectorGroup) implements Serializable {

    /**
     * Validates the transformer.
     *
     * @param id the transformer's id
     * @param hvBus the HV bus
     * @param lvBus the LV bus
     * @param srKva rated power SrT, kVA
     * @param ukPercent short-circuit voltage ukr, %
     * @param pkKw load losses PkrT at rated current, kW
     * @param vectorGroup the vector group, e.g. Dyn11
     * @throws IllegalArgumentException if a value is missing or out of range
     */
    public Transformer {
        Checks.given("transformer: id", id);
        Checks.given("transformer '" + id + "': hv_bus", hvBus);
        Checks.given("transformer '" + id + "': lv_bus", lvBus);
        Checks.given("transformer '" + id + "': vector_group", vectorGroup);
        Checks.positive("transformer '" + id + "': sr_kva", srKva, " kVA");
        Checks.positive("transformer '" + id + "': uk_percent", ukPercent, " %");
        if (!(pkKw >= 0) || Double.isInfinite(pkKw)) {
            throw new IllegalArgumentException("transformer '" + id + "': pk_kw is " + pkKw + " - must be 0 or more");
        }
        // the resistive part cannot exceed the whole short-circuit impedance
        if (pkKw / srKva * 100 > ukPercent) {
            throw new IllegalArgumentException("transformer '" + id + "': pk_kw " + pkKw + " gives uRr "
                    + pkKw / srKva * 100 + " % above uk " + ukPercent + " % - must be below it");
        }
    }

    /**
     * Whether an LV phase-to-phase fault appears on the HV side as 2/√3 of the referred current in
     * one phase: a delta HV winding over a star LV winding (Dy, Dyn).
     *
     * @return whether the group is delta-star
     */
    public boolean deltaStar() {
        String g = vectorGroup.trim();
        return g.length() >= 2 && (g.charAt(0) == 'D' || g.charAt(0) == 'd')
                && (g.charAt(1) == 'y' || g.charAt(1) == 'Y');
    }
}
