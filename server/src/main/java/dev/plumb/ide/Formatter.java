package dev.plumb.ide;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.syntax.LineMap;
import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Lines up blocks of definitions. A block is a run of one-line definitions ({@code NAME = …},
 * {@code input NAME = …}) on consecutive lines with the same indentation; anything else on a
 * line between them, a blank line or a change of indentation ends it. Within a block the
 * {@code =} signs, the {@code in}/{@code as} clauses and the notes stand in columns (see
 * {@link AlignedBlock}).
 *
 * <p>Only blanks between the parts of such a definition change. Everything else is left as
 * written: narrative, code comments and the blanks before them, quoted text, statements that
 * continue onto further lines, correlation and table blocks, every line that holds or belongs
 * to a syntax error, indentation and line breaks. So formatting never changes what a document
 * means, and formatting twice changes nothing more.
 */
public final class Formatter {
    /** {@code correlation NAME(} or {@code table NAME(}, as the parser opens a block. */
    private static final Pattern BLOCK_HEAD =
        Pattern.compile("[\uFEFF \t]*(correlation|table)[ \t]+[\\p{L}_][\\p{L}\\p{Nd}_]*[ \t]*\\(.*");
    /** {@code end} alone on its line, perhaps with a code comment. */
    private static final Pattern BLOCK_END = Pattern.compile("[ \t]*end[ \t]*(#.*)?");

    private Formatter() {
    }

    /** The edits that format the text, in ascending order of offset and not overlapping. */
    public static List<Edit> format(String text) {
        return format(SourceParser.parse(text));
    }

    /** The edits that format a parsed text, for a caller that has parsed it already. */
    public static List<Edit> format(ParsedSource parsed) {
        String text = parsed.text();
        LineMap lines = parsed.lines();
        boolean[] untouchable = untouchableLines(parsed);
        List<Edit> edits = new ArrayList<>();
        List<DefinitionLine> block = new ArrayList<>();
        for (Statement s : parsed.statements()) {
            DefinitionLine line = s instanceof Statement.Definition d ? DefinitionLine.read(text, lines, d) : null;
            if (line != null && untouchable[line.line()]) line = null;
            if (!block.isEmpty() && (line == null || !continuesBlock(block.get(block.size() - 1), line))) {
                new AlignedBlock(text, block).edits(edits);
                block.clear();
            }
            if (line != null) block.add(line);
        }
        if (!block.isEmpty()) new AlignedBlock(text, block).edits(edits);
        // Formatting moves blanks and nothing else: a gap holding anything more (a byte-order
        // mark inside a line, say) is left as written, whatever the rules above decided.
        edits.removeIf(e -> !onlyBlanks(text.substring(e.offset(), e.end())) || !onlyBlanks(e.replacement()));
        edits.sort(Comparator.comparingInt(Edit::offset));
        return edits;
    }

    private static boolean onlyBlanks(String s) {
        return s.chars().allMatch(c -> c == ' ' || c == '\t');
    }

    /** The text with the edits made; the edits must not overlap. */
    public static String apply(String text, List<Edit> edits) {
        List<Edit> sorted = new ArrayList<>(edits);
        sorted.sort(Comparator.comparingInt(Edit::offset));
        StringBuilder out = new StringBuilder(text.length());
        int at = 0;
        for (Edit e : sorted) {
            if (e.offset() < at) throw new IllegalArgumentException("overlapping edits at offset " + e.offset());
            out.append(text, at, e.offset()).append(e.replacement());
            at = e.end();
        }
        return out.append(text, at, text.length()).toString();
    }

    private static boolean continuesBlock(DefinitionLine previous, DefinitionLine next) {
        return next.line() == previous.line() + 1 && next.indent().equals(previous.indent());
    }

    /**
     * Lines the formatter must not touch: those of a broken statement or a syntax error, and
     * those of a correlation or table block as written, from its head to its {@code end} (also
     * when a line inside it reads as a definition and so ends the block for the parser).
     */
    private static boolean[] untouchableLines(ParsedSource parsed) {
        LineMap lines = parsed.lines();
        boolean[] marked = new boolean[lines.lineCount()];
        for (Statement s : parsed.statements()) {
            boolean keepAsWritten = s instanceof Statement.Correlation || s instanceof Statement.Table
                || s instanceof Statement.Broken;
            if (keepAsWritten) mark(marked, lines.lineIndex(s.span().start()), lines.lineIndex(s.span().end()));
        }
        for (Diagnostic d : parsed.diagnostics()) {
            mark(marked, lines.lineIndex(d.span().start()), lines.lineIndex(d.span().end()));
        }
        for (int i = 0; i < lines.lineCount(); i++) {
            if (BLOCK_HEAD.matcher(lines.lineText(i)).matches()) mark(marked, i, blockEnd(lines, i));
        }
        return marked;
    }

    /** The line of the {@code end} that closes the block whose head is on a line; that line when none does. */
    private static int blockEnd(LineMap lines, int head) {
        for (int i = head + 1; i < lines.lineCount(); i++) {
            String line = lines.lineText(i);
            if (BLOCK_END.matcher(line).matches()) return i;
            if (BLOCK_HEAD.matcher(line).matches()) break;
        }
        return head;
    }

    private static void mark(boolean[] marked, int first, int last) {
        for (int i = first; i <= last; i++) marked[i] = true;
    }
}
