package coordination.core.internal;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * Minimisation and root finding of a smooth function on one segment of the log-current axis.
 * A short scan brackets the local minima and sign changes; Brent's methods then solve each one to
 * near machine precision. The scan only brackets: every reported value comes from a solver or from
 * an end of the segment.
 */
public final class LogAxis {
    /** Interior scan points per segment, enough to bracket the extrema of power-law differences. */
    private static final int SCAN = 8;
    /** Absolute accuracy in ln(I) of roots and minima: 1e-12, i.e. currents to 1e-12 relative. */
    private static final double X_ACCURACY = 1e-12;
    private static final int MAX_EVALUATIONS = 200;

    private LogAxis() {
    }

    /** A point of the axis: x = ln(I) and the function's value there. */
    public record Point(double x, double value) {
    }

    /** Number of points a segment is scanned at, ends included. */
    public static final int SCAN_POINTS = SCAN + 2;

    /**
     * The scan abscissae of a segment: {@link #SCAN_POINTS} points from xa to xb, ends exact.
     *
     * @param xa left end
     * @param xb right end
     * @return the points
     */
    public static double[] scanPoints(double xa, double xb) {
        double[] xs = new double[SCAN_POINTS];
        for (int i = 0; i < SCAN_POINTS; i++) {
            xs[i] = scanPoint(xa, xb, i);
        }
        return xs;
    }

    /**
     * One scan abscissa of a segment, as {@link #scanPoints} gives it.
     *
     * @param xa left end
     * @param xb right end
     * @param i index, from 0 to {@code SCAN_POINTS - 1}
     * @return the point
     */
    public static double scanPoint(double xa, double xb, int i) {
        int last = SCAN_POINTS - 1;
        return i == last ? xb : xa + (xb - xa) * i / last;
    }

    /**
     * Minimum of a function on [xa, xb], ends included.
     *
     * @param f the function of x = ln(I), finite on the segment
     * @param xa left end
     * @param xb right end, at or above xa
     * @return the smallest value found and where
     */
    public static Point minimum(DoubleUnaryOperator f, double xa, double xb) {
        if (!(xb > xa)) {
            return new Point(xa, f.applyAsDouble(xa));
        }
        double[] xs = scanPoints(xa, xb);
        double[] vs = new double[xs.length];
        for (int i = 0; i < xs.length; i++) {
            vs[i] = f.applyAsDouble(xs[i]);
        }
        return minimum(f, xs, vs);
    }

    /**
     * Minimum of a function from its values at scan points: each sampled local minimum is refined
     * by Brent's method; an end is refined only if the function falls when moving inwards from it.
     *
     * @param f the function of x = ln(I)
     * @param xs ascending scan points
     * @param vs the function's values there
     * @return the smallest value found and where
     */
    public static Point minimum(DoubleUnaryOperator f, double[] xs, double[] vs) {
        int last = xs.length - 1;
        int best = 0;
        for (int i = 1; i <= last; i++) {
            if (vs[i] < vs[best]) {
                best = i;
            }
        }
        Point result = new Point(xs[best], vs[best]);
        for (int i = 0; i <= last; i++) {
            boolean belowLeft = i == 0 || vs[i] <= vs[i - 1];
            boolean belowRight = i == last || vs[i] <= vs[i + 1];
            if (!belowLeft || !belowRight || last == 0) {
                continue;
            }
            // inside a run of equal samples the function is flat: Brent there finds nothing lower,
            // and a curve's constant stretches made every such sample a minimum to refine
            if (i > 0 && i < last && vs[i] == vs[i - 1] && vs[i] == vs[i + 1]) {
                continue;
            }
            if (i == 0 || i == last) {
                int inner = i == 0 ? 1 : last - 1;
                if (!(f.applyAsDouble(inwardProbe(xs, i)) < vs[i])) {
                    continue;
                }
                Point p = refineMinimum(f, Math.min(xs[i], xs[inner]), Math.max(xs[i], xs[inner]),
                        0.5 * (xs[i] + xs[inner]));
                if (p.value() < result.value()) {
                    result = p;
                }
            } else {
                Point p = refineMinimum(f, xs[i - 1], xs[i + 1], xs[i]);
                if (p.value() < result.value()) {
                    result = p;
                }
            }
        }
        return result;
    }

    /**
     * The point just inside a scan's end at which {@link #minimum(DoubleUnaryOperator, double[], double[])}
     * asks whether the function falls when moving inwards from that end.
     *
     * @param xs ascending scan points, at least two
     * @param end 0 or the last index
     * @return the probe's x
     */
    public static double inwardProbe(double[] xs, int end) {
        int inner = end == 0 ? 1 : end - 1;
        return inwardProbe(xs[end], xs[inner]);
    }

    /**
     * The probe just inside a scan's end, from the end and its neighbour.
     *
     * @param end the end's x
     * @param inner the neighbouring scan point's x
     * @return the probe's x
     */
    public static double inwardProbe(double end, double inner) {
        return end + (inner - end) * 1e-6;
    }

    /**
     * Roots of a function on [xa, xb] where it changes sign: every bracket of the scan solved.
     *
     * @param f the function of x = ln(I)
     * @param xa left end
     * @param xb right end
     * @return the roots, ascending
     */
    public static double[] roots(DoubleUnaryOperator f, double xa, double xb) {
        if (!(xb > xa)) {
            return new double[0];
        }
        double[] xs = scanPoints(xa, xb);
        double[] vs = new double[xs.length];
        for (int i = 0; i < xs.length; i++) {
            vs[i] = f.applyAsDouble(xs[i]);
        }
        return roots(f, xs, vs);
    }

    /**
     * Roots of a function from its values at scan points: each sign change solved.
     *
     * @param f the function of x = ln(I)
     * @param xs ascending scan points
     * @param vs the function's values there
     * @return the roots, ascending
     */
    public static double[] roots(DoubleUnaryOperator f, double[] xs, double[] vs) {
        double[] found = new double[xs.length];
        int n = 0;
        for (int i = 1; i < xs.length; i++) {
            double v0 = vs[i - 1];
            double v1 = vs[i];
            if (v0 == 0.0 && i == 1) {
                found[n++] = xs[0];
            }
            if (v1 == 0.0) {
                found[n++] = xs[i];
            } else if (v0 != 0.0 && Math.signum(v0) != Math.signum(v1) && !Double.isNaN(v0) && !Double.isNaN(v1)) {
                found[n++] = solve(f, xs[i - 1], xs[i]);
            }
        }
        return Arrays.copyOf(found, n);
    }

    /**
     * The single root of a monotonic function in [xa, xb], if its ends have opposite signs.
     *
     * @param f a monotonic function of x
     * @param xa left end
     * @param xb right end
     * @return the root, or NaN if the ends do not bracket one
     */
    public static double monotoneRoot(DoubleUnaryOperator f, double xa, double xb) {
        return monotoneRoot(f, xa, xb, f.applyAsDouble(xa), f.applyAsDouble(xb));
    }

    /**
     * The single root of a monotonic function in [xa, xb] from its values at the ends, which the
     * caller has already evaluated.
     *
     * @param f a monotonic function of x
     * @param xa left end
     * @param xb right end
     * @param fa f(xa)
     * @param fb f(xb)
     * @return the root, or NaN if the ends do not bracket one
     */
    public static double monotoneRoot(DoubleUnaryOperator f, double xa, double xb, double fa, double fb) {
        if (fa == 0.0) {
            return xa;
        }
        if (fb == 0.0) {
            return xb;
        }
        if (Double.isNaN(fa) || Double.isNaN(fb) || Math.signum(fa) == Math.signum(fb)) {
            return Double.NaN;
        }
        return solve(f, xa, xb);
    }

    /** Probe distance in ln(I) for telling a pole of a curve from a finite step. */
    public static final double DIVERGENCE_PROBE = 1e-8;

    /**
     * Whether a time function grows without bound towards x from above: an infinite value there,
     * or a hundredfold growth between probes {@link #DIVERGENCE_PROBE} and x (a finite step changes
     * by almost nothing so close; a pole of 1/(M^p - 1) grows about a thousandfold).
     *
     * @param time the time as a function of x = ln(I)
     * @param x the point
     * @return true at a pole
     */
    public static boolean divergesAt(DoubleUnaryOperator time, double x) {
        double near = time.applyAsDouble(x);
        if (Double.isInfinite(near)) {
            return true;
        }
        return near > 100 * time.applyAsDouble(x + DIVERGENCE_PROBE);
    }

    private static Point refineMinimum(DoubleUnaryOperator f, double lo, double hi, double start) {
        if (!(hi - lo > X_ACCURACY)) {
            return new Point(start, f.applyAsDouble(start));
        }
        BrentOptimizer optimizer = new BrentOptimizer(1e-10, X_ACCURACY);
        UnivariatePointValuePair p = optimizer.optimize(new MaxEval(MAX_EVALUATIONS),
                new UnivariateObjectiveFunction(f::applyAsDouble), GoalType.MINIMIZE, new SearchInterval(lo, hi, start));
        return new Point(p.getPoint(), p.getValue());
    }

    private static double solve(DoubleUnaryOperator f, double lo, double hi) {
        if (!(hi - lo > X_ACCURACY)) {
            return 0.5 * (lo + hi);
        }
        double fl = f.applyAsDouble(lo);
        double fh = f.applyAsDouble(hi);
        if (Double.isInfinite(fl) || Double.isInfinite(fh)) {
            // the solver needs finite ends: bisect until both ends are finite
            return bisect(f, lo, hi, fl);
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-14, X_ACCURACY, 0.0, 5);
        return solver.solve(MAX_EVALUATIONS, f::applyAsDouble, lo, hi, AllowedSolution.ANY_SIDE);
    }

    private static double bisect(DoubleUnaryOperator f, double lo, double hi, double flo) {
        double a = lo;
        double b = hi;
        double fa = flo;
        while (b - a > X_ACCURACY) {
            double m = 0.5 * (a + b);
            double fm = f.applyAsDouble(m);
            if (fm == 0.0) {
                return m;
            }
            if (Math.signum(fm) == Math.signum(fa)) {
                a = m;
                fa = fm;
            } else {
                b = m;
            }
        }
        return 0.5 * (a + b);
    }
}
