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
        dev.plumb.syntax.ExprWalk.each(e, node -> {
            if (node instanceof Expr.Reference r) visit.accept(r.name(), r.span());
            else if (node instanceof Expr.Call c) visit.accept(c.callee().text(), c.callee().span());
        });
    }
}
