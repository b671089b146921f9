package coordination.core.cable;

/**
 * Insulation types with their maximum continuous operating temperature and their short-circuit
 * temperature limit, as tabulated in IEC 60364-4-43:2008, Table 43A (and BS 7671, Table 43.1), and
 * the non-adiabatic constants X and Y of IEC 60949 for conductors (from memory; copper and
 * aluminium, ≤ 3 kV where the standard distinguishes; NaN where this library holds none, and the
 * non-adiabatic method is then refused).
 */
public enum Insulation {
    /** Thermoplastic PVC, 70 °C: 160 °C limit, 140 °C above 300 mm². */
    PVC("pvc", 70, 160, 140, 0.29, 0.06, 0.40, 0.08),
    /** Thermoplastic PVC for 90 °C: 160 °C limit, 140 °C above 300 mm². */
    PVC_90("pvc-90", 90, 160, 140, 0.29, 0.06, 0.40, 0.08),
    /** Cross-linked polyethylene, 90 °C: 250 °C limit. */
    XLPE("xlpe", 90, 250, 250, 0.41, 0.12, 0.57, 0.16),
    /** Ethylene propylene rubber, 90 °C: 250 °C limit. */
    EPR("epr", 90, 250, 250, 0.38, 0.10, 0.52, 0.14),
    /** Rubber, 60 °C: 200 °C limit. */
    RUBBER_60("rubber-60", 60, 200, 200, Double.NaN, Double.NaN, Double.NaN, Double.NaN),
    /** Mineral insulated, PVC covered or exposed to touch, 70 °C sheath: 160 °C limit. */
    MINERAL_PVC("mineral-pvc", 70, 160, 160, Double.NaN, Double.NaN, Double.NaN, Double.NaN),
    /** Mineral insulated, bare and not exposed to touch, 105 °C: 250 °C limit. */
    MINERAL_BARE("mineral-bare", 105, 250, 250, Double.NaN, Double.NaN, Double.NaN, Double.NaN),
    /** Impregnated paper, 80 °C: 160 °C limit (IEC 60364-5-54, Table A.54.3 practice). */
    PAPER("paper", 80, 160, 160, 0.45, 0.14, 0.62, 0.20);

    /** Cross-section above which PVC's short-circuit limit falls to 140 °C (IEC 60364-4-43). */
    public static final double PVC_LARGE_SECTION_MM2 = 300.0;

    private final String key;
    private final double maxOperatingCelsius;
    private final double shortCircuitCelsius;
    private final double shortCircuitLargeCelsius;
    private final double xCopper;
    private final double yCopper;
    private final double xAluminium;
    private final double yAluminium;

    Insulation(String key, double maxOperatingCelsius, double shortCircuitCelsius, double shortCircuitLargeCelsius,
            double xCopper, double yCopper, double xAluminium, double yAluminium) {
        this.key = key;
        this.maxOperatingCelsius = maxOperatingCelsius;
        this.shortCircuitCelsius = shortCircuitCelsius;
        this.shortCircuitLargeCelsius = shortCircuitLargeCelsius;
        this.xCopper = xCopper;
        this.yCopper = yCopper;
        this.xAluminium = xAluminium;
        this.yAluminium = yAluminium;
    }

    /** @return the study-file name, e.g. {@code xlpe} */
    public String key() {
        return key;
    }

    /** @return maximum continuous conductor temperature in °C */
    public double maxOperatingCelsius() {
        return maxOperatingCelsius;
    }

    /**
     * Short-circuit temperature limit for a conductor cross-section.
     *
     * @param sizeMm2 cross-section of one conductor in mm²
     * @return the limit in °C
     */
    public double shortCircuitCelsius(double sizeMm2) {
        return sizeMm2 > PVC_LARGE_SECTION_MM2 ? shortCircuitLargeCelsius : shortCircuitCelsius;
    }

    /**
     * IEC 60949 non-adiabatic constant X for a conductor in this insulation.
     *
     * @param material the conductor material
     * @return X in mm/s^½
     */
    public double nonAdiabaticX(ConductorMaterial material) {
        return material == ConductorMaterial.COPPER ? xCopper : xAluminium;
    }

    /**
     * IEC 60949 non-adiabatic constant Y for a conductor in this insulation.
     *
     * @param material the conductor material
     * @return Y in mm²/s
     */
    public double nonAdiabaticY(ConductorMaterial material) {
        return material == ConductorMaterial.COPPER ? yCopper : yAluminium;
    }

    /**
     * The conductor temperature at rated current that ICEA P-32-382 takes for this insulation, where
     * the library holds one: 75 °C for thermoplastic (PVC), 90 °C for XLPE and EPR (from memory).
     * The ICEA method takes its own standard's temperatures, not IEC 60364-4-43's.
     *
     * @return °C, or empty where no ICEA value is held
     */
    public java.util.OptionalDouble iceaOperatingCelsius() {
        return switch (this) {
            case PVC, PVC_90 -> java.util.OptionalDouble.of(75);
            case XLPE, EPR -> java.util.OptionalDouble.of(90);
            default -> java.util.OptionalDouble.empty();
        };
    }

    /**
     * The short-circuit temperature ICEA P-32-382 takes for this insulation, where the library holds
     * one: 150 °C for thermoplastic (PVC), 250 °C for XLPE and EPR (from memory).
     *
     * @return °C, or empty where no ICEA value is held
     */
    public java.util.OptionalDouble iceaShortCircuitCelsius() {
        return switch (this) {
            case PVC, PVC_90 -> java.util.OptionalDouble.of(150);
            case XLPE, EPR -> java.util.OptionalDouble.of(250);
            default -> java.util.OptionalDouble.empty();
        };
    }

    /**
     * Finds an insulation by its study-file name.
     *
     * @param key the name
     * @return the insulation, or null
     */
    public static Insulation byKey(String key) {
        for (Insulation i : values()) {
            if (i.key.equals(key)) {
                return i;
            }
        }
        return null;
    }

    /** @return the study-file names of all insulations, for messages */
    public static String keys() {
        StringBuilder b = new StringBuilder();
        for (Insulation i : values()) {
            b.append(b.length() == 0 ? "" : ", ").append(i.key);
        }
        return b.toString();
    }
}
