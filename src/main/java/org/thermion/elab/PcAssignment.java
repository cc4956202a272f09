package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.RtExpr;
import org.thermion.model.IsaField;
import org.thermion.model.Transfer;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * Reads the right-hand side of an assignment to the program counter: a field (a jump,
 * {@code pc <- operand}), or {@code pc} plus or minus numbers and at most one field (a skip,
 * {@code pc <- pc + 2}, or a relative jump, {@code pc <- pc + offset - 1}).
 */
final class PcAssignment {
    static final String HOW = "write `pc <- operand` (a jump), `pc <- pc + 2` (a skip) or `pc <- pc + FIELD` (a relative jump)";

    private final List<IsaField> fields;
    private final Diagnostics diags;

    PcAssignment(List<IsaField> fields, Diagnostics diags) {
        this.fields = fields;
        this.diags = diags;
    }

    /** The transfer {@code pc <- value} stands for; null when reported. */
    Transfer read(RtExpr value) {
        if (value instanceof RtExpr.Ref r && !r.name().text().equals("pc")) {
            int fi = field(r.name().text());
            if (fi < 0) {
                diags.error(r.span(), "a jump takes its target from a field; '" + r.name().text() + "' is not one",
                        Declarations.hintFor(r.name().text(), fields.stream().map(IsaField::name).toList(), null));
                return null;
            }
            return new Transfer.ToPc(fi);
        }
        List<Term> terms = terms(value);
        if (!(terms.get(0).e() instanceof RtExpr.Ref first && first.name().text().equals("pc") && !terms.get(0).minus())) {
            diags.error(value.span(), "a jump takes its target from a field, or adds to pc", HOW);
            return null;
        }
        long offset = 0;
        int field = -1;
        boolean minusField = false;
        for (Term t : terms.subList(1, terms.size())) {
            RtExpr e = t.e();
            int fi = e instanceof RtExpr.Ref r ? field(r.name().text()) : -1;
            if (e instanceof RtExpr.Num n) {
                offset += t.minus() ? -n.value() : n.value();
            } else if (fi >= 0 && field < 0) {
                field = fi;
                minusField = t.minus();
            } else if (fi >= 0) {
                diags.error(e.span(), "a relative jump adds one field to pc, not two", HOW);
                return null;
            } else {
                diags.error(e.span(), "pc adds numbers and one field; this is neither", HOW);
                return null;
            }
        }
        return new Transfer.PcStep(offset, field, minusField);
    }

    /** One term of a sum and whether it is subtracted. */
    record Term(RtExpr e, boolean minus) {
    }

    /**
     * The terms of a sum in reading order, each with its sign; anything but '+' and '-' is one term.
     * Walked with an explicit stack, so a long chain costs no call depth.
     */
    static List<Term> terms(RtExpr e) {
        List<Term> out = new ArrayList<>();
        Deque<Term> todo = new ArrayDeque<>();
        todo.push(new Term(e, false));
        while (!todo.isEmpty()) {
            Term t = todo.pop();
            if (t.e() instanceof RtExpr.Bin b && (b.op() == RtExpr.Op.PLUS || b.op() == RtExpr.Op.MINUS)) {
                todo.push(new Term(b.right(), t.minus() ^ (b.op() == RtExpr.Op.MINUS)));
                todo.push(new Term(b.left(), t.minus()));
            } else {
                out.add(t);
            }
        }
        return out;
    }

    private int field(String name) {
        return fields.stream().map(IsaField::name).toList().indexOf(name);
    }
}
