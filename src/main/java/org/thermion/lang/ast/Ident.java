package org.thermion.lang.ast;

import org.thermion.lang.Span;

/** A name as written, with its place. */
public record Ident(String text, Span span) {
    @Override
    public String toString() {
        return text;
    }
}
