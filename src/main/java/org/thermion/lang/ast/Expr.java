package org.thermion.lang.ast;

import org.thermion.lang.Span;

import java.util.List;

/** An expression in a module: logic over nets, or arithmetic over constants. */
public sealed interface Expr {
    Span span();

    /** Binary operators, logic and arithmetic. */
    enum BinOp {
        AND("&"), OR("|"), XOR("^"), EQ("=="), ADD("+"), SUB("-"), MUL("*"), DIV("/"), MOD("%");

        public final String symbol;

        BinOp(String symbol) {
            this.symbol = symbol;
        }
    }

    /** A name, optionally indexed. */
    record Ref(Ident name, Index index, Span span) implements Expr {
    }

    /** A number. */
    record Num(long value, String text, Span span) implements Expr {
    }

    /** Logical negation. */
    record Not(Expr operand, Span span) implements Expr {
    }

    /** Arithmetic negation (constants only). */
    record Neg(Expr operand, Span span) implements Expr {
    }

    /** A binary operation. */
    record Bin(BinOp op, Expr left, Expr right, Span span) implements Expr {
    }

    /** An explicit stage use {@code STAGE(a, b)}. */
    record Call(Ident function, List<Expr> args, Span span) implements Expr {
    }

    /** Concatenation {@code {hi, ..., lo}}. */
    record Concat(List<Expr> parts, Span span) implements Expr {
    }
}
