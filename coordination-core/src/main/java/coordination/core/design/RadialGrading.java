package coordination.core.design;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.internal.Checks;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheck;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.util.ArrayList;
import java.util.List;

/**
 * Time multipliers for a radial chain of relays that grade: from the load end to the source, each
 * relay's first inverse-time stage gets the smallest multiplier that gives the required interval
 * over the relay below it, the most downstream relay the smallest multiplier its range allows. The
 * interval only grows with the upstream multiplier, so the smallest is found by bisection. Each
 * cable is then checked against its relay; as a larger multiplier only slows the relay, a cable that
 * fails at the smallest grading multiplier fails at every one, and the result says so.
 */
public final class RadialGrading {
    private RadialGrading() {
    }

    /**
     * One relay of the chain.
     *
     * @param relay the relay; its first inverse-time stage's multiplier is chosen
     * @param referFactor current scale to the chain's common voltage base
     * @param cable the cable it protects, or null
     * @param cableMargin the margin the cable needs (ignored without a cable)
     * @param faultMinAmps lowest fault current at its location in amperes (on the common base)
     * @param faultMaxAmps highest fault current at its location in amperes
     * @param minMultiplier the relay's smallest multiplier setting
     * @param maxMultiplier the relay's largest multiplier setting
     */
    public record Link(Relay relay, double referFactor, CableThermalLimit cable, MarginRequirement cableMargin,
            double faultMinAmps,
            double faultMaxAmps, double minMultiplier, double maxMultiplier) {
        /**
         * Validates the link.
         *
         * @throws IllegalArgumentException if the relay or requirement is missing, or a number is out of range
         */
        public Link {
            Checks.given("grading link: relay", relay);
            Checks.given("grading link '" + relay.id() + "': cable margin", cableMargin);
            Checks.positive("grading link '" + relay.id() + "': referral factor", referFactor, "");
            Checks.currentRange("grading link '" + relay.id() + "': fault range", faultMinAmps, faultMaxAmps);
            Checks.positive("grading link '" + relay.id() + "': smallest multiplier", minMultiplier, "");
            Checks.positive("grading link '" + relay.id() + "': largest multiplier", maxMultiplier, "");
            if (maxMultiplier < minMultiplier) {
                throw new IllegalArgumentException("grading link '" + relay.id() + "': largest multiplier "
                        + Checks.format(maxMultiplier) + " is below the smallest " + Checks.format(minMultiplier)
                        + " - must be at or above it");
            }
        }
    }

    /**
     * The proposal for one relay.
     *
     * @param id relay id
     * @param currentMultiplier the multiplier as set
     * @param multiplier the proposed multiplier, NaN if none in the relay's range meets the grading
     * @param grading the grading with the relay below at the proposed multiplier, or null for the
     *     most downstream relay
     * @param cable the cable check at the proposed multiplier, or null without a cable
     * @param problem what cannot be met, or null
     */
    public record Setting(String id, double currentMultiplier, double multiplier, GradingCheckResult grading,
            CableCheckResult cable, String problem) {
    }

    /**
     * Grades a chain.
     *
     * @param chain relays from the load end (index 0) to the source
     * @param interval the coordination time interval in seconds
     * @return one setting per relay, in chain order
     */
    public static List<Setting> grade(List<Link> chain, double interval) {
        List<Setting> out = new ArrayList<>();
        ProtectiveDevice below = null;
        Link belowLink = null;
        for (Link link : chain) {
            int index = inverseStage(link.relay());
            InverseTimeStage stage = (InverseTimeStage) link.relay().stages().get(index);
            double m;
            GradingCheckResult grading = null;
            String problem = null;
            if (below == null) {
                m = link.minMultiplier();
            } else {
                ProtectiveDevice down = below;
                // grade over the fault range at the relay below: the currents both relays see
                double lo = belowLink.faultMinAmps();
                double hi = belowLink.faultMaxAmps();
                GradingRequirement req = GradingRequirement.intervalSeconds(interval);
                if (GradingCheck.check(with(link, index, stage, link.minMultiplier()), down, lo, hi, req).pass()) {
                    m = link.minMultiplier();
                } else if (!GradingCheck.check(with(link, index, stage, link.maxMultiplier()), down, lo, hi, req).pass()) {
                    m = Double.NaN;
                    problem = "no multiplier up to " + Checks.format(link.maxMultiplier()) + " gives "
                            + Checks.format(interval) + " s over '" + down.id() + "': "
                            + GradingCheck.check(with(link, index, stage, link.maxMultiplier()), down, lo, hi, req)
                                    .reason();
                } else {
                    m = Boundary.solve(v -> !GradingCheck.check(with(link, index, stage, v), down, lo, hi, req).pass(),
                            link.minMultiplier(), link.maxMultiplier());
                    // the boundary's failing side: step just onto the passing side
                    m = m * (1 + 2 * Boundary.RELATIVE);
                }
                if (!Double.isNaN(m)) {
                    grading = GradingCheck.check(with(link, index, stage, m), down, lo, hi, req);
                }
            }
            CableCheckResult cable = null;
            if (!Double.isNaN(m) && link.cable() != null) {
                cable = CableCheck.check(with(link, index, stage, m), link.cable(), link.faultMinAmps(),
                        link.faultMaxAmps(), link.cableMargin());
                if (!cable.pass()) {
                    problem = "the grading needs multiplier " + Checks.format(m) + ", at which '" + link.cable().id()
                            + "' is not protected (" + cable.reason() + "); no multiplier meets both";
                }
            }
            out.add(new Setting(link.relay().id(), stage.multiplier(), m, grading, cable, problem));
            if (Double.isNaN(m)) {
                // the chain above cannot be graded against a relay that has no valid setting
                below = with(link, index, stage, stage.multiplier());
            } else {
                below = with(link, index, stage, m);
            }
            belowLink = link;
        }
        return out;
    }

    static int inverseStage(Relay relay) {
        for (int i = 0; i < relay.stages().size(); i++) {
            if (relay.stages().get(i) instanceof InverseTimeStage) {
                return i;
            }
        }
        throw new IllegalArgumentException("relay '" + relay.id() + "': no inverse-time stage to grade");
    }

    private static ProtectiveDevice with(Link link, int index, InverseTimeStage stage, double multiplier) {
        List<TimeCurrentCurve> stages = new ArrayList<>(link.relay().stages());
        stages.set(index, stage.withMultiplier(multiplier));
        return link.relay().withStages(stages).referredBy(link.referFactor());
    }
}
