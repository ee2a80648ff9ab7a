package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.opentest4j.AssertionFailedError;

/** The fixture helper itself: if it accepted anything, every fixture test would pass. */
class FixtureTest {

    private static Diagnostic d(Code code, int start, int end, String message) {
        return Diagnostic.of(code, new Span(start, end), message);
    }

    @Test
    void caretsGiveCharacterColumnsOnTheLineAbove() {
        String text = "a = b + 1\n#   ^^^^^ unit.mismatch: adding\n#       ^ name.unknown\n";
        List<Fixture.Expected> e = Fixture.annotations(text);
        assertEquals(2, e.size());
        assertEquals(List.of(4, 9), List.of(e.get(0).start(), e.get(0).end()));
        assertEquals(Code.UNIT_MISMATCH, e.get(0).code());
        assertEquals("adding", e.get(0).fragment());
        assertEquals(8, e.get(1).start());
        assertEquals("", e.get(1).fragment());
    }

    @Test
    void columnZeroIsMarkedWithAnArrow() {
        List<Fixture.Expected> e = Fixture.annotations("ab = 1\n#<^ name.duplicate: x\nc = 2\n#< name.cycle\n");
        assertEquals(List.of(0, 2), List.of(e.get(0).start(), e.get(0).end()));
        assertEquals(7 + 22, e.get(1).start());
    }

    @Test
    void columnsCountCharactersWhileOffsetsCountUtf16Units() {
        // The emoji is one column but two UTF-16 units.
        List<Fixture.Expected> e = Fixture.annotations("q = \"🚀\" )\n#       ^ syntax.error\n");
        assertEquals(9, e.get(0).start());
        assertEquals(10, e.get(0).end());
    }

    @Test
    void aSingleMarkAlsoMatchesAnEmptyRange() {
        String text = "t = 4 +\n#      ^ syntax.error: found the end\n";
        Fixture.check(text, List.of(d(Code.SYNTAX_ERROR, 7, 7, "… found the end of the line")));
        Fixture.check(text.replace("t = 4 +", "t = 4 +)"), List.of(d(Code.SYNTAX_ERROR, 7, 8, "… found the end")));
    }

    @Test
    void aFailureListsWhatIsMissingAndWhatIsUnexpected() {
        String text = "x = 1 mtr\n#     ^^^ unit.unknown: unknown unit 'mtr'\n";
        AssertionFailedError wrongRange = assertThrows(AssertionFailedError.class,
            () -> Fixture.check(text, List.of(d(Code.UNIT_UNKNOWN, 6, 8, "unknown unit 'mtr'"))));
        assertTrue(wrongRange.getMessage().contains("annotated but not reported"), wrongRange.getMessage());
        assertTrue(wrongRange.getMessage().contains("reported but not annotated"), wrongRange.getMessage());
        assertTrue(wrongRange.getMessage().contains("#     ^^ unit.unknown: unknown unit 'mtr'"), wrongRange.getMessage());
        assertThrows(AssertionFailedError.class,
            () -> Fixture.check(text, List.of(d(Code.UNIT_UNKNOWN, 6, 9, "unknown unit 'mt'"))));
        assertThrows(AssertionFailedError.class,
            () -> Fixture.check(text, List.of(d(Code.UNIT_MISMATCH, 6, 9, "unknown unit 'mtr'"))));
        assertThrows(AssertionFailedError.class, () -> Fixture.check(text, List.of()));
        assertThrows(AssertionFailedError.class, () -> Fixture.check(text, List.of(
            d(Code.UNIT_UNKNOWN, 6, 9, "unknown unit 'mtr'"), d(Code.INPUT_UNUSED, 0, 1, "input x is not used"))));
        Fixture.check(text, List.of(d(Code.UNIT_UNKNOWN, 6, 9, "unknown unit 'mtr' (did you mean 'm'?)")));
    }

    @Test
    void fragmentsMaySkipWithThreeDots() {
        assertTrue(Fixture.containsInOrder("unknown unit 'kNN' (did you mean 'kn' or 'kN'?)", "unknown unit ... 'kN'"));
        assertTrue(!Fixture.containsInOrder("b then a", "a ... b"));
    }

    @Test
    void malformedAnnotationsAreRejectedNotIgnored() {
        assertThrows(IllegalArgumentException.class, () -> Fixture.annotations("x = 1\n#   ^^ no-such.code: x\n"));
        assertThrows(IllegalArgumentException.class, () -> Fixture.annotations("x = 1\n#   ^^ unit.unknown x\n"));
        assertThrows(IllegalArgumentException.class, () -> Fixture.annotations("x = 1\n#      ^^ unit.unknown\n"));
        assertThrows(IllegalArgumentException.class, () -> Fixture.annotations("#  ^ unit.unknown\n"));
    }

    @Test
    void everyCodeOfASingleDocumentHasAFixtureFileNamedAfterIt() {
        // syntax.nesting is generated in SyntaxDiagnosticsTest; files and `use` are in UseTest;
        // limit.memory needs an exhausted heap, planted in OutOfMemoryTest; tolerance.samples-failed
        // a run with Monte Carlo samples, in MonteCarloTest.
        Set<Code> elsewhere = Set.of(Code.SYNTAX_NESTING, Code.FILE_NOT_TEXT, Code.FILE_UNREADABLE, Code.USE_NOT_FOUND, Code.USE_CYCLE,
            Code.USE_OUTSIDE_WORKSPACE, Code.USE_HAS_ERRORS, Code.LIMIT_MEMORY,
            Code.TOLERANCE_SAMPLES_FAILED);
        for (Code code : Code.values()) {
            if (elsewhere.contains(code)) continue;
            List<Fixture.Expected> annotated = Fixture.annotations(Fixture.resource(code.id() + ".plumb"));
            assertTrue(annotated.stream().anyMatch(e -> e.code() == code), code + ".plumb annotates no " + code);
        }
    }

    @Test
    void theHelperAnalysesFixturesWithTheEngine() {
        Analysis a = Fixture.check("""
            input x = 2
            #     ^ input.unused: input x is not used
            """);
        assertEquals(Fixture.FILE, a.file());
    }
}
