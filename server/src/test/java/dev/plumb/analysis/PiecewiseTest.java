package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Piecewise definitions and functions: `a when COND otherwise b`, one line or one piece a line. */
class PiecewiseTest {

    private static List<Code> codes(Analysis a) {
        return a.diagnostics().stream().map(Diagnostic::code).toList();
    }

    @Test
    void theFirstPieceWhoseConditionHoldsGivesTheValue() {
        Analysis a = Fixture.analyze("""
            x = 1.2 when 2 < 3 otherwise 1.3
            input AR = 7
            Cd = 1.18 when AR < 5
               = 1.25 when 5 <= AR < 10
               = 1.40 otherwise
            chain = 1 when AR < 2 otherwise 2 when AR < 8 otherwise 3
            """);
        assertEquals(List.of(), codes(a));
        // by hand: 2 < 3 holds, so x = 1.2; AR = 7 fails AR < 5 and meets 5 <= AR < 10; 7 < 8
        assertEquals(1.2, Fixture.value(a, "x").value().si(), 0);
        assertEquals(1.25, Fixture.value(a, "Cd").value().si(), 0);
        assertEquals(2, Fixture.value(a, "chain").value().si(), 0);
    }

    @Test
    void aFunctionChoosesItsPiecePerCall() {
        Analysis a = Fixture.analyze("""
            ramp(t) = 0 m when t < 0 s otherwise 3 m/s * t
            d_before = ramp(-2 s)
            d_after  = ramp(4 s)   in m
            """);
        assertEquals(List.of(), codes(a));
        // by hand: 3 m/s × 4 s = 12 m; before zero the first piece gives 0 m
        assertEquals(0, Fixture.value(a, "d_before").value().si(), 0);
        assertEquals("12 m", Fixture.shown(a, "d_after"));
    }

    @Test
    void piecesUseAndAreUsedLikeAnyFormula() {
        // The dependency order sees names in conditions and in every piece.
        Analysis a = Fixture.analyze("""
            y = a when b > 1 otherwise c
            a = 5
            b = 2
            c = 7
            """);
        assertEquals(List.of(), codes(a));
        assertEquals(5, Fixture.value(a, "y").value().si(), 0);
        assertFalse(Fixture.value(a, "c").value().si() != 7);
    }

    @Test
    void piecewiseMistakesHaveTheirFixture() {
        Fixture.checkResource("range.no-formula.piecewise-definition.plumb");
    }

    @Test
    void aCorrelationsPiecesMustAgreeInDimensionToo() {
        Analysis a = Fixture.analyze("""
            correlation k_bad(r)
                = 1 m when r < 1
                = 2 otherwise
            end
            k = k_bad(3)
            """);
        assertEquals(List.of(Code.UNIT_MISMATCH), codes(a));
        assertEquals("?", Fixture.shown(a, "k"));
    }

    @Test
    void anOtherwiseThatIsNotLastIsASyntaxError() {
        Analysis a = Fixture.analyze("x = 1 when 1 < 2 otherwise 2 otherwise 3\n");
        assertEquals(List.of(Code.SYNTAX_ERROR), codes(a));
    }
}
