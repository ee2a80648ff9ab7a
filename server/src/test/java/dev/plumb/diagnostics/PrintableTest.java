package dev.plumb.diagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/** Control and bidirectional-override characters become visible escapes; everything else stays. */
class PrintableTest {
    @Test
    void controlsBecomeVisibleEscapes() {
        assertEquals("\\u001B[2K\\u001B[1GChecked", Printable.line("\u001b[2K\u001b[1GChecked"));
        assertEquals("\\u001B]0;title\\u0007", Printable.line("\u001b]0;title\u0007"));
        assertEquals("a\\u202Eb\\u2066c\\u0085d\\u007F", Printable.line("a\u202Eb\u2066c\u0085d\u007F"));
        assertEquals("one\\u000Atwo\\u0009", Printable.line("one\ntwo\t"));
        assertEquals("one\ntwo\t\\u000D", Printable.text("one\ntwo\t\r"));
    }

    @Test
    void ordinaryTextIsLeftAlone() {
        String s = "ρ_air = 1.2 kg/m³ — “note” 𝑥 \u05D0";
        assertSame(s, Printable.line(s));
    }
}
