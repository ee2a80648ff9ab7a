package dev.plumb.syntax;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import java.util.ArrayList;
import java.util.List;
import org.antlr.v4.runtime.BaseErrorListener;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Recognizer;
import org.antlr.v4.runtime.Token;

/** Collects syntax errors with their ranges instead of printing them. */
final class SyntaxErrors extends BaseErrorListener {
    private final LineMap lines;
    private final List<Diagnostic> diagnostics = new ArrayList<>();
    /** Code-point index of each error, to tell which statements are broken. */
    private final List<Integer> positions = new ArrayList<>();

    SyntaxErrors(LineMap lines) {
        this.lines = lines;
    }

    /** A repair for the next error: text to insert before its token (null: none). */
    private String pendingTitle;
    private String pendingInsert;

    void insertBeforeNext(String title, String text) {
        pendingTitle = title;
        pendingInsert = text;
    }

    @Override
    public void syntaxError(Recognizer<?, ?> recognizer, Object offendingSymbol, int line, int column,
                            String message, RecognitionException e) {
        Token t = (Token) offendingSymbol;
        int startCp = t.getStartIndex();
        int start = lines.fromCodePoint(startCp);
        boolean visible = t.getType() != Token.EOF && t.getType() != dev.plumb.grammar.PlumbLexer.NEWLINE;
        int end = visible ? lines.fromCodePoint(t.getStopIndex() + 1) : start;
        Diagnostic d = Diagnostic.of(Code.SYNTAX_ERROR, new Span(start, end), message);
        if (pendingInsert != null) d = d.withFix(new dev.plumb.diagnostics.Fix(pendingTitle, new Span(start, start), pendingInsert, true));
        pendingTitle = null;
        pendingInsert = null;
        diagnostics.add(d);
        positions.add(startCp);
    }

    /** An error found while building the tree, at code-point index {@code cp}. */
    void add(Diagnostic d, int cp) {
        diagnostics.add(d);
        positions.add(cp);
    }

    List<Diagnostic> diagnostics() {
        return diagnostics;
    }

    boolean anyWithin(int fromCp, int toCp) {
        for (int p : positions) {
            if (p >= fromCp && p <= toCp) return true;
        }
        return false;
    }
}
