package org.thermion.lang.ast;

import org.thermion.lang.Span;

/** A bus index {@code [i]} or slice {@code [hi..lo]}; {@code lo} is null for a single bit. */
public record Index(Expr hi, Expr lo, Span span) {
    public boolean isSlice() {
        return lo != null;
    }
}
