package org.thermion.lang;

import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;

/**
 * A cheap scan of a source text before the (recursive) parser sees it: it enforces the
 * documented limits on how deeply constructs nest and how long one line's expression may be,
 * so that a pathological input gets an error at its {@code file:line:col} instead of
 * exhausting the stack of the parser, the AST builder or the stages after them.
 * <ul>
 *   <li>{@link #MAX_DEPTH}: brackets {@code ( [ {} open at once, plus a run of prefix
 *   operators {@code !} and {@code -} in front of an operand;</li>
 *   <li>{@link #MAX_OPERATORS}: operator characters on one line (a binary chain builds a tree
 *   as deep as it is long).</li>
 * </ul>
 * Quoted strings and comments are skipped.
 */
public final class NestingLimit {
    /** Most brackets and prefix operators open at one point of the text. */
    public static final int MAX_DEPTH = 100;
    /** Most operators on one line. */
    public static final int MAX_OPERATORS = 1000;

    private NestingLimit() {
    }

    /**
     * Scans {@code text}, reporting each line that breaks a limit (once per line) into
     * {@code diags}. {@code comment} starts a comment that runs to the end of the line;
     * {@code quotes} says whether {@code "..."} strings exist in the language; {@code perLine}
     * that every line is parsed on its own (brackets do not carry over). Returns the 1-based numbers of the lines at fault (empty when the text is fine).
     */
    public static Set<Integer> scan(Path file, String text, char comment, boolean quotes, boolean perLine,
                                    Diagnostics diags) {
        Set<Integer> bad = new TreeSet<>();
        int line = 1;
        int col = 1;
        int depth = 0;
        int prefix = 0;
        int operators = 0;
        boolean lineReported = false;
        boolean deepReported = false;
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (c == '\n') {
                line++;
                col = 1;
                i++;
                operators = 0;
                prefix = 0;
                lineReported = false;
                if (perLine) {
                    depth = 0;
                    deepReported = false;
                }
                continue;
            }
            if (c == comment) {
                while (i < n && text.charAt(i) != '\n') {
                    i++;
                }
                continue;
            }
            if (quotes && c == '"') {
                int j = i + 1;
                while (j < n && text.charAt(j) != '"' && text.charAt(j) != '\n') {
                    j += text.charAt(j) == '\\' && j + 1 < n && text.charAt(j + 1) != '\n' ? 2 : 1;
                }
                int end = j < n && text.charAt(j) == '"' ? j + 1 : j;
                col += end - i;
                i = end;
                prefix = 0;
                continue;
            }
            if (c == '(' || c == '[' || c == '{') {
                depth++;
            } else if (c == ')' || c == ']' || c == '}') {
                depth = Math.max(0, depth - 1);
                if (depth + prefix <= MAX_DEPTH) {
                    deepReported = false;
                }
            }
            boolean operator = "+-*/%&|^!=<>".indexOf(c) >= 0;
            if (c == '!' || c == '-') {
                prefix++;
            } else if (c != ' ' && c != '\t' && c != '\r' && c != '(') {
                prefix = 0;
            }
            if (operator) {
                operators++;
            }
            if (!lineReported && !deepReported && depth + prefix > MAX_DEPTH) {
                diags.error(new Span(file, line, col, line, col + 1),
                        "nesting deeper than " + MAX_DEPTH + " levels",
                        "at most " + MAX_DEPTH + " brackets and prefix operators (! -) may be open at once;"
                                + " name the inner parts (a net, a constant) to flatten it");
                bad.add(line);
                lineReported = true;
                deepReported = true;
            } else if (!lineReported && operators > MAX_OPERATORS) {
                diags.error(new Span(file, line, col, line, col + 1),
                        "more than " + MAX_OPERATORS + " operators on one line",
                        "split the expression over named nets or constants");
                bad.add(line);
                lineReported = true;
            }
            col++;
            i++;
        }
        return bad;
    }
}
