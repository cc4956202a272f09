package org.thermion.lang.ast;

import org.thermion.lang.Span;

/** An expression in an instruction's meaning. */
public sealed interface RtExpr {
    Span span();

    /** A state bit, input, field or pc by name. */
    record Ref(Ident name, Span span) implements RtExpr {
    }

    /** The bit addressed by a field: {@code [addr]}. */
    record Select(Ident field, Span span) implements RtExpr {
    }

    /** A literal 0 or 1 (or a field-width number for pc). */
    record Num(long value, Span span) implements RtExpr {
    }

    /** Negation. */
    record Not(RtExpr operand, Span span) implements RtExpr {
    }

    /** Logic operators, and the additions only {@code pc <- pc + ...} may use. */
    enum Op { AND, OR, XOR, PLUS, MINUS }

    /** A binary logic operation. */
    record Bin(Op op, RtExpr left, RtExpr right, Span span) implements RtExpr {
    }
}
