package org.thermion.asm;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.Span;
import org.thermion.lang.program.AsmExpr;
import org.thermion.model.AddressedBit;
import org.thermion.model.Isa;

import java.util.ArrayList;
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
            eval(new AsmExpr.Name(new org.thermion.lang.ast.Ident(name, at)), "name", new ArrayList<>());
        }
    }

    /** True when every name in {@code e} is a bit, a label or a constant of known value. */
    private boolean resolvable(AsmExpr e) {
        if (e instanceof AsmExpr.Num) {
            return true;
        }
        if (e instanceof AsmExpr.Neg n) {
            return resolvable(n.operand());
        }
        if (e instanceof AsmExpr.Bin b) {
            return resolvable(b.left()) && resolvable(b.right());
        }
        String name = ((AsmExpr.Name) e).name().text();
        return bits.containsKey(name) || labels.containsKey(name) || known.containsKey(name);
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
        return eval(e, role, new ArrayList<>());
    }

    private Long eval(AsmExpr e, String role, List<String> evaluating) {
        if (e instanceof AsmExpr.Num n) {
            return n.value();
        }
        if (e instanceof AsmExpr.Neg n) {
            Long v = eval(n.operand(), role, evaluating);
            return v == null ? null : -v;
        }
        if (e instanceof AsmExpr.Bin b) {
            Long l = eval(b.left(), role, evaluating);
            Long r = eval(b.right(), role, evaluating);
            if (l == null || r == null) {
                return null;
            }
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
        Constant c = constants.get(name);
        if (c != null) {
            if (known.containsKey(name)) {
                return known.get(name);
            }
            if (evaluating.contains(name)) {
                report(c.span(), "constant '" + name + "' is defined in terms of itself", "via " + String.join(" -> ", evaluating)
                        + " -> " + name);
                return null;
            }
            if (evaluating.size() >= MAX_CONST_DEPTH) {
                report(c.span(), "constants refer to each other more than " + MAX_CONST_DEPTH + " deep",
                        "define constants before they are used, so each one's value is known when it is read");
                return null;
            }
            evaluating.add(name);
            Long v = eval(c.value(), role, evaluating);
            evaluating.remove(evaluating.size() - 1);
            // A failed evaluation is remembered too: its error was reported once already.
            known.put(name, v);
            return v;
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

    private void report(Span at, String message, String hint) {
        if (reported.add(at + " " + message)) {
            diags.error(at, message, hint);
        }
    }
}
