package dev.plumb.analysis;

import dev.plumb.syntax.Statement;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * For each {@code seek NAME …}: the definitions its equation reaches that depend on NAME
 * themselves (a Reynolds number from the unknown speed, a drag coefficient from that Reynolds
 * number …). They are re-evaluated for every trial value, so the solve must come before them,
 * and after everything else they use: the seek's dependencies are adjusted to say exactly that.
 */
final class SeekDependents {
    private SeekDependents() {
    }

    /** Adjusts {@code uses} in place and returns, for each seek, the names re-evaluated with it. */
    static Map<String, Set<String>> adjust(Map<String, Statement> own, Map<String, Set<String>> uses) {
        Map<String, Set<String>> out = new LinkedHashMap<>();
        // Most calcs solve nothing: the reverse graph is made at the first solve or motion, not before
        // (from the graph as given, as every solve's closure reads it).
        UsedBy usedBy = new UsedBy(uses);
        for (var entry : own.entrySet()) {
            String unknown = entry.getKey();
            Set<String> dependsOnUnknown;
            Set<String> fromEquation = new LinkedHashSet<>();
            Set<String> unknowns = new LinkedHashSet<>(List.of(unknown));
            if (entry.getValue() instanceof Statement.Seek f) {
                dependsOnUnknown = closure(unknown, usedBy.get());
                References.each(f.lhs(), (n, span) -> fromEquation.add(n));
                References.each(f.rhs(), (n, span) -> fromEquation.add(n));
            } else if (entry.getValue() instanceof Statement.SeekSystem k && k.index() == 0) {
                // Several unknowns: what depends on any of them is re-evaluated per trial; the
                // system's statement comes after everything else its equations use.
                unknowns.addAll(SeekSystems.unknowns(k));
                dependsOnUnknown = new HashSet<>();
                for (String u : unknowns) dependsOnUnknown.addAll(closure(u, usedBy.get()));
                for (Statement.Equation q : k.system().equations()) {
                    References.each(q.lhs(), (n, span) -> fromEquation.add(n));
                    References.each(q.rhs(), (n, span) -> fromEquation.add(n));
                }
            } else if (entry.getValue() instanceof Statement.Evolve k && k.index() == 0) {
                // A motion: what depends on the time or a state and feeds the rates or the stop
                // condition is re-evaluated at every evaluation of the rates.
                unknowns.addAll(Motions.names(k));
                dependsOnUnknown = new HashSet<>();
                for (String u : unknowns) dependsOnUnknown.addAll(closure(u, usedBy.get()));
                List<dev.plumb.syntax.Expr> read = new java.util.ArrayList<>(k.motion().rates());
                read.add(k.motion().stopLeft());
                read.add(k.motion().stopRight());
                for (dev.plumb.syntax.Expr e : read) References.each(e, (n, span) -> fromEquation.add(n));
            } else {
                continue;
            }
            Set<String> reached = new LinkedHashSet<>();
            for (String n : fromEquation) {
                if (uses.containsKey(n)) reached.addAll(closureFrom(n, uses));
            }
            Set<String> dependents = new LinkedHashSet<>();
            for (String n : reached) {
                if (dependsOnUnknown.contains(n) && own.get(n) instanceof Statement.Definition) dependents.add(n);
            }
            Set<String> adjusted = new LinkedHashSet<>(uses.get(unknown));
            for (String d : dependents) adjusted.addAll(uses.get(d));
            adjusted.removeAll(dependents);
            adjusted.removeAll(unknowns);
            uses.put(unknown, adjusted);
            out.put(unknown, dependents);
        }
        return out;
    }

    /** The reverse of the graph as given, made when first asked for. */
    private static final class UsedBy {
        private final Map<String, Set<String>> uses;
        private Map<String, Set<String>> graph;

        UsedBy(Map<String, Set<String>> uses) {
            this.uses = uses;
        }

        Map<String, Set<String>> get() {
            if (graph == null) graph = reverse(uses);
            return graph;
        }
    }

    private static Map<String, Set<String>> reverse(Map<String, Set<String>> uses) {
        Map<String, Set<String>> usedBy = new HashMap<>();
        uses.forEach((n, deps) -> deps.forEach(d -> usedBy.computeIfAbsent(d, k -> new HashSet<>()).add(n)));
        return usedBy;
    }

    /** Every name that (transitively) uses {@code start}, not counting start itself. */
    private static Set<String> closure(String start, Map<String, Set<String>> edges) {
        Set<String> seen = new HashSet<>();
        Deque<String> todo = new ArrayDeque<>(edges.getOrDefault(start, Set.of()));
        while (!todo.isEmpty()) {
            String n = todo.poll();
            if (seen.add(n)) todo.addAll(edges.getOrDefault(n, Set.of()));
        }
        return seen;
    }

    /** {@code start} and everything it (transitively) uses. */
    private static Set<String> closureFrom(String start, Map<String, Set<String>> uses) {
        Set<String> seen = new LinkedHashSet<>();
        Deque<String> todo = new ArrayDeque<>(List.of(start));
        while (!todo.isEmpty()) {
            String n = todo.poll();
            if (seen.add(n)) todo.addAll(uses.getOrDefault(n, Set.of()));
        }
        return seen;
    }

}
