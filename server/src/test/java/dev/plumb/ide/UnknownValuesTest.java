package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.diagnostics.Severity;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * Never silently wrong, as a property: in thousands of random calcs, a document that shows a
 * value as unknown (`?`) or a check as not evaluated always has an error that says why.
 */
class UnknownValuesTest {

    @Test
    void noUnknownValueWithoutAnErrorThatExplainsIt() {
        RandomCalc calcs = new RandomCalc(2_026_120_2L);
        int withUnknowns = 0;
        for (int i = 0; i < 3000; i++) {
            String text = calcs.document();
            Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("/plumb-prop/calc.plumb"), text);
            boolean unknown = a.rows().stream().anyMatch(r -> (r instanceof Row.ValueRow v && !v.value().known())
                || (r instanceof Row.CheckRow c && c.passed() == null));
            if (!unknown) continue;
            withUnknowns++;
            assertTrue(a.count(Severity.ERROR) > 0, () -> "an unknown value with no error to explain it in:\n" + text);
        }
        assertTrue(withUnknowns > 300, "the generator must make many calcs with unknowns; it made " + withUnknowns);
    }
}
