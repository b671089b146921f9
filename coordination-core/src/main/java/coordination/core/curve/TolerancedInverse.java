package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serial;

/**
 * One edge of an inverse-time stage with a relay's time tolerance: the nominal time moved by the
 * larger of a fraction of it and a fixed time (IEC 60255-151). The edge is still monotone; where
 * the fraction and the fixed time give the same error, and where the fast edge reaches 0 s, it
 * has kinks, which it lists as breakpoints.
 */
final class TolerancedInverse implements Invertible {
    @Serial
    private static final long serialVersionUID = 1L;

    private final InverseTimeStage base;
    private final RelayTolerance tolerance;
    private final Edge edge;

    private final double heldSeconds;

    TolerancedInverse(InverseTimeStage base, RelayTolerance tolerance, Edge edge) {
        this.base = base;
        this.tolerance = tolerance;
        this.edge = edge;
        this.heldSeconds = tolerance.seconds(base.heldSeconds(), edge);
    }

    @Override
    public double seconds(double amps) {
        // the held time is the same at every current above the upper multiple: computed once
        return base.heldAt(amps) ? heldSeconds : tolerance.seconds(base.seconds(amps), edge);
    }

    /**
     * The slow edge is the larger of {@code t (1 + e)} and {@code t + min}, neither steeper than t;
     * the fast edge's {@code t - min} is steeper, and no bound is stated for it.
     */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        return edge == Edge.SLOW ? base.logSlopeBound(fromAmps, toAmps) : Double.POSITIVE_INFINITY;
    }

    /**
     * Without a fixed time the edges are {@code t (1 + e)} and {@code t (1 - e)}, as steep as t;
     * a fixed time makes the slow edge flatter, by an amount this does not compute.
     */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        return tolerance.timeMinSeconds() == 0 && tolerance.timeFraction() < 1 ? base.logSlopeFloor(fromAmps, toAmps)
                : 0.0;
    }

    @Override
    public double currentAtSeconds(double seconds) {
        double e = tolerance.timeFraction();
        double min = tolerance.timeMinSeconds();
        // the nominal time whose edge is the given time: invert t -> t +/- max(t e, min)
        double knee = e > 0 ? min / e : Double.POSITIVE_INFINITY;
        double nominal;
        if (edge == Edge.SLOW) {
            nominal = seconds >= knee * (1 + e) ? seconds / (1 + e) : seconds - min;
        } else {
            if (!(seconds > 0)) {
                return Double.NaN;
            }
            nominal = e < 1 && seconds / (1 - e) >= knee ? seconds / (1 - e) : seconds + min;
        }
        return nominal > 0 ? base.currentAtSeconds(nominal) : Double.NaN;
    }

    @Override
    public double[] breakpointsAmps() {
        double[] b = base.breakpointsAmps();
        double e = tolerance.timeFraction();
        double min = tolerance.timeMinSeconds();
        double[] extra = new double[2];
        int n = 0;
        if (e > 0 && min > 0) {
            double knee = base.currentAtSeconds(min / e);
            if (!Double.isNaN(knee)) {
                extra[n++] = knee;
            }
        }
        if (edge == Edge.FAST && min > 0) {
            double zero = base.currentAtSeconds(min);
            if (!Double.isNaN(zero)) {
                extra[n++] = zero;
            }
        }
        return Curves.union(b, java.util.Arrays.copyOf(extra, n));
    }

    @Override
    public String toString() {
        return base + " " + edge.name().toLowerCase(java.util.Locale.ROOT) + " edge (time +/-"
                + Checks.format(tolerance.timeFraction() * 100) + " % or " + Checks.format(tolerance.timeMinSeconds())
                + " s)";
    }
}
