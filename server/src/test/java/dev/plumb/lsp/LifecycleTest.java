package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.logging.Handler;
import java.util.logging.LogRecord;
import java.util.logging.Logger;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The protocol's lifecycle and framing over raw JSON-RPC bytes, as a careless or hostile client
 * sends them: requests too early or too late, missing params, broken headers.
 */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class LifecycleTest {
    private OutputStream toServer;
    private final BlockingQueue<JsonObject> fromServer = new LinkedBlockingQueue<>();
    private final ByteArrayOutputStream serverLog = new ByteArrayOutputStream();
    private final List<LogRecord> logged = new ArrayList<>();
    private final Handler recorder = new Handler() {
        @Override
        public void publish(LogRecord r) {
            synchronized (logged) {
                logged.add(r);
            }
        }

        @Override
        public void flush() {
        }

        @Override
        public void close() {
        }
    };
    private final Logger rpcLog = Logger.getLogger("org.eclipse.lsp4j.jsonrpc.RemoteEndpoint");
    private int nextId = 1;

    @BeforeEach
    void start() throws IOException {
        PipedInputStream serverIn = new PipedInputStream(1 << 20);
        toServer = new PipedOutputStream(serverIn);
        PipedInputStream clientIn = new PipedInputStream(1 << 20);
        PipedOutputStream serverOut = new PipedOutputStream(clientIn);
        PlumbLauncher.create(new PlumbLanguageServer(), serverIn, serverOut,
            new PrintStream(serverLog, true, StandardCharsets.UTF_8)).startListening();
        Thread reader = new Thread(() -> readFrames(clientIn), "test-reader");
        reader.setDaemon(true);
        reader.start();
        rpcLog.addHandler(recorder);
    }

    @AfterEach
    void stop() {
        rpcLog.removeHandler(recorder);
    }

    private void readFrames(InputStream in) {
        try {
            while (true) {
                int length = -1;
                StringBuilder line = new StringBuilder();
                int c;
                while ((c = in.read()) != -1) {
                    if (c == '\n') {
                        String l = line.toString().trim();
                        line.setLength(0);
                        if (l.isEmpty()) break;
                        if (l.startsWith("Content-Length:")) length = Integer.parseInt(l.substring(15).trim());
                    } else {
                        line.append((char) c);
                    }
                }
                if (c == -1) return;
                byte[] body = in.readNBytes(length);
                JsonObject o = JsonParser.parseString(new String(body, StandardCharsets.UTF_8)).getAsJsonObject();
                if (o.has("id") && (o.has("result") || o.has("error"))) fromServer.add(o);
            }
        } catch (IOException e) {
            // the pipe closed at the end of the test
        }
    }

    private void sendRaw(String s) throws IOException {
        toServer.write(s.getBytes(StandardCharsets.UTF_8));
        toServer.flush();
    }

    private static String frame(String json) {
        return "Content-Length: " + json.getBytes(StandardCharsets.UTF_8).length + "\r\n\r\n" + json;
    }

    private static String request(int id, String method, String params) {
        return "{\"jsonrpc\":\"2.0\",\"id\":" + id + ",\"method\":\"" + method + "\"" + (params == null ? "" : ",\"params\":" + params)
            + "}";
    }

    /** Sends a request and returns its response. */
    private JsonObject call(String method, String params) throws Exception {
        int id = nextId++;
        sendRaw(frame(request(id, method, params)));
        return response(id);
    }

    private JsonObject response(int id) throws InterruptedException {
        while (true) {
            JsonObject o = fromServer.poll(30, TimeUnit.SECONDS);
            if (o == null) throw new AssertionError("no response to request " + id + "; server said: " + serverLog);
            if (o.get("id").getAsInt() == id) return o;
        }
    }

    private static int errorCode(JsonObject response) {
        assertTrue(response.has("error"), response::toString);
        return response.getAsJsonObject("error").get("code").getAsInt();
    }

    private static final String INIT = "{\"capabilities\":{}}";
    private static final String HOVER = "{\"textDocument\":{\"uri\":\"file:///tmp/x.plumb\"},\"position\":{\"line\":0,\"character\":0}}";

    @Test
    void requestsBeforeInitializeAreRefusedWithServerNotInitialized() throws Exception {
        assertEquals(-32002, errorCode(call("textDocument/hover", HOVER)));
        assertTrue(call("initialize", INIT).has("result"));
        assertFalse(call("textDocument/hover", HOVER).has("error"));
    }

    @Test
    void aSecondInitializeIsAnError() throws Exception {
        assertTrue(call("initialize", INIT).has("result"));
        assertEquals(-32600, errorCode(call("initialize", INIT)));
    }

    @Test
    void requestsAfterShutdownAreRefusedAndNotificationsDroppedQuietly() throws Exception {
        call("initialize", INIT);
        assertTrue(call("shutdown", null).has("result"));
        sendRaw(frame("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{\"textDocument\":"
            + "{\"uri\":\"file:///tmp/x.plumb\",\"languageId\":\"plumb\",\"version\":1,\"text\":\"x = 1\"}}}"));
        sendRaw(frame("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didChange\",\"params\":{\"textDocument\":"
            + "{\"uri\":\"file:///tmp/x.plumb\",\"version\":2},\"contentChanges\":[{\"text\":\"y = 2\"}]}}"));
        assertEquals(-32600, errorCode(call("textDocument/hover", HOVER)));
        synchronized (logged) {
            assertEquals(List.of(), logged.stream().filter(r -> r.getThrown() != null).map(r -> r.getThrown().toString()).toList());
        }
    }

    @Test
    void aRequestWithoutParamsGetsInvalidParamsAndNoTrace() throws Exception {
        call("initialize", INIT);
        for (String method : List.of("textDocument/hover", "textDocument/completion", "textDocument/definition",
            "textDocument/formatting", "workspace/symbol")) {
            JsonObject r = call(method, null);
            assertEquals(-32602, errorCode(r), method);
            assertFalse(r.getAsJsonObject("error").has("data"), r::toString);
        }
    }

    @Test
    void aFailingHandlerAnswersWithoutAStackTrace() throws Exception {
        call("initialize", INIT);
        // Params of the wrong shape: the handler meets nulls where it expects a position.
        JsonObject r = call("textDocument/hover", "{\"textDocument\":{}}");
        if (r.has("error")) {
            JsonElement data = r.getAsJsonObject("error").get("data");
            assertTrue(data == null || data.isJsonNull(), r::toString);
            assertFalse(r.toString().contains("\\tat "), r::toString);
        }
    }

    @Test
    void messagesWithABrokenContentLengthAreSkippedAndTheStreamRecovers() throws Exception {
        call("initialize", INIT);
        sendRaw("Content-Type: application/vscode-jsonrpc\r\n\r\n" + request(900, "textDocument/hover", HOVER));
        sendRaw("Content-Length: twelve\r\n\r\n" + request(901, "textDocument/hover", HOVER));
        sendRaw("Content-Length: 99999999999999\r\n\r\n" + request(902, "textDocument/hover", HOVER));
        JsonObject after = call("textDocument/hover", HOVER);
        assertFalse(after.has("error"), after::toString);
        String log = serverLog.toString(StandardCharsets.UTF_8);
        assertTrue(log.contains("skipped a message without a valid Content-Length header"), log);
    }

    @Test
    void aNotificationThatFailsIsOneLineAndABrokenBodyIsAnErrorNotAHang() throws Exception {
        call("initialize", INIT);
        sendRaw(frame("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{\"textDocument\":{}}}"));
        sendRaw(frame("{\"jsonrpc\":\"2.0\",\"id\":800,\"method\":\"textDocument/hover\",\"params\":{\"textDocument\":"));
        JsonObject after = call("textDocument/hover", HOVER);
        assertFalse(after.has("error"), after::toString);
        synchronized (logged) {
            assertEquals(List.of(), logged.stream().filter(r -> r.getThrown() != null).map(r -> r.getThrown().toString()).toList());
        }
        String log = serverLog.toString(StandardCharsets.UTF_8);
        assertTrue(log.contains("plumb lsp: could not handle textDocument/didOpen"), log);
        assertFalse(log.contains("\tat "), log);
    }
}
