package coordination.core.curve;

/**
 * How the time multiplier of an inverse-time stage is named and set: IEC 60255-151 calls it the
 * time multiplier setting (TMS), IEEE C37.112 the time dial (TD). Both scale the same equation;
 * the kind only decides the name and the setting range a relay offers when the study states none.
 */
public enum MultiplierKind {
    /** Time multiplier setting, commonly 0.05 to 1 in steps of 0.01 (common practice, from memory). */
    TMS("tms", new SettingRange(0.05, 1.0, 0.01)),
    /** Time dial, commonly 0.5 to 15 in steps of 0.1 (common practice, from memory). */
    TIME_DIAL("time_dial", new SettingRange(0.5, 15.0, 0.1));

    private final String key;
    private final SettingRange defaultRange;

    MultiplierKind(String key, SettingRange defaultRange) {
        this.key = key;
        this.defaultRange = defaultRange;
    }

    /** @return the study-file key of the setting, {@code tms} or {@code time_dial} */
    public String key() {
        return key;
    }

    /** @return the range assumed when the study states none (from memory) */
    public SettingRange defaultRange() {
        return defaultRange;
    }

    /** @return the study-file key of the setting's range, {@code tms_range} or {@code time_dial_range} */
    public String rangeKey() {
        return key + "_range";
    }

    /** @return the study-file key of the setting's step, {@code tms_step} or {@code time_dial_step} */
    public String stepKey() {
        return key + "_step";
    }
}
