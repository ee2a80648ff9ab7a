package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.bench.GeneratedCalc;
import dev.plumb.diagnostics.Code;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Big, deep and hostile documents: always an analysis, never an exception or a hang. */
class RobustnessTest {
    private static final Path FILE = Path.of("generated.plumb").toAbsolutePath();

    private static Analysis analyze(String text) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, text);
    }

    @Test
    void tenThousandLinesEvaluate() {
        String text = GeneratedCalc.of(10_000);
        assertTrue(text.lines().count() >= 10_000);
        Analysis a = analyze(text);
        assertEquals(0, a.diagnostics().size(), () -> a.diagnostics().subList(0, 3).toString());
        long values = a.rows().stream().filter(r -> r instanceof Row.ValueRow v && v.value().known()).count();
        long passed = a.rows().stream().filter(r -> r instanceof Row.CheckRow c && Boolean.TRUE.equals(c.passed())).count();
        assertTrue(values > 5_000, "values: " + values);
        assertEquals(2 * 1000, passed);
    }

    @Test
    void longDependencyChainNeedsNoDeepRecursion() {
        StringBuilder b = new StringBuilder("x0 = 1 m\n");
        for (int i = 1; i < 20_000; i++) b.append("x").append(i).append(" = x").append(i - 1).append(" + 1 mm\n");
        Analysis a = analyze(b.toString());
        assertEquals(0, a.diagnostics().size());
        Row last = a.rows().get(a.rows().size() - 1);
        // 1 m + 19,999 mm = 20.999 m, by hand.
        assertEquals(20.999, ((Row.ValueRow) last).value().si(), 1e-9);
    }

    @Test
    void fiveThousandNestedParenthesesGiveAClearError() {
        String text = "x = " + "(".repeat(5000) + "1" + ")".repeat(5000) + "\n";
        Analysis a = analyze(text);
        assertEquals(1, a.diagnostics().size());
        assertEquals(Code.SYNTAX_NESTING, a.diagnostics().get(0).code());
        assertTrue(a.diagnostics().get(0).message().contains("at most 100"));
    }

    @Test
    void longestAllowedStatementEvaluates() {
        StringBuilder b = new StringBuilder("x = 1");
        for (int i = 0; i < 1_990; i++) b.append(" + 1");
        Analysis a = analyze(b + "\n");
        assertEquals(0, a.diagnostics().size());
        assertEquals(1_991, ((Row.ValueRow) a.rows().get(0)).value().si());
    }

    @Test
    void anAnalysisNobodyWantsStopsEarly() {
        Workspace w = new Workspace(new FileSources(), Settings.DEFAULT);
        assertEquals(null, w.analyzeText(FILE, GeneratedCalc.of(2_000), null, () -> true));
        assertNotNull(w.analyzeText(FILE, GeneratedCalc.of(200), null, () -> false));
    }

    @Test
    void reanalysisFromAnEarlierParseEqualsAFreshAnalysis() {
        String text = GeneratedCalc.of(300);
        Analysis before = analyze(text);
        // Break a line, mend another, and open an unclosed block half way down.
        String edited = text.replaceFirst("= 22 m/s", "= 22 m/").replaceFirst("check F_3 <", "check F_3 <=")
            .replaceFirst("section \"Case 12\"", "correlation k(Re)\n  = 1 / Re\nsection \"Case 12\"");
        Analysis again = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, edited, before.syntax(), () -> false);
        Analysis fresh = analyze(edited);
        assertEquals(fresh.diagnostics(), again.diagnostics());
        assertEquals(fresh.rows(), again.rows());
        assertEquals(fresh.syntax().statements(), again.syntax().statements());
    }

    @Test
    void randomTextNeverThrows() {
        String[] pieces = {"x", "y", " ", "=", "1", "2.5", "e3", "m", "/s", "^", "(", ")", "*", "+", "-", "\n", "    ",
            "in", "as", "check", "<", "<=", "input", "\"", "#", "°C", "µ", "😀", "kg/m³", ",", "f(", "use", "..", "\t",
            "section", "title", "degC", "==", "ρ", "\r\n", "\\", ";"};
        Random random = new Random(20261202L);
        for (int round = 0; round < 500; round++) {
            StringBuilder b = new StringBuilder();
            int n = random.nextInt(80);
            for (int i = 0; i < n; i++) b.append(pieces[random.nextInt(pieces.length)]);
            String text = b.toString();
            Analysis a = analyze(text);
            assertNotNull(a, text);
            a.diagnostics().forEach(d -> {
                assertTrue(d.span().start() >= 0 && d.span().end() <= text.length(), () -> "range " + d + " in " + text);
                assertFalse(d.message().isBlank());
            });
        }
    }
}
