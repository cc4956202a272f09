package org.thermion.levels;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.thermion.circuit.DiodeGate;
import org.thermion.circuit.Load;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.StageCircuit;
import org.thermion.model.Machine;
import org.thermion.model.StageType;

/**
 * The stages a node feeds, as receivers with circuits. A diode gate among them carries what its
 * own output feeds (and so on down a chain of diode gates): it has no gain, so the stage at the
 * head of the chain drives every load along it. Not thread-safe.
 */
public final class Receivers {
    private final Machine machine;
    private final MachineCircuits circuits;
    private final NetFanout fanout;
    private final Map<Integer, List<Load>> loadsOfNode = new HashMap<>();
    private final Set<Integer> inProgress = new HashSet<>();

    /** The receivers of a node: one entry per input pin with a circuit; stage names without one. */
    public record Found(List<StageCircuit> circuits, List<String> missing) {
    }

    public Receivers(Machine machine, MachineCircuits circuits, NetFanout fanout) {
        this.machine = machine;
        this.circuits = circuits;
        this.fanout = fanout;
    }

    /** Every input pin {@code node} feeds, in pin order. */
    public Found of(NetFanout.Node node) {
        List<StageCircuit> found = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        for (NetFanout.Pin p : node.pins()) {
            StageType st = stageOf(p);
            Optional<StageCircuit> c = st == null ? Optional.empty() : circuits.circuit(st);
            if (c.isPresent()) {
                found.add(withOutputLoads(p, c.get()));
            } else if (st != null && !missing.contains(st.name())) {
                missing.add(st.name());
            }
        }
        return new Found(found, missing);
    }

    /** The node's receivers as loads on its driver, in a stable order (one cache key per kind of net). */
    public List<Load> loadsOn(NetFanout.Node node) {
        List<Load> known = loadsOfNode.get(node.net());
        if (known != null) {
            return known;
        }
        if (!inProgress.add(node.net())) {
            return List.of(); // a loop of diode gates cannot settle a level: cut it here
        }
        List<StageCircuit> rs = new ArrayList<>(of(node).circuits());
        rs.sort(Comparator.comparing(StageCircuit::name));
        List<Load> out = new ArrayList<>(rs.size());
        for (StageCircuit r : rs) {
            out.add(r.inputLoad());
        }
        inProgress.remove(node.net());
        List<Load> loads = List.copyOf(out);
        loadsOfNode.put(node.net(), loads);
        return loads;
    }

    private StageCircuit withOutputLoads(NetFanout.Pin p, StageCircuit c) {
        if (!(c instanceof DiodeGate g) || p.latch()) {
            return c;
        }
        int output = machine.netlist().gates().get(p.index()).output();
        List<Load> beyond = loadsOn(fanout.nodeOf(output));
        return beyond.isEmpty() ? g : g.feeding(beyond);
    }

    private StageType stageOf(NetFanout.Pin p) {
        int s = p.latch() ? machine.netlist().latches().get(p.index()).stage()
                : machine.netlist().gates().get(p.index()).stage();
        return s < 0 ? null : machine.stages().get(s);
    }
}
