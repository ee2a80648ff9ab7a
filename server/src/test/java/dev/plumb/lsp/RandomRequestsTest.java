package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.ide.RandomCalc;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.CodeLensCapabilities;
import org.eclipse.lsp4j.CodeLensParams;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentHighlightParams;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.ExecuteCommandParams;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHintCapabilities;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.SignatureHelpParams;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.services.TextDocumentService;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every request the server serves, at random places of random documents — past the last line,
 * past the end of a line, reversed ranges, names that cannot be names — is answered, never with
 * an error: an editor sends such positions while its buffer and the server briefly disagree. Writing
 * a document's report (plumb.writeReport) is one of the requests.
 */
class RandomRequestsTest {
    private static final List<String> NEW_NAMES = List.of("x_new", "", "1x", "a b", "ρ_2", "rho", "in", "q");

    @TempDir
    Path dir;

    @Test
    void everyRequestAnywhereIsAnswered() throws Exception {
        TextDocumentClientCapabilities td = new TextDocumentClientCapabilities();
        td.setInlayHint(new InlayHintCapabilities());
        td.setCodeLens(new CodeLensCapabilities());
        ClientCapabilities caps = new ClientCapabilities();
        caps.setTextDocument(td);
        TestClient client = new TestClient(caps, null);
        Files.createDirectories(dir.resolve(".git"));
        Random random = new Random(20261202L);
        int answered = 0;
        try {
            TextDocumentService s = client.remote.getTextDocumentService();
            for (int doc = 0; doc < 40; doc++) {
                String text = new RandomCalc(1_000 + doc).document();
                Path file = dir.resolve("r" + doc + ".plumb");
                Files.writeString(file, text);
                String uri = file.toUri().toString();
                client.open(uri, text);
                TextDocumentIdentifier id = new TextDocumentIdentifier(uri);
                int lines = text.split("\n", -1).length;
                for (int i = 0; i < 40; i++) {
                    Position at = new Position(random.nextInt(lines + 3), random.nextInt(random.nextBoolean() ? 8 : 160));
                    Position other = new Position(random.nextInt(lines + 3), random.nextInt(160));
                    CompletableFuture<?> f = switch (random.nextInt(17)) {
                        case 0 -> s.hover(new HoverParams(id, at));
                        case 1 -> s.definition(new DefinitionParams(id, at));
                        case 2 -> s.completion(new CompletionParams(id, at));
                        case 3 -> s.signatureHelp(new SignatureHelpParams(id, at));
                        case 4 -> s.references(new ReferenceParams(id, at, new ReferenceContext(random.nextBoolean())));
                        case 5 -> s.documentHighlight(new DocumentHighlightParams(id, at));
                        case 6 -> s.rename(new RenameParams(id, at, NEW_NAMES.get(random.nextInt(NEW_NAMES.size()))));
                        case 7 -> s.prepareRename(new PrepareRenameParams(id, at));
                        case 8 -> s.codeAction(new CodeActionParams(id, new Range(at, other), new CodeActionContext(List.of())));
                        case 9 -> s.inlayHint(new InlayHintParams(id, new Range(at, other)));
                        case 10 -> s.codeLens(new CodeLensParams(id));
                        case 11 -> s.foldingRange(new FoldingRangeRequestParams(id));
                        case 12 -> s.semanticTokensFull(new SemanticTokensParams(id));
                        case 13 -> s.documentSymbol(new DocumentSymbolParams(id));
                        case 14 -> s.formatting(new DocumentFormattingParams(id, new FormattingOptions(4, true)));
                        case 15 -> client.remote.getWorkspaceService().executeCommand(
                            new ExecuteCommandParams(WriteReport.COMMAND, List.of(uri)));
                        default -> s.diagnostic(new DocumentDiagnosticParams(id));
                    };
                    try {
                        f.get(20, TimeUnit.SECONDS);
                    } catch (ExecutionException e) {
                        // A rename the server refuses (no name there, a clash) is an answer; anything else is a fault.
                        boolean refusal = e.getCause() instanceof ResponseErrorException r
                            && r.getResponseError().getCode() == ResponseErrorCode.InvalidRequest.getValue();
                        if (!refusal) {
                            throw new AssertionError("request " + i + " at " + at + " in document " + doc + " failed: "
                                + e.getCause() + "\n" + text, e);
                        }
                    }
                    answered++;
                }
            }
        } finally {
            TestClient.close(client);
        }
        assertTrue(answered == 40 * 40);
    }
}
