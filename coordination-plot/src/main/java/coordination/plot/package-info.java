/**
 * Drawings and the command line: time-current charts ({@code chart}), coordination sheets and
 * their SVG, PNG and PDF output ({@code sheet}), and the {@code coordination} command
 * ({@code cli}).
 */
package coordination.plot;
