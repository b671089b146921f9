/**
 * Log-log time-current charts built with XChart: device curves with their tolerance bands, cable
 * damage limits with the adiabatic window, fault-current markers, crossings and the point of
 * minimum margin.
 */
package coordination.plot.chart;
