/**
 * The network of a study and its short-circuit currents by IEC 60909-0 (far from generator,
 * radial): buses with their voltage factors, sources, transformers and cable branches, and the
 * maximum and minimum currents, κ and ip at every bus and cable end.
 *
 * <p>The value types are {@link java.io.Serializable} so that a batch engine can move them between JVMs
 * of the same version; their serial forms are not a storage format and may change with any release.
 *
 * @serial exclude
 */
package coordination.core.network;
