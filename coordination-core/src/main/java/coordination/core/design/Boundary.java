package coordination.core.design;

import java.util.function.DoublePredicate;

/** Bisection for the edge between values that pass a check and values that fail it. */
final class Boundary {
    /** Relative width at which the bisection stops: far below any setting's resolution. */
    static final double RELATIVE = 1e-10;

    private Boundary() {
    }

    /**
     * The boundary of a monotone predicate on a positive axis, bisected in log space.
     *
     * @param passes the predicate
     * @param good a value that passes
     * @param bad a value that fails (above or below {@code good})
     * @return the last passing value next to the boundary
     */
    static double solve(DoublePredicate passes, double good, double bad) {
        double g = good;
        double b = bad;
        for (int i = 0; i < 200 && Math.abs(b / g - 1) > RELATIVE; i++) {
            double mid = Math.sqrt(g * b);
            if (passes.test(mid)) {
                g = mid;
            } else {
                b = mid;
            }
        }
        return g;
    }
}
