package org.thermion.build;

import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.ThyratronStage;
import org.thermion.model.BypassTrigger;
import org.thermion.model.Envelope;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.SoftStart;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The netlist read back from a wire list: which logic nets each stage instance touches, found only
 * from the nodes' leads, the parts' owners and the packing's sections (a socket pin "grid.2"
 * belongs to whichever stage uses section 2). {@link #expected} is the same from the elaborated
 * netlist; the two are equal when the wire list lost, merged or misrouted no net.
 */
public final class Rebuild {
    private Rebuild() {
    }

    /** Stage key -> names of the logic nets its parts and pins are wired to. */
    public static Map<Integer, Set<String>> fromWiring(Machine m, Wiring w) {
        Map<String, Integer> owner = new HashMap<>();
        for (Part p : w.parts()) {
            if (p.owner() >= 0) {
                owner.put(p.ref(), p.owner());
            }
        }
        Map<String, Map<Integer, Integer>> sectionOwner = new HashMap<>();
        Netlist n = m.netlist();
        for (Wiring.Socket s : w.sockets()) {
            Map<Integer, Integer> bySection = new HashMap<>();
            for (Envelope.Slot slot : m.envelopes().get(s.envelope()).slots()) {
                if (slot.index() >= 0) {
                    bySection.put(slot.section(), slot.latch() ? StageKey.latch(n, slot.index()) : slot.index());
                }
            }
            sectionOwner.put(s.ref(), bySection);
        }
        Map<Integer, Set<String>> out = new TreeMap<>();
        for (Node node : w.nodes()) {
            if (node.kind() != Node.Kind.NET) {
                continue;
            }
            for (Lead l : node.leads()) {
                Integer o = owner.get(l.ref());
                if (o == null && sectionOwner.containsKey(l.ref())) {
                    int dot = l.what().lastIndexOf('.');
                    o = dot < 0 ? null : sectionOwner.get(l.ref()).get(Integer.parseInt(l.what().substring(dot + 1)));
                }
                if (o != null) {
                    out.computeIfAbsent(o, k -> new TreeSet<>()).add(node.name());
                }
            }
        }
        return out;
    }

    /** Stage key -> names of the nets the netlist says it reads and drives (a flip-flop: data, enable, Q, not-Q). */
    public static Map<Integer, Set<String>> expected(Machine m) {
        Netlist n = m.netlist();
        Aliases a = new Aliases(n);
        Map<Integer, Set<String>> out = new TreeMap<>();
        Map<Integer, Integer> latchByQ = new HashMap<>();
        for (Latch l : n.latches()) {
            if (l.stage() >= 0) {
                Set<String> s = new TreeSet<>();
                s.add(n.netName(a.of(l.data())));
                if (l.enable() >= 0) {
                    s.add(n.netName(a.of(l.enable())));
                }
                s.add(n.netName(a.of(l.output())));
                out.put(StageKey.latch(n, l.id()), s);
                latchByQ.put(l.output(), l.id());
            }
        }
        for (Gate g : n.gates()) {
            if (g.stage() >= 0) {
                Set<String> s = new TreeSet<>();
                for (int i = 0; i < g.arity(); i++) {
                    s.add(n.netName(a.of(g.input(i))));
                }
                s.add(n.netName(a.of(g.output())));
                out.put(g.id(), s);
            } else if (g.fn() == org.thermion.model.GateFn.NOT && latchByQ.containsKey(g.input(0))) {
                out.get(StageKey.latch(n, latchByQ.get(g.input(0)))).add(n.netName(a.of(g.output())));
            }
        }
        return out;
    }

    /**
     * Soft start name -> the rails (and the node behind its resistor) its parts and its thyratron's
     * socket pins are wired to, read back from the wire list (heater pins apart: the heater strings
     * wire them).
     */
    public static Map<String, Set<String>> softStartsFromWiring(Machine m, Wiring w) {
        Map<String, String> owner = new HashMap<>();
        Map<Integer, String> byKey = new HashMap<>();
        for (int i = 0; i < m.softStarts().size(); i++) {
            byKey.put(StageKey.softStart(m, i), m.softStarts().get(i).name());
        }
        for (Part p : w.parts()) {
            if (byKey.containsKey(p.owner())) {
                owner.put(p.ref(), byKey.get(p.owner()));
            }
        }
        for (int i = 0; i < m.softStarts().size(); i++) {
            if (m.softStarts().get(i).trigger() instanceof BypassTrigger.ThyratronWarm tw) {
                owner.put(w.sockets().get(tw.envelope()).ref(), m.softStarts().get(i).name());
            }
        }
        Map<String, Set<String>> out = new TreeMap<>();
        for (Node node : w.nodes()) {
            if (node.kind() != Node.Kind.RAIL) {
                continue;
            }
            for (Lead l : node.leads()) {
                String o = owner.get(l.ref());
                if (o != null && !l.what().equals("heater") && !l.what().equals("tap")) {
                    out.computeIfAbsent(o, k -> new TreeSet<>()).add(node.name());
                }
            }
        }
        return out;
    }

    /**
     * The same from the soft starts' descriptions and the circuits of the relay stages they name:
     * the supply and the node behind the resistor; for a thyratron bypass, the plate rail, the grid
     * network's bias rail, the cathode's rail and the highest rail (the grid network's input). A rail a soft
     * start covers for the thyratron's module is met behind that soft start.
     */
    public static Map<String, Set<String>> softStartsExpected(Machine m, MachineCircuits circuits) {
        Map<String, Set<String>> out = new TreeMap<>();
        for (SoftStart s : m.softStarts()) {
            String rail = m.rails().get(s.rail()).name();
            Set<String> names = new TreeSet<>(List.of(rail, WiringBuilder.behindName(s, rail)));
            Optional<ThyratronStage> d = circuits.softStartDriver(s);
            if (d.isPresent() && s.trigger() instanceof BypassTrigger.ThyratronWarm tw) {
                int module = m.envelopes().get(tw.envelope()).module();
                ThyratronStage t = d.get();
                names.add(seen(m, t.plateRail(), module));
                if (Double.isFinite(t.grid().toBiasOhms())) {
                    names.add(seen(m, t.grid().biasRail(), module));
                }
                names.add(seen(m, t.cathode().rail(), module));
                names.add(seen(m, circuits.rails().highest().name(), module));
            }
            out.put(s.name(), names);
        }
        return out;
    }

    /** Rail {@code rail} as module {@code module} meets it: behind a soft start that covers the module. */
    private static String seen(Machine m, String rail, int module) {
        SoftStart s = SoftStartWiring.covering(m, rail, module);
        return s == null ? rail : WiringBuilder.behindName(s, rail);
    }
}
