package org.thermion.faults;

import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.HeaterString;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.StageFunction;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The fault list of a machine: single stuck-at-0 and stuck-at-1 on every wire (inputs, stage
 * outputs, fan-out branches, program-memory lines), and the faults a tube builder meets, each
 * as the wires it forces: dead tubes, open heaters in series strings, relays that never pull
 * in, burnt-out lamps; and, once the sockets' pins are known, solder bridges between neighbouring
 * pins that join two nets ({@link Bridge}, one per pair of pins; the collapsed list keeps one per
 * pair of nets, since two bridges joining the same nets act alike). Stuck-at faults are collapsed by structural equivalence (a gate's
 * controlling value on an input is its output stuck at the value that input forces);
 * dominance marks further faults that plan generation need not aim at, never used for
 * diagnosis.
 */
public final class FaultList {
    private final FaultCircuit circuit;
    private final List<Fault> all;
    private final int[] classOf;
    private final List<Fault> collapsed;
    private final boolean[] dominated;
    private final int stuckAtCount;
    /** The stuck-at fault of (slot, value) at {@code slot * 2 + value}, or -1. */
    private final int[] saIndex;
    private final int stuckAtCollapsed;
    private final List<Bridge> bridges;
    private final int bridgeCollapsed;

    private FaultList(FaultCircuit c, List<SocketPins> sockets) {
        this.circuit = c;
        Machine m = c.machine;
        List<Fault> f = new ArrayList<>();
        List<Site> sites = c.sites();
        saIndex = new int[sites.size() * 2];
        Arrays.fill(saIndex, -1);
        for (Site s : sites) {
            if (s.line()) {
                for (int val = 0; val < 2; val++) {
                    saIndex[s.slot() * 2 + val] = f.size();
                    f.add(new Fault(f.size(), val == 0 ? FaultKind.STUCK_AT_0 : FaultKind.STUCK_AT_1, s.slot(),
                            List.of(new Force(s.slot(), val == 1))));
                }
            }
        }
        stuckAtCount = f.size();
        UnionFind uf = new UnionFind(stuckAtCount);
        List<Gate> gates = m.netlist().gates();
        boolean[] dom = new boolean[stuckAtCount];
        for (int g = 0; g < gates.size(); g++) {
            Gate gate = gates.get(g);
            int out = gate.output();
            if (saIndex[out * 2] < 0) {
                continue;
            }
            int n = gate.inputs().length;
            for (int k = 0; k < n; k++) {
                int p = c.gatePin(g, k);
                if (saIndex[p * 2] < 0) {
                    continue;
                }
                equivalences(gate.fn(), uf, saIndex, p, out, n);
            }
            int dominating = dominatingOutput(gate.fn());
            if (n >= 2 && dominating >= 0) {
                dom[saIndex[out * 2 + dominating]] = true;
            }
        }
        List<Fault> reps = new ArrayList<>();
        Map<Integer, Integer> repOf = new LinkedHashMap<>();
        int stuckReps = 0;
        int[] classIds = new int[stuckAtCount];
        for (int i = 0; i < stuckAtCount; i++) {
            int root = uf.find(i);
            Integer r = repOf.get(root);
            if (r == null) {
                r = i;
                repOf.put(root, i);
                reps.add(f.get(i));
                stuckReps++;
            }
            classIds[i] = r;
        }
        stuckAtCollapsed = stuckReps;
        // A class is left out of plan targets when one of its members dominates another fault.
        boolean[] domClass = new boolean[stuckAtCount];
        for (int i = 0; i < stuckAtCount; i++) {
            if (dom[i]) {
                domClass[classIds[i]] = true;
            }
        }

        tubeFaults(c, f);
        int firstBridge = f.size();
        List<Bridge> br = new ArrayList<>();
        Map<Long, Integer> byNets = new LinkedHashMap<>();
        List<Integer> bridgeClass = new ArrayList<>();
        BridgeRule rule = new BridgeRule(c);
        for (SocketPins sp : sockets) {
            for (int[] pq : SocketPins.neighbours(sp.base(), sp.pins())) {
                int a = sp.net(pq[0]);
                int b = sp.net(pq[1]);
                if (a < 0 || b < 0 || a == b || !sites.get(a).line() || !sites.get(b).line()) {
                    continue;
                }
                Bridge bridge = rule.bridge(a, b, sp, pq[0], pq[1]);
                long key = (long) bridge.slotA() << 32 | bridge.slotB();
                Integer first = byNets.putIfAbsent(key, f.size());
                bridgeClass.add(first == null ? f.size() : first);
                f.add(new Fault(f.size(), FaultKind.BRIDGE, br.size(), List.of(), bridge));
                br.add(bridge);
            }
        }
        this.bridges = List.copyOf(br);
        this.bridgeCollapsed = byNets.size();
        this.all = List.copyOf(f);
        classOf = new int[all.size()];
        System.arraycopy(classIds, 0, classOf, 0, stuckAtCount);
        dominated = new boolean[all.size()];
        for (int i = 0; i < stuckAtCount; i++) {
            dominated[i] = domClass[classIds[i]];
        }
        for (int i = stuckAtCount; i < firstBridge; i++) {
            classOf[i] = i;
            reps.add(all.get(i));
        }
        for (int i = firstBridge; i < all.size(); i++) {
            classOf[i] = bridgeClass.get(i - firstBridge);
            if (classOf[i] == i) {
                reps.add(all.get(i));
            }
        }
        this.collapsed = List.copyOf(reps);
    }

    /** Builds the fault list of a flattened machine. */
    public static FaultList of(FaultCircuit c) {
        return new FaultList(c, List.of());
    }

    /** Builds the fault list with solder bridges between neighbouring pins of {@code sockets}. */
    public static FaultList of(FaultCircuit c, List<SocketPins> sockets) {
        return new FaultList(c, sockets);
    }

    private static void equivalences(GateFn fn, UnionFind uf, int[] sa, int pin, int out, int n) {
        switch (fn) {
            case AND -> uf.union(sa[pin * 2], sa[out * 2]);
            case NAND -> uf.union(sa[pin * 2], sa[out * 2 + 1]);
            case OR -> uf.union(sa[pin * 2 + 1], sa[out * 2 + 1]);
            case NOR -> uf.union(sa[pin * 2 + 1], sa[out * 2]);
            case NOT -> {
                uf.union(sa[pin * 2], sa[out * 2 + 1]);
                uf.union(sa[pin * 2 + 1], sa[out * 2]);
            }
            case BUF -> {
                uf.union(sa[pin * 2], sa[out * 2]);
                uf.union(sa[pin * 2 + 1], sa[out * 2 + 1]);
            }
            default -> {
                // an exclusive-or has no controlling value: nothing is equivalent across it
            }
        }
    }

    /** The output fault that dominates an input fault of a gate with several inputs, or -1. */
    private static int dominatingOutput(GateFn fn) {
        switch (fn) {
            case AND: return 1;
            case NAND: return 0;
            case OR: return 0;
            case NOR: return 1;
            default: return -1;
        }
    }

    private static void tubeFaults(FaultCircuit c, List<Fault> f) {
        Machine m = c.machine;
        List<Gate> gates = m.netlist().gates();
        List<Latch> latches = m.netlist().latches();
        int envelopes = m.envelopes().size();
        List<List<Force>> dark = new ArrayList<>(envelopes);
        for (int e = 0; e < envelopes; e++) {
            dark.add(new ArrayList<>());
        }
        // A flip-flop's second output is a free gate reading its Q: it belongs to the same tube.
        Map<Integer, List<Integer>> freeOf = new LinkedHashMap<>();
        for (int g = 0; g < gates.size(); g++) {
            Gate gate = gates.get(g);
            int env = m.gateEnvelope()[gate.id()];
            if (gate.stage() >= 0 && env >= 0) {
                StageFunction fn = m.stages().get(gate.stage()).function();
                dark.get(env).add(new Force(gate.output(), nonConducting(fn)));
            } else if (gate.stage() < 0 && gate.inputs().length == 1) {
                freeOf.computeIfAbsent(gate.inputs()[0], k -> new ArrayList<>()).add(gate.output());
            }
        }
        for (Latch l : latches) {
            int env = m.latchEnvelope()[l.id()];
            if (l.stage() >= 0 && env >= 0) {
                // Both halves cut off: both plates float up to B+.
                dark.get(env).add(new Force(l.output(), true));
                for (int q : freeOf.getOrDefault(l.output(), List.of())) {
                    dark.get(env).add(new Force(q, true));
                }
            }
        }
        for (int e = 0; e < envelopes; e++) {
            if (!dark.get(e).isEmpty()) {
                f.add(new Fault(f.size(), FaultKind.DEAD_ENVELOPE, e, dark.get(e)));
            }
        }
        List<HeaterString> strings = m.heaterStrings();
        for (int s = 0; s < strings.size(); s++) {
            HeaterString hs = strings.get(s);
            if (hs.envelopes().size() < 2) {
                continue;
            }
            List<Force> forces = new ArrayList<>();
            for (int e : hs.envelopes()) {
                forces.addAll(dark.get(e));
            }
            if (!forces.isEmpty()) {
                f.add(new Fault(f.size(), FaultKind.OPEN_HEATER, s, forces));
            }
        }
        for (int g = 0; g < gates.size(); g++) {
            Gate gate = gates.get(g);
            if (gate.stage() >= 0 && m.stages().get(gate.stage()).function() == StageFunction.RELAY) {
                f.add(new Fault(f.size(), FaultKind.RELAY_OPEN, g, List.of(new Force(gate.output(), false))));
            }
        }
        List<ObservedLamp> lamps = c.lamps();
        for (int i = 0; i < lamps.size(); i++) {
            f.add(new Fault(f.size(), FaultKind.LAMP_BURNT, i, List.of(new Force(lamps.get(i).slot(), false))));
        }
    }

    /**
     * The output of a stage whose tube does not conduct: a plate with no current sits at B+
     * (inverters, nand and nor stages: 1); a diode AND's pull-up wins (1), a diode OR's
     * pull-down wins (0); a cathode follower's cathode falls to the bias rail (0); a lamp or
     * relay without current is dark or open (0); an exclusive-or stage is taken as a plate
     * circuit (1).
     */
    static boolean nonConducting(StageFunction fn) {
        switch (fn) {
            case BUFFER:
            case OR:
            case LAMP:
            case RELAY:
                return false;
            default:
                return true;
        }
    }

    public FaultCircuit circuit() {
        return circuit;
    }

    /** Every fault, stuck-at faults first (two per wire), then the tube builder's faults, then bridges. */
    public List<Fault> all() {
        return all;
    }

    /** One fault per equivalence class: stuck-at representatives, then every tube builder's fault. */
    public List<Fault> collapsed() {
        return collapsed;
    }

    /** The representative (an index into {@link #all}) of fault {@code id}'s equivalence class. */
    public int classOf(int id) {
        return classOf[id];
    }

    /**
     * What the fault does electrically, as a key: faults with equal keys force the same wires
     * (a dead single-stage tube is its output stuck), equivalent stuck-at faults share a key.
     */
    public String effect(Fault f) {
        if (f.bridge() != null) {
            return "br" + f.bridge().slotA() + "-" + f.bridge().slotB();
        }
        if (f.forces().size() == 1) {
            Force x = f.forces().get(0);
            int sa = saIndex[x.slot() * 2 + (x.value() ? 1 : 0)];
            if (sa >= 0) {
                return "sa" + classOf[sa];
            }
        }
        List<String> parts = new ArrayList<>();
        for (Force x : f.forces()) {
            parts.add(x.slot() + (x.value() ? "=1" : "=0"));
        }
        java.util.Collections.sort(parts);
        return String.join(",", parts);
    }

    /** Members of the class whose representative is {@code rep}, in id order. */
    public List<Fault> members(int rep) {
        List<Fault> out = new ArrayList<>();
        for (Fault f : all) {
            if (classOf[f.id()] == rep) {
                out.add(f);
            }
        }
        return out;
    }

    /** True when plan generation need not aim at this fault (it dominates another). */
    public boolean dominated(int id) {
        return dominated[id];
    }

    /** Every solder bridge of the full list, in order ({@link Fault#subject()} indexes it). */
    public List<Bridge> bridges() {
        return bridges;
    }

    /** Bridges in the collapsed list: one per pair of nets joined. */
    public int bridgeCollapsedCount() {
        return bridgeCollapsed;
    }

    public int stuckAtCount() {
        return stuckAtCount;
    }

    public int stuckAtCollapsedCount() {
        return stuckAtCollapsed;
    }

    /** Collapsed stuck-at classes left as plan targets after dominance. */
    public int stuckAtTargetCount() {
        int n = 0;
        for (Fault f : collapsed) {
            if (f.kind().stuckAt() && !dominated[f.id()]) {
                n++;
            }
        }
        return n;
    }

    /** A small union-find over fault indexes. */
    private static final class UnionFind {
        private final int[] parent;

        UnionFind(int n) {
            parent = new int[n];
            for (int i = 0; i < n; i++) {
                parent[i] = i;
            }
        }

        int find(int a) {
            while (parent[a] != a) {
                parent[a] = parent[parent[a]];
                a = parent[a];
            }
            return a;
        }

        void union(int a, int b) {
            int ra = find(a);
            int rb = find(b);
            if (ra != rb) {
                parent[Math.max(ra, rb)] = Math.min(ra, rb);
            }
        }
    }
}
