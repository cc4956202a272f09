package org.thermion.elab;

import org.thermion.text.Nouns;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Expr;
import org.thermion.lang.ast.ModuleStmt;
import org.thermion.model.StageFunction;

import java.util.List;

import static org.thermion.elab.Lowered.bitsWord;

/**
 * Lowers the statements that drive nets (assignments, initialised nets, latches) through
 * {@link ExpressionLowering} and hands their bits to {@link StageMapper}.
 */
final class StatementLowering {
    private final ExpressionLowering exprs;
    private final StageMapper mapper;
    private final Parts parts;
    private final Diagnostics diags;
    private final int phases;
    private boolean reportedNoLatchStage;

    StatementLowering(ExpressionLowering exprs, StageMapper mapper, Parts parts, Diagnostics diags, int phases) {
        this.exprs = exprs;
        this.mapper = mapper;
        this.parts = parts;
        this.diags = diags;
        this.phases = phases;
    }

    void assign(Scope f, ModuleStmt.Assign a) {
        Signal t = f.lookup(a.target(), diags);
        if (t == null) {
            return;
        }
        if (t.kind() == Signal.Kind.IN) {
            diags.error(a.target().span(), "'" + t.name() + "' is an input of this module and cannot be assigned",
                    "inputs are driven from outside; assign an output or a net");
            return;
        }
        if (t.kind() == Signal.Kind.LATCH) {
            diags.error(a.target().span(), "'" + t.name() + "' is a latch; its value is given in its `latch` line",
                    "write `latch " + t.name() + " on phase N = expr`");
            return;
        }
        int[] nets = exprs.select(f, t, a.index());
        if (nets != null) {
            assignBits(f, nets, a.value(), a.span());
        }
    }

    /** {@code net x = expr}: the net was declared with the module's names. */
    void netInit(Scope f, ModuleStmt.Nets n) {
        Signal t = f.names.get(n.nets().get(0).name().text());
        if (t != null) {
            assignBits(f, t.nets(), n.init(), n.span());
        }
    }

    private void assignBits(Scope f, int[] nets, Expr value, Span stmt) {
        Lowered v = exprs.lower(f, value);
        List<Logic> bits = v == null ? null : exprs.bits(v, nets.length, value.span());
        if (bits == null) {
            return;
        }
        if (bits.size() != nets.length) {
            diags.error(value.span(), "bus width mismatch: the target is " + bitsWord(nets.length) + " wide, the value "
                    + bitsWord(bits.size()), "slice one side, e.g. x[3..0], so the widths agree");
            return;
        }
        for (int i = 0; i < nets.length; i++) {
            mapper.emit(f, bits.get(i), nets[i], stmt);
        }
    }

    /** The nets an output port of a child drives: a plain (indexed) net of this scope. */
    int[] outTarget(Scope f, Expr e) {
        if (e instanceof Expr.Ref r) {
            Signal s = f.lookup(r.name(), diags);
            if (s == null) {
                return null;
            }
            if (s.kind() == Signal.Kind.IN) {
                diags.error(r.span(), "an output port cannot drive '" + s.name() + "', an input of this module", null);
                return null;
            }
            if (s.kind() == Signal.Kind.LATCH) {
                diags.error(r.span(), "an output port cannot drive latch '" + s.name() + "'", null);
                return null;
            }
            return exprs.select(f, s, r.index());
        }
        diags.error(e.span(), "an output port connects to a net, not an expression", "write the name of a net, e.g. `y: result`");
        return null;
    }

    /** The nets carrying an expression given to a child's input port of {@code width} bits. */
    int[] inputBits(Scope f, Expr value, int width, Span stmt) {
        Lowered v = exprs.lower(f, value);
        List<Logic> bits = v == null ? null : exprs.bits(v, width, value.span());
        if (bits == null) {
            return null;
        }
        int[] nets = new int[bits.size()];
        for (int i = 0; i < nets.length; i++) {
            nets[i] = mapper.emit(f, bits.get(i), -1, stmt);
        }
        return nets;
    }

    void latch(Scope f, ModuleStmt.Latch l) {
        Signal q = f.names.get(l.name().text());
        if (q == null || q.kind() != Signal.Kind.LATCH) {
            return;
        }
        int phase = phase(f, l);
        int stage = latchStage(l);
        int enable = -1;
        if (l.enable() != null) {
            Lowered ev = exprs.lower(f, l.enable());
            List<Logic> eb = ev == null ? null : exprs.bits(ev, 1, l.enable().span());
            if (eb != null) {
                if (eb.size() != 1) {
                    diags.error(l.enable().span(), "a latch enable is one bit; this is " + eb.size() + " bits", null);
                } else {
                    enable = mapper.emit(f, eb.get(0), -1, l.span());
                }
            }
        }
        Lowered dv = exprs.lower(f, l.data());
        List<Logic> db = dv == null ? null : exprs.bits(dv, q.width(), l.data().span());
        if (db == null) {
            return;
        }
        if (db.size() != q.width()) {
            diags.error(l.data().span(), "bus width mismatch: latch '" + q.name() + "' is " + bitsWord(q.width())
                    + " wide, its data " + bitsWord(db.size()), null);
            return;
        }
        for (int i = 0; i < q.width(); i++) {
            int d = mapper.emit(f, db.get(i), -1, l.span());
            mapper.nb.latch(d, enable, q.nets()[i], phase, stage, f.module, l.span());
        }
    }

    private int phase(Scope f, ModuleStmt.Latch l) {
        if (l.phase() == null) {
            diags.error(l.name().span(), "latch '" + l.name().text() + "' has no clock phase",
                    "say when it loads: `latch " + l.name().text() + " on phase 1 = ...`");
            return 1;
        }
        Long p = exprs.constant(f, l.phase(), "a clock phase");
        if (p != null && (p < 1 || p > phases)) {
            diags.error(l.phase().span(), "clock phase " + p + " does not exist; the clock has " + Nouns.count(phases, "phase"),
                    "use a phase from 1 to " + phases);
            return 1;
        }
        return p == null ? 1 : (int) (long) p;
    }

    private int latchStage(ModuleStmt.Latch l) {
        if (l.stage() != null) {
            int stage = parts.stage(l.stage().text(), l.stage().span());
            if (stage >= 0 && parts.stages.get(stage).function().role() != StageFunction.Role.STORAGE) {
                diags.error(l.stage().span(), "stage '" + l.stage().text() + "' is not a latch or flip-flop",
                        "name a stage whose function is latch");
                return -1;
            }
            return stage;
        }
        int stage = parts.realizer("latch");
        if (stage < 0 && !reportedNoLatchStage && !parts.realizeReported("latch")) {
            reportedNoLatchStage = true;
            diags.error(l.name().span(), "no stage realizes latches",
                    "add `latch triode_flipflop` (or your own latch stage) to a realize block, or write `using STAGE`");
        }
        return stage;
    }
}
