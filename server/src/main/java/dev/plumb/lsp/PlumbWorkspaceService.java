package dev.plumb.lsp;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Printable;
import dev.plumb.ide.Outline;
import dev.plumb.ide.Symbol;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.ExecuteCommandParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.lsp4j.WorkspaceSymbol;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.jsonrpc.CompletableFutures;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.services.WorkspaceService;

/**
 * Settings and files changed outside the editor (analyse the open documents again), the
 * commands, and symbols across the open documents.
 */
final class PlumbWorkspaceService implements WorkspaceService {
    private final PlumbLanguageServer server;
    private final ExecutorService requests;

    PlumbWorkspaceService(PlumbLanguageServer server, ExecutorService requests) {
        this.server = server;
        this.requests = requests;
    }

    @Override
    public void didChangeConfiguration(DidChangeConfigurationParams params) {
        server.updateSettings(params.getSettings());
        server.analyses().scheduleAll();
    }

    @Override
    public void didChangeWatchedFiles(DidChangeWatchedFilesParams params) {
        server.analyses().scheduleAll();
    }

    /**
     * The value lens's command only shows the value, so there is nothing to do; the report is
     * made off the message thread; a command the server never offered is refused in words.
     */
    @Override
    public CompletableFuture<Object> executeCommand(ExecuteCommandParams params) {
        String command = params.getCommand();
        if (ProtocolMapping.SHOW_VALUE.equals(command)) return CompletableFuture.completedFuture(null);
        if (WriteReport.COMMAND.equals(command)) {
            return CompletableFutures.computeAsync(requests, cancel -> server.reports().run(params.getArguments(), cancel));
        }
        return CompletableFuture.failedFuture(new ResponseErrorException(new ResponseError(ResponseErrorCode.InvalidParams,
            "Plumb has no command " + (command == null ? "without a name" : "\"" + Printable.line(command) + "\"")
                + "; its commands are " + ProtocolMapping.SHOW_VALUE + " and " + WriteReport.COMMAND, null)));
    }

    /** Every open document's sections and definitions whose names contain the query. */
    @Override
    public CompletableFuture<Either<List<? extends SymbolInformation>, List<? extends WorkspaceSymbol>>> symbol(
        WorkspaceSymbolParams params) {
        return CompletableFuture.supplyAsync(() -> {
            String query = params.getQuery() == null ? "" : params.getQuery().toLowerCase(java.util.Locale.ROOT);
            List<WorkspaceSymbol> out = new ArrayList<>();
            for (OpenDocument d : server.documents().all()) {
                Analysis a = server.analyses().current(d.uri());
                if (a == null) continue;
                collect(a, d.uri(), Outline.of(a), query, out);
            }
            return Either.forRight(out);
        });
    }

    private void collect(Analysis a, String uri, List<Symbol> symbols, String query, List<WorkspaceSymbol> out) {
        for (Symbol s : symbols) {
            if (s.kind() != dev.plumb.ide.Symbol.Kind.SECTION && s.name().toLowerCase(java.util.Locale.ROOT).contains(query)) {
                out.add(new WorkspaceSymbol(s.name(), s.kind() == dev.plumb.ide.Symbol.Kind.INPUT ? SymbolKind.Constant : SymbolKind.Variable,
                    Either.forLeft(new Location(uri, Positions.range(a.text(), s.selection().start(), s.selection().end(),
                        server.encoding())))));
            }
            collect(a, uri, s.children(), query, out);
        }
    }
}
