package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** name.*, call.arity, and the rule that one mistake gives one diagnostic. */
class NameDiagnosticsTest {

    @Test
    void unknownNamesOfferCloseSpellingsAndExplainUnits() {
        Fixture.checkResource("name.unknown.plumb");
    }

    @Test
    void unknownNamesOfferTheDocumentsOwnValues() {
        Fixture.checkResource("name.unknown.own-names.plumb");
    }

    @Test
    void aNameIsDefinedOnceAndNeverOverABuiltIn() {
        Analysis a = Fixture.checkResource("name.duplicate.plumb");
        // The first definition stands: A = 0.7854 * (0.25 m)^2 = 0.04909 m², by hand.
        assertEquals(0.7854 * 0.0625, Fixture.value(a, "A").value().si(), 1e-12);
        // The second A points back at the first.
        Diagnostic second = a.diagnostics().stream().filter(d -> d.message().startsWith("A is already")).findFirst().orElseThrow();
        assertEquals(1, second.related().size());
        Span first = second.related().get(0).span();
        assertEquals("A", a.text().substring(first.start(), first.end()));
        assertEquals(4, a.lines().line(first.start()));
    }

    @Test
    void circularDefinitionsMarkEveryMemberAndNameTheCircle() {
        Fixture.checkResource("name.cycle.plumb");
    }

    @Test
    @Timeout(120)
    void aFunctionThatCallsItselfIsACircleNotACrash() {
        Fixture.checkResource("name.cycle.recursive-function.plumb");
    }

    @Test
    void valuesAreNotFunctionsAndFunctionsAreNotValues() {
        Fixture.checkResource("name.kind.plumb");
    }

    @Test
    void callsGiveAsManyArgumentsAsTheFunctionTakes() {
        Fixture.checkResource("call.arity.plumb");
    }

    @Test
    void atLeastOneArgumentIsSingular() {
        Fixture.checkResource("call.arity.at-least-one.plumb");
    }

    @Test
    void oneMistakeGivesOneDiagnostic() {
        Analysis a = Fixture.checkResource("cascade.plumb");
        for (String name : new String[] {"Re_2", "G", "I", "J", "d"}) {
            assertFalse(Fixture.value(a, name).value().known(), name + " should be unknown");
        }
        long unevaluated = a.rows().stream().filter(r -> r instanceof Row.CheckRow c && c.passed() == null).count();
        assertEquals(4, unevaluated);
    }

    @Test
    void aCallOfAFunctionWithAnUnknownNameInsideStaysQuiet() {
        Fixture.check("""
            input x = 2
            f(a) = a * k
            #          ^ name.unknown: unknown name 'k'
            y = f(x)
            z = y + 1
            """);
    }
}
