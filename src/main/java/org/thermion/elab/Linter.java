package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Finds nets read but driven by nothing (errors), and nets, inputs and outputs that
 * nothing uses (warnings). Each signal is reported once, at its declaration.
 */
final class Linter {
    private final NetBuilder nb;
    private final InstanceTree ex;
    private final Set<Integer> driverOutputs;
    private final Diagnostics diags;
    private final List<Port> inputs;

    Linter(NetBuilder nb, InstanceTree ex, Set<Integer> driverOutputs, Diagnostics diags, List<Port> inputs) {
        this.nb = nb;
        this.ex = ex;
        this.driverOutputs = driverOutputs;
        this.diags = diags;
        this.inputs = inputs;
    }

    void run() {
        Set<Integer> portNets = new HashSet<>();
        for (List<Signal> ps : ex.ports.values()) {
            for (Signal s : ps) {
                for (int n : s.nets()) {
                    portNets.add(n);
                }
            }
        }
        Set<String> seenUndriven = new HashSet<>();
        for (int n = 2; n < nb.names.size(); n++) {
            if (nb.reads.get(n) > 0 && nb.driver.get(n) == NetBuilder.NONE) {
                Span s = nb.netSpan.get(n);
                if (seenUndriven.add(s.toString())) {
                    diags.error(s, "net '" + nb.names.get(n) + "' is driven by nothing",
                            "assign it (`" + base(nb.names.get(n)) + " = ...`), or connect it to an output port");
                }
            }
        }
        // Unused bits, grouped by the signal that declared them.
        Map<String, List<Integer>> bySignal = new LinkedHashMap<>();
        for (Map.Entry<Integer, Map<String, Signal>> e : ex.scopes.entrySet()) {
            for (Signal s : e.getValue().values()) {
                if (s.nets().length == 0 || s.kind() == Signal.Kind.IN) {
                    continue;
                }
                if (s.kind() == Signal.Kind.OUT && e.getKey() == 0) {
                    continue;
                }
                if (nb.netModule.get(s.nets()[0]) != e.getKey()) {
                    continue;
                }
                List<Integer> unused = new ArrayList<>();
                boolean anyUsed = false;
                for (int n : s.nets()) {
                    boolean driven = nb.driver.get(n) != NetBuilder.NONE;
                    boolean read = nb.reads.get(n) > 0 || driverOutputs.contains(n);
                    if (driven && !read && !tiedOff(n)) {
                        unused.add(n);
                    }
                    anyUsed |= driven || read;
                }
                if (!anyUsed) {
                    diags.warning(s.decl(), (s.kind() == Signal.Kind.OUT ? "output '" : "net '") + qualified(e.getKey(), s.name())
                            + "' is declared but never used", "remove it, or connect it");
                } else if (!unused.isEmpty()) {
                    String what = unused.size() == s.width() ? "" : " (" + unused.size() + " of " + s.width() + " bits)";
                    diags.warning(s.decl(), (s.kind() == Signal.Kind.OUT ? "output '" : "net '") + qualified(e.getKey(), s.name())
                            + "' is never read" + what, s.kind() == Signal.Kind.OUT ? "nothing outside the module uses it" : "remove it, or use it");
                }
            }
        }
        // Inputs that a module never looks at, once per module type.
        Set<String> reportedInputs = new HashSet<>();
        for (Map.Entry<Integer, List<Signal>> e : ex.ports.entrySet()) {
            ModuleInstance mi = ex.modules.get(e.getKey());
            for (Signal s : e.getValue()) {
                if (s.kind() != Signal.Kind.IN) {
                    continue;
                }
                boolean used = false;
                for (int n : s.nets()) {
                    used |= readInside(n, e.getKey());
                }
                if (!used && reportedInputs.add(mi.type() + "." + s.name())) {
                    diags.warning(s.decl(), "input '" + s.name() + "' of module '" + mi.type() + "' is tied to nothing inside it",
                            "remove the port, or use it");
                }
            }
        }
        for (Port p : inputs) {
            if (nb.reads.get(p.net()) == 0) {
                diags.warning(nb.netSpan.get(p.net()), "machine input '" + p.name() + "' is never read", null);
            }
        }
    }

    /** A net wired straight to a constant: a deliberate tie-off, not forgotten logic. */
    private boolean tiedOff(int net) {
        int d = nb.driver.get(net);
        if (d < 0) {
            return false;
        }
        NetBuilder.GateB g = nb.gates.get(d);
        return g.stage < 0 && g.fn == org.thermion.model.GateFn.BUF && g.in[0] <= 1;
    }

    /**
     * True when a gate or latch of {@code module} reads {@code net}, or a child instance it is
     * passed to reads it inside. Answered from indexes built once (reads per module and net,
     * children per module and port net) and memoized, so the lint pass stays linear: a scan
     * of every gate, latch and instance per port net was quadratic in the machine's size.
     */
    private boolean readInside(int net, int module) {
        if (nb.reads.get(net) == 0) {
            return false;
        }
        if (readBy == null) {
            index();
        }
        long key = key(module, net);
        Boolean known = memo.get(key);
        if (known != null) {
            return known;
        }
        boolean used = readBy.contains(key);
        if (!used) {
            // Passed on to a child instance counts as use.
            for (int child : passedTo.getOrDefault(key, List.of())) {
                if (readInside(net, child)) {
                    used = true;
                    break;
                }
            }
        }
        memo.put(key, used);
        return used;
    }

    /** One long per (module, net), scrambled by an odd multiplier (a bijection) so Long's hash spreads well. */
    private static long key(int module, int net) {
        return (((long) module << 32) | (net & 0xffffffffL)) * 0x9E3779B97F4A7C15L;
    }

    /** (module, net) pairs where a gate or latch of the module reads the net. */
    private Set<Long> readBy;
    /** (module, net) -> child instances of the module that have the net among their ports. */
    private Map<Long, List<Integer>> passedTo;
    private final Map<Long, Boolean> memo = new java.util.HashMap<>();

    private void index() {
        readBy = new HashSet<>();
        for (NetBuilder.GateB g : nb.gates) {
            for (int in : g.in) {
                readBy.add(key(g.module, in));
            }
        }
        for (NetBuilder.LatchB l : nb.latches) {
            readBy.add(key(l.module(), l.data()));
            readBy.add(key(l.module(), l.enable()));
        }
        passedTo = new java.util.HashMap<>();
        for (ModuleInstance mi : ex.modules) {
            if (mi.parent() < 0) {
                continue;
            }
            for (Signal s : ex.ports.getOrDefault(mi.id(), List.of())) {
                for (int n : s.nets()) {
                    List<Integer> kids = passedTo.computeIfAbsent(key(mi.parent(), n), k -> new ArrayList<>());
                    if (kids.isEmpty() || kids.get(kids.size() - 1) != mi.id()) {
                        kids.add(mi.id());
                    }
                }
            }
        }
    }

    private String qualified(int module, String name) {
        String p = ex.modules.get(module).path();
        return p.isEmpty() ? name : p + "." + name;
    }

    private static String base(String name) {
        int dot = name.lastIndexOf('.');
        return dot < 0 ? name : name.substring(dot + 1);
    }
}
