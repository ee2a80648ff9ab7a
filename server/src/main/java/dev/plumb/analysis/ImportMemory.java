package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Analyses of `use`d files kept from one analysis to the next, for an editor: while a used file,
 * and every file it uses in turn, reads exactly as it did, its analysis is taken again instead
 * of being made afresh on each keystroke in the document that uses it. Only analyses free of
 * `use` circles are kept: those are the only ones that do not depend on who uses them.
 * Thread-safe.
 */
public final class ImportMemory {
    /** An analysis, the settings it was made with, and each file it rests on with its text then. */
    private record Entry(Analysis analysis, Settings settings, Map<Path, Analysis> used) {
    }

    private final Map<Path, Entry> entries = new ConcurrentHashMap<>();

    /**
     * The kept analysis of a file and of every file it uses (the file itself included), when all
     * of them still read the same (read under {@code root}); else null.
     */
    Map<Path, Analysis> recall(Path file, Path root, Sources sources, Settings settings) {
        Entry e = entries.get(file);
        if (e == null || !e.settings().equals(settings)) return null;
        for (Map.Entry<Path, Analysis> used : e.used().entrySet()) {
            if (!(sources.load(used.getKey(), root) instanceof Sources.Text now) || !now.text().equals(used.getValue().text())) {
                return null;
            }
        }
        return e.used();
    }

    /** Keeps an analysis with the analyses of the files it rests on, unless a circle runs through them. */
    void remember(Path file, Settings settings, Map<Path, Analysis> used) {
        for (Analysis a : used.values()) {
            if (a.diagnostics().stream().anyMatch(d -> d.code() == Code.USE_CYCLE)) return;
        }
        entries.put(file, new Entry(used.get(file), settings, Map.copyOf(used)));
    }
}
