package dev.plumb.analysis;

import dev.plumb.diagnostics.Diagnostic;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Collections;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A document's own definitions by stable identity (file and name, never a span, so they pair
 * across edits and revisions): which of its own names each one uses, and the findings on each
 * one's statement. What an editor re-evaluating only what an edit touched, or a diff pairing two
 * revisions, reads; immutable.
 */
public final class DefinitionGraph {
    /** A definition's identity: the file that defines it and its name. */
    public record Identity(Path file, String name) {
    }

    private final Path file;
    private final Map<String, Set<String>> uses;
    private final Map<String, List<Diagnostic>> findings;
    /** What the next run of the same document may take over from this one. */
    private final ReusableValues reusable;

    /** @param uses read-only, kept as given: the resolver's graph, which nothing changes after it is made */
    DefinitionGraph(Path file, Map<String, Set<String>> uses, Map<String, List<Diagnostic>> findings, ReusableValues reusable) {
        this.file = file;
        this.reusable = reusable;
        this.uses = uses;
        Map<String, List<Diagnostic>> f = new LinkedHashMap<>();
        findings.forEach((k, v) -> f.put(k, List.copyOf(v)));
        this.findings = Collections.unmodifiableMap(f);
    }

    static DefinitionGraph empty(Path file) {
        return new DefinitionGraph(file, Map.of(), Map.of(), ReusableValues.NONE);
    }

    ReusableValues reusable() {
        return reusable;
    }

    /** The document's own names, in the order they are written. */
    public Set<String> names() {
        return uses.keySet();
    }

    public Identity identity(String name) {
        return new Identity(file, name);
    }

    /** The document's own names that {@code name}'s statement uses directly; empty for a name not its own. */
    public Set<String> uses(String name) {
        return uses.getOrDefault(name, Set.of());
    }

    /** Every own name whose value depends on {@code name}, directly or not (not the name itself unless circular). */
    public Set<String> dependents(String name) {
        Map<String, Set<String>> usedBy = new LinkedHashMap<>();
        uses.forEach((user, used) -> used.forEach(u -> usedBy.computeIfAbsent(u, k -> new LinkedHashSet<>()).add(user)));
        Set<String> out = new LinkedHashSet<>();
        Deque<String> todo = new ArrayDeque<>(usedBy.getOrDefault(name, Set.of()));
        while (!todo.isEmpty()) {
            String next = todo.pop();
            if (out.add(next)) todo.addAll(usedBy.getOrDefault(next, Set.of()));
        }
        return out;
    }

    /** The findings on the statement that defines {@code name}, in document order. */
    public List<Diagnostic> findings(String name) {
        return findings.getOrDefault(name, List.of());
    }
}
