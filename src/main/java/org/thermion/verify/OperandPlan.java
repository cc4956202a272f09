package org.thermion.verify;

import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.IsaField;
import org.thermion.model.Meanings;

import java.util.ArrayList;
import java.util.List;

/**
 * Which instruction words one instruction is checked with. Every value of the select field
 * when the meaning uses {@code [sel]}; the jump target bits (outside the select field) take
 * every value when there are at most {@code allTargetBits} of them, else the patterns all
 * zeros, all ones, walking one and walking zero. Word bits that no used field covers
 * ({@code freeMask}) do not matter to the ISA: each case gives them seeded random values, so
 * logic that wrongly reads them shows up.
 *
 * @param words    the word of each operand pattern, opcode in place, free bits 0
 * @param freeMask word bits that take random values per case
 */
public record OperandPlan(Instruction instruction, long[] words, long freeMask, String description) {

    public static OperandPlan of(Isa isa, Instruction ins, int allTargetBits) {
        long wordMask = isa.wordBits() >= 64 ? -1L : (1L << isa.wordBits()) - 1;
        IsaField op = isa.opcode();
        long opMask = op.place(-1L);
        long base = op.place(ins.opcode());
        long selMask = 0;
        if (isa.selectField() >= 0 && Meanings.usesSelected(ins.body())) {
            selMask = isa.fields().get(isa.selectField()).place(-1L);
        }
        long targetMask = 0;
        for (int f : Meanings.jumpFields(ins.body())) {
            targetMask |= isa.fields().get(f).place(-1L);
        }
        targetMask &= ~selMask & ~opMask;
        List<Long> targetPatterns = new ArrayList<>();
        int[] tBits = bits(targetMask);
        String desc;
        if (tBits.length <= allTargetBits) {
            for (long v = 0; v < 1L << tBits.length; v++) {
                targetPatterns.add(spread(v, tBits));
            }
            desc = tBits.length == 0 ? "" : "every target";
        } else {
            targetPatterns.add(0L);
            targetPatterns.add(targetMask);
            for (int b : tBits) {
                targetPatterns.add(1L << b);
            }
            for (int b : tBits) {
                targetPatterns.add(targetMask & ~(1L << b));
            }
            desc = targetPatterns.size() + " targets (zeros, ones, walking one, walking zero)";
        }
        int[] sBits = bits(selMask);
        long[] words = new long[(1 << sBits.length) * targetPatterns.size()];
        int n = 0;
        for (long s = 0; s < 1L << sBits.length; s++) {
            for (long t : targetPatterns) {
                words[n++] = base | spread(s, sBits) | t;
            }
        }
        if (sBits.length > 0) {
            desc = desc.isEmpty() ? "every select value" : "every select value x " + desc;
        }
        long free = wordMask & ~opMask & ~selMask & ~targetMask;
        return new OperandPlan(ins, words, free, desc.isEmpty() ? "no operand" : desc);
    }

    private static int[] bits(long mask) {
        int[] b = new int[Long.bitCount(mask)];
        int n = 0;
        for (int i = 0; i < 64; i++) {
            if ((mask >>> i & 1L) != 0) {
                b[n++] = i;
            }
        }
        return b;
    }

    private static long spread(long v, int[] bits) {
        long w = 0;
        for (int i = 0; i < bits.length; i++) {
            if ((v >>> i & 1L) != 0) {
                w |= 1L << bits[i];
            }
        }
        return w;
    }
}
