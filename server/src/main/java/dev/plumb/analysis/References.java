package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import java.util.function.BiConsumer;

/** Walks an expression and reports every name it uses: values and called functions. */
final class References {
    private References() {
    }

    /** Calls {@code visit(name, span)} for each name in source order. */
    static void each(Expr e, BiConsumer<String, Span> visit) {
        if (e instanceof Expr.Reference r) {
            visit.accept(r.name(), r.span());
        } else if (e instanceof Expr.Call c) {
            visit.accept(c.callee().text(), c.callee().span());
            for (Expr a : c.args()) each(a, visit);
        } else if (e instanceof Expr.Group g) {
            each(g.inner(), visit);
        } else if (e instanceof Expr.Unary u) {
            each(u.operand(), visit);
        } else if (e instanceof Expr.Binary b) {
            each(b.left(), visit);
            each(b.right(), visit);
        } else if (e instanceof Expr.Piecewise p) {
            for (var piece : p.pieces()) {
                each(piece.expr(), visit);
                if (piece.condition() != null) piece.condition().operands().forEach(o -> each(o, visit));
            }
        }
    }
}
