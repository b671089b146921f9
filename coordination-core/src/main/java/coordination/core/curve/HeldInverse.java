package coordination.core.curve;

import java.io.Serial;

/**
 * An inverse-time stage that holds its time above its upper multiple, with that time computed
 * once: a check asks for it at many currents, and each answer would cost the equation's power.
 * Every value is the stage's own to the last bit.
 */
final class HeldInverse implements Invertible {
    @Serial
    private static final long serialVersionUID = 1L;

    private final InverseTimeStage base;
    private final double heldSeconds;

    HeldInverse(InverseTimeStage base) {
        this.base = base;
        this.heldSeconds = base.heldSeconds();
    }

    @Override
    public double seconds(double amps) {
        return base.heldAt(amps) ? heldSeconds : base.seconds(amps);
    }

    @Override
    public double currentAtSeconds(double seconds) {
        return base.currentAtSeconds(seconds);
    }

    @Override
    public double logSlopeBound(double fromAmps, double toAmps) {
        return base.logSlopeBound(fromAmps, toAmps);
    }

    @Override
    public double logSlopeFloor(double fromAmps, double toAmps) {
        return base.logSlopeFloor(fromAmps, toAmps);
    }

    @Override
    public double[] breakpointsAmps() {
        return base.breakpointsAmps();
    }

    @Override
    public String toString() {
        return base.toString();
    }
}
