package coordination.core.cable;

/**
 * Conductor materials with the constants of IEC 60949:1988+A1:2008, Table I: K (A·s^½/mm²) and
 * β (K, the reciprocal of the temperature coefficient of resistance at 0 °C), and the ICEA
 * P-32-382 constants for the same materials (all from memory).
 */
public enum ConductorMaterial {
    /** Copper: K = 226 A·s^½/mm², β = 234.5 K; ICEA: 0.0297 and 234. */
    COPPER("copper", 226.0, 234.5, 0.0297, 234.0),
    /** Aluminium: K = 148 A·s^½/mm², β = 228 K; ICEA: 0.0125 and 228. */
    ALUMINIUM("aluminium", 148.0, 228.0, 0.0125, 228.0);

    private final String key;
    private final double kConstant;
    private final double beta;
    private final double iceaConstant;
    private final double iceaBeta;

    ConductorMaterial(String key, double kConstant, double beta, double iceaConstant, double iceaBeta) {
        this.key = key;
        this.kConstant = kConstant;
        this.beta = beta;
        this.iceaConstant = iceaConstant;
        this.iceaBeta = iceaBeta;
    }

    /** @return the study-file name, e.g. {@code copper} */
    public String key() {
        return key;
    }

    /** @return IEC 60949 constant K in A·s^½/mm² */
    public double kConstant() {
        return kConstant;
    }

    /** @return IEC 60949 constant β in kelvin */
    public double beta() {
        return beta;
    }

    /** @return ICEA P-32-382 constant (A/cmil)²·s per decade of temperature ratio */
    public double iceaConstant() {
        return iceaConstant;
    }

    /** @return ICEA P-32-382 inferred zero-resistance temperature in °C below zero */
    public double iceaBeta() {
        return iceaBeta;
    }

    /**
     * The adiabatic factor k of IEC 60949, clause 3 (equation 1 rearranged for k):
     * {@code k = K * sqrt(ln((θf + β) / (θi + β)))}.
     *
     * @param initialCelsius conductor temperature at the start of the fault, °C
     * @param finalCelsius permitted temperature at its end, °C, above the initial one
     * @return k in A·s^½/mm²
     * @throws IllegalArgumentException if the final temperature is not above the initial one
     */
    public double k(double initialCelsius, double finalCelsius) {
        CableThermalLimit.temperatureProblem(initialCelsius, finalCelsius).ifPresent(p -> {
            throw new IllegalArgumentException(key + ": " + p);
        });
        return kConstant * Math.sqrt(Math.log((finalCelsius + beta) / (initialCelsius + beta)));
    }

    /**
     * Finds a material by its study-file name (also accepts {@code aluminum}).
     *
     * @param key the name
     * @return the material, or null
     */
    public static ConductorMaterial byKey(String key) {
        if ("aluminum".equals(key)) {
            return ALUMINIUM;
        }
        for (ConductorMaterial m : values()) {
            if (m.key.equals(key)) {
                return m;
            }
        }
        return null;
    }
}
