package coordination.core.study;

import coordination.core.Quantities;
import coordination.core.curve.DeviceKind;
import coordination.core.margin.DcOffset;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import coordination.core.network.Bus;
import coordination.core.network.CableBranch;
import coordination.core.network.FaultLevel;
import coordination.core.network.FaultLevels;
import coordination.core.network.Network;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Optional;
import java.util.Set;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * The checks a network implies: every cable against the first device upstream of it, and every
 * pair of adjacent devices on a path from the source, each over the currents its position sees.
 *
 * <ul>
 * <li>A cable: from the minimum phase-to-phase current at its far end to the maximum three-phase
 * current at its sending end, with κ from the sending end's R/X for the DC-offset heating.</li>
 * <li>A pair: from the smallest fault both devices see, the minimum phase-to-phase current at the
 * far end of the downstream device's branch, to the largest through-fault at the downstream
 * device, its bus's maximum three-phase current. Across a delta-star transformer, the three-phase
 * and the phase-to-phase case are checked apart: in the latter one HV phase carries 2/√3 of the
 * LV current referred.</li>
 * </ul>
 *
 * Requirements by kinds (common practice): cable margin 0 s; relay over relay 0.3 s (IEEE 242's
 * interval for electromechanical relays, from memory); relay over a fuse or breaker 0.2 s; any
 * other pair no overlap of the bands, which for fuses over fuses includes their energies.
 */
final class Derivation {
    private final Study.StudyNetwork net;
    private final Map<String, Study.StudyDevice> devices;
    private final Map<String, Study.StudyCable> cables;
    private final double studyKv;
    private final double frequencyHz;
    private final NetworkSection section;
    private final List<Note> warnings = new ArrayList<>();
    /** The devices on each branch, in the study's order, and the bus each device sits at. */
    private final Map<String, List<String>> onBranch = new LinkedHashMap<>();
    private final Map<String, String> deviceBus = new LinkedHashMap<>();
    private final Map<String, Network.Branch> branchById = new LinkedHashMap<>();
    private final Map<String, Bus> busById;
    private final Map<String, FaultLevel> levelAt = new HashMap<>();
    private final Set<Network.Branch> feedingBranches;

    /** A derived pair, in study order of discovery. */
    record Pair(String upstream, String downstream) {
    }

    Derivation(Study.StudyNetwork net, Map<String, Study.StudyDevice> devices, Map<String, Study.StudyCable> cables,
            double studyKv, double frequencyHz, NetworkSection section) {
        this.net = net;
        this.devices = devices;
        this.cables = cables;
        this.studyKv = studyKv;
        this.frequencyHz = frequencyHz;
        this.section = section;
        this.busById = net.network().busMap();
        net.levels().levels().forEach(l -> levelAt.putIfAbsent(l.at(), l));
        this.feedingBranches = new HashSet<>(net.levels().parents().values());
        net.network().branches().forEach(br -> branchById.put(br.id(), br));
        for (Map.Entry<String, Study.Placement> e : net.placements().entrySet()) {
            Network.Branch br = branchById.get(e.getValue().branch());
            onBranch.computeIfAbsent(br.id(), k -> new ArrayList<>()).add(e.getKey());
            deviceBus.put(e.getKey(), e.getValue().end() == Study.End.FROM ? br.a() : br.b());
        }
    }

    List<Note> warnings() {
        return warnings;
    }

    private FaultLevels levels() {
        return net.levels();
    }

    private Map<String, Bus> buses() {
        return busById;
    }

    /** A position along a path: the branch's index and 0 at its near end, 1 at its far end. */
    private record Spot(String device, int branch, int rank) {
    }

    private String nearBus(Network.Branch br) {
        String child = br.equals(levels().parents().get(br.b())) ? br.b() : br.a();
        return child.equals(br.a()) ? br.b() : br.a();
    }

    private String farBus(Network.Branch br) {
        return nearBus(br).equals(br.a()) ? br.b() : br.a();
    }

    private String busOf(String device) {
        return deviceBus.get(device);
    }

    private List<Spot> devicesOn(List<Network.Branch> path) {
        List<Spot> spots = new ArrayList<>();
        for (int i = 0; i < path.size(); i++) {
            Network.Branch br = path.get(i);
            String near = nearBus(br);
            for (int rank = 0; rank < 2; rank++) {
                for (String device : onBranch.getOrDefault(br.id(), List.of())) {
                    if (busOf(device).equals(near) == (rank == 0)) {
                        spots.add(new Spot(device, i, rank));
                    }
                }
            }
        }
        return spots;
    }

    private List<String> leaves() {
        Set<String> feeding = new HashSet<>();
        for (Network.Branch br : levels().parents().values()) {
            feeding.add(nearBus(br));
        }
        List<String> out = new ArrayList<>();
        for (Bus bus : net.network().buses()) {
            if (!feeding.contains(bus.id())) {
                out.add(bus.id());
            }
        }
        return out;
    }

    /**
     * A path from the source to a load-end bus.
     *
     * @param leaf the load-end bus
     * @param branches the branch ids, from the source
     * @param devices the devices on it, from the source
     */
    record Route(String leaf, List<String> branches, List<String> devices) {
    }

    /** @return the paths from the source, one per load-end bus */
    List<Route> routes() {
        List<Route> out = new ArrayList<>();
        for (String leaf : leaves()) {
            List<Network.Branch> path = levels().pathTo(leaf);
            out.add(new Route(leaf, path.stream().map(Network.Branch::id).toList(),
                    devicesOn(path).stream().map(Spot::device).toList()));
        }
        return out;
    }

    /** Current at a bus referred to the study's reference voltage. */
    private double refer(double amps, String bus) {
        return amps * buses().get(bus).voltageKv() / studyKv;
    }

    private FaultLevel at(String bus) {
        FaultLevel l = levelAt.get(bus);
        if (l == null) {
            throw new NoSuchElementException("no fault level at '" + bus + "'");
        }
        return l;
    }

    /** The derived cable checks. */
    Map<String, Study.CableCheckSpec> cableChecks() {
        Map<String, Study.CableCheckSpec> out = new LinkedHashMap<>();
        for (var c : net.network().cables()) {
            Network.Branch br = branchById.get(c.id());
            if (!feedingBranches.contains(br)) {
                continue;
            }
            String far = farBus(br);
            List<Network.Branch> path = levels().pathTo(far);
            List<Spot> spots = devicesOn(path);
            int k = path.size() - 1;
            Spot protector = null;
            for (Spot s : spots) {
                if (s.branch() < k || s.branch() == k && s.rank() == 0) {
                    protector = s;
                }
            }
            if (protector == null) {
                warnings.add(new Note("cable-unprotected", "cable '" + c.id() + "': no device upstream of it in the"
                        + " network, so it is not checked"));
                continue;
            }
            String from = nearBus(br);
            if (Math.abs(buses().get(from).voltageKv() / studyKv - 1) > 1e-9) {
                warnings.add(new Note("cable-not-at-reference", "cable '" + c.id() + "': at "
                        + buses().get(from).voltageKv() + " kV, not the study's reference " + studyKv
                        + " kV, so its check is not derived"));
                continue;
            }
            FaultLevel send = at(from);
            FaultLevel end = at(far);
            double lo = refer(end.ik2MinAmps(), far);
            double hi = refer(send.ik3MaxAmps(), from);
            if (!(hi > lo)) {
                continue;
            }
            MarginRequirement req = MarginRequirement.seconds(section.cableMarginSeconds());
            Optional<DcOffset> dc = Optional.of(new DcOffset(send.kappa(), frequencyHz));
            out.put(c.id(), new Study.CableCheckSpec(c.id(), protector.device(), req, new Study.CurrentRange(lo, hi),
                    dc, Study.DcSource.FROM_NETWORK, true));
            if (c.parallel() > 1) {
                parallelCheck(c, protector.device(), from, req, dc).ifPresent(p -> out.put(c.id() + "#parallel", p));
            }
        }
        return out;
    }

    /**
     * IEC 60364-4-43, 434.4: a fault inside one of n parallel conductors is fed from both ends, and
     * the faulted conductor carries more than 1/n of the current the device sees. At a fraction x
     * of the length, the near part (x z) and the path through the other conductors and back
     * (z/(n−1) + (1−x) z) share the current as B/(A+B) and A/(A+B); the device sees the whole. The
     * worst position is the one of least margin: a scan over x, refined by Brent's method.
     */
    private Optional<Study.CableCheckSpec> parallelCheck(CableBranch c, String device,
            String from, MarginRequirement req, Optional<DcOffset> dc) {
        int n = c.parallel();
        // one conductor's impedance: the branch's is that of all n in parallel
        double rMax = c.resistanceOhm(20) * n;
        double rMin = c.resistanceOhm(c.endTemperatureC()) * n;
        double xOne = c.reactanceOhm() * n;
        DoubleFunction<Study.CableCheckSpec> at = x -> {
            double[] split = parallelFault(n, x);
            double share = split[0];
            FaultLevel l = levels().beyond(buses().get(from), c.id(), rMax * split[1], rMin * split[1], xOne * split[1]);
            return new Study.CableCheckSpec(c.id(), device, req, new Study.CurrentRange(
                    refer(share * l.ik2MinAmps(), from), refer(share * l.ik3MaxAmps(), from)), dc,
                    Study.DcSource.FROM_NETWORK, true, "fault inside one of " + n + " parallel conductors "
                    + (x < 1e-3 ? "at its sending end" : x > 1 - 1e-3 ? "at its far end"
                    : "at " + Quantities.significant(x, 3) + " of its length"), share);
        };
        Study.StudyCable cable = cables.get(c.id());
        coordination.core.margin.CableChecker checker = new coordination.core.margin.CableChecker();
        DoubleUnaryOperator margin = x -> {
            double m = StudyReport.cableCheck(devices.get(device).referred(), cable.limit(), at.apply(x), checker)
                    .minMarginSeconds();
            return Double.isNaN(m) ? Double.NEGATIVE_INFINITY : m;
        };
        int steps = 20;
        double eps = 1e-6;
        double bestX = eps;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= steps; i++) {
            double x = Math.min(1 - eps, Math.max(eps, (double) i / steps));
            double m = margin.applyAsDouble(x);
            if (m < best) {
                best = m;
                bestX = x;
            }
        }
        if (Double.isFinite(best)) {
            double lo = Math.max(eps, bestX - 1.0 / steps);
            double hi = Math.min(1 - eps, bestX + 1.0 / steps);
            var opt = new BrentOptimizer(1e-10, 1e-12);
            var r = opt.optimize(new MaxEval(200),
                    new UnivariateObjectiveFunction(margin::applyAsDouble),
                    GoalType.MINIMIZE,
                    new SearchInterval(lo, hi, bestX));
            if (r.getValue() < best) {
                bestX = r.getPoint();
            }
        }
        Study.CableCheckSpec worst = at.apply(bestX);
        return worst.range().toAmps() > worst.range().fromAmps() ? Optional.of(worst) : Optional.empty();
    }

    /**
     * The current division for a fault at a fraction of the length of one of n parallel conductors
     * joined at both ends. The near part (x z) and the path through the other conductors and back
     * (z/(n−1) + (1−x) z) are in phase, so the shares are real.
     *
     * @param n the number of conductors, at least 2
     * @param x the fault position as a fraction of the length from the sending end
     * @return {the larger share of the fault current in the faulted conductor, the impedance from
     *     the sending end to the fault as a fraction of one conductor's}
     */
    static double[] parallelFault(int n, double x) {
        double total = (double) n / (n - 1);
        double a = x;
        double b = total - x;
        return new double[] {Math.max(a, b) / total, a * b / total};
    }

    /** The derived grading checks, by pair; a pair across a delta-star transformer has two. */
    Map<Pair, List<Study.GradingCheckSpec>> gradingChecks() {
        Map<Pair, List<Study.GradingCheckSpec>> out = new LinkedHashMap<>();
        for (String leaf : leaves()) {
            List<Network.Branch> path = levels().pathTo(leaf);
            List<Spot> spots = devicesOn(path);
            for (int i = 0; i + 1 < spots.size(); i++) {
                Spot up = spots.get(i);
                Spot down = spots.get(i + 1);
                Pair pair = new Pair(up.device(), down.device());
                if (out.containsKey(pair)) {
                    continue;
                }
                out.put(pair, pairChecks(up, down, path));
            }
        }
        return out;
    }

    private List<Study.GradingCheckSpec> pairChecks(Spot up, Spot down, List<Network.Branch> path) {
        Network.Branch downBranch = path.get(down.branch());
        String location = busOf(down.device());
        String far = farBus(downBranch);
        FaultLevel max = at(location);
        FaultLevel min = at(far);
        GradingRequirement req = requirement(devices.get(up.device()).device().kind(),
                devices.get(down.device()).device().kind());
        boolean deltaStar = false;
        for (int i = up.branch(); i <= down.branch(); i++) {
            Network.Branch br = path.get(i);
            boolean between = (i > up.branch() || up.rank() == 0) && (i < down.branch() || down.rank() == 1);
            if (between && br instanceof Network.TransformerBranch t && t.transformer().deltaStar()) {
                deltaStar = true;
            }
        }
        List<Study.GradingCheckSpec> out = new ArrayList<>();
        if (!deltaStar) {
            double lo = refer(min.ik2MinAmps(), far);
            double hi = refer(max.ik3MaxAmps(), location);
            if (hi > lo) {
                out.add(new Study.GradingCheckSpec(up.device(), down.device(), req, new Study.CurrentRange(lo, hi),
                        true, "", 1.0));
            }
            return out;
        }
        double lo3 = refer(min.ik3MinAmps(), far);
        double hi3 = refer(max.ik3MaxAmps(), location);
        if (hi3 > lo3) {
            out.add(new Study.GradingCheckSpec(up.device(), down.device(), req, new Study.CurrentRange(lo3, hi3), true,
                    "three-phase", 1.0));
        }
        double lo2 = refer(min.ik2MinAmps(), far);
        double hi2 = refer(Math.sqrt(3) / 2 * max.ik3MaxAmps(), location);
        if (hi2 > lo2) {
            out.add(new Study.GradingCheckSpec(up.device(), down.device(), req, new Study.CurrentRange(lo2, hi2), true,
                    "phase-to-phase", 2 / Math.sqrt(3)));
        }
        return out;
    }

    private GradingRequirement requirement(DeviceKind up, DeviceKind down) {
        if (up == DeviceKind.RELAY && down == DeviceKind.RELAY) {
            return GradingRequirement.intervalSeconds(section.relayOverRelaySeconds());
        }
        if (up == DeviceKind.RELAY) {
            return GradingRequirement.intervalSeconds(section.relayOverOtherSeconds());
        }
        return GradingRequirement.noOverlap();
    }
}
