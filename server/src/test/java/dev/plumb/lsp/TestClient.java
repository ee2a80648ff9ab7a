package dev.plumb.lsp;

import java.io.IOException;
import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.MessageActionItem;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.ShowMessageRequestParams;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;

/** An in-process editor: talks JSON-RPC to a real server over pipes and records what it is sent. */
final class TestClient implements LanguageClient {
    final BlockingQueue<PublishDiagnosticsParams> published = new LinkedBlockingQueue<>();
    final PlumbLanguageServer server = new PlumbLanguageServer();
    final LanguageServer remote;
    InitializeResult initialized;

    TestClient(ClientCapabilities capabilities, Object options) throws Exception {
        PipedInputStream serverIn = new PipedInputStream(1 << 20);
        PipedOutputStream clientOut = new PipedOutputStream(serverIn);
        PipedInputStream clientIn = new PipedInputStream(1 << 20);
        PipedOutputStream serverOut = new PipedOutputStream(clientIn);
        var serverLauncher = LSPLauncher.createServerLauncher(server, serverIn, serverOut);
        server.connect(serverLauncher.getRemoteProxy());
        serverLauncher.startListening();
        var clientLauncher = LSPLauncher.createClientLauncher(this, clientIn, clientOut);
        clientLauncher.startListening();
        remote = clientLauncher.getRemoteProxy();
        InitializeParams init = new InitializeParams();
        init.setCapabilities(capabilities);
        init.setInitializationOptions(options);
        initialized = remote.initialize(init).get(10, TimeUnit.SECONDS);
    }

    void open(String uri, String text) {
        remote.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(uri, "plumb", 1, text)));
    }

    /** The next diagnostics published for a document at a version at least {@code version}. */
    PublishDiagnosticsParams diagnostics(String uri, int version) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(20);
        while (System.nanoTime() < deadline) {
            PublishDiagnosticsParams p = published.poll(100, TimeUnit.MILLISECONDS);
            if (p != null && p.getUri().equals(uri) && p.getVersion() != null && p.getVersion() >= version) return p;
        }
        throw new AssertionError("no diagnostics for " + uri + " version " + version);
    }

    @Override
    public void telemetryEvent(Object object) {
    }

    @Override
    public void publishDiagnostics(PublishDiagnosticsParams diagnostics) {
        published.add(diagnostics);
    }

    @Override
    public void showMessage(MessageParams messageParams) {
    }

    @Override
    public CompletableFuture<MessageActionItem> showMessageRequest(ShowMessageRequestParams requestParams) {
        return CompletableFuture.completedFuture(null);
    }

    @Override
    public void logMessage(MessageParams message) {
    }

    @Override
    public CompletableFuture<Void> refreshCodeLenses() {
        return CompletableFuture.completedFuture(null);
    }

    @Override
    public CompletableFuture<Void> refreshInlayHints() {
        return CompletableFuture.completedFuture(null);
    }

    static void close(TestClient c) throws IOException {
        c.remote.shutdown();
    }

}
