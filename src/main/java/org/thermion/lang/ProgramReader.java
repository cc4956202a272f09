package org.thermion.lang;

import org.antlr.v4.runtime.BaseErrorListener;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Recognizer;
import org.antlr.v4.runtime.Token;
import org.thermion.lang.ast.Ident;
import org.thermion.lang.parser.ProgramLexer;
import org.thermion.lang.parser.ProgramParser;
import org.thermion.lang.parser.ProgramParser.AddExprContext;
import org.thermion.lang.parser.ProgramParser.DirectiveStmtContext;
import org.thermion.lang.parser.ProgramParser.ExprContext;
import org.thermion.lang.parser.ProgramParser.InstructionStmtContext;
import org.thermion.lang.parser.ProgramParser.MulExprContext;
import org.thermion.lang.parser.ProgramParser.NameExprContext;
import org.thermion.lang.parser.ProgramParser.NegExprContext;
import org.thermion.lang.parser.ProgramParser.NumExprContext;
import org.thermion.lang.parser.ProgramParser.ParenExprContext;
import org.thermion.lang.program.AsmExpr;
import org.thermion.lang.program.ProgramLine;
import org.thermion.lang.program.ProgramSource;
import org.thermion.lang.program.Statement;

import java.math.BigInteger;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * Parses the text of an assembly program into {@link ProgramSource}. Each line is parsed on
 * its own, so every broken line gets its own syntax error and the others are still read.
 */
public final class ProgramReader {
    static final String SHAPE = "a line is [label:] MNEMONIC [operand] [; comment], or [label:] .DIRECTIVE ...";

    private final Path file;
    private final Diagnostics diags;

    private ProgramReader(Path file, Diagnostics diags) {
        this.file = file;
        this.diags = diags;
    }

    /** Parses {@code text}; syntax errors go into {@code diags}, unreadable lines carry no statement. */
    public static ProgramSource parse(Path file, String text, Diagnostics diags) {
        ProgramReader r = new ProgramReader(file, diags);
        List<String> lines = SourceSet.split(text);
        java.util.Set<Integer> tooDeep = NestingLimit.scan(file, text, ';', false, true, diags);
        List<ProgramLine> out = new ArrayList<>(lines.size());
        for (int i = 0; i < lines.size(); i++) {
            out.add(tooDeep.contains(i + 1) ? new ProgramLine(i + 1, lines.get(i), null, null) : r.line(i + 1, lines.get(i)));
        }
        return new ProgramSource(file, List.copyOf(out));
    }

    private ProgramLine line(int number, String text) {
        ProgramLexer lexer = new ProgramLexer(CharStreams.fromString(text, file.toString()));
        ProgramParser parser = new ProgramParser(new CommonTokenStream(lexer));
        LineErrors listener = new LineErrors(number);
        lexer.removeErrorListeners();
        parser.removeErrorListeners();
        lexer.addErrorListener(listener);
        parser.addErrorListener(listener);
        ProgramParser.LineContext ctx = parser.line();
        if (listener.reported) {
            return new ProgramLine(number, text, null, null);
        }
        Ident label = ctx.label == null ? null : ident(ctx.label, number);
        Statement stmt = null;
        try {
            if (ctx.stmt() instanceof InstructionStmtContext c) {
                stmt = new Statement.Op(ident(c.NAME().getSymbol(), number), c.expr() == null ? null : expr(c.expr(), number),
                        span(c, number));
            } else if (ctx.stmt() instanceof DirectiveStmtContext c) {
                Token d = c.DIRECTIVE().getSymbol();
                Ident word = new Ident(d.getText().substring(1), span(d, number));
                Ident name = c.NAME() == null ? null : ident(c.NAME().getSymbol(), number);
                stmt = new Statement.Directive(word, name, c.expr() == null ? null : expr(c.expr(), number), span(c, number));
            }
        } catch (BadNumber e) {
            return new ProgramLine(number, text, label, null);
        }
        return new ProgramLine(number, text, label, stmt);
    }

    /** Binary chains are left-deep: their left spine is walked in a loop (see the description's reader). */
    private AsmExpr expr(ExprContext ctx, int line) {
        Deque<ExprContext> spine = new ArrayDeque<>();
        ExprContext cur = ctx;
        while (cur instanceof MulExprContext || cur instanceof AddExprContext) {
            spine.push(cur);
            cur = cur.getChild(ExprContext.class, 0);
        }
        AsmExpr acc = operand(cur, line);
        while (!spine.isEmpty()) {
            ExprContext b = spine.pop();
            Token op = b instanceof MulExprContext m ? m.op : ((AddExprContext) b).op;
            acc = new AsmExpr.Bin(op.getText().charAt(0), acc, expr(b.getChild(ExprContext.class, 1), line), span(b, line));
        }
        return acc;
    }

    private AsmExpr operand(ExprContext ctx, int line) {
        if (ctx instanceof ParenExprContext c) {
            return expr(c.expr(), line);
        }
        if (ctx instanceof NegExprContext c) {
            return new AsmExpr.Neg(expr(c.expr(), line), span(c, line));
        }
        if (ctx instanceof NameExprContext c) {
            return new AsmExpr.Name(ident(c.NAME().getSymbol(), line));
        }
        NumExprContext c = (NumExprContext) ctx;
        return new AsmExpr.Num(number(c.NUMBER().getSymbol(), line), span(c, line));
    }

    /** Decimal, {@code 0x} hex or {@code 0b} binary, with optional {@code _} separators. */
    private long number(Token t, int line) {
        String s = t.getText().replace("_", "");
        int radix = 10;
        if (s.length() > 1 && (s.charAt(1) == 'x' || s.charAt(1) == 'X')) {
            radix = 16;
            s = s.substring(2);
        } else if (s.length() > 1 && (s.charAt(1) == 'b' || s.charAt(1) == 'B')) {
            radix = 2;
            s = s.substring(2);
        }
        String digits = radix == 16 ? "[0-9a-fA-F]+" : radix == 2 ? "[01]+" : "[0-9]+";
        if (!s.matches(digits)) {
            String kind = radix == 16 ? "hexadecimal" : radix == 2 ? "binary" : "decimal";
            diags.error(span(t, line), "'" + t.getText() + "' is not a " + kind + " number",
                    "write numbers as 31, 0x1F or 0b11111 (underscores may separate digits)");
            throw new BadNumber();
        }
        BigInteger v = new BigInteger(s, radix);
        if (v.bitLength() > 62) {
            diags.error(span(t, line), "number '" + t.getText() + "' is too large", "ROM words and addresses are far smaller");
            throw new BadNumber();
        }
        return v.longValue();
    }

    private Ident ident(Token t, int line) {
        return new Ident(t.getText(), span(t, line));
    }

    private Span span(Token t, int line) {
        int len = t.getText() == null ? 1 : Math.max(1, t.getText().length());
        return new Span(file, line, t.getCharPositionInLine() + 1, line, t.getCharPositionInLine() + 1 + len);
    }

    private Span span(ParserRuleContext ctx, int line) {
        Token a = ctx.getStart();
        Token b = ctx.getStop() == null || ctx.getStop().getTokenIndex() < a.getTokenIndex() ? a : ctx.getStop();
        int len = b.getText() == null ? 1 : Math.max(1, b.getText().length());
        return new Span(file, line, a.getCharPositionInLine() + 1, line, b.getCharPositionInLine() + 1 + len);
    }

    /** ANTLR's message in the tool's words; a line's end of input is the end of the line. */
    static String reword(String msg, String found) {
        String what = found == null ? "input" : "end of line".equals(found) ? found : "'" + found + "'";
        if (msg.startsWith("token recognition error at: ")) {
            return "unexpected character " + msg.substring("token recognition error at: ".length());
        }
        if (msg.startsWith("mismatched input") || msg.startsWith("extraneous input")) {
            int exp = msg.indexOf(" expecting ");
            if (exp < 0) {
                return "syntax error: unexpected " + what;
            }
            String expected = msg.substring(exp + " expecting ".length()).replace("{", "").replace("}", "")
                    .replace("<EOF>", "end of line").replace("DIRECTIVE", "a directive").replace("NAME", "a name")
                    .replace("NUMBER", "a number");
            return "syntax error: unexpected " + what + ", expected " + expected;
        }
        if (msg.startsWith("missing ")) {
            int at = msg.indexOf(" at ");
            return "syntax error: " + (at >= 0 ? msg.substring(0, at) : msg).replace("<EOF>", "end of line") + " here";
        }
        if (msg.startsWith("no viable alternative")) {
            return "syntax error: cannot make sense of " + what + " here";
        }
        return "syntax error: " + msg.replace("<EOF>", "end of line");
    }

    /** A number the reader already reported; the line is dropped. */
    private static final class BadNumber extends RuntimeException {
        BadNumber() {
            super(null, null, false, false);
        }
    }

    /** Keeps the first syntax error of a line, worded like the machine reader's. */
    private final class LineErrors extends BaseErrorListener {
        private final int line;
        boolean reported;

        LineErrors(int line) {
            this.line = line;
        }

        @Override
        public void syntaxError(Recognizer<?, ?> recognizer, Object offending, int l, int col,
                                String msg, RecognitionException e) {
            if (reported) {
                return;
            }
            reported = true;
            int len = 1;
            String found = null;
            if (offending instanceof Token t && t.getText() != null) {
                found = t.getType() == Token.EOF ? "end of line" : t.getText();
                len = t.getType() == Token.EOF ? 1 : Math.max(1, t.getText().length());
            }
            diags.error(new Span(file, line, col + 1, line, col + 1 + len), reword(msg, found), SHAPE);
        }
    }
}
