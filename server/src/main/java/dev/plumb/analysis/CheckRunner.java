package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.List;

/** Evaluates a {@code check}: every comparison of the chain must hold. */
final class CheckRunner {
    private final Scope scope;
    private final Environment env;
    private final Reporter reporter;
    private final String text;
    private final Settings settings;
    private final UnitRegistry units;
    private final Budget budget;

    CheckRunner(Scope scope, Environment env, Reporter reporter, String text, Settings settings, UnitRegistry units,
                Budget budget) {
        this.budget = budget;
        this.scope = scope;
        this.env = env;
        this.reporter = reporter;
        this.text = text;
        this.settings = settings;
        this.units = units;
    }

    /** The check's row; a check that takes more than its budget is not evaluated, with one finding. */
    Row.CheckRow withinBudget(Statement.Check c) {
        String source = Shown.source(text, new dev.plumb.diagnostics.Span(c.operands().get(0).span().start(),
            c.operands().get(c.operands().size() - 1).span().end()));
        try {
            budget.nextStatement();
            return run(c);
        } catch (Budget.Exhausted e) {
            reporter.report(Code.LIMIT_BUDGET, c.span(), "this check was stopped: it needs more work than any calc does ("
                + (e.limit == Budget.Limit.TIME ? "the run's " + Budget.SECONDS + " s are up" : "over "
                + String.format(java.util.Locale.ROOT, "%,d", Budget.STEPS_PER_STATEMENT) + " evaluation steps")
                + "); look for a formula that does repeated work");
            return Row.CheckRow.unjudged(c.span(), source, Row.Verdict.STOPPED, c.note());
        }
    }

    Row.CheckRow run(Statement.Check c) {
        String source = Shown.source(text, new dev.plumb.diagnostics.Span(c.operands().get(0).span().start(),
            c.operands().get(c.operands().size() - 1).span().end()));
        Evaluator evaluator = new Evaluator(scope, env, java.util.Map.of(), reporter, text, units, budget);
        List<Value> values = new ArrayList<>();
        for (Expr e : c.operands()) values.add(evaluator.eval(e));
        if (values.stream().anyMatch(v -> !v.known())) {
            // Never skipped in silence: a check that cannot be judged is a finding of its own.
            reporter.report(Code.CHECK_NOT_EVALUATED, c.span(), "this check is not evaluated, so it neither passes nor fails: "
                + missing(c, evaluator) + "; fix that, and the check runs");
            return Row.CheckRow.unjudged(c.span(), source, Row.Verdict.VALUE_UNKNOWN, c.note());
        }
        for (int i = 1; i < values.size(); i++) {
            if (!values.get(i).dimension().equals(values.get(0).dimension())) {
                reporter.report(Code.UNIT_MISMATCH, c.span(), "this check compares " + values.get(0).dimension().describe()
                    + " with " + values.get(i).dimension().describe() + ": both sides need the same dimension");
                return Row.CheckRow.unjudged(c.span(), source, Row.Verdict.DIMENSIONS_DIFFER, c.note());
            }
        }
        for (int i = 1; i < values.size(); i++) {
            if (Temperatures.incomparable(values.get(i - 1), values.get(i))) {
                reporter.report(Code.UNIT_MISMATCH, c.span(), "this check compares a temperature point (a reading in °C or °F)"
                    + " with a temperature difference: write the limit as the same kind, e.g. a difference in K (`5 K`)"
                    + " or a point in °C (`40 degC`)");
                return Row.CheckRow.unjudged(c.span(), source, Row.Verdict.POINT_AND_DIFFERENCE, c.note());
            }
        }
        Unit unit = commonUnit(c.operands(), values.get(0), evaluator);
        List<String> failures = new ArrayList<>();
        int digits = settings.significantFigures();
        for (int i = 0; i < c.comparators().size(); i++) {
            Comparator op = c.comparators().get(i);
            if (!holds(values.get(i), op, values.get(i + 1))) {
                int apart = digitsToTellApart(values.get(i), values.get(i + 1), unit);
                digits = Math.max(digits, apart);
                failures.add(side(c.operands().get(i), values.get(i), unit, apart) + " is not " + op.symbol() + " "
                    + side(c.operands().get(i + 1), values.get(i + 1), unit, apart));
            }
        }
        if (!failures.isEmpty()) {
            String why = c.note() == null ? "" : " (" + c.note() + ")";
            reporter.report(Code.CHECK_FAILED, c.span(), "check failed: " + String.join("; ", failures) + why);
        }
        return new Row.CheckRow(c.span(), source, failures.isEmpty() ? Row.Verdict.PASSED : Row.Verdict.FAILED, values,
            c.comparators(), unit, digits, c.note());
    }

    /** Which values the check lacks, by name where a name has no value. */
    private static String missing(Statement.Check c, Evaluator evaluator) {
        java.util.Set<String> unknown = new java.util.LinkedHashSet<>();
        for (Expr e : c.operands()) {
            References.each(e, (name, span) -> {
                Binding b = evaluator.lookup(name);
                if (b == null || (b instanceof Binding.ValueBinding v && !v.value().known())) unknown.add(name);
            });
        }
        if (unknown.isEmpty()) return "a value it needs could not be computed (see the finding on this line)";
        List<String> names = new ArrayList<>(unknown);
        return (names.size() == 1 ? names.get(0) + " has" : String.join(", ", names) + " have") + " no value (see the "
            + "finding that says why)";
    }

    private boolean holds(Value a, Comparator op, Value b) {
        return RangeCheck.holds(a.si(), op, b.si(), settings.equalityTolerance());
    }

    /** The unit both sides are shown in: the one a side was written or defined in, else SI. */
    private Unit commonUnit(List<Expr> operands, Value first, Evaluator evaluator) {
        for (Expr e : operands) {
            Unit written = DisplayChoice.written(e, units);
            if (written != null) return written;
        }
        for (Expr e : operands) {
            if (Expr.inner(e) instanceof Expr.Reference r && evaluator.lookup(r.name()) instanceof Binding.ValueBinding v
                && v.display() != null) {
                return v.display();
            }
        }
        return DisplayUnits.defaultFor(first.dimension());
    }

    /** Enough significant figures that two different values do not read the same ("1 is not == 1"). */
    private int digitsToTellApart(Value a, Value b, Unit unit) {
        int digits = settings.significantFigures();
        while (digits < 15 && Shown.value(a, unit, digits).equals(Shown.value(b, unit, digits))) digits++;
        return digits;
    }

    private String side(Expr e, Value v, Unit unit, int digits) {
        String shown = Shown.value(v, unit, digits);
        Expr inner = Expr.inner(e);
        if (inner instanceof Expr.Quantity || (inner instanceof Expr.Unary u && Expr.inner(u.operand()) instanceof Expr.Quantity)) {
            return shown;
        }
        return Shown.source(text, e.span()) + " = " + shown;
    }
}
