package coordination.core.cable;

import coordination.core.internal.Checks;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The currents a set of conductors withstands for a set of fault durations, I = kS/√t (or with
 * the method's own correction): one row per size.
 *
 * @param rows one row per conductor size, in the order given
 * @param timesSeconds fault durations in seconds, each above 0
 */
public record WithstandTable(List<Row> rows, double[] timesSeconds) implements Serializable {

    /**
     * One conductor size.
     *
     * @param label the size as the user wrote it, e.g. {@code 70 mm²} or {@code 4/0 AWG}
     * @param cable the conductor's thermal limit
     */
    public record Row(String label, CableThermalLimit cable) implements Serializable {
        /**
         * The withstand current for each duration of the table.
         *
         * @param timesSeconds durations in seconds
         * @return amperes, one per duration
         */
        public double[] withstandAmps(double[] timesSeconds) {
            double[] a = new double[timesSeconds.length];
            for (int i = 0; i < a.length; i++) {
                a[i] = cable.withstandAmps(timesSeconds[i]);
            }
            return a;
        }
    }

    /**
     * Validates the table.
     *
     * @param rows one row per conductor size, in the order given
     * @param timesSeconds fault durations in seconds, each above 0
     * @throws IllegalArgumentException if there is no row, or a duration is not above 0
     */
    public WithstandTable {
        rows = List.copyOf(rows);
        if (rows.isEmpty()) {
            throw new IllegalArgumentException("withstand table: found no sizes - must have at least one");
        }
        timesSeconds = timesSeconds.clone();
        for (double t : timesSeconds) {
            Checks.positive("withstand table: duration", t, "s");
        }
    }

    /** @return the durations in seconds, a copy */
    @Override
    public double[] timesSeconds() {
        return timesSeconds.clone();
    }

    /**
     * A table for one material, insulation and method over several sizes, each at the temperatures
     * given or at the insulation's defaults for that size.
     *
     * @param material conductor material
     * @param insulation insulation
     * @param method thermal method
     * @param parallel conductors in parallel, 1 or more
     * @param sizesMm2 cross-sections of one conductor in mm²
     * @param labels the sizes as the user wrote them, one per size
     * @param initialCelsius initial temperature in °C, or empty for the insulation's
     * @param finalCelsius final temperature in °C, or empty for the insulation's (which may depend on size)
     * @param timesSeconds fault durations in seconds
     * @return the table
     * @throws IllegalArgumentException if a size, temperature or duration is out of range
     */
    public static WithstandTable of(ConductorMaterial material, Insulation insulation, ThermalMethod method,
            int parallel, double[] sizesMm2, List<String> labels, OptionalDouble initialCelsius,
            OptionalDouble finalCelsius, double[] timesSeconds) {
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < sizesMm2.length; i++) {
            double s = sizesMm2[i];
            double ti = initialCelsius.orElse(insulation.maxOperatingCelsius());
            double tf = finalCelsius.orElse(insulation.shortCircuitCelsius(s));
            rows.add(new Row(labels.get(i), new CableThermalLimit("withstand", material, insulation, s, parallel, ti,
                    tf, method)));
        }
        return new WithstandTable(rows, timesSeconds);
    }
}
