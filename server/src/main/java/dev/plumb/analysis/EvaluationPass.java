package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.IdentityHashMap;
import java.util.Map;

/**
 * The fifth pass, the real run: evaluates the plan in order, each definition once, each solve
 * statement by its {@link SeekRunner}, and makes the result row of every statement that defines
 * a name. What it returns is immutable.
 *
 * @see Plan#evaluate the same evaluation, for many runs
 */
final class EvaluationPass {
    /** The document's own values, and the row of each statement that defines a name (by identity). */
    record Evaluated(Environment values, Map<Statement, Row> rows) {
        Evaluated {
            rows = java.util.Collections.unmodifiableMap(rows);
        }
    }

    private final Plan plan;
    private final Scope scope;
    private final String text;
    private final Reporter reporter;
    private final UnitRegistry units;
    private final Budget budget;
    /** Set once the run's time is up: what is left is not evaluated (one finding said so). */
    private boolean outOfTime;
    private final Map<Statement, Row> rows;

    EvaluationPass(Plan plan, Scope scope, String text, Reporter reporter, UnitRegistry units, Budget budget) {
        this.plan = plan;
        this.scope = scope;
        this.text = text;
        this.reporter = reporter;
        this.units = units;
        this.budget = budget;
        // Sized for every statement at once: a study makes a pass per row.
        this.rows = new IdentityHashMap<>(plan.own().size());
    }

    /** @param duplicates statements defining a name a second time: evaluated for their findings, bound to nothing */
    Evaluated run(Iterable<Statement> duplicates) {
        Environment.Builder values = new Environment.Builder(scope);
        for (String name : plan.order()) {
            Statement s = plan.own().get(name);
            Binding.ValueBinding bound = withinBudget(s, values.now(), plan.inCycle().contains(name));
            if (bound != null) values.put(name, bound);
        }
        Environment done = values.build();
        for (Statement s : duplicates) withinBudget(s, done, false);
        return new Evaluated(done, rows);
    }

    /**
     * The run again for a study: over {@code base} (the real run's values), with {@code overrides}
     * bound in place of their definitions (shown as those were) and only the names in {@code which}
     * evaluated again, in plan order; the rest keep their base values. Solve statements among
     * them are solved again. Rows are made for what was evaluated again.
     */
    Evaluated rerun(Environment base, Map<String, Value> overrides, java.util.Set<String> which) {
        Environment.Builder values = new Environment.Builder(base);
        for (String name : plan.order()) {
            Value given = overrides.get(name);
            if (given != null) {
                Binding.ValueBinding was = base.get(name);
                values.put(name, was == null ? plan.definitions().bare(given) : new Binding.ValueBinding(was.file(),
                    was.span(), given, was.display(), was.basis(), was.input(), was.origin(), was.note()));
            } else if (which.contains(name)) {
                Binding.ValueBinding bound = withinBudget(plan.own().get(name), values.now(), plan.inCycle().contains(name));
                if (bound != null) values.put(name, bound);
            }
        }
        return new Evaluated(values.build(), rows);
    }

    /** Whether the run's time ran out during this pass (what was left is unknown for that reason alone). */
    boolean outOfTime() {
        return outOfTime;
    }

    /** A statement's evaluation, cut short with one finding when it takes more than its budget. */
    private Binding.ValueBinding withinBudget(Statement s, Environment env, boolean inCycle) {
        if (outOfTime) return unknown(s);
        try {
            budget.nextStatement();
            return evaluate(s, env, inCycle);
        } catch (Budget.Exhausted e) {
            outOfTime = e.limit == Budget.Limit.TIME;
            reporter.report(Code.LIMIT_BUDGET, where(s), e.limit == Budget.Limit.TIME
                ? "the check was stopped here after " + Budget.SECONDS + " s: this statement and those after it are not "
                    + "evaluated (their values are unknown); a calc needs far less: look for a formula that does "
                    + "repeated work, such as a function that calls another twice at every level"
                : "this statement was stopped after " + String.format(java.util.Locale.ROOT, "%,d", Budget.STEPS_PER_STATEMENT)
                    + " evaluation steps, more than any calc needs: its value is unknown. Look for a formula that does "
                    + "repeated work, such as a function that calls another twice at every level (the work doubles "
                    + "with each level)");
            return unknown(s);
        }
    }

    /** Where a finding about a statement goes: the name it defines, else the statement. */
    private static dev.plumb.diagnostics.Span where(Statement s) {
        Ident name = DeclarationPass.definedName(s);
        return name != null ? name.span() : s.span();
    }

    /** A statement not evaluated: its row and binding say its value is unknown. */
    private Binding.ValueBinding unknown(Statement s) {
        Ident name = DeclarationPass.definedName(s);
        if (name == null) return null;
        rows.put(s, new Row.ValueRow(s.span(), name.text(), s instanceof Statement.Definition d && d.input(), Value.UNKNOWN,
            null, null, null, null, null, s));
        return s instanceof Statement.Definition || s instanceof Statement.Seek || s instanceof Statement.Broken
            ? new Binding.ValueBinding(plan.definitions().bare(Value.UNKNOWN).file(), name.span(), Value.UNKNOWN, null, null,
                false, null, null)
            : null;
    }

    /** Makes the statement's row; returns the binding of the value it defines, or null when it defines none. */
    private Binding.ValueBinding evaluate(Statement s, Environment env, boolean inCycle) {
        Definitions definitions = plan.definitions();
        if (s instanceof Statement.Broken b) {
            rows.put(s, new Row.ValueRow(b.span(), b.name() == null ? "?" : b.name().text(), false, Value.UNKNOWN, null,
                null, null, null, null, s));
            return b.name() == null ? null : new Binding.ValueBinding(definitions.bare(Value.UNKNOWN).file(),
                b.name().span(), Value.UNKNOWN, null, null, false, null, null);
        }
        if (s instanceof Statement.Function f) {
            String signature = f.name().text() + "(" + String.join(", ", f.params().stream().map(Ident::text).toList()) + ")";
            rows.put(s, new Row.FunctionRow(f.span(), signature, Row.Callable.FUNCTION, f.note()));
            return null;
        }
        if (s instanceof Statement.Correlation c) {
            String signature = c.name().text() + "(" + String.join(", ", c.params().stream().map(p -> p.name().text())
                .toList()) + ")";
            rows.put(s, new Row.FunctionRow(c.span(), signature, Row.Callable.CORRELATION, c.title()));
            new BlockChecks(reporter, units).accuracy(c, scope, text);
            return null;
        }
        if (s instanceof Statement.Table t) {
            String signature = t.name().text() + "(" + t.param().name().text() + ")";
            rows.put(s, new Row.FunctionRow(t.span(), signature, Row.Callable.TABLE, t.title()));
            return null;
        }
        if (s instanceof Statement.Seek f) return seek(f, env, inCycle);
        if (!(s instanceof Statement.Definition d)) return null;
        Binding.ValueBinding bound = definitions.evaluate(d, env, reporter, inCycle, budget);
        rows.put(s, new Row.ValueRow(d.span(), d.name().text(), d.input(), bound.value(), bound.basis(), d.note(),
            bound.origin(), null, bound.display(), s));
        return bound;
    }

    private Binding.ValueBinding seek(Statement.Seek f, Environment env, boolean inCycle) {
        String name = f.name().text();
        if (inCycle || plan.own().get(name) != f) {
            rows.put(f, new Row.ValueRow(f.span(), name, false, Value.UNKNOWN, null, f.note(), null, null, null, f));
            return inCycle ? plan.definitions().bare(Value.UNKNOWN) : null;
        }
        SeekRunner.Outcome outcome = new SeekRunner(plan, scope, env, reporter, text, units, budget).run(f);
        Binding.ValueBinding bound = plan.definitions().solved(f, outcome.value(), env, reporter, budget);
        rows.put(f, new Row.ValueRow(f.span(), name, false, bound.value(), bound.basis(), f.note(), null,
            outcome.solution(), bound.display(), f));
        return bound;
    }
}
