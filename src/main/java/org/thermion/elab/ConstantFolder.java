package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Expr;

import java.util.Map;

/**
 * Evaluates constant expressions (numbers, constants, loop variables, + - * / %) for widths,
 * indices, loop bounds and phases. Overflow of 64 bits is an error, never a wrapped value.
 */
final class ConstantFolder {
    /** The widest bus, port or latch a description may declare. */
    static final int MAX_WIDTH = 65536;

    private final Diagnostics diags;

    ConstantFolder(Diagnostics diags) {
        this.diags = diags;
    }

    /** The value of {@code e} in {@code env}, or null after reporting why it has none. */
    Long value(Map<String, Long> env, Expr e, String what) {
        return fold(env, e, what);
    }

    /** A bus width: 1 when absent, 1 after an error, else the value within 1..MAX_WIDTH. */
    int width(Map<String, Long> env, Expr w) {
        if (w == null) {
            return 1;
        }
        Long v = value(env, w, "a bus width");
        if (v == null) {
            return 1;
        }
        if (v < 1 || v > MAX_WIDTH) {
            diags.error(w.span(), "bus width " + v + " is out of range", "use a width from 1 to " + MAX_WIDTH);
            return 1;
        }
        return (int) (long) v;
    }

    private Long fold(Map<String, Long> env, Expr e, String what) {
        if (e instanceof Expr.Num n) {
            return n.value();
        } else if (e instanceof Expr.Ref r && r.index() == null && env.containsKey(r.name().text())) {
            return env.get(r.name().text());
        } else if (e instanceof Expr.Neg n) {
            Long v = fold(env, n.operand(), what);
            if (v == null) {
                return null;
            }
            if (v == Long.MIN_VALUE) {
                return overflow(e);
            }
            return -v;
        } else if (e instanceof Expr.Bin b && b.op().ordinal() >= Expr.BinOp.ADD.ordinal()) {
            Long l = fold(env, b.left(), what);
            Long r = fold(env, b.right(), what);
            return l == null || r == null ? null : arith(b, l, r);
        }
        diags.error(e.span(), "expected " + what + ": a number or a constant expression", null);
        return null;
    }

    /** {@code x op y} for the arithmetic operators; null after reporting division by zero or overflow. */
    Long arith(Expr.Bin b, long x, long y) {
        try {
            switch (b.op()) {
                case ADD:
                    return Math.addExact(x, y);
                case SUB:
                    return Math.subtractExact(x, y);
                case MUL:
                    return Math.multiplyExact(x, y);
                case DIV:
                case MOD:
                    if (y == 0) {
                        diags.error(b.span(), "division by zero", null);
                        return null;
                    }
                    if (b.op() == Expr.BinOp.DIV && x == Long.MIN_VALUE && y == -1) {
                        return overflow(b);
                    }
                    return b.op() == Expr.BinOp.DIV ? Math.floorDiv(x, y) : Math.floorMod(x, y);
                default:
                    return null;
            }
        } catch (ArithmeticException ex) {
            return overflow(b);
        }
    }

    private Long overflow(Expr e) {
        diags.error(e.span(), "constant arithmetic overflows 64 bits",
                "keep constants between " + Long.MIN_VALUE + " and " + Long.MAX_VALUE);
        return null;
    }
}
