/**
 * Time-current curves of protective devices and the devices built from them: IEC 60255-151 and
 * IEEE C37.112 inverse-time stages, definite-time and instantaneous stages, multi-stage relays,
 * fuses digitised from points, electronic trip units of low-voltage breakers and IEC 60898-1
 * miniature circuit breakers. Every curve gives an operating time in seconds for a current in
 * amperes, and {@link java.lang.Double#POSITIVE_INFINITY} where the device does not operate.
 *
 * <p>The value types are {@link java.io.Serializable} so that a batch engine can move them between JVMs
 * of the same version; their serial forms are not a storage format and may change with any release.
 *
 * @serial exclude
 */
package coordination.core.curve;
