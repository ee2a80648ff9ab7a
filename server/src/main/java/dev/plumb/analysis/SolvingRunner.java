package dev.plumb.analysis;

import dev.plumb.units.UnitRegistry;

/**
 * What the runners of the solving statements (`seek` with one unknown or several, `evolve`)
 * share: the plan, the values computed before the statement (which every trial is evaluated
 * over), where findings go and the run's budget.
 */
abstract class SolvingRunner {
    protected final Plan plan;
    protected final Scope scope;
    /** The values computed before the statement: what the trials are evaluated over. */
    protected final Environment env;
    protected final Reporter reporter;
    protected final String text;
    protected final UnitRegistry units;
    protected final Budget budget;

    SolvingRunner(Plan plan, Scope scope, Environment env, Reporter reporter, String text, UnitRegistry units,
                  Budget budget) {
        this.plan = plan;
        this.scope = scope;
        this.env = env;
        this.reporter = reporter;
        this.text = text;
        this.units = units;
        this.budget = budget;
    }

    /** An evaluator over {@code at} that reports to {@code r}, within this run's budget. */
    protected final Evaluator evaluator(Environment at, Reporter r) {
        return new Evaluator(scope, at, java.util.Map.of(), r, text, units, budget);
    }
}
