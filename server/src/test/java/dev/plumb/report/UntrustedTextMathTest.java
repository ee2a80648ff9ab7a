package dev.plumb.report;

import static dev.plumb.report.MathDom.all;
import static dev.plumb.report.MathDom.reading;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.UnitText;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * A calc comes from strangers, and the values come formatted by a caller: whatever text reaches
 * the typesetter, the markup stays well-formed, no element is injected, and no invisible or
 * reordering character passes through.
 */
class UntrustedTextMathTest {
    private static final Span AT = new Span(0, 1);
    private static final String HOSTILE = "a</mi><script>x</script>&amp;\"'\u202E\u0007\u0000\u200B\u2028\uD800\uFFFE";

    @Test
    void markupInNamesUnitsAndValuesIsText() {
        Expr e = new Expr.Binary(AT, Expr.Op.MULTIPLY,
            new Expr.Call(AT, new Ident(HOSTILE, AT), List.of(new Expr.Reference(AT, HOSTILE))),
            new Expr.Quantity(AT, 1, "1", new UnitText(HOSTILE, AT)));
        String markup = Written.MATH.formula(e, ValueSource.none());
        Element math = MathDom.parse(markup);
        assertEquals(List.of(), all(math, "script"));
        assertTrue(reading(math).contains("a</mi><script>x</script>&amp;\"'"), reading(math));
        String valued = Written.MATH.formula(e, name -> java.util.Optional.of(new ShownValue(HOSTILE, HOSTILE)));
        assertEquals(List.of(), all(MathDom.parse(valued), "script"));
    }

    @Test
    void invisibleAndReorderingCharactersAreShownAsEscapes() {
        String markup = Written.MATH.formula(new Expr.Reference(AT, HOSTILE), ValueSource.none());
        for (char c : new char[] {'\u202E', '\u0007', '\u0000', '\u200B', '\u2028', '\uD800', '\uFFFE'}) {
            assertFalse(markup.indexOf(c) >= 0, String.format("U+%04X passed through", (int) c));
        }
        String text = reading(MathDom.parse(markup));
        assertTrue(text.contains("\\u202E\\u0007\\u0000\\u200B\\u2028\\uD800\\uFFFE"), text);
    }

    @Test
    void lettersOfEveryScriptPassUnchanged() {
        String name = "ρ_𝑥漢";
        assertEquals("ρ 𝑥漢", reading(MathDom.parse(Written.MATH.formula(new Expr.Reference(AT, name), ValueSource.none()))));
    }
}
