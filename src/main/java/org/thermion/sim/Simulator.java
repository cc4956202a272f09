package org.thermion.sim;

import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.Port;
import org.thermion.model.ProgramCounter;
import org.thermion.model.Rom;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Cycle-level simulator of an elaborated machine over 64 independent lanes.
 *
 * <p>The netlist is compiled once into flat arrays and evaluated over {@code long} words, bit
 * {@code i} of every word belonging to lane {@code i}. Each clock phase settles the logic, then
 * loads that phase's latches ({@link PhaseLatches}, honouring their enables) and, on its phase,
 * the off-board program counter ({@link LanePc}); the off-board ROM ({@link RomReader}) drives its
 * data nets from ROM[PC] per lane. The settle is one of three engines: the array engine's runs
 * of one shape ({@link ArraySettle}), generated straight-line code supplied from outside
 * ({@link Settle}), or, in {@link InitMode.Unknown} mode, {@link ThreeValuedSettle}, where a
 * second word per net marks the lanes where the net is unknown (X; the value word is then 0
 * there). This class holds the net values and sequences the phases; runs are driven by
 * {@code org.thermion.sim.run.RunDriver}.
 *
 * <p>A latch output net always holds the latch's stored value (a load shows at once);
 * every gate-driven net holds its value from the last settle.
 */
public final class Simulator {
    /** Lanes per word. */
    public static final int LANES = 64;

    private final Machine machine;
    private final int phases;

    // Net values: bit i = lane i. unk marks X lanes (Unknown mode only).
    private final long[] val;
    private final long[] unk;
    // Where each net's words lie in val and unk.
    private final int[] slot;

    // The three-valued settle, its gates compiled in the netlist's order.
    private final ThreeValuedSettle settle3;
    private final int gateCount;

    // Latches by the phase that loads them, and their outputs in the netlist's order.
    private final PhaseLatches latches;
    private final int[] latchOut;

    private final int[] inputNets;

    // Program counter of every lane (null without one) and the phase it loads on.
    private final LanePc pc;
    private final int pcPhase;
    private final RomReader rom;
    // True when the PC or the ROM changed since the data nets were last driven.
    private boolean romDirty;

    // Two-valued settles: the array engine's runs of one shape, or code supplied from outside.
    private final ArraySettle array;
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

        GateProgram program = new GateProgram(nl);
        // The array engine's values lie in the order its program touches them; generated code
        // is written against the netlist's numbering, so it keeps that.
        slot = twoValued == null ? program.renumber(nets, leadingNets(machine)) : identity(nets);
        final int[] sl = slot;
        array = twoValued == null ? new ArraySettle(program) : null;
        settle3 = new ThreeValuedSettle(nl, sl);
        gateCount = nl.gates().size();

        latches = new PhaseLatches(nl, phases, sl, loads);
        latchOut = latches.outputs();

        inputNets = machine.inputs().stream().mapToInt(in -> sl[in.net()]).toArray();

        ProgramCounter counter = machine.pc();
        pc = counter == null ? null : new LanePc(counter, sl);
        pcPhase = counter == null ? -1 : counter.phase();
        Rom r = machine.rom();
        rom = r == null ? null : new RomReader(Arrays.stream(r.dataNets()).map(n -> sl[n]).toArray(), r.words());
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

    public Machine machine() {
        return machine;
    }

    /** Clock phases whose two-valued latch loads run supplied code rather than the array loop. */
    public int suppliedLoadPhases() {
        return latches.suppliedPhases();
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
        if (pc != null) {
            pc.reset();
        }
        cycle = 0;
        nextPhase = 1;
        romDirty = true;
    }

    /** Loads the same ROM image into every lane; words past the end read 0. */
    public void loadRom(long[] words) {
        if (rom != null) {
            rom.load(words);
        }
        romDirty = true;
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
        if (romDirty) {
            if (rom != null) {
                rom.read(val, unk, pc);
            }
            romDirty = false;
        }
        if (threeValued) {
            settle3.settle(val, unk);
        } else if (compiled != null) {
            compiled.settle(val);
        } else {
            array.settle(val);
        }
        evaluations += gateCount;
    }

    /**
     * Runs the next phase: settle, then load that phase's latches (and the PC on its phase),
     * all sampling the settled values at once; then advance the phase (and the cycle count
     * after the last phase).
     */
    public void stepPhase() {
        settle();
        int p = nextPhase - 1;
        final long[] v = val;
        if (threeValued) {
            latches.stage3(p, v, unk);
        } else if (latches.direct(p)) {
            if (pcPhase == nextPhase) {
                loadPc();
            }
            latchChanges |= latches.loadDirect(p, v);
            advance();
            return;
        } else {
            latches.stage2(p, v);
        }
        if (pcPhase == nextPhase) {
            loadPc();
        }
        latchChanges |= latches.commit(p, v, unk, threeValued);
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
            pc.load3(val, unk);
        } else {
            pc.load2(val);
        }
        romDirty = true;
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

    /** The program counter of one lane (0 without a PC). */
    public int pc(int lane) {
        return pc == null ? 0 : pc.pc(lane);
    }

    /** Lanes whose program counter is unknown (after a jump decided by an X), else 0. */
    public long pcUnknown() {
        return pc == null ? 0L : pc.unknown();
    }

    /** Sets the program counter of one lane (taken mod 2^width); the lane's PC becomes known. */
    public void setPc(int lane, int address) {
        if (pc != null) {
            pc.set(lane, address);
        }
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
        if (rom != null) {
            rom.force(bitLanes);
        }
        romDirty = true;
    }

    /** Gate evaluations so far (each evaluates all 64 lanes at once). */
    public long gateEvaluations() {
        return evaluations;
    }
}
