/**
 * The margin and grading engine: exact minimum margins and crossing currents between a device
 * curve and a cable's thermal limit ({@link coordination.core.margin.CableCheck}), and between two
 * devices in series ({@link coordination.core.margin.GradingCheck}), solved on the log-current axis
 * segment by segment between the curves' discontinuities.
 *
 * <p>The value types are {@link java.io.Serializable} so that a batch engine can move them between JVMs
 * of the same version; their serial forms are not a storage format and may change with any release.
 *
 * @serial exclude
 */
package coordination.core.margin;
