package dev.plumb.lsp;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Span;
import dev.plumb.ide.Completion;
import dev.plumb.ide.CompletionEntry;
import dev.plumb.ide.Edit;
import dev.plumb.ide.Fixes;
import dev.plumb.ide.Folding;
import dev.plumb.ide.Occurrences;
import dev.plumb.ide.SemanticSpans;
import dev.plumb.ide.SignatureInfo;
import dev.plumb.ide.Signatures;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionItemKind;
import org.eclipse.lsp4j.DocumentHighlight;
import org.eclipse.lsp4j.DocumentHighlightKind;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.InsertTextFormat;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.ParameterInformation;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensLegend;
import org.eclipse.lsp4j.SignatureHelp;
import org.eclipse.lsp4j.SignatureInformation;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/** The editor features in protocol types: each maps an `ide` result, nothing more. */
final class Features {
    static final SemanticTokensLegend LEGEND = new SemanticTokensLegend(
        List.of("parameter", "variable", "function", "type"), List.of());

    private Features() {
    }

    /** The items, marked incomplete when cut at the limit so the editor asks again as the user types. */
    static org.eclipse.lsp4j.CompletionList completion(Analysis a, int offset) {
        List<CompletionItem> out = new ArrayList<>();
        List<CompletionEntry> entries = Completion.at(a, offset);
        for (CompletionEntry e : entries) {
            CompletionItem item = new CompletionItem(e.label());
            item.setKind(kind(e.kind()));
            item.setDetail(e.detail());
            item.setInsertText(e.insert());
            item.setInsertTextFormat(e.snippet() ? InsertTextFormat.Snippet : InsertTextFormat.PlainText);
            out.add(item);
        }
        return new org.eclipse.lsp4j.CompletionList(entries.size() >= Completion.LIMIT, out);
    }

    private static CompletionItemKind kind(CompletionEntry.Kind k) {
        return switch (k) {
            case VALUE -> CompletionItemKind.Variable;
            case INPUT, CONSTANT -> CompletionItemKind.Constant;
            case FUNCTION, CORRELATION -> CompletionItemKind.Function;
            case TABLE -> CompletionItemKind.Struct;
            case UNIT -> CompletionItemKind.Unit;
            case KEYWORD -> CompletionItemKind.Keyword;
        };
    }

    static SignatureHelp signatureHelp(Analysis a, int offset) {
        SignatureInfo s = Signatures.at(a, offset);
        if (s == null) return null;
        SignatureInformation info = new SignatureInformation(s.label());
        if (!s.documentation().isEmpty()) info.setDocumentation(new MarkupContent(MarkupKind.PLAINTEXT, s.documentation()));
        List<ParameterInformation> params = new ArrayList<>();
        for (String p : s.parameters()) params.add(new ParameterInformation(p));
        info.setParameters(params);
        return new SignatureHelp(List.of(info), 0, s.active());
    }

    static List<Location> references(Analysis a, int offset, String uri, Positions.Encoding enc, boolean declaration) {
        String name = Occurrences.nameAt(a, offset);
        if (name == null) return List.of();
        var b = a.scope().lookup(name);
        List<Location> out = new ArrayList<>();
        for (Span s : Occurrences.of(a, name)) {
            boolean isDeclaration = b != null && a.file().equals(b.file()) && b.span().equals(s);
            if (declaration || !isDeclaration) out.add(new Location(uri, range(a, s, enc)));
        }
        return out;
    }

    /** The name to rename at the cursor, or null (nothing renameable there). */
    static org.eclipse.lsp4j.jsonrpc.messages.Either3<Range, org.eclipse.lsp4j.PrepareRenameResult,
        org.eclipse.lsp4j.PrepareRenameDefaultBehavior> prepareRename(Analysis a, int offset, Positions.Encoding enc) {
        String name = Occurrences.nameAt(a, offset);
        if (name == null) return null;
        for (Span s : Occurrences.of(a, name)) {
            if (s.start() <= offset && offset <= s.end()) {
                return org.eclipse.lsp4j.jsonrpc.messages.Either3.forSecond(
                    new org.eclipse.lsp4j.PrepareRenameResult(range(a, s, enc), name));
            }
        }
        return null;
    }

    static List<DocumentHighlight> highlights(Analysis a, int offset, Positions.Encoding enc) {
        String name = Occurrences.nameAt(a, offset);
        if (name == null) return List.of();
        List<DocumentHighlight> out = new ArrayList<>();
        for (Span s : Occurrences.of(a, name)) out.add(new DocumentHighlight(range(a, s, enc), DocumentHighlightKind.Text));
        return out;
    }

    static WorkspaceEdit rename(Analysis a, int offset, String newName, String uri, Positions.Encoding enc) {
        Occurrences.Renaming r = Occurrences.rename(a, offset, newName);
        if (r.refusal() != null) {
            throw new ResponseErrorException(new ResponseError(ResponseErrorCode.InvalidRequest, r.refusal(), null));
        }
        return new WorkspaceEdit(Map.of(uri, edits(a, r.edits(), enc)));
    }

    static List<FoldingRange> folding(Analysis a) {
        List<FoldingRange> out = new ArrayList<>();
        for (Folding.Fold f : Folding.of(a)) {
            FoldingRange r = new FoldingRange(f.startLine(), f.endLine());
            r.setKind(f.kind());
            out.add(r);
        }
        return out;
    }

    /** Relative encoding of the protocol: line delta, start delta, length, type, modifiers. */
    static SemanticTokens semanticTokens(Analysis a, Positions.Encoding enc) {
        List<Integer> data = new ArrayList<>();
        int prevLine = 0;
        int prevChar = 0;
        for (SemanticSpans.Token t : SemanticSpans.of(a)) {
            Position start = Positions.position(a.text(), t.span().start(), enc);
            Position end = Positions.position(a.text(), t.span().end(), enc);
            if (end.getLine() != start.getLine()) continue;
            int deltaLine = start.getLine() - prevLine;
            data.add(deltaLine);
            data.add(deltaLine == 0 ? start.getCharacter() - prevChar : start.getCharacter());
            data.add(end.getCharacter() - start.getCharacter());
            data.add(t.type().ordinal());
            data.add(0);
            prevLine = start.getLine();
            prevChar = start.getCharacter();
        }
        return new SemanticTokens(data);
    }

    static List<Either<Command, CodeAction>> codeActions(Analysis a, Range range, String uri, Positions.Encoding enc) {
        // Whole lines: editors ask with the cursor anywhere on the line of a finding.
        Range lines = new Range(new Position(range.getStart().getLine(), 0), new Position(range.getEnd().getLine() + 1, 0));
        Span span = new Span(Positions.offset(a.text(), lines.getStart(), enc), Math.max(0,
            Positions.offset(a.text(), lines.getEnd(), enc) - 1));
        List<Either<Command, CodeAction>> out = new ArrayList<>();
        for (Fixes.Action f : Fixes.at(a, span)) {
            CodeAction action = new CodeAction(f.title());
            action.setKind(f.quickFix() ? CodeActionKind.QuickFix : CodeActionKind.RefactorRewrite);
            // Only a repair that keeps what the user meant may be applied by an editor on its own.
            if (f.preferred()) action.setIsPreferred(true);
            action.setEdit(new WorkspaceEdit(Map.of(uri, edits(a, f.edits(), enc))));
            out.add(Either.forRight(action));
        }
        return out;
    }

    /** Aligns definition blocks; only blanks change, never meaning. */
    static List<TextEdit> format(Analysis a, Positions.Encoding enc) {
        return edits(a, dev.plumb.ide.Formatter.format(a.text()), enc);
    }

    private static List<TextEdit> edits(Analysis a, List<Edit> edits, Positions.Encoding enc) {
        List<TextEdit> out = new ArrayList<>();
        for (Edit e : edits) out.add(new TextEdit(range(a, new Span(e.offset(), e.end()), enc), e.replacement()));
        return out;
    }

    private static Range range(Analysis a, Span s, Positions.Encoding enc) {
        return Positions.range(a.text(), s.start(), s.end(), enc);
    }
}
