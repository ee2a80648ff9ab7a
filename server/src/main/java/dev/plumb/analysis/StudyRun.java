package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The one way the studies (sweeps, cases) evaluate the document again: the real run's values
 * with some of its own values given others, everything that depends on them evaluated again
 * through {@link EvaluationPass#rerun} (solve statements solved again, correlation calls range-checked
 * again), the checks that read them judged again, and the findings of that run collected apart
 * from the document's. Every step comes out of the run's {@link Budget}; a run the budget cut
 * short says so ({@link Outcome#stopped}).
 */
final class StudyRun {
    /**
     * One run: the values (over the real run's), the check rows in document order, and the
     * findings of what was evaluated again.
     */
    record Outcome(Environment values, List<Row.CheckRow> checks, List<Diagnostic> findings, boolean outOfTime) {
        /** Whether the run's budget cut this run short (its values may be unknown for that reason alone). */
        boolean stopped() {
            return outOfTime || findings.stream().anyMatch(d -> d.code() == Code.LIMIT_BUDGET);
        }
    }

    private final Plan plan;
    private final Scope scope;
    private final String text;
    private final UnitRegistry units;
    private final Settings settings;
    private final Budget budget;
    private final Environment base;
    /** The document's checks with the real run's rows, in order. */
    private final Map<Statement.Check, Row.CheckRow> checks;
    private final Map<String, Set<String>> uses;
    /** The reverse graph, made at the first run; shared with the runs around a case's or a row's values. */
    private final Graph graph;

    /** What the studies read of the document's dependencies: the same for every run of one analysis. */
    private static final class Graph {
        /** Each own name → the own names that use it (the plan's dependencies, solve statements adjusted). */
        final Map<String, Set<String>> usedBy = new HashMap<>();
        /** The names each check reads. */
        final Map<Statement.Check, Set<String>> checkReads = new HashMap<>();
        /** What each set of given names makes evaluate again (a sweep asks the same set for every row). */
        final Map<Set<String>, Set<String>> downstream = new HashMap<>();
        boolean prepared;
    }

    StudyRun(Plan plan, Scope scope, Environment base, Map<String, Set<String>> uses,
             Map<Statement.Check, Row.CheckRow> checks, String text, Settings settings, UnitRegistry units, Budget budget) {
        this(plan, scope, base, uses, checks, text, settings, units, budget, new Graph());
    }

    private StudyRun(Plan plan, Scope scope, Environment base, Map<String, Set<String>> uses,
                     Map<Statement.Check, Row.CheckRow> checks, String text, Settings settings, UnitRegistry units,
                     Budget budget, Graph graph) {
        this.graph = graph;
        this.plan = plan;
        this.scope = scope;
        this.base = base;
        this.checks = checks;
        this.text = text;
        this.settings = settings;
        this.units = units;
        this.budget = budget;
        this.uses = uses;
    }

    /**
     * Made at the first run, not before: most calcs study nothing, and the reverse graph of a long
     * one costs an editor's keystroke a good part of its time.
     */
    private void prepare() {
        if (graph.prepared) return;
        graph.prepared = true;
        // The same adjustment the planner made: a solve statement depends on what its equation's definitions use.
        Map<String, Set<String>> adjusted = new HashMap<>(uses);
        SeekDependents.adjust(plan.own(), adjusted);
        adjusted.forEach((name, deps) -> deps.forEach(d -> graph.usedBy.computeIfAbsent(d, k -> new HashSet<>()).add(name)));
        for (Statement.Check c : checks.keySet()) {
            Set<String> reads = new HashSet<>();
            for (Expr e : c.operands()) References.each(e, (n, span) -> reads.add(n));
            graph.checkReads.put(c, reads);
        }
    }

    /** The same document studied around {@code o}'s values (a case's, a sweep row's), sharing this run's graph and budget. */
    private StudyRun(StudyRun from, Outcome o) {
        this(from.plan, from.scope, o.values(), from.uses, rowsOf(from.checks, o.checks()), from.text, from.settings,
            from.units, from.budget, from.graph);
    }

    /** The checks in order with another run's rows (an outcome lists them in the same order). */
    private static Map<Statement.Check, Row.CheckRow> rowsOf(Map<Statement.Check, Row.CheckRow> checks,
                                                            List<Row.CheckRow> rows) {
        Map<Statement.Check, Row.CheckRow> out = new java.util.LinkedHashMap<>();
        int i = 0;
        for (Statement.Check c : checks.keySet()) out.put(c, rows.get(i++));
        return out;
    }

    /**
     * {@code o} (a case's or a sweep row's run) with its checks {@code with spread} judged at their
     * bounds, the tolerances carried to the values of that run rather than the real run's (a
     * tolerance in percent is a percent of the run's own value); the findings of that judgement
     * join the outcome's. {@code o} itself when no check asks for its spread. Throws
     * {@link Budget.Exhausted} when the budget does not stretch to it: such a check is then not
     * judged, never judged on the values alone.
     */
    Outcome withSpreads(Outcome o, List<Statement> statements) {
        if (checks.keySet().stream().noneMatch(Statement.Check::withSpread) || o.stopped()) return o;
        StudyRun here = new StudyRun(this, o);
        Reporter margins = new Reporter();
        Propagation propagation = new Propagation(here, plan, scope, margins, text, units, budget);
        propagation.run(statements);
        List<Row.CheckRow> rows = new ArrayList<>(o.checks().size());
        int i = 0;
        for (Statement.Check c : checks.keySet()) {
            Row.CheckRow row = o.checks().get(i++);
            rows.add(c.withSpread() ? MarginCheck.judge(c, row, propagation, margins, text, settings) : row);
        }
        List<Diagnostic> findings = new ArrayList<>(o.findings());
        findings.addAll(margins.all());
        return new Outcome(o.values(), rows, findings, o.outOfTime());
    }

    /** The real run's values: what a study's own expressions (a sweep's ends, a case's right sides) are evaluated over. */
    Environment base() {
        return base;
    }

    /**
     * The document evaluated again with {@code given} values in place of the definitions of those
     * names; {@code keep} false discards the findings (an outcome then has none).
     */
    Outcome run(Map<String, Value> given, boolean keep) {
        prepare();
        Reporter reporter = keep ? new Reporter() : Reporter.discarding();
        Set<String> again = graph.downstream.computeIfAbsent(Set.copyOf(given.keySet()), this::dependents);
        EvaluationPass pass = new EvaluationPass(plan, scope, text, reporter, units, budget);
        Environment values = pass.rerun(base, given, again).values();
        CheckRunner runner = new CheckRunner(scope, values, reporter, text, settings, units, budget);
        List<Row.CheckRow> rows = new ArrayList<>(checks.size());
        for (var entry : checks.entrySet()) {
            boolean reads = graph.checkReads.get(entry.getKey()).stream().anyMatch(n -> again.contains(n) || given.containsKey(n));
            rows.add(reads ? runner.withinBudget(entry.getKey()) : entry.getValue());
        }
        return new Outcome(values, rows, keep ? reporter.all() : List.of(), pass.outOfTime());
    }

    /** Every own name that depends on {@code name}, directly or not, in no particular order. */
    Set<String> dependentsOf(String name) {
        prepare();
        return graph.downstream.computeIfAbsent(Set.of(name), this::dependents);
    }

    /** Every own name that depends, directly or not, on one of {@code given} (not those themselves). */
    private Set<String> dependents(Set<String> given) {
        Set<String> out = new LinkedHashSet<>();
        List<String> todo = new ArrayList<>(given);
        while (!todo.isEmpty()) {
            String n = todo.remove(todo.size() - 1);
            for (String user : graph.usedBy.getOrDefault(n, Set.of())) {
                if (!given.contains(user) && out.add(user)) todo.add(user);
            }
        }
        return out;
    }
}
