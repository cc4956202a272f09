package org.thermion.lang;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The text of every file read in a run, kept so diagnostics can quote the line. */
public final class SourceSet {
    private final Map<Path, List<String>> lines = new HashMap<>();

    public void put(Path file, String text) {
        lines.put(file, split(text));
    }

    /**
     * The lines of {@code text} as the readers count them: ended by '\n' only (a '\r' before
     * it dropped), so a lone '\r' does not start a line here that the parser does not see.
     */
    public static List<String> split(String text) {
        List<String> out = new java.util.ArrayList<>();
        int start = 0;
        int n = text.length();
        while (start < n) {
            int nl = text.indexOf('\n', start);
            int end = nl < 0 ? n : nl;
            int cut = end > start && text.charAt(end - 1) == '\r' ? end - 1 : end;
            out.add(text.substring(start, cut));
            start = end + 1;
        }
        return out;
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
