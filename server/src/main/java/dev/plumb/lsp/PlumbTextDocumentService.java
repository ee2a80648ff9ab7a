package dev.plumb.lsp;

import dev.plumb.analysis.Analysis;
import dev.plumb.ide.HoverText;
import dev.plumb.ide.Navigation;
import dev.plumb.ide.Outline;
import dev.plumb.ide.Target;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.function.Function;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.CodeLens;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionList;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DocumentHighlight;
import org.eclipse.lsp4j.DocumentHighlightParams;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.SignatureHelp;
import org.eclipse.lsp4j.SignatureHelpParams;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.CodeLensParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.DidSaveTextDocumentParams;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentDiagnosticReport;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.RelatedFullDocumentDiagnosticReport;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.jsonrpc.CompletableFutures;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.services.TextDocumentService;

/**
 * The text-document requests: each is a one-line delegation to the engine's analysis of the
 * document and an `ide` feature, run off the message thread, mapped to protocol types.
 */
final class PlumbTextDocumentService implements TextDocumentService {
    private final PlumbLanguageServer server;
    private final ExecutorService requests;

    PlumbTextDocumentService(PlumbLanguageServer server, ExecutorService requests) {
        this.server = server;
        this.requests = requests;
    }

    @Override
    public void didOpen(DidOpenTextDocumentParams params) {
        var d = params.getTextDocument();
        server.documents().open(d.getUri(), d.getText(), d.getVersion());
        server.analyses().schedule(d.getUri());
    }

    @Override
    public void didChange(DidChangeTextDocumentParams params) {
        String uri = params.getTextDocument().getUri();
        server.documents().change(uri, params.getTextDocument().getVersion(), params.getContentChanges());
        if (!server.settings().onSaveOnly()) server.analyses().schedule(uri);
    }

    @Override
    public void didClose(DidCloseTextDocumentParams params) {
        String uri = params.getTextDocument().getUri();
        server.documents().close(uri);
        server.analyses().forget(uri);
        server.clearDiagnostics(uri);
    }

    @Override
    public void didSave(DidSaveTextDocumentParams params) {
        server.analyses().schedule(params.getTextDocument().getUri());
    }

    /** Runs a feature on the document's current analysis, off the message thread. */
    private <T> CompletableFuture<T> with(String uri, Function<Analysis, T> feature) {
        return CompletableFutures.computeAsync(requests, cancel -> {
            Analysis a = server.analyses().current(uri);
            cancel.checkCanceled();
            return a == null ? null : feature.apply(a);
        });
    }

    private Positions.Encoding enc() {
        return server.encoding();
    }

    @Override
    public CompletableFuture<Hover> hover(HoverParams params) {
        return with(params.getTextDocument().getUri(), a -> {
            String text = HoverText.at(a, Positions.offset(a.text(), params.getPosition(), enc()));
            return text == null ? null : new Hover(new MarkupContent(MarkupKind.MARKDOWN, text));
        });
    }

    @Override
    public CompletableFuture<Either<List<? extends Location>, List<? extends LocationLink>>> definition(
        DefinitionParams params) {
        return with(params.getTextDocument().getUri(), a -> {
            Target t = Navigation.definitionAt(a, Positions.offset(a.text(), params.getPosition(), enc()));
            Location l = t == null ? null : server.locate(t);
            return Either.forLeft(l == null ? List.of() : List.of(l));
        });
    }

    @Override
    public CompletableFuture<List<Either<SymbolInformation, DocumentSymbol>>> documentSymbol(DocumentSymbolParams params) {
        return with(params.getTextDocument().getUri(), a -> ProtocolMapping.symbols(a, Outline.of(a), enc()).stream()
            .map(Either::<SymbolInformation, DocumentSymbol>forRight).toList());
    }

    @Override
    public CompletableFuture<List<InlayHint>> inlayHint(InlayHintParams params) {
        return with(params.getTextDocument().getUri(), a -> server.settings().inlayHints()
            ? ProtocolMapping.inlayHints(a, enc(), params.getRange()) : List.of());
    }

    @Override
    public CompletableFuture<List<? extends CodeLens>> codeLens(CodeLensParams params) {
        return with(params.getTextDocument().getUri(), a -> server.settings().codeLens()
            ? ProtocolMapping.codeLenses(a, enc()) : List.of());
    }

    @Override
    public CompletableFuture<Either<List<CompletionItem>, CompletionList>> completion(CompletionParams params) {
        return with(params.getTextDocument().getUri(), a -> Either.forRight(Features.completion(a,
            Positions.offset(a.text(), params.getPosition(), enc()))));
    }

    @Override
    public CompletableFuture<SignatureHelp> signatureHelp(SignatureHelpParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.signatureHelp(a,
            Positions.offset(a.text(), params.getPosition(), enc())));
    }

    @Override
    public CompletableFuture<List<? extends Location>> references(ReferenceParams params) {
        boolean declaration = params.getContext() == null || params.getContext().isIncludeDeclaration();
        return with(params.getTextDocument().getUri(), a -> Features.references(a,
            Positions.offset(a.text(), params.getPosition(), enc()), params.getTextDocument().getUri(), enc(), declaration));
    }

    @Override
    public CompletableFuture<List<? extends DocumentHighlight>> documentHighlight(DocumentHighlightParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.highlights(a,
            Positions.offset(a.text(), params.getPosition(), enc()), enc()));
    }

    @Override
    public CompletableFuture<WorkspaceEdit> rename(RenameParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.rename(a,
            Positions.offset(a.text(), params.getPosition(), enc()), params.getNewName(), params.getTextDocument().getUri(),
            enc()));
    }

    @Override
    public CompletableFuture<org.eclipse.lsp4j.jsonrpc.messages.Either3<org.eclipse.lsp4j.Range,
        org.eclipse.lsp4j.PrepareRenameResult, org.eclipse.lsp4j.PrepareRenameDefaultBehavior>> prepareRename(
        org.eclipse.lsp4j.PrepareRenameParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.prepareRename(a,
            Positions.offset(a.text(), params.getPosition(), enc()), enc()));
    }

    @Override
    public CompletableFuture<List<FoldingRange>> foldingRange(FoldingRangeRequestParams params) {
        return with(params.getTextDocument().getUri(), Features::folding);
    }

    @Override
    public CompletableFuture<SemanticTokens> semanticTokensFull(SemanticTokensParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.semanticTokens(a, enc()));
    }

    @Override
    public CompletableFuture<List<Either<Command, CodeAction>>> codeAction(CodeActionParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.codeActions(a, params.getRange(),
            params.getTextDocument().getUri(), enc()));
    }

    @Override
    public CompletableFuture<List<? extends org.eclipse.lsp4j.TextEdit>> formatting(
        org.eclipse.lsp4j.DocumentFormattingParams params) {
        return with(params.getTextDocument().getUri(), a -> Features.format(a, enc()));
    }

    @Override
    public CompletableFuture<DocumentDiagnosticReport> diagnostic(DocumentDiagnosticParams params) {
        return with(params.getTextDocument().getUri(), a -> new DocumentDiagnosticReport(
            new RelatedFullDocumentDiagnosticReport(ProtocolMapping.diagnostics(a, enc(), server.settings()))));
    }
}
