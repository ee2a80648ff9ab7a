package dev.plumb.lsp;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Related;
import dev.plumb.ide.InlayValue;
import dev.plumb.ide.Symbol;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.CodeLens;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticRelatedInformation;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintKind;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** The engine's plain data in protocol types: the only place the two meet. */
final class ProtocolMapping {
    /** The source named on every diagnostic. */
    static final String SOURCE = "plumb";
    /** The command of a value's code lens: showing is all it does, so running it changes nothing. */
    static final String SHOW_VALUE = "plumb.showValue";

    private ProtocolMapping() {
    }

    static List<Diagnostic> diagnostics(Analysis a, Positions.Encoding enc, ServerSettings settings) {
        List<Diagnostic> out = new ArrayList<>();
        for (dev.plumb.diagnostics.Diagnostic d : a.diagnostics()) {
            Diagnostic p = new Diagnostic(Positions.range(a.text(), d.span().start(), d.span().end(), enc), dev.plumb.diagnostics.Printable.text(
                d.isAccepted() ? d.message() + " [accepted: " + d.accepted() + "]" : d.message()),
                severity(d.severity()), SOURCE, d.code().id());
            List<DiagnosticRelatedInformation> related = new ArrayList<>();
            for (Related r : d.related()) {
                if (r.file() == null || !r.file().equals(a.file().toString())) continue;
                related.add(new DiagnosticRelatedInformation(new Location(a.file().toUri().toString(),
                    Positions.range(a.text(), r.span().start(), r.span().end(), enc)), dev.plumb.diagnostics.Printable.text(r.message())));
            }
            if (!related.isEmpty()) p.setRelatedInformation(related);
            out.add(p);
        }
        if (settings.valueDiagnostics()) {
            for (InlayValue v : dev.plumb.ide.InlayValues.of(a)) {
                // Zero-width at the statement's end: listed and shown at the end of the line, nothing underlined.
                Diagnostic value = new Diagnostic(Positions.range(a.text(), v.offset(), v.offset(), enc), v.label(),
                    DiagnosticSeverity.Hint, SOURCE, "value");
                out.add(value);
            }
        }
        return out;
    }

    static DiagnosticSeverity severity(dev.plumb.diagnostics.Severity s) {
        return switch (s) {
            case ERROR -> DiagnosticSeverity.Error;
            case WARNING -> DiagnosticSeverity.Warning;
            case INFO -> DiagnosticSeverity.Information;
            case HINT -> DiagnosticSeverity.Hint;
        };
    }

    /** The hints of the rows within {@code range} (the lines the editor shows); all rows for a null range. */
    static List<InlayHint> inlayHints(Analysis a, Positions.Encoding enc, org.eclipse.lsp4j.Range range) {
        int from = range == null ? 0 : Positions.offset(a.text(), range.getStart(), enc);
        int to = range == null ? Integer.MAX_VALUE : Positions.offset(a.text(), range.getEnd(), enc);
        List<InlayHint> out = new ArrayList<>();
        for (InlayValue v : dev.plumb.ide.InlayValues.of(a, from, to)) {
            InlayHint h = new InlayHint(Positions.position(a.text(), lineEnd(a.text(), v.offset()), enc),
                Either.forLeft("  " + v.label()));
            h.setKind(InlayHintKind.Type);
            h.setPaddingLeft(true);
            out.add(h);
        }
        return out;
    }

    static List<CodeLens> codeLenses(Analysis a, Positions.Encoding enc) {
        List<CodeLens> out = new ArrayList<>();
        for (InlayValue v : dev.plumb.ide.InlayValues.of(a)) {
            int lineStart = a.text().lastIndexOf('\n', Math.max(0, v.offset() - 1)) + 1;
            CodeLens lens = new CodeLens(Positions.range(a.text(), lineStart, lineStart, enc));
            lens.setCommand(new Command(v.statement() + " " + v.label(), SHOW_VALUE));
            out.add(lens);
        }
        return out;
    }

    /** The end of the line an offset lies on (inlay hints sit after the statement's last text). */
    private static int lineEnd(String text, int offset) {
        int i = Math.min(offset, text.length());
        while (i < text.length() && text.charAt(i) != '\n' && text.charAt(i) != '\r') i++;
        return i;
    }

    static List<DocumentSymbol> symbols(Analysis a, List<Symbol> symbols, Positions.Encoding enc) {
        List<DocumentSymbol> out = new ArrayList<>();
        for (Symbol s : symbols) {
            DocumentSymbol d = new DocumentSymbol(s.name(), kind(s.kind()),
                Positions.range(a.text(), s.span().start(), s.span().end(), enc),
                Positions.range(a.text(), s.selection().start(), s.selection().end(), enc), s.detail());
            if (!s.children().isEmpty()) d.setChildren(symbols(a, s.children(), enc));
            out.add(d);
        }
        return out;
    }

    private static SymbolKind kind(Symbol.Kind kind) {
        return switch (kind) {
            case SECTION -> SymbolKind.Namespace;
            case INPUT -> SymbolKind.Constant;
            case FUNCTION, CORRELATION -> SymbolKind.Function;
            case TABLE -> SymbolKind.Struct;
            case CHECK -> SymbolKind.Boolean;
            case VALUE -> SymbolKind.Variable;
        };
    }
}
