package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Ident;
import org.thermion.lang.ast.RtExpr;
import org.thermion.lang.ast.RtStmt;
import org.thermion.model.IsaField;
import org.thermion.model.Port;
import org.thermion.model.Rtl;
import org.thermion.model.StateBit;
import org.thermion.model.Transfer;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * Turns the meanings of an isa's instructions (register-transfer statements over state bits,
 * machine inputs and the selected bit) into the model's {@link Transfer}s and {@link Rtl}
 * expressions; assignments to {@code pc} go to {@link PcAssignment}. A binary chain is walked
 * along its left spine in a loop, so its length costs no call depth.
 */
final class IsaMeanings {
    private final Diagnostics diags;
    private final List<IsaField> fields;
    private final List<StateBit> state;
    private final List<Port> inputs;
    private final int selectField;
    private final PcAssignment pc;

    IsaMeanings(Diagnostics diags, List<IsaField> fields, List<StateBit> state, List<Port> inputs, int selectField) {
        this.diags = diags;
        this.fields = fields;
        this.state = state;
        this.inputs = inputs;
        this.selectField = selectField;
        this.pc = new PcAssignment(fields, diags);
    }

    /** The transfers of {@code body}; statements with errors are reported and left out. */
    List<Transfer> stmts(List<RtStmt> body) {
        List<Transfer> out = new ArrayList<>();
        for (RtStmt s : body) {
            if (s instanceof RtStmt.Assign a) {
                String t = a.target().text();
                if (a.selected()) {
                    if (!checkSelect(a.target())) {
                        continue;
                    }
                    Rtl v = expr(a.value());
                    if (v != null) {
                        out.add(new Transfer.ToSelected(v));
                    }
                } else if (t.equals("pc")) {
                    Transfer step = pc.read(a.value());
                    if (step != null) {
                        out.add(step);
                    }
                } else {
                    int si = state.stream().map(StateBit::name).toList().indexOf(t);
                    if (si < 0) {
                        diags.error(a.target().span(), "unknown state bit '" + t + "'",
                                Declarations.hintFor(t, state.stream().map(StateBit::name).toList(), "declare it with `state " + t + " = LATCH`"));
                        continue;
                    }
                    Rtl v = expr(a.value());
                    if (v != null) {
                        out.add(new Transfer.ToState(si, v));
                    }
                }
            } else if (s instanceof RtStmt.If i) {
                Rtl cond = expr(i.cond());
                List<Transfer> then = stmts(i.then());
                List<Transfer> otherwise = stmts(i.otherwise());
                if (cond != null) {
                    out.add(new Transfer.When(cond, then, otherwise));
                }
            }
        }
        return out;
    }

    /** A one-bit expression; null when reported (every operand is still checked, left to right). */
    Rtl expr(RtExpr e) {
        Deque<RtExpr.Bin> spine = new ArrayDeque<>();
        RtExpr cur = e;
        while (cur instanceof RtExpr.Bin b && logic(b.op())) {
            spine.push(b);
            cur = b.left();
        }
        Rtl acc = operand(cur);
        while (!spine.isEmpty()) {
            RtExpr.Bin b = spine.pop();
            Rtl r = expr(b.right());
            if (acc == null || r == null) {
                acc = null;
                continue;
            }
            acc = switch (b.op()) {
                case AND -> new Rtl.And(acc, r);
                case OR -> new Rtl.Or(acc, r);
                default -> new Rtl.Xor(acc, r);
            };
        }
        return acc;
    }

    private static boolean logic(RtExpr.Op op) {
        return op == RtExpr.Op.AND || op == RtExpr.Op.OR || op == RtExpr.Op.XOR;
    }

    /** Everything but a logic operator. */
    private Rtl operand(RtExpr e) {
        if (e instanceof RtExpr.Num n) {
            if (n.value() != 0 && n.value() != 1) {
                diags.error(n.span(), "a one-bit value is 0 or 1, not " + n.value(), null);
                return null;
            }
            return new Rtl.Const(n.value() == 1);
        }
        if (e instanceof RtExpr.Select s) {
            return checkSelect(s.field()) ? new Rtl.Selected() : null;
        }
        if (e instanceof RtExpr.Ref r) {
            String name = r.name().text();
            int si = state.stream().map(StateBit::name).toList().indexOf(name);
            if (si >= 0) {
                return new Rtl.State(si);
            }
            int in = inputs.stream().map(Port::name).toList().indexOf(name);
            if (in >= 0) {
                return new Rtl.Input(in);
            }
            List<String> known = new ArrayList<>();
            state.forEach(x -> known.add(x.name()));
            inputs.forEach(x -> known.add(x.name()));
            diags.error(r.span(), "unknown name '" + name + "' in an instruction's meaning",
                    Declarations.hintFor(name, known, "name a state bit or a machine input"));
            return null;
        }
        if (e instanceof RtExpr.Not n) {
            Rtl x = expr(n.operand());
            return x == null ? null : new Rtl.Not(x);
        }
        if (e instanceof RtExpr.Bin b) {
            diags.error(b.span(), "'+' and '-' compute only the pc; a one-bit value uses & | ^ !",
                    "write `pc <- pc + 2` for a skip");
        }
        return null;
    }

    private boolean checkSelect(Ident field) {
        int fi = fields.stream().map(IsaField::name).toList().indexOf(field.text());
        if (fi < 0 || fi != selectField) {
            diags.error(field.span(), "'[" + field.text() + "]' needs the isa's select field",
                    selectField < 0 ? "add `select FIELD` to the isa" : "write [" + fields.get(selectField).name() + "]");
            return false;
        }
        return true;
    }
}
