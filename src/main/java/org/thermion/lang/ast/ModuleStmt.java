package org.thermion.lang.ast;

import org.thermion.lang.Span;

import java.util.List;

/** A statement inside a module body. */
public sealed interface ModuleStmt {
    Span span();

    /** Port direction. */
    enum Dir { IN, OUT }

    /** A declared name with an optional bus width. */
    record Declared(Ident name, Expr width, Span span) {
    }

    /** {@code in a, b[4]} or {@code out y}. */
    record Ports(Dir dir, List<Declared> ports, Span span) implements ModuleStmt {
    }

    /** {@code net t, u[3]} or {@code net t = expr}. */
    record Nets(List<Declared> nets, Expr init, Span span) implements ModuleStmt {
    }

    /** {@code const N = expr}. */
    record Const(Ident name, Expr value, Span span) implements ModuleStmt {
    }

    /** {@code latch q[w] on phase P [when EN] [using STAGE] = D}. */
    record Latch(Ident name, Expr width, Expr phase, Expr enable, Ident stage, Expr data, Span span)
            implements ModuleStmt {
    }

    /** {@code target[idx] = expr}. */
    record Assign(Ident target, Index index, Expr value, Span span) implements ModuleStmt {
    }

    /** {@code use MODULE as NAME (port: expr, ...)}. */
    record Use(Ident module, Ident name, List<Conn> conns, Span span) implements ModuleStmt {
    }

    /** A port connection of a {@code use}. */
    record Conn(Ident port, Expr value, Span span) {
    }

    /** {@code for k in A..B { ... }}. */
    record For(Ident var, Expr from, Expr to, List<ModuleStmt> body, Span span) implements ModuleStmt {
    }
}
