package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Checks many files at once on all cores, and settles what only the whole set can tell: an
 * input that its own file does not use is still used when a file that `use`s it does.
 */
public final class Batch {
    /** A file's analysis with the diagnostics that stand after looking at the whole set. */
    public record Checked(Analysis analysis, List<Diagnostic> diagnostics) {
    }

    private Batch() {
    }

    public static List<Checked> check(Workspace workspace, List<Path> files, int threads) {
        List<Analysis> analyses = new ArrayList<>(files.size());
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads), DeepStack.FACTORY);
        try {
            List<Future<Analysis>> futures = new ArrayList<>();
            for (Path f : files) futures.add(pool.submit(() -> workspace.analyze(f)));
            for (Future<Analysis> f : futures) analyses.add(f.get());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while checking", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("internal error while checking: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
        Map<Path, Set<String>> usedByImporters = new HashMap<>();
        for (Analysis a : analyses) {
            a.importedUses().forEach((file, names) ->
                usedByImporters.computeIfAbsent(file, k -> new HashSet<>()).addAll(names));
        }
        List<Checked> out = new ArrayList<>();
        for (Analysis a : analyses) {
            Set<String> used = usedByImporters.getOrDefault(a.file(), Set.of());
            List<Diagnostic> kept = a.diagnostics().stream()
                .filter(d -> d.code() != Code.INPUT_UNUSED || !used.contains(a.text().substring(d.span().start(), d.span().end())))
                .toList();
            out.add(new Checked(a, kept));
        }
        return out;
    }
}
