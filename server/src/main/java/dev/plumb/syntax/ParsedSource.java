package dev.plumb.syntax;

import dev.plumb.diagnostics.Diagnostic;
import java.util.List;

/**
 * The result of parsing one document: never fails, always a tree plus the syntax errors.
 *
 * @param chunks the document cut where its reading starts afresh, in order, covering the text;
 *     {@link SourceParser#reparse} reuses the chunks an edit did not touch
 */
public record ParsedSource(String text, LineMap lines, List<Statement> statements, List<Diagnostic> diagnostics,
                           List<Chunk> chunks) {
    public ParsedSource {
        statements = List.copyOf(statements);
        diagnostics = List.copyOf(diagnostics);
        chunks = List.copyOf(chunks);
    }

    /**
     * The text with nothing read from it: for results made without reading the text. Its one chunk
     * ends at the end of the text, so a reparse never reuses it and reads everything.
     */
    public static ParsedSource unread(String text) {
        return new ParsedSource(text, new LineMap(text), List.of(), List.of(), List.of(new Chunk(0, text.length(), 0, 0, 0, 0)));
    }

    /**
     * Text [start, end) whose statements and syntax diagnostics are {@code statements()} and
     * {@code diagnostics()} from the first index (inclusive) to the last (exclusive).
     */
    public record Chunk(int start, int end, int firstStatement, int endStatement, int firstDiagnostic,
                        int endDiagnostic) {
    }
}
