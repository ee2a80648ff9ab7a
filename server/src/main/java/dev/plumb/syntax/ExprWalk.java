package dev.plumb.syntax;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/** The one walk over the expression tree that every reader of formulas shares. */
public final class ExprWalk {
    private ExprWalk() {
    }

    /** Every node of {@code e}, a node before its parts, parts in source order (a piece's formula before its condition). */
    public static void each(Expr e, Consumer<Expr> visit) {
        if (e == null) return;
        visit.accept(e);
        if (e instanceof Expr.Group g) {
            each(g.inner(), visit);
        } else if (e instanceof Expr.Call c) {
            c.args().forEach(a -> each(a, visit));
        } else if (e instanceof Expr.Unary u) {
            each(u.operand(), visit);
        } else if (e instanceof Expr.Binary b) {
            each(b.left(), visit);
            each(b.right(), visit);
        } else if (e instanceof Expr.Piecewise p) {
            for (Statement.Piece piece : p.pieces()) {
                each(piece.expr(), visit);
                if (piece.condition() != null) piece.condition().operands().forEach(o -> each(o, visit));
            }
        }
    }

    /** The formulas a statement writes: a definition's, a check's sides, a function's body, a solve's ends and equation, a sweep's range, a case's values. */
    public static List<Expr> of(Statement s) {
        List<Expr> out = new ArrayList<>();
        if (s instanceof Statement.Definition d) {
            out.add(d.expr());
            if (d.tolerance() != null) out.add(d.tolerance().amount());
        }
        if (s instanceof Statement.Check c) out.addAll(c.operands());
        if (s instanceof Statement.Function f) out.add(f.body());
        if (s instanceof Statement.Seek k) {
            for (Expr e : new Expr[] {k.low(), k.high(), k.start(), k.lhs(), k.rhs()}) if (e != null) out.add(e);
        }
        if (s instanceof Statement.Evolve k && k.index() == 0) {
            // The time's statement speaks for the motion's formulas, so each is walked once.
            Statement.Motion m = k.motion();
            out.addAll(m.starts());
            out.addAll(m.rates());
            out.add(m.stopLeft());
            out.add(m.stopRight());
            if (m.every() != null) out.add(m.every());
        }
        if (s instanceof Statement.SeekSystem k && k.index() == 0) {
            // The first unknown's statement speaks for the system's formulas, so each is walked once.
            Statement.Equations q = k.system();
            out.addAll(q.starts());
            for (int i = 0; i < q.lows().size(); i++) {
                out.add(q.lows().get(i));
                out.add(q.highs().get(i));
            }
            for (Statement.Equation e : q.equations()) {
                out.add(e.lhs());
                out.add(e.rhs());
            }
        }
        if (s instanceof Statement.Sweep w) {
            for (Expr e : new Expr[] {w.from(), w.to(), w.step()}) if (e != null) out.add(e);
            if (w.across() != null) {
                for (Expr e : new Expr[] {w.across().from(), w.across().to(), w.across().step()}) if (e != null) out.add(e);
            }
        }
        if (s instanceof Statement.Case c) c.settings().forEach(x -> out.add(x.expr()));
        return out;
    }
}
