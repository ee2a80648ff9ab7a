package dev.plumb.present;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;

/** How a value reads for people: in its display unit, to the analysis's significant figures. */
public final class ValueText {
    private ValueText() {
    }

    /** "1.204 kg/m³"; "?" when the value could not be computed. */
    public static String of(Analysis a, Row.ValueRow row) {
        return of(row.value(), row.display(), a.settings().significantFigures());
    }

    /** A value split for typesetting: the number and the unit symbol ("" for a plain number). */
    public record Parts(String number, String unit) {
    }

    /** As {@link #of(Value, Unit, int)}, in parts; the number is "?" when the value is unknown. */
    public static Parts parts(Value v, Unit unit, int sig) {
        if (!v.known()) return new Parts("?", unit == null ? "" : unit.symbol());
        Unit u = unit == null ? DisplayUnits.defaultFor(v.dimension()) : unit;
        double number = v.difference() && u.isOffsetScale() ? v.si() / u.factor() : u.fromSi(v.si());
        return new Parts(QuantityFormat.number(number, sig), u.symbol());
    }

    /**
     * The value in {@code unit} (SI when null). On an offset scale (°C, °F) a temperature
     * difference reads as a difference, without the offset.
     */
    public static String of(Value v, Unit unit, int sig) {
        if (!v.known()) return "?";
        return QuantityFormat.format(v.si(), unit == null ? DisplayUnits.defaultFor(v.dimension()) : unit, sig,
            v.difference());
    }
}
