/**
 * Coordination sheets (one landscape page with title block, chart, device, cable and result
 * tables and the caution) and the deterministic SVG, PNG and PDF writers used for sheets and
 * charts alike.
 */
package coordination.plot.sheet;
