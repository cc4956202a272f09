package org.thermion.build;

import org.thermion.circuit.MachineCircuits;
import org.thermion.model.Envelope;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.Port;
import org.thermion.power.HeaterAnalysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Everything the build documents are printed from: the wiring (parts, nodes, sockets) made from the
 * stage circuits and the packing, and the heater strings in order. Built once per machine.
 */
public record BuildDocuments(Machine machine, Wiring wiring, List<HeaterWiring.HeaterRun> heaters,
                             MachineCircuits circuits) {

    public static BuildDocuments of(Machine m) {
        return of(m, Designations.NONE);
    }

    /** As {@link #of(Machine)}, parts keeping the designators {@code d} gives them. */
    public static BuildDocuments of(Machine m, Designations d) {
        MachineCircuits circuits = MachineCircuits.of(m);
        WiringBuilder w = new WiringBuilder(m, d);
        Dissipation heat = new Dissipation(m, circuits);
        StageWiring stages = new StageWiring(w, circuits, heat);
        Netlist n = m.netlist();
        Map<Integer, List<int[]>> sections = new HashMap<>();
        for (Envelope e : m.envelopes()) {
            for (Envelope.Slot s : e.slots()) {
                if (s.index() >= 0) {
                    int key = s.latch() ? StageKey.latch(n, s.index()) : StageKey.gate(s.index());
                    sections.computeIfAbsent(key, k -> new ArrayList<>()).add(new int[] {e.id(), s.section()});
                }
            }
        }
        Map<Integer, Integer> latchByQ = latchesByOutput(n);
        int[] qbar = complements(n);
        for (Gate g : n.gates()) {
            if (g.stage() >= 0) {
                stages.gate(g, sections.getOrDefault(StageKey.gate(g.id()), List.of()), -1);
            } else if (!Aliases.isAlias(g) && (g.fn() != org.thermion.model.GateFn.NOT || !latchByQ.containsKey(g.input(0)))) {
                w.problems.add("free connection " + n.netName(g.output()) + " is not a flip-flop's second output: wire it by hand");
            }
        }
        for (Latch l : n.latches()) {
            if (l.stage() >= 0) {
                stages.latch(l, sections.getOrDefault(StageKey.latch(n, l.id()), List.of()), qbar[l.id()]);
            }
        }
        int ground = w.rail(org.thermion.circuit.RailSet.GROUND);
        for (Envelope e : m.envelopes()) {
            if (w.has(e.id(), 0, org.thermion.model.Electrode.SHIELD)) {
                w.pin(e.id(), 0, org.thermion.model.Electrode.SHIELD, ground);
            }
        }
        for (Port p : m.inputs()) {
            w.multiLead(PartClass.SWITCH, "toggle switch", 0, "input " + p.name(), -1, new String[] {"common"},
                    new int[] {w.net(p.net())});
        }
        external(m, w);
        built(m, w, stages);
        HeaterWiring hw = new HeaterWiring(w);
        hw.wire(new HeaterAnalysis(m));
        SoftStartWiring soft = new SoftStartWiring(w, stages, circuits);
        for (int i = 0; i < m.softStarts().size(); i++) {
            soft.wire(i);
        }
        return new BuildDocuments(m, w.build(), List.copyOf(hw.runs), circuits);
    }

    /**
     * The stages of the built blocks (program counter, ROM decoding, clock), each instance in the
     * sections the packer gave it: the free slots (no gate or latch) of its envelope, in the order
     * the instances were placed, spilling into the next envelopes of the block for a wide stage.
     */
    private static void built(Machine m, WiringBuilder w, StageWiring stages) {
        Map<Integer, java.util.ArrayDeque<Integer>> free = new HashMap<>();
        for (Envelope e : m.envelopes()) {
            for (Envelope.Slot s : e.slots()) {
                if (s.index() < 0) {
                    free.computeIfAbsent(e.id(), k -> new java.util.ArrayDeque<>()).add(s.section());
                }
            }
        }
        int key = m.netlist().gates().size() + m.netlist().latches().size();
        for (org.thermion.model.BuiltBlock b : m.built()) {
            if (!b.counted()) {
                continue;
            }
            Map<String, Integer> numbered = new HashMap<>();
            for (org.thermion.model.BuiltBlock.Instances u : b.stages()) {
                org.thermion.model.StageType st = m.stages().get(u.stage());
                int need = st.sectionsFor(st.fanIn());
                for (int i = 0; i < u.count(); i++) {
                    List<int[]> at = new ArrayList<>();
                    for (int env = u.envelope(i); at.size() < need && env < m.envelopes().size(); env++) {
                        Envelope e = m.envelopes().get(env);
                        java.util.ArrayDeque<Integer> q = free.get(env);
                        while (q != null && !q.isEmpty() && at.size() < need && e.module() == b.module()) {
                            at.add(new int[] {env, q.poll()});
                        }
                    }
                    String name = b.what() + ": " + st.name() + " " + numbered.merge(st.name(), 1, Integer::sum);
                    if (at.size() < need) {
                        w.problems.add(name + " found " + at.size() + " of its " + need + " sections in the packing");
                    }
                    stages.built(name, st, at, b.module(), key++);
                }
            }
        }
    }

    private static Map<Integer, Integer> latchesByOutput(Netlist n) {
        Map<Integer, Integer> latchByQ = new HashMap<>();
        for (Latch l : n.latches()) {
            latchByQ.put(l.output(), l.id());
        }
        return latchByQ;
    }

    /** Per latch, the net of its complement (a free inverter of its output: the flip-flop's second plate), -1 for none. */
    static int[] complements(Netlist n) {
        Map<Integer, Integer> latchByQ = latchesByOutput(n);
        int[] qbar = new int[n.latches().size()];
        java.util.Arrays.fill(qbar, -1);
        for (Gate g : n.gates()) {
            Integer l = g.stage() < 0 && g.fn() == org.thermion.model.GateFn.NOT ? latchByQ.get(g.input(0)) : null;
            if (l != null) {
                qbar[l] = g.output();
            }
        }
        return qbar;
    }

    /** The ROM's data lines and the program counter's inputs end on one connector each. */
    private static void external(Machine m, WiringBuilder w) {
        if (m.rom() != null) {
            int[] data = m.rom().dataNets();
            String[] pins = new String[data.length];
            int[] nodes = new int[data.length];
            for (int i = 0; i < data.length; i++) {
                pins[i] = "D" + i;
                nodes[i] = w.net(data[i]);
            }
            w.multiLead(PartClass.CONNECTOR, "connector, " + data.length + " ways", 0, "ROM data lines", -1, pins, nodes);
        }
        if (m.pc() != null) {
            int[] t = m.pc().targetNets();
            List<String> pins = new ArrayList<>();
            List<Integer> nodes = new ArrayList<>();
            if (m.pc().jumpNet() >= 0) {
                pins.add("jump");
                nodes.add(w.net(m.pc().jumpNet()));
            }
            for (int i = 0; i < t.length; i++) {
                pins.add("T" + i);
                nodes.add(w.net(t[i]));
            }
            if (!pins.isEmpty()) {
                w.multiLead(PartClass.CONNECTOR, "connector, " + pins.size() + " ways", 0, "program counter inputs", -1,
                        pins.toArray(new String[0]), nodes.stream().mapToInt(Integer::intValue).toArray());
            }
        }
    }
}
