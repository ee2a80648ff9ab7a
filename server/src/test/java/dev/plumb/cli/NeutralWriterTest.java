package dev.plumb.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** Only Style's own colour sequences pass; any other control, also a colour a calc wrote, is escaped. */
class NeutralWriterTest {
    private static String through(Style style, String text) {
        StringWriter sink = new StringWriter();
        var w = style.writer(sink);
        w.print(text);
        w.flush();
        return sink.toString();
    }

    @Test
    void styleColoursPassAndInjectedSequencesAreEscaped() {
        Style on = new Style(true);
        String ours = on.bad("FAIL");
        assertEquals(ours, through(on, ours));
        assertEquals("\\u001B[8mhidden " + ours, through(on, "\u001b[8mhidden " + ours));
        assertEquals("\\u001B[31mred", through(new Style(false), "\u001b[31mred"), "no colour passes when colours are off");
        assertEquals("a\n\tb\\u0007", through(on, "a\n\tb\u0007"));
    }
}
