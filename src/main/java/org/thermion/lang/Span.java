package org.thermion.lang;

import java.nio.file.Path;

/**
 * A stretch of source text: file, 1-based line and column of its first character,
 * and the line and column just past its last character.
 */
public record Span(Path file, int line, int col, int endLine, int endCol) {

    /** A span for things that have no place in a file (built-in values, generated parts). */
    public static Span none() {
        return new Span(Path.of("<built-in>"), 0, 0, 0, 0);
    }

    public boolean isKnown() {
        return line > 0;
    }

    /** The span from the start of this one to the end of {@code other}. */
    public Span to(Span other) {
        return new Span(file, line, col, other.endLine, other.endCol);
    }

    @Override
    public String toString() {
        return file + ":" + line + ":" + col;
    }
}
