package org.thermion.elab;

import org.thermion.text.Nouns;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Expr;
import org.thermion.lang.ast.Index;
import org.thermion.model.StageType;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

import static org.thermion.elab.Lowered.bitsWord;

/**
 * Lowers expressions to {@link Logic} bits in a scope: names to nets, slices, constants to
 * constant bits, operators bit by bit, {@code ==} to one AND of matches, stage calls checked
 * against their fan-in. No stage is chosen here; {@link StageMapper} does that.
 */
final class ExpressionLowering {
    private final Declarations decls;
    private final Parts parts;
    private final Diagnostics diags;
    private final ConstantFolder folder;

    ExpressionLowering(Declarations decls, Parts parts, Diagnostics diags, ConstantFolder folder) {
        this.decls = decls;
        this.parts = parts;
        this.diags = diags;
        this.folder = folder;
    }

    /** A constant in this scope (loop variables included), or null after an error. */
    Long constant(Scope f, Expr e, String what) {
        return folder.value(f.consts, e, what);
    }

    Lowered lower(Scope f, Expr e) {
        if (e instanceof Expr.Num n) {
            return new Lowered.Num(n.value());
        } else if (e instanceof Expr.Ref r) {
            return reference(f, r);
        } else if (e instanceof Expr.Not n) {
            Lowered v = lower(f, n.operand());
            if (v instanceof Lowered.Num x) {
                return new Lowered.Num(x.value() == 0 ? 1 : 0);
            }
            if (v instanceof Lowered.Bits b) {
                return new Lowered.Bits(b.bits().stream().map(x -> (Logic) new Logic.Not(x)).toList());
            }
            return null;
        } else if (e instanceof Expr.Neg n) {
            Long v = constant(f, n, "a constant");
            return v == null ? null : new Lowered.Num(v);
        } else if (e instanceof Expr.Bin b) {
            return binary(f, b);
        } else if (e instanceof Expr.Call c) {
            return call(f, c);
        } else if (e instanceof Expr.Concat c) {
            List<Logic> bits = new ArrayList<>();
            for (int i = c.parts().size() - 1; i >= 0; i--) {
                Expr p = c.parts().get(i);
                Lowered v = lower(f, p);
                List<Logic> pb = v == null ? null : bits(v, 1, p.span());
                if (pb == null) {
                    return null;
                }
                if (pb.size() > ConstantFolder.MAX_WIDTH - bits.size()) {
                    diags.error(c.span(), "concatenation is wider than " + ConstantFolder.MAX_WIDTH + " bits",
                            "no bus is wider than " + ConstantFolder.MAX_WIDTH + " bits; slice the parts");
                    return null;
                }
                bits.addAll(pb);
            }
            return new Lowered.Bits(bits);
        }
        return null;
    }

    private Lowered reference(Scope f, Expr.Ref r) {
        if (r.index() == null && f.consts.containsKey(r.name().text())) {
            return new Lowered.Num(f.consts.get(r.name().text()));
        }
        Signal s = f.lookup(r.name(), diags);
        if (s == null) {
            return null;
        }
        if (s.nets().length == 0) {
            diags.error(r.span(), "'" + s.name() + "' is a module instance, not a net", "connect its ports instead");
            return null;
        }
        int[] nets = select(f, s, r.index());
        if (nets == null) {
            return null;
        }
        List<Logic> bits = new ArrayList<>(nets.length);
        for (int n : nets) {
            bits.add(new Logic.Net(n));
        }
        return new Lowered.Bits(bits);
    }

    /** The nets a (possibly indexed or sliced) signal names; null after an error. */
    int[] select(Scope f, Signal s, Index idx) {
        if (idx == null) {
            return s.nets();
        }
        Long hi = constant(f, idx.hi(), "a bus index");
        Long lo = idx.isSlice() ? constant(f, idx.lo(), "a bus index") : hi;
        if (hi == null || lo == null) {
            return null;
        }
        int w = s.width();
        for (long v : new long[]{hi, lo}) {
            if (v < 0 || v >= w) {
                diags.error(idx.span(), "index " + v + " out of range for '" + s.name() + "'"
                                + (s.bus() ? ", a bus of " + w + " bits (0.." + (w - 1) + ")" : ", a single bit"),
                        s.bus() ? "use an index from 0 to " + (w - 1) : "a single net takes no index");
                return null;
            }
        }
        if (hi < lo) {
            diags.error(idx.span(), "slice written low..high", "write slices high..low, e.g. [" + lo + ".." + hi + "]");
            return null;
        }
        int[] out = new int[(int) (hi - lo + 1)];
        System.arraycopy(s.nets(), (int) (long) lo, out, 0, out.length);
        return out;
    }

    /**
     * A chain {@code a & b & c ...} parses left-deep; its left spine is walked with a loop, so a
     * long chain costs no JVM stack. Left before right, as a recursive walk would go.
     */
    private Lowered binary(Scope f, Expr.Bin b) {
        Deque<Expr.Bin> spine = new ArrayDeque<>();
        Expr e = b;
        while (e instanceof Expr.Bin x) {
            spine.push(x);
            e = x.left();
        }
        Lowered acc = lower(f, e);
        while (!spine.isEmpty()) {
            Expr.Bin x = spine.pop();
            acc = combine(x, acc, lower(f, x.right()));
        }
        return acc;
    }

    private Lowered combine(Expr.Bin b, Lowered l, Lowered r) {
        if (b.op().ordinal() >= Expr.BinOp.ADD.ordinal()) {
            if (l instanceof Lowered.Num x && r instanceof Lowered.Num y) {
                Long v = folder.arith(b, x.value(), y.value());
                return v == null ? null : new Lowered.Num(v);
            }
            if (l != null && r != null) {
                diags.error(b.span(), "'" + b.op().symbol + "' works on constants only",
                        "logic uses & | ^ ! and ==; arithmetic is for indices and loop bounds");
            }
            return null;
        }
        if (l == null || r == null) {
            return null;
        }
        if (l instanceof Lowered.Num x && r instanceof Lowered.Num y) {
            long v = switch (b.op()) {
                case AND -> x.value() & y.value();
                case OR -> x.value() | y.value();
                case XOR -> x.value() ^ y.value();
                default -> x.value() == y.value() ? 1 : 0;
            };
            return new Lowered.Num(v);
        }
        int w = l instanceof Lowered.Bits lb ? lb.bits().size() : ((Lowered.Bits) r).bits().size();
        List<Logic> lb = bits(l, w, b.left().span());
        List<Logic> rb = bits(r, w, b.right().span());
        if (lb == null || rb == null) {
            return null;
        }
        if (lb.size() != rb.size()) {
            diags.error(b.span(), "bus width mismatch: '" + b.op().symbol + "' joins " + bitsWord(lb.size()) + " and "
                    + bitsWord(rb.size()), "slice one side so the widths agree");
            return null;
        }
        if (b.op() == Expr.BinOp.EQ) {
            return new Lowered.Bits(List.of(equality(lb, rb)));
        }
        List<Logic> out = new ArrayList<>(lb.size());
        for (int i = 0; i < lb.size(); i++) {
            Logic x = lb.get(i), y = rb.get(i);
            out.add(switch (b.op()) {
                case AND -> new Logic.And(List.of(x, y));
                case OR -> new Logic.Or(List.of(x, y));
                default -> new Logic.Xor(x, y);
            });
        }
        return new Lowered.Bits(out);
    }

    /** {@code a == b}: an AND of per-bit matches; a constant bit matches by its polarity. */
    private static Logic equality(List<Logic> lb, List<Logic> rb) {
        List<Logic> terms = new ArrayList<>();
        for (int i = 0; i < lb.size(); i++) {
            Logic x = lb.get(i), y = rb.get(i);
            if (y instanceof Logic.Const c) {
                terms.add(c.value() ? x : new Logic.Not(x));
            } else if (x instanceof Logic.Const c) {
                terms.add(c.value() ? y : new Logic.Not(y));
            } else {
                terms.add(new Logic.Not(new Logic.Xor(x, y)));
            }
        }
        return terms.size() == 1 ? terms.get(0) : new Logic.And(terms);
    }

    private Lowered call(Scope f, Expr.Call c) {
        String name = c.function().text();
        if (!parts.isStage(name)) {
            if (decls.modules.containsKey(name)) {
                diags.error(c.function().span(), "'" + name + "' is a module; modules are placed with `use " + name + " as NAME (...)`", null);
            } else {
                diags.error(c.function().span(), "unknown stage '" + name + "'",
                        Declarations.hintFor(name, parts.stageNames(), "declare it with `stage " + name + " : FUNCTION { ... }`"));
            }
            return null;
        }
        int s = parts.stage(name, c.function().span());
        if (s < 0) {
            return null;
        }
        StageType st = parts.stages.get(s);
        int max = st.fanIn();
        int min = st.function().minInputs();
        if (!st.function().callable()) {
            diags.error(c.span(), "stage '" + name + "' is a latch; declare it with a `latch` line", null);
            return null;
        }
        if (c.args().size() < Math.min(min, max) || c.args().size() > max) {
            diags.error(c.span(), "stage '" + name + "' takes " + (min == max || min > max ? max + "" : min + " to " + max)
                    + " " + Nouns.agree(max, "input") + ", given " + c.args().size(), null);
            return null;
        }
        List<Logic> args = new ArrayList<>();
        for (Expr a : c.args()) {
            Lowered v = lower(f, a);
            List<Logic> ab = v == null ? null : bits(v, 1, a.span());
            if (ab == null) {
                return null;
            }
            if (ab.size() != 1) {
                diags.error(a.span(), "a stage input is one bit; this is " + bitsWord(ab.size()), null);
                return null;
            }
            args.add(ab.get(0));
        }
        return new Lowered.Bits(List.of(new Logic.Call(s, args)));
    }

    /** The bits of a value at a width; a number becomes constant bits and must fit. */
    List<Logic> bits(Lowered v, int width, Span at) {
        if (v instanceof Lowered.Bits b) {
            return b.bits();
        }
        long n = ((Lowered.Num) v).value();
        if (n < 0 || (width < 63 && n >= (1L << width))) {
            diags.error(at, "constant " + n + " does not fit in " + bitsWord(width), "use a value from 0 to " + ((1L << Math.min(width, 62)) - 1));
            return null;
        }
        List<Logic> out = new ArrayList<>(width);
        for (int i = 0; i < width; i++) {
            out.add(((n >>> i) & 1) == 1 ? Logic.ONE : Logic.ZERO);
        }
        return out;
    }
}
