/**
 * The network of a study and its short-circuit currents by IEC 60909-0 (far from generator,
 * radial): buses with their voltage factors, sources, transformers and cable branches, and the
 * maximum and minimum currents, κ and ip at every bus and cable end.
 */
package coordination.core.network;
