package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serial;
import java.util.Arrays;
import java.util.List;

/**
 * Several stages acting together: the fastest operating stage wins, so the time is the minimum
 * over the stages. All stages must be defined at every current (equation-based stages are).
 */
public final class FastestOfCurve implements TimeCurrentCurve {
    @Serial
    private static final long serialVersionUID = 1L;

    /**
     * Relative margin by which a stage's time must lie below every other's for it to be taken as
     * the fastest throughout a stretch: far above the rounding of a stage's own evaluation.
     */
    private static final double DOMINANCE_MARGIN = 1e-9;

    private final TimeCurrentCurve[] stages;
    private final String label;
    private final double[] breakpoints;
    // the stage that is fastest throughout each stretch between breakpoints, -1 where none provably is
    private final transient int[] fastest;

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
        double[] all = breakpointsOf(this.stages);
        int[] fastestAll = fastestStages(this.stages, all);
        // a stage's kink where another stage is the fastest on both sides is no kink of the curve
        double[] kept = new double[all.length];
        int[] keptFastest = new int[all.length + 1];
        keptFastest[0] = fastestAll[0];
        int n = 0;
        for (int k = 0; k < all.length; k++) {
            int left = keptFastest[n];
            if (left >= 0 && left == fastestAll[k + 1] && !isBreakpointOf(this.stages[left], all[k])) {
                continue;
            }
            kept[n++] = all[k];
            keptFastest[n] = fastestAll[k + 1];
        }
        this.breakpoints = Arrays.copyOf(kept, n);
        this.fastest = Arrays.copyOf(keptFastest, n + 1);
    }

    // the stretch holding a current: how many breakpoints lie at or below it
    private int stretch(double amps) {
        int k = 0;
        while (k < breakpoints.length && amps >= breakpoints[k]) {
            k++;
        }
        return k;
    }

    /**
     * The stage that is the fastest at every current from one current to another, when both lie
     * in one stretch between breakpoints (none of that stage's own is inside), or -1.
     */
    private int fastestThroughout(double fromAmps, double toAmps) {
        int k = stretch(fromAmps);
        return k == stretch(toAmps) ? fastest[k] : -1;
    }

    private static boolean isBreakpointOf(TimeCurrentCurve stage, double amps) {
        for (double b : stage.breakpointsAmps()) {
            if (b == amps) {
                return true;
            }
        }
        return false;
    }

    @Override
    public double seconds(double amps) {
        int k = stretch(amps);
        if (fastest[k] >= 0) {
            // the minimum over the stages is this stage's time, to the last bit
            return stages[fastest[k]].seconds(amps);
        }
        double t = Double.POSITIVE_INFINITY;
        for (TimeCurrentCurve s : stages) {
            t = Math.min(t, s.seconds(amps));
        }
        return t;
    }

    /**
     * On a stretch where one stage is the fastest throughout, that stage's own bound; elsewhere,
     * the fastest of several curves is no steeper than the steepest of those that operate.
     */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        int only = fastestThroughout(fromAmps, toAmps);
        if (only >= 0) {
            return stages[only].logSlopeBound(fromAmps, toAmps);
        }
        double bound = 0.0;
        for (TimeCurrentCurve s : stages) {
            bound = Math.max(bound, s.logSlopeBound(fromAmps, toAmps));
        }
        return bound;
    }

    /**
     * On a stretch where one stage is the fastest throughout, that stage's own floor; elsewhere,
     * whichever stage is fastest falls at least as steeply as the least steep of those that operate.
     */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        int only = fastestThroughout(fromAmps, toAmps);
        if (only >= 0) {
            return stages[only].logSlopeFloor(fromAmps, toAmps);
        }
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

    /**
     * For each stretch between consecutive breakpoints, the stage that is the fastest at every
     * current of it, where one provably is. No stage's time rises with current and none has a step
     * inside a stretch, so on {@code [b(k-1), b(k))} a stage's time is at most its time at
     * {@code b(k-1)}, and every other stage's at least its time at the largest double below
     * {@code b(k)}; above the last breakpoint only a time of 0 is known to be the least.
     */
    private static int[] fastestStages(TimeCurrentCurve[] stages, double[] breaks) {
        int[] fastest = new int[breaks.length + 1];
        for (int k = 0; k <= breaks.length; k++) {
            double lo = k == 0 ? 0.0 : breaks[k - 1];
            double hi = k == breaks.length ? Double.POSITIVE_INFINITY : Math.nextDown(breaks[k]);
            fastest[k] = stages.length == 1 ? 0 : fastestOn(stages, lo, hi);
        }
        return fastest;
    }

    private static int fastestOn(TimeCurrentCurve[] stages, double lo, double hi) {
        for (int i = 0; i < stages.length; i++) {
            double top = stages[i].seconds(lo);
            if (!Double.isFinite(top)) {
                continue;
            }
            if (hi == Double.POSITIVE_INFINITY) {
                if (top == 0.0) {
                    return i;
                }
                continue;
            }
            boolean below = true;
            for (int j = 0; j < stages.length && below; j++) {
                below = j == i || top * (1 + DOMINANCE_MARGIN) < stages[j].seconds(hi) * (1 - DOMINANCE_MARGIN);
            }
            if (below) {
                return i;
            }
        }
        return -1;
    }

    // built again on reading, which checks the stages and finds the fastest stage of each stretch
    @Serial
    private Object readResolve() {
        return new FastestOfCurve(label, List.of(stages));
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
        return Arrays.copyOf(found, n);
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
