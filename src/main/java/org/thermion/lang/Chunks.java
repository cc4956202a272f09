package org.thermion.lang;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Cuts a description into its top-level declarations, so that after a syntax error each
 * declaration can be parsed on its own and one error cannot start a cascade in the ones
 * after it. A declaration starts on a line where the braces before it are balanced, or on a
 * line that begins in column 1 with a top-level word ({@code module}, {@code isa},
 * {@code machine} ...): a block whose closing brace is missing ends there.
 */
final class Chunks {
    /** Words that begin a top-level declaration when they open a line. */
    static final Set<String> TOP_LEVEL = Set.of("include", "module", "isa", "machine", "tube", "stage", "rail", "heaters",
            "softstart", "realize", "packing", "margins");

    /** One declaration's text: from {@code start} to {@code end} (offsets), beginning on 1-based {@code line}. */
    record Chunk(int line, int start, int end) {
    }

    private Chunks() {
    }

    static List<Chunk> of(String text) {
        List<Chunk> out = new ArrayList<>();
        int depth = 0;
        int line = 1;
        int chunkLine = 1;
        int chunkStart = 0;
        int i = 0;
        int n = text.length();
        while (i < n) {
            int lineStart = i;
            int lineEnd = text.indexOf('\n', i);
            lineEnd = lineEnd < 0 ? n : lineEnd;
            boolean code = false;
            int depthBefore = depth;
            for (int k = lineStart; k < lineEnd; k++) {
                char c = text.charAt(k);
                if (c == '#') {
                    break;
                }
                if (c == '"') {
                    int q = k + 1;
                    while (q < lineEnd && text.charAt(q) != '"') {
                        q += text.charAt(q) == '\\' ? 2 : 1;
                    }
                    k = q;
                    code = true;
                    continue;
                }
                if (!Character.isWhitespace(c)) {
                    code = true;
                }
                if (c == '{') {
                    depth++;
                } else if (c == '}') {
                    depth = Math.max(0, depth - 1);
                }
            }
            boolean begins = code && (depthBefore == 0 || startsTopLevel(text, lineStart, lineEnd));
            if (begins && lineStart > chunkStart) {
                out.add(new Chunk(chunkLine, chunkStart, lineStart));
                chunkStart = lineStart;
                chunkLine = line;
            }
            if (begins && depthBefore > 0) {
                depth -= depthBefore;
                depth = Math.max(0, depth);
            }
            i = lineEnd + 1;
            line++;
        }
        if (chunkStart < n) {
            out.add(new Chunk(chunkLine, chunkStart, n));
        }
        return out;
    }

    private static boolean startsTopLevel(String text, int from, int to) {
        int k = from;
        while (k < to && Character.isLetter(text.charAt(k))) {
            k++;
        }
        return k > from && k < to && (text.charAt(k) == ' ' || text.charAt(k) == '\t')
                && TOP_LEVEL.contains(text.substring(from, k));
    }
}
