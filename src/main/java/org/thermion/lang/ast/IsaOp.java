package org.thermion.lang.ast;

import org.thermion.lang.Span;

import java.util.List;

/** {@code op MNEMONIC OPCODE { statements }}: one instruction and its meaning. */
public record IsaOp(Ident mnemonic, Expr opcode, List<RtStmt> body, Span span) {
}
