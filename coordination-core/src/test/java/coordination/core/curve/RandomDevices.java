package coordination.core.curve;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

/** Random devices for property tests; every draw comes from the caller's seeded generator. */
public final class RandomDevices {
    private RandomDevices() {
    }

    static double logUniform(SplittableRandom r, double lo, double hi) {
        return Math.exp(r.nextDouble(Math.log(lo), Math.log(hi)));
    }

    /**
     * A relay with one to three stages.
     *
     * @param r generator
     * @return the relay
     */
    public static Relay relay(SplittableRandom r) {
        double pickup = logUniform(r, 20, 2000);
        List<TimeCurrentCurve> stages = new ArrayList<>();
        InverseTimeFamily f = InverseTimeFamily.values()[r.nextInt(InverseTimeFamily.values().length)];
        double mult = f.multiplierKind() == MultiplierKind.TIME_DIAL ? logUniform(r, 0.5, 10) : logUniform(r, 0.05, 1.0);
        InverseTimeStage inv = InverseTimeStage.of(f, pickup, mult);
        int hc = r.nextInt(3);
        if (hc < 2) {
            inv = inv.withHighCurrent(hc == 0 ? HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE
                    : HighCurrentBehaviour.FOLLOW_EQUATION, 20);
        }
        stages.add(inv);
        if (r.nextBoolean()) {
            stages.add(DefiniteTimeStage.definiteTime(pickup * logUniform(r, 3, 15), logUniform(r, 0.05, 1.0)));
        }
        if (r.nextBoolean()) {
            double inst = pickup * logUniform(r, 10, 40);
            stages.add(r.nextBoolean() ? DefiniteTimeStage.instantaneous(inst, r.nextDouble(0.0, 0.03))
                    : DefiniteTimeStage.instantaneousTimeAssumed(inst));
        }
        // a third with a stated IEC 60255-151 accuracy
        RelayTolerance tolerance = r.nextInt(3) == 0 ? new RelayTolerance(r.nextDouble(0.02, 0.1),
                r.nextDouble(0.0, 0.05), r.nextDouble(0.0, 0.1)) : RelayTolerance.NONE;
        return new Relay("R", stages, java.util.Optional.empty(), r.nextBoolean() ? logUniform(r, 0.03, 0.1) : 0.0,
                tolerance);
    }

    /**
     * A fuse with four to eight points.
     *
     * @param r generator
     * @return the fuse
     */
    public static Fuse fuse(SplittableRandom r) {
        int n = 4 + r.nextInt(5);
        double rating = logUniform(r, 10, 600);
        double[] amps = new double[n];
        double[] melt = new double[n];
        double[] clear = new double[n];
        double a = rating * logUniform(r, 1.3, 2.0);
        double t = logUniform(r, 300, 5000);
        for (int i = 0; i < n; i++) {
            amps[i] = a;
            melt[i] = t;
            clear[i] = t * logUniform(r, 1.05, 1.6) + 0.005;
            a *= logUniform(r, 1.3, 3);
            t /= logUniform(r, 3, 30);
        }
        for (int i = 1; i < n; i++) {
            clear[i] = Math.min(clear[i], clear[i - 1] * 0.99);
            if (clear[i] < melt[i]) {
                clear[i] = melt[i];
            }
        }
        double last = amps[n - 1];
        Optional<LetThroughEnergy> letThrough = r.nextBoolean()
                ? Optional.of(LetThroughEnergy.constant(last * last * clear[n - 1])) : Optional.empty();
        // a maker's pre-arcing I2t above the melting curve: about the adiabatic melting energy, rising slowly
        Optional<LetThroughEnergy> preArcing = r.nextBoolean() ? Optional.of(LetThroughEnergy.points(
                new double[] {last, last * 10, last * 100}, new double[] {last * last * melt[n - 1],
                    last * last * melt[n - 1] * 1.1, last * last * melt[n - 1] * 1.3})) : Optional.empty();
        return new Fuse("F", rating, new TabulatedCurve("melting", amps, melt), new TabulatedCurve("clearing", amps,
                clear), letThrough, preArcing, Optional.empty(), Optional.empty());
    }

    /**
     * A breaker with an electronic trip unit.
     *
     * @param r generator
     * @return the breaker
     */
    public static TripUnitBreaker breaker(SplittableRandom r) {
        double ir = logUniform(r, 40, 2500);
        double isd = r.nextBoolean() ? ir * logUniform(r, 2, 10) : Double.POSITIVE_INFINITY;
        double ii = r.nextBoolean() ? ir * logUniform(r, 12, 15) : Double.POSITIVE_INFINITY;
        return new TripUnitBreaker("B", TripUnitBreaker.Settings.of(ir, logUniform(r, 2, 24), isd,
                logUniform(r, 0.05, 0.4), r.nextBoolean(), ii));
    }

    /**
     * A miniature breaker.
     *
     * @param r generator
     * @return the breaker
     */
    public static MiniatureBreaker mcb(SplittableRandom r) {
        double[] ratings = {6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125};
        McbType type = McbType.values()[r.nextInt(3)];
        double rating = ratings[r.nextInt(ratings.length)];
        // half of them with a maker's let-through energy, half of those as points rising with current
        java.util.Optional<LetThroughEnergy> energy = java.util.Optional.empty();
        if (r.nextBoolean()) {
            double i2t = logUniform(r, 5e3, 2e5);
            energy = java.util.Optional.of(r.nextBoolean() ? LetThroughEnergy.constant(i2t)
                    : LetThroughEnergy.points(new double[] {rating * 10, rating * 100, rating * 1000},
                            new double[] {i2t / 4, i2t, i2t * 2}));
        }
        return new MiniatureBreaker("M", type, rating, MiniatureBreaker.DEFAULT_FASTEST_SECONDS, energy);
    }

    /**
     * Any of the kinds above.
     *
     * @param r generator
     * @return a device
     */
    public static ProtectiveDevice any(SplittableRandom r) {
        switch (r.nextInt(4)) {
            case 0:
                return relay(r);
            case 1:
                return fuse(r);
            case 2:
                return breaker(r);
            default:
                return mcb(r);
        }
    }
}
