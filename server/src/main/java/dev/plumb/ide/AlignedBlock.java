package dev.plumb.ide;

import java.util.List;

/**
 * Lays out a block of consecutive one-line definitions as columns: the {@code =} signs line up
 * with one space after them, the clauses ({@code in UNIT}, else {@code as BASIS}) start in one
 * column, an {@code as} that follows an {@code in} lines up with the others that do, and the notes
 * start in one column. Inside {@code input NAME}, {@code in UNIT} and {@code as BASIS} one space
 * separates the words. Columns are counted in code points from the start of the statement (every
 * line of a block has the same indentation), and stand at least {@value #CLAUSE_GAP} spaces after
 * what comes before them.
 */
final class AlignedBlock {
    static final int CLAUSE_GAP = 2;

    private final String text;
    private final List<DefinitionLine> lines;
    private final int equalsColumn;
    private final int clauseColumn;
    private final int asAfterInColumn;
    private final int noteColumn;

    AlignedBlock(String text, List<DefinitionLine> lines) {
        this.text = text;
        this.lines = lines;
        int longestHead = 0;
        for (DefinitionLine l : lines) longestHead = Math.max(longestHead, headWidth(l));
        equalsColumn = longestHead + 1;
        int clause = 0;
        int longestIn = 0;
        for (DefinitionLine l : lines) {
            if (l.hasIn() || l.hasAs()) clause = Math.max(clause, exprEndColumn(l) + CLAUSE_GAP);
            if (l.hasIn() && l.hasAs()) longestIn = Math.max(longestIn, inWidth(l));
        }
        clauseColumn = clause;
        asAfterInColumn = clauseColumn + longestIn + 1;
        int note = 0;
        for (DefinitionLine l : lines) {
            if (l.hasNote()) note = Math.max(note, tailEndColumn(l) + CLAUSE_GAP);
        }
        noteColumn = note;
    }

    /** Edits that replace each gap between the parts of each line by the blanks the layout asks for. */
    void edits(List<Edit> out) {
        for (DefinitionLine l : lines) {
            if (l.isInput()) gap(out, l.start() + "input".length(), l.nameStart(), 1);
            gap(out, l.nameEnd(), l.equals(), equalsColumn - headWidth(l));
            gap(out, l.equals() + 1, l.exprStart(), 1);
            int column = exprEndColumn(l);
            int end = l.exprEnd();
            if (l.hasIn()) {
                gap(out, end, l.inStart(), clauseColumn - column);
                gap(out, l.inStart() + "in".length(), l.unitStart(), 1);
                column = clauseColumn + inWidth(l);
                end = l.inEnd();
            }
            if (l.hasAs()) {
                int at = l.hasIn() ? asAfterInColumn : clauseColumn;
                gap(out, end, l.asStart(), at - column);
                gap(out, l.asStart() + "as".length(), l.basisStart(), 1);
                column = at + asWidth(l);
                end = l.asEnd();
            }
            if (l.hasNote()) gap(out, end, l.noteStart(), noteColumn - column);
        }
    }

    /** {@code NAME} or {@code input NAME}. */
    private int headWidth(DefinitionLine l) {
        return (l.isInput() ? "input ".length() : 0) + width(l.nameStart(), l.nameEnd());
    }

    /** {@code in UNIT}. */
    private int inWidth(DefinitionLine l) {
        return "in ".length() + width(l.unitStart(), l.inEnd());
    }

    /** {@code as BASIS}. */
    private int asWidth(DefinitionLine l) {
        return "as ".length() + width(l.basisStart(), l.asEnd());
    }

    private int exprEndColumn(DefinitionLine l) {
        return equalsColumn + "= ".length() + width(l.exprStart(), l.exprEnd());
    }

    private int tailEndColumn(DefinitionLine l) {
        if (l.hasAs()) return (l.hasIn() ? asAfterInColumn : clauseColumn) + asWidth(l);
        if (l.hasIn()) return clauseColumn + inWidth(l);
        return exprEndColumn(l);
    }

    private void gap(List<Edit> out, int from, int to, int spaces) {
        String wanted = " ".repeat(spaces);
        boolean asWanted = to - from == spaces && text.regionMatches(from, wanted, 0, spaces);
        if (!asWanted) out.add(new Edit(from, to - from, wanted));
    }

    private int width(int from, int to) {
        return text.codePointCount(from, to);
    }
}
