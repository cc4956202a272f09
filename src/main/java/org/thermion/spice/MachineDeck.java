package org.thermion.spice;

import org.thermion.text.Nouns;
import org.thermion.circuit.Corner;
import org.thermion.circuit.FlipFlop;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageNetlist;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.ThyratronStage;
import org.thermion.circuit.TubeStage;
import org.thermion.circuit.DiodeGate;
import org.thermion.model.BuiltBlock;
import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Netlist;
import org.thermion.model.Rail;
import org.thermion.model.SoftStart;
import org.thermion.model.StageType;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;

/**
 * A module (with its submodules) or the whole machine as one SPICE3 deck: every gate and latch
 * whose stage has a circuit, written as {@link StageDeck} writes one stage, its input sources
 * replaced by the nets that drive them. A net is node "n_NAME"; a stage's inner nodes are
 * "TAG_NODE" (TAG "g12" for gate 12, "l3" for latch 3). Wires (free buffers) join their nets; a
 * flip-flop's complement is its second plate. Nets driven from outside the selection, by a stage
 * without a circuit, or by the constants are held by DC sources at the logic levels (0 V, and the
 * highest rail for 1). For the whole machine, each soft start's bypass thyratron is written too,
 * and built blocks (stated stages, no netlist) are named in a note. Thyratrons are written unfired; a flip-flop's state is the simulator's
 * choice. Stage circuits with fewer inputs than their gate drive the first ones; surplus circuit
 * inputs are held at the level that leaves the others in control.
 */
public final class MachineDeck {
    /** One stage instance in the deck: its tag, the circuit's netlist and each node's deck name. */
    public record Instance(String tag, String what, StageNetlist netlist, List<String> spiceNodes) {
    }

    /** The deck and the instances in it. */
    public record Written(SpiceDeck deck, List<Instance> instances) {
    }

    private final Machine machine;
    private final MachineCircuits circuits;
    private final Netlist nl;
    private final int[] alias;
    private final Map<Integer, String> complementNode = new HashMap<>();
    private final Map<Integer, String> renamed = new HashMap<>();
    private final Map<String, Integer> netOfNode = new java.util.TreeMap<>();
    private final Map<Integer, String> nodeOfNet = new HashMap<>();
    private final Map<StageCircuit, StageNetlist> netlists = new HashMap<>();
    private final Map<StageCircuit, List<String>> localNames = new HashMap<>();

    public MachineDeck(Machine machine, MachineCircuits circuits) {
        this.machine = machine;
        this.circuits = circuits;
        this.nl = machine.netlist();
        alias = new int[nl.netCount()];
        for (int i = 0; i < alias.length; i++) {
            alias[i] = i;
        }
    }

    /** The deck of the module instance at {@code path} and its submodules; "" or null for the whole machine. */
    public Written write(String path) {
        Set<Integer> modules = new TreeSet<>();
        for (ModuleInstance m : machine.modules()) {
            if (path == null || path.isEmpty() || m.path().equals(path) || m.path().startsWith(path + ".")) {
                modules.add(m.id());
            }
        }
        Map<Integer, StageType> latchFlipFlops = new HashMap<>();
        for (Latch l : nl.latches()) {
            if (modules.contains(l.module()) && l.stage() >= 0) {
                StageType st = machine.stages().get(l.stage());
                if (circuits.circuit(st).orElse(null) instanceof FlipFlop) {
                    latchFlipFlops.put(l.output(), st);
                    complementNode.put(l.output(), "l" + l.id() + "_plateB");
                }
            }
        }
        List<SpiceDeck.Line> lines = new ArrayList<>();
        SpiceWriter w = new SpiceWriter(this::tube, lines);
        String scope = path == null || path.isEmpty() ? "machine " + machine.name() : "module " + path;
        w.note(scope + ", written by Thermion from the stage circuits its operating points are solved with");
        w.note("nets are nodes n_NAME; a stage's own nodes TAG_NODE (gN gate N, lN latch N)");
        w.note("B sources: the published tube equations; R ..._leak: the model's 1 TOhm leakage per tube path");
        Map<String, Integer> driven = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        for (Gate g : nl.gates()) {
            if (modules.contains(g.module()) && g.stage() < 0) {
                if (g.fn() == GateFn.BUF) {
                    alias[g.output()] = find(g.input(0));
                } else if (complementNode.containsKey(g.input(0))) {
                    renamed.put(g.output(), complementNode.get(g.input(0)));
                } else {
                    notes.add("net " + nl.netName(g.output()) + " (a free complement) is held by a source");
                }
            }
        }
        List<Instance> instances = new ArrayList<>();
        List<SpiceDeck.Line> body = new ArrayList<>();
        SpiceWriter parts = new SpiceWriter(this::tube, body);
        for (Latch l : nl.latches()) {
            if (modules.contains(l.module())) {
                int[] ins = l.enable() >= 0 ? new int[] {l.data(), l.enable()} : new int[] {l.data()};
                instance(parts, "l" + l.id(), "latch " + nl.netName(l.output()), l.stage(), ins, l.output(),
                        GateFn.AND, instances, driven, notes);
            }
        }
        for (Gate g : nl.gates()) {
            if (modules.contains(g.module()) && g.stage() >= 0) {
                instance(parts, "g" + g.id(), "gate " + g.fn().name().toLowerCase(java.util.Locale.ROOT) + " -> "
                        + nl.netName(g.output()), g.stage(), g.inputs(), g.output(), g.fn(), instances, driven, notes);
            }
        }
        boolean whole = path == null || path.isEmpty();
        for (int i = 0; whole && i < machine.softStarts().size(); i++) {
            softStart(parts, i, instances);
        }
        for (BuiltBlock b : whole ? machine.built() : List.<BuiltBlock>of()) {
            notes.add(b.what() + " (" + b.block() + "): a built block known by its stated stages, not by a netlist; not written");
        }
        for (String n : notes) {
            w.note(n);
        }
        w.note("");
        Set<String> present = new java.util.HashSet<>();
        for (SpiceDeck.Line l : body) {
            if (l.card() != null) {
                present.addAll(l.card().nodes());
            }
        }
        w.note("rails");
        for (Rail r : machine.rails()) {
            String node = SpiceNames.clean(r.name());
            if (!r.name().equals(RailSet.GROUND) && present.contains(node)) {
                w.add(new SpiceCard.VoltageSource(w.name('V', "", r.name()), node, "0", r.volts()));
            }
        }
        w.note("nets driven from outside the selection or by stages without a circuit (0 V = 0, "
                + SpiceNumber.format(high()) + " V = 1)");
        for (Map.Entry<String, Integer> e : netOfNode.entrySet()) {
            if (present.contains(e.getKey()) && !driven.containsKey(e.getKey())) {
                double v = e.getValue() == Netlist.CONST1 ? high() : 0;
                w.add(new SpiceCard.VoltageSource(w.name('V', "", e.getKey()), e.getKey(), "0", v));
            }
        }
        lines.addAll(body);
        return new Written(new SpiceDeck("* Thermion " + scope, lines), List.copyOf(instances));
    }

    private void instance(SpiceWriter w, String tag, String what, int stageIndex, int[] inputs, int output, GateFn fn,
                          List<Instance> instances, Map<String, Integer> driven, List<String> notes) {
        if (stageIndex < 0) {
            notes.add(what + ": no stage (a free cell); its net is held by a source");
            return;
        }
        StageType st = machine.stages().get(stageIndex);
        StageCircuit c = circuits.circuit(st).orElse(null);
        if (c == null) {
            notes.add(what + ": stage " + st.name() + " has no circuit (declared currents); its net is held by a source");
            return;
        }
        // every instance of a stage type has the same parts: build them once
        StageNetlist sn = netlists.computeIfAbsent(c, k -> circuits.solver().netlist(StageSolver.DRIVER, k,
                new double[k.inputs()], false, List.of(), Corner.NOMINAL));
        List<String> local = localNames.computeIfAbsent(c, k -> StageDeck.nodeNames(sn));
        List<String> names = new ArrayList<>();
        double keep = keepLevel(c);
        List<Integer> surplus = new ArrayList<>();
        for (int i = 0; i < sn.nodes().size(); i++) {
            String n = sn.nodes().get(i);
            int pin = inputPin(n);
            if (i == sn.output()) {
                names.add(netNode(output));
            } else if (n.equals(StageDeck.ROLE + "plateB") && c instanceof FlipFlop) {
                names.add(complementNode.getOrDefault(output, tag + "_plateB"));
                driven.put(names.get(i), instances.size());
            } else if (pin >= 0 && pin < inputs.length) {
                names.add(netNode(inputs[pin]));
            } else if (pin >= 0) {
                names.add(tag + "_" + local.get(i));
                surplus.add(i);
            } else if (n.startsWith("rail ")) {
                names.add(local.get(i));
            } else {
                names.add(tag + "_" + local.get(i));
            }
        }
        if (inputs.length > c.inputs() && !(c instanceof FlipFlop)) {
            notes.add(what + ": stage " + st.name() + "'s circuit has " + Nouns.count(c.inputs(), "input") + "; the gate's other "
                    + (inputs.length - c.inputs()) + " " + (inputs.length - c.inputs() == 1 ? "is" : "are") + " not written");
        }
        driven.put(netNode(output), instances.size());
        w.note("");
        w.note(tag + ": " + what + " (stage " + st.name() + ")");
        for (int i : surplus) {
            w.add(new SpiceCard.VoltageSource(w.name('V', tag, "unused"), names.get(i), "0", keep));
        }
        w.parts(sn, names::get, tag, StageDeck.ROLE);
        instances.add(new Instance(tag, what, sn, names));
    }

    /**
     * Soft start {@code index}'s bypass thyratron, unfired, its relay coil as the plate load and
     * its grid network's input on the highest rail, as the wire list wires it ("sK" nodes).
     */
    private void softStart(SpiceWriter w, int index, List<Instance> instances) {
        SoftStart s = machine.softStarts().get(index);
        ThyratronStage d = circuits.softStartDriver(s).orElse(null);
        if (d == null) {
            return;
        }
        String tag = "s" + index;
        StageNetlist sn = circuits.solver().netlist(StageSolver.DRIVER, d, new double[d.inputs()], false, List.of(),
                Corner.NOMINAL);
        List<String> local = StageDeck.nodeNames(sn);
        String gridSupply = SpiceNames.clean(circuits.rails().highest().name());
        List<String> names = new ArrayList<>();
        for (int i = 0; i < sn.nodes().size(); i++) {
            String n = sn.nodes().get(i);
            names.add(inputPin(n) == 0 ? gridSupply : n.startsWith("rail ") ? local.get(i) : tag + "_" + local.get(i));
        }
        String what = "soft start " + s.name() + "'s bypass";
        w.note("");
        w.note(tag + ": " + what + " (stage " + d.name() + ", its relay coil as the plate load, the grid network from rail "
                + circuits.rails().highest().name() + "; unfired)");
        w.parts(sn, names::get, tag, StageDeck.ROLE);
        instances.add(new Instance(tag, what, sn, names));
    }

    /** The level that leaves a stage's other inputs in control: low for parallel and OR, high for series and AND. */
    private double keepLevel(StageCircuit c) {
        if (c instanceof TubeStage t && t.arrangement() == TubeStage.Arrangement.SERIES
                || c instanceof DiodeGate d && d.kind() == DiodeGate.Kind.AND) {
            return high();
        }
        return 0;
    }

    private static int inputPin(String node) {
        String p = StageDeck.ROLE + "in";
        if (!node.startsWith(p)) {
            return -1;
        }
        try {
            return Integer.parseInt(node.substring(p.length()));
        } catch (NumberFormatException e) {
            return -1;
        }
    }

    /** The logic 1 level the deck's sources use: the highest rail, as timing's figures take it. */
    public double high() {
        return org.thermion.timing.DelayCalculator.highRail(machine);
    }

    private String netNode(int net) {
        int n = find(net);
        String c = renamed.get(n);
        if (c != null) {
            return c;
        }
        String node = nodeOfNet.get(n);
        if (node == null) {
            node = "n_" + SpiceNames.clean(nl.netName(n));
            nodeOfNet.put(n, node);
            netOfNode.put(node, n);
        }
        return node;
    }

    private int find(int net) {
        while (alias[net] != net) {
            net = alias[net];
        }
        return net;
    }

    private TubeType tube(String name) {
        for (TubeType t : machine.tubes()) {
            if (t.name().equalsIgnoreCase(name)) {
                return t;
            }
        }
        return null;
    }
}
