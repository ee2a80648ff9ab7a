package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** A calc from someone else, open in the editor: size limit, links out, control characters; where its report goes. */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class UntrustedDocumentsTest {
    @TempDir
    Path dir;
    private TestClient client;

    @AfterEach
    void stop() throws Exception {
        if (client != null) TestClient.close(client);
    }

    private PublishDiagnosticsParams openAndWait(Path file, String text) throws Exception {
        Files.writeString(file, text);
        String uri = file.toUri().toString();
        client.open(uri, text);
        return client.diagnostics(uri, 1);
    }

    @Test
    void aDocumentOverTheSizeLimitGetsOneFinding() throws Exception {
        JsonObject options = new JsonObject();
        options.addProperty("maxFileBytes", 1024);
        client = new TestClient(TestClient.withInlayHints(), options);
        Files.createDirectories(dir.resolve(".git"));
        PublishDiagnosticsParams p = openAndWait(dir.resolve("big.plumb"), "a = 1\n".repeat(400));
        assertEquals(1, p.getDiagnostics().size(), p::toString);
        assertEquals("file.unreadable", p.getDiagnostics().get(0).getCode().getLeft());
        assertTrue(p.getDiagnostics().get(0).getMessage().getLeft().contains("larger than 1 KiB"), p::toString);
    }

    @Test
    void aLinkOutOfTheWorkspaceShowsNothingOfTheOutsideFile() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Path ws = Files.createDirectories(dir.resolve("ws"));
        Files.createDirectories(ws.resolve(".git"));
        Path outside = Files.createDirectories(dir.resolve("outside"));
        Files.writeString(outside.resolve("secret.plumb"), "hunter2_token = 1\n");
        Files.createSymbolicLink(ws.resolve("linkdir"), outside);
        PublishDiagnosticsParams p = openAndWait(ws.resolve("main.plumb"), "use \"linkdir/secret.plumb\"\ny = hunter2_token\n");
        String all = p.toString();
        assertTrue(p.getDiagnostics().stream().anyMatch(d -> d.getMessage().getLeft().contains("no such file in the workspace")), p::toString);
        // The only mention of the name is the document's own text quoted back: unknown, not defined.
        assertFalse(all.contains("hunter2_token = 1"), all);
    }

    @Test
    void hoverShowsControlCharactersOfANoteAsEscapes() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Files.createDirectories(dir.resolve(".git"));
        String uri = client.openAnalysed(dir.resolve("note.plumb"),
            "input x = 2 m  \"\u001b]0;owned\u0007 span \u202Eevil\"\ny = x * 2\n");
        Hover h = client.remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri),
            new Position(0, 7))).get(30, TimeUnit.SECONDS);
        String text = h.getContents().getRight().getValue();
        assertTrue(text.contains("\\u001B]0;owned\\u0007"), text);
        assertFalse(text.chars().anyMatch(c -> c != '\n' && c != '\t' && dev.plumb.diagnostics.Printable.unsafe(c)), text);
    }

    @Test
    void theReportOfACalcInAFolderLinkedFromOutsideIsNotWrittenThere() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Path ws = Files.createDirectories(dir.resolve("ws"));
        Files.createDirectories(ws.resolve(".git"));
        Path outside = Files.createDirectories(dir.resolve("outside"));
        Files.writeString(outside.resolve("pod.plumb"), "x = 1 m\n");
        Files.createSymbolicLink(ws.resolve("linkdir"), outside);
        String uri = client.openAnalysed(ws.resolve("linkdir").resolve("pod.plumb"), "title \"Linked pod\"\nx = 2 m\n");

        JsonObject result = WriteReportTest.writeReport(client, uri);
        Path report = Path.of(result.get("path").getAsString());
        try {
            assertEquals("Wrote the report of pod.plumb to a temporary file, " + report
                + ", because the calc or its folder lies outside the workspace", result.get("message").getAsString());
            assertTrue(Files.readString(report).contains("<title>Linked pod</title>"));
            assertEquals(List.of(outside.resolve("pod.plumb")), WriteReportTest.listing(outside));
        } finally {
            Files.deleteIfExists(report);
            Files.deleteIfExists(report.getParent());
        }
    }

    @Test
    void aLinkNamedLikeTheReportIsReplacedNotWrittenThrough() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Path ws = Files.createDirectories(dir.resolve("ws"));
        Files.createDirectories(ws.resolve(".git"));
        Path victim = Files.writeString(Files.createDirectories(dir.resolve("home")).resolve("notes.html"), "the engineer's own");
        Path link = Files.createSymbolicLink(ws.resolve("pod.html"), victim);
        String uri = client.openAnalysed(ws.resolve("pod.plumb"), "title \"Pod\"\nx = 2 m\n");

        JsonObject result = WriteReportTest.writeReport(client, uri);
        assertEquals(link.toString(), result.get("path").getAsString());
        assertEquals("the engineer's own", Files.readString(victim));
        assertFalse(Files.isSymbolicLink(link), "the link itself is replaced by the report");
        assertTrue(Files.readString(link).contains("<title>Pod</title>"));
    }

    @Test
    void controlCharactersOfTheCalcsNameAreEscapedInTheCommandsMessage() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Files.createDirectories(dir.resolve(".git"));
        String uri = client.openAnalysed(dir.resolve("pod\u001b]0;owned\u0007.plumb"), "x = 2 m\n");
        String message = WriteReportTest.writeReport(client, uri).get("message").getAsString();
        assertEquals("Wrote the report of pod\\u001B]0;owned\\u0007.plumb beside it: " + dir.resolve("pod\\u001B]0;owned\\u0007.html"),
            message);
    }
}
