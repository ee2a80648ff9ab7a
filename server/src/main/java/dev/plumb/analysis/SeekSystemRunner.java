package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Solves a several-unknown {@code seek} as {@link SeekRunner} solves a one-unknown one: every
 * trial binds all the unknowns at once and re-evaluates the definitions that depend on any of
 * them ({@link Plan#dependentsOf} the first unknown) through the document's {@link Plan},
 * quietly; the residuals go to {@link SystemSolver}. At the solution the equations are evaluated
 * once more for real, so their findings describe the solution. Counts, dimensions, dependent
 * equations, a solve that does not converge and a solution outside the brackets are findings.
 */
final class SeekSystemRunner extends SolvingRunner {
    /** The unknowns' values (UNKNOWN each on failure), the units they are shown in, and how they were solved. */
    record Outcome(List<Value> values, List<Unit> units, Solution solution) {
    }

    SeekSystemRunner(Plan plan, Scope scope, Environment env, Reporter reporter, String text, UnitRegistry units,
                     Budget budget) {
        super(plan, scope, env, reporter, text, units, budget);
    }

    Outcome run(Statement.SeekSystem k) {
        Statement.Equations q = k.system();
        List<String> names = SeekSystems.unknowns(k);
        int n = names.size();
        if (!counted(q, names) || !SeekSystems.ownsAll(k, plan.own())) return failed(n);
        Evaluator real = evaluator(env, reporter);
        Value[] start = new Value[n];
        double[] low = new double[n];
        double[] high = new double[n];
        double[] xScale = new double[n];
        for (int j = 0; j < n; j++) {
            if (q.bracketed()) {
                Value lo = real.eval(q.lows().get(j));
                Value hi = real.eval(q.highs().get(j));
                if (!lo.known() || !hi.known()) return failed(n);
                if (!lo.dimension().equals(hi.dimension())) {
                    Span both = Span.cover(q.lows().get(j).span(), q.highs().get(j).span());
                    reporter.report(Code.UNIT_MISMATCH, both, "the bracket's ends differ in dimension: " + Shown.value(lo)
                        + " is " + lo.dimension().describe() + ", " + Shown.value(hi) + " is " + hi.dimension().describe());
                    return failed(n);
                }
                low[j] = Math.min(lo.si(), hi.si());
                high[j] = Math.max(lo.si(), hi.si());
                start[j] = Value.of((low[j] + high[j]) / 2, lo.dimension()).asAngle(lo.angle());
                xScale[j] = scale(start[j].si(), high[j] - low[j]);
            } else {
                start[j] = real.eval(q.starts().get(j));
                if (!start[j].known()) return failed(n);
                xScale[j] = scale(start[j].si(), 0);
            }
        }
        List<Unit> shown = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            Expr written = q.bracketed() ? q.lows().get(j) : q.starts().get(j);
            shown.add(DisplayChoice.writtenOrSi(written, start[j].dimension(), units));
        }
        List<Statement.Definition> dependents = plan.dependentsOf(names.get(0));
        double[] x0 = new double[n];
        for (int j = 0; j < n; j++) x0[j] = start[j].si();
        // At the start, quietly: every equation must have a value and one dimension on both sides.
        Value[][] sides = sidesAt(names, start, x0, dependents, Reporter.discarding(), Reporter.discarding());
        if (sides == null) {
            notEvaluated(k, names, start, x0, dependents, shown);
            return failed(n);
        }
        for (int i = 0; i < n; i++) {
            if (!sides[i][0].dimension().equals(sides[i][1].dimension())) {
                Statement.Equation e = q.equations().get(i);
                reporter.report(Code.UNIT_MISMATCH, e.span(), "the two sides of equation " + (i + 1) + " differ in "
                    + "dimension: " + Shown.source(text, e.lhs().span()) + " is " + sides[i][0].dimension().describe() + ", "
                    + Shown.source(text, e.rhs().span()) + " is " + sides[i][1].dimension().describe());
                return failed(n);
            }
        }
        double[] magnitude = new double[n];
        for (int i = 0; i < n; i++) magnitude[i] = Math.max(Math.abs(sides[i][0].si()), Math.abs(sides[i][1].si()));
        SystemSolver.Result r = SystemSolver.solve(x -> residuals(names, start, x, dependents), x0, xScale, magnitude);
        Span at = Span.cover(q.unknowns().get(0).span(), q.unknowns().get(n - 1).span());
        switch (r.status()) {
            case NO_VALUE -> {
                notEvaluated(k, names, start, x0, dependents, shown);
                return failed(n);
            }
            case SINGULAR -> {
                reportSingular(q, names, r, start, shown, at);
                return unsolved(names, start, x0, dependents, q, n);
            }
            case NOT_CONVERGED -> {
                reportNotConverged(q, names, r, start, shown, at, x0);
                return unsolved(names, start, x0, dependents, q, n);
            }
            default -> {
            }
        }
        if (q.bracketed() && outside(q, names, r.x(), low, high, start, shown, at)) {
            return unsolved(names, start, x0, dependents, q, n);
        }
        // Once for real at the solution: the equations' own findings describe it. The dependents
        // are evaluated in their own places afterwards, with the solved values.
        Value[][] finalSides = sidesAt(names, start, r.x(), dependents, Reporter.discarding(), reporter);
        if (finalSides == null) return failed(n);
        List<Value> values = new ArrayList<>();
        for (int j = 0; j < n; j++) values.add(trial(start[j], r.x()[j]));
        List<SystemSolution.Residual> residuals = new ArrayList<>();
        double worst = 0;
        for (int i = 0; i < n; i++) {
            Statement.Equation e = q.equations().get(i);
            double res = finalSides[i][0].si() - finalSides[i][1].si();
            residuals.add(new SystemSolution.Residual(Shown.source(text, e.span()), res, finalSides[i][0].dimension()));
            worst = Math.max(worst, magnitude[i] > 0 ? Math.abs(res) / magnitude[i] : Math.abs(res));
        }
        List<SystemSolution.Iterate> record = new ArrayList<>();
        for (SystemSolver.Iterate it : r.record()) record.add(new SystemSolution.Iterate(it.n(), boxed(it.x()), boxed(it.residual())));
        List<Dimension> dims = new ArrayList<>();
        for (Value v : start) dims.add(v.dimension());
        SystemSolution system = new SystemSolution(names, shown, dims, residuals, r.method(), r.evaluations(), record);
        return new Outcome(values, shown, new Solution(worst, Dimension.NONE, List.of(), system));
    }

    /** The size an unknown is measured in: its start value's magnitude, else its bracket's width, else 1 SI. */
    private static double scale(double start, double width) {
        if (start != 0 && Double.isFinite(start)) return Math.abs(start);
        return width > 0 && Double.isFinite(width) ? width : 1;
    }

    private static Value trial(Value start, double x) {
        return Value.of(x, start.dimension()).asAngle(start.angle());
    }

    private static List<Double> boxed(double[] v) {
        List<Double> out = new ArrayList<>();
        for (double d : v) out.add(d);
        return out;
    }

    /** As many start values (or brackets) and equations as unknowns; a mismatch is reported. */
    private boolean counted(Statement.Equations q, List<String> names) {
        int n = names.size();
        Span unknowns = Span.cover(q.unknowns().get(0).span(), q.unknowns().get(n - 1).span());
        String list = String.join(", ", names);
        int given = q.bracketed() ? q.lows().size() : q.starts().size();
        if (given != n) {
            List<Expr> written = q.bracketed() ? q.highs() : q.starts();
            Span where = Span.cover((q.bracketed() ? q.lows() : q.starts()).get(0).span(), written.get(written.size() - 1).span());
            reporter.report(Code.SOLVE_COUNT_MISMATCH, where, count(n, "unknown") + " (" + list + ") but "
                + count(given, q.bracketed() ? "bracket" : "start value") + ": give one "
                + (q.bracketed() ? "bracket LOW .. HIGH" : "start value") + " per unknown, in the same order");
            return false;
        }
        int equations = q.equations().size();
        if (equations != n) {
            Span where = Span.cover(q.equations().get(0).span(), q.equations().get(equations - 1).span());
            reporter.report(Code.SOLVE_COUNT_MISMATCH, where, count(n, "unknown") + " (" + list + ") but "
                + count(equations, "equation") + ": " + (equations < n
                    ? "with fewer equations than unknowns the solution is not determined; add an equation, or give "
                        + "one of the unknowns a value"
                    : "with more equations than unknowns they cannot all hold in general; remove one, or make one of "
                        + "the given values an unknown"));
            return false;
        }
        return true;
    }

    private static String count(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    /** LHS − RHS of every equation with the unknowns at {@code x} (SI); NaN where one has no value. */
    private double[] residuals(List<String> names, Value[] start, double[] x, List<Statement.Definition> dependents) {
        Value[][] sides = sidesAt(names, start, x, dependents, Reporter.discarding(), Reporter.discarding());
        double[] out = new double[start.length];
        for (int i = 0; i < out.length; i++) {
            boolean ok = sides != null && sides[i][0].dimension().equals(sides[i][1].dimension());
            out[i] = ok ? sides[i][0].si() - sides[i][1].si() : Double.NaN;
        }
        return out;
    }

    /** Both sides of every equation with the unknowns bound at {@code x}; null when a side has no value. */
    private Value[][] sidesAt(List<String> names, Value[] start, double[] x, List<Statement.Definition> dependents,
                              Reporter dependentsTo, Reporter equationsTo) {
        Map<String, Value> bound = new HashMap<>();
        for (int j = 0; j < names.size(); j++) bound.put(names.get(j), trial(start[j], x[j]));
        Environment trial = plan.evaluate(env, bound, dependents, dependentsTo, budget);
        Evaluator e = evaluator(trial, equationsTo);
        List<Statement.Equation> equations = ((Statement.SeekSystem) plan.own().get(names.get(0))).system().equations();
        Value[][] out = new Value[equations.size()][];
        boolean known = true;
        for (int i = 0; i < equations.size(); i++) {
            Value lhs = e.eval(equations.get(i).lhs());
            Value rhs = e.eval(equations.get(i).rhs());
            known &= lhs.known() && rhs.known();
            out[i] = new Value[] {lhs, rhs};
        }
        return known ? out : null;
    }

    private static Outcome failed(int n) {
        List<Value> unknown = new ArrayList<>();
        List<Unit> none = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            unknown.add(Value.UNKNOWN);
            none.add(null);
        }
        return new Outcome(unknown, none, null);
    }

    /**
     * Unsolved, the definitions that depend on the unknowns are never evaluated at a value: what
     * goes wrong in them and in the equations is reported here, at the start, once.
     */
    private Outcome unsolved(List<String> names, Value[] start, double[] x0, List<Statement.Definition> dependents,
                             Statement.Equations q, int n) {
        sidesAt(names, start, x0, dependents, reporter, reporter);
        return failed(n);
    }

    /** The equations have no value at the start: says so, naming the first finding outside the statement. */
    private void notEvaluated(Statement.SeekSystem k, List<String> names, Value[] start, double[] x0,
                              List<Statement.Definition> dependents, List<Unit> shown) {
        int before = reporter.size();
        sidesAt(names, start, x0, dependents, reporter, reporter);
        List<Diagnostic> elsewhere = reporter.since(before).stream()
            .filter(d -> d.span().start() < k.span().start() || d.span().start() >= k.span().end()).toList();
        if (elsewhere.isEmpty()) return;
        Diagnostic first = elsewhere.get(0);
        int line = (int) text.substring(0, Math.min(first.span().start(), text.length())).chars().filter(ch -> ch == '\n')
            .count() + 1;
        Statement.Equations q = k.system();
        reporter.report(Code.SOLVE_NOT_EVALUATED, Span.cover(q.unknowns().get(0).span(), q.unknowns().get(names.size() - 1)
            .span()), String.join(", ", names) + " are not solved: the equations cannot be evaluated at "
            + point(names, start, x0, shown) + ": on line " + line + ", " + first.message()
            + (elsewhere.size() > 1 ? " (and " + (elsewhere.size() - 1) + " more finding" + (elsewhere.size() > 2 ? "s" : "")
                + ")" : "") + "; fix that, and the solve runs");
    }

    private void reportSingular(Statement.Equations q, List<String> names, SystemSolver.Result r, Value[] start,
                                List<Unit> shown, Span at) {
        List<String> equations = new ArrayList<>();
        for (int i : r.dependent()) equations.add((i + 1) + " (`" + Shown.source(text, q.equations().get(i).span()) + "`)");
        List<String> free = new ArrayList<>();
        for (int j : r.undetermined()) free.add(names.get(j));
        String which = equations.size() == 1 ? "equation " + equations.get(0) + " does not depend on the unknowns there"
            : "equations " + joined(equations) + " are not independent: one follows from the other"
                + (equations.size() > 2 ? "s" : "");
        reporter.report(Code.SOLVE_SINGULAR, at, "the system cannot fix " + joined(free) + ": " + which + " near "
            + point(names, start, r.x(), shown) + ". Replace one of them with an equation that brings new information, "
            + "or give " + (free.size() == 1 ? free.get(0) : "one of " + joined(free)) + " a value");
    }

    private void reportNotConverged(Statement.Equations q, List<String> names, SystemSolver.Result r, Value[] start,
                                    List<Unit> shown, Span at, double[] x0) {
        List<String> residuals = new ArrayList<>();
        for (int i = 0; i < q.equations().size(); i++) {
            Dimension d = i < r.residual().length ? dimensionOfResidual(q, i, names, start, r.x()) : null;
            double v = r.residual()[i];
            String shownResidual = !Double.isFinite(v) ? "not computable"
                : d == null ? Shown.value(Value.number(v), DisplayUnits.defaultFor(Dimension.NONE), 4)
                : Shown.value(Value.of(v, d), DisplayUnits.defaultFor(d), 4);
            residuals.add(shownResidual + " in `" + Shown.source(text, q.equations().get(i).span()) + "`");
        }
        int w = r.wanders();
        String wander = w < 0 ? "" : "; " + names.get(w) + " moved farthest, from " + one(start[w], x0[w], shown.get(w))
            + " to " + one(start[w], r.x()[w], shown.get(w));
        reporter.report(Code.SOLVE_NOT_CONVERGED, at, "no solution of " + String.join(", ", names) + " after "
            + r.evaluations() + " evaluations (Newton, then Levenberg–Marquardt): at " + point(names, start, r.x(), shown)
            + ", LHS − RHS is still " + String.join(", ", residuals) + wander + ". The equations may have no solution "
            + "near the start: check them, or start nearer the solution you expect");
    }

    /** The dimension of equation i's sides (their dimension at the start), for wording its residual. */
    private Dimension dimensionOfResidual(Statement.Equations q, int i, List<String> names, Value[] start, double[] x) {
        double[] x0 = new double[start.length];
        for (int j = 0; j < start.length; j++) x0[j] = start[j].si();
        Value[][] sides = sidesAt(names, start, x0, plan.dependentsOf(names.get(0)), Reporter.discarding(),
            Reporter.discarding());
        return sides == null ? null : sides[i][0].dimension();
    }

    private boolean outside(Statement.Equations q, List<String> names, double[] x, double[] low, double[] high,
                            Value[] start, List<Unit> shown, Span at) {
        List<String> out = new ArrayList<>();
        for (int j = 0; j < names.size(); j++) {
            if (x[j] < low[j] || x[j] > high[j]) {
                out.add(names.get(j) + " = " + one(start[j], x[j], shown.get(j)) + " (bracket "
                    + Shown.source(text, Span.cover(q.lows().get(j).span(), q.highs().get(j).span())) + ")");
            }
        }
        if (out.isEmpty()) return false;
        reporter.report(Code.SOLVE_OUTSIDE_BRACKET, at, "the solution lies outside the brackets given: " + joined(out)
            + ", with " + point(names, start, x, shown) + ". The brackets say where the solution you want lies, so this "
            + "one is not taken: widen the bracket if it is the one you want, or move the brackets (the midpoints are "
            + "the start) toward the one you expect");
        return true;
    }

    private static String point(List<String> names, Value[] start, double[] x, List<Unit> shown) {
        List<String> parts = new ArrayList<>();
        for (int j = 0; j < names.size(); j++) parts.add(names.get(j) + " = " + one(start[j], x[j], shown.get(j)));
        return String.join(", ", parts);
    }

    private static String one(Value start, double x, Unit unit) {
        return Double.isFinite(x) ? Shown.value(trial(start, x), unit, 4) : "not computable";
    }

    private static String joined(List<String> parts) {
        if (parts.size() <= 1) return String.join("", parts);
        return String.join(", ", parts.subList(0, parts.size() - 1)) + " and " + parts.get(parts.size() - 1);
    }
}
