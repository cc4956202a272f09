package org.thermion.asm;

import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Meanings;

/**
 * Which field of the word an instruction's operand fills, read from the instruction's meaning:
 * <ol>
 *   <li>a meaning that assigns the PC ({@code pc <- FIELD}, also inside an {@code if}) takes
 *       a jump target in that field;</li>
 *   <li>otherwise a meaning that reads or writes the selected bit ({@code [sel]}) takes a
 *       bit address in the ISA's select field;</li>
 *   <li>otherwise the instruction takes no operand.</li>
 * </ol>
 */
public record OperandRule(Kind kind, int field) {

    /** What the operand is. */
    public enum Kind { NONE, TARGET, BIT }

    public static OperandRule of(Isa isa, Instruction ins) {
        int pcField = Meanings.firstJumpField(ins.body());
        if (pcField >= 0) {
            return new OperandRule(Kind.TARGET, pcField);
        }
        if (isa.selectField() >= 0 && Meanings.usesSelected(ins.body())) {
            return new OperandRule(Kind.BIT, isa.selectField());
        }
        return new OperandRule(Kind.NONE, -1);
    }
}
