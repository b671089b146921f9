package coordination.plot.sheet;

import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.HighCurrentBehaviour;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.MiniatureBreaker;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.curve.TripUnitBreaker;
import coordination.core.study.Study;
import coordination.core.Quantities;
import java.util.ArrayList;
import java.util.List;

/** The lines of a sheet's settings table for one device: its settings as the study gives them. */
final class SettingsText {
    private SettingsText() {
    }

    /**
     * The heading line of a device: its id and kind, and a relay's breaker interrupting time.
     *
     * @param d the device of the study
     * @return the line
     */
    static String heading(Study.StudyDevice d) {
        String breaker = d.device() instanceof Relay r && r.breakerSeconds() > 0
                ? ", breaker " + g(r.breakerSeconds()) + " s" : "";
        return d.id() + " (" + d.device().kind().key() + breaker + ")";
    }

    /**
     * Describes a device.
     *
     * @param d the device of the study
     * @return one line per setting
     */
    static List<String> lines(Study.StudyDevice d) {
        List<String> lines = new ArrayList<>();
        ProtectiveDevice device = d.device();
        if (device instanceof Relay relay) {
            relay(relay, lines);
        } else if (device instanceof Fuse fuse) {
            lines.add("rating " + g(fuse.ratingAmps()) + " A, " + fuse.minimumCurve().amps().length
                    + " melting and " + fuse.maximumCurve().amps().length + " clearing points");
            fuse.category().ifPresent(c -> lines.add("category " + c + fuse.series().map(x -> ", series " + x).orElse("")));
            fuse.letThrough().ifPresent(e -> lines.add("let-through " + energy(e)));
            fuse.preArcing().ifPresent(e -> lines.add("pre-arcing " + energy(e)));
        } else if (device instanceof TripUnitBreaker breaker) {
            TripUnitBreaker.Settings s = breaker.settings();
            lines.add("long time: Ir " + g(s.irAmps()) + " A, tr " + g(s.trSeconds()) + " s at 6 Ir");
            if (Double.isFinite(s.isdAmps())) {
                lines.add("short time: Isd " + g(s.isdAmps()) + " A, tsd " + g(s.tsdSeconds()) + " s"
                        + (s.shortTimeI2t() ? ", I²t on" : ""));
            }
            if (Double.isFinite(s.iiAmps())) {
                lines.add("instantaneous: Ii " + g(s.iiAmps()) + " A");
            }
            lines.add("tolerance: pickup ±" + g(s.pickupTolerance() * 100) + " %, time ±" + g(s.timeTolerance() * 100)
                    + " %");
        } else if (device instanceof MiniatureBreaker mcb) {
            lines.add("type " + mcb.type().name() + ", In " + g(mcb.ratedAmps()) + " A (IEC 60898-1)");
            mcb.letThrough().ifPresent(e -> lines.add("let-through " + energy(e)));
        }
        if (d.referralFactor() != 1.0) {
            lines.add("at " + g(d.voltageKv()) + " kV: currents x" + Quantities.significant(d.referralFactor(), 3)
                    + " on the chart");
        }
        return lines;
    }

    private static void relay(Relay relay, List<String> lines) {
        for (TimeCurrentCurve s : relay.stages()) {
            if (s instanceof InverseTimeStage inv) {
                lines.add(inv.label() + ": pickup " + g(inv.pickupAmps()) + " A, "
                        + inv.multiplierKind().key().replace('_', ' ') + " " + g(inv.multiplier())
                        + (inv.highCurrent() == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE
                        ? ", held above " + g(inv.upperMultiple()) + "x" : ""));
            } else if (s instanceof DefiniteTimeStage dt && dt.instantaneous()) {
                lines.add("instantaneous: pickup " + g(dt.pickupAmps()) + " A"
                        + (dt.delaySeconds() > 0 ? ", " + g(dt.delaySeconds()) + " s" : ""));
            } else if (s instanceof DefiniteTimeStage dt) {
                lines.add("definite time: pickup " + g(dt.pickupAmps()) + " A, delay " + g(dt.delaySeconds()) + " s");
            }
        }
        if (!relay.tolerance().isNone()) {
            lines.add("tolerance: time ±" + g(relay.tolerance().timeFraction() * 100) + " % or "
                    + g(relay.tolerance().timeMinSeconds()) + " s, pickup ±" + g(relay.tolerance().pickupFraction() * 100)
                    + " %");
        }
        relay.currentTransformer().ifPresent(ct -> lines.add("CT " + g(ct.primaryAmps()) + "/" + g(ct.secondaryAmps())
                + " A, settings in secondary A"));
    }

    private static String energy(LetThroughEnergy e) {
        if (e.isConstant()) {
            return "I²t " + g(e.energiesA2s()[0]) + " A²s (one value)";
        }
        double[] a = e.amps();
        return "I²t " + e.amps().length + " points, " + Quantities.kiloamps(a[0], 3) + " to "
                + Quantities.kiloamps(a[a.length - 1], 3) + " kA";
    }

    private static String g(double v) {
        return Quantities.asGiven(v);
    }
}
