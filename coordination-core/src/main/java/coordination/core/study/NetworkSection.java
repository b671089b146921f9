package coordination.core.study;

import static coordination.core.study.Binder.NumberField.number;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorResistance;
import coordination.core.internal.Checks;
import coordination.core.network.Bus;
import coordination.core.network.CableBranch;
import coordination.core.network.FaultLevels;
import coordination.core.network.Network;
import coordination.core.network.Source;
import coordination.core.network.Transformer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Reads a study's {@code network} section, the branch keys of its cables and the placement keys
 * of its devices, and builds the network with its fault levels. Every problem is located at the
 * element it concerns.
 */
final class NetworkSection {
    private static final Binder.NumberField BUS_KV = number("voltage_kv", "kV").above(0).to(1000).required();
    private static final Binder.NumberField C_FACTOR = number("", "").from(0.8).to(1.2);
    private static final Binder.NumberField SK_MAX = number("sk_max_mva", "MVA").above(0).to(1e6).required();
    private static final Binder.NumberField SK_MIN = number("sk_min_mva", "MVA").above(0).to(1e6).required();
    private static final Binder.NumberField SOURCE_XR = number("x_r", "").above(0).to(1000).required();
    private static final Binder.NumberField SR = number("sr_kva", "kVA").above(0).to(1e7).required();
    private static final Binder.NumberField UK = number("uk_percent", "%").above(0).to(100).required();
    private static final Binder.NumberField PK = number("pk_kw", "kW").from(0).to(1e5).required();
    private static final Binder.NumberField LENGTH = number("length_m", "m").above(0).to(1e6).required();
    private static final Binder.NumberField R_KM = number("r_ohm_per_km", "Ω/km").above(0).to(1000);
    private static final Binder.NumberField X_KM = number("x_ohm_per_km", "Ω/km").from(0).to(100)
            .orElse(ConductorResistance.DEFAULT_REACTANCE_OHM_PER_KM);
    private static final Binder.NumberField END_T = number("end_temperature_c", "°C").from(20).to(1000);
    private static final Binder.NumberField DEFAULT_MARGIN = number("cable_margin_s", "s").from(0).to(100).orElse(0);
    private static final Binder.NumberField DEFAULT_RELAY_RELAY = number("relay_over_relay_s", "s").from(0).to(100)
            .orElse(0.3);
    private static final Binder.NumberField DEFAULT_RELAY_OTHER = number("relay_over_other_s", "s").from(0).to(100)
            .orElse(0.2);

    private final Binder b;
    private final boolean present;
    private final List<Bus> buses = new ArrayList<>();
    private final List<Source> sources = new ArrayList<>();
    private final List<Transformer> transformers = new ArrayList<>();
    private final List<CableBranch> cables = new ArrayList<>();
    private final Map<String, Node> nodes = new HashMap<>();
    private final Map<String, String> paths = new HashMap<>();
    private final Map<String, Study.Placement> placements = new LinkedHashMap<>();
    private final Map<String, Node.MapNode> placementNodes = new HashMap<>();
    private final List<Note> notes = new ArrayList<>();
    private double cableMarginSeconds = 0;
    private double relayOverRelaySeconds = 0.3;
    private double relayOverOtherSeconds = 0.2;

    NetworkSection(Binder b, Node.MapNode root) {
        this.b = b;
        this.present = b.has(root, "network");
        if (present) {
            read(root);
        }
    }

    /** @return whether the study has a network section */
    boolean present() {
        return present;
    }

    double cableMarginSeconds() {
        return cableMarginSeconds;
    }

    double relayOverRelaySeconds() {
        return relayOverRelaySeconds;
    }

    double relayOverOtherSeconds() {
        return relayOverOtherSeconds;
    }

    private void read(Node.MapNode root) {
        Optional<Node.MapNode> n = b.map(b.value(root, "network"), "network");
        if (n.isEmpty()) {
            return;
        }
        Node.MapNode m = n.get();
        b.allowOnly(m, "network", "buses", "sources", "transformers", "defaults");
        List<Node> busNodes = b.optionalList(m, "network", "buses");
        for (int i = 0; i < busNodes.size(); i++) {
            bus(busNodes.get(i), "network.buses[" + i + "]");
        }
        List<Node> sourceNodes = b.optionalList(m, "network", "sources");
        if (sourceNodes.isEmpty()) {
            b.missing(m, "network", "sources", "a network is fed from one source");
        }
        for (int i = 0; i < sourceNodes.size(); i++) {
            source(sourceNodes.get(i), "network.sources[" + i + "]");
        }
        List<Node> txNodes = b.optionalList(m, "network", "transformers");
        for (int i = 0; i < txNodes.size(); i++) {
            transformer(txNodes.get(i), "network.transformers[" + i + "]");
        }
        if (b.has(m, "defaults")) {
            Optional<Node.MapNode> d = b.map(b.value(m, "defaults"), "network.defaults");
            if (d.isPresent()) {
                b.allowOnly(d.get(), "network.defaults", "cable_margin_s", "relay_over_relay_s", "relay_over_other_s");
                cableMarginSeconds = b.number(d.get(), "network.defaults", DEFAULT_MARGIN).orElse(0);
                relayOverRelaySeconds = b.number(d.get(), "network.defaults", DEFAULT_RELAY_RELAY).orElse(0.3);
                relayOverOtherSeconds = b.number(d.get(), "network.defaults", DEFAULT_RELAY_OTHER).orElse(0.2);
            }
        }
    }

    private void remember(String kind, String id, Node node, String path) {
        nodes.put(kind + ":" + id, node);
        paths.put(kind + ":" + id, path);
    }

    private void bus(Node n, String path) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return;
        }
        Node.MapNode m = mapped.get();
        b.allowOnly(m, path, "id", "voltage_kv", "c_max", "c_min");
        Optional<String> id = b.id(m, path, "every bus needs an id");
        OptionalDouble kv = b.number(m, path, BUS_KV);
        if (id.isEmpty() || kv.isEmpty()) {
            return;
        }
        OptionalDouble cMax = b.number(m, path, C_FACTOR.named("c_max").orElse(Bus.defaultCMax(kv.getAsDouble())));
        OptionalDouble cMin = b.number(m, path, C_FACTOR.named("c_min").orElse(Bus.defaultCMin(kv.getAsDouble())));
        if (cMax.isEmpty() || cMin.isEmpty()) {
            return;
        }
        if (cMin.getAsDouble() > cMax.getAsDouble()) {
            b.problem(b.value(m, "c_min"), path + ".c_min", "found " + Checks.format(cMin.getAsDouble())
                    + " - must be at most c_max " + Checks.format(cMax.getAsDouble()));
            return;
        }
        if (nodes.containsKey("bus:" + id.get())) {
            b.problem(b.value(m, "id"), path + ".id", "a second bus '" + id.get() + "' - bus ids must be unique");
            return;
        }
        if (!b.has(m, "c_max") || !b.has(m, "c_min")) {
            notes.add(new Note("bus-voltage-factors-assumed", "bus '" + id.get() + "': c_max "
                    + Checks.format(cMax.getAsDouble()) + " and c_min " + Checks.format(cMin.getAsDouble())
                    + " assumed, IEC 60909-0 Table 1" + (kv.getAsDouble() <= 1.0 ? " (the +6 % tolerance row; a"
                    + " +10 % system takes c_max 1.10)" : "")));
        }
        buses.add(new Bus(id.get(), kv.getAsDouble(), cMax.getAsDouble(), cMin.getAsDouble()));
        remember("bus", id.get(), m, path);
    }

    private void source(Node n, String path) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return;
        }
        Node.MapNode m = mapped.get();
        b.allowOnly(m, path, "id", "bus", "sk_max_mva", "sk_min_mva", "x_r");
        Optional<String> id = b.id(m, path, "every source needs an id");
        Optional<String> bus = b.text(m, path, "bus", "the id of the bus it feeds");
        OptionalDouble max = b.number(m, path, SK_MAX);
        OptionalDouble min = b.number(m, path, SK_MIN);
        OptionalDouble xr = b.number(m, path, SOURCE_XR);
        if (id.isEmpty() || bus.isEmpty() || max.isEmpty() || min.isEmpty() || xr.isEmpty()) {
            return;
        }
        if (min.getAsDouble() > max.getAsDouble()) {
            b.problem(b.value(m, "sk_min_mva"), path + ".sk_min_mva", "found " + Checks.format(min.getAsDouble())
                    + " MVA - must be at most sk_max_mva " + Checks.format(max.getAsDouble()) + " MVA");
            return;
        }
        sources.add(new Source(id.get(), bus.get(), max.getAsDouble(), min.getAsDouble(), xr.getAsDouble()));
        remember("source", id.get(), m, path);
    }

    private void transformer(Node n, String path) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return;
        }
        Node.MapNode m = mapped.get();
        b.allowOnly(m, path, "id", "hv_bus", "lv_bus", "sr_kva", "uk_percent", "pk_kw", "vector_group");
        Optional<String> id = b.id(m, path, "every transformer needs an id");
        Optional<String> hv = b.text(m, path, "hv_bus", "the id of its HV bus");
        Optional<String> lv = b.text(m, path, "lv_bus", "the id of its LV bus");
        OptionalDouble sr = b.number(m, path, SR);
        OptionalDouble uk = b.number(m, path, UK);
        OptionalDouble pk = b.number(m, path, PK);
        Optional<String> group = b.text(m, path, "vector_group", "e.g. Dyn11");
        if (id.isEmpty() || hv.isEmpty() || lv.isEmpty() || sr.isEmpty() || uk.isEmpty() || pk.isEmpty()
                || group.isEmpty()) {
            return;
        }
        try {
            transformers.add(new Transformer(id.get(), hv.get(), lv.get(), sr.getAsDouble(), uk.getAsDouble(),
                    pk.getAsDouble(), group.get()));
            remember("transformer", id.get(), m, path);
        } catch (IllegalArgumentException e) {
            b.problem(m, path, e.getMessage());
        }
    }

    /**
     * Reads a cable's branch keys, if it has any.
     *
     * @param m the cable's node
     * @param path its path
     * @param limit the cable as read
     */
    void cable(Node.MapNode m, String path, CableThermalLimit limit) {
        boolean branch = b.has(m, "from") || b.has(m, "to") || b.has(m, "length_m");
        if (!branch) {
            for (String k : new String[] {"r_ohm_per_km", "x_ohm_per_km", "end_temperature_c"}) {
                if (b.has(m, k)) {
                    b.problemAtKey(m.entries().get(k), path + "." + k, "goes with from, to and length_m");
                }
            }
            return;
        }
        if (!present) {
            Node.Entry e = m.entries().get(b.has(m, "from") ? "from" : b.has(m, "to") ? "to" : "length_m");
            b.problemAtKey(e, path + "." + e.name(), "a cable branch needs the study's network section");
            return;
        }
        Optional<String> from = b.text(m, path, "from", "the id of the bus it leaves");
        Optional<String> to = b.text(m, path, "to", "the id of the bus it feeds");
        OptionalDouble length = b.number(m, path, LENGTH);
        OptionalDouble r = b.number(m, path, R_KM);
        OptionalDouble x = b.number(m, path, X_KM);
        OptionalDouble end = b.number(m, path, END_T.orElse(limit.finalCelsius()));
        if (from.isEmpty() || to.isEmpty() || length.isEmpty() || x.isEmpty() || end.isEmpty()) {
            return;
        }
        double rKm;
        if (r.isPresent()) {
            rKm = r.getAsDouble();
        } else {
            OptionalDouble table = ConductorResistance.maxOhmPerKm(limit.material(), limit.sizeMm2());
            if (table.isEmpty()) {
                b.missing(m, path, "r_ohm_per_km", "IEC 60228's table holds no " + Checks.format(limit.sizeMm2())
                        + " mm² " + limit.material().key() + " conductor - give the resistance at 20 °C");
                return;
            }
            rKm = table.getAsDouble();
            notes.add(new Note("cable-resistance-assumed", "cable '" + limit.id() + "': conductor resistance "
                    + Checks.format(rKm) + " Ω/km at 20 °C assumed, the maximum of IEC 60228 (from memory)"));
        }
        if (!b.has(m, "x_ohm_per_km")) {
            notes.add(new Note("cable-reactance-assumed", "cable '" + limit.id() + "': reactance "
                    + Checks.format(x.getAsDouble()) + " Ω/km assumed (common practice for low-voltage multicore"
                    + " cables)"));
        }
        try {
            cables.add(new CableBranch(limit.id(), from.get(), to.get(), length.getAsDouble(), rKm, x.getAsDouble(),
                    end.getAsDouble(), limit.parallel()));
            remember("cable", limit.id(), m, path);
        } catch (IllegalArgumentException e) {
            b.problem(m, path, e.getMessage());
        }
    }

    /**
     * Reads a device's placement keys, if it has any.
     *
     * @param m the device's node
     * @param path its path
     * @param id its id
     */
    void device(Node.MapNode m, String path, String id) {
        if (!b.has(m, "branch")) {
            if (b.has(m, "end")) {
                b.problemAtKey(m.entries().get("end"), path + ".end", "goes with branch");
            }
            return;
        }
        if (!present) {
            b.problemAtKey(m.entries().get("branch"), path + ".branch", "a device's branch needs the study's network"
                    + " section");
            return;
        }
        Optional<String> branch = b.text(m, path, "branch", "the id of a cable or transformer");
        Optional<String> end = b.has(m, "end") ? b.text(m, path, "end", "") : Optional.empty();
        if (branch.isEmpty()) {
            return;
        }
        placements.put(id, new Study.Placement(branch.get(), Study.End.FROM));
        placementNodes.put(id, m);
        paths.put("device:" + id, path);
        end.ifPresent(e -> paths.put("device-end:" + id, e));
    }

    /**
     * Builds the network once every cable and device is read.
     *
     * @return the network with its levels and placements, or empty if absent or wrong
     */
    Optional<Study.StudyNetwork> build() {
        if (!present) {
            return Optional.empty();
        }
        int before = b.problemCount();
        Network network = new Network(implicitBuses(), sources, transformers, cables);
        for (Network.Problem p : network.problems()) {
            String key = p.kind() + ":" + p.id();
            Node at = nodes.get(key);
            String path = paths.getOrDefault(key, "network");
            Node.MapNode element = at instanceof Node.MapNode mm ? mm : null;
            if (element != null && b.has(element, p.key())) {
                b.problem(b.value(element, p.key()), path + "." + p.key(), p.message());
            } else {
                b.problem(at, path, p.message());
            }
        }
        Map<String, Study.Placement> placed = new LinkedHashMap<>();
        Map<String, Network.Branch> branches = new java.util.HashMap<>();
        network.branches().forEach(br -> branches.putIfAbsent(br.id(), br));
        for (Map.Entry<String, Study.Placement> e : placements.entrySet()) {
            Node.MapNode m = placementNodes.get(e.getKey());
            String path = paths.get("device:" + e.getKey());
            Optional<Network.Branch> branch = Optional.ofNullable(branches.get(e.getValue().branch()));
            if (branch.isEmpty()) {
                b.problem(b.value(m, "branch"), path + ".branch", "no cable or transformer is called '"
                        + Binder.echo(e.getValue().branch()) + "'");
                continue;
            }
            String word = paths.get("device-end:" + e.getKey());
            boolean transformer = branch.get() instanceof Network.TransformerBranch;
            Study.End end = Study.End.FROM;
            if (word != null) {
                List<String> words = transformer ? List.of("hv", "lv") : List.of("from", "to");
                if (!words.contains(word)) {
                    b.problem(b.value(m, "end"), path + ".end", "found '" + Binder.echo(word) + "' - write "
                            + words.get(0) + " or " + words.get(1) + " for a " + (transformer ? "transformer" : "cable"));
                    continue;
                }
                end = words.indexOf(word) == 0 ? Study.End.FROM : Study.End.TO;
            }
            placed.put(e.getKey(), new Study.Placement(e.getValue().branch(), end));
        }
        if (b.problemCount() > before) {
            return Optional.empty();
        }
        return Optional.of(new Study.StudyNetwork(network, FaultLevels.of(network), placed, List.of(), notes));
    }

    /**
     * The declared buses, and each cable's receiving bus where it is not declared: a load-end bus
     * at the sending bus's voltage.
     */
    private List<Bus> implicitBuses() {
        List<Bus> all = new ArrayList<>(buses);
        Map<String, Bus> byId = new HashMap<>();
        buses.forEach(x -> byId.put(x.id(), x));
        boolean grew = true;
        while (grew) {
            grew = false;
            for (CableBranch c : cables) {
                if (!byId.containsKey(c.to()) && byId.containsKey(c.from())) {
                    Bus at = Bus.of(c.to(), byId.get(c.from()).voltageKv());
                    byId.put(at.id(), at);
                    all.add(at);
                    grew = true;
                }
            }
        }
        return all;
    }
}
