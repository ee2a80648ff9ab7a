package dev.plumb.ide;

import dev.plumb.syntax.LineMap;
import dev.plumb.syntax.Statement;

/**
 * Where the parts of a one-line definition ({@code [input] NAME = EXPR [in UNIT] [as BASIS] ["note"]})
 * stand in the text, found from the AST spans and the text between them. Offsets are UTF-16;
 * a missing clause has all its offsets -1. The formatter changes only the blanks between parts.
 *
 * @param line       0-based line
 * @param indent     the blanks before the statement, without a byte-order mark
 * @param start      where the statement starts ({@code input} or the name)
 * @param nameStart  the name (after {@code input} and its blanks, when given)
 * @param nameEnd    just past the name
 * @param equals     the {@code =}
 * @param exprStart  the first character of the expression
 * @param exprEnd    just past the expression, closing parentheses included
 * @param inStart    the word {@code in}; {@code unitStart} and {@code inEnd} bound its unit
 * @param asStart    the word {@code as}; {@code basisStart} and {@code asEnd} bound its basis
 * @param noteStart  the note's opening quote; {@code noteEnd} is just past its closing one
 */
record DefinitionLine(int line, String indent, int start, int nameStart, int nameEnd, int equals, int exprStart,
                      int exprEnd, int inStart, int unitStart, int inEnd, int asStart, int basisStart, int asEnd,
                      int noteStart, int noteEnd) {

    boolean isInput() {
        return nameStart > start;
    }

    boolean hasIn() {
        return inStart >= 0;
    }

    boolean hasAs() {
        return asStart >= 0;
    }

    boolean hasNote() {
        return noteStart >= 0;
    }

    /**
     * Reads a definition that stands alone on its line (nothing after it but blanks or a code
     * comment); null when it does not, or when the text is not shaped as expected.
     */
    static DefinitionLine read(String text, LineMap lines, Statement.Definition d) {
        int start = d.span().start();
        int end = d.span().end();
        int line = lines.lineIndex(start);
        if (lines.lineIndex(end) != line) return null;
        int lineStart = lines.lineStart(line);
        int lineEnd = lineStart + lines.lineText(line).length();
        String indent = text.substring(lineStart, start).replace("\uFEFF", "");
        if (!isBlanks(indent, 0, indent.length()) || !restIsCommentOrBlank(text, end, lineEnd)) return null;

        int nameEnd = d.name().span().end();
        int equals = skipBlanks(text, nameEnd, end);
        if (equals >= end || text.charAt(equals) != '=') return null;
        int exprStart = skipBlanks(text, equals + 1, end);

        int inStart = -1;
        int unitStart = -1;
        int inEnd = -1;
        if (d.displayUnit() != null) {
            unitStart = d.displayUnit().span().start();
            inStart = keywordBefore(text, unitStart, "in", exprStart);
            inEnd = d.displayUnit().span().end();
            if (inStart < 0) return null;
        }
        int asStart = -1;
        int basisStart = -1;
        int asEnd = -1;
        if (d.basis() != null) {
            basisStart = d.basis().span().start();
            asStart = keywordBefore(text, basisStart, "as", Math.max(exprStart, inEnd));
            asEnd = d.basis().span().end();
            if (asStart < 0) return null;
        }
        int noteStart = -1;
        int noteEnd = -1;
        if (d.note() != null) {
            // An expression and its clauses hold no quote, so the first one after them opens the note.
            noteStart = text.indexOf('"', Math.max(exprStart, Math.max(inEnd, asEnd)));
            noteEnd = end;
            if (noteStart < 0 || noteStart >= end - 1 || text.charAt(end - 1) != '"') return null;
        }
        int firstClause = inStart >= 0 ? inStart : asStart >= 0 ? asStart : noteStart >= 0 ? noteStart : end;
        int exprEnd = firstClause == end ? end : skipBlanksBack(text, firstClause, exprStart);
        if (exprEnd <= exprStart) return null;
        int nameStart = d.name().span().start();
        int headGap = start + "input".length();
        boolean inputHead = text.startsWith("input", start) && nameStart > headGap && isBlanks(text, headGap, nameStart);
        if (d.input() ? !inputHead : nameStart != start) return null;
        return new DefinitionLine(line, indent, start, nameStart, nameEnd, equals, exprStart, exprEnd, inStart,
            unitStart, inEnd, asStart, basisStart, asEnd, noteStart, noteEnd);
    }

    /** The start of {@code word} standing before {@code at} with at least one blank between; -1 when absent. */
    private static int keywordBefore(String text, int at, String word, int notBefore) {
        int wordEnd = skipBlanksBack(text, at, notBefore);
        int wordStart = wordEnd - word.length();
        boolean found = wordEnd < at && wordStart >= notBefore && text.startsWith(word, wordStart);
        return found ? wordStart : -1;
    }

    private static boolean restIsCommentOrBlank(String text, int from, int lineEnd) {
        int i = skipBlanks(text, from, lineEnd);
        return i == lineEnd || text.charAt(i) == '#';
    }

    private static boolean isBlank(char c) {
        return c == ' ' || c == '\t';
    }

    private static boolean isBlanks(String s, int from, int to) {
        for (int i = from; i < to; i++) {
            if (!isBlank(s.charAt(i))) return false;
        }
        return true;
    }

    private static int skipBlanks(String text, int i, int limit) {
        while (i < limit && isBlank(text.charAt(i))) i++;
        return i;
    }

    private static int skipBlanksBack(String text, int i, int limit) {
        while (i > limit && isBlank(text.charAt(i - 1))) i--;
        return i;
    }
}
