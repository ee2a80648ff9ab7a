package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Fix;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
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
        // The finding depends on the word alone, so each word is judged once, at its first place.
        Set<String> judged = new HashSet<>();
        for (Statement s : statements) {
            for (Expr e : dev.plumb.syntax.ExprWalk.of(s)) {
                dev.plumb.syntax.ExprWalk.each(e, node -> {
                    if (!(node instanceof Expr.Quantity q)) return;
                    String word = q.unit() == null ? null : q.unit().text();
                    if (word == null || !judged.add(word) || !WORD.matcher(word).matches()) return;
                    Binding.ValueBinding value = own.apply(word) != null ? own.apply(word)
                        : scope.lookup(word) instanceof Binding.ValueBinding v && v.file() != null && !Stdlib.isLibrary(v.file())
                        ? v : null;
                    if (value == null || !(units.resolve(word) instanceof UnitResult.Ok ok)) return;
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

}
