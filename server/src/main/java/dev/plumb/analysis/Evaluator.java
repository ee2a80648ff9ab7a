package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.UnitText;
import dev.plumb.units.Dimension;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Evaluates expressions on doubles with their dimensions checked at every operation.
 * Each check is a small guard method; a failed guard reports once and yields
 * {@link Value#UNKNOWN}, which keeps everything built on it quiet.
 */
final class Evaluator {
    private final Scope scope;
    /** The values of the scope's own definitions (Environment.NONE: they are final in the scope). */
    private final Environment env;
    private final Map<String, Value> locals;
    /** The run's budget: every node evaluated takes one step of it. */
    private final Budget budget;
    private final Reporter reporter;
    private final String text;
    private final UnitRegistry units;
    private final BasisRules basis;
    private final Arithmetic arithmetic;

    /** An evaluation outside any run (a block's declarations), with a budget of its own. */
    Evaluator(Scope scope, Reporter reporter, String text, UnitRegistry units) {
        this(scope, Map.of(), reporter, text, units);
    }

    Evaluator(Scope scope, Map<String, Value> locals, Reporter reporter, String text, UnitRegistry units) {
        this(scope, Environment.NONE, locals, reporter, text, units, Budget.standalone());
    }

    Evaluator(Scope scope, Environment env, Map<String, Value> locals, Reporter reporter, String text, UnitRegistry units,
              Budget budget) {
        this.scope = scope;
        this.budget = budget;
        this.env = env;
        this.locals = locals;
        this.reporter = reporter;
        this.text = text;
        this.units = units;
        this.basis = new BasisRules(reporter, text);
        this.arithmetic = new Arithmetic(reporter, text, basis, this::operand);
    }

    Value eval(Expr e) {
        budget.step();
        if (e instanceof Expr.Group g) return eval(g.inner());
        if (e instanceof Expr.Binary b) return binary(b);
        if (e instanceof Expr.Reference r) return reference(r);
        if (e instanceof Expr.Quantity q) return quantity(q);
        if (e instanceof Expr.Call c) return call(c);
        if (e instanceof Expr.Piecewise p) {
            return new Pieces(this, reporter, text).choose(p.pieces(), why -> reporter.report(Code.RANGE_NO_FORMULA,
                p.span(), "no piece of this formula applies: " + why
                    + "; add a last piece `otherwise …`, or a `when` that covers this case")).value();
        }
        return unary((Expr.Unary) e);
    }

    /** The same evaluation, reporting nothing: to learn what a formula gives without judging it. */
    Evaluator quiet() {
        return new Evaluator(scope, env, locals, Reporter.discarding(), text, units, budget);
    }

    /** What a name stands for here: an own definition's value from the environment, else the scope's binding. */
    Binding lookup(String name) {
        Binding own = env.get(name);
        return own != null ? own : scope.lookup(name);
    }

    /** True when the name comes from the standard library (not defined or imported here). */
    boolean fromLibrary(String name) {
        return env.get(name) == null && scope.fromLibrary(name);
    }

    Scope scope() {
        return scope;
    }

    UnitRegistry units() {
        return units;
    }

    Budget budget() {
        return budget;
    }

    /** The dimensions of the parameters bound here (a function's or correlation's), for memos keyed by them. */
    java.util.List<Object> parameterDimensions() {
        if (locals.isEmpty()) return java.util.List.of();
        java.util.List<Object> out = new java.util.ArrayList<>(locals.size() * 2);
        for (var e : new java.util.TreeMap<>(locals).entrySet()) {
            out.add(e.getKey());
            out.add(e.getValue().dimension());
        }
        return out;
    }

    /** The environment to evaluate a body defined in {@code where} with: ours when it is our scope. */
    Environment environmentOf(Scope where) {
        return env.of(where) ? env : Environment.NONE;
    }

    // ---- leaves ----------------------------------------------------------------------

    private Value quantity(Expr.Quantity q) {
        return quantity(q, 1);
    }

    /** {@code sign} -1 reads {@code -15 degC} as the point 15 °C below zero, not minus the point 15 °C. */
    private Value quantity(Expr.Quantity q, int sign) {
        if (!Double.isFinite(q.number())) {
            reporter.report(Code.MATH_NOT_FINITE, q.span(),
                "the number " + q.numberText() + " is too large to compute with: use a larger unit or a smaller number");
            return Value.UNKNOWN;
        }
        if (q.unit() == null) {
            Value n = Value.number(sign * q.number());
            return n.noted(BasisRules.quantity(n, q));
        }
        Unit unit = resolveUnit(q.unit(), true);
        if (unit == null) return Value.UNKNOWN;
        Value.Temperature kind = unit.isOffsetScale() ? Value.Temperature.POINT : Value.Temperature.EITHER;
        Value v = new Value(unit.toSi(sign * q.number()), unit.dimension(), kind);
        return v.noted(BasisRules.quantity(v, q)).asAngle(Angles.isAngleUnit(q.unit().text(), unit));
    }

    /** Resolves a unit written in the source, reporting unknown ones with a fix. */
    Unit resolveUnit(UnitText written, boolean afterNumber) {
        UnitResult result = units.resolve(written.text());
        if (result instanceof UnitResult.Ok ok) return ok.unit();
        UnitResult.Error err = (UnitResult.Error) result;
        int start = written.span().start() + err.offset();
        int end = Math.min(written.span().end(), start + Math.max(1, err.length()));
        String message = err.message() + err.didYouMean();
        // Only a lone word can have been meant as a value's name; then the whole word is the mistake.
        if (afterNumber && written.text().matches("[\\p{L}_][\\p{L}\\p{Nd}_]*")) {
            start = written.span().start();
            end = written.span().end();
            message += ". A unit follows a number directly (`2 m` is two metres); to multiply by a value named "
                + written.text() + " write `2 * " + written.text() + "`";
        }
        List<dev.plumb.diagnostics.Fix> fixes = new ArrayList<>();
        for (UnitResult.Suggestion s : err.offers()) fixes.add(new dev.plumb.diagnostics.Fix("Change to " + s.described(), new Span(start, end), s.spelling()));
        reporter.report(Code.UNIT_UNKNOWN, new Span(start, end), message, fixes, List.of());
        return null;
    }

    private Value reference(Expr.Reference r) {
        Value local = locals.get(r.name());
        if (local != null) return local.known() ? local.noted(BasisRules.reference(r.name(), local)) : local;
        Binding b = lookup(r.name());
        if (b instanceof Binding.ValueBinding v) {
            return v.value().known() ? v.value().noted(BasisRules.reference(r.name(), v.value())) : v.value();
        }
        if (!(b instanceof Binding.ValueBinding) && b != null) {
            reporter.report(Code.NAME_KIND, r.span(),
                r.name() + " is a function: call it with its arguments, e.g. " + r.name() + "(…)");
        }
        // An unknown name is reported once by the resolver.
        return Value.UNKNOWN;
    }

    // ---- calls -----------------------------------------------------------------------

    private Value call(Expr.Call c) {
        String name = c.callee().text();
        Binding b = locals.containsKey(name) ? null : lookup(name);
        if (!locals.containsKey(name) && b instanceof Binding.ValueBinding v && v.trajectory() != null
            && v.trajectory().names().indexOf(name) > 0) {
            return MotionCalls.stateAt(this, reporter, c, v, name);
        }
        if (locals.containsKey(name) || b instanceof Binding.ValueBinding) {
            // A name whose statement could not be read (a broken table, say) is already reported.
            if (b instanceof Binding.ValueBinding v && !v.value().known() && !locals.containsKey(name)) return Value.UNKNOWN;
            reporter.report(Code.NAME_KIND, c.callee().span(),
                name + " is a value, not a function: write `" + name + " * (…)` to multiply");
            return Value.UNKNOWN;
        }
        if (b == null) return Value.UNKNOWN;
        List<Value> args = new ArrayList<>(c.args().size());
        boolean saved = insideProduct;
        insideProduct = false;
        for (Expr a : c.args()) args.add(eval(a));
        insideProduct = saved;
        if (b instanceof Binding.BuiltinFunction f) {
            if (!arity(c, f.minArgs(), f.maxArgs(), f.signature())) return Value.UNKNOWN;
            if (args.stream().anyMatch(v -> !v.known())) return Value.UNKNOWN;
            return new BuiltinCalls(reporter, this::operand).call(f.name(), c, args);
        }
        if (b instanceof Binding.CorrelationBinding cb) {
            List<dev.plumb.syntax.Statement.Param> params = cb.def().params();
            String signature = name + "(" + String.join(", ", params.stream().map(p -> p.name().text()).toList()) + ")";
            if (!arity(c, params.size(), params.size(), signature)) return Value.UNKNOWN;
            if (args.stream().anyMatch(v -> !v.known())) return Value.UNKNOWN;
            return new CorrelationCall(this, reporter, this::operand, units).correlation(c, cb, args);
        }
        if (b instanceof Binding.TableBinding tb) {
            String signature = name + "(" + tb.def().param().name().text() + ")";
            if (!arity(c, 1, 1, signature)) return Value.UNKNOWN;
            if (!args.get(0).known()) return Value.UNKNOWN;
            return new CorrelationCall(this, reporter, this::operand, units).table(c, tb, args);
        }
        Binding.FunctionBinding f = (Binding.FunctionBinding) b;
        if (f.circular()) return Value.UNKNOWN;
        List<Ident> params = f.def().params();
        String signature = name + "(" + String.join(", ", params.stream().map(Ident::text).toList()) + ")";
        if (!arity(c, params.size(), params.size(), signature)) return Value.UNKNOWN;
        if (args.stream().anyMatch(v -> !v.known())) return Value.UNKNOWN;
        Map<String, Value> bound = new HashMap<>();
        for (int i = 0; i < params.size(); i++) bound.put(params.get(i).text(), args.get(i));
        Reporter inner = reporter.inCall(name, c.span(), f.file());
        String bodyText = f.scope() == scope ? text : f.scope().text();
        return new Evaluator(f.scope(), environmentOf(f.scope()), bound, inner, bodyText, units, budget).eval(f.def().body());
    }

    private boolean arity(Expr.Call c, int min, int max, String signature) {
        int n = c.args().size();
        if (n >= min && n <= max) return true;
        String wanted = min == max ? String.valueOf(min) : max == Integer.MAX_VALUE ? "at least " + min : min + " to " + max;
        boolean one = min == 1 && (max == 1 || max == Integer.MAX_VALUE);
        reporter.report(Code.CALL_ARITY, c.span(), c.callee().text() + " takes " + wanted + " argument"
            + (one ? "" : "s") + " but is given " + n + ": " + signature);
        return false;
    }

    // ---- operators -------------------------------------------------------------------

    private Value unary(Expr.Unary u) {
        if (u.op() == Expr.Op.NEGATE && Expr.inner(u.operand()) instanceof Expr.Quantity q) return quantity(q, -1);
        Value v = eval(u.operand());
        if (!v.known() || u.op() == Expr.Op.PLUS) return v;
        return new Value(-v.si(), v.dimension(), v.difference() ? Value.Temperature.DIFFERENCE : Value.Temperature.EITHER,
            BasisRules.negate(v), v.angle());
    }

    /** True while evaluating the factors of a product: only its top is judged as a whole. */
    private boolean insideProduct;

    private Value binary(Expr.Binary b) {
        boolean product = b.op() == Expr.Op.MULTIPLY || b.op() == Expr.Op.DIVIDE;
        boolean top = product && !insideProduct;
        boolean saved = insideProduct;
        insideProduct = product;
        Value l = eval(b.left());
        Value r = eval(b.right());
        insideProduct = saved;
        if (!l.known() || !r.known()) return Value.UNKNOWN;
        Value v = arithmetic.apply(b, l, r);
        if (top && v.known()) basis.wholeProduct(b, v);
        return v;
    }

    /**
     * An operand for a message: a literal as written; anything else as "source = value", in the
     * unit its definition is shown in when it is a name.
     */
    String operand(Expr e, Value v) {
        String source = Shown.source(text, e.span());
        if (Expr.inner(e) instanceof Expr.Quantity) return source;
        Unit unit = null;
        if (Expr.inner(e) instanceof Expr.Reference r && !locals.containsKey(r.name())
            && lookup(r.name()) instanceof Binding.ValueBinding vb) {
            unit = vb.display();
        }
        return source + " = " + Shown.value(v, unit, 4);
    }
}
