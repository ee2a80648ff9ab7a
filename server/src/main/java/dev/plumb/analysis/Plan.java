package dev.plumb.analysis;

import dev.plumb.syntax.Statement;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A document compiled for evaluation, immutable: its own definitions in dependency order, those
 * that lie on a circle, and for each solve statement the definitions re-evaluated with every
 * trial value. {@link #evaluate} is the one way to evaluate definitions: the real run and a
 * solver's trials go through it; the studies (sweeps, cases, the tolerances' runs and Monte Carlo
 * samples) go through {@link StudyRun}, whose {@link EvaluationPass#rerun} evaluates each
 * definition with the same {@link Definitions} and solves each solve statement again.
 *
 * @param order every own name, each after what it uses (circles broken where Plumb had to)
 * @param inCycle the names on a circle of definitions: their values are unknown
 * @param seekDependents for each solved name, the definitions that depend on it and feed its
 *     equation, in evaluation order
 */
record Plan(Map<String, Statement> own, List<String> order, Set<String> inCycle,
            Map<String, List<Statement.Definition>> seekDependents, Definitions definitions) {

    Plan {
        // Read-only views: the passes that built these hand them over and keep no reference.
        own = Collections.unmodifiableMap(own);
        order = Collections.unmodifiableList(order);
        inCycle = Collections.unmodifiableSet(inCycle);
        Map<String, List<Statement.Definition>> copy = new LinkedHashMap<>();
        seekDependents.forEach((k, v) -> copy.put(k, List.copyOf(v)));
        seekDependents = Collections.unmodifiableMap(copy);
    }

    /**
     * Evaluates {@code definitions} (in this order) over {@code base}, with {@code overrides} bound
     * first in place of their definitions; every finding goes to {@code sink}, every step is taken
     * from {@code budget}. The result holds the overrides and the new values over {@code base},
     * which is left as it was.
     */
    Environment evaluate(Environment base, Map<String, Value> overrides, List<Statement.Definition> which,
                         Reporter sink, Budget budget) {
        Environment.Builder run = new Environment.Builder(base);
        overrides.forEach((name, v) -> run.put(name, definitions.bare(v)));
        for (Statement.Definition d : which) {
            String name = d.name().text();
            run.put(name, definitions.evaluate(d, run.now(), sink, inCycle.contains(name), budget));
        }
        return run.build();
    }

    /** The definitions a solve statement re-evaluates per trial (none for other names). */
    List<Statement.Definition> dependentsOf(String solved) {
        return seekDependents.getOrDefault(solved, List.of());
    }
}
