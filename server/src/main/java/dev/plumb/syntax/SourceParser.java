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

/**
 * Entry point of the syntax layer: text in, AST plus syntax diagnostics out. Never throws.
 * {@link #reparse} gives the same result as {@link #parse} while reading again only the part of
 * the text an edit touched: the rest is taken from the earlier result, moved to its new place.
 */
public final class SourceParser {
    private SourceParser() {
    }

    public static ParsedSource parse(String text) {
        Assembly out = new Assembly();
        out.read(read(text, true), 0, text.length());
        return out.build(text);
    }

    /** Equal to {@code parse(text)}; fast when {@code text} is {@code previous.text()} after an edit. */
    public static ParsedSource reparse(ParsedSource previous, String text) {
        String old = previous.text();
        if (old.equals(text)) return previous;
        int shorter = Math.min(old.length(), text.length());
        int prefix = 0;
        while (prefix < shorter && old.charAt(prefix) == text.charAt(prefix)) prefix++;
        int suffix = 0;
        while (suffix < shorter - prefix && old.charAt(old.length() - 1 - suffix) == text.charAt(text.length() - 1 - suffix)) {
            suffix++;
        }
        List<ParsedSource.Chunk> chunks = previous.chunks();
        // Chunks before the edit, whose following line starts before it too, read the same.
        int keep = 0;
        while (keep < chunks.size() && chunks.get(keep).end() < prefix) keep++;
        // Chunks after the edit, the line break before them included, read the same but moved.
        int from = chunks.size();
        while (from > keep && chunks.get(from - 1).start() > old.length() - suffix) from--;
        int delta = text.length() - old.length();
        int start = keep == 0 ? 0 : chunks.get(keep - 1).end();
        int end = from == chunks.size() ? text.length() : chunks.get(from).start() + delta;
        Reading middle = read(text.substring(start, end), start == 0);
        if (middle.blockOpenAtEnd() && from < chunks.size()) {
            // A block opened in the edited part runs on into what follows: read the rest afresh.
            from = chunks.size();
            end = text.length();
            middle = read(text.substring(start), start == 0);
        }
        Assembly out = new Assembly();
        out.reuse(previous, 0, keep, 0);
        out.read(middle, start, end);
        out.reuse(previous, from, chunks.size(), delta);
        return out.build(text);
    }

    /** What reading a stretch of text gives, with offsets from the stretch's start. */
    private record Reading(List<Statement> statements, List<Diagnostic> diagnostics, List<Integer> freshStarts,
                           boolean blockOpenAtEnd) {
    }

    /** Reads a stretch of text: the whole document, or a part of it from one of its fresh starts. */
    private static Reading read(String text, boolean documentStart) {
        LineMap lines = new LineMap(text);
        PlumbLexer lexer = new PlumbLexer(CharStreams.fromString(text));
        lexer.removeErrorListeners();
        List<? extends Token> raw = lexer.getAllTokens();
        List<Token> all = new ArrayList<>(raw);
        all.add(lexer.nextToken()); // getAllTokens() leaves out EOF; asking again returns it

        StatementTokens arranged = new StatementTokens(lines, documentStart);
        List<Token> tokens = arranged.arrange(all);

        SyntaxErrors errors = new SyntaxErrors(lines);
        PlumbParser parser = new PlumbParser(new CommonTokenStream(new ListTokenSource(tokens)));
        parser.removeErrorListeners();
        parser.addErrorListener(errors);
        parser.setErrorHandler(new LineRecovery(errors));

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
        return new Reading(statements, diagnostics, arranged.freshStarts(), arranged.blockOpenAtEnd());
    }

    /** Builds a parse result chunk by chunk, from fresh readings and from an earlier result. */
    private static final class Assembly {
        private final List<Statement> statements = new ArrayList<>();
        private final List<Diagnostic> diagnostics = new ArrayList<>();
        private final List<ParsedSource.Chunk> chunks = new ArrayList<>();

        /** Takes a reading of text [start, end), cut into chunks where it starts afresh. */
        void read(Reading r, int start, int end) {
            List<Statement> st = Shift.statements(r.statements(), start);
            List<Diagnostic> dg = Shift.diagnostics(r.diagnostics(), start);
            int s = 0;
            int d = 0;
            for (int k = 0; k <= r.freshStarts().size(); k++) {
                int chunkStart = k == 0 ? start : start + r.freshStarts().get(k - 1);
                boolean last = k == r.freshStarts().size();
                int chunkEnd = last ? end : start + r.freshStarts().get(k);
                int s0 = statements.size();
                int d0 = diagnostics.size();
                while (s < st.size() && (last || st.get(s).span().start() < chunkEnd)) statements.add(st.get(s++));
                while (d < dg.size() && (last || dg.get(d).span().start() < chunkEnd)) diagnostics.add(dg.get(d++));
                chunks.add(new ParsedSource.Chunk(chunkStart, chunkEnd, s0, statements.size(), d0, diagnostics.size()));
            }
        }

        /** Takes chunks [first, end) of an earlier result, moved by {@code by}. */
        void reuse(ParsedSource earlier, int first, int end, int by) {
            if (first >= end) return;
            ParsedSource.Chunk a = earlier.chunks().get(first);
            ParsedSource.Chunk z = earlier.chunks().get(end - 1);
            int statementsBy = statements.size() - a.firstStatement();
            int diagnosticsBy = diagnostics.size() - a.firstDiagnostic();
            statements.addAll(Shift.statements(earlier.statements().subList(a.firstStatement(), z.endStatement()), by));
            diagnostics.addAll(Shift.diagnostics(earlier.diagnostics().subList(a.firstDiagnostic(), z.endDiagnostic()), by));
            for (ParsedSource.Chunk c : earlier.chunks().subList(first, end)) {
                chunks.add(new ParsedSource.Chunk(c.start() + by, c.end() + by, c.firstStatement() + statementsBy,
                    c.endStatement() + statementsBy, c.firstDiagnostic() + diagnosticsBy, c.endDiagnostic() + diagnosticsBy));
            }
        }

        ParsedSource build(String text) {
            return new ParsedSource(text, new LineMap(text), statements, diagnostics, chunks);
        }
    }
}
