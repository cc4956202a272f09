package org.thermion.sim;

import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.Port;
import org.thermion.model.ProgramCounter;
import org.thermion.model.Rom;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Cycle-level simulator of an elaborated machine over 64 independent lanes.
 *
 * <p>The netlist is compiled once into flat arrays and evaluated over {@code long} words, bit
 * {@code i} of every word belonging to lane {@code i}: two-valued settles run a
 * {@link GateProgram} (runs of gates of one shape, one tight loop each), three-valued settles
 * an opcode per gate in the gates' levelized order. Each clock phase settles the
 * logic, then loads that phase's latches (honouring their enables) and, on its phase, the
 * off-board program counter. The off-board ROM drives its data nets from ROM[PC] per lane.
 *
 * <p>In {@link InitMode.Unknown} mode a second word per net marks the lanes where the net is
 * unknown (X); the value word is then 0 on those lanes. Gates follow the exact three-valued
 * rules (0 AND X = 0, 1 OR X = 1, X XOR anything = X).
 *
 * <p>A latch output net always holds the latch's stored value (a load shows at once);
 * every gate-driven net holds its value from the last settle.
 */
public final class Simulator {
    /** Lanes per word. */
    public static final int LANES = 64;

    // Opcodes of the compiled gates; two-input forms avoid the operand list.
    private static final int OP_BUF = 0;
    private static final int OP_NOT = 1;
    private static final int OP_AND2 = 2;
    private static final int OP_OR2 = 3;
    private static final int OP_NAND2 = 4;
    private static final int OP_NOR2 = 5;
    private static final int OP_XOR2 = 6;
    private static final int OP_AND = 7;
    private static final int OP_OR = 8;
    private static final int OP_NAND = 9;
    private static final int OP_NOR = 10;
    private static final int OP_XOR = 11;
    private static final int OP_AND3 = 12;
    private static final int OP_OR3 = 13;
    private static final int OP_AND4 = 14;
    private static final int OP_OR4 = 15;

    private final Machine machine;
    private final int phases;

    // Net values: bit i = lane i. unk marks X lanes (Unknown mode only).
    private final long[] val;
    private final long[] unk;
    // Where each net's words lie in val and unk.
    private final int[] slot;

    // Compiled gates in the netlist's order, for the three-valued settle.
    private final int gateCount;
    private final int[] op;
    private final int[] in0;
    private final int[] in1;
    private final int[] listStart;
    private final int[] listEnd;
    private final int[] list;
    private final int[] out;

    // Latches grouped by the phase that loads them (index 0 = phase 1).
    private final int[][] phaseLatchData;
    private final int[][] phaseLatchEnable;
    private final int[][] phaseLatchOut;
    private final int[] latchOut;
    // Per phase: no latch's data or enable is a latch output, so loads need no staging.
    private final boolean[] phaseDirect;
    private final LatchLoad[] phaseLoad;
    private final long[] stageV;
    private final long[] stageX;

    private final int[] inputNets;

    // Program counter, per lane.
    private final boolean hasPc;
    private final int pcPhase;
    private final int jumpNet;
    private final int[] targetNets;
    // The PC as bit planes: bit i of pcPlanes[b] is bit b of lane i's PC, so a load is a few word
    // operations per PC bit whatever the lanes do.
    private final long[] pcPlanes;
    // Scratch for the per-lane ROM read: 64 rows of a bit matrix.
    private final long[] laneMatrix = new long[LANES];
    private final long[] laneScratch = new long[LANES];
    private long pcUnknown;
    private boolean pcUniform;
    // Lane 0's PC, kept beside pcUniform; while every lane holds it, it alone is current and the
    // planes may lag (planesStale), so a load with no parting lanes is a scalar add or copy.
    private int pcAddress;
    private boolean planesStale;
    private final int pcMask;

    // ROM.
    private final boolean hasRom;
    private final int[] dataNets;
    private long[] romWords;
    // Where the data nets are consecutive from dataBase and the table is small: every word as the
    // values its data nets take on every lane (0 or -1 a bit), word after word, so a read shared
    // by all lanes is one array copy. Otherwise null.
    private long[] romPlanes;
    private final int dataBase;
    private static final int PLANE_TABLE_MAX = 1 << 16;
    // True when the last ROM read may have left X on the data nets.
    private boolean romUnknownShown;
    private long[] forced;
    private boolean romDirty;

    // The two-valued gates regrouped into runs of one shape.
    private final GateProgram program;
    private final Settle compiled;
    private boolean threeValued;
    private long cycle;
    private int nextPhase;
    private long latchChanges;
    private long evaluations;

    /**
     * Two-valued combinational evaluation supplied from outside (the generated straight-line
     * engine of {@code org.thermion.sim.compiled}): gates in the netlist's order over the
     * value words, exactly as the array engine evaluates them.
     */
    public interface Settle {
        void settle(long[] values);
    }

    /** Compiles the machine's netlist; the simulator starts reset with all latches zero. */
    public Simulator(Machine machine) {
        this(machine, null);
    }

    /**
     * As {@link #Simulator(Machine)}, but two-valued settles run {@code twoValued} instead of
     * the array loop (null: the array loop). Three-valued settles always use the array engine.
     */
    public Simulator(Machine machine, Settle twoValued) {
        this(machine, twoValued, null);
    }

    /**
     * Two-valued latch loads of one phase supplied from outside: every latch of the phase (in the
     * netlist's order) takes its data where its enable is 1, at once; returns the lanes in which
     * some latch changed. Used only for phases whose latches read no latch output directly.
     */
    public interface LatchLoad {
        long load(long[] values);
    }

    /**
     * As {@link #Simulator(Machine, Settle)}, with {@code loads[p]} (may be null, as may the
     * array) loading phase p + 1's latches in two-valued runs.
     */
    public Simulator(Machine machine, Settle twoValued, LatchLoad[] loads) {
        this.machine = machine;
        this.compiled = twoValued;
        Netlist nl = machine.netlist();
        int nets = nl.netCount();
        this.val = new long[nets];
        this.unk = new long[nets];
        this.phases = Math.max(1, machine.clock().phases());

        program = new GateProgram(nl);
        // The array engine's values lie in the order its program touches them; generated code
        // is written against the netlist's numbering, so it keeps that.
        slot = twoValued == null ? program.renumber(nets, leadingNets(machine)) : identity(nets);
        final int[] sl = slot;

        List<Gate> gates = nl.gates();
        gateCount = gates.size();
        op = new int[gateCount];
        in0 = new int[gateCount];
        in1 = new int[gateCount];
        listStart = new int[gateCount];
        listEnd = new int[gateCount];
        out = new int[gateCount];
        int total = 0;
        for (Gate g : gates) {
            total += g.arity();
        }
        list = new int[total];
        int at = 0;
        for (int i = 0; i < gateCount; i++) {
            Gate g = gates.get(i);
            int[] ins = g.inputs();
            out[i] = sl[g.output()];
            listStart[i] = at;
            for (int n : ins) {
                list[at++] = sl[n];
            }
            listEnd[i] = at;
            in0[i] = ins.length > 0 ? sl[ins[0]] : Netlist.CONST0;
            in1[i] = ins.length > 1 ? sl[ins[1]] : Netlist.CONST0;
            op[i] = opcode(g, ins.length);
        }

        int maxPerPhase = 0;
        List<List<Latch>> byPhase = new ArrayList<>();
        for (int p = 0; p < phases; p++) {
            byPhase.add(new ArrayList<>());
        }
        for (Latch l : nl.latches()) {
            int p = l.phase() - 1;
            if (p < 0 || p >= phases) {
                throw new IllegalArgumentException("latch on net " + nl.netName(l.output()) + " loads on phase "
                        + l.phase() + " but the clock has " + phases + " phases");
            }
            byPhase.get(p).add(l);
        }
        phaseLatchData = new int[phases][];
        phaseLatchEnable = new int[phases][];
        phaseLatchOut = new int[phases][];
        for (int p = 0; p < phases; p++) {
            List<Latch> ls = byPhase.get(p);
            phaseLatchData[p] = ls.stream().mapToInt(l -> sl[l.data()]).toArray();
            phaseLatchEnable[p] = ls.stream().mapToInt(l -> l.enable() < 0 ? l.enable() : sl[l.enable()]).toArray();
            phaseLatchOut[p] = ls.stream().mapToInt(l -> sl[l.output()]).toArray();
            maxPerPhase = Math.max(maxPerPhase, ls.size());
        }
        latchOut = nl.latches().stream().mapToInt(l -> sl[l.output()]).toArray();
        phaseDirect = new boolean[phases];
        boolean[] isLatchOut = new boolean[nets];
        for (int q : latchOut) {
            isLatchOut[q] = true;
        }
        for (int p = 0; p < phases; p++) {
            boolean direct = true;
            for (int i = 0; i < phaseLatchData[p].length; i++) {
                int e = phaseLatchEnable[p][i];
                direct &= !isLatchOut[phaseLatchData[p][i]] && (e < 0 || !isLatchOut[e]);
            }
            phaseDirect[p] = direct;
        }
        phaseLoad = new LatchLoad[phases];
        for (int p = 0; p < phases && loads != null && p < loads.length; p++) {
            phaseLoad[p] = phaseDirect[p] ? loads[p] : null;
        }
        stageV = new long[maxPerPhase];
        stageX = new long[maxPerPhase];

        inputNets = machine.inputs().stream().mapToInt(in -> sl[in.net()]).toArray();

        ProgramCounter pc = machine.pc();
        hasPc = pc != null;
        if (hasPc) {
            if (pc.width() < 1 || pc.width() > 30) {
                throw new IllegalArgumentException("program counter width " + pc.width() + " is outside 1..30");
            }
            pcPhase = pc.phase();
            jumpNet = sl[pc.jumpNet()];
            targetNets = Arrays.stream(pc.targetNets()).limit(31).map(n -> sl[n]).toArray();
        } else {
            pcPhase = -1;
            jumpNet = -1;
            targetNets = new int[0];
        }
        pcPlanes = new long[hasPc ? pc.width() : 0];
        pcMask = (int) ((1L << pcPlanes.length) - 1);
        Rom rom = machine.rom();
        hasRom = rom != null;
        dataNets = hasRom ? Arrays.stream(rom.dataNets()).map(n -> sl[n]).toArray() : new int[0];
        romWords = new long[hasRom ? Math.max(0, rom.words()) : 0];
        dataBase = consecutive(dataNets) ? dataNets[0] : -1;
        romPlanes = planes(romWords);
        reset(new InitMode.Zero());
    }

    // Constants first (the program names them 0 and 1), then the ROM's data nets side by side
    // (a shared ROM read is one array copy), then the inputs.
    private static int[] leadingNets(Machine machine) {
        java.util.stream.IntStream.Builder b = java.util.stream.IntStream.builder();
        b.add(Netlist.CONST0).add(Netlist.CONST1);
        if (machine.rom() != null) {
            Arrays.stream(machine.rom().dataNets()).forEach(b::add);
        }
        machine.inputs().forEach(p -> b.add(p.net()));
        return b.build().toArray();
    }

    private static int[] identity(int n) {
        int[] a = new int[n];
        for (int i = 0; i < n; i++) {
            a[i] = i;
        }
        return a;
    }

    private static int opcode(Gate g, int n) {
        if (n == 0) {
            // Never produced by the elaborator; the list forms give the empty function's value.
            return switch (g.fn()) {
                case AND -> OP_AND;
                case OR -> OP_OR;
                case NAND -> OP_NAND;
                case NOR -> OP_NOR;
                case XOR -> OP_XOR;
                case BUF -> OP_BUF;
                case NOT -> OP_NOT;
            };
        }
        return switch (g.fn()) {
            case BUF -> OP_BUF;
            case NOT -> OP_NOT;
            case AND -> n == 1 ? OP_BUF : n == 2 ? OP_AND2 : n == 3 ? OP_AND3 : n == 4 ? OP_AND4 : OP_AND;
            case OR -> n == 1 ? OP_BUF : n == 2 ? OP_OR2 : n == 3 ? OP_OR3 : n == 4 ? OP_OR4 : OP_OR;
            case NAND -> n == 1 ? OP_NOT : n == 2 ? OP_NAND2 : OP_NAND;
            case NOR -> n == 1 ? OP_NOT : n == 2 ? OP_NOR2 : OP_NOR;
            case XOR -> n == 1 ? OP_BUF : n == 2 ? OP_XOR2 : OP_XOR;
        };
    }

    public Machine machine() {
        return machine;
    }

    /** Clock phases whose two-valued latch loads run supplied code rather than the array loop. */
    public int suppliedLoadPhases() {
        int n = 0;
        for (LatchLoad l : phaseLoad) {
            n += l != null ? 1 : 0;
        }
        return n;
    }

    /** True when two-valued settles run a supplied engine rather than the array loop. */
    public boolean compiledEngine() {
        return compiled != null;
    }

    /**
     * Starts over: latches per {@code init}, PC 0 on every lane, cycle 0, next phase 1.
     * Machine inputs keep the values last set; a loaded ROM, or a forced ROM word, stays.
     */
    public void reset(InitMode init) {
        threeValued = init instanceof InitMode.Unknown;
        long[] inputs = new long[inputNets.length];
        for (int i = 0; i < inputNets.length; i++) {
            inputs[i] = val[inputNets[i]];
        }
        Arrays.fill(val, 0L);
        Arrays.fill(unk, 0L);
        for (int i = 0; i < inputNets.length; i++) {
            val[inputNets[i]] = inputs[i];
        }
        if (init instanceof InitMode.Random r) {
            SplittableRandom rng = new SplittableRandom(r.seed());
            for (int n : latchOut) {
                val[n] = rng.nextLong();
            }
        } else if (threeValued) {
            for (int n : latchOut) {
                unk[n] = -1L;
            }
        }
        val[Netlist.CONST1] = -1L;
        val[Netlist.CONST0] = 0L;
        Arrays.fill(pcPlanes, 0L);
        pcUnknown = 0;
        pcUniform = true;
        pcAddress = 0;
        planesStale = false;
        cycle = 0;
        nextPhase = 1;
        romDirty = true;
    }

    /** Loads the same ROM image into every lane; words past the end read 0. */
    public void loadRom(long[] words) {
        long[] w = new long[Math.max(romWords.length, 0)];
        long mask = dataNets.length >= 64 ? -1L : (1L << dataNets.length) - 1;
        for (int i = 0; i < w.length && i < words.length; i++) {
            w[i] = words[i] & mask;
        }
        romWords = w;
        romPlanes = planes(w);
        romDirty = true;
    }

    private long[] planes(long[] words) {
        int width = dataNets.length;
        if (dataBase < 0 || (long) words.length * width > PLANE_TABLE_MAX) {
            return null;
        }
        long[] p = new long[words.length * width];
        for (int a = 0; a < words.length; a++) {
            for (int b = 0; b < width; b++) {
                p[a * width + b] = -((words[a] >>> b) & 1L);
            }
        }
        return p;
    }

    private static boolean consecutive(int[] nets) {
        for (int i = 1; i < nets.length; i++) {
            if (nets[i] != nets[0] + i) {
                return false;
            }
        }
        return nets.length > 0;
    }

    /** Sets machine input {@code inputIndex} (index into {@code machine.inputs()}); bit i = lane i. */
    public void setInput(int inputIndex, long lanes) {
        int n = inputNets[inputIndex];
        val[n] = lanes;
        unk[n] = 0;
    }

    /** Sets a machine input by name on every lane. */
    public void setInput(String name, boolean value) {
        setInput(inputIndex(name), value ? -1L : 0L);
    }

    /** Index of a machine input by name; IllegalArgumentException when there is none. */
    public int inputIndex(String name) {
        List<Port> in = machine.inputs();
        for (int i = 0; i < in.size(); i++) {
            if (in.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("machine " + machine.name() + " has no input '" + name + "'");
    }

    /** Evaluates the combinational logic in levelized order; loads nothing. */
    public void settle() {
        // Only the ROM drives its data nets, so they change only when the ROM word does.
        if (romDirty && hasRom) {
            computeRom();
        }
        if (threeValued) {
            settle3();
        } else if (compiled != null) {
            compiled.settle(val);
        } else {
            settle2();
        }
        evaluations += gateCount;
    }

    // Two-valued settle: one tight loop per run of gates of one shape (see GateProgram), each
    // loop a small method of its own so the JIT optimises it alone.
    private void settle2() {
        final long[] v = val;
        final int[] c = program.code;
        final int[] shape = program.runShape;
        final int[] start = program.runStart;
        for (int r = 0, runs = shape.length; r < runs; r++) {
            int p = start[r];
            int e = start[r + 1];
            switch (shape[r]) {
                case GateProgram.BUF -> runBuf(v, c, p, e);
                case GateProgram.NOT -> runNot(v, c, p, e);
                case GateProgram.AND2 -> runAnd2(v, c, p, e);
                case GateProgram.OR2 -> runOr2(v, c, p, e);
                case GateProgram.NAND2 -> runNand2(v, c, p, e);
                case GateProgram.NOR2 -> runNor2(v, c, p, e);
                case GateProgram.XOR2 -> runXor2(v, c, p, e);
                case GateProgram.AND3 -> runAnd3(v, c, p, e);
                case GateProgram.OR3 -> runOr3(v, c, p, e);
                case GateProgram.NAND3 -> runNand3(v, c, p, e);
                case GateProgram.NOR3 -> runNor3(v, c, p, e);
                case GateProgram.AND4 -> runAnd4(v, c, p, e);
                case GateProgram.OR4 -> runOr4(v, c, p, e);
                case GateProgram.NAND4 -> runNand4(v, c, p, e);
                case GateProgram.NOR4 -> runNor4(v, c, p, e);
                default -> listRun(v, c, shape[r], p, e);
            }
        }
    }

    private static void runBuf(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 2) {
            v[c[p]] = v[c[p + 1]];
        }
    }

    private static void runNot(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 2) {
            v[c[p]] = ~v[c[p + 1]];
        }
    }

    private static void runAnd2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = v[c[p + 1]] & v[c[p + 2]];
        }
    }

    private static void runOr2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = v[c[p + 1]] | v[c[p + 2]];
        }
    }

    private static void runNand2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = ~(v[c[p + 1]] & v[c[p + 2]]);
        }
    }

    private static void runNor2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = ~(v[c[p + 1]] | v[c[p + 2]]);
        }
    }

    private static void runXor2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = v[c[p + 1]] ^ v[c[p + 2]];
        }
    }

    private static void runAnd3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]];
        }
    }

    private static void runOr3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]];
        }
    }

    private static void runNand3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = ~(v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]]);
        }
    }

    private static void runNor3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = ~(v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]]);
        }
    }

    private static void runAnd4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]] & v[c[p + 4]];
        }
    }

    private static void runOr4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]] | v[c[p + 4]];
        }
    }

    private static void runNand4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = ~(v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]] & v[c[p + 4]]);
        }
    }

    private static void runNor4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = ~(v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]] | v[c[p + 4]]);
        }
    }

    // A run of list-shaped gates: output, operand count, operands.
    private static void listRun(long[] v, int[] c, int shape, int p, int e) {
        while (p < e) {
            int o = c[p];
            int k = p + 2;
            int end = k + c[p + 1];
            long r;
            if (shape == GateProgram.AND_N || shape == GateProgram.NAND_N) {
                r = -1L;
                for (; k < end; k++) {
                    r &= v[c[k]];
                }
            } else {
                r = 0L;
                if (shape == GateProgram.XOR_N) {
                    for (; k < end; k++) {
                        r ^= v[c[k]];
                    }
                } else {
                    for (; k < end; k++) {
                        r |= v[c[k]];
                    }
                }
            }
            v[o] = shape == GateProgram.NAND_N || shape == GateProgram.NOR_N ? ~r : r;
            p = end;
        }
    }

    // Three-valued settle. Invariant: val has 0 wherever unk has 1, so "known 1" is just val.
    private void settle3() {
        final long[] v = val;
        final long[] x = unk;
        for (int g = 0, n = gateCount; g < n; g++) {
            long rv;
            long rx;
            int code = op[g];
            switch (code) {
                case OP_BUF:
                    rv = v[in0[g]];
                    rx = x[in0[g]];
                    break;
                case OP_NOT:
                    rx = x[in0[g]];
                    rv = ~v[in0[g]] & ~rx;
                    break;
                case OP_AND2:
                case OP_NAND2: {
                    int p = in0[g];
                    int q = in1[g];
                    long one = v[p] & v[q];
                    long zero = (~v[p] & ~x[p]) | (~v[q] & ~x[q]);
                    rx = ~zero & ~one;
                    rv = code == OP_AND2 ? one : zero;
                    break;
                }
                case OP_OR2:
                case OP_NOR2: {
                    int p = in0[g];
                    int q = in1[g];
                    long one = v[p] | v[q];
                    long zero = ~v[p] & ~x[p] & ~v[q] & ~x[q];
                    rx = ~zero & ~one;
                    rv = code == OP_OR2 ? one : zero;
                    break;
                }
                case OP_XOR2: {
                    rx = x[in0[g]] | x[in1[g]];
                    rv = (v[in0[g]] ^ v[in1[g]]) & ~rx;
                    break;
                }
                case OP_AND3:
                case OP_AND4:
                case OP_AND:
                case OP_NAND: {
                    long one = -1L;
                    long zero = 0L;
                    for (int k = listStart[g], e = listEnd[g]; k < e; k++) {
                        int p = list[k];
                        one &= v[p];
                        zero |= ~v[p] & ~x[p];
                    }
                    rx = ~zero & ~one;
                    rv = code == OP_NAND ? zero : one;
                    break;
                }
                case OP_OR3:
                case OP_OR4:
                case OP_OR:
                case OP_NOR: {
                    long one = 0L;
                    long zero = -1L;
                    for (int k = listStart[g], e = listEnd[g]; k < e; k++) {
                        int p = list[k];
                        one |= v[p];
                        zero &= ~v[p] & ~x[p];
                    }
                    rx = ~zero & ~one;
                    rv = code == OP_NOR ? zero : one;
                    break;
                }
                case OP_XOR: {
                    long r = 0L;
                    long u = 0L;
                    for (int k = listStart[g], e = listEnd[g]; k < e; k++) {
                        r ^= v[list[k]];
                        u |= x[list[k]];
                    }
                    rx = u;
                    rv = r & ~u;
                    break;
                }
                default:
                    rv = 0;
                    rx = 0;
                    break;
            }
            v[out[g]] = rv;
            x[out[g]] = rx;
        }
    }

    /**
     * Runs the next phase: settle, then load that phase's latches (and the PC on its phase),
     * all sampling the settled values at once; then advance the phase (and the cycle count
     * after the last phase).
     */
    public void stepPhase() {
        settle();
        int p = nextPhase - 1;
        int[] data = phaseLatchData[p];
        int[] en = phaseLatchEnable[p];
        int[] q = phaseLatchOut[p];
        int n = data.length;
        final long[] v = val;
        final long[] x = unk;
        if (threeValued) {
            for (int i = 0; i < n; i++) {
                long dv = v[data[i]];
                long dx = x[data[i]];
                long qv = v[q[i]];
                long qx = x[q[i]];
                long ev = en[i] < 0 ? -1L : v[en[i]];
                long ex = en[i] < 0 ? 0L : x[en[i]];
                long e0 = ~ev & ~ex;
                // An unknown enable keeps the value only where data and the stored bit agree and are known.
                long same = ~(dv ^ qv) & ~dx & ~qx;
                stageV[i] = (ev & dv) | (e0 & qv) | (ex & same & qv);
                stageX[i] = (ev & dx) | (e0 & qx) | (ex & ~same);
            }
        } else if (phaseDirect[p]) {
            if (hasPc && pcPhase == nextPhase) {
                loadPc();
            }
            LatchLoad l = phaseLoad[p];
            latchChanges |= l != null ? l.load(v) : loadDirect(v, data, en, q);
            advance();
            return;
        } else {
            for (int i = 0; i < n; i++) {
                long e = en[i] < 0 ? -1L : v[en[i]];
                stageV[i] = (v[data[i]] & e) | (v[q[i]] & ~e);
            }
        }
        if (hasPc && pcPhase == nextPhase) {
            loadPc();
        }
        long changed = 0L;
        for (int i = 0; i < n; i++) {
            changed |= v[q[i]] ^ stageV[i];
            v[q[i]] = stageV[i];
        }
        if (threeValued) {
            for (int i = 0; i < n; i++) {
                changed |= x[q[i]] ^ stageX[i];
                x[q[i]] = stageX[i];
            }
        }
        latchChanges |= changed;
        advance();
    }

    private void advance() {
        // A compare, not a remainder: this runs every phase.
        if (nextPhase == phases) {
            nextPhase = 1;
            cycle++;
        } else {
            nextPhase++;
        }
    }

    // Two-valued loads where no latch of the phase reads another's output: each latch commits at once.
    private static long loadDirect(long[] v, int[] data, int[] en, int[] q) {
        long changed = 0L;
        for (int i = 0, n = data.length; i < n; i++) {
            int o = q[i];
            long old = v[o];
            int ei = en[i];
            long nv = ei < 0 ? v[data[i]] : (v[data[i]] & v[ei]) | (old & ~v[ei]);
            changed |= old ^ nv;
            v[o] = nv;
        }
        return changed;
    }

    /** Lanes in which some latch changed its stored value since the last {@link #clearLatchChanges()}. */
    public long latchChanges() {
        return latchChanges;
    }

    /** Starts a new watch for latch changes (a fixed point is a cycle without any). */
    public void clearLatchChanges() {
        latchChanges = 0L;
    }

    /** Runs phases until the current cycle is complete. */
    public void stepCycle() {
        do {
            stepPhase();
        } while (nextPhase != 1);
    }

    private void loadPc() {
        if (threeValued) {
            loadPc3();
        } else {
            loadPc2();
        }
    }

    // Three-valued PC load: an unknown jump or target leaves lanes' PCs unknown.
    private void loadPc3() {
        freshPlanes();
        long j = val[jumpNet];
        long jx = unk[jumpNet];
        long carry = -1L;
        long diff = 0L;
        long tx = 0L;
        int tn = targetNets.length;
        for (int b = 0; b < pcPlanes.length; b++) {
            long p = pcPlanes[b];
            // PC + 1 by ripple carry, all lanes at once; the carry out of the top bit wraps away.
            long inc = p ^ carry;
            carry &= p;
            long t = 0L;
            if (b < tn) {
                t = val[targetNets[b]];
                tx |= unk[targetNets[b]];
            }
            diff |= t ^ inc;
            // j is 0 on lanes where the jump is unknown, so those take PC + 1 here.
            pcPlanes[b] = (j & t) | (~j & inc);
        }
        long nu = (pcUnknown & ~j) | (j & tx);
        // An unknown jump leaves the PC known only where target and PC + 1 agree.
        nu |= jx & (tx | diff);
        pcUnknown = nu;
        updateUniform();
        romDirty = true;
    }

    // Two-valued PC load: no X anywhere, so pcUnknown stays 0. Where every lane holds one PC and
    // jumps alike, a scalar step; otherwise the planes, finding on the way whether every lane
    // holds the same PC, and lane 0's PC (what updateUniform would find).
    private void loadPc2() {
        final long[] v = val;
        final int[] tg = targetNets;
        long j = v[jumpNet];
        romDirty = true;
        if (pcUniform && (j == 0L || j == -1L)) {
            if (j == 0L) {
                pcAddress = (pcAddress + 1) & pcMask;
                planesStale = true;
                return;
            }
            int target = 0;
            long spread = 0L;
            for (int b = 0, tn = Math.min(tg.length, pcPlanes.length); b < tn; b++) {
                long t = v[tg[b]];
                spread |= t ^ (t >> 63);
                target |= ((int) t & 1) << b;
            }
            if (spread == 0L) {
                pcAddress = target;
                planesStale = true;
                return;
            }
        }
        freshPlanes();
        final long[] planes = pcPlanes;
        long nj = ~j;
        long carry = -1L;
        long spread = 0L;
        int address = 0;
        int w = planes.length;
        int tn = Math.min(tg.length, w);
        int b = 0;
        for (; b < tn; b++) {
            long p = planes[b];
            long np = (j & v[tg[b]]) | (nj & (p ^ carry));
            carry &= p;
            planes[b] = np;
            spread |= np ^ (np >> 63);
            address |= ((int) np & 1) << b;
        }
        for (; b < w; b++) {
            long p = planes[b];
            long np = nj & (p ^ carry);
            carry &= p;
            planes[b] = np;
            spread |= np ^ (np >> 63);
            address |= ((int) np & 1) << b;
        }
        pcUniform = spread == 0L && pcUnknown == 0L;
        pcAddress = address;
    }

    // Brings the planes up to the scalar PC that every lane holds.
    private void freshPlanes() {
        if (planesStale) {
            for (int b = 0; b < pcPlanes.length; b++) {
                pcPlanes[b] = -(long) ((pcAddress >>> b) & 1);
            }
            planesStale = false;
        }
    }

    private void updateUniform() {
        boolean u = pcUnknown == 0;
        for (int b = 0; b < pcPlanes.length && u; b++) {
            u = pcPlanes[b] == 0L || pcPlanes[b] == -1L;
        }
        pcUniform = u;
        pcAddress = pc(0);
    }

    private long romWord(int address) {
        return address >= 0 && address < romWords.length ? romWords[address] : 0L;
    }

    // Kept small, so the JIT inlines it into settle(); the rarer reads are methods of their own.
    private void computeRom() {
        int w = dataNets.length;
        if (forced != null) {
            romForced(w);
        } else if (!pcUniform) {
            romPerLane(w);
        } else if (romPlanes != null && !romUnknownShown && pcAddress < romWords.length) {
            // Every lane reads one word, and no X is left on the data nets from an unknown PC.
            System.arraycopy(romPlanes, pcAddress * w, val, dataBase, w);
        } else {
            romShared(w);
        }
        romDirty = false;
    }

    private void romForced(int w) {
        for (int b = 0; b < w; b++) {
            val[dataNets[b]] = b < forced.length ? forced[b] : 0L;
            unk[dataNets[b]] = 0L;
        }
    }

    // Every lane reads one word; the X words are already 0 unless the last read had an unknown PC.
    private void romShared(int w) {
        long word = romWord(pcAddress);
        final long[] v = val;
        final int[] d = dataNets;
        for (int b = 0; b < w; b++) {
            v[d[b]] = -((word >>> b) & 1L);
        }
        if (romUnknownShown) {
            for (int b = 0; b < w; b++) {
                unk[d[b]] = 0L;
            }
            romUnknownShown = false;
        }
    }

    // A ROM read per lane, from PC planes to data planes through partial bit transposes.
    private void romPerLane(int w) {
        long[] m = laneMatrix;
        BitMatrix.lookup(pcPlanes, pcPlanes.length, romWords, Math.min(w, LANES), laneScratch, m);
        long known = ~pcUnknown;
        for (int b = 0; b < w; b++) {
            unk[dataNets[b]] = pcUnknown;
            val[dataNets[b]] = b < LANES ? m[b] & known : 0L;
        }
        romUnknownShown |= pcUnknown != 0L;
    }

    /** Completed cycles since reset. */
    public long cycle() {
        return cycle;
    }

    /** The 1-based phase the next {@link #stepPhase()} runs. */
    public int nextPhase() {
        return nextPhase;
    }

    /** Clock phases per cycle. */
    public int phases() {
        return phases;
    }

    /** The net's value (bit i = lane i); 0 on lanes where it is unknown. */
    public long value(int net) {
        return val[slot[net]];
    }

    /** Lanes where the net is unknown (Unknown mode), else 0. */
    public long unknown(int net) {
        return unk[slot[net]];
    }

    /** True while simulating with three-valued logic. */
    public boolean threeValued() {
        return threeValued;
    }

    /** The program counter of one lane. */
    public int pc(int lane) {
        if (planesStale) {
            return pcAddress;
        }
        int a = 0;
        for (int b = 0; b < pcPlanes.length; b++) {
            a |= (int) ((pcPlanes[b] >>> lane) & 1L) << b;
        }
        return a;
    }

    /** Lanes whose program counter is unknown (after a jump decided by an X), else 0. */
    public long pcUnknown() {
        return pcUnknown;
    }

    /** Sets the program counter of one lane (taken mod 2^width); the lane's PC becomes known. */
    public void setPc(int lane, int pc) {
        freshPlanes();
        long bit = 1L << lane;
        for (int b = 0; b < pcPlanes.length; b++) {
            if ((pc >>> b & 1) != 0) {
                pcPlanes[b] |= bit;
            } else {
                pcPlanes[b] &= ~bit;
            }
        }
        pcUnknown &= ~(1L << lane);
        updateUniform();
        romDirty = true;
    }

    /** Forces the stored value of latch {@code latchIndex} (index into the netlist's latches). */
    public void setLatch(int latchIndex, long lanes) {
        int n = latchOut[latchIndex];
        val[n] = lanes;
        unk[n] = 0L;
    }

    /**
     * Drives the ROM data nets with a given word per lane instead of ROM[PC]: word bit b on lane i
     * is {@code bitLanes[b] >>> i & 1}. {@code null} returns to ROM[PC].
     */
    public void forceRomWord(long[] bitLanes) {
        forced = bitLanes == null ? null : bitLanes.clone();
        romDirty = true;
    }

    /** Gate evaluations so far (each evaluates all 64 lanes at once). */
    public long gateEvaluations() {
        return evaluations;
    }
}
