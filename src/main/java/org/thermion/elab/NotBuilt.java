package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Value;
import org.thermion.lang.Span;
import org.thermion.model.GateFn;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Takes the module instances a machine block marks {@code notbuilt} out of the logic, so every
 * command sees the half-built machine on the bench: their stages and latches go (no tubes, no
 * heater, no faults), and each net they drove that built logic (or a machine output) still reads
 * becomes a machine input named as the net, a switch the builder sets by hand, or, for an
 * instance declared {@code held 0} or {@code held 1}, a wire tied to that level.
 */
final class NotBuilt {
    /** Instance ids not built (whole subtrees), and the switches that replace their outputs. */
    final Set<Integer> modules = new HashSet<>();
    final List<Port> switches = new ArrayList<>();
    /** Instance id to the level its outputs are held at (0 or 1); instances not here become switches. */
    final Map<Integer, Integer> held = new HashMap<>();

    private NotBuilt() {
    }

    /**
     * Resolves the names against the instance tree; unknown names and the top are errors.
     * {@code levels} gives per name the level its outputs are held at, or -1 for switches.
     */
    static NotBuilt resolve(List<Value> names, List<Integer> levels, List<ModuleInstance> tree, Diagnostics diags) {
        NotBuilt nb = new NotBuilt();
        for (int k = 0; k < names.size(); k++) {
            Value v = names.get(k);
            String path = v.text();
            int level = k < levels.size() ? levels.get(k) : -1;
            boolean found = false;
            for (ModuleInstance mi : tree) {
                if (mi.parent() >= 0 && (mi.path().equals(path) || mi.path().startsWith(path + "."))) {
                    nb.modules.add(mi.id());
                    if (level >= 0) {
                        nb.held.put(mi.id(), level);
                    }
                    found |= mi.path().equals(path);
                }
            }
            if (!found) {
                List<String> known = tree.stream().filter(m -> m.parent() >= 0).map(ModuleInstance::path).toList();
                diags.error(v.span(), "no module instance '" + path + "' to leave unbuilt",
                        Declarations.hintFor(path, known, known.isEmpty() ? "the top module is always built"
                                : "name an instance of a `use` line, e.g. " + known.get(0)));
            }
        }
        return nb;
    }

    boolean any() {
        return !modules.isEmpty();
    }

    /**
     * Removes the unbuilt stages and latches from {@code net}, renumbering the rest; nets they
     * drove that are still read (or are {@code outputs}) become inputs, appended to {@code inputs}.
     */
    void apply(NetBuilder net, List<Port> inputs, List<Port> outputs) {
        Set<Integer> outputNets = new HashSet<>();
        outputs.forEach(p -> outputNets.add(p.net()));
        List<Integer> orphaned = new ArrayList<>();
        Map<Integer, Integer> level = new HashMap<>();
        List<NetBuilder.GateB> gates = new ArrayList<>();
        for (NetBuilder.GateB g : net.gates) {
            if (modules.contains(g.module)) {
                for (int i : g.in) {
                    net.reads.set(i, net.reads.get(i) - 1);
                }
                orphaned.add(g.out);
                level.put(g.out, held.getOrDefault(g.module, -1));
            } else {
                net.driver.set(g.out, gates.size());
                gates.add(g);
            }
        }
        List<NetBuilder.LatchB> latches = new ArrayList<>();
        for (NetBuilder.LatchB l : net.latches) {
            if (modules.contains(l.module())) {
                net.reads.set(l.data(), net.reads.get(l.data()) - 1);
                if (l.enable() >= 0) {
                    net.reads.set(l.enable(), net.reads.get(l.enable()) - 1);
                }
                orphaned.add(l.out());
                level.put(l.out(), held.getOrDefault(l.module(), -1));
            } else {
                net.driver.set(l.out(), -10 - latches.size());
                latches.add(l);
            }
        }
        net.gates.clear();
        net.gates.addAll(gates);
        net.latches.clear();
        net.latches.addAll(latches);
        Map<Integer, Boolean> seen = new HashMap<>();
        for (int n : orphaned) {
            if (seen.put(n, true) != null) {
                continue;
            }
            if ((net.reads.get(n) > 0 || outputNets.contains(n)) && level.get(n) >= 0) {
                // Tied on the bench: a free wire from the constant (a flip-flop's complement the other way).
                Integer source = net.complementSource.get(n);
                int at = source != null && level.containsKey(source) ? 1 - level.get(n) : level.get(n);
                int constant = at == 1 ? org.thermion.model.Netlist.CONST1 : org.thermion.model.Netlist.CONST0;
                net.read(constant);
                net.gates.add(new NetBuilder.GateB(GateFn.BUF, new int[] {constant}, n, -1, net.netModule.get(n), Span.none()));
                net.driver.set(n, net.gates.size() - 1);
            } else if (net.reads.get(n) > 0 || outputNets.contains(n)) {
                net.driver.set(n, NetBuilder.EXTERNAL);
                Port p = new Port(net.names.get(n), n);
                inputs.add(p);
                switches.add(p);
            } else {
                net.driver.set(n, NetBuilder.NONE);
            }
        }
    }

    /** The instance tree without the unbuilt instances' names and ports, for the linter. */
    InstanceTree builtPart(InstanceTree tree) {
        InstanceTree t = new InstanceTree();
        t.modules.addAll(tree.modules);
        tree.scopes.forEach((id, s) -> {
            if (!modules.contains(id)) {
                t.scopes.put(id, s);
            }
        });
        tree.ports.forEach((id, s) -> {
            if (!modules.contains(id)) {
                t.ports.put(id, s);
            }
        });
        return t;
    }
}
