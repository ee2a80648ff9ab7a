package dev.plumb.syntax;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.plumb.bench.GeneratedCalc;
import dev.plumb.ide.RandomCalc;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * {@link SourceParser#reparse} must give exactly what a fresh {@link SourceParser#parse} gives —
 * statements, spans, syntax errors and chunk cuts — after any edit, however it cuts the text.
 */
class ReparseTest {
    /** Inserted text: fragments that change line structure (breaks, indents, block heads, ends). */
    private static final List<String> INSERTS = List.of("\n", "\n", "\r\n", "\r", "  ", "    ", "\t", "x", "= 2 m",
        " * ", "(", ")", "#", "# note\n", "\"", "correlation f(Re)\n", "    = 24 / Re\n", "end\n", "end",
        "table t(x)\n", "  x   y\n  1   2\n", "input ", "check ", "ρ", "😀", "°C", "\n  ", "\nsection \"S\"\n", "use \"a.plumb\"\n",
        "seek V in 1 m/s .. 2 m/s where V = 1.5 m/s\n", "title \"T\"\n", "\n\n", "  valid 0 < Re < 10\n");

    @Test
    void reparseAfterRandomEditsEqualsAFreshParse() {
        Random random = new Random(20261202L);
        int edits = 0;
        for (int doc = 0; doc < 300; doc++) {
            String text = new RandomCalc(doc).document();
            ParsedSource parsed = SourceParser.parse(text);
            for (int step = 0; step < 25; step++) {
                text = edit(text, random);
                ParsedSource reparsed = SourceParser.reparse(parsed, text);
                ParsedSource fresh = SourceParser.parse(text);
                String where = "document " + doc + ", edit " + step + ":\n" + text;
                assertEquals(fresh.statements(), reparsed.statements(), where);
                assertEquals(fresh.diagnostics(), reparsed.diagnostics(), where);
                assertEquals(fresh.chunks(), reparsed.chunks(), where);
                parsed = reparsed;
                edits++;
            }
        }
        assertEquals(300 * 25, edits);
    }

    @Test
    void aKeystrokeReadsOnlyItsOwnLine() {
        String text = GeneratedCalc.of(1_000);
        ParsedSource before = SourceParser.parse(text);
        int at = text.indexOf("= 22 m/s");
        String edited = text.substring(0, at + 2) + "23" + text.substring(at + 4);
        ParsedSource after = SourceParser.reparse(before, edited);
        int changed = 0;
        for (int i = 0; i < before.statements().size(); i++) {
            Statement s = after.statements().get(i);
            if (s.span().end() < at) {
                assertSame(before.statements().get(i), s, "statements before the edit are the earlier ones");
            } else if (!s.equals(before.statements().get(i))) {
                changed++;
                assertNotSame(before.statements().get(i), s);
            }
        }
        assertEquals(1, changed, "only the edited definition reads differently");
        assertEquals(SourceParser.parse(edited).statements(), after.statements());
    }

    @Test
    void anUnclosedBlockTypedMidDocumentSwallowsWhatFollowsAsAFreshParseDoes() {
        String text = "a = 1\nb = 2\nc = 3\n";
        ParsedSource parsed = SourceParser.parse(text);
        String edited = "a = 1\ncorrelation f(Re)\n  = 1\nb = 2\nc = 3\n";
        assertEquals(SourceParser.parse(edited).statements(), SourceParser.reparse(parsed, edited).statements());
        assertEquals(SourceParser.parse(edited).diagnostics(), SourceParser.reparse(parsed, edited).diagnostics());
    }

    @Test
    void aLineEmptiedAfterAnInvisibleFirstCharacterCutsAsAFreshParse() {
        // Found by the fuzzer (EngineFuzzTestInputs/anyEditReparsesAsAFreshParse/chunk-cut-after-edit):
        // a byte-order mark or a character no token takes was the line's only text after the edit.
        for (String first : List.of("\uFEFF", "\u0000", "!")) {
            String text = "x = 1\n" + first + "ab\ny = 2\n";
            String edited = "x = 1\n" + first + "\ny = 2\n";
            ParsedSource reparsed = SourceParser.reparse(SourceParser.parse(text), edited);
            assertEquals(SourceParser.parse(edited).chunks(), reparsed.chunks(), first);
            assertEquals(SourceParser.parse(edited).statements(), reparsed.statements(), first);
        }
    }

    @Test
    void aLineOfByteOrderMarksAndBlanksInsideTheDocumentReadsAsInAFreshParse() {
        // Found by the fuzzer (EngineFuzzTestInputs/anyEditReparsesAsAFreshParse/byte-order-marks-then-blanks-
        // mid-document): blanks after byte-order marks indent only the document's first line.
        String text = "x = 1\n\uFEFF\uFEFFy = 2\n  + 3\n z = 4\n";
        String edited = "x = 1\n\uFEFF\uFEFF  y2 = 2\n  + 3\n z = 4\n";
        ParsedSource reparsed = SourceParser.reparse(SourceParser.parse(text), edited);
        assertEquals(SourceParser.parse(edited).statements(), reparsed.statements());
        assertEquals(SourceParser.parse(edited).diagnostics(), reparsed.diagnostics());
    }

    /** Replaces a random stretch (up to a few lines) with a random fragment, never inside a surrogate pair. */
    private static String edit(String text, Random random) {
        int start = boundary(text, random.nextInt(text.length() + 1));
        int end = boundary(text, Math.min(text.length(), start + (random.nextInt(4) == 0 ? random.nextInt(60) : random.nextInt(4))));
        String insert = random.nextInt(4) == 0 ? "" : INSERTS.get(random.nextInt(INSERTS.size()));
        return text.substring(0, start) + insert + text.substring(Math.max(start, end));
    }

    private static int boundary(String text, int i) {
        if (i > 0 && i < text.length() && Character.isLowSurrogate(text.charAt(i))) i--;
        return i;
    }
}
