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
}
