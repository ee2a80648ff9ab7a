package dev.plumb.syntax;

import dev.plumb.diagnostics.Diagnostic;
import java.util.List;

/** The result of parsing one document: never fails, always a tree plus the syntax errors. */
public record ParsedSource(String text, LineMap lines, List<Statement> statements, List<Diagnostic> diagnostics) {
    public ParsedSource {
        statements = List.copyOf(statements);
        diagnostics = List.copyOf(diagnostics);
    }
}
