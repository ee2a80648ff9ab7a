package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Fix;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.regex.Pattern;

/**
 * A lint: `0.8 t` is 0.8 tonnes even in a calc that has a value named t, because a unit after a
 * number always wins. Where a lone unit word is also the name of one of the calc's own or used
 * values, a reader cannot tell which was meant, so it is said — once per word (a calc with a mass
 * m writes lengths in m on many lines), at its first place in the text. Built-in constants and the
 * library's values are known to every reader and do not count.
 */
final class UnitNameClash {
    private static final Pattern WORD = Pattern.compile("[\\p{L}_][\\p{L}\\p{Nd}_]*");

    private UnitNameClash() {
    }

    /** @param own the calc's own value of a name, null for a name it does not define */
    static void report(List<Statement> statements, java.util.function.Function<String, Binding.ValueBinding> own, Scope scope,
                       UnitRegistry units, Reporter reporter) {
        Set<String> said = new HashSet<>();
        for (Statement s : statements) {
            for (Expr e : expressions(s)) {
                quantities(e, q -> {
                    String word = q.unit() == null ? null : q.unit().text();
                    if (word == null || !WORD.matcher(word).matches() || said.contains(word)) return;
                    Binding.ValueBinding value = own.apply(word) != null ? own.apply(word)
                        : scope.lookup(word) instanceof Binding.ValueBinding v && v.file() != null && !Stdlib.isLibrary(v.file())
                        ? v : null;
                    if (value == null || !(units.resolve(word) instanceof UnitResult.Ok ok)) return;
                    said.add(word);
                    say(q, ok.unit(), value, reporter);
                });
            }
        }
    }

    private static void say(Expr.Quantity q, Unit unit, Binding.ValueBinding value, Reporter reporter) {
        String word = q.unit().text();
        String shown = value.value().known() ? " (" + Shown.value(value.value(), value.display(), 4) + ")" : "";
        String product = q.numberText() + " * " + word;
        reporter.report(Code.UNIT_ALSO_A_NAME, q.unit().span(), "`" + q.numberText() + " " + word + "` reads " + word
            + " as the unit " + unit.symbol() + ", " + unit.dimension().describe() + ", but this calc also has a value named "
            + word + shown + ": write `" + product + "` to multiply by the value, or rename the value so the unit reads plainly",
            List.of(new Fix("Multiply by the value " + word + " (changes the value)", q.span(), product)), List.of());
    }

    private static List<Expr> expressions(Statement s) {
        List<Expr> out = new ArrayList<>();
        if (s instanceof Statement.Definition d) out.add(d.expr());
        if (s instanceof Statement.Check c) out.addAll(c.operands());
        if (s instanceof Statement.Function f) out.add(f.body());
        if (s instanceof Statement.Seek k) {
            for (Expr e : new Expr[] {k.low(), k.high(), k.start(), k.lhs(), k.rhs()}) if (e != null) out.add(e);
        }
        return out;
    }

    /** Every quantity written in an expression, in source order. */
    private static void quantities(Expr e, Consumer<Expr.Quantity> visit) {
        if (e instanceof Expr.Quantity q) {
            visit.accept(q);
        } else if (e instanceof Expr.Call c) {
            c.args().forEach(a -> quantities(a, visit));
        } else if (e instanceof Expr.Group g) {
            quantities(g.inner(), visit);
        } else if (e instanceof Expr.Unary u) {
            quantities(u.operand(), visit);
        } else if (e instanceof Expr.Binary b) {
            quantities(b.left(), visit);
            quantities(b.right(), visit);
        } else if (e instanceof Expr.Piecewise p) {
            for (var piece : p.pieces()) {
                quantities(piece.expr(), visit);
                if (piece.condition() != null) piece.condition().operands().forEach(o -> quantities(o, visit));
            }
        }
    }
}
