/**
 * Protection coordination core: the root package holds the project's base exception; the
 * sub-packages hold device curves ({@code curve}), cable thermal limits ({@code cable}), the margin
 * and grading engine ({@code margin}), study files ({@code study}) and Hamcrest matchers for
 * design-automation tests ({@code matchers}). All quantities are SI: amperes, seconds, mm², °C, A²s.
 */
package coordination.core;
