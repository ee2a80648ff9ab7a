package dev.plumb.lsp;

import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;

/**
 * Converts between the engine's offsets (UTF-16 units into the document string) and protocol
 * positions, whose character counts are UTF-16 units by default, or UTF-8 bytes or code points
 * when that was negotiated.
 */
final class Positions {
    enum Encoding {
        UTF16("utf-16"), UTF8("utf-8"), UTF32("utf-32");

        final String id;

        Encoding(String id) {
            this.id = id;
        }
    }

    private Positions() {
    }

    static Position position(String text, int offset, Encoding enc) {
        offset = Math.max(0, Math.min(offset, text.length()));
        int[] starts = lineStarts(text);
        int line = java.util.Arrays.binarySearch(starts, offset);
        if (line < 0) line = -line - 2;
        return new Position(line, units(text, starts[line], offset, enc));
    }

    /**
     * Line starts of the texts converted most recently: a document's positions are asked for many
     * times. Found by identity, not by content: an editor that retypes a character back and forth
     * makes texts that are equal without being the same object, and comparing two long texts
     * character by character on every lookup cost more than the lookups saved.
     */
    private static final int KEPT = 8;
    private static final String[] KEPT_TEXTS = new String[KEPT];
    private static final int[][] KEPT_STARTS = new int[KEPT][];
    private static int next;

    private static int[] lineStarts(String text) {
        synchronized (KEPT_TEXTS) {
            for (int i = 0; i < KEPT; i++) {
                if (KEPT_TEXTS[i] == text) return KEPT_STARTS[i];
            }
        }
        int[] starts = new int[16];
        int n = 1;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'))) {
                if (n == starts.length) starts = java.util.Arrays.copyOf(starts, n * 2);
                starts[n++] = i + 1;
            }
        }
        int[] exact = java.util.Arrays.copyOf(starts, n);
        synchronized (KEPT_TEXTS) {
            KEPT_TEXTS[next] = text;
            KEPT_STARTS[next] = exact;
            next = (next + 1) % KEPT;
        }
        return exact;
    }

    static Range range(String text, int start, int end, Encoding enc) {
        return new Range(position(text, start, enc), position(text, end, enc));
    }

    /** The offset of a position; positions past a line's end clamp to it, past the end to the end. */
    static int offset(String text, Position p, Encoding enc) {
        int line = 0;
        int i = 0;
        while (line < p.getLine() && i < text.length()) {
            char c = text.charAt(i++);
            if (c == '\n' || (c == '\r' && (i >= text.length() || text.charAt(i) != '\n'))) line++;
        }
        if (line < p.getLine()) return text.length();
        int remaining = p.getCharacter();
        while (i < text.length() && remaining > 0) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') break;
            int cp = text.codePointAt(i);
            int width = width(cp, enc);
            if (width > remaining) break;
            remaining -= width;
            i += Character.charCount(cp);
        }
        return i;
    }

    private static int units(String text, int from, int to, Encoding enc) {
        if (enc == Encoding.UTF16) return to - from;
        int n = 0;
        for (int i = from; i < to; ) {
            int cp = text.codePointAt(i);
            n += width(cp, enc);
            i += Character.charCount(cp);
        }
        return n;
    }

    private static int width(int cp, Encoding enc) {
        return switch (enc) {
            case UTF16 -> Character.charCount(cp);
            case UTF32 -> 1;
            case UTF8 -> cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
        };
    }

    /** A mutable holder of the negotiated encoding, shared by the services. */
    static final class Enc {
        volatile Encoding value = Encoding.UTF16;
    }
}
