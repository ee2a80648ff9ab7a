package dev.plumb.compare;

import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * A definition's formula as written, without spacing and with the names it uses put through a
 * renaming: two definitions with the same key compute the same thing from the same values, which
 * is how a renamed value is recognised across revisions.
 */
final class FormulaKey {
    private FormulaKey() {
    }

    /** The key of what a statement computes, names renamed by {@code rename}; null when it has no formula. */
    static String of(String text, Statement s, Map<String, String> rename) {
        if (s instanceof Statement.Definition d) {
            return (d.input() ? "input " : "") + written(text, d.expr(), rename);
        }
        if (s instanceof Statement.Seek k) {
            // A solve is its search and its equation: the text from after the name to the equation's
            // end, the unknown itself written as a placeholder (its equation uses it by name).
            List<Expr> parts = new ArrayList<>();
            for (Expr e : new Expr[] {k.low(), k.high(), k.start(), k.lhs(), k.rhs()}) if (e != null) parts.add(e);
            Map<String, String> own = placeholders(rename, List.of(k.name().text()));
            return "seek" + spaceless(substituted(text, new Span(k.name().span().end(), k.equation().end()), parts, own));
        }
        if (s instanceof Statement.SeekSystem k) {
            // Each unknown of a system is its place among the unknowns and the whole system as written.
            Statement.Equations q = k.system();
            Map<String, String> own = placeholders(rename, q.unknowns().stream().map(u -> u.text()).toList());
            StringBuilder out = new StringBuilder("seek#" + k.index());
            for (List<Expr> group : List.of(q.starts(), q.lows(), q.highs())) {
                for (Expr e : group) out.append(',').append(written(text, e, own));
            }
            for (Statement.Equation e : q.equations()) {
                out.append(';').append(written(text, e.lhs(), own)).append('=').append(written(text, e.rhs(), own));
            }
            return out.toString();
        }
        if (s instanceof Statement.Evolve k) {
            // The time and each state: its place, the starts, the rates and when the motion stops.
            Statement.Motion m = k.motion();
            List<String> names = new ArrayList<>(List.of(m.time().text()));
            m.states().forEach(state -> names.add(state.text()));
            Map<String, String> own = placeholders(rename, names);
            StringBuilder out = new StringBuilder("evolve#" + k.index());
            for (List<Expr> group : List.of(m.starts(), m.rates())) {
                for (Expr e : group) out.append(',').append(written(text, e, own));
            }
            out.append(";until").append(written(text, m.stopLeft(), own)).append(m.stop().symbol())
                .append(written(text, m.stopRight(), own));
            if (m.every() != null) out.append(";every").append(written(text, m.every(), own));
            return out.toString();
        }
        return null;
    }

    /** {@code rename} with the statement's own names written as their places: #0, #1, … */
    private static Map<String, String> placeholders(Map<String, String> rename, List<String> own) {
        Map<String, String> out = new java.util.HashMap<>(rename);
        for (int i = 0; i < own.size(); i++) out.put(own.get(i), "#" + i);
        return out;
    }

    /** The key of a check: its sides and comparisons, names renamed by {@code rename}. */
    static String ofCheck(String text, Statement.Check c, Map<String, String> rename) {
        StringBuilder out = new StringBuilder("check");
        for (int i = 0; i < c.operands().size(); i++) {
            if (i > 0) out.append(c.comparators().get(i - 1).symbol());
            out.append(written(text, c.operands().get(i), rename));
        }
        return out.toString();
    }

    private static String written(String text, Expr e, Map<String, String> rename) {
        Span whole = e instanceof Expr.Group g ? g.written() : e.span();
        return spaceless(substituted(text, whole, List.of(e), rename));
    }

    /** The text of {@code whole} with every name referenced in {@code roots} replaced by its new name. */
    private static String substituted(String text, Span whole, List<Expr> roots, Map<String, String> rename) {
        List<Expr.Reference> refs = new ArrayList<>();
        for (Expr r : roots) collect(r, refs);
        refs.sort(Comparator.comparingInt(r -> r.span().start()));
        StringBuilder out = new StringBuilder();
        int at = whole.start();
        for (Expr.Reference r : refs) {
            if (r.span().start() < at || r.span().end() > whole.end()) continue;
            out.append(text, at, r.span().start()).append(rename.getOrDefault(r.name(), r.name()));
            at = r.span().end();
        }
        return out.append(text, at, Math.max(at, whole.end())).toString();
    }

    private static void collect(Expr e, List<Expr.Reference> out) {
        dev.plumb.syntax.ExprWalk.each(e, node -> {
            if (node instanceof Expr.Reference r) out.add(r);
        });
    }

    private static String spaceless(String s) {
        return s.replaceAll("\\s+", "");
    }
}
