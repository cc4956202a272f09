package org.thermion.lang;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.Map;

/**
 * Which section of the language reference ({@link #DOCUMENT}) explains the text a diagnostic
 * points at: the statement's first word where it has a section (a {@code rail}, a {@code latch},
 * an {@code op}), else the innermost enclosing block's, else lexical rules for errors in the
 * text itself (encoding, characters, nesting), else the blocks overview. Read from the source
 * as written, so it works for errors the parser found before any tree existed.
 */
public final class LanguageSections {
    /** The language reference, relative to the project folder. */
    public static final String DOCUMENT = "src/docs/language.md";

    /** Statement or block words and the anchor of the section that explains them. */
    static final Map<String, String> ANCHORS = Map.ofEntries(
            Map.entry("include", "include"), Map.entry("rail", "rail"), Map.entry("tube", "tube"),
            Map.entry("stage", "stage"), Map.entry("heaters", "heaters"), Map.entry("softstart", "softstart"),
            Map.entry("relay", "relay"), Map.entry("realize", "realize"), Map.entry("module", "module"),
            Map.entry("machine", "machine"), Map.entry("clock", "clock"), Map.entry("rom", "rom"),
            Map.entry("pc", "pc"), Map.entry("isa", "isa"), Map.entry("latch", "latch-timing"),
            Map.entry("op", "instruction-meanings"), Map.entry("offboard", "built-blocks-the-clock-the-program-counter-and-the-rom"));

    /** Sections for errors in the text itself, before any statement is read. */
    static final String LEXICAL = "lexical-rules";
    static final String BLOCKS = "blocks";
    static final String EXPRESSIONS = "expressions";
    static final String ASSEMBLER = "assembler";

    /** Every anchor {@link #anchor} can return (a test checks each is a heading of the document). */
    public static List<String> anchors() {
        List<String> all = new java.util.ArrayList<>(ANCHORS.values());
        all.addAll(List.of(LEXICAL, BLOCKS, EXPRESSIONS, ASSEMBLER));
        return all;
    }

    private final SourceSet sources;

    public LanguageSections(SourceSet sources) {
        this.sources = sources;
    }

    /** "src/docs/language.md#rail" for a diagnostic, or null when it has no place in a source file. */
    public String pointer(Diagnostic d) {
        String a = anchor(d);
        return a == null ? null : DOCUMENT + "#" + a;
    }

    /** The anchor of the section that explains what {@code d} points at, or null. */
    public String anchor(Diagnostic d) {
        Span s = d.span();
        if (s == null || !s.isKnown()) {
            return null;
        }
        String name = s.file().getFileName() == null ? "" : s.file().getFileName().toString();
        if (name.endsWith(".asm")) {
            return ASSEMBLER;
        }
        if (name.endsWith(".csv")) {
            return null;
        }
        String m = d.message();
        if (m.contains("UTF-8") || m.contains("UTF-16") || m.contains("string is not closed") || m.contains("nesting deeper")
                || m.startsWith("syntax error: unexpected '") && strayCharacter(s)) {
            return LEXICAL;
        }
        if (m.contains("in an expression") || m.contains("operators on one line")) {
            return EXPRESSIONS;
        }
        String block = enclosing(s.file(), s.line(), s.col());
        return block != null ? block : BLOCKS;
    }

    // True when the span starts at a character the language has no use for (not a name, number or operator).
    private boolean strayCharacter(Span s) {
        String line = sources.line(s.file(), s.line());
        if (line == null || s.col() < 1 || s.col() > line.length()) {
            return false;
        }
        char c = line.charAt(s.col() - 1);
        return !Character.isLetterOrDigit(c) && c != '_' && "=<>!&|^~+-*/%()[]{},.:;\"#".indexOf(c) < 0
                && !Character.isWhitespace(c);
    }

    /**
     * The section of the statement at (line, col): its first word's, else the innermost open
     * block's that has one. Comments and strings are skipped; {@code ;} and newlines end statements.
     */
    String enclosing(Path file, int line, int col) {
        Deque<String> blocks = new ArrayDeque<>();
        String statement = null;
        for (int n = 1; n <= line; n++) {
            String text = sources.line(file, n);
            if (text == null) {
                break;
            }
            int end = n == line ? Math.min(text.length(), Math.max(0, col - 1)) : text.length();
            statement = null;
            boolean inString = false;
            for (int i = 0; i < end; i++) {
                char c = text.charAt(i);
                if (inString) {
                    inString = c != '"';
                } else if (c == '"') {
                    inString = true;
                } else if (c == '#') {
                    break;
                } else if (c == ';') {
                    statement = null;
                } else if (c == '{') {
                    blocks.push(statement == null ? "" : statement);
                    statement = null;
                } else if (c == '}') {
                    if (!blocks.isEmpty()) {
                        blocks.pop();
                    }
                    statement = null;
                } else if (statement == null && (Character.isLetter(c) || c == '_')) {
                    int j = i;
                    while (j < text.length() && (Character.isLetterOrDigit(text.charAt(j)) || text.charAt(j) == '_')) {
                        j++;
                    }
                    statement = text.substring(i, j);
                    i = j - 1;
                }
            }
        }
        if (statement == null) {
            // The error sits at the statement's start: read its first word from the line itself.
            String text = sources.line(file, line);
            if (text != null) {
                String t = text.strip();
                int j = 0;
                while (j < t.length() && (Character.isLetterOrDigit(t.charAt(j)) || t.charAt(j) == '_')) {
                    j++;
                }
                statement = t.substring(0, j);
            }
        }
        if (statement != null && ANCHORS.containsKey(statement)) {
            return ANCHORS.get(statement);
        }
        for (String b : blocks) {
            if (ANCHORS.containsKey(b)) {
                return ANCHORS.get(b);
            }
        }
        return null;
    }
}
