package dev.plumb;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.api.FuzzedDataProvider;
import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.ide.Completion;
import dev.plumb.ide.Fixes;
import dev.plumb.ide.Folding;
import dev.plumb.ide.HoverText;
import dev.plumb.ide.InlayValues;
import dev.plumb.ide.Navigation;
import dev.plumb.ide.Occurrences;
import dev.plumb.ide.Outline;
import dev.plumb.ide.SemanticSpans;
import dev.plumb.ide.Signatures;
import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * Coverage-guided fuzzing of the engine and the editor features (Jazzer). {@code mvn test}
 * replays the inputs stored under {@code src/test/resources/dev/plumb/EngineFuzzTestInputs/}
 * (seeds of our own, and any input a fuzzing run found to fail, kept once fixed);
 * {@code JAZZER_FUZZ=1 mvn -pl server test -Dtest=EngineFuzzTest#METHOD} searches for new ones
 * (DEVELOPERS.md, "Fuzzing").
 */
class EngineFuzzTest {
    private static final Path FILE = Path.of("/plumb-fuzz/fuzz.plumb");

    /** Any text is analysed: diagnostics inside the text, never an exception. */
    @FuzzTest(maxDuration = "2m")
    void anyTextIsAnalysed(byte[] bytes) {
        String text = new String(bytes, StandardCharsets.UTF_8);
        Analysis a = analyze(text);
        for (Diagnostic d : a.diagnostics()) {
            assertTrue(0 <= d.span().start() && d.span().end() <= text.length(), d.toString());
            assertTrue(!d.message().isBlank(), d.toString());
        }
    }

    /** Every editor feature answers at any place of any text. */
    @FuzzTest(maxDuration = "2m")
    void everyEditorFeatureAnswersAnywhere(byte[] bytes) {
        String text = new String(bytes, StandardCharsets.UTF_8);
        Analysis a = analyze(text);
        int offset = text.isEmpty() ? 0 : Math.floorMod(text.hashCode(), text.length() + 1);
        HoverText.at(a, offset);
        Completion.at(a, offset);
        Signatures.at(a, offset);
        Navigation.definitionAt(a, offset);
        String name = Occurrences.nameAt(a, offset);
        if (name != null) {
            Occurrences.of(a, name);
            Occurrences.rename(a, offset, name + "_2");
        }
        assertNotNull(Fixes.at(a, new Span(0, text.length())));
        assertNotNull(Outline.of(a));
        assertNotNull(Folding.of(a));
        assertNotNull(SemanticSpans.of(a));
        assertNotNull(InlayValues.of(a));
    }

    /** After any edit of any text, reparsing from the earlier parse equals a fresh parse. */
    @FuzzTest(maxDuration = "2m")
    void anyEditReparsesAsAFreshParse(FuzzedDataProvider data) {
        String text = data.consumeString(4000);
        int at = data.consumeInt(0, text.length());
        int removed = data.consumeInt(0, text.length() - at);
        String edited = text.substring(0, at) + data.consumeRemainingAsString() + text.substring(at + removed);
        ParsedSource fresh = SourceParser.parse(edited);
        ParsedSource reparsed = SourceParser.reparse(SourceParser.parse(text), edited);
        String what = "after editing " + escaped(text) + " into " + escaped(edited);
        assertEquals(fresh.statements(), reparsed.statements(), what);
        assertEquals(fresh.diagnostics(), reparsed.diagnostics(), what);
        assertEquals(fresh.chunks(), reparsed.chunks(), what);
    }

    private static String escaped(String s) {
        StringBuilder b = new StringBuilder("\"");
        s.codePoints().forEach(c -> b.append(c >= 0x20 && c < 0x7f ? Character.toString(c) : String.format("\\u{%x}", c)));
        return b.append('"').toString();
    }

    private static Analysis analyze(String text) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, text);
    }
}
