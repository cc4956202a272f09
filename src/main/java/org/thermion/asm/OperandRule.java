package org.thermion.asm;

import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Meanings;
import org.thermion.model.Transfer;

/**
 * Which field of the word an instruction's operand fills, read from the instruction's meaning:
 * <ol>
 *   <li>a meaning that assigns the PC ({@code pc <- FIELD}, also inside an {@code if}) takes
 *       a jump target in that field;</li>
 *   <li>otherwise a meaning that adds a field to the PC ({@code pc <- pc + FIELD}, a relative
 *       jump) takes a jump target too, written into the field as its distance from the
 *       instruction ({@link #OFFSET});</li>
 *   <li>otherwise a meaning that reads or writes the selected bit ({@code [sel]}) takes a
 *       bit address in the ISA's select field;</li>
 *   <li>otherwise the instruction takes no operand (a skip such as {@code pc <- pc + 2} needs none).</li>
 * </ol>
 *
 * @param step the relative jump, for {@link Kind#OFFSET} only (else null)
 */
public record OperandRule(Kind kind, int field, Transfer.PcStep step) {

    /** What the operand is. */
    public enum Kind { NONE, TARGET, OFFSET, BIT }

    public static OperandRule of(Isa isa, Instruction ins) {
        int pcField = Meanings.firstJumpField(ins.body());
        if (pcField >= 0) {
            return new OperandRule(Kind.TARGET, pcField, null);
        }
        Transfer.PcStep rel = Meanings.firstRelativeJump(ins.body());
        if (rel != null) {
            return new OperandRule(Kind.OFFSET, rel.field(), rel);
        }
        if (isa.selectField() >= 0 && Meanings.usesSelected(ins.body())) {
            return new OperandRule(Kind.BIT, isa.selectField(), null);
        }
        return new OperandRule(Kind.NONE, -1, null);
    }

    /**
     * The field value that makes the relative jump of an instruction at {@code address} land on
     * {@code target}, with addresses modulo {@code pcRange}: target - address - offset (or its
     * negation for {@code pc - FIELD}).
     */
    public long fieldFor(long target, long address, long pcRange) {
        long d = step.minusField() ? address + step.offset() - target : target - address - step.offset();
        return Math.floorMod(d, pcRange);
    }
}
