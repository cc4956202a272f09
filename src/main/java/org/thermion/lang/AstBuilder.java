package org.thermion.lang;

import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.Token;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.Expr;
import org.thermion.lang.ast.Ident;
import org.thermion.lang.ast.Index;
import org.thermion.lang.ast.IsaOp;
import org.thermion.lang.ast.ModuleStmt;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.RtExpr;
import org.thermion.lang.ast.RtStmt;
import org.thermion.lang.ast.SourceFile;
import org.thermion.lang.ast.Value;
import org.thermion.lang.parser.MachineParser;
import org.thermion.lang.parser.MachineParser.*;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.function.BiFunction;
import java.util.function.Function;

/** Turns a parse tree into immutable AST records; the parse tree goes no further. */
final class AstBuilder {
    private final Path file;
    private final Diagnostics diags;

    AstBuilder(Path file, Diagnostics diags) {
        this.file = file;
        this.diags = diags;
    }

    SourceFile file(FileContext ctx) {
        List<Decl> decls = new ArrayList<>();
        for (DeclContext d : ctx.decl()) {
            Decl decl = decl(d);
            if (decl != null) {
                decls.add(decl);
            }
        }
        return new SourceFile(file, decls);
    }

    private Decl decl(DeclContext ctx) {
        if (ctx instanceof IncludeDeclContext c) {
            return new Decl.Include(unquote(c.STRING().getText()), span(c));
        }
        if (ctx instanceof ModuleDeclContext c) {
            return new Decl.Module(ident(c.ident()), moduleBody(c.moduleBody()), span(c));
        }
        if (ctx instanceof IsaDeclContext c) {
            List<Prop> props = new ArrayList<>();
            List<IsaOp> ops = new ArrayList<>();
            for (IstmtContext s : c.isaBody().istmt()) {
                if (s instanceof OpStmtContext o) {
                    ops.add(new IsaOp(ident(o.ident()), expr(o.expr()), rbody(o.rbody()), span(o)));
                } else if (s instanceof IsaPropStmtContext p) {
                    props.add(prop(p.prop()));
                }
            }
            Ident name = c.ident() == null ? new Ident("isa", span(c)) : ident(c.ident());
            return new Decl.Isa(name, props, ops, span(c));
        }
        if (ctx instanceof PropDeclContext c) {
            return new Decl.PropDecl(prop(c.prop()));
        }
        return null;
    }

    private Prop prop(PropContext ctx) {
        List<Value> values = new ArrayList<>();
        for (ValueContext v : ctx.value()) {
            values.add(value(v));
        }
        List<Prop> block = new ArrayList<>();
        if (ctx.propBlock() != null) {
            for (PropContext p : ctx.propBlock().prop()) {
                block.add(prop(p));
            }
        }
        return new Prop(ident(ctx.ident()), values, block, ctx.propBlock() != null, span(ctx));
    }

    private Value value(ValueContext v) {
        Span s = span(v);
        if (v.NUMBER() != null) {
            return new Value.Num(v.getText(), s);
        }
        if (v.ident() != null || v.keyword() != null) {
            return new Value.Word(v.getText(), s);
        }
        if (v.STRING() != null) {
            return new Value.Str(unquote(v.getText()), s);
        }
        return new Value.Sym(v.getText(), s);
    }

    private List<ModuleStmt> moduleBody(ModuleBodyContext ctx) {
        List<ModuleStmt> out = new ArrayList<>();
        if (ctx == null) {
            return out;
        }
        for (MstmtContext m : ctx.mstmt()) {
            ModuleStmt s = mstmt(m);
            if (s != null) {
                out.add(s);
            }
        }
        return out;
    }

    private ModuleStmt mstmt(MstmtContext ctx) {
        Span s = span(ctx);
        if (ctx instanceof PortsStmtContext c) {
            ModuleStmt.Dir dir = c.dir.getType() == MachineParser.IN ? ModuleStmt.Dir.IN : ModuleStmt.Dir.OUT;
            List<ModuleStmt.Declared> ports = new ArrayList<>();
            for (PortDeclContext p : c.portDecl()) {
                ports.add(new ModuleStmt.Declared(ident(p.ident()), width(p.width()), span(p)));
            }
            return new ModuleStmt.Ports(dir, ports, s);
        }
        if (ctx instanceof NetStmtContext c) {
            List<ModuleStmt.Declared> nets = new ArrayList<>();
            for (NetDeclContext p : c.netDecl()) {
                nets.add(new ModuleStmt.Declared(ident(p.ident()), width(p.width()), span(p)));
            }
            return new ModuleStmt.Nets(nets, c.expr() == null ? null : expr(c.expr()), s);
        }
        if (ctx instanceof ConstStmtContext c) {
            return new ModuleStmt.Const(ident(c.ident()), expr(c.expr()), s);
        }
        if (ctx instanceof LatchStmtContext c) {
            List<ExprContext> es = c.expr();
            int at = 0;
            Expr phase = c.PHASE() != null ? expr(es.get(at++)) : null;
            Expr enable = c.WHEN() != null ? expr(es.get(at)) : null;
            Expr data = expr(es.get(es.size() - 1));
            Ident stage = c.USING() != null ? ident(c.ident(1)) : null;
            return new ModuleStmt.Latch(ident(c.ident(0)), width(c.width()), phase, enable, stage, data, s);
        }
        if (ctx instanceof AssignStmtContext c) {
            LvalueContext l = c.lvalue();
            return new ModuleStmt.Assign(ident(l.ident()), index(l.index()), expr(c.expr()), s);
        }
        if (ctx instanceof UseStmtContext c) {
            List<ModuleStmt.Conn> conns = new ArrayList<>();
            for (ConnContext k : c.conn()) {
                conns.add(new ModuleStmt.Conn(ident(k.ident()), expr(k.expr()), span(k)));
            }
            return new ModuleStmt.Use(ident(c.ident(0)), ident(c.ident(1)), conns, s);
        }
        if (ctx instanceof ForStmtContext c) {
            return new ModuleStmt.For(ident(c.ident()), expr(c.expr(0)), expr(c.expr(1)),
                    moduleBody(c.moduleBody()), s);
        }
        return null;
    }

    private Expr width(WidthContext w) {
        return w == null ? null : expr(w.expr());
    }

    private Index index(IndexContext i) {
        if (i == null) {
            return null;
        }
        Expr hi = expr(i.expr(0));
        Expr lo = i.expr().size() > 1 ? expr(i.expr(1)) : null;
        return new Index(hi, lo, span(i));
    }

    /**
     * Binary operators associate to the left, so a long chain is a left-deep tree: its left spine
     * is walked in a loop, and recursion goes only as deep as brackets and precedence levels
     * (bounded by {@link NestingLimit}), not as long as the chain.
     */
    private Expr expr(ExprContext ctx) {
        return leftDeep(ctx, AstBuilder::leftOperand, this::operand,
                (b, acc) -> new Expr.Bin(binOp(b), acc, expr(b.getChild(ExprContext.class, 1)), span(b)));
    }

    /**
     * A left-associative chain from its parse tree: the left spine ({@code left} gives a node's left
     * operand, null below the chain) walked in a loop from the innermost operand outwards, each
     * node joined to what is built so far by {@code join}.
     */
    private static <C, T> T leftDeep(C ctx, Function<C, C> left, Function<C, T> operand, BiFunction<C, T, T> join) {
        Deque<C> spine = new ArrayDeque<>();
        C cur = ctx;
        while (left.apply(cur) != null) {
            spine.push(cur);
            cur = left.apply(cur);
        }
        T acc = operand.apply(cur);
        while (!spine.isEmpty()) {
            acc = join.apply(spine.pop(), acc);
        }
        return acc;
    }

    /** The left operand of a binary expression, null for any other kind. */
    private static ExprContext leftOperand(ExprContext ctx) {
        boolean binary = ctx instanceof MulExprContext || ctx instanceof AddExprContext || ctx instanceof EqExprContext
                || ctx instanceof AndExprContext || ctx instanceof XorExprContext || ctx instanceof OrExprContext;
        return binary ? ctx.getChild(ExprContext.class, 0) : null;
    }

    private static Expr.BinOp binOp(ExprContext ctx) {
        if (ctx instanceof MulExprContext c) {
            return switch (c.op.getText()) {
                case "*" -> Expr.BinOp.MUL;
                case "/" -> Expr.BinOp.DIV;
                default -> Expr.BinOp.MOD;
            };
        }
        if (ctx instanceof AddExprContext c) {
            return c.op.getText().equals("+") ? Expr.BinOp.ADD : Expr.BinOp.SUB;
        }
        if (ctx instanceof EqExprContext) {
            return Expr.BinOp.EQ;
        }
        if (ctx instanceof AndExprContext) {
            return Expr.BinOp.AND;
        }
        return ctx instanceof XorExprContext ? Expr.BinOp.XOR : Expr.BinOp.OR;
    }

    /** Everything but a binary operator. */
    private Expr operand(ExprContext ctx) {
        Span s = span(ctx);
        if (ctx instanceof ParenExprContext c) {
            return expr(c.expr());
        }
        if (ctx instanceof NotExprContext c) {
            return new Expr.Not(expr(c.expr()), s);
        }
        if (ctx instanceof NegExprContext c) {
            return new Expr.Neg(expr(c.expr()), s);
        }
        if (ctx instanceof CallExprContext c) {
            List<Expr> args = new ArrayList<>();
            for (ExprContext e : c.expr()) {
                args.add(expr(e));
            }
            return new Expr.Call(ident(c.ident()), args, s);
        }
        if (ctx instanceof RefExprContext c) {
            return new Expr.Ref(ident(c.ident()), index(c.index()), s);
        }
        if (ctx instanceof NumExprContext c) {
            return new Expr.Num(parseNumber(c.NUMBER().getSymbol()), c.getText(), s);
        }
        if (ctx instanceof ConcatExprContext c) {
            List<Expr> parts = new ArrayList<>();
            for (ExprContext e : c.expr()) {
                parts.add(expr(e));
            }
            return new Expr.Concat(parts, s);
        }
        return new Expr.Num(0, "0", s);
    }

    private List<RtStmt> rbody(RbodyContext ctx) {
        List<RtStmt> out = new ArrayList<>();
        if (ctx == null) {
            return out;
        }
        for (RstmtContext r : ctx.rstmt()) {
            if (r instanceof RAssignContext a) {
                RtargetContext t = a.rtarget();
                boolean selected = t.getChildCount() == 3;
                out.add(new RtStmt.Assign(ident(t.ident()), selected, rexpr(a.rexpr()), span(a)));
            } else if (r instanceof RIfContext i) {
                List<RtStmt> otherwise = i.rbody().size() > 1 ? rbody(i.rbody(1)) : List.of();
                out.add(new RtStmt.If(rexpr(i.rexpr()), rbody(i.rbody(0)), otherwise, span(i)));
            }
        }
        return out;
    }

    /**
     * An instruction's meaning, built as {@link #expr} builds a description expression: the left
     * spine of a binary chain in a loop ({@link #leftDeep}), recursion only for brackets, prefix
     * operators and right operands (bounded by {@link NestingLimit}).
     */
    private RtExpr rexpr(RexprContext ctx) {
        return leftDeep(ctx, AstBuilder::rLeftOperand, this::rOperand,
                (b, acc) -> new RtExpr.Bin(rBinOp(b), acc, rexpr(b.getChild(RexprContext.class, 1)), span(b)));
    }

    /** The left operand of a binary meaning, null for any other kind. */
    private static RexprContext rLeftOperand(RexprContext ctx) {
        boolean binary = ctx instanceof RAddContext || ctx instanceof RAndContext || ctx instanceof RXorContext
                || ctx instanceof ROrContext;
        return binary ? ctx.getChild(RexprContext.class, 0) : null;
    }

    private static RtExpr.Op rBinOp(RexprContext ctx) {
        if (ctx instanceof RAddContext c) {
            return c.op.getText().equals("+") ? RtExpr.Op.PLUS : RtExpr.Op.MINUS;
        }
        if (ctx instanceof RAndContext) {
            return RtExpr.Op.AND;
        }
        return ctx instanceof RXorContext ? RtExpr.Op.XOR : RtExpr.Op.OR;
    }

    /** Everything in a meaning but a binary operator. */
    private RtExpr rOperand(RexprContext ctx) {
        Span s = span(ctx);
        if (ctx instanceof RParenContext c) {
            return rexpr(c.rexpr());
        }
        if (ctx instanceof RNotContext c) {
            return new RtExpr.Not(rexpr(c.rexpr()), s);
        }
        if (ctx instanceof RSelectContext c) {
            return new RtExpr.Select(ident(c.ident()), s);
        }
        if (ctx instanceof RRefContext c) {
            return new RtExpr.Ref(ident(c.ident()), s);
        }
        if (ctx instanceof RNumContext c) {
            return new RtExpr.Num(parseNumber(c.NUMBER().getSymbol()), s);
        }
        return new RtExpr.Num(0, s);
    }

    private Ident ident(IdentContext ctx) {
        return new Ident(ctx.getText(), span(ctx));
    }

    private long parseNumber(Token t) {
        String text = t.getText().replace("_", "");
        try {
            if (text.startsWith("0x")) {
                return Long.parseLong(text.substring(2), 16);
            }
            if (text.startsWith("0b")) {
                return Long.parseLong(text.substring(2), 2);
            }
            if (text.contains(".") || text.contains("e") || text.contains("E")) {
                diags.error(span(t), "expected a whole number here, found '" + t.getText() + "'",
                        "logic expressions use whole numbers; units belong in property lines");
                return 0;
            }
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            diags.error(span(t), "number '" + t.getText() + "' is too large", "use a value below 2^63");
            return 0;
        }
    }

    private Span span(ParserRuleContext ctx) {
        Token a = ctx.getStart();
        Token b = ctx.getStop() == null ? a : ctx.getStop();
        if (b.getTokenIndex() < a.getTokenIndex()) {
            b = a;
        }
        return new Span(file, a.getLine(), a.getCharPositionInLine() + 1, b.getLine(),
                b.getCharPositionInLine() + 1 + Math.max(1, b.getText() == null ? 1 : b.getText().length()));
    }

    Span span(Token t) {
        int len = t.getText() == null ? 1 : Math.max(1, t.getText().length());
        return new Span(file, t.getLine(), t.getCharPositionInLine() + 1, t.getLine(),
                t.getCharPositionInLine() + 1 + len);
    }

    private static String unquote(String s) {
        if (s.length() >= 2 && s.startsWith("\"") && s.endsWith("\"")) {
            s = s.substring(1, s.length() - 1);
        }
        return s.replace("\\\"", "\"").replace("\\\\", "\\");
    }
}
