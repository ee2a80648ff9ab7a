package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A sweep's and a case's lines carry a short inline summary too, worded by the present layer. */
class InlayStudiesTest {
    @Test
    void aSweepSaysItsRowsAndHowItsChecksWentAndACaseItsLastValueWithTheRatio() {
        // F = 0.6 kg/m · V²: 240 N at 20 m/s; at V = 30 m/s, 540 N = 2.25 × 240 N (worked by hand).
        // The sweep from 10 to 40 m/s by 10 has 4 rows: 60, 240, 540 and 960 N; the check F <= 600 N
        // fails at 40 m/s only.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("s.plumb"), """
            input V = 20 m/s
            F = 0.6 kg/m * V^2 in N
            check F <= 600 N
            case gusty: V = 30 m/s
            sweep V over 10 m/s .. 40 m/s by 10 m/s
                show F
            """);
        List<String> labels = InlayValues.of(a).stream().map(InlayValue::label).toList();
        assertEquals(List.of("= 240 N", "✓ 240 N <= 600 N", "→ F 540 N ×2.25, checks pass",
            "= 4 rows, 1 fail a check"), labels);
    }
}
