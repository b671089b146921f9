package coordination.core.margin;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.TimeCurrentCurve;

/**
 * The breakpoints of the last curve, energy or cable asked for, kept while the same one is asked
 * for again: they do not change, and a checker run again need not copy them.
 */
final class KeptBreakpoints {
    private static final double[] NONE = new double[0];

    private Object source;
    private double[] amps;

    double[] of(TimeCurrentCurve c) {
        if (c != source) {
            source = c;
            amps = c.breakpointsAmps();
        }
        return amps;
    }

    // a device without stated energy has no breakpoints of it
    double[] of(LetThroughEnergy e) {
        if (e == null) {
            return NONE;
        }
        if (e != source) {
            source = e;
            amps = e.breakpointsAmps();
        }
        return amps;
    }

    double[] of(CableThermalLimit cable) {
        if (cable != source) {
            source = cable;
            amps = cable.breakpointsAmps();
        }
        return amps;
    }
}
