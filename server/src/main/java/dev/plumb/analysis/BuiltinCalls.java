package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Expr;
import dev.plumb.units.Dimension;
import java.util.List;
import java.util.function.BiFunction;
import java.util.function.DoubleUnaryOperator;

/** Evaluates the built-in functions with their dimension rules. Arguments are known values. */
final class BuiltinCalls {
    private final Reporter reporter;
    /** How an argument reads in a message: as written, with its value when it is not a literal. */
    private final BiFunction<Expr, Value, String> operand;

    BuiltinCalls(Reporter reporter, BiFunction<Expr, Value, String> operand) {
        this.reporter = reporter;
        this.operand = operand;
    }

    Value call(String name, Expr.Call c, List<Value> args) {
        return switch (name) {
            case "sqrt" -> sqrt(c, args.get(0));
            case "abs" -> new Value(Math.abs(args.get(0).si()), args.get(0).dimension(), args.get(0).temperature())
                .asAngle(args.get(0).angle());
            case "min", "max" -> extreme(name, c, args);
            case "atan2" -> atan2(c, args.get(0), args.get(1)).asAngle(true);
            case "exp" -> plain(name, c, args.get(0), Math::exp);
            case "ln" -> positive(name, c, args.get(0), Math::log);
            case "log10" -> positive(name, c, args.get(0), Math::log10);
            case "sin" -> plain(name, c, args.get(0), Math::sin);
            case "cos" -> plain(name, c, args.get(0), Math::cos);
            case "tan" -> plain(name, c, args.get(0), Math::tan);
            // The inverse functions give angles (in radians): they may be passed where an angle is declared.
            case "asin" -> unitInterval(name, c, args.get(0), Math::asin).asAngle(true);
            case "acos" -> unitInterval(name, c, args.get(0), Math::acos).asAngle(true);
            case "atan" -> plain(name, c, args.get(0), Math::atan).asAngle(true);
            default -> throw new IllegalStateException("no built-in function " + name);
        };
    }

    private Value sqrt(Expr.Call c, Value x) {
        Dimension d = x.dimension().root(2);
        if (d == null) {
            reporter.report(Code.UNIT_FRACTIONAL_POWER, c.span(), "the square root of " + x.dimension().describe()
                + " has no unit with whole exponents: check the formula's dimensions");
            return Value.UNKNOWN;
        }
        if (x.si() < 0) {
            reporter.report(Code.MATH_DOMAIN, c.span(), "square root of a negative number: "
                + operand.apply(c.args().get(0), x));
            return Value.UNKNOWN;
        }
        return Value.of(Math.sqrt(x.si()), d);
    }

    private Value extreme(String name, Expr.Call c, List<Value> args) {
        Value best = args.get(0);
        for (int i = 1; i < args.size(); i++) {
            Value v = args.get(i);
            if (!v.dimension().equals(best.dimension())) {
                reporter.report(Code.UNIT_MISMATCH, c.args().get(i).span(), name + " compares values of one dimension, but "
                    + operand.apply(c.args().get(i), v) + " is " + v.dimension().describe()
                    + " and the first argument is " + args.get(0).dimension().describe());
                return Value.UNKNOWN;
            }
            boolean better = name.equals("min") ? v.si() < best.si() : v.si() > best.si();
            if (better) best = v;
        }
        return best;
    }

    private Value atan2(Expr.Call c, Value y, Value x) {
        if (!y.dimension().equals(x.dimension())) {
            reporter.report(Code.UNIT_MISMATCH, c.span(), "atan2(y, x) needs y and x of one dimension, but y is "
                + y.dimension().describe() + " and x is " + x.dimension().describe());
            return Value.UNKNOWN;
        }
        return Value.number(Math.atan2(y.si(), x.si()));
    }

    private boolean dimensionless(String name, Expr.Call c, Value x) {
        if (x.dimensionless()) return true;
        reporter.report(Code.UNIT_NOT_DIMENSIONLESS, c.args().get(0).span(), name + " needs a dimensionless argument, but "
            + operand.apply(c.args().get(0), x) + " is " + x.dimension().describe()
            + ": divide by a reference value of the same dimension first");
        return false;
    }

    private Value plain(String name, Expr.Call c, Value x, DoubleUnaryOperator f) {
        if (!dimensionless(name, c, x)) return Value.UNKNOWN;
        double r = f.applyAsDouble(x.si());
        if (!Double.isFinite(r)) {
            reporter.report(Code.MATH_NOT_FINITE, c.span(), name + "(" + Shown.value(x) + ") is too large to represent");
            return Value.UNKNOWN;
        }
        return Value.number(r);
    }

    private Value positive(String name, Expr.Call c, Value x, DoubleUnaryOperator f) {
        if (!dimensionless(name, c, x)) return Value.UNKNOWN;
        if (x.si() <= 0) {
            reporter.report(Code.MATH_DOMAIN, c.span(), name + " is defined only for positive numbers, but "
                + operand.apply(c.args().get(0), x));
            return Value.UNKNOWN;
        }
        return Value.number(f.applyAsDouble(x.si()));
    }

    private Value unitInterval(String name, Expr.Call c, Value x, DoubleUnaryOperator f) {
        if (!dimensionless(name, c, x)) return Value.UNKNOWN;
        if (x.si() < -1 || x.si() > 1) {
            reporter.report(Code.MATH_DOMAIN, c.span(), name + " is defined only from -1 to 1, but "
                + operand.apply(c.args().get(0), x));
            return Value.UNKNOWN;
        }
        return Value.number(f.applyAsDouble(x.si()));
    }
}
