package org.thermion.lang.ast;

import org.thermion.lang.Span;

import java.util.List;

/** A top-level declaration. */
public sealed interface Decl {
    Span span();

    /** {@code include "file"}. */
    record Include(String file, Span span) implements Decl {
    }

    /** A property block: tube, stage, rail, heaters, softstart, realize, machine. */
    record PropDecl(Prop prop) implements Decl {
        @Override
        public Span span() {
            return prop.span();
        }
    }

    /** {@code module NAME { ... }}. */
    record Module(Ident name, List<ModuleStmt> body, Span span) implements Decl {
    }

    /** {@code isa NAME { ... }}. */
    record Isa(Ident name, List<Prop> props, List<IsaOp> ops, Span span) implements Decl {
    }

    /**
     * A declaration whose text did not parse (its syntax errors are reported): its first word
     * ({@code stage}, {@code rail} ...) and name, when they could be read, so that the rest of
     * the description is still checked and its uses are not reported again as unknown.
     */
    record Rejected(String kind, String name, Span span) implements Decl {
    }
}
