package org.thermion.tui;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;

/**
 * Reads the description and program again for the UI after a save, the way the command that
 * opened the UI read them. The UI keeps running the old session when the new files are bad.
 */
public interface Reloader {

    /** What a reload gave: a new session, or the errors printed as the command line prints them. */
    sealed interface Result permits Loaded, Failed {
        /** The files read this time (the description, its includes, the program), to watch next. */
        Set<Path> files();
    }

    /** The files read well: a new session at its power-up state. */
    record Loaded(Session session, Set<Path> files) implements Result {
    }

    /** The files have errors: each line as printed ({@code file:line:col: error: ...}, the line, a caret). */
    record Failed(List<String> lines, Set<Path> files) implements Result {
        public Failed {
            lines = List.copyOf(lines);
        }
    }

    /** The files the session on screen was read from. */
    Set<Path> files();

    /** Reads everything again. Never throws for bad input: that is a {@link Failed}. */
    Result load();
}
