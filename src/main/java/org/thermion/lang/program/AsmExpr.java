package org.thermion.lang.program;

import org.thermion.lang.Span;
import org.thermion.lang.ast.Ident;

/** A constant expression in a program: numbers, names, + - * / and parentheses. */
public sealed interface AsmExpr {
    Span span();

    /** A number as written (decimal, 0x hex or 0b binary). */
    record Num(long value, Span span) implements AsmExpr {
    }

    /** A label, a named constant or a bit of the machine's bit map. */
    record Name(Ident name) implements AsmExpr {
        @Override
        public Span span() {
            return name.span();
        }
    }

    /** Unary minus. */
    record Neg(AsmExpr operand, Span span) implements AsmExpr {
    }

    /** A binary operation: one of {@code + - * /}. */
    record Bin(char op, AsmExpr left, AsmExpr right, Span span) implements AsmExpr {
    }
}
