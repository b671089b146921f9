package coordination.core.matchers;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.internal.Checks;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import coordination.core.margin.Side;
import org.hamcrest.Description;
import org.hamcrest.TypeSafeDiagnosingMatcher;

/**
 * Entry points of the matchers:
 *
 * <pre>{@code
 * assertThat(feederRelay, protects(cable).between(1_500, 12_000).withMarginOfSeconds(0.1));
 * assertThat(feederRelay, gradesUnder(incomer).between(1_500, 12_000).withIntervalOfSeconds(0.3));
 * }</pre>
 *
 * <p>The matchers are Hamcrest matchers, so their signatures name Hamcrest types; the module reads
 * Hamcrest only when it is present, as it is wherever the matchers are used (a test path).
 */
@SuppressWarnings("exports")
public final class CoordinationMatchers {
    private CoordinationMatchers() {
    }

    /**
     * Starts a matcher that passes when a device clears every fault in a range before the cable
     * is damaged.
     *
     * @param cable the cable to protect
     * @return a matcher to complete with {@code between(...)} and a margin
     */
    public static ProtectsCable protects(CableThermalLimit cable) {
        return new ProtectsCable(cable, Double.NaN, Double.NaN, MarginRequirement.seconds(0));
    }

    /**
     * Starts a matcher that passes when a device (the downstream one) clears before an upstream
     * device operates, by an interval.
     *
     * @param upstream the device nearer the source
     * @return a matcher to complete with {@code between(...)} and an interval
     */
    public static GradesUnder gradesUnder(ProtectiveDevice upstream) {
        return new GradesUnder(upstream, Double.NaN, Double.NaN, GradingRequirement.intervalSeconds(0));
    }

    private static double sided(double amps, Side side) {
        return side == Side.BELOW ? amps * (1 - 1e-9) : side == Side.ABOVE ? amps * (1 + 1e-9) : amps;
    }

    /** Matches a device that protects a cable; immutable, each refinement returns a new matcher. */
    public static final class ProtectsCable extends TypeSafeDiagnosingMatcher<ProtectiveDevice> {
        private final CableThermalLimit cable;
        private final double fromAmps;
        private final double toAmps;
        private final MarginRequirement requirement;

        ProtectsCable(CableThermalLimit cable, double fromAmps, double toAmps, MarginRequirement requirement) {
            this.cable = cable;
            this.fromAmps = fromAmps;
            this.toAmps = toAmps;
            this.requirement = requirement;
        }

        /**
         * The range of prospective fault currents.
         *
         * @param minAmps lowest fault current in amperes
         * @param maxAmps highest fault current in amperes
         * @return the refined matcher
         */
        public ProtectsCable between(double minAmps, double maxAmps) {
            return new ProtectsCable(cable, minAmps, maxAmps, requirement);
        }

        /**
         * Requires at least this time margin.
         *
         * @param seconds margin in seconds
         * @return the refined matcher
         */
        public ProtectsCable withMarginOfSeconds(double seconds) {
            return new ProtectsCable(cable, fromAmps, toAmps, MarginRequirement.seconds(seconds));
        }

        /**
         * Requires at least this ratio of cable damage time to device clearing time.
         *
         * @param ratio the ratio, 1 or more
         * @return the refined matcher
         */
        public ProtectsCable withMarginRatio(double ratio) {
            return new ProtectsCable(cable, fromAmps, toAmps, MarginRequirement.ratio(ratio));
        }

        @Override
        protected boolean matchesSafely(ProtectiveDevice device, Description mismatch) {
            requireRange(fromAmps, toAmps);
            CableCheck check = new CableCheck(device, cable, fromAmps, toAmps, requirement, null);
            CableCheckResult r = check.result();
            if (r.pass()) {
                return true;
            }
            if (!Double.isNaN(r.undefinedFromAmps()) || !Double.isNaN(r.notClearedFromAmps())
                    || Double.isInfinite(r.minMarginSeconds())) {
                mismatch.appendText(r.reason());
                return false;
            }
            boolean ratio = requirement instanceof MarginRequirement.Ratio;
            double at = ratio ? r.minRatioAtAmps() : r.minMarginAtAmps();
            Side side = ratio ? r.minRatioSide() : r.minMarginSide();
            double probe = sided(at, side);
            double td = check.equivalentSeconds(probe);
            double tc = cable.damageSeconds(probe);
            mismatch.appendText("at " + Checks.format(at) + " A" + (side == Side.AT ? "" : " (just " + side.key() + ")")
                    + " '" + device.id() + "' clears in " + Checks.format(td) + " s and '" + cable.id()
                    + "' is damaged in " + Checks.format(tc) + " s: ");
            if (requirement instanceof MarginRequirement.Seconds s) {
                mismatch.appendText("margin " + Checks.format(r.minMarginSeconds()) + " s, "
                        + Checks.format(s.seconds() - r.minMarginSeconds()) + " s short of " + requirement);
            } else {
                MarginRequirement.Ratio q = (MarginRequirement.Ratio) requirement;
                mismatch.appendText("ratio " + Checks.format(r.minRatio()) + ", short of " + Checks.format(q.ratio()));
            }
            return false;
        }

        @Override
        public void describeTo(Description description) {
            description.appendText("a device that protects cable '" + cable.id() + "' from " + Checks.format(fromAmps)
                    + " A to " + Checks.format(toAmps) + " A with a margin of " + requirement);
        }
    }

    /** Matches a downstream device that grades under an upstream one; immutable. */
    public static final class GradesUnder extends TypeSafeDiagnosingMatcher<ProtectiveDevice> {
        private final ProtectiveDevice upstream;
        private final double fromAmps;
        private final double toAmps;
        private final GradingRequirement requirement;

        GradesUnder(ProtectiveDevice upstream, double fromAmps, double toAmps, GradingRequirement requirement) {
            this.upstream = upstream;
            this.fromAmps = fromAmps;
            this.toAmps = toAmps;
            this.requirement = requirement;
        }

        /**
         * The range of currents seen by both devices.
         *
         * @param minAmps lowest current in amperes
         * @param maxAmps highest current in amperes
         * @return the refined matcher
         */
        public GradesUnder between(double minAmps, double maxAmps) {
            return new GradesUnder(upstream, minAmps, maxAmps, requirement);
        }

        /**
         * Requires at least this coordination time interval.
         *
         * @param seconds interval in seconds
         * @return the refined matcher
         */
        public GradesUnder withIntervalOfSeconds(double seconds) {
            return new GradesUnder(upstream, fromAmps, toAmps, GradingRequirement.intervalSeconds(seconds));
        }

        /** @return the refined matcher requiring only that the bands do not overlap */
        public GradesUnder withoutOverlap() {
            return new GradesUnder(upstream, fromAmps, toAmps, GradingRequirement.noOverlap());
        }

        @Override
        protected boolean matchesSafely(ProtectiveDevice downstream, Description mismatch) {
            requireRange(fromAmps, toAmps);
            GradingCheckResult r = GradingCheck.check(upstream, downstream, fromAmps, toAmps, requirement);
            if (r.pass()) {
                return true;
            }
            if (!Double.isFinite(r.minIntervalSeconds())) {
                mismatch.appendText(r.reason());
                return false;
            }
            double probe = sided(r.minIntervalAtAmps(), r.minIntervalSide());
            double tu = upstream.minimumCurve().seconds(probe);
            double td = (r.toOperatingTime() ? downstream.slowestOperatingCurve() : downstream.maximumCurve())
                    .seconds(probe);
            Side side = r.minIntervalSide();
            mismatch.appendText("at " + Checks.format(r.minIntervalAtAmps()) + " A"
                    + (side == Side.AT ? "" : " (just " + side.key() + ")") + " '" + upstream.id()
                    + "' operates in " + Checks.format(tu) + " s and '" + downstream.id() + "' "
                    + (r.toOperatingTime() ? "operates" : "clears") + " in "
                    + Checks.format(td) + " s: interval " + Checks.format(r.minIntervalSeconds()) + " s, "
                    + Checks.format(r.requiredSeconds() - r.minIntervalSeconds()) + " s short of " + requirement);
            return false;
        }

        @Override
        public void describeTo(Description description) {
            description.appendText("a device that grades under '" + upstream.id() + "' from " + Checks.format(fromAmps)
                    + " A to " + Checks.format(toAmps) + " A with an interval of " + requirement);
        }
    }

    private static void requireRange(double fromAmps, double toAmps) {
        if (Double.isNaN(fromAmps) || Double.isNaN(toAmps)) {
            throw new IllegalArgumentException("matcher: no current range - call between(minAmps, maxAmps)");
        }
    }
}
