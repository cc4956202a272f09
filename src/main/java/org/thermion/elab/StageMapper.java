package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.model.GateFn;
import org.thermion.model.StageType;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Maps lowered {@link Logic} bits onto the stages the realize block names and adds them to the
 * {@link NetBuilder}: NOT pushed into NAND/NOR, wide AND/OR split into trees within each
 * stage's fan-in, XOR built from AND/OR where no XOR stage exists. An inverter of a net whose
 * driver is not yet known is kept as a candidate; {@link ComplementResolver} later turns it
 * into a flip-flop's free second output where the driver proves to be a latch.
 */
final class StageMapper {
    final NetBuilder nb;
    /** Outputs of relay and lamp drivers: they drive something outside, so they count as read. */
    final Set<Integer> driverOutputs = new HashSet<>();
    /** Inverters decided after expansion: gate index, in creation order. */
    final List<Integer> candidates = new ArrayList<>();
    private final Map<Integer, Integer> candidateOf = new HashMap<>();
    private final Map<Long, Integer> candidateFor = new HashMap<>();
    private final Parts parts;
    private final Diagnostics diags;
    private final Set<String> reportedOps = new HashSet<>();

    StageMapper(NetBuilder nb, Parts parts, Diagnostics diags) {
        this.nb = nb;
        this.parts = parts;
        this.diags = diags;
    }

    /** Builds {@code l} into {@code dest}, or into a new net when {@code dest} < 0; returns the net. */
    int emit(Scope f, Logic l, int dest, Span span) {
        if (l instanceof Logic.Net n) {
            return dest < 0 ? n.net() : nb.wire(n.net(), dest, f.module, span);
        } else if (l instanceof Logic.Const c) {
            int k = c.value() ? 1 : 0;
            return dest < 0 ? k : nb.wire(k, dest, f.module, span);
        } else if (l instanceof Logic.Not n) {
            return emitNot(f, n.operand(), dest, span);
        } else if (l instanceof Logic.And a) {
            return emitAssoc(f, true, a.operands(), false, dest, span);
        } else if (l instanceof Logic.Or o) {
            return emitAssoc(f, false, o.operands(), false, dest, span);
        } else if (l instanceof Logic.Xor x) {
            return emitXor(f, x, false, dest, span);
        } else if (l instanceof Logic.Call c) {
            return emitCall(f, c, dest, span);
        }
        throw new IllegalStateException("unknown logic node " + l);
    }

    private int emitCall(Scope f, Logic.Call c, int dest, Span span) {
        int[] in = new int[c.args().size()];
        for (int i = 0; i < in.length; i++) {
            in[i] = emit(f, c.args().get(i), -1, span);
        }
        StageType st = parts.stages.get(c.stage());
        int out = nb.gate(st.function().gate(in.length), c.stage(), in, dest, f.module, f.path, span);
        if (st.function().isDriver()) {
            driverOutputs.add(out);
        }
        return out;
    }

    private int emitNot(Scope f, Logic x, int dest, Span span) {
        if (x instanceof Logic.Not n) {
            return emit(f, n.operand(), dest, span);
        } else if (x instanceof Logic.Const c) {
            return emit(f, new Logic.Const(!c.value()), dest, span);
        } else if (x instanceof Logic.And a) {
            return emitAssoc(f, true, a.operands(), true, dest, span);
        } else if (x instanceof Logic.Or o) {
            return emitAssoc(f, false, o.operands(), true, dest, span);
        } else if (x instanceof Logic.Xor xo) {
            return emitXor(f, xo, true, dest, span);
        } else {
            int in = emit(f, x, -1, span);
            return invert(f, in, dest, span);
        }
    }

    private int invert(Scope f, int in, int dest, Span span) {
        if (in <= 1 && nb.driver.get(in) == NetBuilder.CONSTANT) {
            return emit(f, new Logic.Const(in == 0), dest, span);
        }
        if (nb.isLatchOutput(in)) {
            // The module's candidate for this latch, where one was made before the latch was known.
            Integer t = candidateFor.get(((long) f.module << 32) | in);
            int c = t != null ? t : nb.complementOf(in);
            return dest < 0 ? c : nb.wire(c, dest, f.module, span);
        }
        Integer source = nb.complementSource.get(in);
        if (source != null) {
            return dest < 0 ? source : nb.wire(source, dest, f.module, span);
        }
        if (nb.driver.get(in) == NetBuilder.NONE || candidateOf.containsKey(in)) {
            return candidate(f, in, dest, span);
        }
        int s = needStage("not", "!", span);
        if (s < 0) {
            return 0;
        }
        return nb.gate(GateFn.NOT, s, new int[]{in}, dest, f.module, f.path, span);
    }

    /**
     * An inverter of a net not yet driven (or of such an inverter): one per module and net, built
     * now on the realize block's NOT stage (or none) and decided once every driver is known.
     */
    private int candidate(Scope f, int in, int dest, Span span) {
        long key = ((long) f.module << 32) | in;
        Integer t = candidateFor.get(key);
        if (t == null) {
            t = nb.undecidedInverter(parts.realizer("not"), in, f.module, f.path, span);
            candidates.add(nb.driver.get(t));
            candidateOf.put(t, in);
            candidateFor.put(key, t);
        }
        return dest < 0 ? t : nb.wire(t, dest, f.module, span);
    }

    /** A left-deep chain {@code a ^ b ^ c ...} is walked with a loop: no JVM stack per link. */
    private int emitXor(Scope f, Logic.Xor x, boolean inverted, int dest, Span span) {
        Deque<Logic.Xor> spine = new ArrayDeque<>();
        Logic e = x;
        while (e instanceof Logic.Xor xo) {
            spine.push(xo);
            e = xo.left();
        }
        int a = emit(f, e, -1, span);
        while (spine.size() > 1) {
            a = xor(f, a, emit(f, spine.pop().right(), -1, span), false, -1, span);
        }
        return xor(f, a, emit(f, spine.pop().right(), -1, span), inverted, dest, span);
    }

    private int xor(Scope f, int a, int b, boolean inverted, int dest, Span span) {
        int xs = parts.realizer("xor");
        if (xs >= 0) {
            if (!inverted) {
                return nb.gate(GateFn.XOR, xs, new int[]{a, b}, dest, f.module, f.path, span);
            }
            return invert(f, nb.gate(GateFn.XOR, xs, new int[]{a, b}, -1, f.module, f.path, span), dest, span);
        }
        // Without an xor stage: a ^ b = (a | b) & !(a & b); its complement = !(a | b) | (a & b).
        Logic la = new Logic.Net(a), lb = new Logic.Net(b);
        if (!inverted) {
            return emit(f, new Logic.And(List.of(new Logic.Or(List.of(la, lb)), new Logic.Not(new Logic.And(List.of(la, lb))))), dest, span);
        }
        return emit(f, new Logic.Or(List.of(new Logic.Not(new Logic.Or(List.of(la, lb))), new Logic.And(List.of(la, lb)))), dest, span);
    }

    private int emitAssoc(Scope f, boolean and, List<Logic> operands, boolean inverted, int dest, Span span) {
        List<Logic> flat = new ArrayList<>();
        flatten(and, operands, flat);
        List<Integer> nets = new ArrayList<>();
        // A set beside the list: the list keeps first-seen order, the set keeps the duplicate
        // test constant-time (List.contains made wide ANDs and ORs quadratic in their operands).
        Set<Integer> seen = new HashSet<>();
        for (Logic o : flat) {
            if (o instanceof Logic.Const c) {
                if (c.value() != and) {
                    return emit(f, new Logic.Const(and == inverted), dest, span);
                }
                continue;
            }
            int n = emit(f, o, -1, span);
            if (n <= 1) {
                boolean v = n == 1;
                if (v != and) {
                    return emit(f, new Logic.Const(and == inverted), dest, span);
                }
                continue;
            }
            if (seen.add(n)) {
                nets.add(n);
            }
        }
        if (nets.isEmpty()) {
            return emit(f, new Logic.Const(and != inverted), dest, span);
        }
        if (nets.size() == 1) {
            return inverted ? invert(f, nets.get(0), dest, span) : emit(f, new Logic.Net(nets.get(0)), dest, span);
        }
        return tree(f, and, inverted, nets.stream().mapToInt(Integer::intValue).toArray(), dest, span);
    }

    private static void flatten(boolean and, List<Logic> ops, List<Logic> out) {
        for (Logic o : ops) {
            if (and && o instanceof Logic.And a) {
                flatten(true, a.operands(), out);
            } else if (!and && o instanceof Logic.Or r) {
                flatten(false, r.operands(), out);
            } else {
                out.add(o);
            }
        }
    }

    /** An n-input AND/OR (inverted: NAND/NOR) as a tree of stages within their fan-in. */
    private int tree(Scope f, boolean and, boolean inverted, int[] in, int dest, Span span) {
        String plain = and ? "and" : "or";
        String inv = and ? "nand" : "nor";
        String sym = and ? "&" : "|";
        int stage = parts.realizer(inverted ? inv : plain);
        if (stage < 0) {
            // Fall back on the other polarity and an inverter.
            int other = parts.realizer(inverted ? plain : inv);
            if (other < 0 || parts.realizer("not") < 0) {
                needStage(inverted ? inv : plain, inverted ? "!(" + sym + ")" : sym, span);
                return 0;
            }
            int mid = tree(f, and, !inverted, in, -1, span);
            return invert(f, mid, dest, span);
        }
        int fanIn = parts.stages.get(stage).fanIn();
        if (in.length <= fanIn) {
            GateFn fn = and ? (inverted ? GateFn.NAND : GateFn.AND) : (inverted ? GateFn.NOR : GateFn.OR);
            return nb.gate(fn, stage, in, dest, f.module, f.path, span);
        }
        if (fanIn < 2) {
            diags.error(span, "stage '" + parts.stages.get(stage).name() + "' has a fan-in of 1 and cannot join inputs", null);
            return 0;
        }
        int groups = (in.length + fanIn - 1) / fanIn;
        int per = (in.length + groups - 1) / groups;
        int[] inner = new int[groups];
        for (int g = 0; g < groups; g++) {
            int from = g * per, to = Math.min(in.length, from + per);
            int[] part = Arrays.copyOfRange(in, from, to);
            inner[g] = part.length == 1 ? part[0] : tree(f, and, false, part, -1, span);
        }
        return tree(f, and, inverted, inner, dest, span);
    }

    /** The stage realizing {@code op}; reports a missing one once per operator. */
    int needStage(String op, String sym, Span span) {
        int s = parts.realizer(op);
        if (s < 0 && !parts.realizeReported(op) && reportedOps.add(op)) {
            diags.error(span, "operator '" + sym + "' has no stage to realize it",
                    "add `" + op + " STAGE` to a realize block, naming a stage whose function is " + op);
        }
        return s;
    }
}
