package org.thermion.lang.program;

import org.thermion.lang.Span;
import org.thermion.lang.ast.Ident;

/** What a program line says, besides its label. */
public sealed interface Statement {
    Span span();

    /** An instruction: mnemonic and optional operand. */
    record Op(Ident mnemonic, AsmExpr operand, Span span) implements Statement {
    }

    /**
     * A directive: its word without the dot ({@code at}, {@code const}, {@code word}), the name
     * before {@code =} if any, and its value if any. The assembler checks the shape.
     */
    record Directive(Ident word, Ident name, AsmExpr value, Span span) implements Statement {
    }
}
