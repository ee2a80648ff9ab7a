package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

/** math.*: division by zero, values outside a function's domain, overflow. */
class MathDiagnosticsTest {

    @Test
    void divisionByZeroNamesTheDivisor() {
        Analysis a = Fixture.checkResource("math.division-by-zero.plumb");
        assertFalse(Fixture.value(a, "V").value().known());
        assertEquals("?", Fixture.shown(a, "V"));
    }

    @Test
    void valuesOutsideAFunctionsDomain() {
        Fixture.checkResource("math.domain.plumb");
    }

    @Test
    void argumentsOutsideACorrelationsDomainAreErrorsAndLeaveTheValueUnknown() {
        Analysis a = Fixture.checkResource("math.domain.library.plumb");
        for (String name : new String[] {"a", "F", "c", "g", "Cd", "A", "Re", "F_sphere"}) {
            assertFalse(Fixture.value(a, name).value().known(), name);
            assertEquals("?", Fixture.shown(a, name), name);
        }
        // Outside `valid` but inside `domain`: warned, and still computed. By hand: 1.32 - 0.11 *
        // log10(8e5 / 2e4) = 1.32 - 0.11 * 1.60206 = 1.14377.
        assertEquals(1.32 - 0.11 * Math.log10(40), Fixture.value(a, "b").value().si(), 1e-12);
    }

    @Test
    void overflowNamesTheOperands() {
        Fixture.checkResource("math.not-finite.plumb");
    }

    @Test
    void largeButFiniteValuesAreFine() {
        Analysis a = Fixture.check("""
            input a = 1e150 m
            A = a * a
            check A > 1e299 m^2
            """);
        assertEquals(1e300, Fixture.value(a, "A").value().si(), 1e285);
    }
}
