package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Fix;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.BiFunction;

/**
 * Calls a correlation or reads a table column, with the checks a reviewer needs at every call:
 * parameter dimensions, the {@code valid} range (with the library's alternatives that do cover
 * the value), the boundary-layer regime, and which piece of a piecewise formula applies.
 */
final class CorrelationCall {
    private final Evaluator caller;
    private final Reporter reporter;
    private final BiFunction<Expr, Value, String> operand;
    private final UnitRegistry units;
    private final RangeAdvice advice;

    CorrelationCall(Evaluator caller, Reporter reporter, BiFunction<Expr, Value, String> operand, UnitRegistry units) {
        this.caller = caller;
        this.reporter = reporter;
        this.operand = operand;
        this.units = units;
        this.advice = new RangeAdvice(caller, reporter, units);
    }

    Value correlation(Expr.Call c, Binding.CorrelationBinding b, List<Value> args) {
        Statement.Correlation def = b.def();
        String name = def.name().text();
        if (b.circular() || !dimensionsFit(c, name, def.params(), args)) return Value.UNKNOWN;
        roles(c, name, def.params(), args);
        bareAngles(c, name, def.params(), args);
        Map<String, Value> params = RangeCheck.bind(def.params(), args);
        Reporter inner = reporter.inCorrelation(name, c.span(), b.file());
        Evaluator inside = new Evaluator(b.scope(), caller.environmentOf(b.scope()), params, inner, b.scope().text(), units,
            caller.budget());
        Set<String> names = params.keySet();
        String outside = outsideDomain(c, name, def.domain(), inside, b.scope().text(), names);
        if (outside != null) {
            reporter.call(new Analysis.CallSite(c.callee().span(), name, arguments(def, args), Analysis.Standing.OUTSIDE_DOMAIN,
                List.of(outside), StdlibCatalog.validText(b), null));
            return Value.UNKNOWN;
        }
        // Range and regime are judged only where the findings are kept: a solve's trials skip the words and the search for alternatives.
        List<String> breaches = new ArrayList<>();
        if (reporter.keepsRanges()) {
            for (Statement.Bound bound : def.valid()) {
                String why = RangeCheck.violation(bound, inside, b.scope().text(), names);
                if (why != null) {
                    advice.outside(c, name + " is " + why, advice.alternatives(b, args));
                    breaches.add(why);
                }
            }
            advice.regime(c, b, params, args);
        }
        String basis = def.basis() == null ? null : def.basis().text();
        String flow = def.flow() == null ? null : def.flow().text();
        // Findings inside the formula go to the correlation's own reporter; none applying is the call's.
        Pieces.Chosen chosen = new Pieces(inside, inner, b.scope().text()).choose(def.pieces(), why -> reporter.report(
            Code.RANGE_NO_FORMULA, c.span(), "no formula of " + name + " applies at " + argumentWords(def, args)
                + ": every `when` condition is false; add a last line `= … otherwise` to " + name));
        Statement.Piece piece = chosen.piece();
        if (reporter.keeps()) callSite(c, b, def, args, breaches, piece);
        return noted(chosen.value(), basis, flow, name);
    }

    private void callSite(Expr.Call c, Binding.CorrelationBinding b, Statement.Correlation def, List<Value> args,
                          List<String> breaches, Statement.Piece piece) {
        String range = StdlibCatalog.validText(b);
        Analysis.Standing standing = !breaches.isEmpty() ? Analysis.Standing.OUTSIDE
            : range.isEmpty() ? Analysis.Standing.NO_RANGE : Analysis.Standing.INSIDE;
        reporter.call(new Analysis.CallSite(c.callee().span(), def.name().text(), arguments(def, args), standing, breaches,
            range, piece == null ? null : PieceUsed.describe(def, piece, b.scope())));
    }

    Value table(Expr.Call c, Binding.TableBinding t, List<Value> args) {
        Statement.Table def = t.def();
        if (!dimensionsFit(c, t.name(), List.of(def.param()), args)) return Value.UNKNOWN;
        bareAngles(c, t.name(), List.of(def.param()), args);
        TableData data = t.data();
        Value x = args.get(0);
        if (!x.dimension().equals(data.argument)) {
            reporter.report(Code.UNIT_MISMATCH, c.args().get(0).span(), t.name() + " reads its table by "
                + data.argument.describe() + ", but " + operand.apply(c.args().get(0), x) + " is " + x.dimension().describe());
            return Value.UNKNOWN;
        }
        String param = def.param().name().text();
        Map<String, Value> params = Map.of(param, x);
        Evaluator inside = new Evaluator(t.scope(), caller.environmentOf(t.scope()), params,
            reporter.inCorrelation(t.name(), c.span(), t.file()), t.scope().text(), units, caller.budget());
        String outside = outsideDomain(c, t.name(), def.domain(), inside, t.scope().text(), params.keySet());
        if (outside != null) {
            reporter.call(new Analysis.CallSite(c.callee().span(), t.name(),
                List.of(new Analysis.Argument(param, x, data.argumentUnit)), Analysis.Standing.OUTSIDE_DOMAIN,
                List.of(outside), StdlibCatalog.validText(t), null));
            return Value.UNKNOWN;
        }
        if (!data.covers(x.si()) && reporter.keepsRanges()) {
            String lo = Shown.value(Value.of(data.first(), data.argument), data.argumentUnit, 4);
            String hi = Shown.value(Value.of(data.last(), data.argument), data.argumentUnit, 4);
            boolean above = x.si() > data.last();
            Value limit = Value.of(above ? data.last() : data.first(), data.argument);
            advice.outside(c, t.name() + " reads its table from " + lo + " to " + hi + ", but "
                + param + " = " + Shown.value(x, data.argumentUnit, 4) + " here: "
                + RangeCheck.distance(x, limit, above, data.argumentUnit, above ? "the last row" : "the first row")
                + "; the value is extrapolated with the slope of the " + (above ? "last" : "first") + " two rows",
                advice.alternatives(t, args));
        }
        for (Statement.Bound bound : reporter.keepsRanges() ? def.valid() : List.<Statement.Bound>of()) {
            String why = RangeCheck.violation(bound, inside, t.scope().text(), params.keySet());
            if (why != null) advice.outside(c, t.name() + " is " + why, advice.alternatives(t, args));
        }
        if (reporter.keeps()) reporter.call(new Analysis.CallSite(c.callee().span(), t.name(),
            List.of(new Analysis.Argument(param, x, data.argumentUnit)),
            data.covers(x.si()) ? Analysis.Standing.TABLE_INSIDE : Analysis.Standing.TABLE_BEYOND, List.of(),
            StdlibCatalog.validText(t), null));
        double v = data.at(x.si());
        if (Double.isNaN(v)) {
            reporter.report(Code.MATH_DOMAIN, c.span(), t.name() + " interpolates log–log, so it needs a positive "
                + param + ", but " + operand.apply(c.args().get(0), x) + " is not");
            return Value.UNKNOWN;
        }
        return noted(Value.of(v, data.result), def.basis() == null ? null : def.basis().text(),
            def.flow() == null ? null : def.flow().text(), t.name());
    }

    /**
     * Checks the {@code domain} lines: outside them the formula has no physical meaning (a
     * negative Reynolds number, a negative length), so the call is an error and its value unknown,
     * and nothing downstream is computed from it. Returns the verdict for hover, or null inside.
     */
    private String outsideDomain(Expr.Call c, String name, List<Statement.Bound> domain, Evaluator inside, String text,
                                 Set<String> names) {
        for (Statement.Bound bound : domain) {
            String unlike = RangeCheck.mismatch(bound, inside, text);
            if (unlike != null) {
                // The domain cannot be judged: say so rather than pass the value on unchecked.
                reporter.report(Code.UNIT_MISMATCH, c.span(), name + "'s domain line compares unlike quantities, " + unlike
                    + ": give the limit the argument's unit; the value is not computed");
                return "its domain cannot be judged: " + unlike;
            }
            String why = RangeCheck.outsideDomain(bound, inside, text, names);
            if (why == null) continue;
            reporter.report(Code.MATH_DOMAIN, c.span(), name + " is defined only for " + why + ", outside its physical "
                + "domain: the value is not computed, and nothing is computed from it; check the sign and the units of "
                + "what this argument is made of");
            return "outside its physical domain: " + why;
        }
        return null;
    }

    /** A correlation's result carries its basis: a coefficient's, or a tagged area's. */
    private static Value noted(Value v, String basis, String flow, String name) {
        return v.known() ? v.noted(BasisRules.result(v, basis, flow, name)) : v;
    }

    private boolean dimensionsFit(Expr.Call c, String name, List<Statement.Param> params, List<Value> args) {
        for (int i = 0; i < params.size(); i++) {
            Statement.Param p = params.get(i);
            Dimension wanted = p.dimension() == null ? null : ParameterDimensions.of(p.dimension().text());
            if (wanted == null || wanted.equals(args.get(i).dimension())) continue;
            reporter.report(Code.UNIT_MISMATCH, c.args().get(i).span(), name + " takes " + p.name().text() + " as "
                + wanted.describe() + ", but " + operand.apply(c.args().get(i), args.get(i)) + " is "
                + args.get(i).dimension().describe());
            return false;
        }
        return true;
    }

    /**
     * Warns where a parameter declared {@code : angle} gets a number with no angle unit: angles
     * are dimensionless, so a bare 30 is 30 rad (1719°), and that is seldom what was meant.
     */
    private void bareAngles(Expr.Call c, String name, List<Statement.Param> params, List<Value> args) {
        for (int i = 0; i < params.size(); i++) {
            Statement.Param p = params.get(i);
            Value v = args.get(i);
            if (p.dimension() == null || !p.dimension().text().equals("angle") || v.angle()) continue;
            Expr arg = c.args().get(i);
            String rad = QuantityFormat.number(v.si(), 4);
            String deg = QuantityFormat.number(Math.toDegrees(v.si()), 4);
            String head = name + " takes " + p.name().text() + " as an angle, but ";
            String message = Expr.inner(arg) instanceof Expr.Quantity q && q.unit() == null
                ? head + q.numberText() + " is a plain number, read as " + rad + " rad (" + deg + "°): write "
                    + q.numberText() + " deg, or " + q.numberText() + " rad when radians are meant"
                : head + operand.apply(arg, v) + " carries no angle unit, so it is read as " + rad + " rad (" + deg
                    + "°): give it its unit where it is defined (`30 deg`, `0.5 rad`), or write `* 1 rad` when it"
                    + " is a number of radians";
            reporter.report(Code.UNIT_BARE_ANGLE, arg.span(), message);
        }
    }

    /** Warns where a parameter declared `as fluid` gets a density tagged body, or the other way round. */
    private void roles(Expr.Call c, String name, List<Statement.Param> params, List<Value> args) {
        for (int i = 0; i < params.size(); i++) {
            Statement.Param p = params.get(i);
            BasisNotes.Density given = args.get(i).notes() == null ? null : args.get(i).notes().density();
            // An unknown role word is reported where the correlation is declared.
            if (p.role() == null || !BlockChecks.DENSITY_TAGS.contains(p.role().text())) continue;
            if (given == null || given.tag().equals(p.role().text())) continue;
            String fix = p.role().text().equals("fluid") ? "pass the density of the fluid around the body (air, water)"
                : "pass the density of the body itself";
            // The document's densities of the right kind, once all are known, are the repairs.
            reporter.report(Code.BASIS_DENSITY, c.args().get(i).span(), name + " takes " + p.name().text()
                + " as the density of the " + p.role().text() + ", but " + given.label() + " is tagged " + given.tag()
                + ": " + fix, List.of(), List.of(new FixRequest.TaggedDensity(p.role().text(), c.args().get(i).span())));
        }
    }


    private static List<Analysis.Argument> arguments(Statement.Correlation def, List<Value> args) {
        List<Analysis.Argument> out = new ArrayList<>();
        for (int i = 0; i < args.size(); i++) out.add(new Analysis.Argument(def.params().get(i).name().text(), args.get(i), null));
        return out;
    }

    /** "Re = 3e5, k = 0.1" for a message. */
    private static String argumentWords(Statement.Correlation def, List<Value> args) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < args.size(); i++) parts.add(def.params().get(i).name().text() + " = " + Shown.value(args.get(i)));
        return String.join(", ", parts);
    }
}
