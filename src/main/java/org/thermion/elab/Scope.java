package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.ast.Ident;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The names of one module instance: its signals, its constants and the generator loops open
 * at the statement being expanded (outermost first, so indices are named in nesting order).
 */
final class Scope {
    final int module;
    final String path;
    final Map<String, Signal> names = new LinkedHashMap<>();
    final Map<String, Long> consts = new HashMap<>();
    private final List<String> loops = new ArrayList<>();

    Scope(int module, String path) {
        this.module = module;
        this.path = path;
    }

    /** The name of a local net or instance as seen from the top: {@code path.local}. */
    String qualify(String local) {
        return path.isEmpty() ? local : path + "." + local;
    }

    void enterLoop(String var) {
        loops.add(var);
    }

    void leaveLoop() {
        loops.remove(loops.size() - 1);
    }

    /** The open loops' indices, outermost first: {@code [row][col]} inside {@code for row { for col {...} }}. */
    String loopSuffix() {
        if (loops.isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        for (String var : loops) {
            sb.append('[').append(consts.get(var)).append(']');
        }
        return sb.toString();
    }

    /** Adds a signal; a name already taken by a signal or a constant is an error. */
    boolean declare(Signal s, Diagnostics diags) {
        Signal old = names.get(s.name());
        if (old != null || consts.containsKey(s.name())) {
            diags.error(s.decl(), "duplicate name '" + s.name() + "'",
                    (old != null ? "first declared at " + old.decl() + "; " : "") + "each name in a module is declared once");
            return false;
        }
        names.put(s.name(), s);
        return true;
    }

    /** The signal a name refers to, or null after reporting what the name is instead. */
    Signal lookup(Ident name, Diagnostics diags) {
        Signal s = names.get(name.text());
        if (s == null) {
            if (consts.containsKey(name.text())) {
                diags.error(name.span(), "'" + name.text() + "' is a constant, not a net", null);
                return null;
            }
            List<String> known = new ArrayList<>(names.keySet());
            known.addAll(consts.keySet());
            String dym = Names.didYouMean(name.text(), known);
            diags.error(name.span(), "unknown name '" + name.text() + "'",
                    dym != null ? dym : "declare it with `net " + name.text() + "` or as a port");
        }
        return s;
    }
}
