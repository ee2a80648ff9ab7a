package dev.plumb.syntax;

import java.util.Arrays;

/**
 * Maps between the offsets the engine uses (UTF-16 units, as Java strings and LSP count) and
 * lines and columns (1-based, counted in characters = code points, as people count them).
 * Also maps ANTLR's code-point indices to UTF-16 offsets.
 */
public final class LineMap {
    private final String text;
    private final int[] lineStarts;
    /** utf16Of[i] = UTF-16 offset of code point i; null when the text has no surrogate pairs. */
    private final int[] utf16Of;

    public LineMap(String text) {
        this.text = text;
        int[] starts = new int[16];
        int count = 1;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean lineBreak = c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'));
            if (lineBreak) {
                if (count == starts.length) starts = Arrays.copyOf(starts, count * 2);
                starts[count++] = i + 1;
            }
        }
        this.lineStarts = Arrays.copyOf(starts, count);
        this.utf16Of = hasSurrogates(text) ? codePointOffsets(text) : null;
    }

    private static boolean hasSurrogates(String text) {
        // Constant time for the common all-Latin-1 text: String knows it has no surrogates.
        return text.codePointCount(0, text.length()) != text.length();
    }

    private static int[] codePointOffsets(String text) {
        int[] map = new int[text.codePointCount(0, text.length()) + 1];
        int cp = 0;
        for (int i = 0; i < text.length(); i = text.offsetByCodePoints(i, 1)) {
            map[cp++] = i;
        }
        map[cp] = text.length();
        return map;
    }

    /** UTF-16 offset of an ANTLR code-point index. */
    public int fromCodePoint(int codePointIndex) {
        if (utf16Of == null) return Math.min(codePointIndex, text.length());
        return utf16Of[Math.max(0, Math.min(codePointIndex, utf16Of.length - 1))];
    }

    /** The length of the text in UTF-16 units. */
    public int length() {
        return text.length();
    }

    public int lineCount() {
        return lineStarts.length;
    }

    /** 0-based line of an offset. */
    public int lineIndex(int offset) {
        int i = Arrays.binarySearch(lineStarts, offset);
        return i >= 0 ? i : -i - 2;
    }

    public int lineStart(int lineIndex) {
        return lineStarts[lineIndex];
    }

    /** 1-based line number. */
    public int line(int offset) {
        return lineIndex(offset) + 1;
    }

    /** 1-based column in characters (code points). */
    public int column(int offset) {
        int start = lineStarts[lineIndex(offset)];
        // A byte-order mark is an encoding marker, not a character anyone sees.
        if (start == 0 && text.startsWith("\uFEFF") && offset > 0) start = 1;
        int end = Math.min(offset, text.length());
        return text.codePointCount(start, end) + 1;
    }

    /** 0-based column in UTF-16 units, as the language server protocol counts by default. */
    public int utf16Column(int offset) {
        return offset - lineStarts[lineIndex(offset)];
    }

    /** The text of a 0-based line without its line break. */
    public String lineText(int lineIndex) {
        int start = lineStarts[lineIndex];
        int end = lineIndex + 1 < lineStarts.length ? lineStarts[lineIndex + 1] : text.length();
        while (end > start && (text.charAt(end - 1) == '\n' || text.charAt(end - 1) == '\r')) end--;
        return text.substring(start, end);
    }
}
