package dev.plumb.analysis;

import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Judges a call against a correlation's {@code valid} lines and words the verdict for the
 * reviewer: the argument and its value, the range, and how far outside it lies.
 */
final class RangeCheck {
    private RangeCheck() {
    }

    /** Whether a range comparison holds; {@code <=}, {@code >=} and {@code ==} allow a relative 1e-9 for rounding. */
    static boolean holds(double x, Comparator op, double y) {
        return holds(x, op, y, 1e-9);
    }

    /** Whether a comparison holds, with "equal" meaning within a relative tolerance. */
    static boolean holds(double x, Comparator op, double y, double tolerance) {
        boolean equal = Math.abs(x - y) <= tolerance * Math.max(Math.abs(x), Math.abs(y));
        return switch (op) {
            case LT -> x < y;
            case LE -> x <= y || equal;
            case GT -> x > y;
            case GE -> x >= y || equal;
            case EQ -> equal;
            case NE -> !equal;
        };
    }

    /**
     * Why a bound does not hold for these parameter values, or null when it holds (or cannot be
     * evaluated: an error in the bound itself is reported by the evaluator).
     */
    static String violation(Statement.Bound bound, Evaluator inside, String definingText, Set<String> params) {
        Breach b = breach(bound, inside, definingText, params);
        return b == null ? null : "valid for " + b.range() + ", but " + b.argument() + " here: " + b.distance();
    }

    /** For a {@code domain} line: "Re > 0, but Re = -1e4 here"; null when the bound holds. */
    static String outsideDomain(Statement.Bound bound, Evaluator inside, String definingText, Set<String> params) {
        Breach b = breach(bound, inside, definingText, params);
        return b == null ? null : b.range() + ", but " + b.argument() + " here";
    }

    /**
     * "d > 0: d is a length, 0 is a plain number" when two sides of a bound cannot be compared;
     * null when they can (or one cannot be evaluated: that error is reported by the evaluator).
     */
    static String mismatch(Statement.Bound bound, Evaluator inside, String definingText) {
        List<Value> values = bound.operands().stream().map(inside::eval).toList();
        if (values.stream().anyMatch(v -> !v.known())) return null;
        for (int i = 0; i + 1 < values.size(); i++) {
            if (values.get(i).dimension().equals(values.get(i + 1).dimension())) continue;
            return Shown.source(definingText, bound.span()) + ": " + Shown.source(definingText, bound.operands().get(i).span())
                + " is " + values.get(i).dimension().describe() + ", but " + Shown.source(definingText,
                bound.operands().get(i + 1).span()) + " is " + values.get(i + 1).dimension().describe();
        }
        return null;
    }

    /** @param argument "Re = 1.2e6" as the bound names it; @param distance how far past the limit */
    private record Breach(String range, String argument, String distance) {
    }

    private static Breach breach(Statement.Bound bound, Evaluator inside, String definingText, Set<String> params) {
        List<Value> values = bound.operands().stream().map(inside::eval).toList();
        if (values.stream().anyMatch(v -> !v.known())) return null;
        for (int i = 0; i < bound.comparators().size(); i++) {
            Comparator op = bound.comparators().get(i);
            if (holds(values.get(i).si(), op, values.get(i + 1).si())) continue;
            boolean argumentLeft = mentions(bound.operands().get(i), params) || !mentions(bound.operands().get(i + 1), params);
            int arg = argumentLeft ? i : i + 1;
            int limit = argumentLeft ? i + 1 : i;
            boolean upper = argumentLeft == (op == Comparator.LT || op == Comparator.LE);
            // The limit is shown in the unit it is written in, else in SI (the same rule as for values).
            Unit written = DisplayChoice.written(bound.operands().get(limit), inside.units());
            Unit unit = written != null ? written : DisplayUnits.defaultFor(values.get(limit).dimension());
            String argument = Shown.source(definingText, bound.operands().get(arg).span());
            return new Breach(Shown.source(definingText, bound.span()),
                argument + " = " + Shown.value(values.get(arg), unit, 4),
                distance(values.get(arg), values.get(limit), upper, unit));
        }
        return null;
    }

    /** Whether every bound holds; bounds that cannot be evaluated count as holding. */
    static boolean within(List<Statement.Bound> bounds, Evaluator inside) {
        for (Statement.Bound b : bounds) {
            List<Value> values = b.operands().stream().map(inside::eval).toList();
            if (values.stream().anyMatch(v -> !v.known())) continue;
            for (int i = 0; i < b.comparators().size(); i++) {
                if (!values.get(i).dimension().equals(values.get(i + 1).dimension())) return false;
                if (!holds(values.get(i).si(), b.comparators().get(i), values.get(i + 1).si())) return false;
            }
        }
        return true;
    }

    /** "6.25 times the upper limit", "12% below the lower limit", "5 K beyond the upper limit". */
    static String distance(Value argument, Value limit, boolean upper, Unit unit) {
        return distance(argument, limit, upper, unit, upper ? "the upper limit" : "the lower limit");
    }

    /** As above, naming the limit in the caller's words ("the last row"). */
    static String distance(Value argument, Value limit, boolean upper, Unit unit, String which) {
        double a = argument.si();
        double l = limit.si();
        boolean ratioMeans = a > 0 && l > 0 && !argument.dimension().equals(Dimension.TEMPERATURE);
        if (!ratioMeans) {
            Value gap = Value.of(Math.abs(a - l), argument.dimension());
            Unit u = unit.isOffsetScale() ? DisplayUnits.defaultFor(argument.dimension()) : unit;
            return QuantityFormat.format(gap.si(), u, 3) + (upper ? " above " : " below ") + which;
        }
        double r = a / l;
        if (upper) {
            return r >= 2 ? QuantityFormat.number(r, 3) + " times " + which
                : QuantityFormat.number((r - 1) * 100, 2) + "% above " + which;
        }
        return r <= 0.5 ? QuantityFormat.number(1 / r, 3) + " times smaller than " + which
            : QuantityFormat.number((1 - r) * 100, 2) + "% below " + which;
    }

    static boolean mentions(Expr e, Set<String> params) {
        boolean[] found = {false};
        References.each(e, (name, span) -> found[0] |= params.contains(name));
        return found[0];
    }

    /** Parameter values by name, for evaluating bounds. */
    static Map<String, Value> bind(List<Statement.Param> params, List<Value> args) {
        Map<String, Value> out = new java.util.HashMap<>();
        for (int i = 0; i < params.size(); i++) out.put(params.get(i).name().text(), args.get(i));
        return out;
    }
}
