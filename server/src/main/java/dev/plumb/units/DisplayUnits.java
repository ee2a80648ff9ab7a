package dev.plumb.units;

/**
 * The unit a result is shown in when the user has not asked for one: the named SI unit of a
 * familiar dimension ("N", "Pa", "kg/m³", "Pa·s"), else the dimension in SI base units.
 * Every display unit is coherent SI, so its factor is 1.
 */
public final class DisplayUnits {

    private DisplayUnits() {
    }

    public static Unit defaultFor(Dimension d) {
        DimensionNames.Entry named = DimensionNames.lookup(d);
        String symbol = named != null ? named.symbol() : d.siUnits();
        // A lone kelvin reads as a point on the scale, as when the user writes "K".
        boolean absolute = d.equals(Dimension.TEMPERATURE);
        return new Unit(symbol, 1, 0, d, absolute);
    }
}
