package dev.plumb.lsp;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextEdit;

/** Applies a server's text edits to a document the way an editor does, so tests compare the text they make. */
final class AppliedEdits {
    private AppliedEdits() {
    }

    static String apply(String text, List<? extends TextEdit> edits) {
        List<TextEdit> sorted = new ArrayList<>(edits);
        // From the end backwards, so earlier offsets stay valid; the protocol forbids overlapping edits.
        sorted.sort(Comparator.comparingInt((TextEdit e) -> offset(text, e.getRange().getStart())).reversed());
        StringBuilder out = new StringBuilder(text);
        for (TextEdit e : sorted) {
            out.replace(offset(text, e.getRange().getStart()), offset(text, e.getRange().getEnd()), e.getNewText());
        }
        return out.toString();
    }

    /** A UTF-16 offset from a line and a UTF-16 character (the protocol's default position encoding). */
    static int offset(String text, Position p) {
        int at = 0;
        for (int line = 0; line < p.getLine(); line++) {
            int next = text.indexOf('\n', at);
            if (next < 0) throw new AssertionError("no line " + p.getLine() + " in the document");
            at = next + 1;
        }
        return at + p.getCharacter();
    }
}
