package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.Expr;
import org.thermion.lang.ast.Ident;
import org.thermion.lang.ast.Index;
import org.thermion.lang.ast.ModuleStmt;
import org.thermion.model.GateFn;
import org.thermion.model.ModuleInstance;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Expands modules into the flat netlist: declares names, runs generators, lowers
 * expressions to bits and maps every operator onto the stage the realize block names,
 * splitting wide operators into trees that respect each stage's fan-in.
 */
final class ModuleExpander {
    private static final long ITERATION_LIMIT = 10_000_000;

    final NetBuilder nb;
    final List<ModuleInstance> modules = new ArrayList<>();
    final Map<Integer, Map<String, Signal>> scopes = new HashMap<>();
    /** Ports of each instance, for lint: instance → (name → signal). */
    final Map<Integer, List<Signal>> ports = new HashMap<>();
    final Set<Integer> driverOutputs = new HashSet<>();
    private final Declarations decls;
    private final Parts parts;
    private final Diagnostics diags;
    private final int phases;
    private final Deque<String> stack = new ArrayDeque<>();
    private final Set<String> reportedOps = new HashSet<>();
    private long iterations;
    private long loopProduct = 1;
    private boolean stopped;

    ModuleExpander(Declarations decls, Parts parts, Diagnostics diags, int phases) {
        this.decls = decls;
        this.parts = parts;
        this.diags = diags;
        this.phases = phases;
        this.nb = new NetBuilder(diags);
    }

    /** A module instance being expanded: where its names live. */
    private final class Frame {
        final int module;
        final String path;
        final Map<String, Signal> names = new LinkedHashMap<>();
        final Map<String, Long> consts = new HashMap<>();

        Frame(int module, String path) {
            this.module = module;
            this.path = path;
        }

        String qualify(String local) {
            return path.isEmpty() ? local : path + "." + local;
        }
    }

    /** Expands the top module; its input ports become externally driven nets. */
    Map<String, Signal> expandTop(Decl.Module top) {
        stack.push(top.name().text());
        Frame f = instantiate(top, "", -1, Map.of(), true);
        stack.pop();
        return f.names;
    }

    private Frame instantiate(Decl.Module m, String path, int parent, Map<String, int[]> bound, boolean top) {
        int id = modules.size();
        modules.add(new ModuleInstance(id, path, m.name().text(), parent));
        Frame f = new Frame(id, path);
        scopes.put(id, f.names);
        List<Signal> myPorts = new ArrayList<>();
        ports.put(id, myPorts);
        for (ModuleStmt s : m.body()) {
            if (s instanceof ModuleStmt.Const c) {
                declareConst(f, c);
            }
        }
        for (ModuleStmt s : m.body()) {
            if (s instanceof ModuleStmt.Ports p) {
                for (ModuleStmt.Declared d : p.ports()) {
                    int w = width(f, d.width());
                    int[] nets = bound.get(d.name().text());
                    Signal.Kind kind = p.dir() == ModuleStmt.Dir.IN ? Signal.Kind.IN : Signal.Kind.OUT;
                    if (nets == null) {
                        nets = allocate(f, d.name().text(), w, d.width() != null, d.span());
                        if (top && kind == Signal.Kind.IN) {
                            for (int n : nets) {
                                nb.driver.set(n, NetBuilder.EXTERNAL);
                            }
                        }
                    }
                    Signal sig = new Signal(d.name().text(), nets, d.name().span(), kind, d.width() != null);
                    if (declare(f, sig)) {
                        myPorts.add(sig);
                    }
                }
            } else if (s instanceof ModuleStmt.Nets n) {
                for (ModuleStmt.Declared d : n.nets()) {
                    int w = width(f, d.width());
                    declare(f, new Signal(d.name().text(), allocate(f, d.name().text(), w, d.width() != null, d.span()),
                            d.name().span(), Signal.Kind.NET, d.width() != null));
                }
                if (n.init() != null && n.nets().size() != 1) {
                    diags.error(n.init().span(), "an initial expression needs exactly one net", "write one `net x = ...` per line");
                }
            } else if (s instanceof ModuleStmt.Latch l) {
                int w = width(f, l.width());
                Signal port = f.names.get(l.name().text());
                if (port != null && port.kind() == Signal.Kind.OUT && port.width() == w) {
                    // An output port stored in a latch: the latch drives the port's nets.
                    f.names.put(port.name(), new Signal(port.name(), port.nets(), port.decl(), Signal.Kind.LATCH, port.bus()));
                } else {
                    declare(f, new Signal(l.name().text(), allocate(f, l.name().text(), w, l.width() != null, l.name().span()),
                            l.name().span(), Signal.Kind.LATCH, l.width() != null));
                }
            }
        }
        body(f, m.body(), true);
        return f;
    }

    private void declareConst(Frame f, ModuleStmt.Const c) {
        Long v = constant(f, c.value(), "the value of a constant");
        if (f.consts.containsKey(c.name().text()) || f.names.containsKey(c.name().text())) {
            diags.error(c.name().span(), "duplicate name '" + c.name().text() + "'", "each name in a module is declared once");
            return;
        }
        f.consts.put(c.name().text(), v == null ? 0 : v);
    }

    private boolean declare(Frame f, Signal s) {
        Signal old = f.names.get(s.name());
        if (old != null || f.consts.containsKey(s.name())) {
            diags.error(s.decl(), "duplicate name '" + s.name() + "'",
                    (old != null ? "first declared at " + old.decl() + "; " : "") + "each name in a module is declared once");
            return false;
        }
        f.names.put(s.name(), s);
        return true;
    }

    private int[] allocate(Frame f, String name, int width, boolean bus, Span span) {
        int[] nets = new int[width];
        for (int i = 0; i < width; i++) {
            nets[i] = nb.net(f.qualify(bus ? name + "[" + i + "]" : name), f.module, span);
        }
        return nets;
    }

    private int width(Frame f, Expr w) {
        if (w == null) {
            return 1;
        }
        Long v = constant(f, w, "a bus width");
        if (v == null) {
            return 1;
        }
        if (v < 1 || v > 65536) {
            diags.error(w.span(), "bus width " + v + " is out of range", "use a width from 1 to 65536");
            return 1;
        }
        return (int) (long) v;
    }

    private void body(Frame f, List<ModuleStmt> stmts, boolean topLevel) {
        for (ModuleStmt s : stmts) {
            if (diags.full() || stopped) {
                return;
            }
            if (s instanceof ModuleStmt.Assign a) {
                assign(f, a);
            } else if (s instanceof ModuleStmt.Nets n) {
                if (!topLevel) {
                    diags.error(n.span(), "nets are declared outside generator loops", "declare the bus before the loop and index it inside");
                } else if (n.init() != null && n.nets().size() == 1) {
                    Signal t = f.names.get(n.nets().get(0).name().text());
                    if (t != null) {
                        assignBits(f, t.nets(), lower(f, n.init()), n.init().span(), n.span());
                    }
                }
            } else if (s instanceof ModuleStmt.Latch l) {
                if (!topLevel) {
                    diags.error(l.span(), "latches are declared outside generator loops", "declare the latch bus before the loop");
                } else {
                    latch(f, l);
                }
            } else if (s instanceof ModuleStmt.Use u) {
                use(f, u);
            } else if (s instanceof ModuleStmt.For fo) {
                generate(f, fo);
            } else if (s instanceof ModuleStmt.Ports p) {
                if (!topLevel) {
                    diags.error(p.span(), "ports are declared outside generator loops", null);
                }
            } else if (s instanceof ModuleStmt.Const c) {
                if (!topLevel) {
                    diags.error(c.span(), "constants are declared outside generator loops", null);
                }
            }
        }
    }

    private void generate(Frame f, ModuleStmt.For fo) {
        Long from = constant(f, fo.from(), "the start of a loop range");
        Long to = constant(f, fo.to(), "the end of a loop range");
        if (from == null || to == null) {
            return;
        }
        String var = fo.var().text();
        if (f.names.containsKey(var)) {
            diags.error(fo.var().span(), "loop variable '" + var + "' hides a net of the same name", "choose another name for the loop variable");
            return;
        }
        long count = Math.abs(to - from) + 1;
        if (count > NetBuilder.LIMIT / loopProduct) {
            diags.error(fo.span(), "generator would expand " + String.format("%,d", count * loopProduct)
                            + " times (limit " + String.format("%,d", NetBuilder.LIMIT) + ")",
                    "check the loop's range; a machine of this size is not what was meant");
            stopped = true;
            return;
        }
        Long saved = f.consts.get(var);
        boolean fresh = activeLoops.add(var);
        loopProduct *= count;
        long step = from <= to ? 1 : -1;
        for (long k = from; ; k += step) {
            if (++iterations > ITERATION_LIMIT) {
                throw new TooLarge();
            }
            f.consts.put(var, k);
            body(f, fo.body(), false);
            if (k == to || diags.full() || stopped) {
                break;
            }
        }
        loopProduct /= count;
        if (fresh) {
            activeLoops.remove(var);
        }
        if (saved == null) {
            f.consts.remove(var);
        } else {
            f.consts.put(var, saved);
        }
    }

    // ---- statements

    private void assign(Frame f, ModuleStmt.Assign a) {
        Signal t = lookup(f, a.target());
        if (t == null) {
            return;
        }
        if (t.kind() == Signal.Kind.IN) {
            diags.error(a.target().span(), "'" + t.name() + "' is an input of this module and cannot be assigned",
                    "inputs are driven from outside; assign an output or a net");
            return;
        }
        if (t.kind() == Signal.Kind.LATCH) {
            diags.error(a.target().span(), "'" + t.name() + "' is a latch; its value is given in its `latch` line",
                    "write `latch " + t.name() + " on phase N = expr`");
            return;
        }
        int[] nets = select(f, t, a.index(), a.target().span());
        if (nets == null) {
            return;
        }
        assignBits(f, nets, lower(f, a.value()), a.value().span(), a.span());
    }

    private void assignBits(Frame f, int[] nets, Val v, Span valueSpan, Span stmt) {
        if (v == null) {
            return;
        }
        List<Logic> bits = bits(v, nets.length, valueSpan);
        if (bits == null) {
            return;
        }
        if (bits.size() != nets.length) {
            diags.error(valueSpan, "bus width mismatch: the target is " + bitsWord(nets.length) + " wide, the value "
                    + bitsWord(bits.size()), "slice one side, e.g. x[3..0], so the widths agree");
            return;
        }
        for (int i = 0; i < nets.length; i++) {
            emit(f, bits.get(i), nets[i], stmt);
        }
    }

    private static String bitsWord(int n) {
        return n + (n == 1 ? " bit" : " bits");
    }

    private void latch(Frame f, ModuleStmt.Latch l) {
        Signal q = f.names.get(l.name().text());
        if (q == null || q.kind() != Signal.Kind.LATCH) {
            return;
        }
        int phase = 1;
        if (l.phase() == null) {
            diags.error(l.name().span(), "latch '" + l.name().text() + "' has no clock phase",
                    "say when it loads: `latch " + l.name().text() + " on phase 1 = ...`");
        } else {
            Long p = constant(f, l.phase(), "a clock phase");
            if (p != null && (p < 1 || p > phases)) {
                diags.error(l.phase().span(), "clock phase " + p + " does not exist; the clock has " + phases + " phases",
                        "use a phase from 1 to " + phases);
            } else if (p != null) {
                phase = (int) (long) p;
            }
        }
        int stage;
        if (l.stage() != null) {
            stage = parts.stage(l.stage().text(), l.stage().span());
            if (stage >= 0 && parts.stages.get(stage).function().role() != StageFunction.Role.STORAGE) {
                diags.error(l.stage().span(), "stage '" + l.stage().text() + "' is not a latch or flip-flop",
                        "name a stage whose function is latch");
                stage = -1;
            }
        } else {
            stage = parts.realizer("latch");
            if (stage < 0 && reportedOps.add("latch")) {
                diags.error(l.name().span(), "no stage realizes latches",
                        "add `latch triode_flipflop` (or your own latch stage) to a realize block, or write `using STAGE`");
            }
        }
        int enable = -1;
        if (l.enable() != null) {
            Val ev = lower(f, l.enable());
            List<Logic> eb = ev == null ? null : bits(ev, 1, l.enable().span());
            if (eb != null) {
                if (eb.size() != 1) {
                    diags.error(l.enable().span(), "a latch enable is one bit; this is " + eb.size() + " bits", null);
                } else {
                    enable = emit(f, eb.get(0), -1, l.span());
                }
            }
        }
        Val dv = lower(f, l.data());
        List<Logic> db = dv == null ? null : bits(dv, q.width(), l.data().span());
        if (db == null) {
            return;
        }
        if (db.size() != q.width()) {
            diags.error(l.data().span(), "bus width mismatch: latch '" + q.name() + "' is " + bitsWord(q.width())
                    + " wide, its data " + bitsWord(db.size()), null);
            return;
        }
        for (int i = 0; i < q.width(); i++) {
            int d = emit(f, db.get(i), -1, l.span());
            nb.latch(d, enable, q.nets()[i], phase, stage, f.module, l.span());
        }
    }

    private void use(Frame f, ModuleStmt.Use u) {
        Decl.Module child = decls.modules.get(u.module().text());
        if (child == null) {
            diags.error(u.module().span(), "unknown module '" + u.module().text() + "'",
                    Declarations.hintFor(u.module().text(), new ArrayList<>(decls.modules.keySet()), "declare it with `module NAME { ... }`"));
            return;
        }
        if (stack.contains(child.name().text())) {
            diags.error(u.module().span(), "module '" + child.name().text() + "' instantiates itself"
                    + " (" + String.join(" -> ", reversed(stack)) + " -> " + child.name().text() + ")",
                    "a module cannot contain itself");
            return;
        }
        String instName = u.name().text();
        for (String var : loopVars(f)) {
            instName = instName + "[" + f.consts.get(var) + "]";
        }
        String path = f.qualify(instName);
        if (f.names.containsKey(instName)) {
            diags.error(u.name().span(), "duplicate name '" + instName + "'", "instances and nets of a module need distinct names");
            return;
        }
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
        Map<String, Long> childConsts = new HashMap<>();
        for (ModuleStmt s : child.body()) {
            if (s instanceof ModuleStmt.Const c) {
                Long v = constantIn(childConsts, c.value());
                childConsts.put(c.name().text(), v == null ? 0 : v);
            }
        }
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
            int w = 1;
            if (d.width() != null) {
                Long wv = constantIn(childConsts, d.width());
                w = wv == null ? 1 : (int) (long) wv;
            }
            int[] nets;
            if (dirs.get(pn) == ModuleStmt.Dir.OUT) {
                nets = outTarget(f, c.value());
            } else {
                Val v = lower(f, c.value());
                List<Logic> bits = v == null ? null : bits(v, w, c.value().span());
                if (bits == null) {
                    continue;
                }
                nets = new int[bits.size()];
                for (int i = 0; i < bits.size(); i++) {
                    nets[i] = emit(f, bits.get(i), -1, c.span());
                }
            }
            if (nets == null) {
                continue;
            }
            if (nets.length != w) {
                diags.error(c.value().span(), "bus width mismatch: port '" + pn + "' of '" + child.name().text() + "' is "
                        + bitsWord(w) + " wide, the connection " + bitsWord(nets.length), "slice the connection, e.g. x[3..0]");
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
        f.names.put(instName, new Signal(instName, new int[0], u.name().span(), Signal.Kind.NET, false));
        stack.push(child.name().text());
        instantiate(child, path, f.module, bound, false);
        stack.pop();
    }

    private static List<String> reversed(Deque<String> d) {
        List<String> l = new ArrayList<>(d);
        java.util.Collections.reverse(l);
        return l;
    }

    private List<String> loopVars(Frame f) {
        List<String> vars = new ArrayList<>();
        for (String k : f.consts.keySet()) {
            if (activeLoops.contains(k)) {
                vars.add(k);
            }
        }
        return vars;
    }

    private final Set<String> activeLoops = new HashSet<>();

    private int[] outTarget(Frame f, Expr e) {
        if (e instanceof Expr.Ref r) {
            Signal s = lookup(f, r.name());
            if (s == null) {
                return null;
            }
            if (s.kind() == Signal.Kind.IN) {
                diags.error(r.span(), "an output port cannot drive '" + s.name() + "', an input of this module", null);
                return null;
            }
            if (s.kind() == Signal.Kind.LATCH) {
                diags.error(r.span(), "an output port cannot drive latch '" + s.name() + "'", null);
                return null;
            }
            return select(f, s, r.index(), r.span());
        }
        diags.error(e.span(), "an output port connects to a net, not an expression", "write the name of a net, e.g. `y: result`");
        return null;
    }

    // ---- names and constants

    private Signal lookup(Frame f, Ident name) {
        Signal s = f.names.get(name.text());
        if (s == null) {
            if (f.consts.containsKey(name.text())) {
                diags.error(name.span(), "'" + name.text() + "' is a constant, not a net", null);
                return null;
            }
            List<String> known = new ArrayList<>(f.names.keySet());
            known.addAll(f.consts.keySet());
            String dym = Names.didYouMean(name.text(), known);
            diags.error(name.span(), "unknown name '" + name.text() + "'",
                    dym != null ? dym : "declare it with `net " + name.text() + "` or as a port");
        }
        return s;
    }

    private int[] select(Frame f, Signal s, Index idx, Span at) {
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
        for (int i = 0; i < out.length; i++) {
            out[i] = s.nets()[(int) (lo + i)];
        }
        return out;
    }

    private Long constant(Frame f, Expr e, String what) {
        Val v = lowerConst(f.consts, e, what, true);
        return v instanceof Val.Num n ? n.value() : null;
    }

    private Long constantIn(Map<String, Long> env, Expr e) {
        Val v = lowerConst(env, e, "a constant", true);
        return v instanceof Val.Num n ? n.value() : null;
    }

    private Val lowerConst(Map<String, Long> env, Expr e, String what, boolean report) {
        if (e instanceof Expr.Num n) {
            return new Val.Num(n.value());
        } else if (e instanceof Expr.Ref r && r.index() == null && env.containsKey(r.name().text())) {
            return new Val.Num(env.get(r.name().text()));
        } else if (e instanceof Expr.Neg n) {
            Val v = lowerConst(env, n.operand(), what, report);
            return v instanceof Val.Num x ? new Val.Num(-x.value()) : null;
        } else if (e instanceof Expr.Bin b && b.op().ordinal() >= Expr.BinOp.ADD.ordinal()) {
            Val l = lowerConst(env, b.left(), what, report);
            Val r = lowerConst(env, b.right(), what, report);
            if (l instanceof Val.Num x && r instanceof Val.Num y) {
                return arith(b, x.value(), y.value());
            }
            return null;
        } else {
            if (report) {
                diags.error(e.span(), "expected " + what + ": a number or a constant expression", null);
            }
            return null;
        }
    }

    private Val arith(Expr.Bin b, long x, long y) {
        switch (b.op()) {
            case ADD:
                return new Val.Num(x + y);
            case SUB:
                return new Val.Num(x - y);
            case MUL:
                return new Val.Num(x * y);
            case DIV:
            case MOD:
                if (y == 0) {
                    diags.error(b.span(), "division by zero", null);
                    return null;
                }
                return new Val.Num(b.op() == Expr.BinOp.DIV ? Math.floorDiv(x, y) : Math.floorMod(x, y));
            default:
                return null;
        }
    }

    // ---- expressions to bits

    /** A lowered value: a bus of bits, or a number whose width comes from its use. */
    private sealed interface Val {
        record Bits(List<Logic> bits) implements Val {
        }

        record Num(long value) implements Val {
        }
    }

    private Val lower(Frame f, Expr e) {
        if (e instanceof Expr.Num n) {
            return new Val.Num(n.value());
        } else if (e instanceof Expr.Ref r) {
            if (r.index() == null && f.consts.containsKey(r.name().text())) {
                return new Val.Num(f.consts.get(r.name().text()));
            }
            Signal s = lookup(f, r.name());
            if (s == null) {
                return null;
            }
            if (s.nets().length == 0) {
                diags.error(r.span(), "'" + s.name() + "' is a module instance, not a net", "connect its ports instead");
                return null;
            }
            int[] nets = select(f, s, r.index(), r.span());
            if (nets == null) {
                return null;
            }
            List<Logic> bits = new ArrayList<>(nets.length);
            for (int n : nets) {
                bits.add(new Logic.Net(n));
            }
            return new Val.Bits(bits);
        } else if (e instanceof Expr.Not n) {
            Val v = lower(f, n.operand());
            if (v instanceof Val.Num x) {
                return new Val.Num(x.value() == 0 ? 1 : 0);
            }
            if (v instanceof Val.Bits b) {
                return new Val.Bits(b.bits().stream().map(x -> (Logic) new Logic.Not(x)).toList());
            }
            return null;
        } else if (e instanceof Expr.Neg n) {
            return lowerConst(f.consts, n, "a constant", true);
        } else if (e instanceof Expr.Bin b) {
            return binary(f, b);
        } else if (e instanceof Expr.Call c) {
            return call(f, c);
        } else if (e instanceof Expr.Concat c) {
            List<Logic> bits = new ArrayList<>();
            for (int i = c.parts().size() - 1; i >= 0; i--) {
                Expr p = c.parts().get(i);
                Val v = lower(f, p);
                if (v == null) {
                    return null;
                }
                List<Logic> pb = bits(v, 1, p.span());
                if (pb == null) {
                    return null;
                }
                bits.addAll(pb);
            }
            return new Val.Bits(bits);
        }
        return null;
    }

    private Val binary(Frame f, Expr.Bin b) {
        if (b.op().ordinal() >= Expr.BinOp.ADD.ordinal()) {
            Val l = lower(f, b.left());
            Val r = lower(f, b.right());
            if (l instanceof Val.Num x && r instanceof Val.Num y) {
                return arith(b, x.value(), y.value());
            }
            if (l != null && r != null) {
                diags.error(b.span(), "'" + b.op().symbol + "' works on constants only",
                        "logic uses & | ^ ! and ==; arithmetic is for indices and loop bounds");
            }
            return null;
        }
        Val l = lower(f, b.left());
        Val r = lower(f, b.right());
        if (l == null || r == null) {
            return null;
        }
        if (l instanceof Val.Num x && r instanceof Val.Num y) {
            long v = switch (b.op()) {
                case AND -> x.value() & y.value();
                case OR -> x.value() | y.value();
                case XOR -> x.value() ^ y.value();
                default -> x.value() == y.value() ? 1 : 0;
            };
            return new Val.Num(v);
        }
        int w = l instanceof Val.Bits lb ? lb.bits().size() : ((Val.Bits) r).bits().size();
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
            return new Val.Bits(List.of(terms.size() == 1 ? terms.get(0) : new Logic.And(terms)));
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
        return new Val.Bits(out);
    }

    private Val call(Frame f, Expr.Call c) {
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
                    + (max == 1 ? " input" : " inputs") + ", given " + c.args().size(), null);
            return null;
        }
        List<Logic> args = new ArrayList<>();
        for (Expr a : c.args()) {
            Val v = lower(f, a);
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
        return new Val.Bits(List.of(new Logic.Call(s, args)));
    }

    /** The bits of a value at a width; a number becomes constant bits and must fit. */
    private List<Logic> bits(Val v, int width, Span at) {
        if (v instanceof Val.Bits b) {
            return b.bits();
        }
        long n = ((Val.Num) v).value();
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

    // ---- mapping onto stages

    private int emit(Frame f, Logic l, int dest, Span span) {
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
        throw new IllegalStateException("unknown logic node " + l);
    }

    private int emitNot(Frame f, Logic x, int dest, Span span) {
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

    private int invert(Frame f, int in, int dest, Span span) {
        if (in <= 1 && nb.driver.get(in) == NetBuilder.CONSTANT) {
            return emit(f, new Logic.Const(in == 0), dest, span);
        }
        if (nb.isLatchOutput(in)) {
            int c = nb.complementOf(in, f.module);
            return dest < 0 ? c : nb.wire(c, dest, f.module, span);
        }
        Integer source = nb.complementSource.get(in);
        if (source != null) {
            return dest < 0 ? source : nb.wire(source, dest, f.module, span);
        }
        int s = needStage(f, "not", "!", span);
        if (s < 0) {
            return 0;
        }
        return nb.gate(GateFn.NOT, s, new int[]{in}, dest, f.module, f.path, span);
    }

    private int emitXor(Frame f, Logic.Xor x, boolean inverted, int dest, Span span) {
        int xs = parts.realizer("xor");
        if (xs >= 0) {
            int a = emit(f, x.left(), -1, span);
            int b = emit(f, x.right(), -1, span);
            if (!inverted) {
                return nb.gate(GateFn.XOR, xs, new int[]{a, b}, dest, f.module, f.path, span);
            }
            return invert(f, nb.gate(GateFn.XOR, xs, new int[]{a, b}, -1, f.module, f.path, span), dest, span);
        }
        // Without an xor stage: a ^ b = (a | b) & !(a & b); its complement = !(a | b) | (a & b).
        int a = emit(f, x.left(), -1, span);
        int b = emit(f, x.right(), -1, span);
        Logic la = new Logic.Net(a), lb = new Logic.Net(b);
        if (!inverted) {
            return emit(f, new Logic.And(List.of(new Logic.Or(List.of(la, lb)), new Logic.Not(new Logic.And(List.of(la, lb))))), dest, span);
        }
        return emit(f, new Logic.Or(List.of(new Logic.Not(new Logic.Or(List.of(la, lb))), new Logic.And(List.of(la, lb)))), dest, span);
    }

    private int emitAssoc(Frame f, boolean and, List<Logic> operands, boolean inverted, int dest, Span span) {
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
    private int tree(Frame f, boolean and, boolean inverted, int[] in, int dest, Span span) {
        String plain = and ? "and" : "or";
        String inv = and ? "nand" : "nor";
        String sym = and ? "&" : "|";
        int stage = parts.realizer(inverted ? inv : plain);
        if (stage < 0) {
            // Fall back on the other polarity and an inverter.
            int other = parts.realizer(inverted ? plain : inv);
            if (other < 0 || parts.realizer("not") < 0) {
                needStage(f, inverted ? inv : plain, inverted ? "!(" + sym + ")" : sym, span);
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
            int[] part = java.util.Arrays.copyOfRange(in, from, to);
            inner[g] = part.length == 1 ? part[0] : tree(f, and, false, part, -1, span);
        }
        return tree(f, and, inverted, inner, dest, span);
    }

    private int needStage(Frame f, String op, String sym, Span span) {
        int s = parts.realizer(op);
        if (s < 0 && reportedOps.add(op)) {
            diags.error(span, "operator '" + sym + "' has no stage to realize it",
                    "add `" + op + " STAGE` to a realize block, naming a stage whose function is " + op);
        }
        return s;
    }

}
