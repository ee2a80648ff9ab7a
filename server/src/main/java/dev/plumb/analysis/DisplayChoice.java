package dev.plumb.analysis;

import dev.plumb.syntax.Expr;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;

/**
 * Which unit a value is shown in when its statement does not say (`in UNIT` does): the unit it
 * was written in when it is a single quantity (`-3 ft` shows `-3 ft`), else the named SI unit of
 * its dimension. One rule for definitions, solved values and the two sides of a check.
 */
final class DisplayChoice {
    private DisplayChoice() {
    }

    /** The unit of a lone quantity, possibly negated ({@code 12 ft}, {@code -3 ft}); null for anything else. */
    static Unit written(Expr e, UnitRegistry units) {
        e = Expr.inner(e);
        if (e instanceof Expr.Unary u) e = Expr.inner(u.operand());
        if (e instanceof Expr.Quantity q && q.unit() != null && units.resolve(q.unit().text()) instanceof UnitResult.Ok ok) {
            return ok.unit();
        }
        return null;
    }

    /**
     * The unit a solved value is shown in: its `in` unit when that has the value's dimension
     * (a mismatch is reported where the binding is made), else the unit of the bracket's (or
     * start value's) number, else SI. The solver's messages and the value's row use the same.
     */
    static Unit ofSeek(dev.plumb.syntax.Statement.Seek s, Dimension dimension, UnitRegistry units) {
        if (s.displayUnit() != null && units.resolve(s.displayUnit().text()) instanceof UnitResult.Ok ok
            && ok.unit().dimension().equals(dimension)) {
            return ok.unit();
        }
        if (s.displayUnit() != null) return DisplayUnits.defaultFor(dimension);
        return writtenOrSi(s.low() != null ? s.low() : s.start(), dimension, units);
    }

    /**
     * For a temperature point computed from others (`T_in + 5 K`), the offset scale (°C, °F) of
     * the first point it uses that is shown on one, so it reads like what it was made from; null
     * for anything else.
     */
    static Unit pointScale(Expr e, Value v, java.util.function.Function<String, Binding> lookup) {
        if (!v.dimension().equals(Dimension.TEMPERATURE) || v.difference()) return null;
        Unit[] found = new Unit[1];
        References.each(e, (name, span) -> {
            if (found[0] == null && lookup.apply(name) instanceof Binding.ValueBinding b && b.display() != null
                && b.display().isOffsetScale() && b.value().known() && !b.value().difference()) {
                found[0] = b.display();
            }
        });
        return found[0];
    }

    /** The written unit of {@code e} when it has the dimension, else the SI unit of the dimension. */
    static Unit writtenOrSi(Expr e, Dimension dimension, UnitRegistry units) {
        Unit u = e == null ? null : written(e, units);
        return u != null && u.dimension().equals(dimension) ? u : DisplayUnits.defaultFor(dimension);
    }
}
