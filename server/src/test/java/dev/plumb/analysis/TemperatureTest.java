package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Temperature points and differences. The conversions are definitions of the scales:
 * T/K = t/°C + 273.15 (NIST SP 811 (2008), section 4.2.1.1, from memory); a difference of
 * 1 °C equals a difference of 1 K (same section).
 */
class TemperatureTest {

    private static Analysis analyze(String text) {
        return Fixture.analyze(text);
    }

    private static List<Code> codes(Analysis a) {
        return a.diagnostics().stream().map(Diagnostic::code).toList();
    }

    @Test
    void negativeCelsiusReadingIsAPointBelowZero() {
        Analysis a = analyze("input T = -5 degC\nx = T + 10 K in degC\n");
        assertEquals(List.of(), codes(a));
        assertEquals(268.15, Fixture.value(a, "T").value().si(), 1e-9);
        assertEquals("5 °C", Fixture.shown(a, "x"));
    }

    @Test
    void differenceOfTwoPointsIsADifference() {
        Analysis a = analyze("input T1 = 20 degC\ninput T2 = 25 degC\nd = T2 - T1\ne = d in degC\n");
        assertEquals(List.of(), codes(a));
        assertEquals(5.0, Fixture.value(a, "d").value().si(), 1e-12);
        assertEquals("5 °C", Fixture.shown(a, "e"), "a difference shown in °C has no offset");
    }

    @Test
    void checkThatComparesAPointWithADifferenceIsRefused() {
        Analysis a = analyze("input T1 = 20 degC\ninput T2 = 25 degC\nd = T2 - T1\ncheck d < 1 degC\n");
        assertEquals(List.of(Code.UNIT_MISMATCH), codes(a));
        assertTrue(a.diagnostics().get(0).message().contains("temperature point"));
        Row.CheckRow check = (Row.CheckRow) a.rows().get(a.rows().size() - 1);
        assertNull(check.passed());
    }

    @Test
    void kelvinValuesMayBePointsOrDifferences() {
        // 288.15 K is 15 °C; 5 K added to a °C reading is a difference; neither is an error.
        Analysis a = analyze("input T = 288.15 K\nshown = T in degC\ninput t = 15 degC\nu = t + 5 K in degC\n"
            + "check T == t\ncheck u > 300 K - 10 K\n");
        assertEquals(List.of(), codes(a));
        assertEquals("15 °C", Fixture.shown(a, "shown"));
        assertEquals("20 °C", Fixture.shown(a, "u"));
    }

    @Test
    void subtractingAPointFromADifferenceIsRefused() {
        Analysis a = analyze("input T1 = 20 degC\ninput T2 = 25 degC\nd = T2 - T1\nx = d - T1\n");
        assertEquals(List.of(Code.UNIT_TEMPERATURE_SUM), codes(a));
    }

    @Test
    void aPointMadeFromAPointReadsOnItsScale() {
        // 20 °C + 5 K = 25 °C (a point plus a difference is a point, common practice); a
        // difference of two points stays a difference, in K.
        Analysis a = analyze("input T1 = 20 degC\ninput rise = 5 K\nT2 = T1 + rise\nd = T2 - T1\n"
            + "input T_f = 50 degF\nT_g = T_f + rise\n");
        assertEquals("25 °C", Fixture.shown(a, "T2"));
        assertEquals("5 K", Fixture.shown(a, "d"));
        // 50 °F + 5 K = 50 °F + 9 °F = 59 °F.
        assertEquals("59 °F", Fixture.shown(a, "T_g"));
    }

    @Test
    void fahrenheitPointsConvert() {
        // 68 °F = 20 °C = 293.15 K, by the definition t/°F = 1.8 t/°C + 32.
        Analysis a = analyze("input T = 68 degF\nc = T in degC\n");
        assertEquals(293.15, Fixture.value(a, "T").value().si(), 1e-9);
        assertEquals("20 °C", Fixture.shown(a, "c"));
    }

    @Test
    void aMissingFileIsUnreadableNotBinary() {
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyze(Path.of("/nonexistent/plumb/x.plumb"));
        assertEquals(List.of(Code.FILE_UNREADABLE), codes(a));
        assertTrue(a.diagnostics().get(0).message().contains("no such file"));
    }
}
