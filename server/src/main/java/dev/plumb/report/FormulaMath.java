package dev.plumb.report;

import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.List;

/**
 * The formulas of a calc as presentation MathML, for the report: each method returns one block
 * {@code <math>} element as markup, ready to place in an HTML or XHTML page. Everything taken from
 * the calc or from the caller is escaped (see {@link XmlText}).
 *
 * <p>Given {@link ValueSource#none()}, a formula is shown in symbols; given the calc's values, the
 * same formula is shown with each name replaced by its value and unit, so that a reviewer can
 * follow the arithmetic. How names, numbers, units and operators are laid out is described in
 * {@link SymbolMath}, {@link NumberMath}, {@link UnitMath} and {@link ExprMath}.
 */
public final class FormulaMath {
    private final UnitMath units;

    /** Units shown in the spelling of the standard registry. */
    public FormulaMath() {
        this(UnitRegistry.standard());
    }

    public FormulaMath(UnitRegistry registry) {
        this.units = new UnitMath(registry);
    }

    /** A formula alone, as the right side of a definition or a function body. */
    public String formula(Expr expr, ValueSource values) {
        return MathElements.math(new ExprMath(units, values).of(expr).markup());
    }

    /** {@code NAME = formula}; the name on the left always stays a symbol. */
    public String definition(Statement.Definition d, ValueSource values) {
        return definition(d, values, null);
    }

    /** {@code NAME = formula = result}: the definition followed by its result; null for none. */
    public String definition(Statement.Definition d, ValueSource values, ShownValue result) {
        List<String> sides = new ArrayList<>();
        sides.add(SymbolMath.of(d.name().text()));
        sides.add(new ExprMath(units, values).of(d.expr()).markup());
        if (result != null) sides.add(quantityMarkup(result));
        return MathElements.math(equated(sides));
    }

    /** {@code f(x, y) = body}, in symbols. */
    public String function(Statement.Function f) {
        List<String> params = new ArrayList<>();
        for (Ident p : f.params()) {
            if (!params.isEmpty()) params.add(MathElements.mo(",", "0", "0.2"));
            params.add(SymbolMath.of(p.text()));
        }
        String head = MathElements.row(MathElements.upright(f.name().text()), MathElements.APPLY_FUNCTION,
            MathElements.fenced("(", MathElements.row(params.toArray(String[]::new)), ")"));
        String body = new ExprMath(units, ValueSource.none()).of(f.body()).markup();
        return MathElements.math(equated(List.of(head, body)));
    }

    /** {@code lhs = rhs}: a solve statement's equation. */
    public String equation(Expr lhs, Expr rhs, ValueSource values) {
        ExprMath walk = new ExprMath(units, values);
        return MathElements.math(equated(List.of(walk.of(lhs).markup(), walk.of(rhs).markup())));
    }

    /** {@code a < b ≤ c}: a check or a range; operands.size() == comparators.size() + 1. */
    public String comparison(List<Expr> operands, List<Comparator> comparators, ValueSource values) {
        if (operands.size() != comparators.size() + 1) {
            throw new IllegalArgumentException(operands.size() + " operands for " + comparators.size() + " comparators");
        }
        return MathElements.math(new ExprMath(units, values).comparison(operands, comparators));
    }

    /** A value alone, its number and unit typeset as in formulas: for tables of inputs and results. */
    public String quantity(ShownValue value) {
        return MathElements.math(quantityMarkup(value));
    }

    /** A value alone, inline (a table cell, a line of text). */
    public String inlineQuantity(ShownValue value) {
        return MathElements.inline(quantityMarkup(value));
    }

    /** A formula in symbols, inline (a bracket's ends). */
    public String inlineFormula(Expr expr) {
        return MathElements.inline(new ExprMath(units, ValueSource.none()).of(expr).markup());
    }

    /** A name as a symbol, inline: `F_D` as F with subscript D, `rho` as ρ. */
    public String symbol(String name) {
        return MathElements.inline(SymbolMath.of(name));
    }

    private String quantityMarkup(ShownValue value) {
        return units.quantity(NumberMath.of(value.number()), value.unit()).markup();
    }

    private static String equated(List<String> sides) {
        List<String> parts = new ArrayList<>();
        for (String side : sides) {
            if (!parts.isEmpty()) parts.add(MathElements.mo("="));
            parts.add(side);
        }
        return MathElements.row(parts.toArray(String[]::new));
    }
}
