package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** syntax.error and syntax.nesting: one error per broken line, in the right place, never a crash. */
class SyntaxDiagnosticsTest {

    @Test
    void eachBrokenLineHasOneErrorAtItsToken() {
        Fixture.checkResource("syntax.error.plumb");
    }

    @Test
    void threeBrokenLinesAfterTextOutsideAsciiGiveExactlyThreeErrors() {
        Analysis a = Fixture.checkResource("syntax.error.unicode.plumb");
        List<Diagnostic> errors = a.diagnostics().stream().filter(d -> d.severity() == Severity.ERROR).toList();
        assertEquals(3, errors.size(), errors::toString);
        // Lines and character columns as a person counts them (1-based), emoji included.
        assertEquals(List.of("11:24", "13:15", "16:46"),
            errors.stream().map(d -> a.lines().line(d.span().start()) + ":" + a.lines().column(d.span().start())).toList());
    }

    @Test
    void formerSpellingsAreErrorsThatShowTheNewOne() {
        Fixture.checkResource("syntax.renamed.plumb");
    }

    @Test
    void theFormerSolveSpellingCarriesItsRewriteAsAFix() {
        String text = "W = 2 N\nfind V within 1 m/s .. 10 m/s\n    so that V * 1 N*s/m = W   \"note\"\n";
        Analysis a = Fixture.analyze(text);
        Diagnostic d = a.diagnostics().get(0);
        assertEquals(Code.SYNTAX_RENAMED, d.code());
        String mended = text.substring(0, d.fixes().get(0).span().start()) + d.fixes().get(0).text() + text.substring(d.fixes().get(0).span().end());
        // The user's own line break and spacing are kept; only the four words change.
        assertEquals("W = 2 N\nseek V in 1 m/s .. 10 m/s\n    where V * 1 N*s/m = W   \"note\"\n", mended);
        Analysis again = Fixture.analyze(mended);
        assertEquals(List.of(), again.diagnostics(), "the mended text reads clean");
        // by hand: V * 1 N·s/m = 2 N gives V = 2 m/s
        assertEquals(2.0, Fixture.value(again, "V").value().si(), 1e-9);
    }

    @Test
    void aStrayTokenInTheMiddleOfALineCostsOnlyThatLine() {
        Fixture.checkResource("syntax.error.mid-line.plumb");
    }

    @Test
    void usesOfABrokenDefinitionAreNotUnknownNames() {
        Fixture.check("""
            input L = 2 m
            A = L * L *
            #          ^ syntax.error: expected a value, a name or '(' but found the end of the line
            V = A * L
            check V > 1 m^3
            #<^^^^^^^^^^^^^^ check.not-evaluated: V has no value
            """);
    }

    @Test
    void anInputUsedOnlyByABrokenLineIsNotReportedUnused() {
        Fixture.checkResource("cascade.input-used-by-broken-line.plumb");
    }

    @Test
    void continuationLinesBelongToTheirStatement() {
        // The error on the continued line is placed on that line; the next statement is separate.
        Analysis a = Fixture.check("""
            input b = 2 m
            A = b
                * 3 mtr
            #       ^^^ unit.unknown: unknown unit 'mtr'
            B = b *
            #      ^ syntax.error: expected a value, a name or '(' but found the end of the line
            C = b * 2
            """);
        Row.ValueRow c = (Row.ValueRow) a.rows().get(a.rows().size() - 1);
        assertEquals("C", c.name());
        assertEquals(4.0, c.value().si(), 1e-12);
    }

    @Test
    void windowsLineEndsDoNotShiftPositions() {
        Fixture.check("x = 1 mtr\r\n#     ^^^ unit.unknown: unknown unit 'mtr'\r\n"
            + "t = 4 +\r\n#      ^ syntax.error: found the end of the line\r\ny = t\r\n");
    }

    @Test
    void aByteOrderMarkIsNotAColumn() {
        // Editors saving UTF-8 "with BOM" put U+FEFF first; nobody sees it, so nobody counts it.
        Analysis a = Fixture.analyze("\uFEFFx = 1 mtr\n");
        Diagnostic d = a.diagnostics().get(0);
        assertEquals(Code.UNIT_UNKNOWN, d.code());
        assertEquals(7, d.span().start()); // a UTF-16 offset into the text, which holds the mark
        assertEquals(1, a.lines().line(d.span().start()));
        assertEquals(7, a.lines().column(d.span().start()), "'mtr' is the 7th character a person sees");
    }

    @Test
    void fiveThousandNestedParenthesesGiveOneNestingError() {
        String line = "x = " + "(".repeat(5000) + "L" + ")".repeat(5000);
        // The error points at the innermost '(' (column 5003) and names the limit.
        String fixture = "input L = 1 m\ncheck L > 0 m\n" + line + "\n"
            + "#" + " ".repeat(5002) + "^ syntax.nesting: this expression is nested 5000 levels deep; Plumb accepts at most 100\n"
            + "y = x * 2\n";
        Analysis a = Fixture.check(fixture);
        assertTrue(a.rows().stream().anyMatch(r -> r instanceof Row.ValueRow v && v.name().equals("y") && !v.value().known()));
    }

    @Test
    @Timeout(60)
    void fiveThousandNestedParenthesesOnASmallStackDoNotOverflow() throws Exception {
        String text = "x = " + "(".repeat(5000) + "1" + ")".repeat(5000) + "\n";
        Analysis[] result = new Analysis[1];
        Throwable[] thrown = new Throwable[1];
        // 256 KB: far less than a default thread; the engine must not depend on the caller's stack.
        Thread t = new Thread(null, () -> {
            try {
                result[0] = Fixture.analyze(text);
            } catch (Throwable e) {
                thrown[0] = e;
            }
        }, "small-stack", 256 * 1024);
        t.start();
        t.join();
        assertEquals(null, thrown[0], () -> "threw " + thrown[0]);
        assertEquals(List.of(Code.SYNTAX_NESTING), result[0].diagnostics().stream().map(Diagnostic::code).toList());
    }

    @Test
    void theNestingLimitIsOneHundred() {
        String hundred = "(".repeat(100) + "a" + ")".repeat(100);
        String hundredOne = "(".repeat(101) + "a" + ")".repeat(101);
        Analysis ok = Fixture.analyze("input a = 2\ncheck a > 1\nx = " + hundred + "\n");
        assertEquals(List.of(), ok.diagnostics());
        Analysis deep = Fixture.analyze("input a = 2\ncheck a > 1\nx = " + hundredOne + "\n");
        assertEquals(List.of(Code.SYNTAX_NESTING), deep.diagnostics().stream().map(Diagnostic::code).toList());
        assertTrue(deep.diagnostics().get(0).message().contains("nested 101 levels deep"));
    }

    @Test
    void aLongRunOfSignsNestsLikeParentheses() {
        Analysis a = Fixture.analyze("x = " + "-".repeat(5000) + "1\n");
        assertEquals(List.of(Code.SYNTAX_NESTING), a.diagnostics().stream().map(Diagnostic::code).toList());
        assertFalse(a.rows().isEmpty());
    }
}
