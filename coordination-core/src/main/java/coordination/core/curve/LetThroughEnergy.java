package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serial;
import java.io.Serializable;
import java.util.Arrays;

/**
 * An energy I²t a device's maker states against the prospective current: the total let-through
 * of a current-limiting fuse or an energy-limiting breaker, or the pre-arcing I²t of a fuse. It is
 * either one value for every current (a constant, which understates the energy at high currents
 * and is reported as an assumption) or points, interpolated as straight lines on log-log axes.
 * Below the first point the first value holds; above the last point it has no value, since the
 * energy may keep rising.
 */
public final class LetThroughEnergy implements Serializable {
    @Serial
    private static final long serialVersionUID = 1L;

    private final double[] amps;
    private final double[] a2s;

    private LetThroughEnergy(double[] amps, double[] a2s) {
        this.amps = amps;
        this.a2s = a2s;
    }

    /**
     * One value for every prospective current.
     *
     * @param a2s energy in A²s, a finite number above 0
     * @return the energy
     * @throws IllegalArgumentException if the value is not positive and finite
     */
    public static LetThroughEnergy constant(double a2s) {
        Checks.positive("let-through energy", a2s, "A2s");
        return new LetThroughEnergy(new double[0], new double[] {a2s});
    }

    /**
     * Points of energy against prospective current.
     *
     * @param prospectiveAmps prospective currents in amperes, strictly rising, above 0, at least two
     * @param a2s energies in A²s, above 0
     * @return the energy
     * @throws IllegalArgumentException naming the first point that breaks a rule
     */
    public static LetThroughEnergy points(double[] prospectiveAmps, double[] a2s) {
        problem(prospectiveAmps, a2s).ifPresent(p -> {
            throw new IllegalArgumentException("let-through energy: " + p);
        });
        return new LetThroughEnergy(prospectiveAmps.clone(), a2s.clone());
    }

    /**
     * What is wrong with a set of points, if anything.
     *
     * @param amps prospective currents in amperes
     * @param a2s energies in A²s
     * @return the message, or empty when the points are valid
     */
    public static java.util.Optional<String> problem(double[] amps, double[] a2s) {
        if (amps.length != a2s.length || amps.length < 2) {
            return java.util.Optional.of("found " + Math.min(amps.length, a2s.length) + " point(s) - must have at"
                    + " least 2 pairs");
        }
        for (int i = 0; i < amps.length; i++) {
            if (!(amps[i] > 0) || !Double.isFinite(amps[i]) || !(a2s[i] > 0) || !Double.isFinite(a2s[i])) {
                return java.util.Optional.of("point " + (i + 1) + " must have a finite current and energy above 0");
            }
            if (i > 0 && !(amps[i] > amps[i - 1])) {
                return java.util.Optional.of("current falls from " + Checks.format(amps[i - 1]) + " A to "
                        + Checks.format(amps[i]) + " A at points " + i + " and " + (i + 1)
                        + "; currents must rise from point to point");
            }
        }
        return java.util.Optional.empty();
    }

    /** @return whether one value stands for every current */
    public boolean isConstant() {
        return amps.length == 0;
    }

    /**
     * Whether the energy has a value at a prospective current.
     *
     * @param prospectiveAmps current in amperes
     * @return true for a constant, and up to the last point
     */
    public boolean isDefinedAt(double prospectiveAmps) {
        return isConstant() || prospectiveAmps <= lastAmps();
    }

    // the last point, with the rounding of ln and exp at the end of a segment taken as the point itself
    private double lastAmps() {
        return amps[amps.length - 1] * (1 + END_ROUNDING);
    }

    /** Relative distance past the last point still read as the last point: far below any stated figure. */
    private static final double END_ROUNDING = 1e-12;

    /**
     * The energy at a prospective current.
     *
     * @param prospectiveAmps current in amperes, above 0
     * @return energy in A²s
     * @throws CurveDomainException above the last point
     */
    public double a2s(double prospectiveAmps) {
        if (isConstant()) {
            return a2s[0];
        }
        if (prospectiveAmps <= amps[0]) {
            return a2s[0];
        }
        if (prospectiveAmps > lastAmps()) {
            throw new CurveDomainException(this + ": no value at " + Checks.format(prospectiveAmps)
                    + " A; the points end at " + Checks.format(amps[amps.length - 1]) + " A");
        }
        if (prospectiveAmps >= amps[amps.length - 1]) {
            return a2s[a2s.length - 1];
        }
        int i = Arrays.binarySearch(amps, prospectiveAmps);
        if (i >= 0) {
            return a2s[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double f = Math.log(prospectiveAmps / amps[lo]) / Math.log(amps[hi] / amps[lo]);
        return Math.exp(Math.log(a2s[lo]) + f * Math.log(a2s[hi] / a2s[lo]));
    }

    /** @return the prospective currents of the points in amperes (a copy), empty for a constant */
    public double[] amps() {
        return amps.clone();
    }

    /** @return the energies in A²s (a copy): one value for a constant */
    public double[] energiesA2s() {
        return a2s.clone();
    }

    /** @return where the interpolation has kinks: the points, in amperes */
    public double[] breakpointsAmps() {
        return amps.clone();
    }

    /**
     * The same energy seen from another voltage level: currents times the factor, energies times
     * its square.
     *
     * @param factor positive multiplier of the current axis
     * @return the referred energy
     */
    public LetThroughEnergy scaled(double factor) {
        Checks.positive("let-through energy: scale factor", factor, "");
        double[] sa = amps.clone();
        double[] se = a2s.clone();
        for (int i = 0; i < sa.length; i++) {
            sa[i] *= factor;
        }
        for (int i = 0; i < se.length; i++) {
            se[i] *= factor * factor;
        }
        return new LetThroughEnergy(sa, se);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LetThroughEnergy e && Arrays.equals(amps, e.amps) && Arrays.equals(a2s, e.a2s);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(amps) + Arrays.hashCode(a2s);
    }

    @Override
    public String toString() {
        return isConstant() ? "let-through " + Checks.format(a2s[0]) + " A2s" : "let-through energy of "
                + amps.length + " points";
    }
}
