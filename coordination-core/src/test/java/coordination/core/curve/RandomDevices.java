package coordination.core.curve;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
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
        if (r.nextInt(3) == 0) {
            inv = inv.withHighCurrent(HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE, 20);
        }
        stages.add(inv);
        if (r.nextBoolean()) {
            stages.add(DefiniteTimeStage.definiteTime(pickup * logUniform(r, 3, 15), logUniform(r, 0.05, 1.0)));
        }
        if (r.nextBoolean()) {
            stages.add(DefiniteTimeStage.instantaneous(pickup * logUniform(r, 10, 40), r.nextDouble(0.0, 0.03)));
        }
        return new Relay("R", stages, 1.0, r.nextBoolean() ? logUniform(r, 0.03, 0.1) : 0.0);
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
        return new Fuse("F", rating, new TabulatedCurve("melting", amps, melt), new TabulatedCurve("clearing", amps,
                clear), r.nextBoolean() ? OptionalDouble.of(amps[n - 1] * amps[n - 1] * clear[n - 1]) : OptionalDouble.empty());
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
        // half of them with a maker's let-through energy
        double i2t = r.nextBoolean() ? logUniform(r, 5e3, 2e5) : Double.NaN;
        return new MiniatureBreaker("M", type, rating, MiniatureBreaker.DEFAULT_FASTEST_SECONDS, i2t);
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
