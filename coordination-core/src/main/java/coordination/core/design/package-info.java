/**
 * Design aids that solve for what a check only verifies: the smallest conductor a device protects
 * ({@link coordination.core.design.MinimumConductor}), the slowest inverse-time settings that still
 * protect a cable ({@link coordination.core.design.SlowestSetting}), and time multipliers for
 * relays in series that grade ({@link coordination.core.design.RadialGrading}).
 *
 * <p>The value types are {@link java.io.Serializable} so that a batch engine can move them between JVMs
 * of the same version; their serial forms are not a storage format and may change with any release.
 *
 * @serial exclude
 */
package coordination.core.design;
