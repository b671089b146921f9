/**
 * The margin and grading engine: exact minimum margins and crossing currents between a device
 * curve and a cable's thermal limit ({@link coordination.core.margin.CableCheck}), and between two
 * devices in series ({@link coordination.core.margin.GradingCheck}), solved on the log-current axis
 * segment by segment between the curves' discontinuities.
 */
package coordination.core.margin;
