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
    void aRunStartedBeforeASettingsChangeIsNotKeptAfterIt() throws Exception {
        DocumentStore documents = new DocumentStore(new Positions.Enc());
        java.util.concurrent.atomic.AtomicReference<ServerSettings> settings =
            new java.util.concurrent.atomic.AtomicReference<>(ServerSettings.DEFAULT);
        java.util.concurrent.CountDownLatch started = new java.util.concurrent.CountDownLatch(1);
        java.util.concurrent.CountDownLatch release = new java.util.concurrent.CountDownLatch(1);
        Analyses analyses = new Analyses(documents, settings::get, r -> { }, m -> { },
            (file, text, earlier, superseded, engine) -> {
                // The first run (under the old settings) waits until the settings have changed.
                if (engine.significantFigures() == 4) {
                    started.countDown();
                    try {
                        release.await(10, TimeUnit.SECONDS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                }
                return new dev.plumb.analysis.Workspace(new dev.plumb.analysis.FileSources(), engine).analyzeText(file, text);
            });
        try {
            documents.open("file:///tmp/race.plumb", "x = 2 / 3\n", 1);
            var old = java.util.concurrent.CompletableFuture.supplyAsync(() -> analyses.current("file:///tmp/race.plumb"));
            assertTrue(started.await(10, TimeUnit.SECONDS));
            settings.set(settings.get().with(com.google.gson.JsonParser.parseString("{\"significantFigures\": 6}")));
            release.countDown();
            assertEquals(4, old.get(10, TimeUnit.SECONDS).settings().significantFigures(), "the old run answers its own request");
            // Same version, new settings: the old result is not what the document reads as now.
            assertEquals(6, analyses.current("file:///tmp/race.plumb").settings().significantFigures());
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
