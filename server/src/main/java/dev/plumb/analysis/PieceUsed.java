package dev.plumb.analysis;

import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Says which formula of a piecewise correlation gave the value at a call, for the reviewer: a
 * selector such as {@code cd_sphere} hands over from one published fit to another, and the value
 * is only as good as the fit that gave it. Names the correlations and tables the chosen piece
 * calls ({@code cd_sphere_morrison}); a piece that combines several, as a blend does, is named by
 * them and its condition.
 */
final class PieceUsed {
    private PieceUsed() {
    }

    /** What gave the value: null for a correlation with one formula (nothing to choose). */
    static String describe(Statement.Correlation def, Statement.Piece piece, Scope scope) {
        if (def.pieces().size() < 2) return null;
        Set<String> called = new LinkedHashSet<>();
        collect(piece.expr(), scope, called);
        String condition = piece.otherwise() || piece.condition() == null ? "the `otherwise` formula"
            : "the formula when " + condition(scope.text(), piece.condition());
        if (called.size() == 1) return called.iterator().next();
        if (called.isEmpty()) return condition;
        return String.join(" and ", called) + " (" + condition + ")";
    }

    private static String condition(String text, Statement.Bound bound) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < bound.operands().size(); i++) {
            if (i > 0) parts.add(bound.comparators().get(i - 1).symbol());
            Expr e = bound.operands().get(i);
            parts.add(text.substring(e.span().start(), e.span().end()).strip());
        }
        return String.join(" ", parts);
    }

    /** The correlations and tables an expression calls, in the order written, each once. */
    private static void collect(Expr e, Scope scope, Set<String> out) {
        if (e instanceof Expr.Call c) {
            Binding b = scope.lookup(c.callee().text());
            if (b instanceof Binding.CorrelationBinding || b instanceof Binding.TableBinding) out.add(c.callee().text());
            for (Expr a : c.args()) collect(a, scope, out);
        } else if (e instanceof Expr.Group g) {
            collect(g.inner(), scope, out);
        } else if (e instanceof Expr.Unary u) {
            collect(u.operand(), scope, out);
        } else if (e instanceof Expr.Binary b) {
            collect(b.left(), scope, out);
            collect(b.right(), scope, out);
        }
    }
}
