package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The fourth pass: orders the own definitions (each after what it uses), places each solve
 * statement before the definitions it re-evaluates per trial, and reports circular definitions.
 */
final class Planner {
    private final Reporter reporter;
    /** The graph ordered by the last run, with its order, for the next run of the document to take over. */
    private DependencyOrder.Memo ordered;

    Planner(Reporter reporter) {
        this.reporter = reporter;
    }

    Plan run(Map<String, Statement> own, Map<String, Set<String>> graph, Definitions definitions) {
        return run(own, graph, definitions, null);
    }

    /** As above, taking the order over from {@code earlier} (an earlier run's {@link #ordered()}) where the graph is the same. */
    Plan run(Map<String, Statement> own, Map<String, Set<String>> graph, Definitions definitions,
             DependencyOrder.Memo earlier) {
        // SeekDependents replaces the entries of solved names with sets of its own; the others are
        // only read, so a shallow copy of the graph is enough.
        Map<String, Set<String>> uses = new LinkedHashMap<>(graph);
        Map<String, Set<String>> solvedWith = SeekDependents.adjust(own, uses);
        DependencyOrder.Result order = DependencyOrder.of(uses, earlier);
        ordered = new DependencyOrder.Memo(uses, order);
        Map<String, List<Statement.Definition>> dependents = new LinkedHashMap<>();
        for (var entry : solvedWith.entrySet()) {
            List<Statement.Definition> inOrder = new ArrayList<>();
            for (String n : order.order()) {
                if (entry.getValue().contains(n) && own.get(n) instanceof Statement.Definition d) inOrder.add(d);
            }
            dependents.put(entry.getKey(), inOrder);
        }
        return new Plan(own, order.order(), reportCycles(own, order.cycles()), dependents, definitions);
    }

    /** What {@link #run} ordered, for the next run of the same document. */
    DependencyOrder.Memo ordered() {
        return ordered;
    }

    private Set<String> reportCycles(Map<String, Statement> own, List<List<String>> cycles) {
        Set<String> members = new HashSet<>();
        for (List<String> cycle : cycles) {
            List<String> loop = new ArrayList<>(cycle);
            loop.add(cycle.get(0));
            for (String member : cycle) {
                members.add(member);
                String message = cycle.size() == 1
                    ? "circular definition: " + member + " uses itself; "
                        + (own.get(member) instanceof Statement.Definition ? "give it a value that does not depend on itself"
                            : "a function or correlation may not call itself")
                    : "circular definition: " + String.join(" → ", loop)
                        + "; one of them must be given a value that does not depend on the others";
                reporter.report(Code.NAME_CYCLE, DeclarationPass.definedName(own.get(member)).span(), message);
            }
        }
        return members;
    }
}
