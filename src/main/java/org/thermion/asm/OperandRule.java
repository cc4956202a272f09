package org.thermion.asm;

import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Rtl;
import org.thermion.model.Transfer;

import java.util.List;

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
        int pcField = pcField(ins.body());
        if (pcField >= 0) {
            return new OperandRule(Kind.TARGET, pcField);
        }
        if (isa.selectField() >= 0 && usesSelected(ins.body())) {
            return new OperandRule(Kind.BIT, isa.selectField());
        }
        return new OperandRule(Kind.NONE, -1);
    }

    /** True when the meaning writes the selected bit (a store-like instruction). */
    public static boolean writesSelected(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToSelected) {
                return true;
            }
            if (t instanceof Transfer.When w && (writesSelected(w.then()) || writesSelected(w.otherwise()))) {
                return true;
            }
        }
        return false;
    }

    private static int pcField(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToPc p) {
                return p.field();
            }
            if (t instanceof Transfer.When w) {
                int f = pcField(w.then());
                if (f < 0) {
                    f = pcField(w.otherwise());
                }
                if (f >= 0) {
                    return f;
                }
            }
        }
        return -1;
    }

    private static boolean usesSelected(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToSelected) {
                return true;
            }
            if (t instanceof Transfer.ToState s && reads(s.value())) {
                return true;
            }
            if (t instanceof Transfer.When w && (reads(w.cond()) || usesSelected(w.then()) || usesSelected(w.otherwise()))) {
                return true;
            }
        }
        return false;
    }

    private static boolean reads(Rtl e) {
        if (e instanceof Rtl.Selected) {
            return true;
        }
        if (e instanceof Rtl.Not n) {
            return reads(n.operand());
        }
        if (e instanceof Rtl.And a) {
            return reads(a.left()) || reads(a.right());
        }
        if (e instanceof Rtl.Or o) {
            return reads(o.left()) || reads(o.right());
        }
        if (e instanceof Rtl.Xor x) {
            return reads(x.left()) || reads(x.right());
        }
        return false;
    }
}
