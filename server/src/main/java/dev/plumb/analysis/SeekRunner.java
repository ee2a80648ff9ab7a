package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Solves one {@code seek}: NAME is given trial values; the definitions that depend on it (and
 * that the equation uses) are re-evaluated for each trial through the document's {@link Plan},
 * quietly; the residual LHS − RHS goes to {@link RootFinder}. At the root the equation is
 * evaluated once more for real, so range warnings speak of the solution, never of an
 * intermediate trial, and errors in the equation are reported once.
 */
final class SeekRunner extends SolvingRunner {
    /** What solving gave: the value (UNKNOWN on failure) and, when solved, how. */
    record Outcome(Value value, Solution solution) {
    }

    SeekRunner(Plan plan, Scope scope, Environment env, Reporter reporter, String text, UnitRegistry units, Budget budget) {
        super(plan, scope, env, reporter, text, units, budget);
    }

    Outcome run(Statement.Seek f) {
        List<Statement.Definition> dependents = plan.dependentsOf(f.name().text());
        Evaluator real = evaluator(env, reporter);
        String name = f.name().text();
        Dimension dim;
        DoubleUnaryOperator residual;
        RootFinder.Result result;
        // Where the equation is evaluated for real when it cannot be solved: where the user said to start.
        double first;
        if (f.start() != null) {
            Value start = real.eval(f.start());
            if (!start.known()) return failed(name);
            dim = start.dimension();
            residual = residual(name, dim, dependents, f);
            result = RootFinder.outwardFrom(residual, start.si());
            first = start.si();
        } else {
            Value low = real.eval(f.low());
            Value high = real.eval(f.high());
            if (!low.known() || !high.known()) return failed(name);
            if (!low.dimension().equals(high.dimension())) {
                reporter.report(Code.UNIT_MISMATCH, Span.cover(f.low().span(), f.high().span()), "the bracket's ends differ "
                    + "in dimension: " + Shown.value(low) + " is " + low.dimension().describe() + ", "
                    + Shown.value(high) + " is " + high.dimension().describe());
                return failed(name);
            }
            dim = low.dimension();
            if (low.si() == high.si()) {
                reporter.report(Code.SOLVE_NO_ROOT, Span.cover(f.low().span(), f.high().span()), "the bracket "
                    + Shown.source(text, Span.cover(f.low().span(), f.high().span())) + " holds a single value, so there is "
                    + "nothing to search: give two different ends, LOW .. HIGH, around the value you expect");
                return failed(name);
            }
            residual = residual(name, dim, dependents, f);
            result = RootFinder.within(residual, low.si(), high.si());
            first = low.si();
        }
        Unit unit = DisplayChoice.ofSeek(f, dim, units);
        boolean solved = result.status() == RootFinder.Status.SOLVED;
        double at = solved ? result.root() : result.status() == RootFinder.Status.NO_ROOT ? result.low() : first;
        int before = reporter.size();
        // Unsolved, the definitions that depend on NAME are never evaluated at a value: what went
        // wrong in them is reported here, at their own lines, once.
        Value[] sides = finalSides(name, dim, at, dependents, f, solved ? Reporter.discarding() : reporter);
        if (sides == null || result.status() == RootFinder.Status.NO_VALUE) {
            // A mistake in the statement itself is reported there; one elsewhere that the
            // equation reaches is named here too, so the unsolved value is never a mystery.
            List<dev.plumb.diagnostics.Diagnostic> elsewhere = reporter.since(before).stream()
                .filter(d -> d.span().start() < f.span().start() || d.span().start() >= f.span().end()).toList();
            if (!elsewhere.isEmpty()) reportNotEvaluated(f, Value.of(at, dim), unit, elsewhere);
            return failed(name);
        }
        switch (result.status()) {
            case NO_ROOT -> {
                reportNoRoot(f, result, dim, unit, sides[0].dimension(), dependents);
                return failed(name);
            }
            case TOO_WIDE -> {
                reporter.report(Code.SOLVE_NOT_CONVERGED, f.name().span(), "the bracket is too wide to find the root of "
                    + name + " to the accuracy Plumb needs: it lies near " + show(result.root(), dim, unit) + ", small beside a "
                    + "bracket from " + show(result.low(), dim, unit) + " to " + show(result.high(), dim, unit)
                    + "; narrow the bracket around the value you expect");
                return failed(name);
            }
            case NOT_CONVERGED -> {
                String last = Double.isFinite(result.residual())
                    ? "; the residual there is still " + showResidual(result.residual(), sides[0].dimension(),
                        DisplayUnits.defaultFor(sides[0].dimension()))
                    : "";
                reporter.report(Code.SOLVE_NOT_CONVERGED, f.name().span(), "no root of " + name + " after "
                    + result.iterations() + " evaluations: the bracket closed in on " + show(result.low(), dim, unit)
                    + " .. " + show(result.high(), dim, unit) + last + ". The two sides may jump there (a pole or a step) "
                    + "rather than cross: check the equation, or move the bracket away from that point");
                return failed(name);
            }
            default -> {
            }
        }
        if (result.brackets().size() > 1) reportMultiple(f, result, dim, unit);
        Value root = Value.of(result.root(), dim);
        List<Solution.Step> steps = new ArrayList<>();
        for (RootFinder.Iterate it : result.record()) {
            steps.add(new Solution.Step(it.n(), it.x(), it.residual(), it.low(), it.high()));
        }
        return new Outcome(root, new Solution(result.residual(), sides[0].dimension(), steps));
    }

    /** The residual LHS − RHS for a trial value of NAME (SI); NaN where it cannot be computed. */
    private DoubleUnaryOperator residual(String name, Dimension dim, List<Statement.Definition> dependents,
                                         Statement.Seek f) {
        return x -> {
            Value[] sides = evaluateAt(name, Value.of(x, dim), dependents, Reporter.discarding(), f);
            if (sides == null || !sides[0].dimension().equals(sides[1].dimension())) return Double.NaN;
            return sides[0].si() - sides[1].si();
        };
    }

    /** Evaluates NAME's dependents at a trial value, then both sides of the equation. */
    private Value[] evaluateAt(String name, Value x, List<Statement.Definition> dependents, Reporter r, Statement.Seek f) {
        Environment trial = plan.evaluate(env, java.util.Map.of(name, x), dependents, r, budget);
        Evaluator e = evaluator(trial, r);
        Value lhs = e.eval(f.lhs());
        Value rhs = e.eval(f.rhs());
        return lhs.known() && rhs.known() ? new Value[] {lhs, rhs} : null;
    }

    /**
     * Once, for real, at the root (or the bracket's low end when there is none): reports the
     * equation's own findings, and the dependents' to {@code dependentsTo}.
     */
    private Value[] finalSides(String name, Dimension dim, double at, List<Statement.Definition> dependents,
                               Statement.Seek f, Reporter dependentsTo) {
        Environment trial = plan.evaluate(env, java.util.Map.of(name, Value.of(at, dim)), dependents, dependentsTo, budget);
        Evaluator real = evaluator(trial, reporter);
        Value lhs = real.eval(f.lhs());
        Value rhs = real.eval(f.rhs());
        if (!lhs.known() || !rhs.known()) return null;
        if (!lhs.dimension().equals(rhs.dimension())) {
            reporter.report(Code.UNIT_MISMATCH, f.equation(), "the two sides of the equation differ in dimension: "
                + Shown.source(text, f.lhs().span()) + " is " + lhs.dimension().describe() + ", "
                + Shown.source(text, f.rhs().span()) + " is " + rhs.dimension().describe());
            return null;
        }
        return new Value[] {lhs, rhs};
    }

    private static Outcome failed(String name) {
        return new Outcome(Value.UNKNOWN, null);
    }

    /** The equation has no value: says so, and why, with the first finding the real evaluation gave. */
    private void reportNotEvaluated(Statement.Seek f, Value at, Unit unit, List<dev.plumb.diagnostics.Diagnostic> causes) {
        String name = f.name().text();
        String equation = Shown.source(text, f.equation());
        String where = name + " = " + Shown.value(at, unit, 4);
        String why;
        {
            dev.plumb.diagnostics.Diagnostic first = causes.get(0);
            int line = (int) text.substring(0, Math.min(first.span().start(), text.length())).chars().filter(ch -> ch == '\n')
                .count() + 1;
            why = "on line " + line + ", " + first.message() + (causes.size() > 1 ? " (and " + (causes.size() - 1)
                + " more finding" + (causes.size() > 2 ? "s" : "") + ")" : "");
        }
        reporter.report(Code.SOLVE_NOT_EVALUATED, f.name().span(), name + " is not solved: the equation `" + equation
            + "` cannot be evaluated at " + where + ": " + why + "; fix that, and the solve runs");
    }

    private void reportNoRoot(Statement.Seek f, RootFinder.Result r, Dimension dim, Unit unit, Dimension residualDim,
                              List<Statement.Definition> dependents) {
        Unit ru = DisplayUnits.defaultFor(residualDim);
        String ends = "LHS − RHS is " + showResidual(r.fLow(), residualDim, ru) + " at " + show(r.low(), dim, unit) + " and "
            + showResidual(r.fHigh(), residualDim, ru) + " at " + show(r.high(), dim, unit);
        String fix = r.wider() != null
            ? "; a wider search finds a sign change between " + show(r.wider()[0], dim, unit) + " and "
                + show(r.wider()[1], dim, unit) + ": widen the bracket to include it"
            : "; no sign change either in a range a thousand times wider: check the equation";
        String where = f.start() != null ? " searching outward from the start value" : " in the bracket";
        List<String> ranges = rangeFindings(f, dim, unit, dependents, r.low(), r.high());
        String name = f.name().text();
        if (!ranges.isEmpty()) {
            reporter.report(Code.SOLVE_NO_ROOT, f.name().span(), "no root of " + name + where + ", and the equation "
                + "uses a correlation outside its valid range there, which is usually why: "
                + String.join("; ", ranges.subList(0, Math.min(3, ranges.size())))
                + (ranges.size() > 3 ? " (and " + (ranges.size() - 3) + " more)" : "")
                + ". Check that the correlation suits this case, or choose one valid over the bracket, before widening it. "
                + "The two sides do not cross (" + ends + ")" + fix);
            return;
        }
        reporter.report(Code.SOLVE_NO_ROOT, f.name().span(), "no root of " + name + where
            + ": the two sides do not cross (" + ends + ")" + fix);
    }

    /**
     * The range findings (range.outside, range.regime) of the equation and its dependents at the
     * bracket's two ends, each introduced by where it was found; evaluated quietly, collected.
     */
    private List<String> rangeFindings(Statement.Seek f, Dimension dim, Unit unit, List<Statement.Definition> dependents,
                                       double low, double high) {
        List<String> out = new ArrayList<>();
        for (double x : new double[] {low, high}) {
            Reporter collected = new Reporter();
            evaluateAt(f.name().text(), Value.of(x, dim), dependents, collected, f);
            for (dev.plumb.diagnostics.Diagnostic d : collected.all()) {
                if (d.code() == Code.RANGE_OUTSIDE || d.code() == Code.RANGE_REGIME) {
                    out.add("at " + f.name().text() + " = " + show(x, dim, unit) + ", " + d.message());
                }
            }
        }
        return out;
    }

    private void reportMultiple(Statement.Seek f, RootFinder.Result r, Dimension dim, Unit unit) {
        List<String> all = new ArrayList<>();
        for (double[] b : r.brackets()) all.add(show(b[0], dim, unit) + " .. " + show(b[1], dim, unit));
        reporter.report(Code.SOLVE_MULTIPLE_ROOTS, f.name().span(), f.name().text() + " has " + r.brackets().size()
            + " roots in the bracket, between " + String.join("; ", all) + "; the first, "
            + show(r.root(), dim, unit) + ", is taken: narrow the bracket to choose another");
    }

    private static String show(double si, Dimension dim, Unit unit) {
        return Shown.value(Value.of(si, dim), unit, 4);
    }

    private static String showResidual(double si, Dimension dim, Unit unit) {
        return Double.isFinite(si) ? Shown.value(Value.of(si, dim), unit, 4) : "not computable";
    }
}
