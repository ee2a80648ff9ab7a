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

/**
 * A test editor: talks JSON-RPC to a real server and records what it is sent. The server runs
 * in this process over pipes, or is a separate process (then {@link #server} is null).
 */
final class TestClient implements LanguageClient {
    final BlockingQueue<PublishDiagnosticsParams> published = new LinkedBlockingQueue<>();
    final PlumbLanguageServer server;
    final LanguageServer remote;
    InitializeResult initialized;

    TestClient(ClientCapabilities capabilities, Object options) throws Exception {
        PipedInputStream serverIn = new PipedInputStream(1 << 20);
        PipedOutputStream clientOut = new PipedOutputStream(serverIn);
        PipedInputStream clientIn = new PipedInputStream(1 << 20);
        PipedOutputStream serverOut = new PipedOutputStream(clientIn);
        server = new PlumbLanguageServer();
        PlumbLauncher.create(server, serverIn, serverOut, System.err).startListening();
        remote = connect(clientIn, clientOut, capabilities, options);
    }

    /** A client of a server started as its own process ({@code plumb lsp}). */
    TestClient(Process serverProcess, ClientCapabilities capabilities, Object options) throws Exception {
        server = null;
        remote = connect(serverProcess.getInputStream(), serverProcess.getOutputStream(), capabilities, options);
    }

    private LanguageServer connect(java.io.InputStream in, java.io.OutputStream out, ClientCapabilities capabilities,
                                   Object options) throws Exception {
        var clientLauncher = LSPLauncher.createClientLauncher(this, in, out);
        clientLauncher.startListening();
        LanguageServer proxy = clientLauncher.getRemoteProxy();
        InitializeParams init = new InitializeParams();
        init.setCapabilities(capabilities);
        init.setInitializationOptions(options);
        initialized = proxy.initialize(init).get(60, TimeUnit.SECONDS);
        return proxy;
    }

    /** A client that shows values as inlay hints, as current editors do. */
    static ClientCapabilities withInlayHints() {
        org.eclipse.lsp4j.TextDocumentClientCapabilities td = new org.eclipse.lsp4j.TextDocumentClientCapabilities();
        td.setInlayHint(new org.eclipse.lsp4j.InlayHintCapabilities());
        ClientCapabilities caps = new ClientCapabilities();
        caps.setTextDocument(td);
        return caps;
    }

    /** Writes a file, opens it, and waits for its first diagnostics; its URI. */
    String openAnalysed(java.nio.file.Path file, String text) throws Exception {
        java.nio.file.Files.writeString(file, text);
        String uri = file.toUri().toString();
        open(uri, text);
        diagnostics(uri, 1);
        return uri;
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
