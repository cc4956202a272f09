package org.thermion.lang.ast;

import org.thermion.lang.Span;

/** One token of a property line. */
public sealed interface Value {
    Span span();

    String text();

    /** A number as written (decimal, 0x hex or 0b binary). */
    record Num(String text, Span span) implements Value {
    }

    /** A bare word: a name, a unit, or a glued quantity such as {@code 47k}. */
    record Word(String text, Span span) implements Value {
    }

    /** A quoted string, quotes removed. */
    record Str(String text, Span span) implements Value {
    }

    /** Punctuation: - .. : = , . * + [ ]. */
    record Sym(String text, Span span) implements Value {
    }
}
