package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Unit expressions resolve to the factor and dimension their SI definitions give. Definitions
 * from the SI Brochure, 9th edition (BIPM, 2019): Table 4 (derived units with special names:
 * N = kg·m/s², Pa = N/m², J = N·m, W = J/s), Table 7 (prefixes), Table 8 (non-SI units
 * accepted for use with the SI: min, h, d, L, °); all from memory.
 */
class UnitExpressionTest {

    private static final Dimension VELOCITY = Dimension.of(1, 0, -1, 0, 0, 0, 0);
    private static final Dimension ACCELERATION = Dimension.of(1, 0, -2, 0, 0, 0, 0);
    private static final Dimension DENSITY = Dimension.of(-3, 1, 0, 0, 0, 0, 0);
    private static final Dimension PRESSURE = Dimension.of(-1, 1, -2, 0, 0, 0, 0);
    private static final Dimension FORCE = Dimension.of(1, 1, -2, 0, 0, 0, 0);
    private static final Dimension POWER = Dimension.of(2, 1, -3, 0, 0, 0, 0);
    private static final Dimension DYNAMIC_VISCOSITY = Dimension.of(-1, 1, -1, 0, 0, 0, 0);
    private static final Dimension SPECIFIC_HEAT = Dimension.of(2, 0, -2, 0, -1, 0, 0);
    private static final Dimension HEAT_TRANSFER_COEFF = Dimension.of(0, 1, -3, 0, -1, 0, 0);

    @Test
    void divisionChainsLeftToRight() {
        check("m/s/s", 1, ACCELERATION);
        check("J/kg/K", 1, SPECIFIC_HEAT);
        check("kg/m/s", 1, DYNAMIC_VISCOSITY);
    }

    @Test
    void parenthesesGroupADenominator() {
        check("J/(kg*K)", 1, SPECIFIC_HEAT);
        check("W/(m^2*K)", 1, HEAT_TRANSFER_COEFF);
        check("(kg)/(m·s)", 1, DYNAMIC_VISCOSITY);
    }

    @Test
    void exponents() {
        check("m/s^2", 1, ACCELERATION);
        check("kg*m^-3", 1, DENSITY);
        check("kg·m^(-3)", 1, DENSITY);
        check("kg·m⁻³", 1, DENSITY);
        check("s^-1", 1, Dimension.TIME.pow(-1));
        check("1/s", 1, Dimension.TIME.pow(-1));
        check("cm^2", 1e-4, Dimension.LENGTH.pow(2)); // a prefix binds before the exponent
        check("km²", 1e6, Dimension.LENGTH.pow(2));
    }

    @Test
    void derivedUnitsReduceToBaseUnits() {
        check("N", 1, FORCE);
        check("kg*m/s^2", 1, FORCE);
        check("N/m^2", 1, PRESSURE);
        check("J/s", 1, POWER);
        check("N*m/s", 1, POWER);
    }

    @Test
    void unicodeAndAsciiSpellingsAgree() {
        same("m³", "m^3");
        same("kg/m³", "kg/m^3");
        same("Pa·s", "Pa*s");
        same("Pa⋅s", "Pa*s");
        same("°C", "degC");
        same("°F", "degF");
        same("°R", "degR");
        same("\u00B5m", "um"); // micro sign
        same("\u03BCm", "um"); // Greek small mu
        same("\u03A9", "ohm"); // Greek capital omega
        same("\u2126", "ohm"); // ohm sign
        same("°", "deg");
        same("L", "l");
    }

    @Test
    void prefixes() {
        check("kPa", 1e3, PRESSURE);
        check("MPa", 1e6, PRESSURE);
        check("hPa", 1e2, PRESSURE);
        check("mm", 1e-3, Dimension.LENGTH);
        check("µs", 1e-6, Dimension.TIME);
        check("kN", 1e3, FORCE);
        check("GW", 1e9, POWER);
        check("mg", 1e-6, Dimension.MASS);
        check("kg", 1, Dimension.MASS);
        check("mL", 1e-6, Dimension.LENGTH.pow(3));
        check("mbar", 100, PRESSURE);
        check("dam", 10, Dimension.LENGTH);
        check("qm", 1e-30, Dimension.LENGTH);
        check("Qm", 1e30, Dimension.LENGTH);
    }

    @Test
    void exactSymbolsWinOverPrefixSplits() {
        check("min", 60, Dimension.TIME); // not milli-inch
        check("cd", 1, Dimension.LUMINOUS); // not centi-day
        check("Pa", 1, PRESSURE);
        check("P", 0.1, DYNAMIC_VISCOSITY); // the poise; "PW" is still the petawatt
        check("PW", 1e15, POWER);
        check("h", 3600, Dimension.TIME);
        check("d", 86400, Dimension.TIME);
        check("ft", 0.3048, Dimension.LENGTH);
        check("ms", 1e-3, Dimension.TIME); // millisecond, as SI reads it
    }

    @Test
    void speedsAndDimensionlessUnits() {
        check("km/h", 1 / 3.6, VELOCITY);
        check("%", 0.01, Dimension.NONE);
        check("deg", Math.PI / 180, Dimension.NONE);
        check("rad", 1, Dimension.NONE);
    }

    @Test
    void loneTemperatureIsAPointOnItsScale() {
        Unit celsius = unit("°C");
        assertTrue(celsius.absoluteTemperature());
        assertEquals(273.15, celsius.offset(), 1e-12);
        Unit fahrenheit = unit("degF");
        assertTrue(fahrenheit.absoluteTemperature());
        assertEquals(459.67 * 5 / 9, fahrenheit.offset(), 1e-12);
        assertTrue(unit("K").absoluteTemperature());
        assertEquals(0, unit("K").offset());
        assertTrue(unit("degR").absoluteTemperature());
        assertEquals(0, unit("degR").offset());
    }

    @Test
    void temperatureInsideACompoundIsADifference() {
        for (String expression : new String[] {"J/(kg*degC)", "degC^2", "W/(m*°C)", "°F/s"}) {
            Unit u = unit(expression);
            assertFalse(u.absoluteTemperature(), expression);
            assertEquals(0, u.offset(), expression);
        }
        assertEquals(5.0 / 9 * 5 / 9, unit("degF^2").factor(), 1e-15);
    }

    @Test
    void symbolIsWrittenBackInUnicode() {
        symbol("kg/m^3", "kg/m³");
        symbol("W/(m^2*K)", "W/(m²·K)");
        symbol("J/kg/K", "J/kg/K");
        symbol("degC", "°C");
        symbol("(degC)", "°C");
        symbol("um", "µm");
        symbol("kohm", "kΩ");
        symbol("m^-1", "m⁻¹");
        symbol(" m / s ", "m/s");
    }

    private static void check(String expression, double factor, Dimension dimension) {
        Unit u = unit(expression);
        assertEquals(factor, u.factor(), Math.abs(factor) * 1e-15, expression);
        assertEquals(dimension, u.dimension(), expression);
    }

    private static void same(String a, String b) {
        Unit ua = unit(a);
        Unit ub = unit(b);
        assertEquals(ub.factor(), ua.factor(), 0, a + " vs " + b);
        assertEquals(ub.offset(), ua.offset(), 0, a + " vs " + b);
        assertEquals(ub.dimension(), ua.dimension(), a + " vs " + b);
    }

    private static void symbol(String expression, String expected) {
        assertEquals(expected, unit(expression).symbol(), expression);
    }

    private static Unit unit(String expression) {
        UnitResult result = UnitRegistry.standard().resolve(expression);
        return assertInstanceOf(UnitResult.Ok.class, result, expression).unit();
    }
}
