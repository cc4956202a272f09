package org.thermion.asm;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.Span;
import org.thermion.lang.program.AsmExpr;
import org.thermion.model.AddressedBit;
import org.thermion.model.Isa;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.Iterator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The names a program can use, in one name space: the bits of the ISA's bit map (their
 * address), labels (the address of the next word) and named constants (their expression).
 * Evaluates constant expressions and reports each distinct problem once. A constant's value is
 * kept once known (a chain of constants each using the one before twice costs linear time,
 * not exponential), and constants may refer to each other at most {@link #MAX_CONST_DEPTH}
 * deep before the chain is reported.
 */
final class Symbols {
    /** Most constants being evaluated at once, one inside the other. */
    static final int MAX_CONST_DEPTH = 200;

    private record Label(long address, Span span) {
    }

    private record Constant(AsmExpr value, Span span) {
    }

    private final Diagnostics diags;
    private final Map<String, AddressedBit> bits = new LinkedHashMap<>();
    private final Map<String, Label> labels = new LinkedHashMap<>();
    private final Map<String, Constant> constants = new LinkedHashMap<>();
    private final Set<String> laterLabels = new HashSet<>();
    private final Set<String> reported = new HashSet<>();
    private final Map<String, Long> known = new HashMap<>();
    /** The constants being settled now, outermost first. */
    private final List<String> settling = new ArrayList<>();

    Symbols(Isa isa, Diagnostics diags) {
        this.diags = diags;
        for (AddressedBit b : isa.bitMap()) {
            bits.put(b.name(), b);
        }
    }

    /** Names every label the program will define, so early uses can be explained. */
    void announceLabel(String name) {
        laterLabels.add(name);
    }

    /** The bit mapped at {@code address}, or null. */
    AddressedBit bitAt(long address) {
        for (AddressedBit b : bits.values()) {
            if (b.address() == address) {
                return b;
            }
        }
        return null;
    }

    void defineLabel(String name, Span at, long address) {
        if (taken(name, at)) {
            return;
        }
        labels.put(name, new Label(address, at));
    }

    void defineConstant(String name, Span at, AsmExpr value) {
        if (taken(name, at)) {
            return;
        }
        constants.put(name, new Constant(value, at));
        if (resolvable(value)) {
            // Everything it names is known already: settle it now, so long chains stay shallow.
            eval(new AsmExpr.Name(new org.thermion.lang.ast.Ident(name, at)), "name");
        }
    }

    /** True when every name in {@code e} is a bit, a label or a constant of known value. */
    private boolean resolvable(AsmExpr e) {
        for (String name : names(e)) {
            if (!bits.containsKey(name) && !labels.containsKey(name) && !known.containsKey(name)) {
                return false;
            }
        }
        return true;
    }

    /** The names {@code e} uses, in order, found without recursion. */
    private static List<String> names(AsmExpr e) {
        List<String> out = new ArrayList<>();
        Deque<AsmExpr> todo = new ArrayDeque<>();
        todo.push(e);
        while (!todo.isEmpty()) {
            AsmExpr x = todo.pop();
            if (x instanceof AsmExpr.Name n) {
                out.add(n.name().text());
            } else if (x instanceof AsmExpr.Neg n) {
                todo.push(n.operand());
            } else if (x instanceof AsmExpr.Bin bin) {
                todo.push(bin.right());
                todo.push(bin.left());
            }
        }
        return out;
    }

    private boolean taken(String name, Span at) {
        if (bits.containsKey(name)) {
            diags.error(at, "'" + name + "' is already the name of bit " + bits.get(name).address() + " of the machine",
                    "choose another name for the label or constant");
            return true;
        }
        Label l = labels.get(name);
        Constant c = constants.get(name);
        if (l != null || c != null) {
            Span first = l != null ? l.span() : c.span();
            diags.error(at, "duplicate label '" + name + "'" + (c != null ? " (already a constant)" : ""),
                    "first defined on line " + first.line());
            return true;
        }
        return false;
    }

    /** Evaluates {@code e}; null after a reported error. {@code role} words undefined-name errors. */
    Long value(AsmExpr e, String role) {
        return eval(e, role);
    }

    /**
     * The value of {@code e}, with every constant it names settled first. Recursion follows only
     * brackets, prefix minus and operator precedence (bounded by the reader's nesting limit):
     * a long chain of operators is walked in a loop, and constants that refer to each other are
     * settled by {@link #settle} with an explicit stack, so neither depends on the JVM's stack.
     */
    private Long eval(AsmExpr e, String role) {
        if (e instanceof AsmExpr.Num n) {
            return n.value();
        }
        if (e instanceof AsmExpr.Neg n) {
            Long v = eval(n.operand(), role);
            return v == null ? null : -v;
        }
        if (e instanceof AsmExpr.Bin) {
            Deque<AsmExpr.Bin> spine = new ArrayDeque<>();
            AsmExpr cur = e;
            while (cur instanceof AsmExpr.Bin b) {
                spine.push(b);
                cur = b.left();
            }
            Long acc = eval(cur, role);
            while (!spine.isEmpty()) {
                AsmExpr.Bin b = spine.pop();
                Long r = eval(b.right(), role);
                acc = acc == null || r == null ? null : apply(b, acc, r);
            }
            return acc;
        }
        AsmExpr.Name n = (AsmExpr.Name) e;
        String name = n.name().text();
        AddressedBit bit = bits.get(name);
        if (bit != null) {
            return bit.address();
        }
        Label l = labels.get(name);
        if (l != null) {
            return l.address();
        }
        if (constants.containsKey(name)) {
            if (known.containsKey(name)) {
                return known.get(name);
            }
            // Not known: either being settled now (a cycle or a chain too deep, reported) or not yet.
            return settling.isEmpty() ? settle(name, role) : null;
        }
        if (laterLabels.contains(name)) {
            report(n.span(), "label '" + name + "' is defined further down; its address is not known here",
                    "an origin can only use numbers, constants and labels above it");
            return null;
        }
        List<String> known = new ArrayList<>(labels.keySet());
        known.addAll(constants.keySet());
        known.addAll(bits.keySet());
        String hint = Names.didYouMean(name, known);
        report(n.span(), "undefined " + role + " '" + name + "'",
                hint != null ? hint : "define it as a label (`" + name + ":`) or a constant (`.const " + name + " = ...`)");
        return null;
    }

    /**
     * Settles constant {@code root} and, deepest first, every constant it needs: a depth-first walk
     * with its path on an explicit stack, so a chain is limited by {@link #MAX_CONST_DEPTH}, not by
     * the JVM. A cycle or a chain too deep is reported once and leaves the constants on it null.
     */
    private Long settle(String root, String role) {
        List<String> path = settling;
        List<Iterator<String>> pending = new ArrayList<>();
        path.add(root);
        pending.add(names(constants.get(root).value()).iterator());
        while (!path.isEmpty()) {
            int top = path.size() - 1;
            Iterator<String> it = pending.get(top);
            if (it.hasNext()) {
                String dep = it.next();
                Constant dc = constants.get(dep);
                if (dc == null || bits.containsKey(dep) || labels.containsKey(dep) || known.containsKey(dep)) {
                    continue;
                }
                if (path.contains(dep)) {
                    report(dc.span(), "constant '" + dep + "' is defined in terms of itself",
                            "via " + String.join(" -> ", path) + " -> " + dep);
                    continue;
                }
                if (path.size() >= MAX_CONST_DEPTH) {
                    report(dc.span(), "constants refer to each other more than " + MAX_CONST_DEPTH + " deep",
                            "define constants before they are used, so each one's value is known when it is read");
                    continue;
                }
                path.add(dep);
                pending.add(names(dc.value()).iterator());
                continue;
            }
            String done = path.get(top);
            // Every constant it names is known now, or on the path (its error is reported).
            Long v = eval(constants.get(done).value(), role);
            path.remove(top);
            pending.remove(top);
            // A failed evaluation is remembered too: its error was reported once already.
            known.put(done, v);
        }
        return known.get(root);
    }

    private Long apply(AsmExpr.Bin b, long l, long r) {
        try {
            switch (b.op()) {
                case '+':
                    return Math.addExact(l, r);
                case '-':
                    return Math.subtractExact(l, r);
                case '*':
                    return Math.multiplyExact(l, r);
                default:
                    if (r == 0) {
                        report(b.right().span(), "division by zero", null);
                        return null;
                    }
                    return l / r;
            }
        } catch (ArithmeticException ex) {
            report(b.span(), "value out of range", "keep constants within 62 bits");
            return null;
        }
    }

    private void report(Span at, String message, String hint) {
        if (reported.add(at + " " + message)) {
            diags.error(at, message, hint);
        }
    }
}
