package org.thermion.verify;

import org.thermion.model.Isa;
import org.thermion.model.Meanings;

import java.util.List;
import java.util.SplittableRandom;

/** Fills 64-lane batches of cases for one instruction: in order (exhaustive) or seeded at random. */
final class CaseBatches {
    /** Lane words whose lane i carries bit j of i. */
    private static final long[] LANE_BITS = {
        0xAAAAAAAAAAAAAAAAL, 0xCCCCCCCCCCCCCCCCL, 0xF0F0F0F0F0F0F0F0L,
        0xFF00FF00FF00FF00L, 0xFFFF0000FFFF0000L, 0xFFFFFFFF00000000L};

    private final Isa isa;
    private final List<OperandPlan> plans;
    private final int stateBits;
    /** Machine inputs the cases enumerate: all but the switches of the word. */
    private final int[] free;
    private final int inputBits;
    private final int allInputs;
    private final int pcMask;
    private final long seed;

    CaseBatches(Isa isa, List<OperandPlan> plans, int allInputs, int pcMask, long seed) {
        this.isa = isa;
        this.plans = plans;
        this.stateBits = isa.state().size();
        this.allInputs = allInputs;
        this.free = freeInputs(isa, allInputs);
        this.inputBits = free.length;
        this.pcMask = pcMask;
        this.seed = seed;
    }

    /** The machine inputs that are not switches of the instruction word. */
    static int[] freeInputs(Isa isa, int allInputs) {
        java.util.Set<Integer> word = new java.util.HashSet<>();
        for (int w : isa.wordInputs()) {
            word.add(w);
        }
        return java.util.stream.IntStream.range(0, allInputs).filter(i -> !word.contains(i)).toArray();
    }

    private Batch batch(int k, long c0) {
        Batch b = new Batch(k, isa.wordBits(), stateBits, allInputs);
        if (Meanings.firstRelativeJump(plans.get(k).instruction().body()) != null) {
            // A relative jump is checked from many addresses, so an absolute one cannot pass for it.
            b.pc = (int) ((c0 >>> 6) * 0x9E3779B1L + 3) & pcMask;
        }
        return b;
    }

    /** Puts each lane's word on the word's switches (a switch-fed machine). */
    private Batch withSwitches(Batch b) {
        int[] w = isa.wordInputs();
        for (int i = 0; i < w.length; i++) {
            b.inputs[w[i]] = b.wordBits[i];
        }
        return b;
    }

    /** All cases of instruction k: every operand word, state bit and input combined. */
    long casesOf(int k) {
        return (long) plans.get(k).words().length << (stateBits + inputBits);
    }

    Batch exhaustive(int k, long c0, long count) {
        return withSwitches(fill(k, c0, count));
    }

    private Batch fill(int k, long c0, long count) {
        Batch b = batch(k, c0);
        OperandPlan plan = plans.get(k);
        SplittableRandom rnd = random(k, c0);
        int low = stateBits + inputBits;
        if (low >= 6 && count - c0 >= 64) {
            // A whole batch inside one operand pattern: lane i is case c0 + i, so the six low
            // case bits follow the lane number and the others are the same in every lane.
            long word = plan.words()[(int) (c0 >>> low)];
            for (int bit = 0; bit < b.wordBits.length; bit++) {
                b.wordBits[bit] = (plan.freeMask() >>> bit & 1L) != 0 ? rnd.nextLong() : (word >>> bit & 1L) != 0 ? -1L : 0L;
            }
            for (int j = 0; j < low; j++) {
                long v = j < 6 ? LANE_BITS[j] : (c0 >>> j & 1L) != 0 ? -1L : 0L;
                if (j < stateBits) {
                    b.state[j] = v;
                } else {
                    b.inputs[free[j - stateBits]] = v;
                }
            }
            b.valid = -1L;
            return b;
        }
        for (int lane = 0; lane < 64; lane++) {
            long c = c0 + lane;
            if (c >= count) {
                c = c0;
            } else {
                b.valid |= 1L << lane;
            }
            long rest = low == 0 ? 0 : c & ((1L << low) - 1);
            int pattern = (int) (c >>> low);
            b.setWord(lane, plan.words()[pattern] | (rnd.nextLong() & plan.freeMask()));
            for (int s = 0; s < stateBits; s++) {
                b.state[s] |= (rest >>> s & 1L) << lane;
            }
            for (int i = 0; i < inputBits; i++) {
                b.inputs[free[i]] |= (rest >>> (stateBits + i) & 1L) << lane;
            }
        }
        return b;
    }

    Batch sample(int k, long c0) {
        Batch b = batch(k, c0);
        OperandPlan plan = plans.get(k);
        SplittableRandom rnd = random(k, c0);
        for (int lane = 0; lane < 64; lane++) {
            b.setWord(lane, plan.words()[rnd.nextInt(plan.words().length)] | (rnd.nextLong() & plan.freeMask()));
        }
        for (int s = 0; s < stateBits; s++) {
            b.state[s] = rnd.nextLong();
        }
        for (int i = 0; i < inputBits; i++) {
            b.inputs[free[i]] = rnd.nextLong();
        }
        b.valid = -1L;
        return withSwitches(b);
    }

    private SplittableRandom random(int k, long c0) {
        return new SplittableRandom(seed ^ (k * 0x9E3779B97F4A7C15L) ^ (c0 * 0xBF58476D1CE4E5B9L));
    }
}
