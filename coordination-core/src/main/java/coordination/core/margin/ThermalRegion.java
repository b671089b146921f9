package coordination.core.margin;

import java.io.Serializable;

/**
 * A part of a check's current range and the thermal method used there.
 *
 * @param fromAmps lower end in amperes
 * @param toAmps upper end in amperes
 * @param method one of {@link #ENERGY}, {@link #ENERGY_DC_OFFSET}, {@link #ENERGY_LET_THROUGH},
 *     {@link #OUTSIDE_IEC_60949}, {@link #ADIABATIC},
 *     {@link #ADIABATIC_CONSERVATIVE}, {@link #NON_ADIABATIC}, {@link #ICEA}, {@link #NOT_CLEARED},
 *     {@link #UNDEFINED}
 */
public record ThermalRegion(double fromAmps, double toAmps, String method) implements Serializable {
    /** Clearing under 0.1 s: let-through energy I²t compared with k²S². */
    public static final String ENERGY = "energy";
    /** As {@link #ENERGY}, with the DC-offset heating of IEC 60909-0. */
    public static final String ENERGY_DC_OFFSET = "energy-dc-offset";
    /** The device maker's let-through energy compared with k²S². */
    public static final String ENERGY_LET_THROUGH = "energy-let-through";
    /** A non-adiabatic cable beyond IEC 60949's 5 s: no heat loss credited past 5 s. */
    public static final String OUTSIDE_IEC_60949 = "adiabatic-outside-iec-60949";
    /** Clearing from 0.1 s to 5 s: the adiabatic limit. */
    public static final String ADIABATIC = "adiabatic";
    /** Clearing over 5 s: the adiabatic limit, which is conservative there. */
    public static final String ADIABATIC_CONSERVATIVE = "adiabatic-conservative";
    /** The IEC 60949 non-adiabatic limit. */
    public static final String NON_ADIABATIC = "non-adiabatic";
    /** The ICEA P-32-382 limit. */
    public static final String ICEA = "icea";
    /** The device does not operate here. */
    public static final String NOT_CLEARED = "not-cleared";
    /** The device curve has no value here. */
    public static final String UNDEFINED = "undefined";
}
