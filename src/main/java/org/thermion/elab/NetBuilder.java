package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.model.GateFn;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Grows the flat netlist: nets with names and drivers, gates and latches with the span
 * that made them. Shares identical gates within a module and keeps one driver per net.
 */
final class NetBuilder {
    static final int NONE = -1;
    static final int EXTERNAL = -2;
    static final int CONSTANT = -3;
    static final int LIMIT = 1_000_000;

    /** A gate under construction. */
    static final class GateB {
        final GateFn fn;
        final int[] in;
        final int out;
        final int stage;
        final int module;
        final Span span;

        GateB(GateFn fn, int[] in, int out, int stage, int module, Span span) {
            this.fn = fn;
            this.in = in;
            this.out = out;
            this.stage = stage;
            this.module = module;
            this.span = span;
        }
    }

    /** A latch under construction. */
    record LatchB(int data, int enable, int out, int phase, int stage, int module, Span span) {
    }

    final List<String> names = new ArrayList<>();
    final IntList netModule = new IntList();
    final List<Span> netSpan = new ArrayList<>();
    final IntList driver = new IntList();
    final IntList reads = new IntList();
    final List<Span> driverSpan = new ArrayList<>();
    final List<GateB> gates = new ArrayList<>();
    final List<LatchB> latches = new ArrayList<>();
    final Map<Integer, Integer> complement = new HashMap<>();
    final Map<Integer, Integer> complementSource = new HashMap<>();
    private final Map<GateKey, Integer> shared = new HashMap<>();
    private final Diagnostics diags;
    private int temps;

    NetBuilder(Diagnostics diags) {
        this.diags = diags;
        int c0 = net("0", -1, Span.none());
        int c1 = net("1", -1, Span.none());
        driver.set(c0, CONSTANT);
        driver.set(c1, CONSTANT);
    }

    int net(String name, int module, Span span) {
        if (names.size() >= 4 * LIMIT) {
            throw new TooLarge();
        }
        names.add(name);
        netModule.add(module);
        netSpan.add(span);
        driver.add(NONE);
        reads.add(0);
        driverSpan.add(null);
        return names.size() - 1;
    }

    int temp(String modulePath, int module) {
        return net((modulePath.isEmpty() ? "" : modulePath + ".") + "$" + (temps++), module, Span.none());
    }

    boolean isTemp(int net) {
        String n = names.get(net);
        int dot = n.lastIndexOf('.');
        return n.startsWith("$", dot + 1);
    }

    void drive(int net, int by, Span span) {
        int d = driver.get(net);
        if (d != NONE) {
            Span first = driverSpan.get(net);
            diags.error(span, "net '" + names.get(net) + "' has two drivers",
                    d == EXTERNAL ? "it is a machine input or a port driven from outside"
                            : "first driven at " + (first == null ? "another statement" : first) + "; a net takes one driver");
            return;
        }
        driver.set(net, by);
        driverSpan.set(net, span);
    }

    void read(int net) {
        reads.set(net, reads.get(net) + 1);
    }

    /** A gate; identical gates of one module are shared. {@code dest} < 0 asks for a new net. */
    int gate(GateFn fn, int stage, int[] in, int dest, int module, String modulePath, Span span) {
        return gate(fn, stage, in, dest, module, modulePath, span, true);
    }

    /**
     * An inverter whose fate waits for every driver: kept out of sharing until then, so a stage
     * named outright is never folded into it (nor it into the stage) before it is decided.
     */
    int undecidedInverter(int stage, int in, int module, String modulePath, Span span) {
        return gate(GateFn.NOT, stage, new int[]{in}, -1, module, modulePath, span, false);
    }

    /** The output of a shared gate identical to gate {@code g}, or -1; registers {@code g} when none. */
    int shareDecided(int g) {
        GateB gate = gates.get(g);
        Integer existing = shared.putIfAbsent(keyOf(gate.fn, gate.stage, gate.module, gate.in), gate.out);
        return existing == null ? -1 : existing;
    }

    /**
     * Makes gate {@code g} a free connection from {@code from}, an identical gate's output. The
     * nets it read keep their read marks: the description still reads them.
     */
    void merge(int g, int from) {
        GateB old = gates.get(g);
        read(from);
        gates.set(g, new GateB(GateFn.BUF, new int[]{from}, old.out, -1, old.module, old.span));
    }

    static GateKey keyOf(GateFn fn, int stage, int module, int[] in) {
        int[] key = in.clone();
        if (fn != GateFn.NOT && fn != GateFn.BUF) {
            Arrays.sort(key);
        }
        return new GateKey(fn.ordinal(), stage, module, key);
    }

    private int gate(GateFn fn, int stage, int[] in, int dest, int module, String modulePath, Span span, boolean share) {
        share &= !(stage == -1 && fn == GateFn.BUF);
        GateKey k = keyOf(fn, stage, module, in);
        Integer existing = share ? shared.get(k) : null;
        if (existing != null) {
            if (dest < 0) {
                return existing;
            }
            return wire(existing, dest, module, span);
        }
        if (gates.size() + latches.size() >= LIMIT) {
            throw new TooLarge();
        }
        if ((gates.size() & 4095) == 4095 && Thread.currentThread().isInterrupted()) {
            throw new ElaborationInterrupted();
        }
        int out = dest >= 0 ? dest : temp(modulePath, module);
        for (int i : in) {
            read(i);
        }
        gates.add(new GateB(fn, in, out, stage, module, span));
        drive(out, gates.size() - 1, span);
        if (share) {
            shared.put(k, out);
        }
        return out;
    }

    /** A plain connection from one net to another: no stage, no delay. */
    int wire(int from, int dest, int module, Span span) {
        return gate(GateFn.BUF, -1, new int[]{from}, dest, module, "", span);
    }

    int latch(int data, int enable, int out, int phase, int stage, int module, Span span) {
        if (gates.size() + latches.size() >= LIMIT) {
            throw new TooLarge();
        }
        read(data);
        if (enable >= 0) {
            read(enable);
        }
        latches.add(new LatchB(data, enable, out, phase, stage, module, span));
        drive(out, -10 - (latches.size() - 1), span);
        return out;
    }

    boolean isLatchOutput(int net) {
        return driver.get(net) <= -10;
    }

    /** The complementary output of a flip-flop: the other plate, free of charge. */
    int complementOf(int latchOut) {
        Integer c = complement.get(latchOut);
        if (c != null) {
            return c;
        }
        int n = net(names.get(latchOut) + "_n", netModule.get(latchOut), Span.none());
        read(latchOut);
        gates.add(new GateB(GateFn.NOT, new int[]{latchOut}, n, -1, netModule.get(latchOut), Span.none()));
        drive(n, gates.size() - 1, Span.none());
        complement.put(latchOut, n);
        complementSource.put(n, latchOut);
        return n;
    }

    /** Makes gate {@code g} a free connection from {@code from}: an inverter that proved needless. */
    void rewire(int g, int from) {
        GateB old = gates.get(g);
        reads.set(old.in[0], reads.get(old.in[0]) - 1);
        read(from);
        gates.set(g, new GateB(GateFn.BUF, new int[]{from}, old.out, -1, old.module, old.span));
    }

    /**
     * What makes two gates the same: function, stage, module and (sorted) inputs. A record
     * with a mixed hash; the text key it replaces hashed so unevenly on large machines that
     * its buckets turned into trees.
     */
    static final class GateKey {
        private final int fn;
        private final int stage;
        private final int module;
        private final int[] in;
        private final int hash;

        GateKey(int fn, int stage, int module, int[] in) {
            this.fn = fn;
            this.stage = stage;
            this.module = module;
            this.in = in;
            long h = fn * 0x9E3779B97F4A7C15L + stage;
            h = h * 0xC2B2AE3D27D4EB4FL + module;
            for (int i : in) {
                h = h * 0x9E3779B97F4A7C15L + i;
            }
            h ^= h >>> 31;
            h *= 0xBF58476D1CE4E5B9L;
            this.hash = (int) (h ^ (h >>> 32));
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof GateKey g && g.hash == hash && g.fn == fn && g.stage == stage && g.module == module
                    && Arrays.equals(g.in, in);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }

    /** Growable int array. */
    static final class IntList {
        private int[] a = new int[64];
        private int n;

        void add(int v) {
            if (n == a.length) {
                a = Arrays.copyOf(a, n * 2);
            }
            a[n++] = v;
        }

        int get(int i) {
            return a[i];
        }

        void set(int i, int v) {
            a[i] = v;
        }

        int[] toArray() {
            return Arrays.copyOf(a, n);
        }

        int size() {
            return n;
        }
    }
}
