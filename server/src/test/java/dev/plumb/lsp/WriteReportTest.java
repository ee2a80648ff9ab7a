package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.Gson;
import com.google.gson.JsonObject;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.ExecuteCommandParams;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** The command plumb.writeReport over JSON-RPC: where the report goes, what it holds, what is refused. */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class WriteReportTest {
    private static final String POD = "title \"Camera pod: drag\"\ninput d = 150 mm\nA = pi / 4 * d^2   in cm^2\n";

    @TempDir
    Path dir;
    private TestClient client;
    private final List<Path> temporaryReports = new ArrayList<>();

    @BeforeEach
    void start() throws Exception {
        client = new TestClient(TestClient.withInlayHints(), null);
        Files.createDirectories(dir.resolve(".git"));
    }

    @AfterEach
    void stop() throws Exception {
        TestClient.close(client);
        // The temporary folder is the server's, outside the test's: leave nothing behind there.
        for (Path report : temporaryReports) {
            Files.deleteIfExists(report);
            Files.deleteIfExists(report.getParent());
        }
    }

    /** Runs the command with these arguments; its result as JSON. */
    static JsonObject writeReport(TestClient client, Object... arguments) throws Exception {
        Object result = client.remote.getWorkspaceService()
            .executeCommand(new ExecuteCommandParams(WriteReport.COMMAND, Arrays.asList(arguments)))
            .get(30, TimeUnit.SECONDS);
        return new Gson().toJsonTree(result).getAsJsonObject();
    }

    /** The JSON-RPC error a command is answered with. */
    private ResponseErrorException refusal(String command, List<Object> arguments) {
        ExecutionException e = assertThrows(ExecutionException.class, () -> client.remote.getWorkspaceService()
            .executeCommand(new ExecuteCommandParams(command, arguments)).get(30, TimeUnit.SECONDS));
        assertTrue(e.getCause() instanceof ResponseErrorException, e.toString());
        return (ResponseErrorException) e.getCause();
    }

    private Path temporary(JsonObject result) {
        Path report = Path.of(result.get("path").getAsString());
        temporaryReports.add(report);
        return report;
    }

    @Test
    void theServerOffersTheCommand() {
        assertEquals(List.of("plumb.showValue", "plumb.writeReport"),
            client.initialized.getCapabilities().getExecuteCommandProvider().getCommands());
    }

    @Test
    void theReportOfTheTextAsTypedIsWrittenBesideTheCalc() throws Exception {
        Path calcs = Files.createDirectories(dir.resolve("calcs"));
        Path calc = calcs.resolve("pod.plumb");
        Files.writeString(calc, "title \"As saved\"\n");
        String uri = calc.toUri().toString();
        client.open(uri, POD);

        JsonObject result = writeReport(client, uri);
        Path report = calcs.resolve("pod.html");
        assertEquals(report.toUri().toString(), result.get("uri").getAsString());
        assertEquals(report.toString(), result.get("path").getAsString());
        assertTrue(result.get("beside").getAsBoolean());
        assertEquals("Wrote the report of pod.plumb beside it: " + report, result.get("message").getAsString());
        String html = Files.readString(report);
        assertTrue(html.startsWith("<!DOCTYPE html>"), html);
        assertTrue(html.contains("<title>Camera pod: drag</title>"), "the unsaved text, not the file's");
        assertFalse(html.contains("As saved"), html);
        assertTrue(html.contains("calcs/pod.plumb"), "the path from the workspace root");
        assertEquals(List.of(report, calc), listing(calcs), "nothing else is left in the folder");

        // After an edit the report follows the buffer.
        client.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
            new VersionedTextDocumentIdentifier(uri, 2),
            List.of(new TextDocumentContentChangeEvent(POD.replace("Camera pod", "Lamp pod")))));
        writeReport(client, uri);
        assertTrue(Files.readString(report).contains("<title>Lamp pod: drag</title>"));
    }

    @Test
    void theArgumentMayBeAnObjectWithTheUri() throws Exception {
        Path calc = dir.resolve("pod.plumb");
        String uri = client.openAnalysed(calc, POD);
        JsonObject identifier = new JsonObject();
        identifier.addProperty("uri", uri);
        assertEquals(dir.resolve("pod.html").toString(), writeReport(client, identifier).get("path").getAsString());
    }

    @Test
    void aFolderInTheWayOfTheReportSendsItToATemporaryFile() throws Exception {
        Path calc = dir.resolve("pod.plumb");
        String uri = client.openAnalysed(calc, POD);
        Path inTheWay = Files.createDirectories(dir.resolve("pod.html"));
        Files.writeString(inTheWay.resolve("keep.txt"), "kept");

        JsonObject result = writeReport(client, uri);
        Path report = temporary(result);
        assertFalse(result.get("beside").getAsBoolean());
        assertEquals("pod.html", report.getFileName().toString());
        assertTrue(report.getParent().getFileName().toString().startsWith("plumb-reports-"), report.toString());
        assertEquals(Path.of(System.getProperty("java.io.tmpdir")).toAbsolutePath(), report.getParent().getParent());
        assertTrue(result.get("message").getAsString().startsWith("Wrote the report of pod.plumb to a temporary file, "
            + report + ", because writing beside it failed ("), result.toString());
        assertTrue(Files.readString(report).contains("<title>Camera pod: drag</title>"));
        assertEquals(List.of(inTheWay.resolve("keep.txt")), listing(inTheWay));
        assertEquals("kept", Files.readString(inTheWay.resolve("keep.txt")));
    }

    @Test
    void anUnsavedCalcGetsATemporaryReport() throws Exception {
        Path calc = dir.resolve("new.plumb");
        String uri = calc.toUri().toString();
        client.open(uri, POD);
        JsonObject result = writeReport(client, uri);
        Path report = temporary(result);
        assertEquals("Wrote the report of new.plumb to a temporary file, " + report
            + ", because the calc is not saved as a file", result.get("message").getAsString());
        assertEquals(List.of(dir.resolve(".git")), listing(dir), "nothing is written beside a calc that is not saved");
    }

    @Test
    void badArgumentsAreRefusedInWordsAndTheServerCarriesOn() throws Exception {
        String open = client.openAnalysed(dir.resolve("pod.plumb"), POD);
        client.open("untitled:Untitled-1", POD);
        String closed = client.openAnalysed(dir.resolve("closed.plumb"), POD);
        client.remote.getTextDocumentService().didClose(new DidCloseTextDocumentParams(new TextDocumentIdentifier(closed)));
        String needsUri = "plumb.writeReport needs the calc's document URI as its argument, e.g. [\"file:///work/pod.plumb\"]";
        List<List<Object>> arguments = List.of(List.of(), List.of(42), List.of(List.of(open)), List.of("pod plumb"),
            List.of("untitled:Untitled-1"), List.of("file:pod.plumb"), List.of(dir.resolve("other.plumb").toUri().toString()),
            List.of(closed));
        List<String> expected = List.of(
            needsUri,
            "plumb.writeReport takes the calc's document URI, a string (or an object with a \"uri\"), as its first argument, not 42",
            "plumb.writeReport takes the calc's document URI, a string (or an object with a \"uri\"), as its first argument, not [\""
                + open + "\"]",
            "\"pod plumb\" is not a URI: give the calc's document URI, e.g. file:///work/pod.plumb",
            "\"untitled:Untitled-1\" is not a file: save the calc as a .plumb file, then write its report",
            "\"file:pod.plumb\" names no file on this machine: give a URI such as file:///work/pod.plumb",
            "\"" + dir.resolve("other.plumb").toUri() + "\" is not open in the editor: the report is made from the text the "
                + "editor has, so open the calc first",
            "\"" + closed + "\" is not open in the editor: the report is made from the text the editor has, so open the calc first");
        List<String> got = new ArrayList<>();
        for (List<Object> a : arguments) {
            ResponseErrorException e = refusal(WriteReport.COMMAND, a);
            assertEquals(ResponseErrorCode.InvalidParams.getValue(), e.getResponseError().getCode(), a.toString());
            got.add(e.getResponseError().getMessage());
        }
        assertEquals(expected, got);
        assertEquals(needsUri, refusal(WriteReport.COMMAND, null).getResponseError().getMessage());
        assertEquals("Plumb has no command \"plumb.nothing\"; its commands are plumb.showValue and plumb.writeReport",
            refusal("plumb.nothing", List.of(open)).getResponseError().getMessage());

        assertEquals(List.of(dir.resolve(".git"), dir.resolve("closed.plumb"), dir.resolve("pod.plumb")), listing(dir),
            "a refused command writes nothing");
        assertTrue(client.remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(open),
            new Position(1, 7))).get(30, TimeUnit.SECONDS).getContents().getRight().getValue().contains("**d** = 150 mm"));
        assertTrue(writeReport(client, open).get("beside").getAsBoolean());
    }

    static List<Path> listing(Path folder) throws java.io.IOException {
        try (var files = Files.list(folder)) {
            return files.sorted().toList();
        }
    }
}
