package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A library entry or table column as a curve around one of its calls: the entry evaluated over
 * its stated range of one argument (the others held at the call's values), with that range and the
 * call's own point, so a reader sees where the calc sits — and an argument outside the range at
 * once. Evaluated quietly (nothing is reported) within one small budget per curve; a curve that
 * exceeds it is not drawn.
 *
 * @param parameter the argument swept; {@code low}/{@code high} its stated range in SI (NaN: none)
 * @param xs the swept values (SI), {@code ys} the entry's values there (NaN where it has none)
 * @param logarithmic whether the swept range spans decades (then the samples are spaced evenly in log)
 */
public record EntryCurve(String entry, String parameter, Dimension xDimension, Unit xUnit, Dimension yDimension,
                         double[] xs, double[] ys, double low, double high, double x, double y, boolean logarithmic) {

    /**
     * One budget for a whole curve (its range and every sample): a curve is a picture, and a
     * library entry written by anyone must not make a report take longer than a few seconds each.
     */
    private static final long CURVE_STEPS = 2_000_000L;
    private static final long CURVE_SECONDS = 5;

    /** Decades a range must span to be drawn on a log axis. */
    private static final double LOG_SPAN = 30;

    /** Whether the call's argument lies within the stated range. */
    public boolean inside() {
        return (Double.isNaN(low) || x >= low) && (Double.isNaN(high) || x <= high);
    }

    /** The curve of the entry called at {@code call}, sampled at {@code points} values; empty when it cannot be drawn. */
    public static Optional<EntryCurve> of(Analysis a, Analysis.CallSite call, UnitRegistry units, int points) {
        try {
            return sample(a, call, units, points, new Budget(CURVE_STEPS, CURVE_SECONDS, () -> false));
        } catch (Budget.Exhausted e) {
            return Optional.empty();
        }
    }

    private static Optional<EntryCurve> sample(Analysis a, Analysis.CallSite call, UnitRegistry units, int points,
                                               Budget budget) {
        Binding b = a.scope().lookup(call.name());
        if (call.arguments().isEmpty() || call.arguments().stream().anyMatch(arg -> !arg.value().known())) {
            return Optional.empty();
        }
        double low = Double.NaN;
        double high = Double.NaN;
        int swept = 0;
        if (b instanceof Binding.TableBinding t) {
            low = t.data().first();
            high = t.data().last();
        } else if (b instanceof Binding.CorrelationBinding c) {
            List<Statement.Param> params = c.def().params();
            for (int i = 0; i < params.size() && Double.isNaN(low) && Double.isNaN(high); i++) {
                double[] range = range(c, params.get(i).name().text(), units, budget);
                if (!Double.isNaN(range[0]) || !Double.isNaN(range[1])) {
                    swept = i;
                    low = range[0];
                    high = range[1];
                }
            }
        } else {
            return Optional.empty();
        }
        Analysis.Argument arg = call.arguments().get(swept);
        double x = arg.value().si();
        double from = Double.isNaN(low) ? x : Math.min(low, x);
        double to = Double.isNaN(high) ? x : Math.max(high, x);
        boolean log = from > 0 && (to / from > LOG_SPAN || (from == to));
        if (from == to) {
            from = from > 0 ? from / 10 : from - 1;
            to = to > 0 ? to * 10 : to + 1;
        }
        // A margin either side, so the range's ends and a point just outside stay in view.
        if (log) {
            from /= 1.6;
            to *= 1.6;
        } else {
            double pad = (to - from) * 0.08;
            from -= pad;
            to += pad;
        }
        double[] xs = new double[points];
        double[] ys = new double[points];
        Dimension yDimension = null;
        for (int i = 0; i < points; i++) {
            double f = points == 1 ? 0 : (double) i / (points - 1);
            xs[i] = log ? Math.exp(Math.log(from) + f * (Math.log(to) - Math.log(from))) : from + f * (to - from);
            Value v = at(a, call, swept, Value.of(xs[i], arg.value().dimension()), units, budget);
            ys[i] = v.known() ? v.si() : Double.NaN;
            if (v.known()) yDimension = v.dimension();
        }
        Value here = at(a, call, swept, arg.value(), units, budget);
        if (!here.known() || yDimension == null) return Optional.empty();
        return Optional.of(new EntryCurve(call.name(), arg.name(), arg.value().dimension(), arg.unit(), yDimension, xs, ys,
            low, high, x, here.si(), log));
    }

    /** The entry at the call's arguments, one of them replaced. */
    private static Value at(Analysis a, Analysis.CallSite call, int swept, Value replaced, UnitRegistry units,
                            Budget budget) {
        Map<String, Value> locals = new HashMap<>();
        List<Expr> args = new ArrayList<>();
        for (int i = 0; i < call.arguments().size(); i++) {
            // Names no calc can write, so they never meet one of its own.
            String local = "\u0000argument " + i;
            locals.put(local, i == swept ? replaced : call.arguments().get(i).value());
            args.add(new Expr.Reference(Span.NONE, local));
        }
        Expr.Call synthetic = new Expr.Call(Span.NONE, new Ident(call.name(), Span.NONE), args);
        return new Evaluator(a.scope(), Environment.NONE, locals, Reporter.discarding(), a.text(), units, budget)
            .eval(synthetic);
    }

    /** The stated range of one parameter from the entry's `valid` lines: {low, high} in SI, NaN where none. */
    private static double[] range(Binding.CorrelationBinding c, String param, UnitRegistry units, Budget budget) {
        double low = Double.NaN;
        double high = Double.NaN;
        Evaluator constants = new Evaluator(c.scope(), Environment.NONE, Map.of(), Reporter.discarding(), c.scope().text(),
            units, budget);
        java.util.Set<String> params = new java.util.HashSet<>();
        c.def().params().forEach(p -> params.add(p.name().text()));
        for (Statement.Bound bound : c.def().valid()) {
            for (int i = 0; i < bound.comparators().size(); i++) {
                Expr left = Expr.inner(bound.operands().get(i));
                Expr right = Expr.inner(bound.operands().get(i + 1));
                Comparator op = bound.comparators().get(i);
                boolean ascending = op == Comparator.LT || op == Comparator.LE;
                boolean descending = op == Comparator.GT || op == Comparator.GE;
                if (right instanceof Expr.Reference r && r.name().equals(param) && !mentions(left, params)) {
                    Value v = constants.eval(left);
                    if (v.known() && ascending) low = v.si();
                    if (v.known() && descending) high = v.si();
                } else if (left instanceof Expr.Reference r && r.name().equals(param) && !mentions(right, params)) {
                    Value v = constants.eval(right);
                    if (v.known() && ascending) high = v.si();
                    if (v.known() && descending) low = v.si();
                }
            }
        }
        return new double[] {low, high};
    }

    /** Whether an expression uses one of the entry's parameters (then it is no constant bound). */
    private static boolean mentions(Expr e, java.util.Set<String> params) {
        boolean[] found = new boolean[1];
        References.each(e, (name, span) -> found[0] |= params.contains(name));
        return found[0];
    }
}
