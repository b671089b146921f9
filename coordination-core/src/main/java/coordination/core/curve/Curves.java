package coordination.core.curve;

import coordination.core.internal.Checks;
import java.util.Arrays;

/** Helpers shared by the curve implementations. */
final class Curves {
    /**
     * Relative margin by which a stated slope bound is widened and a slope floor narrowed: far
     * above the rounding of the curve's own evaluation, far below any slope the engine relies on.
     */
    static final double SLOPE_MARGIN = 1e-9;

    private Curves() {
    }

    static CurveDomainException outside(TimeCurrentCurve curve, double amps) {
        return new CurveDomainException(curve + ": no value at " + Checks.format(amps)
                + " A; the curve is defined from " + Checks.format(curve.lowestDefinedAmps()) + " A to "
                + Checks.format(curve.highestDefinedAmps()) + " A");
    }

    static void checkCurrent(double amps) {
        if (!(amps >= 0)) {
            throw new IllegalArgumentException("current: found " + Checks.format(amps) + " A - must be 0 A or more");
        }
    }

    /** Sorted union of breakpoint arrays without duplicates. */
    static double[] union(double[]... parts) {
        int n = 0;
        for (double[] p : parts) {
            n += p.length;
        }
        double[] all = new double[n];
        int k = 0;
        for (double[] p : parts) {
            System.arraycopy(p, 0, all, k, p.length);
            k += p.length;
        }
        Arrays.sort(all);
        int m = 0;
        for (int i = 0; i < all.length; i++) {
            if (m == 0 || all[i] != all[m - 1]) {
                all[m++] = all[i];
            }
        }
        return Arrays.copyOf(all, m);
    }
}
