package coordination.core.curve;

import coordination.core.internal.Checks;
import coordination.core.internal.RecordForm;
import java.io.Serial;
import java.util.Optional;

/**
 * A miniature circuit breaker to IEC 60898-1:2015, its band built from the time-current points of
 * Table 7 (from memory):
 *
 * <ul>
 *   <li>thermal region: the conventional non-tripping current 1.13 In (no trip within 1 h) and the
 *       conventional tripping current 1.45 In (trip within 1 h); at 2.55 In, trip between 1 s and
 *       60 s (In up to 32 A) or 120 s (In above 32 A). The minimum curve joins (1.13 In, 3600 s) to
 *       (2.55 In, 1 s), the maximum curve (1.45 In, 3600 s) to (2.55 In, 60 or 120 s), linearly in
 *       log-log; above 2.55 In both continue at constant I²t;</li>
 *   <li>instantaneous region: no trip within 0.1 s below the type's lower multiple, so the minimum
 *       curve is held at 0.1 s or more until it, and steps to the fastest clearing time there; a
 *       trip within 0.1 s at the upper multiple, so the maximum curve steps to 0.1 s there.</li>
 * </ul>
 *
 * The standard sets no lower limit on the instantaneous clearing time; the fastest clearing time is
 * a parameter ({@link #DEFAULT_FASTEST_SECONDS} unless stated). Where the maker states the
 * breaker's let-through energy I²t (energy-limiting breakers, IEC 60898-1 energy limiting classes),
 * a cable check compares that energy with k²S² from the type's upper instantaneous multiple up;
 * the maximum curve stays at the standard's 0.1 s, the slowest clearing a grading check may assume.
 *
 * @param id identifier
 * @param type the instantaneous tripping type
 * @param ratedAmps rated current In in amperes, above 0
 * @param fastestSeconds fastest clearing time in the instantaneous region, from 0 to 0.1 s
 * @param letThrough the maker's let-through energy against prospective current, or empty
 */
public record MiniatureBreaker(String id, McbType type, double ratedAmps, double fastestSeconds,
        Optional<LetThroughEnergy> letThrough) implements ProtectiveDevice {
    /** Optionals cannot be serialized: the record goes as its components. */
    @Serial
    private Object writeReplace() {
        return RecordForm.of(this);
    }

    /** Fastest instantaneous clearing time assumed when none is stated: 5 ms, a quarter cycle at 50 Hz. */
    public static final double DEFAULT_FASTEST_SECONDS = 0.005;

    /** IEC 60898-1 Table 7: one hour, the conventional time. */
    static final double CONVENTIONAL_SECONDS = 3600.0;
    /** IEC 60898-1 Table 7: the 0.1 s limit of the instantaneous tests. */
    static final double INSTANTANEOUS_LIMIT_SECONDS = 0.1;

    /**
     * Validates the settings.
     *
     * @param id identifier
     * @param type the instantaneous tripping type
     * @param ratedAmps rated current In in amperes, above 0
     * @param fastestSeconds fastest clearing time in the instantaneous region, from 0 to 0.1 s
     * @param letThrough the maker's let-through energy against prospective current, or empty
     * @throws IllegalArgumentException if a parameter is out of range
     */
    public MiniatureBreaker {
        Checks.given("mcb: id", id);
        Checks.positive("mcb '" + id + "': rating", ratedAmps, "A");
        Checks.inRange("mcb '" + id + "': fastest clearing time", fastestSeconds, 0.0, INSTANTANEOUS_LIMIT_SECONDS, "s");
        Checks.given("mcb '" + id + "': let-through energy", letThrough);
        if (type == null) {
            throw new IllegalArgumentException("mcb '" + id + "': type: found null - must be B, C or D");
        }
    }

    /**
     * A breaker with the default fastest clearing time.
     *
     * @param id identifier
     * @param type B, C or D
     * @param ratedAmps In in amperes
     * @return the breaker
     */
    public static MiniatureBreaker of(String id, McbType type, double ratedAmps) {
        return new MiniatureBreaker(id, type, ratedAmps, DEFAULT_FASTEST_SECONDS, Optional.empty());
    }

    /** @return the upper instantaneous multiple times In: from here the breaker clears within 0.1 s */
    @Override
    public double letThroughFromAmps() {
        return type.highMultiple() * ratedAmps;
    }

    @Override
    public DeviceKind kind() {
        return DeviceKind.MCB;
    }

    @Override
    public TimeCurrentCurve minimumCurve() {
        return new Edge(this, false);
    }

    @Override
    public TimeCurrentCurve maximumCurve() {
        return new Edge(this, true);
    }

    /** @return the longest time allowed at 2.55 In by Table 7: 60 s up to 32 A, 120 s above */
    double slowSecondsAt255() {
        return ratedAmps <= 32.0 ? 60.0 : 120.0;
    }

    private record Edge(MiniatureBreaker mcb, boolean maximum) implements TimeCurrentCurve {
        private static final double KNEE_MULTIPLE = 2.55;

        @Override
        public double seconds(double amps) {
            Curves.checkCurrent(amps);
            double in = mcb.ratedAmps;
            double startMultiple = maximum ? 1.45 : 1.13;
            double kneeSeconds = maximum ? mcb.slowSecondsAt255() : 1.0;
            double m = amps / in;
            if (m < startMultiple) {
                return Double.POSITIVE_INFINITY;
            }
            if (maximum && m >= mcb.type.highMultiple()) {
                return INSTANTANEOUS_LIMIT_SECONDS;
            }
            if (!maximum && m >= mcb.type.lowMultiple()) {
                return mcb.fastestSeconds;
            }
            double t;
            if (m <= KNEE_MULTIPLE) {
                double f = Math.log(m / startMultiple) / Math.log(KNEE_MULTIPLE / startMultiple);
                t = CONVENTIONAL_SECONDS * Math.exp(f * Math.log(kneeSeconds / CONVENTIONAL_SECONDS));
            } else {
                double r = KNEE_MULTIPLE / m;
                t = kneeSeconds * r * r;
            }
            return maximum ? t : Math.max(t, INSTANTANEOUS_LIMIT_SECONDS);
        }

        @Override
        public double[] breakpointsAmps() {
            double in = mcb.ratedAmps;
            if (maximum) {
                return new double[] {1.45 * in, KNEE_MULTIPLE * in, mcb.type.highMultiple() * in};
            }
            // where the constant-I²t part meets the 0.1 s floor, if that lies before the step
            double floorAt = KNEE_MULTIPLE * Math.sqrt(1.0 / INSTANTANEOUS_LIMIT_SECONDS);
            if (floorAt < mcb.type.lowMultiple()) {
                return new double[] {1.13 * in, KNEE_MULTIPLE * in, floorAt * in, mcb.type.lowMultiple() * in};
            }
            return new double[] {1.13 * in, KNEE_MULTIPLE * in, mcb.type.lowMultiple() * in};
        }

        @Override
        public String toString() {
            return "mcb '" + mcb.id + "' " + (maximum ? "maximum" : "minimum");
        }
    }
}
