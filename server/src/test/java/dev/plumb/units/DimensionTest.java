package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Dimension arithmetic and names. Base-unit forms of derived units from the SI Brochure, 9th
 * edition (BIPM, 2019), Table 4, from memory: N = kg·m·s⁻², Pa = kg·m⁻¹·s⁻², J = kg·m²·s⁻²,
 * W = kg·m²·s⁻³; dynamic viscosity Pa·s = kg·m⁻¹·s⁻¹ (Table 5, from memory).
 */
class DimensionTest {

    private static final Dimension FORCE = Dimension.of(1, 1, -2, 0, 0, 0, 0);
    private static final Dimension VELOCITY = Dimension.LENGTH.divide(Dimension.TIME);

    @Test
    void exponentsBeyondTheBoundStayOutOfRangeInsteadOfWrapping() {
        Dimension d = Dimension.LENGTH.pow(99);
        for (int i = 0; i < 40; i++) d = d.times(d); // 99·2^40 wraps an int many times over
        assertTrue(d.outOfRange());
        assertFalse(d.isDimensionless());
        assertFalse(d.equals(Dimension.NONE));
        assertTrue(d.divide(d).outOfRange(), "out of range is sticky, even divided by itself");
        assertTrue(Dimension.LENGTH.pow(101).outOfRange());
        assertFalse(Dimension.LENGTH.pow(100).outOfRange());
        assertTrue(Dimension.LENGTH.pow(Integer.MAX_VALUE).outOfRange());
        assertTrue(d.describe().contains("beyond ±100"), d.describe());
    }

    @Test
    void arithmetic() {
        assertEquals(FORCE, Dimension.MASS.times(VELOCITY).divide(Dimension.TIME));
        assertEquals(Dimension.of(2, 0, -2, 0, 0, 0, 0), VELOCITY.pow(2));
        assertEquals(VELOCITY, VELOCITY.pow(2).root(2));
        assertNull(Dimension.LENGTH.pow(3).root(2));
        assertEquals(Dimension.NONE, FORCE.divide(FORCE));
        assertTrue(Dimension.NONE.isDimensionless());
        assertFalse(FORCE.isDimensionless());
        assertEquals(-2, FORCE.exponent(2));
    }

    @Test
    void valueSemantics() {
        assertEquals(Dimension.of(0, 1, 0, 0, 0, 0, 0), Dimension.MASS);
        assertEquals(Dimension.MASS.hashCode(), Dimension.of(0, 1, 0, 0, 0, 0, 0).hashCode());
        assertEquals("1", Dimension.NONE.toString());
        assertEquals("kg·m/s²", FORCE.toString());
    }

    @Test
    void siUnits() {
        check(FORCE, "kg·m/s²");
        check(Dimension.LENGTH.pow(2), "m²");
        check(Dimension.TIME.pow(-1), "1/s");
        check(Dimension.NONE, "");
        check(Dimension.of(2, 1, -3, 0, 0, 0, 0), "kg·m²/s³");
        check(Dimension.of(-1, 1, -1, 0, 0, 0, 0), "kg/(m·s)");
        check(Dimension.of(0, 1, -3, 0, -1, 0, 0), "kg/(s³·K)");
    }

    @Test
    void describe() {
        describe(FORCE, "a force (N)");
        describe(Dimension.LENGTH, "a length (m)");
        describe(Dimension.of(-1, 1, -2, 0, 0, 0, 0), "a pressure (Pa)");
        describe(Dimension.of(-1, 1, -1, 0, 0, 0, 0), "a dynamic viscosity (Pa·s)");
        describe(Dimension.of(1, 0, -2, 0, 0, 0, 0), "an acceleration (m/s²)");
        describe(Dimension.LENGTH.pow(2), "an area (m²)");
        describe(Dimension.NONE, "a dimensionless number");
        describe(Dimension.of(2, 1, -3, 0, 1, 0, 0), "a quantity in kg·m²·K/s³");
    }

    @Test
    void names() {
        assertEquals("force", FORCE.name());
        assertEquals("kinematic viscosity", Dimension.of(2, 0, -1, 0, 0, 0, 0).name());
        assertEquals("density", Dimension.of(-3, 1, 0, 0, 0, 0, 0).name());
        assertNull(Dimension.of(5, 0, 0, 0, 0, 0, 0).name());
    }

    private static void check(Dimension d, String expected) {
        assertEquals(expected, d.siUnits());
    }

    private static void describe(Dimension d, String expected) {
        assertEquals(expected, d.describe());
    }
}
