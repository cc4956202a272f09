package org.thermion.faults;

import java.util.Arrays;

/**
 * Sixty-four copies of the machine in the bits of {@code long} words, three-valued: per slot
 * {@code v} (the value) and {@code x} (unknown; then {@code v} is 0). Each lane may carry its
 * own faults as force masks per slot ({@code f0}: forced to 0, {@code f1}: forced to 1),
 * applied wherever a slot is written, so one flat program serves every batch of faults.
 * Latches power up unknown, the program counter at 0; each lane has its own counter.
 */
final class LaneMachine {
    static final int LANES = 64;

    final FaultCircuit c;
    final long[] v;
    final long[] x;
    final long[] f0;
    final long[] f1;
    private final long[] rom;
    private final int[] pc = new int[LANES];
    private long pcX;
    private int nextPhase = 1;
    private final long[] loadV;
    private final long[] loadX;
    private final int pcMask;

    LaneMachine(FaultCircuit c, long[] rom) {
        this.c = c;
        this.rom = rom == null ? new long[0] : rom;
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
        Arrays.fill(pc, 0);
        pcX = 0L;
        nextPhase = 1;
        forceSources();
    }

    /** Forces {@code slot} to {@code value} on the lanes in {@code lanes}. */
    void force(int slot, boolean value, long lanes) {
        if (value) {
            f1[slot] |= lanes;
        } else {
            f0[slot] |= lanes;
        }
    }

    /** Sets machine input {@code i}: bit k of {@code lanes} is its value on lane k. */
    void setInput(int i, long lanes) {
        int s = c.inputSlots[i];
        v[s] = lanes;
        x[s] = 0L;
    }

    /** Sets every input alike on every lane. */
    void setInputs(boolean[] values) {
        for (int i = 0; i < values.length; i++) {
            setInput(i, values[i] ? -1L : 0L);
        }
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

    /** Copies state, inputs and values (not forces) from another machine over the same circuit. */
    void copyFrom(LaneMachine o) {
        System.arraycopy(o.v, 0, v, 0, v.length);
        System.arraycopy(o.x, 0, x, 0, x.length);
        System.arraycopy(o.pc, 0, pc, 0, LANES);
        pcX = o.pcX;
        nextPhase = o.nextPhase;
    }

}
