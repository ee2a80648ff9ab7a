package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** What each name and unit is, for semantic colouring: inputs, derived values, functions and correlations, units. */
public final class SemanticSpans {
    public enum Type { INPUT, VALUE, FUNCTION, UNIT }

    public record Token(Span span, Type type) {
    }

    private SemanticSpans() {
    }

    public static List<Token> of(Analysis a) {
        List<Token> out = new ArrayList<>();
        for (Analysis.Reference r : a.references()) {
            Type t = typeOf(a.scope().lookup(r.name()));
            if (t != null) out.add(new Token(r.span(), t));
        }
        for (Statement s : a.syntax().statements()) units(s, out);
        out.sort(Comparator.comparingInt(t -> t.span().start()));
        return out;
    }

    private static Type typeOf(Binding b) {
        if (b instanceof Binding.ValueBinding v) return v.input() ? Type.INPUT : Type.VALUE;
        if (b == null) return null;
        return Type.FUNCTION;
    }

    private static void units(Statement s, List<Token> out) {
        if (s instanceof Statement.Definition d) {
            expr(d.expr(), out);
            if (d.displayUnit() != null) out.add(new Token(d.displayUnit().span(), Type.UNIT));
        } else if (s instanceof Statement.Check c) {
            c.operands().forEach(e -> expr(e, out));
        } else if (s instanceof Statement.Function f) {
            expr(f.body(), out);
        } else if (s instanceof Statement.Seek f) {
            for (Expr e : new Expr[] {f.low(), f.high(), f.start(), f.lhs(), f.rhs()}) if (e != null) expr(e, out);
            if (f.displayUnit() != null) out.add(new Token(f.displayUnit().span(), Type.UNIT));
        } else if (s instanceof Statement.SeekSystem) {
            dev.plumb.syntax.ExprWalk.of(s).forEach(e -> expr(e, out));
        }
    }

    private static void expr(Expr e, List<Token> out) {
        dev.plumb.syntax.ExprWalk.each(e, node -> {
            if (node instanceof Expr.Quantity q && q.unit() != null) out.add(new Token(q.unit().span(), Type.UNIT));
        });
    }
}
