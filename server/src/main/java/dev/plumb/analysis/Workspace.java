package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.ParsedSource;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The engine's entry point: analyses documents from a {@link Sources}, caching each file's
 * analysis for the life of this object (one command-line run). Thread-safe; never throws for
 * anything a user can write.
 */
public final class Workspace {
    private final Sources sources;
    private final Settings settings;
    private final Map<Path, Imported> cache = new ConcurrentHashMap<>();
    /** The names every document sees besides its own and built-ins: the standard library. */
    private final Library library;
    /** Which files use which, read from their texts. */
    private final UseGraph uses;
    /** Used files' analyses kept from earlier workspaces (an editor's), or null. */
    private final ImportMemory memory;

    public Workspace(Sources sources, Settings settings) {
        this(sources, settings, Stdlib.get().asLibrary(), null);
    }

    /** A workspace that takes used files' analyses from {@code memory} while they still hold, and adds to it. */
    public Workspace(Sources sources, Settings settings, ImportMemory memory) {
        this(sources, settings, Stdlib.get().asLibrary(), memory);
    }

    Workspace(Sources sources, Settings settings, Library library) {
        this(sources, settings, library, null);
    }

    private Workspace(Sources sources, Settings settings, Library library, ImportMemory memory) {
        this.sources = sources;
        this.settings = settings;
        this.library = library;
        this.memory = memory;
        this.uses = new UseGraph(sources, file -> {
            Imported done = cache.get(file);
            return done == null || done.analysis() == null ? null : done.analysis().syntax();
        });
    }

    Library library() {
        return library;
    }

    /**
     * Threads with room for deep expressions: an engine caller that runs analyses on its own pool
     * should make the pool's threads with this, so each analysis need not hop to a fresh thread.
     */
    public static java.util.concurrent.ThreadFactory threadFactory() {
        return DeepStack.FACTORY;
    }

    Sources sources() {
        return sources;
    }

    /** An analysis, or why the file could not be read (then analysis is null). */
    record Imported(Analysis analysis, String problem) {
    }

    /** Analyses a file on disk (or wherever the sources read it from). */
    public Analysis analyze(Path file) {
        Path key = file.toAbsolutePath().normalize();
        Imported result = analyzeImport(key, List.of(), NEVER);
        if (result.analysis() != null) return result.analysis();
        return failure(key, "", Code.FILE_UNREADABLE, "cannot read this file: " + result.problem(), 0);
    }

    /** Analyses text that is not (or not yet) saved under its path, e.g. an editor buffer. */
    public Analysis analyzeText(Path file, String text) {
        return guarded(file.toAbsolutePath().normalize(), text, null, null, List.of(), NEVER);
    }

    /** For runs nobody abandons. */
    private static final java.util.function.BooleanSupplier NEVER = () -> false;

    /**
     * As {@link #analyzeText(Path, String)} for an editor: reparses from {@code earlier} (an
     * earlier analysis's {@link Analysis#syntax()} of the same document, or null), and gives up as
     * soon as {@code superseded} says the result is no longer wanted (a newer edit arrived): then
     * null.
     */
    public Analysis analyzeText(Path file, String text, ParsedSource earlier, java.util.function.BooleanSupplier superseded) {
        try {
            return guarded(file.toAbsolutePath().normalize(), text, earlier, null, List.of(), superseded);
        } catch (Superseded e) {
            return null;
        }
    }

    /**
     * As {@link #analyzeText(Path, String, ParsedSource, java.util.function.BooleanSupplier)} after an
     * edit of a document whose previous analysis is {@code earlier} (null for none): besides
     * reparsing only the edited part, it evaluates again only the definitions the edit can have
     * changed and takes the other values over from {@code earlier} (see {@link ReusableValues}).
     * The result is the one a fresh analysis of {@code text} gives.
     */
    public Analysis analyzeEdit(Path file, String text, Analysis earlier, java.util.function.BooleanSupplier superseded) {
        try {
            return guarded(file.toAbsolutePath().normalize(), text, earlier == null ? null : earlier.syntax(),
                earlier == null ? ReusableValues.NONE : earlier.graph().reusable(), List.of(), superseded);
        } catch (Superseded e) {
            return null;
        }
    }

    /** Asked between statements: gives up on a run whose caller no longer wants it. */
    static void checkSuperseded(java.util.function.BooleanSupplier superseded) {
        if (superseded.getAsBoolean()) throw new Superseded();
    }

    /** Thrown to abandon an analysis nobody wants any more; never escapes this class. */
    static final class Superseded extends RuntimeException {
        Superseded() {
            super(null, null, false, false);
        }
    }

    /** @param superseded the check of the run that asked (a used file's run is given up with it) */
    Imported analyzeImport(Path file, List<Path> chain, java.util.function.BooleanSupplier superseded) {
        Imported cached = cache.get(file);
        if (cached != null) return cached;
        // Every read is confined to the root of the file the analysis started from.
        Path root = sources.workspaceRoot(chain.isEmpty() ? file : chain.get(0));
        Map<Path, Analysis> kept = memory == null ? null : memory.recall(file, root, sources, settings);
        if (kept != null) {
            // The whole group goes in, analysed together as it was.
            kept.forEach((p, a) -> cache.putIfAbsent(p, new Imported(a, null)));
            return cache.get(file);
        }
        Sources.Loaded loaded = sources.load(file, root);
        Imported fresh;
        if (loaded instanceof Sources.Text t) {
            fresh = new Imported(guarded(file, t.text(), uses.parsed(file), null, chain, superseded), null);
        } else if (loaded instanceof Sources.NotText n) {
            fresh = new Imported(failure(file, "", Code.FILE_NOT_TEXT,
                "this is not a calc file: " + n.reason() + " (first bad byte at offset " + n.offset() + ")", 0), null);
        } else {
            fresh = new Imported(null, ((Sources.Missing) loaded).reason());
        }
        Imported raced = cache.putIfAbsent(file, fresh);
        if (raced != null) return raced;
        if (memory != null && fresh.analysis() != null && loaded instanceof Sources.Text) {
            Map<Path, Analysis> used = usedBy(file, root);
            if (used != null) memory.remember(file, settings, used);
        }
        return fresh;
    }

    /** A file's analysis with those of every file it uses in turn, or null if one is not text. */
    private Map<Path, Analysis> usedBy(Path file, Path root) {
        Map<Path, Analysis> out = new java.util.HashMap<>();
        java.util.ArrayDeque<Path> todo = new java.util.ArrayDeque<>(List.of(file));
        while (!todo.isEmpty()) {
            Path p = todo.poll();
            if (out.containsKey(p)) continue;
            Imported done = cache.get(p);
            if (done == null || done.analysis() == null || !(sources.load(p, root) instanceof Sources.Text)) return null;
            out.put(p, done.analysis());
            todo.addAll(done.analysis().imports());
        }
        return out;
    }

    /**
     * The files from {@code from} to {@code to} along `use` statements ({@code from} first,
     * {@code to} last), or null: read from the files' texts, so never from timing.
     *
     * @param start the file the analysis started from (its root bounds the search)
     */
    List<Path> usePath(Path from, Path to, Path start) {
        return uses.path(from, to, sources.workspaceRoot(start));
    }

    private Analysis guarded(Path file, String text, ParsedSource earlier, ReusableValues reusable, List<Path> chain,
                             java.util.function.BooleanSupplier superseded) {
        if (DiskReads.exceeds(text, sources.maxBytes())) {
            return failure(file, "", Code.FILE_UNREADABLE, "cannot check this document: " + DiskReads.tooLarge(sources.maxBytes()), 0);
        }
        return DeepStack.call(() -> {
            try {
                return new Analyzer(this, file, text, earlier, reusable, chain, settings,
                    dev.plumb.units.UnitRegistry.standard(), superseded).run();
            } catch (Superseded e) {
                throw e;
            } catch (StackOverflowError e) {
                return failure(file, text, Code.SYNTAX_NESTING,
                    "this document nests expressions too deeply to evaluate: give inner parts names of their own", 0);
            } catch (OutOfMemoryError e) {
                // One analysis failed; what it held is garbage now, and the process carries on.
                return failure(file, text, Code.LIMIT_MEMORY, "checking this document needed more memory than Plumb has ("
                    + Runtime.getRuntime().maxMemory() / (1024 * 1024) + " MB): split it into files that `use` each other, "
                    + "or give Plumb more memory (-Xmx, see README)", 0);
            }
        });
    }

    private static Analysis failure(Path file, String text, Code code, String message, int offset) {
        Diagnostic d = Diagnostic.of(code, new Span(offset, offset), message);
        return new Analysis(file, text, ParsedSource.unread(text), Map.of(), List.of(), List.of(d), new Scope(text), Map.of(),
            List.of(), List.of(), List.of(), Settings.DEFAULT, DefinitionGraph.empty(file));
    }
}
