/**
 * Short-circuit thermal limits of cable conductors: the adiabatic limit I²t = k²S² with k from the
 * material constants of IEC 60949, the non-adiabatic factor of IEC 60949, the ICEA P-32-382
 * equations for circular-mil sizes, conductor sizes in mm², AWG and kcmil, and the insulation
 * temperature limits of IEC 60364-4-43 / IEC 60502 practice.
 */
package coordination.core.cable;
