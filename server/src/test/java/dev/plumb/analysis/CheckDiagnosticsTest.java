package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** check.failed, input.unused and basis.unknown: what a reviewer reads about a calc's claims. */
class CheckDiagnosticsTest {

    @Test
    void aFailedCheckShowsBothSidesAndItsReason() {
        Analysis a = Fixture.checkResource("check.failed.plumb");
        assertEquals(List.of(false, false, false, true, true), passed(a));
    }

    @Test
    void aFailedEqualityShowsEnoughFiguresToSeeTheDifference() {
        Analysis a = Fixture.checkResource("check.failed.close-values.plumb");
        // The report's row for the check must not read "1 m == 1 m" next to a failure either.
        Row.CheckRow row = a.rows().stream().filter(r -> r instanceof Row.CheckRow).map(r -> (Row.CheckRow) r)
            .findFirst().orElseThrow();
        assertEquals(false, row.passed());
        assertEquals("1.00002 m == 1 m", dev.plumb.present.CheckText.detail(row));
    }

    @Test
    void anInputThatNothingUsesIsAHint() {
        Fixture.checkResource("input.unused.plumb");
    }

    @Test
    void anAreaBasisIsFrontalWettedOrPlanform() {
        Analysis a = Fixture.checkResource("basis.unknown.plumb");
        assertEquals("planform", Fixture.value(a, "A_p").basis());
        assertEquals(null, Fixture.value(a, "A_f").basis());
    }

    @Test
    void aCheckOnAnUnknownValueIsNotEvaluatedAndSaysSo() {
        Analysis a = Fixture.check("""
            input F = 2 kN
            G = F + 1 m
            #   ^^^^^^^ unit.mismatch: adding a length (m) to a force (N)
            check G < 3 kN
            #<^^^^^^^^^^^^^ check.not-evaluated: this check is not evaluated, so it neither passes nor fails: G has no value
            """);
        Row.CheckRow c = a.rows().stream().filter(r -> r instanceof Row.CheckRow).map(r -> (Row.CheckRow) r).findFirst()
            .orElseThrow();
        assertEquals(null, c.passed());
        assertEquals("not evaluated: a value it needs is unknown", dev.plumb.present.CheckText.detail(c));
    }

    private static List<Boolean> passed(Analysis a) {
        return a.rows().stream().filter(r -> r instanceof Row.CheckRow).map(r -> ((Row.CheckRow) r).passed()).toList();
    }
}
