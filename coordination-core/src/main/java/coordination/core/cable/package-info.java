/**
 * Short-circuit thermal limits of cable conductors: the adiabatic limit I²t = k²S² with k from the
 * material constants of IEC 60949, the non-adiabatic factor of IEC 60949, the ICEA P-32-382
 * equations for circular-mil sizes, conductor sizes in mm², AWG and kcmil, and the insulation
 * temperature limits of IEC 60364-4-43 / IEC 60502 practice.
 *
 * <p>The value types are {@link java.io.Serializable} so that a batch engine can move them between JVMs
 * of the same version; their serial forms are not a storage format and may change with any release.
 *
 * @serial exclude
 */
package coordination.core.cable;
