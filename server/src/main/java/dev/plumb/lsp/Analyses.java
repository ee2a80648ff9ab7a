package dev.plumb.lsp;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.ImportMemory;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import java.util.function.Supplier;

/**
 * Runs the engine for open documents off the message thread: debounced per document, the
 * newest edit cancelling a pending run, and a result published only while its version is still
 * the document's version, so a stale result never overwrites a newer one. Documents that `use`
 * an edited file are re-run too.
 */
final class Analyses {
    /**
     * An analysis, the document version it was made from, and the engine settings it was made
     * with: after a settings change a result made under the old ones is stale even at the same
     * version (a run that started before the change may finish after it).
     */
    record Result(int version, Settings settings, Analysis analysis, int generation) {
    }

    private final DocumentStore documents;
    private final Supplier<ServerSettings> settings;
    private final Consumer<OpenDocumentResult> publisher;
    /** Told when an analysis fails outright (a fault of ours): the editor should say so. */
    private final Consumer<String> trouble;
    private final ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(daemon("plumb-debounce"));
    private final ExecutorService workers = Executors.newFixedThreadPool(
        Math.max(1, Runtime.getRuntime().availableProcessors()), Workspace.threadFactory());
    private final Map<String, Result> latest = new ConcurrentHashMap<>();
    private final Map<String, ScheduledFuture<?>> pending = new ConcurrentHashMap<>();
    /**
     * The run under way for each document: a request that arrives while the edit's own run is
     * working waits for that run instead of starting a second one beside it.
     */
    private final Map<String, Run> running = new ConcurrentHashMap<>();

    /** One engine run: what it is for (see {@link Result}), and its analysis when done (null if superseded). */
    private record Run(int version, Settings settings, int generation, java.util.concurrent.CompletableFuture<Analysis> analysis) {
    }

    /**
     * For each document, how many times what it uses changed beneath it (a used file was edited,
     * files changed on disk): a result or run of an earlier generation is out of date even at the
     * same version and settings. The parse it holds is still worth reparsing from.
     */
    private final Map<String, Integer> generations = new ConcurrentHashMap<>();

    /** What is published: the document and its fresh analysis. */
    record OpenDocumentResult(OpenDocument document, Analysis analysis) {
    }

    /** What runs the engine on a document's text: the workspace of open buffers and files. */
    interface Engine {
        /** @param earlier the document's last analysis, whatever its version (null for none): what an edit can reuse */
        Analysis analyze(Path file, String text, Analysis earlier, BooleanSupplier superseded, Settings settings);

        /** Drops whatever it keeps between runs (settings or files outside the editor changed). */
        default void forgetKept() {
        }
    }

    /**
     * The engine over the open buffers and the files, keeping used files' analyses between runs
     * ({@link ImportMemory}): typing in a calc does not analyse the files it uses again.
     */
    static Engine workspaceEngine(DocumentStore documents, java.util.function.LongSupplier maxBytes) {
        AtomicReference<ImportMemory> kept = new AtomicReference<>(new ImportMemory());
        return new Engine() {
            @Override
            public Analysis analyze(Path file, String text, Analysis earlier, BooleanSupplier superseded, Settings s) {
                return new Workspace(new OverlaySources(documents, maxBytes.getAsLong()), s, kept.get())
                    .analyzeEdit(file, text, earlier, superseded);
            }

            @Override
            public void forgetKept() {
                kept.set(new ImportMemory());
            }
        };
    }

    private final Engine engine;

    Analyses(DocumentStore documents, Supplier<ServerSettings> settings, Consumer<OpenDocumentResult> publisher,
             Consumer<String> trouble) {
        this(documents, settings, publisher, trouble, workspaceEngine(documents, () -> settings.get().maxFileBytes()));
    }

    Analyses(DocumentStore documents, Supplier<ServerSettings> settings, Consumer<OpenDocumentResult> publisher,
             Consumer<String> trouble, Engine engine) {
        this.engine = engine;
        this.documents = documents;
        this.settings = settings;
        this.publisher = publisher;
        this.trouble = trouble;
    }

    private static java.util.concurrent.ThreadFactory daemon(String name) {
        return r -> {
            Thread t = new Thread(r, name);
            t.setDaemon(true);
            return t;
        };
    }

    /** After an edit: run again after the debounce delay, and re-run the documents that use this one. */
    void schedule(String uri) {
        ScheduledFuture<?> previous = pending.remove(uri);
        if (previous != null) previous.cancel(false);
        int delay = settings.get().debounceMs();
        pending.put(uri, timer.schedule(() -> workers.submit(() -> run(uri)), delay, TimeUnit.MILLISECONDS));
    }

    void forget(String uri) {
        ScheduledFuture<?> previous = pending.remove(uri);
        if (previous != null) previous.cancel(false);
        latest.remove(uri);
        // A run still going for the closed text must not be kept for a reopened one at the same version.
        generations.merge(uri, 1, Integer::sum);
    }

    /** The analysis of a document's current text, made now (or awaited from the run making it) if the last one is stale. */
    Analysis current(String uri) {
        OpenDocument d = documents.get(uri);
        if (d == null) return null;
        return analysisOf(d, engineSettings());
    }

    /**
     * The analysis of this version of a document under these settings: the kept one, the one a
     * run under way is making, or one made now. Null when an edit or a close made it pointless.
     */
    private Analysis analysisOf(OpenDocument d, Settings s) {
        int generation = generations.getOrDefault(d.uri(), 0);
        Result r = latest.get(d.uri());
        if (r != null && r.generation() == generation && r.version() == d.version() && r.settings().equals(s)) {
            return r.analysis();
        }
        java.util.concurrent.CompletableFuture<Analysis> mine = new java.util.concurrent.CompletableFuture<>();
        Run run = running.compute(d.uri(), (k, now) -> now != null && now.generation() == generation
            && now.version() == d.version() && now.settings().equals(s) ? now : new Run(d.version(), s, generation, mine));
        if (run.analysis() != mine) return awaited(run);
        try {
            // A run stops, whoever asked for it, once an edit or a close makes it pointless.
            Analysis a = analyze(d, s, () -> {
                OpenDocument now = documents.get(d.uri());
                return now == null || now.version() != d.version();
            });
            if (a != null) store(d, s, generation, a);
            mine.complete(a);
            return a;
        } catch (RuntimeException | Error e) {
            mine.completeExceptionally(e);
            throw e;
        } finally {
            running.remove(d.uri(), run);
        }
    }

    /** What another thread's run made; its failure is thrown here as it was there. */
    private static Analysis awaited(Run run) {
        try {
            return run.analysis().join();
        } catch (java.util.concurrent.CompletionException e) {
            if (e.getCause() instanceof RuntimeException re) throw re;
            if (e.getCause() instanceof Error err) throw err;
            throw e;
        }
    }

    private void run(String uri) {
        OpenDocument d = documents.get(uri);
        if (d == null) return;
        try {
            Settings s = engineSettings();
            Analysis a = analysisOf(d, s);
            // Published only while it is still the document's current result.
            Result kept = latest.get(uri);
            if (a == null || kept == null || kept.analysis() != a) return;
            publisher.accept(new OpenDocumentResult(d, a));
            for (String user : usersOf(d.path(), uri)) {
                generations.merge(user, 1, Integer::sum);
                schedule(user);
            }
        } catch (RuntimeException | StackOverflowError | OutOfMemoryError e) {
            System.err.println("plumb: analysis of " + uri + " failed: " + e);
            trouble.accept("Plumb could not check " + d.path().getFileName() + " (" + e
                + "); the problems shown for it may be out of date. Please report this, with the file.");
        }
    }

    /** Keeps a result only while it belongs to the document's current version and the current settings. */
    private boolean store(OpenDocument d, Settings made, int generation, Analysis a) {
        OpenDocument now = documents.get(d.uri());
        if (now == null || now.version() != d.version() || !made.equals(engineSettings())
            || generation != generations.getOrDefault(d.uri(), 0)) {
            return false;
        }
        latest.put(d.uri(), new Result(d.version(), made, a, generation));
        return true;
    }

    /** The engine's options from the server's settings as they are now. */
    private Settings engineSettings() {
        ServerSettings now = settings.get();
        return new Settings(now.digits(), Settings.DEFAULT.equalityTolerance(), now.criticalReynolds())
            .withSamples(now.monteCarloSamples(), now.monteCarloSeed());
    }

    /** The engine on a document's text; null when a newer edit made the run pointless on the way. */
    private Analysis analyze(OpenDocument d, Settings s, BooleanSupplier superseded) {
        // The last result, whatever version it was: only the edited part is read again, and only
        // the values the edit can have changed are evaluated again.
        Result last = latest.get(d.uri());
        return engine.analyze(d.path(), d.text(), last == null ? null : last.analysis(), superseded, s);
    }

    /** Open documents that use this path, directly or through other files. */
    private Set<String> usersOf(Path path, String self) {
        Set<String> users = new HashSet<>();
        Deque<Path> todo = new ArrayDeque<>();
        todo.add(path);
        Set<Path> seen = new HashSet<>();
        while (!todo.isEmpty()) {
            Path p = todo.poll();
            if (!seen.add(p)) continue;
            for (Map.Entry<String, Result> e : latest.entrySet()) {
                if (e.getKey().equals(self)) continue;
                if (e.getValue().analysis().imports().contains(p)) {
                    users.add(e.getKey());
                    todo.add(e.getValue().analysis().file());
                }
            }
        }
        return users;
    }

    /** Every open document again (settings or files on disk changed): earlier results are void. */
    void scheduleAll() {
        latest.clear();
        for (OpenDocument d : documents.all()) generations.merge(d.uri(), 1, Integer::sum);
        engine.forgetKept();
        for (OpenDocument d : documents.all()) schedule(d.uri());
    }

    void shutdown() {
        timer.shutdownNow();
        workers.shutdownNow();
    }
}
