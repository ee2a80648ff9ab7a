package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Inline values carry a spread's short form. */
class InlaySpreadTest {
    @Test
    void aValueWithASpreadShowsItRelativeAndATemperatureAbsolute() {
        // F = 0.6 kg/m · V²: ±10 % from V ± 5 %; T_out = T + 5 K carries ± 2 K, a reading with no relative form.
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("i.plumb"), """
            input V = 20 m/s ± 1 m/s
            F = 0.6 kg/m * V^2 in N
            input T = 15 degC ± 2 K
            T_out = T + 5 K
            """);
        List<String> labels = InlayValues.of(a).stream().map(InlayValue::label).toList();
        assertEquals(List.of("= 240 N ±10 %", "= 20 °C ± 2 °C"), labels);
    }
}
