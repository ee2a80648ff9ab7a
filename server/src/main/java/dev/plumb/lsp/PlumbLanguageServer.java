package dev.plumb.lsp;

import dev.plumb.analysis.Stdlib;
import dev.plumb.ide.Target;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DiagnosticRegistrationOptions;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.ServerInfo;
import org.eclipse.lsp4j.TextDocumentSyncKind;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageClientAware;
import org.eclipse.lsp4j.services.LanguageServer;
import org.eclipse.lsp4j.services.TextDocumentService;
import org.eclipse.lsp4j.services.WorkspaceService;

/**
 * Plumb's language server: wires the document store, the analysis scheduler and the services,
 * negotiates the position encoding and the value channels the client can show.
 */
public final class PlumbLanguageServer implements LanguageServer, LanguageClientAware {
    private final Positions.Enc encoding = new Positions.Enc();
    private final DocumentStore documents = new DocumentStore(encoding);
    private final ExecutorService requests = Executors.newFixedThreadPool(2, r -> {
        Thread t = new Thread(r, "plumb-request");
        t.setDaemon(true);
        return t;
    });
    private volatile ServerSettings settings = ServerSettings.DEFAULT;
    private volatile LanguageClient client;
    private final Analyses analyses = new Analyses(documents, () -> settings, this::publish, this::warn);
    private final PlumbTextDocumentService text = new PlumbTextDocumentService(this, requests);
    private final WriteReport reports = new WriteReport(documents, analyses,
        new ReportFiles(new dev.plumb.analysis.FileSources()));
    private final PlumbWorkspaceService workspace = new PlumbWorkspaceService(this, requests);
    private boolean shutdown;
    private volatile boolean pullsConfiguration;
    private volatile boolean refreshLenses;
    private volatile boolean watchesFiles;
    private volatile boolean refreshHints;
    private Path libraryCopy;
    /** What the server says it is at initialize: the program's version as the build recorded it. */
    private final String version;

    /** A server that does not know its build's version (tests). */
    public PlumbLanguageServer() {
        this("unknown");
    }

    public PlumbLanguageServer(String version) {
        this.version = version;
    }

    @Override
    public void connect(LanguageClient client) {
        this.client = client;
    }

    @Override
    public CompletableFuture<InitializeResult> initialize(InitializeParams params) {
        ClientCapabilities caps = params.getCapabilities();
        encoding.value = negotiate(caps);
        pullsConfiguration = caps != null && caps.getWorkspace() != null
            && Boolean.TRUE.equals(caps.getWorkspace().getConfiguration());
        String clientName = params.getClientInfo() == null ? "" : params.getClientInfo().getName();
        settings = channelsFor(caps, clientName).with(params.getInitializationOptions());
        watchesFiles = caps != null && caps.getWorkspace() != null && caps.getWorkspace().getDidChangeWatchedFiles() != null
            && Boolean.TRUE.equals(caps.getWorkspace().getDidChangeWatchedFiles().getDynamicRegistration());
        refreshLenses = caps != null && caps.getWorkspace() != null && caps.getWorkspace().getCodeLens() != null
            && Boolean.TRUE.equals(caps.getWorkspace().getCodeLens().getRefreshSupport());
        refreshHints = caps != null && caps.getWorkspace() != null && caps.getWorkspace().getInlayHint() != null
            && Boolean.TRUE.equals(caps.getWorkspace().getInlayHint().getRefreshSupport());
        ServerCapabilities c = new ServerCapabilities();
        c.setTextDocumentSync(TextDocumentSyncKind.Incremental);
        c.setHoverProvider(true);
        c.setDefinitionProvider(true);
        c.setDocumentSymbolProvider(true);
        c.setInlayHintProvider(true);
        c.setCodeLensProvider(new org.eclipse.lsp4j.CodeLensOptions(false));
        c.setDiagnosticProvider(new DiagnosticRegistrationOptions(true, false));
        c.setPositionEncoding(encoding.value.id);
        c.setCompletionProvider(new org.eclipse.lsp4j.CompletionOptions(false, List.of(" ", "/", "*")));
        c.setSignatureHelpProvider(new org.eclipse.lsp4j.SignatureHelpOptions(List.of("(", ",")));
        c.setReferencesProvider(true);
        c.setDocumentHighlightProvider(true);
        c.setRenameProvider(new org.eclipse.lsp4j.RenameOptions(true));
        c.setFoldingRangeProvider(true);
        c.setWorkspaceSymbolProvider(true);
        c.setCodeActionProvider(true);
        c.setDocumentFormattingProvider(true);
        c.setExecuteCommandProvider(new org.eclipse.lsp4j.ExecuteCommandOptions(
            List.of(ProtocolMapping.SHOW_VALUE, WriteReport.COMMAND)));
        c.setSemanticTokensProvider(new org.eclipse.lsp4j.SemanticTokensWithRegistrationOptions(Features.LEGEND, true));
        return CompletableFuture.completedFuture(new InitializeResult(c, new ServerInfo("plumb", version)));
    }

    /** UTF-16 unless the client offers only others; the client's first choice among those we know. */
    private static Positions.Encoding negotiate(ClientCapabilities caps) {
        List<String> offered = caps == null || caps.getGeneral() == null ? null : caps.getGeneral().getPositionEncodings();
        if (offered == null || offered.isEmpty()) return Positions.Encoding.UTF16;
        for (String o : offered) {
            for (Positions.Encoding e : Positions.Encoding.values()) {
                if (e.id.equalsIgnoreCase(o)) return e;
            }
        }
        return Positions.Encoding.UTF16;
    }

    /**
     * Values go where the client can show them: inlay hints; else code lenses (answered to any client
     * that asks — Neovim 0.7 shows them without declaring it); else, for clients that show neither,
     * low-severity value diagnostics.
     */
    private static ServerSettings channelsFor(ClientCapabilities caps, String clientName) {
        var td = caps == null ? null : caps.getTextDocument();
        boolean inlay = td != null && td.getInlayHint() != null;
        boolean lens = td != null && td.getCodeLens() != null;
        boolean neovim = clientName != null && clientName.toLowerCase(java.util.Locale.ROOT).contains("neovim");
        return ServerSettings.DEFAULT.withChannels(inlay, !inlay, !inlay && !lens && !neovim);
    }

    /** Asks the client for the "plumb" settings, without ever blocking the message thread. */
    @Override
    public void initialized(org.eclipse.lsp4j.InitializedParams params) {
        LanguageClient c = client;
        if (c == null) return;
        if (watchesFiles) {
            // Calc files changed outside the editor (git checkout, another tool) re-run the open documents.
            var watcher = new org.eclipse.lsp4j.FileSystemWatcher(
                org.eclipse.lsp4j.jsonrpc.messages.Either.forLeft("**/*.plumb"));
            var options = new org.eclipse.lsp4j.DidChangeWatchedFilesRegistrationOptions(List.of(watcher));
            c.registerCapability(new org.eclipse.lsp4j.RegistrationParams(List.of(new org.eclipse.lsp4j.Registration(
                "plumb-watch", "workspace/didChangeWatchedFiles", options)))).exceptionally(e -> null);
        }
        if (!pullsConfiguration) return;
        org.eclipse.lsp4j.ConfigurationItem item = new org.eclipse.lsp4j.ConfigurationItem();
        item.setSection("plumb");
        c.configuration(new org.eclipse.lsp4j.ConfigurationParams(List.of(item))).thenAccept(values -> {
            if (values != null && !values.isEmpty() && values.get(0) != null) {
                updateSettings(values.get(0));
                analyses.scheduleAll();
            }
        }).exceptionally(e -> null);
    }

    @Override
    public CompletableFuture<Object> shutdown() {
        shutdown = true;
        analyses.shutdown();
        return CompletableFuture.completedFuture(null);
    }

    @Override
    public void exit() {
        System.exit(shutdown ? 0 : 1);
    }

    @Override
    public TextDocumentService getTextDocumentService() {
        return text;
    }

    @Override
    public WorkspaceService getWorkspaceService() {
        return workspace;
    }

    DocumentStore documents() {
        return documents;
    }

    Analyses analyses() {
        return analyses;
    }

    WriteReport reports() {
        return reports;
    }

    ServerSettings settings() {
        return settings;
    }

    Positions.Encoding encoding() {
        return encoding.value;
    }

    void updateSettings(Object json) {
        settings = settings.with(json);
    }

    private void publish(Analyses.OpenDocumentResult r) {
        LanguageClient c = client;
        if (c == null) return;
        c.publishDiagnostics(new PublishDiagnosticsParams(r.document().uri(),
            ProtocolMapping.diagnostics(r.analysis(), encoding.value, settings), r.document().version()));
        if (settings.codeLens() && refreshLenses) c.refreshCodeLenses();
        if (settings.inlayHints() && refreshHints) c.refreshInlayHints();
    }

    /** A message the engineer should see: the editor shows it, and keeps it in its log. */
    private void warn(String message) {
        LanguageClient c = client;
        if (c == null) return;
        c.showMessage(new org.eclipse.lsp4j.MessageParams(org.eclipse.lsp4j.MessageType.Warning, message));
    }

    void clearDiagnostics(String uri) {
        LanguageClient c = client;
        if (c != null) c.publishDiagnostics(new PublishDiagnosticsParams(uri, List.of()));
    }

    /** A definition's place as a protocol location; library files are copied out of the jar once. */
    Location locate(Target t) {
        Path file = t.file();
        String text;
        try {
            if (file.startsWith(Stdlib.ROOT)) {
                file = libraryFile(Stdlib.ROOT.relativize(file).toString());
            }
            OpenDocument open = documents.byPath(file);
            if (open != null) {
                text = open.text();
            } else if (t.file().startsWith(Stdlib.ROOT)) {
                try (var in = Stdlib.class.getResourceAsStream("/stdlib/" + Stdlib.ROOT.relativize(t.file()))) {
                    if (in == null) return null;
                    text = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
                }
            } else {
                // Through the same rules as every read of a calc: a file swapped for a pipe since it
                // was analysed must not block this request.
                OverlaySources sources = new OverlaySources(documents, settings.maxFileBytes());
                if (!(sources.load(file, sources.workspaceRoot(file)) instanceof dev.plumb.analysis.Sources.Text read)) return null;
                text = read.text();
            }
        } catch (IOException | RuntimeException e) {
            return null;
        }
        return new Location(file.toUri().toString(), Positions.range(text, t.span().start(), t.span().end(), encoding.value));
    }

    private synchronized Path libraryFile(String name) throws IOException {
        if (libraryCopy == null) libraryCopy = Files.createTempDirectory("plumb-stdlib-");
        Path copy = libraryCopy.resolve(name);
        if (!Files.exists(copy)) {
            try (var in = Stdlib.class.getResourceAsStream("/stdlib/" + name)) {
                if (in == null) throw new IOException("no library file " + name);
                Files.copy(in, copy);
            }
            copy.toFile().setReadOnly();
        }
        return copy;
    }
}
