package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.ModuleStmt;
import org.thermion.model.ModuleInstance;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Places module instances: {@code use} lines are checked against the child's ports (names,
 * directions, widths within {@link ConstantFolder#MAX_WIDTH}), connections are lowered in the
 * parent's scope, and the child is declared ({@link NameDeclarer}) and expanded
 * ({@link LoopUnroller}) with the parent's nets bound to its ports.
 */
final class Instantiator {
    final InstanceTree tree = new InstanceTree();
    private final Declarations decls;
    private final NameDeclarer declarer;
    private final LoopUnroller unroller;
    private final StatementLowering statements;
    private final Diagnostics diags;
    private final Deque<String> stack = new ArrayDeque<>();
    private final Set<ModuleStmt.Declared> reportedWidths = new HashSet<>();

    Instantiator(Declarations decls, NameDeclarer declarer, LoopUnroller unroller, StatementLowering statements, Diagnostics diags) {
        this.decls = decls;
        this.declarer = declarer;
        this.unroller = unroller;
        this.statements = statements;
        this.diags = diags;
    }

    /** Expands the top module; its input ports become externally driven nets. */
    Scope top(Decl.Module top) {
        stack.push(top.name().text());
        Scope f = instantiate(top, "", -1, Map.of(), true);
        stack.pop();
        return f;
    }

    private Scope instantiate(Decl.Module m, String path, int parent, Map<String, int[]> bound, boolean top) {
        unroller.step();
        int id = tree.modules.size();
        tree.modules.add(new ModuleInstance(id, path, m.name().text(), parent));
        Scope f = new Scope(id, path);
        tree.scopes.put(id, f.names);
        List<Signal> ports = new ArrayList<>();
        tree.ports.put(id, ports);
        declarer.declare(f, m, bound, top, ports);
        unroller.body(f, m.body(), true);
        return f;
    }

    void use(Scope f, ModuleStmt.Use u) {
        Decl.Module child = decls.modules.get(u.module().text());
        if (child == null && decls.rejected("module", u.module().text())) {
            return;
        }
        if (child == null) {
            diags.error(u.module().span(), "unknown module '" + u.module().text() + "'",
                    Declarations.hintFor(u.module().text(), new ArrayList<>(decls.modules.keySet()), "declare it with `module NAME { ... }`"));
            return;
        }
        if (stack.contains(child.name().text())) {
            List<String> chain = new ArrayList<>(stack);
            Collections.reverse(chain);
            diags.error(u.module().span(), "module '" + child.name().text() + "' instantiates itself"
                    + " (" + String.join(" -> ", chain) + " -> " + child.name().text() + ")", "a module cannot contain itself");
            return;
        }
        String instName = u.name().text() + f.loopSuffix();
        if (f.names.containsKey(instName)) {
            diags.error(u.name().span(), "duplicate name '" + instName + "'", "instances and nets of a module need distinct names");
            return;
        }
        Map<String, int[]> bound = bind(f, u, child, instName);
        if (bound == null || !unroller.enter(u.span(), "module instance")) {
            return;
        }
        f.names.put(instName, new Signal(instName, new int[0], u.name().span(), Signal.Kind.NET, false));
        stack.push(child.name().text());
        instantiate(child, f.qualify(instName), f.module, bound, false);
        stack.pop();
        unroller.leave();
    }

    /** The parent's nets for each connected port; null when a port's width is out of range. */
    private Map<String, int[]> bind(Scope f, ModuleStmt.Use u, Decl.Module child, String instName) {
        Map<String, ModuleStmt.Declared> childPorts = new LinkedHashMap<>();
        Map<String, ModuleStmt.Dir> dirs = new HashMap<>();
        for (ModuleStmt s : child.body()) {
            if (s instanceof ModuleStmt.Ports p) {
                for (ModuleStmt.Declared d : p.ports()) {
                    childPorts.put(d.name().text(), d);
                    dirs.put(d.name().text(), p.dir());
                }
            }
        }
        Map<String, Long> childConsts = ConstantTable.of(child.body(), diags, false);
        Map<String, int[]> bound = new HashMap<>();
        for (ModuleStmt.Conn c : u.conns()) {
            String pn = c.port().text();
            ModuleStmt.Declared d = childPorts.get(pn);
            if (d == null) {
                diags.error(c.port().span(), "module '" + child.name().text() + "' has no port '" + pn + "'",
                        Declarations.hintFor(pn, new ArrayList<>(childPorts.keySet()), "its ports are: " + String.join(", ", childPorts.keySet())));
                continue;
            }
            if (bound.containsKey(pn)) {
                diags.error(c.port().span(), "port '" + pn + "' is connected twice", null);
                continue;
            }
            // The child's own expansion reports a bad width at the port; here it only must not be used.
            int w = d.width() == null ? 1 : portWidth(childConsts, d);
            if (w < 0) {
                return null;
            }
            int[] nets = dirs.get(pn) == ModuleStmt.Dir.OUT ? statements.outTarget(f, c.value())
                    : statements.inputBits(f, c.value(), w, c.span());
            if (nets == null) {
                continue;
            }
            if (nets.length != w) {
                diags.error(c.value().span(), "bus width mismatch: port '" + pn + "' of '" + child.name().text() + "' is "
                        + Lowered.bitsWord(w) + " wide, the connection " + Lowered.bitsWord(nets.length), "slice the connection, e.g. x[3..0]");
                continue;
            }
            bound.put(pn, nets);
        }
        for (Map.Entry<String, ModuleStmt.Declared> e : childPorts.entrySet()) {
            if (dirs.get(e.getKey()) == ModuleStmt.Dir.IN && !bound.containsKey(e.getKey())) {
                diags.error(u.span(), "input port '" + e.getKey() + "' of '" + instName + "' is driven by nothing",
                        "connect it: `" + e.getKey() + ": some_net`");
            }
        }
        return bound;
    }

    /** A child's port width seen from a {@code use}: -1 (after an error at the port) when out of range. */
    private int portWidth(Map<String, Long> childConsts, ModuleStmt.Declared d) {
        Diagnostics quiet = new Diagnostics();
        Long v = new ConstantFolder(quiet).value(childConsts, d.width(), "a bus width");
        if (v == null) {
            return 1;
        }
        if (v < 1 || v > ConstantFolder.MAX_WIDTH) {
            if (reportedWidths.add(d)) {
                diags.error(d.width().span(), "bus width " + v + " of port '" + d.name().text() + "' is out of range",
                        "use a width from 1 to " + ConstantFolder.MAX_WIDTH);
            }
            return -1;
        }
        return (int) (long) v;
    }
}
