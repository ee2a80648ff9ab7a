package dev.plumb.analysis;

import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * Which files `use` which, read from their texts, for one workspace. A circle of `use` is found
 * here from the texts alone, so that whether a file is on a circle never depends on which file
 * an analysis started from or on which analysis finished first.
 */
final class UseGraph {
    private final Sources sources;
    /** The parse of a file already made, if an analysis made one (its syntax is reused). */
    private final Function<Path, ParsedSource> analysed;
    private final Map<Path, List<Path>> edges = new ConcurrentHashMap<>();
    /** Parses made here, handed to the file's own analysis so the text is read once. */
    private final Map<Path, ParsedSource> parses = new ConcurrentHashMap<>();

    UseGraph(Sources sources, Function<Path, ParsedSource> analysed) {
        this.sources = sources;
        this.analysed = analysed;
    }

    /**
     * The files from {@code from} to {@code to} along `use` statements ({@code from} first,
     * {@code to} last), or null when {@code from} does not lead to {@code to}.
     */
    List<Path> path(Path from, Path to, Path root) {
        Map<Path, Path> cameFrom = new HashMap<>();
        ArrayDeque<Path> queue = new ArrayDeque<>(List.of(from));
        cameFrom.put(from, from);
        while (!queue.isEmpty()) {
            Path at = queue.poll();
            if (at.equals(to)) {
                LinkedList<Path> path = new LinkedList<>();
                for (Path p = to; !p.equals(from); p = cameFrom.get(p)) path.addFirst(p);
                path.addFirst(from);
                return path;
            }
            for (Path next : usesOf(at, root)) {
                if (cameFrom.putIfAbsent(next, at) == null) queue.add(next);
            }
        }
        return null;
    }

    /** The parse this graph made of a file, or null. */
    ParsedSource parsed(Path file) {
        return parses.get(file);
    }

    /** The files a file `use`s that lie inside the root, as its text says. */
    private List<Path> usesOf(Path file, Path root) {
        List<Path> known = edges.get(file);
        if (known != null) return known;
        ParsedSource syntax = analysed.apply(file);
        if (syntax == null && sources.load(file, root) instanceof Sources.Text t) {
            syntax = SourceParser.parse(t.text());
            parses.putIfAbsent(file, syntax);
        }
        List<Path> out = new ArrayList<>();
        if (syntax != null) {
            for (Statement s : syntax.statements()) {
                if (!(s instanceof Statement.Use u)) continue;
                Path target = ImportPass.target(file, u);
                if (target != null && target.startsWith(root)) out.add(target);
            }
        }
        edges.putIfAbsent(file, List.copyOf(out));
        return edges.get(file);
    }
}
