package coordination.core.network;

import java.io.Serializable;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;

/**
 * The short-circuit currents of a radial network by IEC 60909-0:2016, far from generator: every
 * impedance on the path from the source is referred to the faulted bus's voltage and added.
 *
 * <ul>
 * <li>Source: Z_Q = c U_nQ² / S″kQ with its bus's c (c_max with S″kQ max, c_min with S″kQ min),
 * R from X/R (eq. 1).</li>
 * <li>Transformer: Z_T = ukr/100 · U_rT² / S_rT, R_T = P_krT U_rT² / S_rT² (eq. 7, 8), with the
 * correction K_T = 0.95 c_max / (1 + 0.6 x_T) (eq. 12a) for the maximum currents only: K_T is
 * below one for usual transformers, so it raises the current, which is optimistic for a minimum
 * current; the minimum case takes the uncorrected impedance.</li>
 * <li>Cable: R from R20 per km, raised to the end temperature for the minimum case
 * (R = [1 + 0.004 (θe − 20 °C)] R20, 10.3), X per km.</li>
 * <li>I″k3 = c U_n / (√3 |Z_k|) (eq. 29), I″k2 = √3/2 I″k3 (eq. 34, far from generator),
 * κ = 1.02 + 0.98 e^(−3R/X) (eq. 55), ip = κ √2 I″k3 (eq. 54).</li>
 * </ul>
 *
 * @param network the network
 * @param levels the levels at every bus (in the network's order), then at both ends of every cable
 * @param parents the branch feeding each bus from the source's side, absent for source buses
 * @param impedances each bus's impedance from the source, at the bus's own voltage
 */
public record FaultLevels(Network network, List<FaultLevel> levels, Map<String, Network.Branch> parents,
        Map<String, SourceImpedance> impedances) implements Serializable {

    /**
     * The impedance from the source to a bus, at the bus's voltage, in Ω.
     *
     * @param rMaxOhm resistance for the maximum currents (conductors at 20 °C, KT applied)
     * @param xMaxOhm reactance for the maximum currents
     * @param rMinOhm resistance for the minimum currents (conductors at their end temperature)
     * @param xMinOhm reactance for the minimum currents
     */
    public record SourceImpedance(double rMaxOhm, double xMaxOhm, double rMinOhm, double xMinOhm)
            implements Serializable {
    }

    /**
     * The levels of a fault beyond a bus, through an added series impedance: a point inside a
     * branch. The bus's voltage and voltage factors apply.
     *
     * @param bus the bus the fault is fed from, one of this network's
     * @param at the point's name in the level
     * @param rMaxOhm added resistance for the maximum currents, Ω
     * @param rMinOhm added resistance for the minimum currents, Ω
     * @param xOhm added reactance, Ω
     * @return the levels there
     */
    public FaultLevel beyond(Bus bus, String at, double rMaxOhm, double rMinOhm, double xOhm) {
        SourceImpedance z = impedances.get(bus.id());
        return level(at, bus, new Complex(z.rMaxOhm() + rMaxOhm, z.xMaxOhm() + xOhm),
                new Complex(z.rMinOhm() + rMinOhm, z.xMinOhm() + xOhm));
    }

    /**
     * Copies the collections in.
     *
     * @param network the network
     * @param levels the levels at every bus (in the network's order), then at both ends of every cable
     * @param parents the branch feeding each bus from the source's side, absent for source buses
     * @param impedances each bus's impedance from the source, at the bus's own voltage
     */
    public FaultLevels {
        levels = List.copyOf(levels);
        parents = Collections.unmodifiableMap(new LinkedHashMap<>(parents));
        impedances = Collections.unmodifiableMap(new LinkedHashMap<>(impedances));
    }

    /**
     * Computes the currents.
     *
     * @param network a network without {@link Network#problems()}
     * @return the levels
     * @throws IllegalArgumentException if the network has problems
     */
    public static FaultLevels of(Network network) {
        List<Network.Problem> problems = network.problems();
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException("network: " + problems.get(0).message());
        }
        Map<String, Bus> buses = network.busMap();
        Map<String, List<Network.Branch>> touching = new HashMap<>();
        for (Network.Branch b : network.branches()) {
            touching.computeIfAbsent(b.a(), k -> new ArrayList<>()).add(b);
            touching.computeIfAbsent(b.b(), k -> new ArrayList<>()).add(b);
        }
        Map<String, Complex> zMax = new HashMap<>();
        Map<String, Complex> zMin = new HashMap<>();
        Map<String, Network.Branch> parents = new LinkedHashMap<>();
        for (Source s : network.sources()) {
            Bus at = buses.get(s.bus());
            zMax.put(at.id(), source(at.cMax(), at.voltageKv(), s.skMaxMva(), s.xOverR()));
            zMin.put(at.id(), source(at.cMin(), at.voltageKv(), s.skMinMva(), s.xOverR()));
            ArrayDeque<String> queue = new ArrayDeque<>(List.of(at.id()));
            while (!queue.isEmpty()) {
                String here = queue.poll();
                Bus u = buses.get(here);
                for (Network.Branch br : touching.getOrDefault(here, List.of())) {
                    String there = br.a().equals(here) ? br.b() : br.a();
                    if (zMax.containsKey(there)) {
                        continue;
                    }
                    Bus v = buses.get(there);
                    double refer = Math.pow(v.voltageKv() / u.voltageKv(), 2);
                    zMax.put(there, zMax.get(here).multiply(refer).add(branch(br, v, buses, true)));
                    zMin.put(there, zMin.get(here).multiply(refer).add(branch(br, v, buses, false)));
                    parents.put(there, br);
                    queue.add(there);
                }
            }
        }
        List<FaultLevel> levels = new ArrayList<>();
        Map<String, FaultLevel> byBus = new HashMap<>();
        for (Bus b : network.buses()) {
            FaultLevel l = level(b.id(), b, zMax.get(b.id()), zMin.get(b.id()));
            levels.add(l);
            byBus.put(b.id(), l);
        }
        for (CableBranch c : network.cables()) {
            for (String end : new String[] {c.from(), c.to()}) {
                FaultLevel l = byBus.get(end);
                levels.add(new FaultLevel(c.id() + (end.equals(c.from()) ? ":from" : ":to"), end, l.ik3MaxAmps(),
                        l.ik3MinAmps(), l.ik2MinAmps(), l.kappa(), l.ipAmps(), l.rOverX()));
            }
        }
        Map<String, SourceImpedance> impedances = new LinkedHashMap<>();
        for (Bus b : network.buses()) {
            Complex a = zMax.get(b.id());
            Complex c = zMin.get(b.id());
            impedances.put(b.id(), new SourceImpedance(a.getReal(), a.getImaginary(), c.getReal(), c.getImaginary()));
        }
        return new FaultLevels(network, levels, parents, impedances);
    }

    /**
     * The source impedance at its bus: Z = c U² / S″k, R = X / (X/R).
     *
     * @param c the voltage factor
     * @param kv the bus voltage
     * @param mva the short-circuit power
     * @param xOverR X/R
     * @return Ω
     */
    static Complex source(double c, double kv, double mva, double xOverR) {
        double z = c * kv * kv / mva;
        double x = z / Math.sqrt(1 + 1 / (xOverR * xOverR));
        return new Complex(x / xOverR, x);
    }

    /**
     * A transformer's impedance at a winding's voltage: ukr/100 · U² / Sr, R = PkrT U² / Sr².
     *
     * @param t the transformer
     * @param kv the voltage of the side it is seen from
     * @return Ω
     */
    static Complex transformer(Transformer t, double kv) {
        double sr = t.srKva() / 1000;
        double z = t.ukPercent() / 100 * kv * kv / sr;
        double r = t.pkKw() / 1000 * kv * kv / (sr * sr);
        return new Complex(r, Math.sqrt(Math.max(0, z * z - r * r)));
    }

    /**
     * The correction factor of IEC 60909-0:2016, eq. 12a.
     *
     * @param t the transformer
     * @param cMax c_max of the LV side's network
     * @return K_T
     */
    public static double correction(Transformer t, double cMax) {
        double xT = transformer(t, 1).getImaginary() / (1.0 / (t.srKva() / 1000));
        return 0.95 * cMax / (1 + 0.6 * xT);
    }

    private static Complex branch(Network.Branch br, Bus at, Map<String, Bus> buses, boolean max) {
        if (br instanceof Network.TransformerBranch tb) {
            Transformer t = tb.transformer();
            Complex z = transformer(t, at.voltageKv());
            return max ? z.multiply(correction(t, buses.get(t.lvBus()).cMax())) : z;
        }
        CableBranch c = ((Network.Cable) br).cable();
        return new Complex(c.resistanceOhm(max ? 20 : c.endTemperatureC()), c.reactanceOhm());
    }

    private static FaultLevel level(String at, Bus b, Complex zMax, Complex zMin) {
        // kV / Ω gives kA
        double ik3Max = b.cMax() * b.voltageKv() / (Math.sqrt(3) * zMax.abs()) * 1000;
        double ik3Min = b.cMin() * b.voltageKv() / (Math.sqrt(3) * zMin.abs()) * 1000;
        double rx = zMax.getReal() / zMax.getImaginary();
        double kappa = kappa(rx);
        return new FaultLevel(at, b.id(), ik3Max, ik3Min, Math.sqrt(3) / 2 * ik3Min, kappa,
                kappa * Math.sqrt(2) * ik3Max, rx);
    }

    /**
     * The peak factor of IEC 60909-0:2016, eq. 55.
     *
     * @param rOverX R/X at the fault point
     * @return κ
     */
    public static double kappa(double rOverX) {
        return 1.02 + 0.98 * Math.exp(-3 * rOverX);
    }

    /**
     * The level at a point.
     *
     * @param at a bus id, or a cable id with {@code :from} or {@code :to}
     * @return the level, or empty
     */
    public Optional<FaultLevel> at(String at) {
        return levels.stream().filter(l -> l.at().equals(at)).findFirst();
    }

    /**
     * The branches from the source to a bus, source end first.
     *
     * @param bus the bus
     * @return the path
     */
    public List<Network.Branch> pathTo(String bus) {
        List<Network.Branch> path = new ArrayList<>();
        String here = bus;
        while (parents.containsKey(here)) {
            Network.Branch b = parents.get(here);
            path.add(0, b);
            here = b.a().equals(here) ? b.b() : b.a();
        }
        return path;
    }
}
