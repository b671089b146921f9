package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.Serial;

/** A curve with its current axis scaled and a constant time added where it operates. */
final class ScaledCurve implements TimeCurrentCurve {
    @Serial
    private static final long serialVersionUID = 1L;

    private final TimeCurrentCurve base;
    private final double factor;
    private final double addedSeconds;

    ScaledCurve(TimeCurrentCurve base, double factor, double addedSeconds) {
        Checks.positive("current scale factor", factor, "");
        Checks.nonNegative("added time", addedSeconds, "s");
        if (base instanceof ScaledCurve s) {
            this.base = s.base;
            this.factor = s.factor * factor;
            this.addedSeconds = s.addedSeconds + addedSeconds;
        } else {
            this.base = base;
            this.factor = factor;
            this.addedSeconds = addedSeconds;
        }
    }

    @Override
    public double seconds(double amps) {
        if (!isDefinedAt(amps)) {
            throw Curves.outside(this, amps);
        }
        double t = base.seconds(clampToBase(amps / factor));
        return t + addedSeconds;
    }

    /** A constant added time makes no curve steeper in ln t; the current scale moves the stretch. */
    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        return base.logSlopeBound(fromAmps / factor, toAmps / factor);
    }

    /** An added time makes a curve flatter, by an amount this does not compute: no floor then. */
    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        return addedSeconds == 0.0 ? base.logSlopeFloor(fromAmps / factor, toAmps / factor) : 0.0;
    }

    // amps / factor may round just outside the base's interval at its very ends
    private double clampToBase(double baseAmps) {
        return Math.min(Math.max(baseAmps, base.lowestDefinedAmps()), base.highestDefinedAmps());
    }

    @Override
    public double lowestDefinedAmps() {
        return base.lowestDefinedAmps() * factor;
    }

    @Override
    public double highestDefinedAmps() {
        return base.highestDefinedAmps() * factor;
    }

    @Override
    public double[] breakpointsAmps() {
        double[] b = base.breakpointsAmps();
        for (int i = 0; i < b.length; i++) {
            b[i] *= factor;
        }
        return b;
    }

    @Override
    public TimeCurrentCurve scaledCurrent(double f) {
        return f == 1.0 ? this : new ScaledCurve(this, f, 0.0);
    }

    @Override
    public String toString() {
        return base + (factor != 1.0 ? " x" + Checks.format(factor) + " A" : "")
                + (addedSeconds != 0.0 ? " +" + Checks.format(addedSeconds) + " s" : "");
    }
}
