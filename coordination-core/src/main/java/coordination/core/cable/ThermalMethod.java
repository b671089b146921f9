package coordination.core.cable;

/** How a cable's short-circuit damage limit is computed. */
public enum ThermalMethod {
    /** IEC 60949 adiabatic: I²t = k²S², with k from the material constants. */
    ADIABATIC("adiabatic"),
    /** IEC 60949 with the non-adiabatic factor ε for heat lost to the insulation (longer faults). */
    NON_ADIABATIC("non-adiabatic"),
    /** ICEA P-32-382 adiabatic equations in circular mils. */
    ICEA("icea");

    private final String key;

    ThermalMethod(String key) {
        this.key = key;
    }

    /** @return the study-file name */
    public String key() {
        return key;
    }

    /**
     * Finds a method by its study-file name.
     *
     * @param key the name
     * @return the method, or null
     */
    public static ThermalMethod byKey(String key) {
        for (ThermalMethod m : values()) {
            if (m.key.equals(key)) {
                return m;
            }
        }
        return null;
    }
}
