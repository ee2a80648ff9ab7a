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
