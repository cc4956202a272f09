package org.thermion.lang;

import org.antlr.v4.runtime.BaseErrorListener;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Recognizer;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.TokenStream;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.SourceFile;
import org.thermion.lang.parser.MachineLexer;
import org.thermion.lang.parser.MachineParser;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Parses the text of a .machine file into an AST, reporting syntax errors as diagnostics.
 * After a syntax error each top-level declaration is parsed again on its own ({@link Chunks});
 * for each broken declaration its first error is reported and the next real one (found with
 * the first error's line blanked), and no train of follow-on errors from the parser losing its place.
 * The declarations that parse are kept, and each broken one becomes a {@link Decl.Rejected}, so
 * that elaboration still checks the rest of the description in the same run.
 */
public final class MachineReader {
    private MachineReader() {
    }

    /**
     * Parses {@code text}; syntax errors go into {@code diags}. After errors the AST holds the
     * declarations that parse on their own and a {@link Decl.Rejected} for each that does not.
     */
    public static SourceFile parse(Path file, String text, Diagnostics diags) {
        if (!NestingLimit.scan(file, text, '#', true, false, diags).isEmpty()) {
            return new SourceFile(file, List.of());
        }
        List<Diagnostic> errors = new ArrayList<>();
        MachineParser.FileContext tree = parse(file, text, 1, true, errors);
        if (errors.isEmpty()) {
            return new AstBuilder(file, diags).file(tree);
        }
        int reported = 0;
        List<Decl> kept = new ArrayList<>();
        List<Chunks.Chunk> chunks = Chunks.of(text);
        for (Chunks.Chunk c : chunks) {
            List<Diagnostic> own = new ArrayList<>();
            String chunk = text.substring(c.start(), c.end());
            boolean last = c.end() == text.length();
            MachineParser.FileContext part = parse(file, chunk, c.line(), last, own);
            if (own.isEmpty()) {
                kept.addAll(new AstBuilder(file, diags).file(part).decls());
            } else {
                kept.add(rejected(file, chunk, c.line()));
                Diagnostic first = own.get(0);
                diags.add(first);
                reported++;
                // The next real error: the same declaration with the offending line blanked
                // (its braces kept, so the block structure stays), if it is on a later line.
                List<Diagnostic> next = new ArrayList<>();
                parse(file, blankLine(chunk, first.span().line() - c.line()), c.line(), last, next);
                if (!next.isEmpty() && next.get(0).span().line() > first.span().line()) {
                    diags.add(next.get(0));
                }
            }
        }
        if (reported == 0) {
            // The declarations parse alone but not together: nothing of the file is trusted.
            diags.add(errors.get(0));
            return new SourceFile(file, List.of());
        }
        return new SourceFile(file, List.copyOf(kept));
    }

    /** A broken declaration by its first two words ({@code stage inverter}), read from its first line of code. */
    static Decl.Rejected rejected(Path file, String chunk, int firstLine) {
        String[] lines = chunk.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String code = lines[i];
            int hash = code.indexOf('#');
            code = hash < 0 ? code : code.substring(0, hash);
            java.util.regex.Matcher m = FIRST_WORDS.matcher(code);
            if (m.lookingAt()) {
                int col = m.start(1) + 1;
                return new Decl.Rejected(m.group(1), m.group(2) == null ? "" : m.group(2),
                        new Span(file, firstLine + i, col, firstLine + i, col + m.group(1).length()));
            }
            if (!code.isBlank()) {
                break;
            }
        }
        return new Decl.Rejected("", "", new Span(file, firstLine, 1, firstLine, 2));
    }

    private static final java.util.regex.Pattern FIRST_WORDS =
            java.util.regex.Pattern.compile("\\s*([A-Za-z_]\\w*)(?:[ \\t]+([A-Za-z0-9_]\\w*))?");

    /** {@code text} with every character of its {@code index}-th line (0-based) but braces made a space. */
    static String blankLine(String text, int index) {
        int start = 0;
        for (int i = 0; i < index && start >= 0; i++) {
            start = text.indexOf('\n', start) + 1;
            start = start == 0 ? -1 : start;
        }
        if (start < 0) {
            return text;
        }
        int end = text.indexOf('\n', start);
        end = end < 0 ? text.length() : end;
        StringBuilder b = new StringBuilder(text);
        for (int k = start; k < end; k++) {
            char ch = b.charAt(k);
            if (ch != '{' && ch != '}') {
                b.setCharAt(k, ' ');
            }
        }
        return b.toString();
    }

    /** {@code last}: the text runs to the end of the file (else its end is where the next declaration begins). */
    private static MachineParser.FileContext parse(Path file, String text, int firstLine, boolean last, List<Diagnostic> errors) {
        MachineLexer lexer = new MachineLexer(CharStreams.fromString(text, file.toString()));
        lexer.setLine(firstLine);
        MachineParser parser = new MachineParser(new CommonTokenStream(lexer));
        SyntaxErrors listener = new SyntaxErrors(file, last ? "end of file" : "the next declaration", errors);
        lexer.removeErrorListeners();
        parser.removeErrorListeners();
        lexer.addErrorListener(listener);
        parser.addErrorListener(listener);
        return parser.file();
    }

    /** Forwards ANTLR's complaints with our wording and a caret under the offending token. */
    static final class SyntaxErrors extends BaseErrorListener {
        private final Path file;
        private final List<Diagnostic> errors;
        private final String end;

        SyntaxErrors(Path file, String end, List<Diagnostic> errors) {
            this.file = file;
            this.end = end;
            this.errors = errors;
        }

        @Override
        public void syntaxError(Recognizer<?, ?> recognizer, Object offending, int line, int col,
                                String msg, RecognitionException e) {
            int len = 1;
            String found = null;
            if (offending instanceof Token t && t.getText() != null) {
                found = t.getType() == Token.EOF ? end : t.getText();
                len = Math.max(1, t.getText().length());
                if (t.getType() == MachineLexer.NL) {
                    found = "end of line";
                    len = 1;
                }
                if (t.getType() == Token.EOF && recognizer instanceof org.antlr.v4.runtime.Parser p) {
                    // The end of the file is just after its last token, not on the empty line after it.
                    Token last = lastToken(p.getInputStream(), t.getTokenIndex());
                    if (last != null) {
                        line = last.getLine();
                        col = last.getCharPositionInLine() + firstLineLength(last.getText());
                        len = 1;
                    }
                }
            }
            String context = null;
            if (recognizer instanceof org.antlr.v4.runtime.Parser p && p.getContext() != null) {
                context = SyntaxWording.ruleName(p.getRuleNames()[p.getContext().getRuleIndex()]);
            }
            boolean atEnd = offending instanceof Token t && t.getType() == Token.EOF;
            String message = atEnd && !msg.startsWith("missing ")
                    ? "syntax error: " + ("end of file".equals(end) ? "the file ends" : "the next declaration begins")
                            + " before the block is closed"
                    : SyntaxWording.reword(msg.replace("<EOF>", end), found, context);
            String hint = atEnd ? "check that every '{' has its '}'" : SyntaxWording.hint(msg);
            errors.add(Diagnostic.error(new Span(file, line, col + 1, line, col + 1 + len), message, hint));
        }

        private static Token lastToken(TokenStream tokens, int eof) {
            for (int i = eof - 1; i >= 0; i--) {
                Token t = tokens.get(i);
                if (t.getType() != MachineLexer.NL && t.getChannel() == Token.DEFAULT_CHANNEL) {
                    return t;
                }
            }
            return null;
        }

        private static int firstLineLength(String text) {
            int nl = text.indexOf('\n');
            return nl < 0 ? text.length() : nl;
        }
    }
}
