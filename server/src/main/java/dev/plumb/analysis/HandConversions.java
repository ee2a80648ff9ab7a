package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Expr;
import dev.plumb.units.Dimension;
import dev.plumb.units.QuantityFormat;
import java.math.BigDecimal;
import java.util.List;
import java.util.function.BiFunction;

/**
 * Warns of a unit conversion done by hand on a value that already carries its unit
 * ({@code d_pole / 12} with {@code d_pole = 10.75 in}): Plumb holds every value in SI and
 * converts itself, so the factor only makes the value wrong. The finding needs three things: a
 * plain number written in the product (a literal, never a name), a number that is a common
 * conversion factor, and a factor of the kind of the other operand (12 with a length, 2.205 with
 * a mass). The factors and the matching rule are listed in docs/diagnostics.md
 * (unit.hand-conversion).
 */
final class HandConversions {
    /**
     * A conversion factor: its value (exact, or to more digits than anyone writes), the
     * dimension it converts, what it is in words, and the unit a value is in after multiplying
     * and after dividing by it. A whole number ({@code divideOnly}) is flagged only as a divisor:
     * 12 times a length is as often twelve diameters as feet to inches.
     */
    record Factor(BigDecimal value, boolean exact, Dimension kind, String words, String timesUnit,
                  String overUnit, boolean divideOnly) {
    }

    private static final Dimension AREA = Dimension.LENGTH.pow(2);
    private static final Dimension VOLUME = Dimension.LENGTH.pow(3);
    private static final Dimension SPEED = Dimension.LENGTH.divide(Dimension.TIME);
    private static final Dimension FORCE = Dimension.of(1, 1, -2, 0, 0, 0, 0);
    private static final Dimension PRESSURE = Dimension.of(-1, 1, -2, 0, 0, 0, 0);
    private static final Dimension DENSITY = Dimension.of(-3, 1, 0, 0, 0, 0, 0);

    /**
     * The factors, from NIST SP 811 (2008) Appendix B.8 (from memory): ft = 0.3048 m, in =
     * 0.0254 m, mi = 1609.344 m, lb = 0.45359237 kg (all exact), lbf = 4.448222 N, psi =
     * 6.894757 kPa, lbf/ft² = 47.88026 Pa, lb/ft³ = 16.01846 kg/m³, knot = 1852/3600 m/s (exact),
     * mph = 0.44704 m/s (exact); the others are their reciprocals or follow by arithmetic
     * (144 = 12², 1728 = 12³, 5280 ft in a mile, 88/60 ft/s in a mph, 3.6 = 3600 s/h ÷ 1000 m/km).
     */
    static final List<Factor> FACTORS = List.of(
        whole("12", "12 in = 1 ft", "in", "ft", Dimension.LENGTH),
        whole("144", "144 in² = 1 ft²", "in^2", "ft^2", AREA),
        whole("144", "144 psf = 1 psi", "psf", "psi", PRESSURE),
        whole("1728", "1728 in³ = 1 ft³", "in^3", "ft^3", VOLUME),
        whole("5280", "5280 ft = 1 mi", "ft", "mi", Dimension.LENGTH),
        exact("0.3048", "1 ft = 0.3048 m", "m", "ft", Dimension.LENGTH),
        near("3.280839895", "1 m = 3.281 ft", "ft", "m", Dimension.LENGTH),
        exact("25.4", "1 in = 25.4 mm", "mm", "in", Dimension.LENGTH),
        exact("0.0254", "1 in = 0.0254 m", "m", "in", Dimension.LENGTH),
        near("39.37007874", "1 m = 39.37 in", "in", "m", Dimension.LENGTH),
        exact("1.609344", "1 mi = 1.609 km", "km", "mi", Dimension.LENGTH),
        exact("0.09290304", "1 ft² = 0.0929 m²", "m^2", "ft^2", AREA),
        near("10.76391042", "1 m² = 10.76 ft²", "ft^2", "m^2", AREA),
        near("2.204622622", "1 kg = 2.205 lb", "lb", "kg", Dimension.MASS),
        exact("0.45359237", "1 lb = 0.4536 kg", "kg", "lb", Dimension.MASS),
        near("4.448222", "1 lbf = 4.448 N", "N", "lbf", FORCE),
        near("0.2248089", "1 N = 0.2248 lbf", "lbf", "N", FORCE),
        near("6.894757", "1 psi = 6.895 kPa", "kPa", "psi", PRESSURE),
        near("0.1450377", "1 kPa = 0.145 psi", "psi", "kPa", PRESSURE),
        near("47.88026", "1 psf = 47.88 Pa", "Pa", "psf", PRESSURE),
        near("0.02088543", "1 Pa = 0.02089 psf", "psf", "Pa", PRESSURE),
        exact("3.6", "1 m/s = 3.6 km/h", "km/h", "m/s", SPEED),
        exact("0.44704", "1 mph = 0.447 m/s", "m/s", "mph", SPEED),
        near("2.236936292", "1 m/s = 2.237 mph", "mph", "m/s", SPEED),
        near("1.466666667", "1 mph = 1.467 ft/s", "ft/s", "mph", SPEED),
        near("0.6818181818", "1 ft/s = 0.6818 mph", "mph", "ft/s", SPEED),
        near("0.5144444444", "1 kn = 0.5144 m/s", "m/s", "kn", SPEED),
        near("1.943844492", "1 m/s = 1.944 kn", "kn", "m/s", SPEED),
        near("16.01846", "1 lb/ft³ = 16.02 kg/m³", "kg/m^3", "lb/ft^3", DENSITY),
        near("0.06242796", "1 kg/m³ = 0.06243 lb/ft³", "lb/ft^3", "kg/m^3", DENSITY));

    private final Reporter reporter;
    private final String text;
    private final BiFunction<Expr, Value, String> operand;

    HandConversions(Reporter reporter, String text, BiFunction<Expr, Value, String> operand) {
        this.reporter = reporter;
        this.text = text;
        this.operand = operand;
    }

    /** Looks at one product or quotient of known values, and warns when it converts by hand. */
    void check(Expr.Binary b, Value l, Value r) {
        boolean divide = b.op() == Expr.Op.DIVIDE;
        if (!divide && b.op() != Expr.Op.MULTIPLY) return;
        Expr.Quantity right = plainNumber(b.right());
        Expr.Quantity left = divide ? null : plainNumber(b.left());
        if (right != null) {
            judge(right, b.left(), l, divide);
        } else if (left != null) {
            judge(left, b.right(), r, false);
        }
    }

    private void judge(Expr.Quantity literal, Expr other, Value value, boolean divide) {
        if (!value.known() || value.dimensionless() || plainNumber(other) != null) return;
        Factor f = match(literal.number(), literal.numberText(), value.dimension(), divide);
        if (f == null) return;
        String n = literal.numberText();
        String target = divide ? f.overUnit() : f.timesUnit();
        double scale = divide ? 1 / f.value().doubleValue() : f.value().doubleValue();
        String how = (divide ? "dividing by " : "multiplying by ") + n + " makes the value "
            + QuantityFormat.number(scale >= 1 ? scale : 1 / scale, 4) + " times too " + (scale >= 1 ? "large" : "small");
        String example = Expr.inner(other) instanceof Expr.Reference ref ? " (`" + ref.name() + " in " + target + "`)" : "";
        reporter.report(Code.UNIT_HAND_CONVERSION, literal.span(), n + " looks like a unit conversion done by hand ("
            + f.words() + "), but " + operand.apply(other, value) + " already carries its unit and Plumb converts units "
            + "itself: " + how + ". Remove the factor " + n + "; to show the value in " + target
            + ", end the line with `in " + target + "`" + example);
    }

    /** The literal when {@code e} is a number written without a unit, else null. */
    private static Expr.Quantity plainNumber(Expr e) {
        return Expr.inner(e) instanceof Expr.Quantity q && q.unit() == null ? q : null;
    }

    /**
     * The factor a number as written stands for, with a value of the given dimension: the factor
     * rounded to the number's own last digit must be the number, and the number must have at
     * least three significant digits unless it is the exact factor (3.6 and 12, not 2.2).
     */
    static Factor match(String numberText, Dimension kind, boolean divide) {
        double number;
        try {
            number = Double.parseDouble(numberText);
        } catch (NumberFormatException e) {
            return null;
        }
        return match(number, numberText, kind, divide);
    }

    /** As {@link #match(String, Dimension, boolean)}, for a number already read ({@code number}, written {@code numberText}). */
    private static Factor match(double number, String numberText, Dimension kind, boolean divide) {
        // Most products are of a kind no factor has, or far from every factor of it: answered
        // without reading the number's digits.
        List<Factor> ofKind = BY_KIND.get(kind);
        if (ofKind == null || !nearAny(number, ofKind)) return null;
        BigDecimal x;
        try {
            x = new BigDecimal(numberText);
        } catch (NumberFormatException e) {
            return null;
        }
        if (x.signum() <= 0) return null;
        BigDecimal halfUnit = BigDecimal.valueOf(5, x.scale() + 1);
        for (Factor f : ofKind) {
            if (f.divideOnly() && !divide) continue;
            boolean same = f.exact() && x.compareTo(f.value()) == 0;
            boolean rounded = x.stripTrailingZeros().precision() >= 3
                && x.subtract(f.value()).abs().compareTo(halfUnit) <= 0;
            if (same || rounded) return f;
        }
        return null;
    }

    /**
     * A cheap second look, since nearly every product in a calc is no conversion: the rule above
     * admits a number within half a unit of its third significant digit (0.5 %) of a factor of
     * its kind, so one more than 1 % from all of them matches none.
     */
    private static boolean nearAny(double x, List<Factor> ofKind) {
        for (double v : VALUES.get(ofKind.get(0).kind())) {
            if (Math.abs(x - v) <= 0.01 * v) return true;
        }
        return false;
    }

    /** The values of {@link #BY_KIND}'s factors as doubles, kind by kind, for {@link #nearAny}. */
    private static final java.util.Map<Dimension, List<Double>> VALUES = values();

    private static java.util.Map<Dimension, List<Double>> values() {
        java.util.Map<Dimension, List<Double>> out = new java.util.HashMap<>();
        byKind().forEach((kind, factors) -> out.put(kind, factors.stream().map(f -> f.value().doubleValue()).toList()));
        return java.util.Map.copyOf(out);
    }

    /** The factors by the kind of value they convert, in the order of {@link #FACTORS}; read-only. */
    private static final java.util.Map<Dimension, List<Factor>> BY_KIND = byKind();

    private static java.util.Map<Dimension, List<Factor>> byKind() {
        java.util.Map<Dimension, List<Factor>> out = new java.util.HashMap<>();
        for (Factor f : FACTORS) out.computeIfAbsent(f.kind(), k -> new java.util.ArrayList<>()).add(f);
        out.replaceAll((k, v) -> List.copyOf(v));
        return java.util.Map.copyOf(out);
    }

    private static Factor whole(String value, String words, String times, String over, Dimension kind) {
        return new Factor(new BigDecimal(value), true, kind, words, times, over, true);
    }

    private static Factor exact(String value, String words, String times, String over, Dimension kind) {
        return new Factor(new BigDecimal(value), true, kind, words, times, over, false);
    }

    private static Factor near(String value, String words, String times, String over, Dimension kind) {
        return new Factor(new BigDecimal(value), false, kind, words, times, over, false);
    }
}
