package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** The scheduler around the engine: what the engineer is told when the engine itself fails. */
class AnalysesTest {
    @Test
    void aFaultOfTheEngineIsShownToTheEngineerNotSwallowed() throws Exception {
        DocumentStore documents = new DocumentStore(new Positions.Enc());
        BlockingQueue<String> told = new LinkedBlockingQueue<>();
        BlockingQueue<Analyses.OpenDocumentResult> published = new LinkedBlockingQueue<>();
        Analyses analyses = new Analyses(documents, () -> ServerSettings.DEFAULT, published::add, told::add,
            (file, text, earlier, superseded, settings) -> {
                throw new IllegalStateException("a fault planted by the test");
            });
        try {
            documents.open("file:///tmp/fault.plumb", "x = 1\n", 1);
            analyses.schedule("file:///tmp/fault.plumb");
            String message = told.poll(10, TimeUnit.SECONDS);
            assertTrue(message != null && message.startsWith("Plumb could not check fault.plumb")
                && message.contains("a fault planted by the test") && message.contains("may be out of date"), message);
            assertEquals(List.of(), List.copyOf(published));
        } finally {
            analyses.shutdown();
        }
    }

    @Test
    void runningOutOfMemoryFailsThatRunAndTheServerCarriesOn() throws Exception {
        DocumentStore documents = new DocumentStore(new Positions.Enc());
        BlockingQueue<String> told = new LinkedBlockingQueue<>();
        BlockingQueue<Analyses.OpenDocumentResult> published = new LinkedBlockingQueue<>();
        Analyses analyses = new Analyses(documents, () -> ServerSettings.DEFAULT, published::add, told::add,
            (file, text, earlier, superseded, settings) -> {
                if (text.contains("huge")) throw new OutOfMemoryError("planted by the test");
                return new dev.plumb.analysis.Workspace(new dev.plumb.analysis.FileSources(), settings).analyzeText(file, text);
            });
        try {
            documents.open("file:///tmp/huge.plumb", "huge = 1\n", 1);
            analyses.schedule("file:///tmp/huge.plumb");
            String message = told.poll(10, TimeUnit.SECONDS);
            assertTrue(message != null && message.contains("OutOfMemoryError"), message);
            documents.open("file:///tmp/small.plumb", "x = 1\n", 1);
            analyses.schedule("file:///tmp/small.plumb");
            Analyses.OpenDocumentResult r = published.poll(10, TimeUnit.SECONDS);
            assertTrue(r != null && r.document().uri().endsWith("small.plumb"), String.valueOf(r));
        } finally {
            analyses.shutdown();
        }
    }

    @Test
    void aRequestThatRunsOutOfMemoryGetsAShortErrorWithoutTrace() {
        var error = PlumbLauncher.error(new java.util.concurrent.CompletionException(new OutOfMemoryError("planted")));
        assertEquals(org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode.RequestFailed.getValue(), error.getCode());
        assertTrue(error.getMessage().contains("ran out of memory"), error.getMessage());
        assertEquals(null, error.getData());
    }
}
