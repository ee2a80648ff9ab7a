package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** unit.*: unknown units and dimension errors, each with a message that says what to do. */
class UnitDiagnosticsTest {

    @Test
    void unknownUnitsExplainTwoMetresAgainstTwoTimesM() {
        Fixture.checkResource("unit.unknown.plumb");
    }

    @Test
    void aValueNameWrittenAsAUnitGetsTheFixWithThatName() {
        Fixture.checkResource("unit.unknown.name-after-number.plumb");
    }

    @Test
    void theSuggestionSpeltLikeTheTypoInItsCaseComesFirst() {
        // kNN is kN with one letter too many; the knot (kn) needs a change of case as well.
        Fixture.check("""
            F = 3 kNN
            #     ^^^ unit.unknown: unknown unit 'kNN' (did you mean 'kN'
            """);
    }

    @Test
    void mismatchesNameBothDimensionsInWordsAndSi() {
        Fixture.checkResource("unit.mismatch.plumb");
    }

    @Test
    void anInUnitForAValueOfAnUnusualDimensionOffersNoUnit() {
        // by hand: N·m·s = kg·m/s²·m·s = kg·m²/s, which no named quantity has
        Analysis a = Fixture.analyze("input F = 2 N\ninput L = 1 m\ninput t = 3 s\nQ = F * L * t   in N*m\n");
        assertEquals(1, a.diagnostics().size(), a.diagnostics().toString());
        assertTrue(a.diagnostics().get(0).message().contains("the formula is the likely mistake"));
        assertEquals(List.of(), a.diagnostics().get(0).fixes());
        // A named dimension still gets its unit as the fix: F / L is a force per length, N/m.
        Analysis named = Fixture.analyze("input F = 2 N\ninput L = 1 m\nq = F / L   in N\n");
        assertEquals("N/m", named.diagnostics().get(0).fixes().get(0).text());
    }

    @Test
    void argumentsOfLogExpTrigAndExponentsArePlainNumbers() {
        Fixture.checkResource("unit.not-dimensionless.plumb");
    }

    @Test
    void powersAndRootsKeepWholeExponents() {
        Fixture.checkResource("unit.fractional-power.plumb");
    }

    @Test
    void twoTemperaturePointsCannotBeAdded() {
        Analysis a = Fixture.checkResource("unit.temperature-sum.plumb");
        // The lines that are fine evaluate: 40 °C - 15 °C = 25 K, a difference (by definition of
        // the Celsius scale, a step of 1 °C is a step of 1 K).
        Row.ValueRow dT = Fixture.value(a, "ΔT");
        assertEquals(25.0, dT.value().si(), 1e-9);
        assertTrue(dT.value().difference());
    }

    @Test
    void aNumberWithoutAnAngleUnitWhereAnAngleIsDeclared() {
        Fixture.checkResource("unit.bare-angle.plumb");
    }
}
