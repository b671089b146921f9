package coordination.core.cable;

import java.util.Map;
import java.util.OptionalDouble;

/**
 * The maximum DC resistance at 20 °C of stranded (class 2) conductors, IEC 60228 Table 2, in
 * Ω/km (values from memory): the default resistance of a cable branch when the study gives none.
 * The table's maximum is the conservative side for the minimum fault current, not for the maximum;
 * a stated resistance is better.
 */
public final class ConductorResistance {
    /** Reactance per conductor of a low-voltage multicore cable, Ω/km (common practice). */
    public static final double DEFAULT_REACTANCE_OHM_PER_KM = 0.08;

    private static final Map<Double, Double> COPPER = Map.ofEntries(Map.entry(1.5, 12.1), Map.entry(2.5, 7.41),
            Map.entry(4.0, 4.61), Map.entry(6.0, 3.08), Map.entry(10.0, 1.83), Map.entry(16.0, 1.15),
            Map.entry(25.0, 0.727), Map.entry(35.0, 0.524), Map.entry(50.0, 0.387), Map.entry(70.0, 0.268),
            Map.entry(95.0, 0.193), Map.entry(120.0, 0.153), Map.entry(150.0, 0.124), Map.entry(185.0, 0.0991),
            Map.entry(240.0, 0.0754), Map.entry(300.0, 0.0601), Map.entry(400.0, 0.0470), Map.entry(500.0, 0.0366),
            Map.entry(630.0, 0.0283), Map.entry(800.0, 0.0221), Map.entry(1000.0, 0.0176));
    private static final Map<Double, Double> ALUMINIUM = Map.ofEntries(Map.entry(16.0, 1.91), Map.entry(25.0, 1.20),
            Map.entry(35.0, 0.868), Map.entry(50.0, 0.641), Map.entry(70.0, 0.443), Map.entry(95.0, 0.320),
            Map.entry(120.0, 0.253), Map.entry(150.0, 0.206), Map.entry(185.0, 0.164), Map.entry(240.0, 0.125),
            Map.entry(300.0, 0.100), Map.entry(400.0, 0.0778), Map.entry(500.0, 0.0605), Map.entry(630.0, 0.0469),
            Map.entry(800.0, 0.0367), Map.entry(1000.0, 0.0291));

    private ConductorResistance() {
    }

    /**
     * The table's resistance of a size.
     *
     * @param material copper or aluminium
     * @param mm2 a nominal cross-section of IEC 60228
     * @return Ω/km at 20 °C, or empty for a size or material the table does not hold
     */
    public static OptionalDouble maxOhmPerKm(ConductorMaterial material, double mm2) {
        Map<Double, Double> table = switch (material) {
            case COPPER -> COPPER;
            case ALUMINIUM -> ALUMINIUM;
        };
        Double r = table.get(mm2);
        return r == null ? OptionalDouble.empty() : OptionalDouble.of(r);
    }
}
