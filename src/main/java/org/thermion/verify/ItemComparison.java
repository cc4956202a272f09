package org.thermion.verify;

import org.thermion.model.Isa;

import java.util.List;
import java.util.Map;

/** Compares a batch's logic result with the ISA's meaning, item by item (each state bit, then the PC). */
final class ItemComparison {
    /** Mismatches of one item of one instruction: how many cases, and the first. */
    static final class Group {
        final int instruction;
        final int item;
        long cases;
        Batch batch;
        int lane;

        Group(int instruction, int item) {
            this.instruction = instruction;
            this.item = item;
        }
    }

    private final IsaLanes lanes;
    private final List<OperandPlan> plans;
    private final int stateBits;
    private final int pcMask;
    private final boolean canInhibit;

    ItemComparison(Isa isa, List<OperandPlan> plans, int pcMask) {
        this.lanes = new IsaLanes(isa);
        this.plans = plans;
        this.stateBits = isa.state().size();
        this.pcMask = pcMask;
        this.canInhibit = isa.inhibitNet() >= 0;
    }

    /** The ISA's meaning of the batch; an inhibited cycle changes no state and does not jump. */
    IsaLanes.Expected expected(Batch b) {
        if (b.inhibited) {
            return new IsaLanes.Expected(b.state.clone(), new long[stateBits], 0L, new int[64]);
        }
        return lanes.evaluate(plans.get(b.instruction).instruction(), b.wordBits, b.state, b.inputs, b.pc);
    }

    int expectedPc(Batch b, IsaLanes.Expected e, int lane) {
        return (e.jump() >>> lane & 1L) != 0 ? e.jumpTarget()[lane] & pcMask : (b.pc + 1) & pcMask;
    }

    /**
     * True when the logic's PC and inhibit latch do what the ISA says: the expected address with
     * the decoder free next cycle, or, for a skip over one instruction, the next address with the
     * decoder inhibited (the skipped cycle is checked on its own as an inhibited batch).
     */
    private boolean pcRight(Batch b, IsaLanes.Expected e, BatchRun.Result r, int lane) {
        int want = expectedPc(b, e, lane);
        boolean inhibits = (r.inhibit >>> lane & 1L) != 0;
        if (r.pc[lane] == want && !inhibits) {
            return true;
        }
        return canInhibit && inhibits && want == ((b.pc + 2) & pcMask) && r.pc[lane] == ((b.pc + 1) & pcMask);
    }

    /** Lanes where item (a state bit index, or stateBits for the PC) is wrong. */
    long wrong(Batch b, IsaLanes.Expected e, BatchRun.Result r, int item) {
        if (item < stateBits) {
            return (r.state[item] ^ e.state()[item]) & b.valid;
        }
        long bad = 0;
        for (int lane = 0; lane < 64; lane++) {
            if ((b.valid >>> lane & 1L) != 0 && !pcRight(b, e, r, lane)) {
                bad |= 1L << lane;
            }
        }
        return bad;
    }

    /** Adds batch b's wrong lanes of instruction k to groups, keyed by instruction and item. */
    void compare(int k, Batch b, BatchRun.Result r, Map<Long, Group> groups) {
        IsaLanes.Expected e = expected(b);
        for (int item = 0; item <= stateBits; item++) {
            long bad = wrong(b, e, r, item);
            if (bad != 0) {
                long key = ((long) k * (stateBits + 1) + item) * 2 + (b.inhibited ? 1 : 0);
                Group g = groups.get(key);
                if (g == null) {
                    g = new Group(k, item);
                    g.batch = b;
                    g.lane = Long.numberOfTrailingZeros(bad);
                    groups.put(key, g);
                }
                g.cases += Long.bitCount(bad);
            }
        }
    }
}
