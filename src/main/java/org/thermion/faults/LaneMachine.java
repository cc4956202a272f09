package org.thermion.faults;

import java.util.Arrays;

/**
 * Sixty-four copies of the machine in the bits of {@code long} words, three-valued: per slot
 * {@code v} (the value) and {@code x} (unknown; then {@code v} is 0). Each lane may carry its
 * own faults as force masks per slot ({@code f0}: forced to 0, {@code f1}: forced to 1),
 * applied wherever a slot is written, so one flat program serves every batch of faults.
 * Latches power up unknown, the program counter at 0; each lane has its own counter.
 *
 * <p>A lane may instead carry a solder bridge: both nets then show one joined value, which
 * depends on what their drivers give. A settle then runs the program until the joined values stop
 * changing, starting them unknown: every operation is monotone in three-valued logic, so the
 * values only ever become known and the result is the least fixed point, whatever the order (a
 * bridge that closes a loop and finds no stable level stays unknown). A latch output's joined value
 * is what it holds afterwards: a flip-flop pulled over by a bridge stays over.
 */
final class LaneMachine {
    static final int LANES = 64;

    final FaultCircuit c;
    final long[] v;
    final long[] x;
    final long[] f0;
    final long[] f1;
    // The programs a plan may fit (the first runs at power-up), and the one in the ROM now.
    private final long[][] programs;
    private long[] rom;
    private final int[] pc = new int[LANES];
    private long pcX;
    private int nextPhase = 1;
    private final long[] loadV;
    private final long[] loadX;
    private final int pcMask;
    // Slots given a force since the last clearFaults, so clearing touches only those.
    private int[] forced = new int[16];
    private int forcedCount;
    // Solder bridges (allocated with the first): per bridge its lanes; per slot the lanes it is
    // joined on, the joined value and the value its driver gives on its own.
    private Bridge[] bridges = new Bridge[0];
    private long[] bridgeLanes = new long[0];
    private int[] bridgedSlots = new int[0];
    private long[] bm;
    private long[] jv;
    private long[] jx;
    private long[] rawV;
    private long[] rawX;
    private long[] swV;
    private long[] swX;

    LaneMachine(FaultCircuit c, long[] rom) {
        this(c, new long[][] {rom});
    }

    /** A machine at power-up running {@code programs[0]}; a restarting step fits another ({@code null}: no ROM). */
    LaneMachine(FaultCircuit c, long[][] programs) {
        this.c = c;
        this.programs = programs.clone();
        for (int k = 0; k < this.programs.length; k++) {
            this.programs[k] = programs[k] == null ? new long[0] : programs[k];
        }
        this.rom = this.programs[0];
        v = new long[c.slotCount];
        x = new long[c.slotCount];
        f0 = new long[c.slotCount];
        f1 = new long[c.slotCount];
        int most = 0;
        for (int[] q : c.latchOut) {
            most = Math.max(most, q.length);
        }
        loadV = new long[most];
        loadX = new long[most];
        pcMask = c.pcWidth >= 31 ? -1 : (1 << c.pcWidth) - 1;
        powerUp();
    }

    /** Latches unknown, program counter 0 on every lane, next phase 1; inputs 0. */
    void powerUp() {
        Arrays.fill(v, 0L);
        Arrays.fill(x, 0L);
        for (int q : c.allLatchOut) {
            x[q] = -1L;
        }
        v[1] = -1L;
        if (swV != null) {
            Arrays.fill(swV, 0L);
            Arrays.fill(swX, 0L);
        }
        Arrays.fill(pc, 0);
        pcX = 0L;
        nextPhase = 1;
        forceSources();
    }

    /** Puts fault {@code f} on the lanes in {@code lanes}. */
    void inject(Fault f, long lanes) {
        for (Force x : f.forces()) {
            force(x.slot(), x.value(), lanes);
        }
        if (f.bridge() != null) {
            bridge(f.bridge(), lanes);
        }
    }

    /** Joins the bridge's two nets on the lanes in {@code lanes}. */
    void bridge(Bridge b, long lanes) {
        if (bm == null) {
            bm = new long[c.slotCount];
            jv = new long[c.slotCount];
            jx = new long[c.slotCount];
            rawV = new long[c.slotCount];
            rawX = new long[c.slotCount];
            swV = new long[c.slotCount];
            swX = new long[c.slotCount];
            for (int s : c.inputSlots) {
                swV[s] = v[s];
                swX[s] = x[s];
            }
        }
        int n = bridges.length;
        bridges = Arrays.copyOf(bridges, n + 1);
        bridgeLanes = Arrays.copyOf(bridgeLanes, n + 1);
        bridges[n] = b;
        bridgeLanes[n] = lanes;
        for (int s : new int[] {b.slotA(), b.slotB()}) {
            if (bm[s] == 0L) {
                bridgedSlots = Arrays.copyOf(bridgedSlots, bridgedSlots.length + 1);
                bridgedSlots[bridgedSlots.length - 1] = s;
            }
            bm[s] |= lanes;
        }
    }

    void force(int slot, boolean value, long lanes) {
        if ((f0[slot] | f1[slot]) == 0L) {
            if (forcedCount == forced.length) {
                forced = Arrays.copyOf(forced, 2 * forced.length);
            }
            forced[forcedCount++] = slot;
        }
        if (value) {
            f1[slot] |= lanes;
        } else {
            f0[slot] |= lanes;
        }
    }

    /**
     * Takes every fault off every lane, so a worker can load its next batch into the same
     * machine instead of allocating one per batch (call {@link #powerUp} after injecting).
     */
    void clearFaults() {
        for (int k = 0; k < forcedCount; k++) {
            f0[forced[k]] = 0L;
            f1[forced[k]] = 0L;
        }
        forcedCount = 0;
        if (bm != null) {
            bridges = new Bridge[0];
            bridgeLanes = new long[0];
            bridgedSlots = new int[0];
            bm = null;
            jv = null;
            jx = null;
            rawV = null;
            rawX = null;
            swV = null;
            swX = null;
        }
    }

    /** Sets machine input {@code i}: bit k of {@code lanes} is its value on lane k. */
    void setInput(int i, long lanes) {
        int s = c.inputSlots[i];
        v[s] = lanes;
        x[s] = 0L;
        if (swV != null) {
            swV[s] = lanes;
            swX[s] = 0L;
        }
    }

    /** Sets every input alike on every lane. */
    void setInputs(boolean[] values) {
        for (int i = 0; i < values.length; i++) {
            setInput(i, values[i] ? -1L : 0L);
        }
    }

    /** Does step {@code s}: a restart (program fitted, power-up), the switches, the cycles. */
    void step(Step s) {
        if (s.restarts()) {
            fit(s.program());
            powerUp();
        }
        setInputs(s.inputs());
        clock(s.cycles());
    }

    /** Runs {@code cycles} whole clock cycles, then settles so the lamps show the new state. */
    void clock(int cycles) {
        for (int k = 0; k < cycles; k++) {
            do {
                phase();
            } while (nextPhase != 1);
        }
        settle();
    }

    /** Settles, then loads the latches (and the program counter) of the next phase together. */
    void phase() {
        settle();
        load();
    }

    /** Loads the latches (and the program counter) of the next phase from the settled values. */
    void load() {
        int p = nextPhase - 1;
        int[] data = c.latchData[p];
        int[] en = c.latchEnable[p];
        int[] out = c.latchOut[p];
        for (int k = 0; k < data.length; k++) {
            long dv = v[data[k]];
            long dx = x[data[k]];
            long qv = v[out[k]];
            long qx = x[out[k]];
            long ev = en[k] < 0 ? -1L : v[en[k]];
            long ex = en[k] < 0 ? 0L : x[en[k]];
            long e0 = ~ev & ~ex;
            // An unknown enable keeps the stored bit only where it and the data agree and are known.
            long same = ~(dv ^ qv) & ~dx & ~qx;
            loadV[k] = (ev & dv) | (e0 & qv) | (ex & same & qv);
            loadX[k] = (ev & dx) | (e0 & qx) | (ex & ~same);
        }
        if (c.hasPc && c.pcPhase == nextPhase) {
            loadPc();
        }
        for (int k = 0; k < data.length; k++) {
            int q = out[k];
            long m = f0[q] | f1[q];
            v[q] = (loadV[k] & ~m) | f1[q];
            x[q] = loadX[k] & ~m;
        }
        nextPhase = nextPhase == c.phases ? 1 : nextPhase + 1;
    }

    /** Evaluates the flat program: ROM read, forces on the sources, then every operation in order. */
    void settle() {
        if (c.romSlots.length > 0) {
            readRom();
        }
        forceSources();
        if (bm == null) {
            run();
            return;
        }
        for (int s : bridgedSlots) {
            // what it gives on its own: a switch its setting (a joined value may sit in v), a ROM
            // line or a latch what it holds; other lanes' forces applied
            if (c.sites().get(s).place() == Site.Place.INPUT) {
                long m = f0[s] | f1[s];
                rawV[s] = (swV[s] & ~m) | f1[s];
                rawX[s] = swX[s] & ~m;
            } else {
                rawV[s] = v[s];
                rawX[s] = x[s];
            }
            jv[s] = 0L;
            jx[s] = bm[s];
        }
        for (int pass = 0; pass <= LANES + 1; pass++) {
            for (int s : bridgedSlots) {
                if (c.sites().get(s).place().stem() && c.sites().get(s).place() != Site.Place.GATE_OUT) {
                    long b = bm[s];
                    v[s] = (rawV[s] & ~b) | (jv[s] & b);
                    x[s] = (rawX[s] & ~b) | (jx[s] & b);
                }
            }
            run();
            if (!joinAgain()) {
                return;
            }
        }
    }

    // Joins each bridge's two driven values; true when some joined value changed.
    private boolean joinAgain() {
        boolean changed = false;
        for (int k = 0; k < bridges.length; k++) {
            Bridge br = bridges[k];
            long lanes = bridgeLanes[k];
            int a = br.slotA();
            int b = br.slotB();
            long a1 = rawV[a] | rawX[a];
            long a0 = ~rawV[a] | rawX[a];
            long b1 = rawV[b] | rawX[b];
            long b0 = ~rawV[b] | rawX[b];
            long can1 = a1 & b1;
            long can0 = a0 & b0;
            long m01 = a0 & b1;
            long m10 = a1 & b0;
            can1 |= br.whenA0B1() != 0 ? m01 : 0L;
            can0 |= br.whenA0B1() != 1 ? m01 : 0L;
            can1 |= br.whenA1B0() != 0 ? m10 : 0L;
            can0 |= br.whenA1B0() != 1 ? m10 : 0L;
            long nx = can1 & can0 & lanes;
            long nv = can1 & ~can0 & lanes;
            if ((((jv[a] ^ nv) | (jx[a] ^ nx)) & lanes) != 0L) {
                changed = true;
                jv[a] = (jv[a] & ~lanes) | nv;
                jx[a] = (jx[a] & ~lanes) | nx;
                jv[b] = (jv[b] & ~lanes) | nv;
                jx[b] = (jx[b] & ~lanes) | nx;
            }
        }
        return changed;
    }

    /** Every operation of the flat program in order (a bridged gate output keeps its driven value aside). */
    private void run() {
        final long[] bm = this.bm;
        final int[] code = c.code;
        final long[] v = this.v;
        final long[] x = this.x;
        final long[] f0 = this.f0;
        final long[] f1 = this.f1;
        for (int at = 0, end = code.length; at < end; ) {
            int op = code[at];
            int out = code[at + 1];
            int n = code[at + 2];
            int in = at + 3;
            at = in + n;
            long rv;
            long rx;
            switch (op) {
                case FaultCircuit.COPY:
                    rv = v[code[in]];
                    rx = x[code[in]];
                    break;
                case FaultCircuit.NOT:
                    rx = x[code[in]];
                    rv = ~v[code[in]] & ~rx;
                    break;
                case FaultCircuit.AND:
                case FaultCircuit.NAND: {
                    long one = -1L;
                    long zero = 0L;
                    for (int k = in; k < at; k++) {
                        int s = code[k];
                        one &= v[s];
                        zero |= ~v[s] & ~x[s];
                    }
                    rx = ~zero & ~one;
                    rv = op == FaultCircuit.AND ? one : zero;
                    break;
                }
                case FaultCircuit.OR:
                case FaultCircuit.NOR: {
                    long one = 0L;
                    long zero = -1L;
                    for (int k = in; k < at; k++) {
                        int s = code[k];
                        one |= v[s];
                        zero &= ~v[s] & ~x[s];
                    }
                    rx = ~zero & ~one;
                    rv = op == FaultCircuit.OR ? one : zero;
                    break;
                }
                default: {
                    long r = 0L;
                    long u = 0L;
                    for (int k = in; k < at; k++) {
                        r ^= v[code[k]];
                        u |= x[code[k]];
                    }
                    rx = u;
                    rv = r & ~u;
                    break;
                }
            }
            long m = f0[out] | f1[out];
            v[out] = (rv & ~m) | f1[out];
            x[out] = rx & ~m;
            if (bm != null && bm[out] != 0L) {
                long b = bm[out];
                rawV[out] = v[out];
                rawX[out] = x[out];
                v[out] = (v[out] & ~b) | (jv[out] & b);
                x[out] = (x[out] & ~b) | (jx[out] & b);
            }
        }
    }

    private void forceSources() {
        for (int s : c.sourceSlots) {
            long m = f0[s] | f1[s];
            if (m != 0L) {
                v[s] = (v[s] & ~m) | f1[s];
                x[s] &= ~m;
            }
        }
    }

    private void readRom() {
        int[] d = c.romSlots;
        int pc0 = pc[0];
        boolean uniform = pcX == 0L;
        for (int l = 1; l < LANES && uniform; l++) {
            uniform = pc[l] == pc0;
        }
        if (uniform) {
            long word = pc0 < rom.length ? rom[pc0] : 0L;
            for (int b = 0; b < d.length; b++) {
                v[d[b]] = -((word >>> b) & 1L);
                x[d[b]] = 0L;
            }
            return;
        }
        for (int b = 0; b < d.length; b++) {
            v[d[b]] = 0L;
            x[d[b]] = pcX;
        }
        for (int l = 0; l < LANES; l++) {
            if ((pcX >>> l & 1L) == 0L) {
                long word = pc[l] < rom.length ? rom[pc[l]] : 0L;
                for (int b = 0; b < d.length; b++) {
                    v[d[b]] |= ((word >>> b) & 1L) << l;
                }
            }
        }
    }

    // Per lane: a known jump takes the target, a known no-jump counts up; an unknown jump or
    // target leaves the counter unknown unless both ways lead to the same address.
    private void loadPc() {
        long jv = v[c.pcJump];
        long jx = x[c.pcJump];
        int[] t = c.pcTarget;
        int bits = Math.min(t.length, c.pcWidth);
        long nx = 0L;
        for (int l = 0; l < LANES; l++) {
            int target = 0;
            boolean targetX = false;
            for (int b = 0; b < bits; b++) {
                target |= (int) (v[t[b]] >>> l & 1L) << b;
                targetX |= (x[t[b]] >>> l & 1L) != 0L;
            }
            boolean known = (pcX >>> l & 1L) == 0L;
            int next = (pc[l] + 1) & pcMask;
            boolean unknown;
            if ((jx >>> l & 1L) != 0L) {
                unknown = !known || targetX || target != next;
                pc[l] = next;
            } else if ((jv >>> l & 1L) != 0L) {
                unknown = targetX;
                pc[l] = target;
            } else {
                unknown = !known;
                pc[l] = next;
            }
            if (unknown) {
                nx |= 1L << l;
                pc[l] = 0;
            }
        }
        pcX = nx;
    }

    int nextPhase() {
        return nextPhase;
    }

    /** Lane {@code l}'s program counter, -1 when unknown. */
    int pc(int l) {
        return (pcX >>> l & 1L) != 0L ? -1 : pc[l];
    }

    /** Words of a state key: two bits per latch, then the program counter. */
    int keyWords() {
        return (2 * c.allLatchOut.length + 63) / 64 + 1;
    }

    /** Writes lane {@code l}'s state (latches, program counter, phase) into {@code key}. */
    void stateKey(int l, long[] key) {
        Arrays.fill(key, 0L);
        int[] q = c.allLatchOut;
        for (int i = 0; i < q.length; i++) {
            long bits = (v[q[i]] >>> l & 1L) | (x[q[i]] >>> l & 1L) << 1;
            key[(2 * i) >>> 6] |= bits << ((2 * i) & 63);
        }
        key[key.length - 1] = ((long) pc(l) << 8) | nextPhase;
    }

    /** Loads lane {@code l}'s state from a key written by {@link #stateKey}; same phase required. */
    void loadState(int l, long[] key) {
        int[] q = c.allLatchOut;
        long bit = 1L << l;
        for (int i = 0; i < q.length; i++) {
            long bits = key[(2 * i) >>> 6] >>> ((2 * i) & 63);
            v[q[i]] = (bits & 1L) != 0L ? v[q[i]] | bit : v[q[i]] & ~bit;
            x[q[i]] = (bits & 2L) != 0L ? x[q[i]] | bit : x[q[i]] & ~bit;
        }
        int p = (int) (key[key.length - 1] >> 8);
        if (p < 0) {
            pcX |= bit;
            pc[l] = 0;
        } else {
            pcX &= ~bit;
            pc[l] = p;
        }
        nextPhase = (int) (key[key.length - 1] & 0xff);
    }

    /** Fits program {@code k} in the ROM (the state is not touched: power up after it). */
    void fit(int k) {
        rom = programs[k];
    }

    /** Fits the program {@code o} has in its ROM now (the state is not touched). */
    void fitProgramOf(LaneMachine o) {
        rom = o.rom;
    }

    /** Copies state, program, inputs and values (not forces) from another machine over the same circuit. */
    void copyFrom(LaneMachine o) {
        rom = o.rom;
        System.arraycopy(o.v, 0, v, 0, v.length);
        System.arraycopy(o.x, 0, x, 0, x.length);
        System.arraycopy(o.pc, 0, pc, 0, LANES);
        pcX = o.pcX;
        nextPhase = o.nextPhase;
        if (swV != null) {
            for (int s : c.inputSlots) {
                swV[s] = o.swV != null ? o.swV[s] : o.v[s];
                swX[s] = o.swV != null ? o.swX[s] : o.x[s];
            }
        }
    }

}
