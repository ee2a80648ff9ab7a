package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Default display units are the coherent SI units (factor 1) named in the SI Brochure, 9th
 * edition (BIPM, 2019), Tables 2, 4 and 5, from memory; frequency is shown in hertz (SI Brochure Table 4: Hz = s⁻¹, from memory).
 */
class DisplayUnitsTest {

    @Test
    void namedDimensionsUseTheirSiUnit() {
        check(Dimension.NONE, "");
        check(Dimension.LENGTH, "m");
        check(Dimension.MASS, "kg");
        check(Dimension.TEMPERATURE, "K");
        check(Dimension.of(1, 1, -2, 0, 0, 0, 0), "N");
        check(Dimension.of(-1, 1, -2, 0, 0, 0, 0), "Pa");
        check(Dimension.of(2, 1, -2, 0, 0, 0, 0), "N·m");
        check(Dimension.of(2, 1, -3, 0, 0, 0, 0), "W");
        check(Dimension.of(0, 0, -1, 0, 0, 0, 0), "Hz");
        check(Dimension.of(3, 0, 0, 0, 0, 0, 0), "m³");
        check(Dimension.of(1, 0, -1, 0, 0, 0, 0), "m/s");
        check(Dimension.of(1, 0, -2, 0, 0, 0, 0), "m/s²");
        check(Dimension.of(-3, 1, 0, 0, 0, 0, 0), "kg/m³");
        check(Dimension.of(-1, 1, -1, 0, 0, 0, 0), "Pa·s");
        check(Dimension.of(2, 0, -1, 0, 0, 0, 0), "m²/s");
        check(Dimension.of(0, 1, -2, 0, 0, 0, 0), "N/m");
        check(Dimension.of(0, 1, -1, 0, 0, 0, 0), "kg/s");
        check(Dimension.of(3, 0, -1, 0, 0, 0, 0), "m³/s");
        check(Dimension.of(0, 1, -3, 0, -1, 0, 0), "W/(m²·K)");
    }

    @Test
    void otherDimensionsAreComposedFromBaseUnits() {
        check(Dimension.of(2, 1, -3, 0, 1, 0, 0), "kg·m²·K/s³");
        check(Dimension.of(4, 0, 0, 0, 0, 0, 0), "m⁴");
    }

    @Test
    void displayUnitsAreCoherent() {
        Unit u = DisplayUnits.defaultFor(Dimension.of(-1, 1, -1, 0, 0, 0, 0));
        assertEquals(1, u.factor());
        assertEquals(0, u.offset());
    }

    private static void check(Dimension d, String symbol) {
        Unit u = DisplayUnits.defaultFor(d);
        assertEquals(symbol, u.symbol(), d.toString());
        assertEquals(d, u.dimension());
    }
}
