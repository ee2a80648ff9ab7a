package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Thousands of random incremental edits — inserts and deletes across lines, with characters of
 * one, two and four UTF-8 bytes and surrogate pairs — after which the server's text and
 * diagnostics equal those of a fresh open of the same text.
 */
class RandomEditsTest {
    private static final String[] PIECES = {"x", "=", " ", "\n", "1", "2.5", " m", "kg/m³", "°C", "µ", "ρ", "😀", "𝑥",
        "+", "*", "(", ")", "# note", "input ", "check ", "\"why\"", "\r\n", "²"};

    @TempDir
    Path dir;

    @Test
    void serverTextAndDiagnosticsMatchAFreshOpen() throws Exception {
        // No debounce: many runs start, most are overtaken, each reparses from the last that finished.
        com.google.gson.JsonObject options = new com.google.gson.JsonObject();
        options.addProperty("debounceMs", 0);
        TestClient client = new TestClient(new ClientCapabilities(), options);
        try {
            Files.createDirectories(dir.resolve(".git"));
            Path file = dir.resolve("edits.plumb");
            String text = "input rho = 1.2 kg/m^3\nq = 0.5 * rho * (20 m/s)^2\n";
            Files.writeString(file, text);
            String uri = file.toUri().toString();
            client.open(uri, text);
            Random random = new Random(20261202L);
            int version = 1;
            for (int round = 0; round < 3000; round++) {
                int start = random.nextInt(text.length() + 1);
                int end = Math.min(text.length(), start + random.nextInt(6));
                // Never split a surrogate pair or a CRLF: the protocol cannot address inside them.
                start = boundary(text, start);
                end = Math.max(start, boundary(text, end));
                String insert = random.nextInt(3) == 0 ? "" : PIECES[random.nextInt(PIECES.length)];
                Range range = new Range(position(text, start), position(text, end));
                text = text.substring(0, start) + insert + text.substring(end);
                version++;
                client.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
                    new VersionedTextDocumentIdentifier(uri, version), List.of(new TextDocumentContentChangeEvent(range, insert))));
                // Every 250 edits, the last of them included.
                if ((round + 1) % 250 == 0) assertMatchesFreshOpen(client, uri, version, text);
            }
        } finally {
            TestClient.close(client);
        }
    }

    private static void assertMatchesFreshOpen(TestClient client, String uri, int version, String text) throws Exception {
        var published = client.diagnostics(uri, version);
        assertEquals(text, client.server.documents().get(uri).text());
        var fresh = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(Path.of(java.net.URI.create(uri)), text);
        List<String> expected = new ArrayList<>();
        for (var d : fresh.diagnostics()) {
            expected.add(d.code().id() + " " + Positions.range(text, d.span().start(), d.span().end(),
                Positions.Encoding.UTF16) + " " + d.message());
        }
        List<String> actual = new ArrayList<>();
        for (var d : published.getDiagnostics()) {
            if (d.getCode().getLeft().equals("value")) continue;
            actual.add(d.getCode().getLeft() + " " + d.getRange() + " " + d.getMessage().getLeft());
        }
        assertEquals(expected, actual, "after " + version + " versions");
    }

    private static int boundary(String text, int i) {
        if (i > 0 && i < text.length() && Character.isLowSurrogate(text.charAt(i))) i--;
        if (i > 0 && i < text.length() && text.charAt(i) == '\n' && text.charAt(i - 1) == '\r') i--;
        return i;
    }

    /** An independent conversion: count lines and UTF-16 units by hand. */
    private static Position position(String text, int offset) {
        int line = 0;
        int col = 0;
        for (int i = 0; i < offset; i++) {
            char c = text.charAt(i);
            if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                continue;
            }
            if (c == '\n' || c == '\r') {
                line++;
                col = 0;
            } else {
                col++;
            }
        }
        return new Position(line, col);
    }

}
