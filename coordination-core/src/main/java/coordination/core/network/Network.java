package coordination.core.network;

import coordination.core.internal.Checks;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A radial network: buses joined by transformers and cables, each part fed from exactly one
 * source. {@link #problems()} says what keeps a network from being computed; meshed networks
 * (a loop of branches) are not supported yet.
 *
 * @param buses the buses
 * @param sources the sources
 * @param transformers the transformers
 * @param cables the cable branches
 */
public record Network(List<Bus> buses, List<Source> sources, List<Transformer> transformers,
        List<CableBranch> cables) implements Serializable {

    /**
     * What is wrong with a network, located at one of its elements.
     *
     * @param kind the kind of element: {@code bus}, {@code source}, {@code transformer} or {@code cable}
     * @param id the element's id
     * @param key the key at fault
     * @param message what is wrong
     */
    public record Problem(String kind, String id, String key, String message) implements Serializable {
    }

    /** A branch of the tree: a transformer or a cable. */
    public sealed interface Branch extends Serializable permits TransformerBranch, Cable {
        /** @return the branch's id */
        String id();

        /** @return one end */
        String a();

        /** @return the other end */
        String b();
    }

    /**
     * A transformer as a branch.
     *
     * @param transformer the transformer
     */
    public record TransformerBranch(Transformer transformer) implements Branch {
        @Override
        public String id() {
            return transformer.id();
        }

        @Override
        public String a() {
            return transformer.hvBus();
        }

        @Override
        public String b() {
            return transformer.lvBus();
        }
    }

    /**
     * A cable as a branch.
     *
     * @param cable the cable
     */
    public record Cable(CableBranch cable) implements Branch {
        @Override
        public String id() {
            return cable.id();
        }

        @Override
        public String a() {
            return cable.from();
        }

        @Override
        public String b() {
            return cable.to();
        }
    }

    /**
     * Copies the lists in.
     *
     * @param buses the buses
     * @param sources the sources
     * @param transformers the transformers
     * @param cables the cable branches
     */
    public Network {
        buses = List.copyOf(Checks.given("network: buses", buses));
        sources = List.copyOf(Checks.given("network: sources", sources));
        transformers = List.copyOf(Checks.given("network: transformers", transformers));
        cables = List.copyOf(Checks.given("network: cables", cables));
    }

    /** @return the buses by id */
    public Map<String, Bus> busMap() {
        Map<String, Bus> m = new LinkedHashMap<>();
        buses.forEach(b -> m.putIfAbsent(b.id(), b));
        return m;
    }

    /** @return every branch, transformers first */
    public List<Branch> branches() {
        List<Branch> out = new ArrayList<>();
        transformers.forEach(t -> out.add(new TransformerBranch(t)));
        cables.forEach(c -> out.add(new Cable(c)));
        return out;
    }

    /**
     * The branch of an id.
     *
     * @param id a transformer's or cable's id
     * @return the branch, or empty
     */
    public Optional<Branch> branch(String id) {
        return branches().stream().filter(b -> b.id().equals(id)).findFirst();
    }

    /**
     * What keeps the network from being computed: unknown buses, mismatched voltages, loops, a part
     * fed by two sources or by none.
     *
     * @return the problems, empty for a computable network
     */
    public List<Problem> problems() {
        List<Problem> out = new ArrayList<>();
        Map<String, Bus> bus = new HashMap<>();
        for (Bus b : buses) {
            if (bus.putIfAbsent(b.id(), b) != null) {
                out.add(new Problem("bus", b.id(), "id", "a second bus '" + b.id() + "' - ids must be unique"));
            }
        }
        for (Source s : sources) {
            if (!bus.containsKey(s.bus())) {
                out.add(new Problem("source", s.id(), "bus", "bus '" + s.bus() + "' is not declared"));
            }
        }
        for (Transformer t : transformers) {
            Bus hv = bus.get(t.hvBus());
            Bus lv = bus.get(t.lvBus());
            if (hv == null) {
                out.add(new Problem("transformer", t.id(), "hv_bus", "bus '" + t.hvBus() + "' is not declared"));
            }
            if (lv == null) {
                out.add(new Problem("transformer", t.id(), "lv_bus", "bus '" + t.lvBus() + "' is not declared"));
            }
            if (hv != null && lv != null && !(hv.voltageKv() > lv.voltageKv())) {
                out.add(new Problem("transformer", t.id(), "lv_bus", "bus '" + lv.id() + "' at " + lv.voltageKv()
                        + " kV is not below the HV bus '" + hv.id() + "' at " + hv.voltageKv() + " kV - the HV bus"
                        + " must have the higher voltage"));
            }
        }
        for (CableBranch c : cables) {
            Bus from = bus.get(c.from());
            Bus to = bus.get(c.to());
            if (from == null) {
                out.add(new Problem("cable", c.id(), "from", "bus '" + c.from() + "' is not declared"));
            }
            if (to == null) {
                out.add(new Problem("cable", c.id(), "to", "bus '" + c.to() + "' is not declared"));
            }
            if (from != null && to != null && Math.abs(from.voltageKv() / to.voltageKv() - 1) > 1e-9) {
                out.add(new Problem("cable", c.id(), "to", "bus '" + to.id() + "' is at " + to.voltageKv()
                        + " kV, bus '" + from.id() + "' at " + from.voltageKv() + " kV - a cable joins buses of one"
                        + " voltage"));
            }
        }
        if (!out.isEmpty()) {
            return out;
        }
        // union-find: a branch between buses already joined closes a loop
        Map<String, String> parent = new HashMap<>();
        bus.keySet().forEach(k -> parent.put(k, k));
        for (Branch br : branches()) {
            String ra = root(parent, br.a());
            String rb = root(parent, br.b());
            if (ra.equals(rb)) {
                out.add(new Problem(br instanceof Cable ? "cable" : "transformer", br.id(), "id", "'" + br.id()
                        + "' closes a loop between buses '" + br.a() + "' and '" + br.b() + "' - meshed networks are"
                        + " not supported yet; the network must be radial"));
            } else {
                parent.put(ra, rb);
            }
        }
        Map<String, Source> fedBy = new HashMap<>();
        for (Source s : sources) {
            Source other = fedBy.putIfAbsent(root(parent, s.bus()), s);
            if (other != null) {
                out.add(new Problem("source", s.id(), "bus", "'" + s.id() + "' and '" + other.id() + "' feed one"
                        + " radial network - a network is fed from one source"));
            }
        }
        for (Bus b : buses) {
            if (!fedBy.containsKey(root(parent, b.id()))) {
                out.add(new Problem("bus", b.id(), "id", "bus '" + b.id() + "' is fed by no source"));
            }
        }
        return out;
    }

    private static String root(Map<String, String> parent, String k) {
        // path halving keeps the walk short on long radial chains
        String r = k;
        String up = parent.get(r);
        while (!up.equals(r)) {
            String grand = parent.get(up);
            parent.put(r, grand);
            r = grand;
            up = parent.get(r);
        }
        return r;
    }
}
