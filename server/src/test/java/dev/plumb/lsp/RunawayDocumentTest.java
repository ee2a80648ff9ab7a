package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * A document whose evaluation would run for ever (its work doubles with each of 60 levels of
 * functions) cannot take the server with it: closing it stops its work, and the other documents
 * are answered.
 */
class RunawayDocumentTest {
    @TempDir
    Path dir;
    TestClient client;

    @AfterEach
    void shutDown() throws Exception {
        if (client != null) client.remote.shutdown().get(30, TimeUnit.SECONDS);
    }

    private static String doubling() {
        StringBuilder b = new StringBuilder("f0(x) = x\n");
        for (int k = 1; k <= 60; k++) b.append("f").append(k).append("(x) = f").append(k - 1).append("(x) + f").append(k - 1)
            .append("(x)\n");
        return b.append("y = f60(1)\n").toString();
    }

    private CompletableFuture<Hover> hover(String uri, int line, int character) {
        return client.remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri),
            new Position(line, character)));
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void closingARunawayDocumentFreesTheServerForTheOthers() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Files.createDirectories(dir.resolve(".git"));
        String ok = client.openAnalysed(dir.resolve("ok.plumb"), "input L = 2 m\nA = L * 3 m\n");
        Path runaway = dir.resolve("runaway.plumb");
        Files.writeString(runaway, doubling());
        String bad = runaway.toUri().toString();
        client.open(bad, doubling());
        // Two requests on the runaway document take both request threads while its text is analysed.
        CompletableFuture<Hover> first = hover(bad, 61, 0);
        CompletableFuture<Hover> second = hover(bad, 61, 1);
        client.remote.getTextDocumentService().didClose(new DidCloseTextDocumentParams(new TextDocumentIdentifier(bad)));
        long start = System.nanoTime();
        Hover answer = hover(ok, 1, 0).get(60, TimeUnit.SECONDS);
        double seconds = (System.nanoTime() - start) / 1e9;
        assertNotNull(answer, "the other document is answered");
        assertTrue(seconds < 15, "answered in " + seconds + " s");
        // The closed document's requests end too, with no answer for a document no longer open.
        first.get(60, TimeUnit.SECONDS);
        second.get(60, TimeUnit.SECONDS);
    }
}
