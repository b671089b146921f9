package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serial;
import java.util.List;

/**
 * Several stages acting together: the fastest operating stage wins, so the time is the minimum
 * over the stages. All stages must be defined at every current (equation-based stages are).
 */
public final class FastestOfCurve implements TimeCurrentCurve {
    @Serial
    private static final long serialVersionUID = 1L;

    private final TimeCurrentCurve[] stages;
    private final String label;
    private final double[] breakpoints;

    /**
     * Combines stages.
     *
     * @param label a name for messages
     * @param stages one or more stages, each defined at every current from 0 A upwards
     * @throws IllegalArgumentException if no stage is given or a stage has a limited domain
     */
    public FastestOfCurve(String label, List<? extends TimeCurrentCurve> stages) {
        Checks.given("combined stages: label", label);
        Checks.given(label + ": stages", stages);
        if (stages.isEmpty()) {
            throw new IllegalArgumentException(label + ": stages: found none - must have at least one");
        }
        for (TimeCurrentCurve s : stages) {
            if (s.lowestDefinedAmps() > 0 || s.highestDefinedAmps() < Double.POSITIVE_INFINITY) {
                throw new IllegalArgumentException(label + ": stage " + s
                        + " is defined only on part of the current axis - a combined stage must be defined everywhere");
            }
        }
        this.stages = stages.toArray(new TimeCurrentCurve[0]);
        this.label = label;
        this.breakpoints = breakpointsOf(this.stages);
    }

    @Override
    public double seconds(double amps) {
        double t = Double.POSITIVE_INFINITY;
        for (TimeCurrentCurve s : stages) {
            t = Math.min(t, s.seconds(amps));
        }
        return t;
    }

    /** The fastest of several curves is no steeper than the steepest of those that operate. */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        double bound = 0.0;
        for (TimeCurrentCurve s : stages) {
            bound = Math.max(bound, s.logSlopeBound(fromAmps, toAmps));
        }
        return bound;
    }

    /** Whichever stage is fastest falls at least as steeply as the least steep of those that operate. */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        double floor = Double.POSITIVE_INFINITY;
        for (TimeCurrentCurve s : stages) {
            floor = Math.min(floor, s.logSlopeFloor(fromAmps, toAmps));
        }
        return floor;
    }

    @Override
    public double[] breakpointsAmps() {
        return breakpoints.clone();
    }

    // the stages do not change: a check asks for the breakpoints every time, and they are found once
    private static double[] breakpointsOf(TimeCurrentCurve[] stages) {
        double[][] parts = new double[stages.length + 1][];
        for (int i = 0; i < stages.length; i++) {
            parts[i] = stages[i].breakpointsAmps();
        }
        parts[stages.length] = handovers(stages);
        return Curves.union(parts);
    }

    // where an inverse stage becomes faster than a definite-time stage the minimum has a kink
    private static double[] handovers(TimeCurrentCurve[] stages) {
        double[] found = new double[stages.length * stages.length];
        int n = 0;
        for (TimeCurrentCurve a : stages) {
            if (!(a instanceof Invertible inverse)) {
                continue;
            }
            for (TimeCurrentCurve b : stages) {
                if (b instanceof DefiniteTimeStage flat && flat.delaySeconds() > 0) {
                    double amps = inverse.currentAtSeconds(flat.delaySeconds());
                    if (amps > flat.pickupAmps()) {
                        found[n++] = amps;
                    }
                }
            }
        }
        return java.util.Arrays.copyOf(found, n);
    }

    /** @return the stages, in the order given */
    public List<TimeCurrentCurve> stages() {
        return List.of(stages);
    }

    @Override
    public String toString() {
        return label;
    }
}
