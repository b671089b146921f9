/**
 * Design aids that solve for what a check only verifies: the smallest conductor a device protects
 * ({@link coordination.core.design.MinimumConductor}), the slowest inverse-time settings that still
 * protect a cable ({@link coordination.core.design.SlowestSetting}), and time multipliers for
 * relays in series that grade ({@link coordination.core.design.RadialGrading}).
 */
package coordination.core.design;
