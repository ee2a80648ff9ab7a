package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
