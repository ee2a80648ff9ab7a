package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.diagnostics.Printable;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** What the editor shows of a calc's own words (outline, hover) carries no control characters. */
class UntrustedTextTest {
    private static final String ESC = "\u001b[2K\u202Eevil";

    private static Analysis analyze(String text) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of("/tmp/untrusted.plumb"), text);
    }

    private static void clean(String s) {
        assertFalse(s.chars().anyMatch(c -> c != '\n' && c != '\t' && Printable.unsafe(c)), s);
    }

    private static void collect(List<Symbol> symbols, List<String> out) {
        for (Symbol s : symbols) {
            out.add(s.name());
            out.add(s.detail());
            collect(s.children(), out);
        }
    }

    @Test
    void outlineAndHoverShowEscapesNotControls() {
        String text = "section \"Loads " + ESC + "\"\ninput x = 2 m \"" + ESC + "\"\nf(a) = a * 2 \"" + ESC + "\"\ncheck x < 3 m \"" + ESC + "\"\n";
        Analysis a = analyze(text);
        List<String> shown = new ArrayList<>();
        collect(Outline.of(a), shown);
        shown.forEach(UntrustedTextTest::clean);
        assertTrue(shown.stream().anyMatch(s -> s.startsWith("Loads \\u001B[2K")), shown::toString);
        String hover = HoverText.at(a, text.indexOf("x ="));
        clean(hover);
        assertTrue(hover.contains("\\u202E"), hover);
    }
}
