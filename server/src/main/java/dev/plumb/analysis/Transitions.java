package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Statement;
import dev.plumb.units.QuantityFormat;
import java.util.List;
import java.util.Optional;

/**
 * The calc's own transition Reynolds number, from its `transition Re = …` statement: the
 * threshold of every regime check (laminar formulas above it, turbulent ones below it warn). It
 * is a statement of its own so that a value that merely happens to be named Re_crit moves
 * nothing; such a value is pointed out.
 */
final class Transitions {
    private Transitions() {
    }

    /** The threshold the calc sets, or null (then the settings', else the library's). */
    static Double of(List<Statement> statements, Reporter reporter, boolean library) {
        Double found = null;
        for (Statement s : statements) {
            // The library's own Re_crit is the default the checks fall back to.
            if (!library && s instanceof Statement.Definition d && d.name().text().equals("Re_crit")) {
                reporter.report(Code.RANGE_TRANSITION_NAME, d.name().span(), "a value named Re_crit does not move the "
                    + "laminar–turbulent threshold of the regime checks: to set it for this calc, write `transition Re = "
                    + "5e5 \"why\"` with your number, or rename the value");
            }
            if (!(s instanceof Statement.Transition t)) continue;
            if (!t.quantity().text().equals("Re")) {
                reporter.report(Code.SYNTAX_ERROR, t.quantity().span(), "`transition` sets the Reynolds number at which "
                    + "boundary layers turn turbulent: write `transition Re = 3e5 \"why\"`");
            } else if (!(t.value() > 0) || !Double.isFinite(t.value())) {
                reporter.report(Code.MATH_DOMAIN, t.valueSpan(), "a transition Reynolds number is positive: write the "
                    + "Reynolds number at which the layer turns turbulent, e.g. 3e5");
            } else if (found != null) {
                reporter.report(Code.NAME_DUPLICATE, t.span(), "a second `transition`: a calc has one threshold; remove one");
            } else {
                found = t.value();
            }
        }
        return found;
    }

    /** "Re = 3e5 (the library's default is 5e5): tripped by the sand strip", for the calc's header. */
    static Optional<String> describe(List<Statement> statements, Double transition) {
        if (transition == null) return Optional.empty();
        for (Statement s : statements) {
            if (s instanceof Statement.Transition t && t.value() == transition) {
                return Optional.of("Re = " + QuantityFormat.number(transition, 4) + (t.note() == null ? "" : ", " + t.note()));
            }
        }
        return Optional.empty();
    }
}
