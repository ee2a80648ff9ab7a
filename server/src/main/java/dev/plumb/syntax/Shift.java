package dev.plumb.syntax;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Span;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * Moves syntax results by a number of UTF-16 units: a statement read once keeps its meaning when
 * text before it is edited, only its place changes. Every span in the tree moves; nothing else.
 */
final class Shift {
    private final int by;

    private Shift(int by) {
        this.by = by;
    }

    static List<Statement> statements(List<Statement> in, int by) {
        if (by == 0) return in;
        Shift s = new Shift(by);
        return s.each(in, s::statement);
    }

    static List<Diagnostic> diagnostics(List<Diagnostic> in, int by) {
        if (by == 0) return in;
        Shift s = new Shift(by);
        return s.each(in, s::diagnostic);
    }

    private <T> List<T> each(List<T> in, Function<T, T> moved) {
        List<T> out = new ArrayList<>(in.size());
        for (T t : in) out.add(moved.apply(t));
        return out;
    }

    private Diagnostic diagnostic(Diagnostic d) {
        List<Related> related = each(d.related(), r -> new Related(r.file(), span(r.span()), r.message()));
        List<Fix> fixes = each(d.fixes(), f -> new Fix(f.title(), span(f.span()), f.text(), f.preferred()));
        return new Diagnostic(d.code(), d.severity(), span(d.span()), d.message(), related, fixes);
    }

    private Span span(Span s) {
        return s == null ? null : new Span(s.start() + by, s.end() + by);
    }

    private Ident ident(Ident i) {
        return i == null ? null : new Ident(i.text(), span(i.span()));
    }

    private UnitText unit(UnitText u) {
        return u == null ? null : new UnitText(u.text(), span(u.span()));
    }

    private List<Ident> idents(List<Ident> in) {
        return each(in, this::ident);
    }

    private List<Expr> exprs(List<Expr> in) {
        return each(in, this::expr);
    }

    private List<Statement.Bound> bounds(List<Statement.Bound> in) {
        return each(in, this::bound);
    }

    private Statement.Bound bound(Statement.Bound b) {
        return b == null ? null : new Statement.Bound(span(b.span()), exprs(b.operands()), b.comparators());
    }

    private Statement.Piece piece(Statement.Piece p) {
        return new Statement.Piece(span(p.span()), expr(p.expr()), bound(p.condition()), p.otherwise());
    }

    private Statement.Param param(Statement.Param p) {
        return new Statement.Param(ident(p.name()), ident(p.dimension()), ident(p.role()));
    }

    Expr expr(Expr e) {
        if (e == null) return null;
        if (e instanceof Expr.Quantity q) return new Expr.Quantity(span(q.span()), q.number(), q.numberText(), unit(q.unit()));
        if (e instanceof Expr.Reference r) return new Expr.Reference(span(r.span()), r.name());
        if (e instanceof Expr.Call c) return new Expr.Call(span(c.span()), ident(c.callee()), exprs(c.args()));
        if (e instanceof Expr.Unary u) return new Expr.Unary(span(u.span()), u.op(), expr(u.operand()));
        if (e instanceof Expr.Piecewise p) return new Expr.Piecewise(span(p.span()), each(p.pieces(), this::piece));
        if (e instanceof Expr.Group g) return new Expr.Group(span(g.span()), span(g.written()), expr(g.inner()));
        Expr.Binary b = (Expr.Binary) e;
        return new Expr.Binary(span(b.span()), b.op(), expr(b.left()), expr(b.right()));
    }

    private Statement statement(Statement s) {
        if (s instanceof Statement.Header h) return new Statement.Header(span(h.span()), h.key(), h.text());
        if (s instanceof Statement.Narrative n) return new Statement.Narrative(span(n.span()), n.text());
        if (s instanceof Statement.Section sec) return new Statement.Section(span(sec.span()), sec.title());
        if (s instanceof Statement.Use u) return new Statement.Use(span(u.span()), u.path(), span(u.pathSpan()));
        if (s instanceof Statement.Definition d) {
            return new Statement.Definition(span(d.span()), d.input(), ident(d.name()), expr(d.expr()),
                unit(d.displayUnit()), ident(d.basis()), d.note(), d.tolerance() == null ? null
                    : new Statement.Tolerance(span(d.tolerance().span()), expr(d.tolerance().amount())));
        }
        if (s instanceof Statement.Function f) {
            return new Statement.Function(span(f.span()), ident(f.name()), idents(f.params()), expr(f.body()), f.note());
        }
        if (s instanceof Statement.Check c) {
            return new Statement.Check(span(c.span()), exprs(c.operands()), c.comparators(), c.note(), c.withSpread());
        }
        if (s instanceof Statement.Transition t) {
            return new Statement.Transition(span(t.span()), ident(t.quantity()), t.value(), span(t.valueSpan()), t.note());
        }
        if (s instanceof Statement.Seek f) {
            return new Statement.Seek(span(f.span()), ident(f.name()), expr(f.low()), expr(f.high()), expr(f.start()),
                expr(f.lhs()), expr(f.rhs()), span(f.equation()), unit(f.displayUnit()), ident(f.basis()), f.note());
        }
        if (s instanceof Statement.Evolve k) {
            Statement.Motion m = k.motion();
            Statement.Motion moved = new Statement.Motion(ident(m.time()), idents(m.states()), exprs(m.starts()),
                exprs(m.rates()), expr(m.stopLeft()), m.stop(), expr(m.stopRight()), span(m.until()), expr(m.every()),
                idents(m.drawn()), m.note());
            return new Statement.Evolve(span(k.span()), ident(k.name()), k.index(), moved);
        }
        if (s instanceof Statement.SeekSystem k) {
            Statement.Equations q = k.system();
            Statement.Equations moved = new Statement.Equations(idents(q.unknowns()), exprs(q.starts()), exprs(q.lows()),
                exprs(q.highs()), each(q.equations(), e -> new Statement.Equation(span(e.span()), expr(e.lhs()), expr(e.rhs()))),
                q.note());
            return new Statement.SeekSystem(span(k.span()), ident(k.name()), k.index(), moved);
        }
        if (s instanceof Statement.Correlation c) {
            List<Statement.Param> params = each(c.params(), this::param);
            List<Statement.Piece> pieces = each(c.pieces(), this::piece);
            return new Statement.Correlation(span(c.span()), ident(c.name()), params, c.title(), c.source(),
                ident(c.family()), ident(c.basis()), bounds(c.valid()), ident(c.regime()), expr(c.accuracy()), pieces,
                ident(c.flow()), bounds(c.domain()));
        }
        if (s instanceof Statement.Table t) {
            List<Statement.Column> columns = each(t.columns(), c -> new Statement.Column(ident(c.name()), unit(c.unit())));
            List<Statement.Row> rows = each(t.rows(), r -> new Statement.Row(span(r.span()), r.numbers()));
            return new Statement.Table(span(t.span()), ident(t.name()), param(t.param()), t.title(), t.source(),
                ident(t.family()), ident(t.basis()), bounds(t.valid()), expr(t.accuracy()), ident(t.interpolate()),
                columns, rows, ident(t.flow()), bounds(t.domain()));
        }
        if (s instanceof Statement.Sweep w) {
            Statement.SweepAxis a = w.across();
            Statement.SweepAxis across = a == null ? null : new Statement.SweepAxis(ident(a.name()), expr(a.from()),
                expr(a.to()), expr(a.step()), a.count(), span(a.countSpan()), ident(a.spacing()));
            return new Statement.Sweep(span(w.span()), ident(w.name()), expr(w.from()), expr(w.to()), expr(w.step()),
                w.count(), span(w.countSpan()), ident(w.spacing()), across,
                each(w.shown(), x -> new Statement.Shown(ident(x.name()), unit(x.unit()))), w.note());
        }
        if (s instanceof Statement.Case c) {
            return new Statement.Case(span(c.span()), ident(c.name()),
                each(c.settings(), x -> new Statement.Setting(ident(x.name()), expr(x.expr()))), c.note());
        }
        if (s instanceof Statement.Accept a) {
            return new Statement.Accept(span(a.span()), a.code(), span(a.codeSpan()), ident(a.target()), a.reason());
        }
        Statement.Broken b = (Statement.Broken) s;
        return new Statement.Broken(span(b.span()), ident(b.name()));
    }
}
