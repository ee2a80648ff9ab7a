package dev.plumb.analysis;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Orders a document's definitions so each comes after what it uses (Kahn's algorithm, no
 * recursion), and finds the circular definitions that cannot be ordered.
 */
final class DependencyOrder {
    /** The evaluation order and the cycles found, each as the names around the loop. */
    record Result(List<String> order, List<List<String>> cycles) {
    }

    /**
     * One graph and its order, kept by an editor's run so that the next run of the edited
     * document, whose graph is mostly the very same (an edit of a number changes no name it
     * uses), takes the order over instead of sorting thousands of names again.
     */
    record Memo(Map<String, Set<String>> uses, Result result) {
    }

    /**
     * As {@link #of(Map)}, taken over from {@code earlier} when its graph is {@code uses} exactly:
     * the same names with the same uses, both in the same order (the order found and the cycles
     * reported follow the order the names are written in).
     */
    static Result of(Map<String, Set<String>> uses, Memo earlier) {
        if (earlier != null && sameInOrder(earlier.uses(), uses)) return earlier.result();
        return of(uses);
    }

    private static boolean sameInOrder(Map<String, Set<String>> a, Map<String, Set<String>> b) {
        if (a.size() != b.size()) return false;
        var i = b.entrySet().iterator();
        for (var e : a.entrySet()) {
            var f = i.next();
            if (!e.getKey().equals(f.getKey())) return false;
            if (e.getValue() == f.getValue()) continue;
            if (e.getValue().size() != f.getValue().size()) return false;
            var j = f.getValue().iterator();
            for (String name : e.getValue()) {
                if (!name.equals(j.next())) return false;
            }
        }
        return true;
    }

    private DependencyOrder() {
    }

    /** @param uses for each name, the names (of the same map) it uses, in source order */
    static Result of(Map<String, Set<String>> uses) {
        Map<String, Integer> waiting = new HashMap<>();
        Map<String, List<String>> usedBy = new HashMap<>();
        for (var entry : uses.entrySet()) {
            int count = 0;
            for (String dep : entry.getValue()) {
                if (!uses.containsKey(dep)) continue;
                count++;
                usedBy.computeIfAbsent(dep, k -> new ArrayList<>()).add(entry.getKey());
            }
            waiting.put(entry.getKey(), count);
        }
        List<String> order = new ArrayList<>(uses.size());
        List<List<String>> cycles = new ArrayList<>();
        Deque<String> ready = new ArrayDeque<>();
        for (String name : uses.keySet()) {
            if (waiting.get(name) == 0) ready.add(name);
        }
        Set<String> done = new LinkedHashSet<>();
        while (done.size() < uses.size()) {
            while (!ready.isEmpty()) {
                String name = ready.poll();
                if (!done.add(name)) continue;
                order.add(name);
                for (String user : usedBy.getOrDefault(name, List.of())) {
                    if (waiting.merge(user, -1, Integer::sum) == 0) ready.add(user);
                }
            }
            if (done.size() == uses.size()) break;
            // Everything left waits on a cycle: find one, release its members, go on.
            List<String> cycle = findCycle(uses, done);
            cycles.add(cycle);
            for (String member : cycle) {
                waiting.put(member, 0);
                ready.add(member);
            }
        }
        return new Result(order, cycles);
    }

    /** Walks unfinished dependencies from an unfinished name until a name repeats. */
    private static List<String> findCycle(Map<String, Set<String>> uses, Set<String> done) {
        String start = null;
        for (String name : uses.keySet()) {
            if (!done.contains(name)) {
                start = name;
                break;
            }
        }
        Map<String, Integer> position = new LinkedHashMap<>();
        List<String> path = new ArrayList<>();
        String at = start;
        while (!position.containsKey(at)) {
            position.put(at, path.size());
            path.add(at);
            String next = null;
            for (String dep : uses.get(at)) {
                if (uses.containsKey(dep) && !done.contains(dep)) {
                    next = dep;
                    break;
                }
            }
            at = next;
        }
        return new ArrayList<>(path.subList(position.get(at), path.size()));
    }
}
