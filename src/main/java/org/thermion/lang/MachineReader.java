package org.thermion.lang;

import org.antlr.v4.runtime.BaseErrorListener;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Recognizer;
import org.antlr.v4.runtime.Token;
import org.thermion.lang.ast.SourceFile;
import org.thermion.lang.parser.MachineLexer;
import org.thermion.lang.parser.MachineParser;

import java.nio.file.Path;

/** Parses the text of a .machine file into an AST, reporting syntax errors as diagnostics. */
public final class MachineReader {
    private MachineReader() {
    }

    /** Parses {@code text}; syntax errors go into {@code diags}. The AST is returned even after errors. */
    public static SourceFile parse(Path file, String text, Diagnostics diags) {
        if (!NestingLimit.scan(file, text, '#', true, false, diags).isEmpty()) {
            return new SourceFile(file, java.util.List.of());
        }
        MachineLexer lexer = new MachineLexer(CharStreams.fromString(text, file.toString()));
        MachineParser parser = new MachineParser(new CommonTokenStream(lexer));
        SyntaxErrors listener = new SyntaxErrors(file, diags);
        lexer.removeErrorListeners();
        parser.removeErrorListeners();
        lexer.addErrorListener(listener);
        parser.addErrorListener(listener);
        MachineParser.FileContext tree = parser.file();
        if (listener.count > 0) {
            return new SourceFile(file, java.util.List.of());
        }
        return new AstBuilder(file, diags).file(tree);
    }

    /** Forwards ANTLR's complaints with our wording and a caret under the offending token. */
    static final class SyntaxErrors extends BaseErrorListener {
        private final Path file;
        private final Diagnostics diags;
        int count;

        SyntaxErrors(Path file, Diagnostics diags) {
            this.file = file;
            this.diags = diags;
        }

        @Override
        public void syntaxError(Recognizer<?, ?> recognizer, Object offending, int line, int col,
                                String msg, RecognitionException e) {
            count++;
            int len = 1;
            String found = null;
            if (offending instanceof Token t && t.getText() != null) {
                found = t.getType() == Token.EOF ? "end of file" : t.getText();
                len = Math.max(1, t.getText().length());
                if (t.getType() == MachineLexer.NL) {
                    found = "end of line";
                }
            }
            String context = null;
            if (recognizer instanceof org.antlr.v4.runtime.Parser p && p.getContext() != null) {
                context = SyntaxWording.ruleName(p.getRuleNames()[p.getContext().getRuleIndex()]);
            }
            String message = SyntaxWording.reword(msg, found, context);
            diags.error(new Span(file, line, col + 1, line, col + 1 + len), message, SyntaxWording.hint(msg));
        }
    }
}
