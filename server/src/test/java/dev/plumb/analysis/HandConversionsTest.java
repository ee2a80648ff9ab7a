package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.plumb.units.Dimension;
import org.junit.jupiter.api.Test;

/** unit.hand-conversion: a conversion factor by hand on a value that carries its unit. */
class HandConversionsTest {
    private static final Dimension SPEED = Dimension.LENGTH.divide(Dimension.TIME);
    private static final Dimension PRESSURE = Dimension.of(-1, 1, -2, 0, 0, 0, 0);

    @Test
    void theFixtureFlagsConversionsAndLeavesCountsAndOtherKindsAlone() {
        Fixture.checkResource("unit.hand-conversion.plumb");
    }

    @Test
    void theFactorsAreTheNistFigures() {
        // NIST SP 811 (2008) B.8: foot = 3.048 E-01 m, exact; from memory
        assertEquals(0.3048, factor("0.3048", Dimension.LENGTH).value().doubleValue(), 0);
        // by hand: 1 / 0.3048 = 3.280 839 895… ft per m
        assertEquals(1 / 0.3048, factor("3.281", Dimension.LENGTH).value().doubleValue(), 1e-9);
        // NIST SP 811 (2008) B.8: inch = 2.54 E-02 m, exact; from memory
        assertEquals(0.0254, factor("0.0254", Dimension.LENGTH).value().doubleValue(), 0);
        // NIST SP 811 (2008) B.8: pound (avoirdupois) = 4.535 924 E-01 kg (0.453 592 37 exact); from memory
        assertEquals(0.45359237, factor("0.4536", Dimension.MASS).value().doubleValue(), 0);
        // by hand: 1 / 0.45359237 = 2.204 622 62… lb per kg
        assertEquals(1 / 0.45359237, factor("2.2046", Dimension.MASS).value().doubleValue(), 1e-9);
        // NIST SP 811 (2008) B.8: pound-force per square inch = 6.894 757 E+03 Pa; from memory
        assertEquals(6.894757, factor("6.895", PRESSURE).value().doubleValue(), 0.5e-6);
        // NIST SP 811 (2008) B.8: pound-force per square foot = 4.788 026 E+01 Pa; from memory
        assertEquals(47.88026, factor("47.88", PRESSURE).value().doubleValue(), 0.5e-5);
        // NIST SP 811 (2008) B.8: knot = 5.144 444 E-01 m/s (1852 m/h); from memory
        assertEquals(1852.0 / 3600, factor("0.5144", SPEED).value().doubleValue(), 1e-9);
        // NIST SP 811 (2008) B.8: mile per hour = 4.4704 E-01 m/s, exact; from memory
        assertEquals(0.44704, factor("0.447", SPEED).value().doubleValue(), 0);
        // by hand: 5280 ft / 3600 s = 1.466 666… ft/s per mph
        assertEquals(5280.0 / 3600, factor("1.467", SPEED).value().doubleValue(), 1e-9);
        // by hand: 1000 m / 3600 s = 1 / 3.6: 1 m/s = 3.6 km/h
        assertEquals(3.6, factor("3.6", SPEED).value().doubleValue(), 0);
        // NIST SP 811 (2008) B.8: pound per cubic foot = 1.601 846 E+01 kg/m³; from memory
        assertEquals(16.01846, factor("16.02", Dimension.of(-3, 1, 0, 0, 0, 0, 0)).value().doubleValue(), 0.5e-5);
    }

    @Test
    void aNumberMatchesWhenItIsTheFactorRoundedToItsOwnLastDigit() {
        // by hand: 3.280 84 rounds to 3.28, 3.281, 3.2808
        assertNotNull(HandConversions.match("3.28", Dimension.LENGTH, false));
        assertNotNull(HandConversions.match("3.2808", Dimension.LENGTH, false));
        // by hand: 3.280 84 does not round to 3.282 nor to 3.29
        assertNull(HandConversions.match("3.282", Dimension.LENGTH, false));
        assertNull(HandConversions.match("3.29", Dimension.LENGTH, false));
        // two significant digits that are not the exact factor say too little: 2.2, 0.45
        assertNull(HandConversions.match("2.2", Dimension.MASS, false));
        assertNull(HandConversions.match("0.45", Dimension.MASS, false));
        // exact factors match however they are written: 3.6, 3.60, 12.0
        assertNotNull(HandConversions.match("3.60", SPEED, true));
        assertNotNull(HandConversions.match("12.0", Dimension.LENGTH, true));
        // a whole number only as a divisor; never for another kind
        assertNull(HandConversions.match("12", Dimension.LENGTH, false));
        assertNull(HandConversions.match("12", Dimension.MASS, true));
        assertNull(HandConversions.match("2.205", Dimension.LENGTH, false));
    }

    private static HandConversions.Factor factor(String written, Dimension kind) {
        HandConversions.Factor f = HandConversions.match(written, kind, false);
        assertNotNull(f, written);
        return f;
    }
}
