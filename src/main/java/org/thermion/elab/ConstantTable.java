package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Expr;
import org.thermion.lang.ast.ModuleStmt;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The constants of one module, each evaluated after the constants it names, so their order in
 * the module does not matter. The walk keeps its own stack: a long chain of constants cannot
 * exhaust the JVM's. A constant that depends on itself is an error; after any error it is 0.
 */
final class ConstantTable {
    private ConstantTable() {
    }

    /**
     * Values of the module's {@code const} lines; {@code report} false evaluates without
     * diagnostics (a child's constants seen from a {@code use}, reported when it expands).
     */
    static Map<String, Long> of(List<ModuleStmt> body, Diagnostics diags, boolean report) {
        Map<String, ModuleStmt.Const> decl = new LinkedHashMap<>();
        for (ModuleStmt s : body) {
            if (s instanceof ModuleStmt.Const c && decl.putIfAbsent(c.name().text(), c) != null && report) {
                diags.error(c.name().span(), "duplicate name '" + c.name().text() + "'", "each name in a module is declared once");
            }
        }
        Diagnostics sink = report ? diags : new Diagnostics();
        ConstantFolder folder = new ConstantFolder(sink);
        Map<String, Long> values = new HashMap<>();
        Map<String, Boolean> open = new HashMap<>();
        for (String root : decl.keySet()) {
            Deque<String> stack = new ArrayDeque<>();
            stack.push(root);
            while (!stack.isEmpty()) {
                String name = stack.peek();
                if (values.containsKey(name)) {
                    stack.pop();
                    continue;
                }
                ModuleStmt.Const c = decl.get(name);
                if (open.putIfAbsent(name, Boolean.TRUE) == null) {
                    for (String dep : references(c.value())) {
                        if (!decl.containsKey(dep) || values.containsKey(dep)) {
                            continue;
                        }
                        if (open.containsKey(dep)) {
                            sink.error(c.name().span(), "constant '" + name + "' depends on itself (through '" + dep + "')",
                                    "give one constant of the chain a number");
                            values.put(dep, 0L);
                        } else {
                            stack.push(dep);
                        }
                    }
                    continue;
                }
                stack.pop();
                Long v = folder.value(values, c.value(), "the value of a constant");
                values.put(name, v == null ? 0 : v);
            }
        }
        return values;
    }

    /** Names read by an expression without an index, in reading order. */
    private static List<String> references(Expr e) {
        List<String> out = new ArrayList<>();
        Deque<Expr> todo = new ArrayDeque<>();
        todo.push(e);
        while (!todo.isEmpty()) {
            Expr x = todo.pop();
            if (x instanceof Expr.Ref r && r.index() == null) {
                out.add(r.name().text());
            } else if (x instanceof Expr.Neg n) {
                todo.push(n.operand());
            } else if (x instanceof Expr.Not n) {
                todo.push(n.operand());
            } else if (x instanceof Expr.Bin b) {
                todo.push(b.right());
                todo.push(b.left());
            }
        }
        return out;
    }
}
