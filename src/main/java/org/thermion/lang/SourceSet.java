package org.thermion.lang;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The text of every file read in a run, kept so diagnostics can quote the line. */
public final class SourceSet {
    private final Map<Path, List<String>> lines = new HashMap<>();

    public void put(Path file, String text) {
        lines.put(file, text.lines().toList());
    }

    /** Every file whose text is kept here. */
    public java.util.Set<Path> files() {
        return java.util.Collections.unmodifiableSet(lines.keySet());
    }

    /** The 1-based line of a file, or null when unknown. */
    public String line(Path file, int line) {
        List<String> l = lines.get(file);
        if (l == null || line < 1 || line > l.size()) {
            return null;
        }
        return l.get(line - 1);
    }
}
