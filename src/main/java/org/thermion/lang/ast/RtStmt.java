package org.thermion.lang.ast;

import org.thermion.lang.Span;

import java.util.List;

/** A register-transfer statement of an instruction's meaning. */
public sealed interface RtStmt {
    Span span();

    /** {@code target <- expr}; {@code selected} when the target is the operand-addressed bit {@code [field]}. */
    record Assign(Ident target, boolean selected, RtExpr value, Span span) implements RtStmt {
    }

    /** {@code if cond { ... } else { ... }}. */
    record If(RtExpr cond, List<RtStmt> then, List<RtStmt> otherwise, Span span) implements RtStmt {
    }
}
