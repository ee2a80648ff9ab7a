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

    /**
     * A document in a hostile workspace (links to a folder outside, to `/`, to /dev/zero, to a
     * FIFO, a `.plumb` link to a `.env`): whatever it `use`s, nothing outside the workspace and
     * nothing of a refused file shows in any finding, hover or completion, and the run ends.
     */
    @FuzzTest(maxDuration = "2m")
    void useInAHostileWorkspaceShowsNothingOutside(byte[] bytes) {
        HostileWorkspace ws = HostileWorkspace.get();
        String fuzzed = new String(bytes, StandardCharsets.UTF_8);
        StringBuilder text = new StringBuilder();
        for (String path : HostileWorkspace.PATHS) {
            if (Math.floorMod(fuzzed.hashCode() ^ path.hashCode(), 3) != 0) text.append("use \"").append(path).append("\"\n");
        }
        text.append(fuzzed).append("\nz = ").append(HostileWorkspace.SECRET).append("\n");
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(ws.root().resolve("main.plumb"),
            text.toString());
        StringBuilder shown = new StringBuilder();
        for (Diagnostic d : a.diagnostics()) shown.append(d.message()).append('\n');
        for (int at = 0; at <= a.text().length(); at += Math.max(1, a.text().length() / 16)) {
            String hover = HoverText.at(a, at);
            if (hover != null) shown.append(hover).append('\n');
        }
        Completion.at(a, a.text().length()).forEach(c -> shown.append(c.label()).append(' ').append(c.detail()).append('\n'));
        String all = shown.toString();
        for (String secret : HostileWorkspace.CONTENTS) {
            // The document's own words may be quoted back to it; only what it does not hold is a leak.
            if (a.text().contains(secret)) continue;
            assertTrue(!all.contains(secret), "shows '" + secret + "' from outside or from a refused file:\n" + all);
        }
    }

    /** Quick fixes and formatting edit only inside the text, never overlapping; formatting changes only blanks. */
    @FuzzTest(maxDuration = "2m")
    void editsStayInsideTheTextAndFormattingChangesOnlyBlanks(byte[] bytes) {
        String text = new String(bytes, StandardCharsets.UTF_8);
        Analysis a = analyze(text);
        for (Fixes.Action action : Fixes.at(a, new Span(0, text.length()))) {
            int end = -1;
            for (dev.plumb.ide.Edit e : action.edits().stream()
                .sorted(java.util.Comparator.comparingInt(dev.plumb.ide.Edit::offset)).toList()) {
                assertTrue(e.offset() >= 0 && e.end() <= text.length() && e.offset() >= end, action.title() + ": " + e);
                end = e.end();
            }
        }
        for (dev.plumb.ide.Edit e : dev.plumb.ide.Formatter.format(text)) {
            assertTrue(e.offset() >= 0 && e.end() <= text.length(), e.toString());
            assertTrue(text.substring(e.offset(), e.end()).isBlank() && e.replacement().isBlank(),
                "formatting changes only blanks: " + e);
        }
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
