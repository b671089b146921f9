/**
 * Hamcrest matchers for design-automation tests: "this device protects this cable over this range
 * with this margin" ({@link coordination.core.matchers.CoordinationMatchers#protects}) and "this
 * device grades under that one with this interval"
 * ({@link coordination.core.matchers.CoordinationMatchers#gradesUnder}). A failure states the
 * current, both times and the shortfall.
 */
package coordination.core.matchers;
