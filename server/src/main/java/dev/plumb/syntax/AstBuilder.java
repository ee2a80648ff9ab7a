package dev.plumb.syntax;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Span;
import dev.plumb.grammar.PlumbLexer;
import dev.plumb.grammar.PlumbParser;
import dev.plumb.grammar.PlumbParserBaseVisitor;
import java.util.ArrayList;
import java.util.List;
import org.antlr.v4.runtime.CharStream;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.misc.Interval;
import org.antlr.v4.runtime.tree.TerminalNode;

/**
 * Turns the parse tree into the immutable AST; nothing above the syntax layer sees ANTLR.
 * The visit methods follow the grammar's rule order. Statements that hold a syntax error
 * become {@link Statement.Broken}.
 */
final class AstBuilder extends PlumbParserBaseVisitor<Object> {
    private final LineMap lines;
    private final SyntaxErrors errors;

    AstBuilder(LineMap lines, SyntaxErrors errors) {
        this.lines = lines;
        this.errors = errors;
    }

    /** The document's lines in order: statements, and block lines for {@link BlockGrouper}. */
    List<Object> document(PlumbParser.DocumentContext ctx, List<Token> tokens) {
        List<Object> out = new ArrayList<>();
        for (PlumbParser.LineContext line : ctx.line()) {
            PlumbParser.StatementContext s = line.statement();
            if (s == null || s.getStart() == null || s.getStart().getType() == Token.EOF) continue;
            int startCp = s.getStart().getStartIndex();
            int lineEndCp = lineEnd(s.getStart().getTokenIndex(), tokens);
            if (errors.anyWithin(startCp, lineEndCp)) {
                out.add(broken(s, tokens));
            } else {
                Object made = visit(s);
                // A several-unknown solve is one statement per unknown.
                if (made instanceof List<?> several) out.addAll(several);
                else out.add(made);
            }
        }
        return out;
    }

    /** Code-point index of the NEWLINE (or EOF) that ends the statement starting at a token. */
    private static int lineEnd(int tokenIndex, List<Token> tokens) {
        for (int i = tokenIndex; i < tokens.size(); i++) {
            Token t = tokens.get(i);
            boolean terminator = (t.getType() == PlumbLexer.NEWLINE && t.getChannel() == Token.DEFAULT_CHANNEL)
                || t.getType() == Token.EOF;
            if (terminator) return t.getStartIndex();
        }
        return Integer.MAX_VALUE;
    }

    private Statement broken(PlumbParser.StatementContext s, List<Token> tokens) {
        List<Token> head = new ArrayList<>(3);
        for (int i = s.getStart().getTokenIndex(); i < tokens.size() && head.size() < 3; i++) {
            Token t = tokens.get(i);
            if (t.getChannel() == Token.DEFAULT_CHANNEL) head.add(t);
        }
        return new Statement.Broken(span(s), StatementTokens.nameFromHead(head, lines));
    }

    // ---- statements ------------------------------------------------------------------

    @Override
    public Object visitStatement(PlumbParser.StatementContext ctx) {
        return visit(ctx.getChild(0));
    }

    @Override
    public Object visitHeader(PlumbParser.HeaderContext ctx) {
        return new Statement.Header(span(ctx), ctx.key.getText(), unquote(ctx.STRING().getText()));
    }

    @Override
    public Object visitNarrative(PlumbParser.NarrativeContext ctx) {
        String text = ctx.NARRATIVE().getText().substring(1);
        return new Statement.Narrative(span(ctx), text.startsWith(" ") ? text.substring(1) : text);
    }

    @Override
    public Object visitSection(PlumbParser.SectionContext ctx) {
        return new Statement.Section(span(ctx), unquote(ctx.STRING().getText()));
    }

    @Override
    public Object visitUseFile(PlumbParser.UseFileContext ctx) {
        TerminalNode path = ctx.STRING();
        return new Statement.Use(span(ctx), unquote(path.getText()), span(path.getSymbol()));
    }

    @Override
    public Object visitInput(PlumbParser.InputContext ctx) {
        Statement.Definition d = (Statement.Definition) definition(ctx, true, ctx.name(), expr(ctx.expr()), ctx.tail());
        if (ctx.tolerance() == null) return d;
        Statement.Tolerance t = new Statement.Tolerance(span(ctx.tolerance()), expr(ctx.tolerance().expr()));
        return new Statement.Definition(d.span(), true, d.name(), d.expr(), d.displayUnit(), d.basis(), d.note(), t);
    }

    @Override
    public Object visitFunctionDef(PlumbParser.FunctionDefContext ctx) {
        List<PlumbParser.NameContext> names = ctx.name();
        List<Ident> params = new ArrayList<>();
        for (int i = 1; i < names.size(); i++) params.add(ident(names.get(i)));
        return new Statement.Function(span(ctx), ident(names.get(0)), params, value(ctx.value()), note(ctx.note()));
    }

    @Override
    public Object visitDefinition(PlumbParser.DefinitionContext ctx) {
        return definition(ctx, false, ctx.name(), value(ctx.value()), ctx.tail());
    }

    private Statement definition(ParserRuleContext ctx, boolean input, PlumbParser.NameContext name,
                                 Expr expr, PlumbParser.TailContext tail) {
        UnitText unit = tail.UNIT() == null ? null : unitText(tail.UNIT().getSymbol());
        Ident basis = tail.name() == null ? null : ident(tail.name());
        return new Statement.Definition(span(ctx), input, ident(name), expr, unit, basis, note(tail.note()));
    }

    /**
     * A formula, or a piecewise one read branch by branch: an expression followed by `when` is a
     * branch; one after `otherwise` with no `when`, or before a closing `otherwise`, is the last.
     */
    private Expr value(PlumbParser.ValueContext ctx) {
        if (ctx.WHEN().isEmpty()) return expr(ctx.expr(0));
        List<Statement.Piece> pieces = new ArrayList<>();
        Expr pending = null;
        for (int i = 0; i < ctx.getChildCount(); i++) {
            var child = ctx.getChild(i);
            if (child instanceof PlumbParser.ExprContext e) {
                pending = expr(e);
            } else if (child instanceof PlumbParser.ConditionContext c) {
                Statement.Bound when = bound(c, c.expr(), c.comparator());
                pieces.add(new Statement.Piece(Span.cover(pending.span(), when.span()), pending, when, false));
                pending = null;
            } else if (child instanceof TerminalNode t && t.getSymbol().getType() == PlumbLexer.OTHERWISE && pending != null) {
                pieces.add(new Statement.Piece(Span.cover(pending.span(), span(t.getSymbol())), pending, null, true));
                pending = null;
            }
        }
        if (pending != null) pieces.add(new Statement.Piece(pending.span(), pending, null, true));
        Span all = Span.cover(pieces.get(0).span(), pieces.get(pieces.size() - 1).span());
        return new Expr.Piecewise(all, pieces);
    }

    @Override
    public Object visitCheck(PlumbParser.CheckContext ctx) {
        Statement.Bound chain = bound(ctx, ctx.expr(), ctx.comparator());
        return new Statement.Check(span(ctx), chain.operands(), chain.comparators(), note(ctx.note()), ctx.WITH() != null);
    }

    private Statement.Bound bound(ParserRuleContext ctx, List<PlumbParser.ExprContext> exprs,
                                  List<PlumbParser.ComparatorContext> ops) {
        List<Expr> operands = new ArrayList<>();
        for (PlumbParser.ExprContext e : exprs) operands.add(expr(e));
        List<Comparator> comparators = new ArrayList<>();
        for (PlumbParser.ComparatorContext c : ops) comparators.add(comparator(c.getStart()));
        Span span = Span.cover(operands.get(0).span(), operands.get(operands.size() - 1).span());
        return new Statement.Bound(span, operands, comparators);
    }

    @Override
    public Object visitSeek(PlumbParser.SeekContext ctx) {
        List<PlumbParser.ExprContext> e = ctx.expr();
        boolean range = ctx.IN() != null;
        Expr low = range ? expr(e.get(0)) : null;
        Expr high = range ? expr(e.get(1)) : null;
        Expr start = range ? null : expr(e.get(0));
        int k = range ? 2 : 1;
        Expr lhs = expr(e.get(k));
        Expr rhs = expr(e.get(k + 1));
        PlumbParser.TailContext tail = ctx.tail();
        UnitText unit = tail.UNIT() == null ? null : unitText(tail.UNIT().getSymbol());
        Ident basis = tail.name() == null ? null : ident(tail.name());
        return new Statement.Seek(span(ctx), ident(ctx.name()), low, high, start, lhs, rhs,
            Span.cover(lhs.span(), rhs.span()), unit, basis, note(tail.note()));
    }

    /** One statement per unknown, sharing what was written (see {@link Statement.SeekSystem}). */
    @Override
    public Object visitSeekSystem(PlumbParser.SeekSystemContext ctx) {
        List<Ident> unknowns = new ArrayList<>();
        for (PlumbParser.NameContext n : ctx.name()) unknowns.add(ident(n));
        List<Expr> starts = new ArrayList<>();
        for (PlumbParser.ExprContext e : ctx.expr()) starts.add(expr(e));
        List<Expr> lows = new ArrayList<>();
        List<Expr> highs = new ArrayList<>();
        for (PlumbParser.BracketContext b : ctx.bracket()) {
            lows.add(expr(b.expr(0)));
            highs.add(expr(b.expr(1)));
        }
        List<Statement.Equation> equations = new ArrayList<>();
        for (PlumbParser.EquationContext q : ctx.equation()) {
            Expr lhs = expr(q.expr(0));
            Expr rhs = expr(q.expr(1));
            equations.add(new Statement.Equation(Span.cover(lhs.span(), rhs.span()), lhs, rhs));
        }
        Statement.Equations system = new Statement.Equations(unknowns, starts, lows, highs, equations, note(ctx.note()));
        List<Statement> out = new ArrayList<>();
        for (int i = 0; i < unknowns.size(); i++) out.add(new Statement.SeekSystem(span(ctx), unknowns.get(i), i, system));
        return out;
    }

    /** One statement for the time and one per state, sharing what was written (see {@link Statement.Evolve}). */
    @Override
    public Object visitEvolve(PlumbParser.EvolveContext ctx) {
        List<PlumbParser.NameContext> names = ctx.name();
        int overAt = ctx.OVER().getSymbol().getTokenIndex();
        List<Ident> states = new ArrayList<>();
        List<Ident> drawn = new ArrayList<>();
        Ident time = null;
        for (PlumbParser.NameContext n : names) {
            if (n.getStart().getTokenIndex() < overAt) states.add(ident(n));
            else if (time == null) time = ident(n);
            else drawn.add(ident(n));
        }
        List<PlumbParser.ExprContext> e = ctx.expr();
        int timeAt = overAt;
        List<Expr> starts = new ArrayList<>();
        List<Expr> rates = new ArrayList<>();
        int k = 0;
        while (k < e.size() && e.get(k).getStart().getTokenIndex() < timeAt) starts.add(expr(e.get(k++)));
        int untilAt = ctx.UNTIL().getSymbol().getTokenIndex();
        while (k < e.size() && e.get(k).getStart().getTokenIndex() < untilAt) rates.add(expr(e.get(k++)));
        Expr left = expr(e.get(k));
        Expr right = expr(e.get(k + 1));
        Expr every = ctx.EVERY() != null ? expr(e.get(k + 2)) : null;
        Statement.Motion motion = new Statement.Motion(time, states, starts, rates, left,
            comparator(ctx.comparator().getStart()), right, Span.cover(left.span(), right.span()), every, drawn,
            note(ctx.note()));
        List<Statement> out = new ArrayList<>();
        List<Ident> all = motion.names();
        for (int i = 0; i < all.size(); i++) out.add(new Statement.Evolve(span(ctx), all.get(i), i, motion));
        return out;
    }

    @Override
    public Object visitTransition(PlumbParser.TransitionContext ctx) {
        Token n = ctx.NUMBER().getSymbol();
        return new Statement.Transition(span(ctx), ident(ctx.name()), Double.parseDouble(n.getText()), span(n),
            note(ctx.note()));
    }

    @Override
    public Object visitSweep(PlumbParser.SweepContext ctx) {
        Statement.SweepAxis first = axis(ctx.axis(0));
        Statement.SweepAxis across = ctx.across == null ? null : axis(ctx.across);
        List<Statement.Shown> shown = new ArrayList<>();
        for (PlumbParser.ShownContext s : ctx.shown()) {
            shown.add(new Statement.Shown(ident(s.name()), s.UNIT() == null ? null : unitText(s.UNIT().getSymbol())));
        }
        return new Statement.Sweep(span(ctx), first.name(), first.from(), first.to(), first.step(), first.count(),
            first.countSpan(), first.spacing(), across, shown, note(ctx.note()));
    }

    private Statement.SweepAxis axis(PlumbParser.AxisContext ctx) {
        List<PlumbParser.ExprContext> e = ctx.expr();
        Expr step = ctx.BY() != null ? expr(e.get(2)) : null;
        Integer count = null;
        Span countSpan = null;
        if (ctx.NUMBER() != null) {
            Token n = ctx.NUMBER().getSymbol();
            countSpan = span(n);
            double written = Double.parseDouble(n.getText());
            // A count is a whole number of values; anything else is the engine's to refuse with its words.
            count = written == Math.rint(written) && written <= Integer.MAX_VALUE ? (int) written : -1;
        }
        return new Statement.SweepAxis(ident(ctx.varied), expr(e.get(0)), expr(e.get(1)), step, count, countSpan,
            ctx.spacing == null ? null : ident(ctx.spacing));
    }

    @Override
    public Object visitCaseDef(PlumbParser.CaseDefContext ctx) {
        List<Statement.Setting> settings = new ArrayList<>();
        for (PlumbParser.SettingContext s : ctx.setting()) settings.add(new Statement.Setting(ident(s.name()), expr(s.expr())));
        return new Statement.Case(span(ctx), ident(ctx.label), settings, note(ctx.note()));
    }

    /** The former `find … within … so that …`: an error that shows the statement in today's words. */
    @Override
    public Object visitAccept(PlumbParser.AcceptContext ctx) {
        PlumbParser.FindingCodeContext c = ctx.findingCode();
        Span code = span(c);
        // As written, blanks included: `range . outside` is no code.
        String written = c.getStart().getInputStream()
            .getText(Interval.of(c.getStart().getStartIndex(), c.getStop().getStopIndex()));
        String reason = note(ctx.note());
        if (reason == null || reason.isBlank()) {
            Span where = ctx.note() == null ? new Span(span(ctx).end(), span(ctx).end()) : span(ctx.note());
            errors.add(Diagnostic.of(Code.SYNTAX_ERROR, where, "an acceptance needs its reason, in quotes: write why this "
                + "finding is acceptable, e.g. `accept " + written + " at " + ctx.name().getText()
                + " \"validated against test report TR-118\"`"), ctx.getStart().getStartIndex());
            return new Statement.Broken(span(ctx), null);
        }
        return new Statement.Accept(span(ctx), written, code, ident(ctx.name()), reason);
    }

    @Override
    public Object visitOldSolve(PlumbParser.OldSolveContext ctx) {
        Respelling r = new Respelling(ctx);
        r.replace(ctx.FIND().getSymbol(), "seek");
        if (ctx.WITHIN() != null) r.replace(ctx.WITHIN().getSymbol(), "in");
        if (ctx.GUESS() != null) r.replace(ctx.GUESS().getSymbol(), "from");
        r.replaceSpan(ctx.SO().getSymbol(), ctx.THAT().getSymbol(), "where");
        String now = r.text();
        String changed = "`find` became `seek`, " + (ctx.WITHIN() != null ? "`within` became `in`" : "`guess` became `from`")
            + " and `so that` became `where`";
        errors.add(Diagnostic.of(Code.SYNTAX_RENAMED, span(ctx), "the solve statement is now written `" + oneLine(now)
            + "`: " + changed).withFix(new Fix("Write it as `seek …`", span(ctx), now, true)), ctx.getStart().getStartIndex());
        return new Statement.Broken(span(ctx), ident(ctx.name()));
    }

    /** The statement's text with some of its tokens written anew, keeping the user's spacing. */
    private final class Respelling {
        private final ParserRuleContext ctx;
        private final java.util.TreeMap<Integer, int[]> cuts = new java.util.TreeMap<>();
        private final java.util.Map<Integer, String> words = new java.util.HashMap<>();

        Respelling(ParserRuleContext ctx) {
            this.ctx = ctx;
        }

        void replace(Token t, String word) {
            replaceSpan(t, t, word);
        }

        void replaceSpan(Token first, Token last, String word) {
            cuts.put(first.getStartIndex(), new int[] {first.getStartIndex(), last.getStopIndex() + 1});
            words.put(first.getStartIndex(), word);
        }

        String text() {
            CharStream in = ctx.getStart().getInputStream();
            int from = ctx.getStart().getStartIndex();
            int to = ctx.getStop().getStopIndex() + 1;
            StringBuilder b = new StringBuilder();
            int at = from;
            for (int[] cut : cuts.values()) {
                b.append(in.getText(Interval.of(at, cut[0] - 1))).append(words.get(cut[0]));
                at = cut[1];
            }
            return b.append(in.getText(Interval.of(at, to - 1))).toString();
        }
    }

    private static String oneLine(String statement) {
        return statement.replaceAll("\\s*\\R\\s*", " ");
    }

    // ---- correlation and table blocks ------------------------------------------------

    @Override
    public Object visitCorrelationHead(PlumbParser.CorrelationHeadContext ctx) {
        List<Statement.Param> params = new ArrayList<>();
        for (PlumbParser.ParamContext p : ctx.param()) params.add(param(p));
        return new BlockLine.CorrelationHead(span(ctx), ident(ctx.name()), params);
    }

    @Override
    public Object visitTableHead(PlumbParser.TableHeadContext ctx) {
        return new BlockLine.TableHead(span(ctx), ident(ctx.name()), param(ctx.param()));
    }

    private Statement.Param param(PlumbParser.ParamContext ctx) {
        return new Statement.Param(ident(ctx.id), ctx.dim == null ? null : ident(ctx.dim),
            ctx.role == null ? null : ident(ctx.role));
    }

    @Override
    public Object visitSourceLine(PlumbParser.SourceLineContext ctx) {
        return new BlockLine.Property(span(ctx), "source", unquote(ctx.STRING().getText()), null);
    }

    @Override
    public Object visitFamilyLine(PlumbParser.FamilyLineContext ctx) {
        return new BlockLine.Property(span(ctx), "family", null, ident(ctx.name()));
    }

    @Override
    public Object visitBasisLine(PlumbParser.BasisLineContext ctx) {
        return new BlockLine.Property(span(ctx), "basis", null, ident(ctx.name()));
    }

    @Override
    public Object visitBasisFlowLine(PlumbParser.BasisFlowLineContext ctx) {
        return new BlockLine.Basis(span(ctx), ident(ctx.basis), ident(ctx.flow));
    }

    @Override
    public Object visitRegimeLine(PlumbParser.RegimeLineContext ctx) {
        return new BlockLine.Property(span(ctx), "regime", null, ident(ctx.name()));
    }

    @Override
    public Object visitInterpolateLine(PlumbParser.InterpolateLineContext ctx) {
        return new BlockLine.Property(span(ctx), "interpolate", null, ident(ctx.name()));
    }

    @Override
    public Object visitValidLine(PlumbParser.ValidLineContext ctx) {
        return new BlockLine.Valid(span(ctx), bound(ctx, ctx.expr(), ctx.comparator()));
    }

    @Override
    public Object visitDomainLine(PlumbParser.DomainLineContext ctx) {
        return new BlockLine.Domain(span(ctx), bound(ctx, ctx.expr(), ctx.comparator()));
    }

    @Override
    public Object visitAccuracyLine(PlumbParser.AccuracyLineContext ctx) {
        return new BlockLine.Accuracy(span(ctx), expr(ctx.expr()));
    }

    @Override
    public Object visitPieceLine(PlumbParser.PieceLineContext ctx) {
        List<PlumbParser.ExprContext> exprs = ctx.expr();
        Statement.Bound when = ctx.WHEN() == null ? null : bound(ctx, exprs.subList(1, exprs.size()), ctx.comparator());
        Statement.Piece piece = new Statement.Piece(span(ctx), expr(exprs.get(0)), when, ctx.OTHERWISE() != null);
        return new BlockLine.Piece(span(ctx), piece);
    }

    @Override
    public Object visitColumnsLine(PlumbParser.ColumnsLineContext ctx) {
        List<Statement.Column> columns = new ArrayList<>();
        Respelling bracketed = new Respelling(ctx);
        boolean old = false;
        for (PlumbParser.ColumnContext c : ctx.column()) {
            columns.add(new Statement.Column(ident(c.name()), c.UNIT() == null ? null : unitText(c.UNIT().getSymbol())));
            if (c.LBRACK() != null) {
                old = true;
                bracketed.replaceSpan(c.LBRACK().getSymbol(), c.RBRACK().getSymbol(), " in " + c.UNIT().getText());
            }
        }
        if (old) {
            String now = bracketed.text();
            errors.add(Diagnostic.of(Code.SYNTAX_RENAMED, span(ctx), "a column names its unit with `in`: write `"
                + now + "`").withFix(new Fix("Write the units with `in`", span(ctx), now, true)), ctx.getStart().getStartIndex());
            return new Statement.Broken(span(ctx), null);
        }
        return new BlockLine.Columns(span(ctx), columns);
    }

    @Override
    public Object visitRowLine(PlumbParser.RowLineContext ctx) {
        List<Double> numbers = new ArrayList<>();
        for (PlumbParser.SignedNumberContext n : ctx.signedNumber()) {
            double v = Double.parseDouble(n.NUMBER().getText());
            numbers.add(n.MINUS() == null ? v : -v);
        }
        return new BlockLine.Row(span(ctx), new Statement.Row(span(ctx), numbers));
    }

    @Override
    public Object visitEndLine(PlumbParser.EndLineContext ctx) {
        return new BlockLine.End(span(ctx));
    }

    private static Comparator comparator(Token t) {
        return switch (t.getType()) {
            case PlumbLexer.LT -> Comparator.LT;
            case PlumbLexer.LE -> Comparator.LE;
            case PlumbLexer.GT -> Comparator.GT;
            case PlumbLexer.GE -> Comparator.GE;
            case PlumbLexer.EQ -> Comparator.EQ;
            default -> Comparator.NE;
        };
    }

    // ---- expressions -----------------------------------------------------------------

    private Expr expr(PlumbParser.ExprContext ctx) {
        return (Expr) visit(ctx);
    }

    @Override
    public Object visitPower(PlumbParser.PowerContext ctx) {
        return new Expr.Binary(span(ctx), Expr.Op.POWER, expr(ctx.expr(0)), expr(ctx.expr(1)));
    }

    @Override
    public Object visitUnary(PlumbParser.UnaryContext ctx) {
        Expr.Op op = ctx.op.getType() == PlumbLexer.MINUS ? Expr.Op.NEGATE : Expr.Op.PLUS;
        return new Expr.Unary(span(ctx), op, expr(ctx.expr()));
    }

    @Override
    public Object visitMultiplicative(PlumbParser.MultiplicativeContext ctx) {
        Expr.Op op = ctx.op.getType() == PlumbLexer.STAR ? Expr.Op.MULTIPLY : Expr.Op.DIVIDE;
        return new Expr.Binary(span(ctx), op, expr(ctx.expr(0)), expr(ctx.expr(1)));
    }

    @Override
    public Object visitAdditive(PlumbParser.AdditiveContext ctx) {
        Expr.Op op = ctx.op.getType() == PlumbLexer.PLUS ? Expr.Op.ADD : Expr.Op.SUBTRACT;
        return new Expr.Binary(span(ctx), op, expr(ctx.expr(0)), expr(ctx.expr(1)));
    }

    @Override
    public Object visitQuantity(PlumbParser.QuantityContext ctx) {
        String text = ctx.NUMBER().getText();
        UnitText unit = ctx.UNIT() == null ? null : unitText(ctx.UNIT().getSymbol());
        return new Expr.Quantity(span(ctx), Double.parseDouble(text), text, unit);
    }

    @Override
    public Object visitCall(PlumbParser.CallContext ctx) {
        List<Expr> args = new ArrayList<>();
        for (PlumbParser.ExprContext e : ctx.expr()) args.add(expr(e));
        // `table.column(x)` names one column of a table: the callee is the dotted name.
        List<PlumbParser.NameContext> names = ctx.name();
        Ident callee = ident(names.get(0));
        if (names.size() > 1) {
            Ident column = ident(names.get(1));
            callee = new Ident(callee.text() + "." + column.text(), Span.cover(callee.span(), column.span()));
        }
        return new Expr.Call(span(ctx), callee, args);
    }

    @Override
    public Object visitReference(PlumbParser.ReferenceContext ctx) {
        return new Expr.Reference(span(ctx), ctx.getText());
    }

    @Override
    public Object visitParenthesized(PlumbParser.ParenthesizedContext ctx) {
        Expr inner = expr(ctx.expr());
        return new Expr.Group(inner.span(), span(ctx), inner);
    }

    // ---- helpers ---------------------------------------------------------------------

    private Ident ident(PlumbParser.NameContext ctx) {
        return new Ident(ctx.getText(), span(ctx));
    }

    private UnitText unitText(Token t) {
        return new UnitText(t.getText(), span(t));
    }

    private static String note(PlumbParser.NoteContext ctx) {
        return ctx == null ? null : unquote(ctx.STRING().getText());
    }

    private Span span(ParserRuleContext ctx) {
        Token stop = ctx.getStop() == null ? ctx.getStart() : ctx.getStop();
        int start = lines.fromCodePoint(ctx.getStart().getStartIndex());
        return new Span(start, lines.fromCodePoint(stop.getStopIndex() + 1));
    }

    private Span span(Token t) {
        return new Span(lines.fromCodePoint(t.getStartIndex()), lines.fromCodePoint(t.getStopIndex() + 1));
    }

    static String unquote(String quoted) {
        String body = quoted.substring(1, quoted.length() - 1);
        if (body.indexOf('\\') < 0) return body;
        StringBuilder b = new StringBuilder(body.length());
        for (int i = 0; i < body.length(); i++) {
            char c = body.charAt(i);
            if (c == '\\' && i + 1 < body.length()) {
                char n = body.charAt(++i);
                b.append(n == 'n' ? '\n' : n);
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }
}
