package dev.plumb.syntax;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.grammar.PlumbLexer;
import dev.plumb.grammar.PlumbParser;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.ListTokenSource;
import org.antlr.v4.runtime.Token;

/** Entry point of the syntax layer: text in, AST plus syntax diagnostics out. Never throws. */
public final class SourceParser {
    private SourceParser() {
    }

    public static ParsedSource parse(String text) {
        LineMap lines = new LineMap(text);
        PlumbLexer lexer = new PlumbLexer(CharStreams.fromString(text));
        lexer.removeErrorListeners();
        List<? extends Token> raw = lexer.getAllTokens();
        List<Token> all = new ArrayList<>(raw);
        all.add(lexer.nextToken()); // getAllTokens() leaves out EOF; asking again returns it

        StatementTokens arranged = new StatementTokens(lines);
        List<Token> tokens = arranged.arrange(all);

        SyntaxErrors errors = new SyntaxErrors(lines);
        PlumbParser parser = new PlumbParser(new CommonTokenStream(new ListTokenSource(tokens)));
        parser.removeErrorListeners();
        parser.addErrorListener(errors);
        parser.setErrorHandler(new LineRecovery());

        List<Statement> statements;
        try {
            PlumbParser.DocumentContext tree = parser.document();
            BlockGrouper blocks = new BlockGrouper();
            statements = new ArrayList<>(blocks.group(new AstBuilder(lines, errors).document(tree, tokens)));
            errors.diagnostics().addAll(blocks.diagnostics());
        } catch (StackOverflowError e) {
            // The token filter bounds nesting, so this is a last line of defence only.
            statements = new ArrayList<>();
            errors.diagnostics().add(Diagnostic.of(Code.SYNTAX_NESTING, new Span(0, Math.min(1, text.length())),
                "this document is nested too deeply to read: give inner parts of long expressions names"));
        }
        for (StatementTokens.Dropped d : arranged.dropped()) statements.add(new Statement.Broken(d.span(), d.name()));
        statements.sort(Comparator.comparingInt(s -> s.span().start()));

        List<Diagnostic> diagnostics = new ArrayList<>(arranged.diagnostics());
        diagnostics.addAll(errors.diagnostics());
        diagnostics.sort(Comparator.comparingInt(d -> d.span().start()));
        return new ParsedSource(text, lines, statements, diagnostics);
    }
}
