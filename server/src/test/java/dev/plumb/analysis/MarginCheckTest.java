package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Checks `with spread`: judged at the sides' bounds. A wind load of our own. */
class MarginCheckTest {
    private static List<Row.Verdict> verdicts(Analysis a) {
        return a.rows().stream().filter(r -> r instanceof Row.CheckRow).map(r -> ((Row.CheckRow) r).verdict()).toList();
    }

    @Test
    void aCheckThatPassesForTheValuesButNotAtTheBoundHasAVerdictOfItsOwn() {
        // F = 0.6 kg/m · V² = 576.6 N at 31 m/s; uF = 2 · (2/31) · F = 74.4 N, so F's upper bound is 651 N:
        // below 700 N, above 600 N; 560 N fails for the value itself; the lower bound 502 N is above 100 N.
        Analysis a = Fixture.analyze("""
            input V = 31 m/s ± 2 m/s
            F = 0.6 kg/m * V^2 in N
            check F <= 600 N with spread
            check F <= 700 N with spread
            check F <= 560 N with spread
            check 100 N <= F with spread
            check 510 N <= F with spread
            check F <= 600 N
            """);
        assertEquals(List.of(Row.Verdict.FAILS_AT_BOUND, Row.Verdict.PASSED, Row.Verdict.FAILED, Row.Verdict.PASSED,
            Row.Verdict.FAILS_AT_BOUND, Row.Verdict.PASSED), verdicts(a));
        Row.CheckRow first = (Row.CheckRow) a.rows().stream().filter(r -> r instanceof Row.CheckRow).findFirst().orElseThrow();
        assertEquals(2 * 2.0 / 31 * 0.6 * 31 * 31, first.spreads().get(0), 1e-6);
        assertEquals(0.0, first.spreads().get(1), 0.0);
        assertEquals(Boolean.FALSE, first.passed());
    }

    @Test
    void withoutAnySourceTheBoundsAreTheValues() {
        Analysis a = Fixture.analyze("""
            input V = 31 m/s
            F = 0.6 kg/m * V^2 in N
            check F <= 600 N with spread
            """);
        assertEquals(List.of(Row.Verdict.PASSED), verdicts(a));
    }
}
