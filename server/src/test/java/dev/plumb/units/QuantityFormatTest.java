package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;

/**
 * Numbers for people. The air figures are the sea-level standard atmosphere of the U.S.
 * Standard Atmosphere, 1976 (NOAA/NASA/USAF), Table I, from memory: density 1.2250 kg/m³,
 * dynamic viscosity 1.7894e-5 Pa·s at 288.15 K.
 */
class QuantityFormatTest {

    @Test
    void significantFiguresWithoutTrailingZeros() {
        number(38, 4, "38");
        number(1.8, 4, "1.8");
        number(1.204, 4, "1.204");
        number(1.2041, 4, "1.204");
        number(-42.125, 4, "-42.13"); // half-up
        number(1.0005, 4, "1.001"); // half-up on the printed decimal, not the binary value
        number(123456, 4, "123500");
        number(0.001, 4, "0.001");
    }

    @Test
    void eNotationOutsideThePlainRange() {
        number(1.7894e-5, 4, "1.789e-5");
        number(1.849e-5, 4, "1.849e-5");
        number(2.5e6, 4, "2.5e6");
        number(999999.7, 4, "1e6"); // rounds up into e-notation
        number(0.00099995, 4, "0.001"); // rounds up into the plain range
        number(-3.0e-7, 4, "-3e-7");
        number(6.02214076e23, 4, "6.022e23");
    }

    @Test
    void specialValues() {
        number(0, 4, "0");
        number(-0.0, 4, "0");
        number(Double.NaN, 4, "NaN");
        number(Double.POSITIVE_INFINITY, 4, "∞");
        number(Double.NEGATIVE_INFINITY, 4, "-∞");
        number(1.23456, 0, "1"); // at least one figure
    }

    @Test
    void formatWithUnits() {
        format(1.2250, "kg/m^3", "1.225 kg/m³");
        format(38, "m/s", "38 m/s");
        format(1.7894e-5, "Pa*s", "1.789e-5 Pa·s");
        format(288.15, "degC", "15 °C");
        format(288.15, "K", "288.2 K");
        format(0.12, "%", "12%");
        format(Math.PI / 6, "deg", "30°");
        format(1000 / 3.6, "km/h", "1000 km/h");
        format(0.45, "1", "0.45");
    }

    @Test
    void dimensionlessDisplayHasNoUnit() {
        assertEquals("0.45", QuantityFormat.format(0.45, DisplayUnits.defaultFor(Dimension.NONE), 4));
    }

    private static void number(double value, int sig, String expected) {
        assertEquals(expected, QuantityFormat.number(value, sig), Double.toString(value));
    }

    private static void format(double si, String unit, String expected) {
        UnitResult r = UnitRegistry.standard().resolve(unit);
        Unit u = assertInstanceOf(UnitResult.Ok.class, r, unit).unit();
        assertEquals(expected, QuantityFormat.format(si, u, 4));
    }
}
