package dev.plumb.units;

import java.util.Objects;

/**
 * A resolved unit: SI value = number × factor + offset.
 *
 * <p>Only an absolute temperature scale (a lone °C or °F) carries an offset; everywhere else the
 * unit is a pure factor. The constructor enforces that, so {@link #toSi} and {@link #fromSi}
 * always invert each other.
 *
 * @param symbol how the unit is written back to the user, e.g. "kg/m³" or "°C"
 * @param absoluteTemperature true for a temperature read as a point on a scale (a lone K, °C,
 *     °F, °R); false for everything else, including a temperature inside a compound, which is a
 *     difference
 */
public record Unit(String symbol, double factor, double offset, Dimension dimension,
                   boolean absoluteTemperature) {

    /** A plain number: no unit, factor 1. */
    public static final Unit PLAIN_NUMBER = new Unit("", 1, 0, Dimension.NONE, false);

    public Unit {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(dimension, "dimension");
        if (!Double.isFinite(factor) || factor == 0) {
            throw new IllegalArgumentException("factor must be finite and non-zero: " + factor);
        }
        if (offset != 0 && !absoluteTemperature) {
            throw new IllegalArgumentException("only an absolute temperature scale has an offset");
        }
    }

    public double toSi(double number) {
        return number * factor + offset;
    }

    /** The number in this unit. For a difference (absoluteTemperature false) no offset applies. */
    public double fromSi(double si) {
        return absoluteTemperature ? (si - offset) / factor : si / factor;
    }

    public boolean isOffsetScale() {
        return offset != 0;
    }
}
