package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Hover at the cursor ($0): what a reviewer reads about a value, a correlation call, an unknown. */
class HoverTest {

    private static String hover(String marked) {
        Marked m = Marked.of(marked);
        return HoverText.at(m.analysis(), m.cursor());
    }

    private static void contains(String hover, String... parts) {
        for (String part : parts) assertTrue(hover != null && hover.contains(part), "'" + part + "' in:\n" + hover);
    }

    @Test
    void aValueShowsItsUnitItsSiFormAndItsFormulaWithTheValuesPutIn() {
        // by hand: 1.2 m × 0.8 m = 0.96 m² = 9600 cm²
        contains(hover("input b = 1.2 m\ninput h = 800 mm\nA$0 = b * h   in cm^2\n"),
            "**A** = 9600 cm²", "an area", "in SI 0.96 m²", "`A = b * h`", "(1.2 m)", "(800 mm)");
    }

    @Test
    void theFormulaShownIsTheFormulaWrittenNotItsUnitOrNote() {
        String h = hover("input b = 2 m\nA$0 = b * b   in cm^2   \"the face\"\n");
        contains(h, "`A = b * b`", "the face");
        assertTrue(!h.contains("b * b   in"), h);
    }

    @Test
    void aCorrelationCallSaysWhereItsArgumentSitsInTheRange() {
        contains(hover("Cd = cd_sphere_s$0n(50)\n"), "cd_sphere_sn", "correlation", "at this call", "Re = 50");
    }

    @Test
    void aSweepShowsItsTableAndAResultItShowsReadsAsAValue() {
        // F = 0.6 kg/m · V²: 60 N at 10 m/s, 960 N at 40 m/s (0.96 kN).
        String calc = "input V = 20 m/s\nF = 0.6 kg/m * V^2 in N\ncheck F <= 400 N\nsw$0eep V over 10 m/s .. 40 m/s by 10 m/s\n"
            + "    show F in kN\n";
        contains(hover(calc), "sweep V: 4 rows", "| V [m/s] | F [kN] | checks |", "| 10 | 0.06 | ✓ |",
            "| 40 | 0.96 | ✗ F <= 400 N |");
        contains(hover(calc.replace("sw$0eep V", "sweep V$0")), "| V [m/s] |");
        contains(hover(calc.replace("sw$0eep", "sweep").replace("show F", "show F$0")), "**F** = 240 N");
    }

    @Test
    void aCaseShowsItsValuesBesideTheBaseWithTheRatio() {
        // F = 0.6 kg/m · V²: 240 N → 960 N when V doubles, ×4.
        String calc = "input V = 20 m/s\nF = 0.6 kg/m * V^2 in N\nca$0se doubled: V = 2 * V\n";
        contains(hover(calc), "case doubled: V = 40 m/s", "| F | 240 N | 960 N | ×4 |", "| V | 20 m/s | 40 m/s | ×2 |");
    }

    @Test
    void aValueShowsItsSpreadAndTheSharesOfItsSources() {
        // F = Cd · 0.6 kg/m · V²: (uF/F)² = (2 · 1/20)² + 0.05² → ±11 %; shares 0.01/0.0125 and 0.0025/0.0125.
        contains(hover("input V = 20 m/s ± 1 m/s\ninput Cd = 1 ± 5 %\nF$0 = Cd * 0.6 kg/m * V^2 in N\n"),
            "**F** = 240 N ± 27 N (±11 %)", "shares of its variance: V 80 %, Cd 20 %");
    }

    @Test
    void anUnknownValueSaysItWasNotComputed() {
        contains(hover("x = 1 m + 1 s\ny = x$0 * 2\n"), "not computed");
    }

    @Test
    void anUnknownOfASystemShowsWithWhatItWasSolvedAndEachEquationsResidual() {
        // by hand: T sin θ = 120 N, T cos θ = 300 N give tan θ = 0.4, θ = 21.80°
        contains(hover("input D = 120 N\ninput W = 300 N\nseek T, th$0eta from 100 N, 10 deg "
                + "where T * sin(theta) = D, T * cos(theta) = W\n"),
            "**theta** = 21.8°", "solved by `seek` together with T", "(Newton)", "`T * sin(theta) = D`: ",
            "`T * cos(theta) = W`: ");
    }

    @Test
    void nothingIsShownWhereThereIsNoName() {
        assertNull(hover("x = 1 m $0+ 2 m\n"));
    }
}
