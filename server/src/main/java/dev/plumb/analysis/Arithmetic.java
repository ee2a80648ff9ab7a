package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Expr;
import dev.plumb.units.Dimension;
import dev.plumb.units.QuantityFormat;
import java.util.function.BiFunction;

/**
 * The binary operators on known values, each with its guard: equal dimensions for + and −,
 * no sum of two absolute temperatures, no division by zero, a dimensionless exponent that
 * leaves whole dimension exponents, a finite result. A failed guard reports once and gives
 * {@link Value#UNKNOWN}.
 */
final class Arithmetic {
    private final Reporter reporter;
    private final String text;
    private final BasisRules basis;
    /** How an operand is named in a message ("d = 60 mm"). */
    private final BiFunction<Expr, Value, String> operand;
    private final HandConversions conversions;

    Arithmetic(Reporter reporter, String text, BasisRules basis, BiFunction<Expr, Value, String> operand) {
        this.reporter = reporter;
        this.text = text;
        this.basis = basis;
        this.operand = operand;
        this.conversions = new HandConversions(reporter, text, operand);
    }

    Value apply(Expr.Binary b, Value l, Value r) {
        return switch (b.op()) {
            case ADD, SUBTRACT -> addOrSubtract(b, l, r);
            case MULTIPLY -> {
                conversions.check(b, l, r);
                Dimension d = l.dimension().times(r.dimension());
                yield finite(b, l, r, Value.of(l.si() * r.si(), d).noted(basis.multiply(b, l, r, d))
                    .asAngle(Angles.scaled(l, r) || Angles.scaled(r, l)));
            }
            case DIVIDE -> divide(b, l, r);
            case POWER -> power(b, l, r);
            default -> throw new IllegalStateException("not a binary operator: " + b.op());
        };
    }

    private Value addOrSubtract(Expr.Binary b, Value l, Value r) {
        boolean add = b.op() == Expr.Op.ADD;
        if (!l.dimension().equals(r.dimension())) {
            String message = add
                ? "adding " + r.dimension().describe() + " to " + l.dimension().describe()
                : "subtracting " + r.dimension().describe() + " from " + l.dimension().describe();
            reporter.report(Code.UNIT_MISMATCH, b.span(), message
                + ": both sides of '" + b.op().symbol() + "' need the same dimension ("
                + operand.apply(b.left(), l) + ", " + operand.apply(b.right(), r) + ")");
            return Value.UNKNOWN;
        }
        if (add && l.point() && r.point()) {
            reporter.report(Code.UNIT_TEMPERATURE_SUM, b.span(),
                "adding two absolute temperatures (" + Shown.value(l, Shown.celsius(), 4) + " + "
                    + Shown.value(r, Shown.celsius(), 4) + ") has no physical meaning: "
                    + "add a temperature difference in K instead, or subtract to get a difference");
            return Value.UNKNOWN;
        }
        if (!add && l.difference() && r.point()) {
            reporter.report(Code.UNIT_TEMPERATURE_SUM, b.span(), "subtracting a temperature point ("
                + Shown.value(r, Shown.celsius(), 4) + ") from a temperature difference (" + Shown.value(l)
                + ") has no physical meaning: subtract differences from differences, or points from points");
            return Value.UNKNOWN;
        }
        double si = add ? l.si() + r.si() : l.si() - r.si();
        return finite(b, l, r, new Value(si, l.dimension(), Temperatures.sum(add, l, r), BasisRules.sum(l, r),
            l.angle() && r.angle()));
    }

    private Value divide(Expr.Binary b, Value l, Value r) {
        if (r.si() == 0) {
            reporter.report(Code.MATH_DIVISION_BY_ZERO, b.right().span(),
                "division by zero: the divisor " + Shown.source(text, b.right().span()) + " is 0");
            return Value.UNKNOWN;
        }
        conversions.check(b, l, r);
        Dimension d = l.dimension().divide(r.dimension());
        return finite(b, l, r, Value.of(l.si() / r.si(), d).noted(basis.divide(l, r, d)).asAngle(Angles.scaled(l, r)));
    }

    private Value power(Expr.Binary b, Value base, Value exponent) {
        if (!exponent.dimensionless()) {
            reporter.report(Code.UNIT_NOT_DIMENSIONLESS, b.right().span(), "the exponent of '^' must be a plain number, but "
                + operand.apply(b.right(), exponent) + " is " + exponent.dimension().describe());
            return Value.UNKNOWN;
        }
        double n = exponent.si();
        Dimension d = Powers.raise(base.dimension(), n);
        if (d == null) {
            reporter.report(Code.UNIT_FRACTIONAL_POWER, b.span(), Shown.source(text, b.left().span()) + " is "
                + base.dimension().describe() + "; raised to " + QuantityFormat.number(n, 4)
                + " its unit would have a fractional exponent: only powers that leave whole exponents are allowed");
            return Value.UNKNOWN;
        }
        double si = Math.pow(base.si(), n);
        if (Double.isNaN(si)) {
            reporter.report(Code.MATH_DOMAIN, b.span(), "a negative number (" + Shown.value(base)
                + ") raised to the fractional power " + QuantityFormat.number(n, 4) + " has no real value");
            return Value.UNKNOWN;
        }
        return finite(b, base, exponent, Value.of(si, d).noted(BasisRules.power(base, n)));
    }

    /** Reports a result that overflowed although its operands were finite. */
    private Value finite(Expr.Binary b, Value l, Value r, Value result) {
        if (Double.isFinite(result.si()) && !result.dimension().outOfRange()) return result;
        reporter.report(Code.MATH_NOT_FINITE, b.span(), "the result of " + Shown.source(text, b.span())
            + (result.dimension().outOfRange() ? " would have a unit with an exponent beyond ±" + Dimension.MAX_EXPONENT
                : " is too large to represent") + " (" + operand.apply(b.left(), l) + ", " + operand.apply(b.right(), r) + ")");
        return Value.UNKNOWN;
    }

}
